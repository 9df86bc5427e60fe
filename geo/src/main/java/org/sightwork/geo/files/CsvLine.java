package org.sightwork.geo.files;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * One line of a CSV file, split into its cells, for the readers of the user's CSV files (tracks,
 * DR logs, observations, sight logs).
 *
 * <p><b>Method.</b> The quoting of RFC 4180, section 2: cells are separated by commas (rule 4), a
 * cell may be enclosed in double quotes and then hold commas (rules 5 and 6), and a double quote
 * inside such a cell is written twice (rule 7). Spaces are kept as part of the cell (rule 4);
 * callers strip them where their format says so.
 *
 * <p><b>Why by hand.</b> The error reports name the column of every cell, a line can be read on
 * its own (a bad line is reported and the good ones go on), and the project carries no CSV
 * library for these 40 lines.
 *
 * <p><b>Limits.</b> A line break inside a quoted cell (allowed by rule 6) is not supported: each
 * line is split on its own, and a quote left open is an error. More lenient than the RFC, a
 * quote inside a cell that did not start with one also opens quoting ({@code a"b,c"d} is one
 * cell {@code ab,cd}).
 *
 * @param cells the cells, as written (unquoted, spaces kept)
 */
public record CsvLine(List<String> cells) {

    /** The message of a line whose quoted cell is not closed. */
    public static final String UNCLOSED_QUOTE = "a quoted cell is not closed: expected a closing \"";

    /** Copies the cells. */
    public CsvLine {
        cells = List.copyOf(cells);
    }

    /**
     * Splits one line.
     *
     * @param line the text of the line, without its line break
     * @return the cells
     * @throws IllegalArgumentException with {@link #UNCLOSED_QUOTE} when a quoted cell is not closed
     */
    public static CsvLine split(String line) {
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        cell.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cell.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                cells.add(cell.toString());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        if (quoted) {
            throw new IllegalArgumentException(UNCLOSED_QUOTE);
        }
        cells.add(cell.toString());
        return new CsvLine(cells);
    }

    /** @return the number of cells (at least one: an empty line is one empty cell) */
    public int size() {
        return cells.size();
    }

    /**
     * @param index the cell's index, from 0
     * @return the cell as written, or {@code ""} when the line has fewer cells
     */
    public String cell(int index) {
        return index < cells.size() ? cells.get(index) : "";
    }

    /**
     * The column number used in error messages for a cell.
     *
     * @param index the cell's index, from 0
     * @return its column number, from 1
     */
    public static int column(int index) {
        return index + 1;
    }

    /**
     * Reads this line as a header: each cell's name, stripped and in lower case, to its index.
     * When a name appears twice, the later column is the one kept.
     *
     * @return the index of each named column
     */
    public Map<String, Integer> indexByName() {
        Map<String, Integer> col = new HashMap<>();
        for (int i = 0; i < cells.size(); i++) {
            col.put(cells.get(i).strip().toLowerCase(Locale.ROOT), i);
        }
        return col;
    }

    /**
     * Reads a cell as a finite decimal number (Java's {@code Double.parseDouble} syntax; NaN and
     * infinities are not numbers a log holds).
     *
     * @param cell the cell's text, stripped
     * @return the number, or empty when the cell is not a finite number
     */
    public static OptionalDouble finiteNumber(String cell) {
        try {
            double d = Double.parseDouble(cell);
            return Double.isFinite(d) ? OptionalDouble.of(d) : OptionalDouble.empty();
        } catch (NumberFormatException e) {
            return OptionalDouble.empty();
        }
    }
}
