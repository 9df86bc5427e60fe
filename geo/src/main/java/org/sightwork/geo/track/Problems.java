package org.sightwork.geo.track;

import java.util.ArrayList;
import java.util.List;

/**
 * Collects the problems of one file, keeping the first {@link #KEPT} so that a log of millions of
 * bad lines does not fill the memory; the count goes on.
 */
final class Problems {

    /** How many problems are kept with their text. */
    static final int KEPT = 500;

    private final String file;
    private final List<ImportProblem> kept = new ArrayList<>();
    private long count;

    Problems(String file) {
        this.file = file;
    }

    void add(long line, int column, String message) {
        count++;
        if (kept.size() < KEPT) {
            kept.add(new ImportProblem(file, line, column, message));
        }
    }

    <T> ImportResult<T> result(T value) {
        return new ImportResult<>(value, kept, count);
    }

    long count() {
        return count;
    }

    String file() {
        return file;
    }
}
