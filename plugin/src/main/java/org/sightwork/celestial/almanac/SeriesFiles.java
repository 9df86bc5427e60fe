package org.sightwork.celestial.almanac;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the tab-separated coefficient resources of this package (comment lines start with '#'). */
final class SeriesFiles {

    private SeriesFiles() {
    }

    /**
     * The data rows of a resource, split on white space.
     *
     * @param resource name relative to this package
     * @return rows of fields
     */
    static List<String[]> rows(String resource) {
        List<String[]> rows = new ArrayList<>();
        try (InputStream in = SeriesFiles.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("almanac data " + resource + " is missing from the build");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                rows.add(line.trim().split("\\s+"));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read almanac data " + resource, e);
        }
        return rows;
    }

    /**
     * The raw lines of a resource, without comment lines.
     *
     * @param resource name relative to this package
     * @return lines
     */
    static List<String> lines(String resource) {
        List<String> lines = new ArrayList<>();
        try (InputStream in = SeriesFiles.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("almanac data " + resource + " is missing from the build");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            while ((line = r.readLine()) != null) {
                if (!line.startsWith("#") && !line.isBlank()) {
                    lines.add(line);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read almanac data " + resource, e);
        }
        return lines;
    }
}
