package org.sightwork.geo.chart;

import java.nio.file.Path;

/**
 * A problem met while reading chart data: what the user is told in a notification.
 *
 * @param file the file
 * @param where the layer, feature or line and column where it was found; empty when it is the whole
 *     file
 * @param message what is wrong and what was expected
 */
public record ChartProblem(Path file, String where, String message) {

    /** Checks. */
    public ChartProblem {
        if (file == null || message == null) {
            throw new IllegalArgumentException("a problem needs a file and a message");
        }
        where = where == null ? "" : where;
    }

    /** The problem in one line: {@code file: where: message}. */
    @Override
    public String toString() {
        return file.getFileName() + (where.isEmpty() ? "" : ": " + where) + ": " + message;
    }
}
