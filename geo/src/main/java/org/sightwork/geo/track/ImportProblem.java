package org.sightwork.geo.track;

import java.util.Locale;

/**
 * One problem found while reading a file: where it is and what was expected.
 *
 * @param file the file name as given by the user
 * @param line line number (1-based), or 0 when the problem concerns the whole file
 * @param column column (1-based), or 0 when unknown
 * @param message what is wrong and what was expected, in plain words
 */
public record ImportProblem(String file, long line, int column, String message) {

    /** The problem as one line: {@code file:line:column: message}. */
    @Override
    public String toString() {
        if (line <= 0) {
            return String.format(Locale.ROOT, "%s: %s", file, message);
        }
        if (column <= 0) {
            return String.format(Locale.ROOT, "%s:%d: %s", file, line, message);
        }
        return String.format(Locale.ROOT, "%s:%d:%d: %s", file, line, column, message);
    }
}
