package org.sightwork.celestial.planning;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads the committed reference tables (TSV: '#' comments, one header line, then rows). */
final class ReferenceTables {

    private ReferenceTables() {
    }

    /**
     * The rows of a table, each as column name to cell text (empty cell = "").
     *
     * @param resource the class-path resource, e.g. {@code /reference/planning-pyephem.tsv}
     * @return the rows
     */
    static List<Map<String, String>> read(String resource) {
        try (InputStream in = ReferenceTables.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("reference table " + resource + " is missing");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String[] header = null;
            List<Map<String, String>> rows = new ArrayList<>();
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                String[] cells = line.split("\t", -1);
                if (header == null) {
                    header = cells;
                    continue;
                }
                Map<String, String> row = new HashMap<>();
                for (int i = 0; i < header.length; i++) {
                    row.put(header[i], i < cells.length ? cells[i] : "");
                }
                rows.add(row);
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
