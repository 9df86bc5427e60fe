package org.sightwork.geo.track;

import java.util.List;

/**
 * What a reader made of a file: the good data, and the problems with the rest.
 *
 * @param <T> the kind of data read
 * @param value the data read from the good lines
 * @param problems the problems kept, in file order (at most {@link Problems#KEPT} of them)
 * @param problemCount the number of problems found, also those not kept
 */
public record ImportResult<T>(T value, List<ImportProblem> problems, long problemCount) {

    /** Copies the list. */
    public ImportResult {
        problems = List.copyOf(problems);
    }

    /** @return true when no problem was found */
    public boolean clean() {
        return problemCount == 0;
    }
}
