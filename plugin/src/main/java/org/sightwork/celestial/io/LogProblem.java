package org.sightwork.celestial.io;

/**
 * A problem found in an input file, placed exactly.
 *
 * @param file the file's name
 * @param line line number (1-based; the header is line 1)
 * @param column column number (1-based; 0 when the whole line is at fault)
 * @param columnName the column's header name, or "" for the whole line
 * @param message what is wrong and what was expected
 */
public record LogProblem(String file, int line, int column, String columnName, String message) {

    /** @return e.g. "sights.csv:7: column 4 (hs): '95 12' ... expected ...", or "sights.csv:7: message" */
    @Override
    public String toString() {
        String where = column > 0 ? " column " + column + " (" + columnName + "):" : "";
        return file + ":" + line + ":" + where + " " + message;
    }
}
