package org.sightwork.celestial.io;

import java.util.List;
import org.sightwork.celestial.sight.Sight;

/**
 * A sight log as read: the good sights, with the line each came from, and the problems.
 *
 * @param file the file's name
 * @param sights the sights read, in file order
 * @param lines the line number of each sight (same order)
 * @param problems every bad cell or line, in file order
 */
public record SightLog(String file, List<Sight> sights, List<Integer> lines, List<LogProblem> problems) {

    /** Copies the lists. */
    public SightLog {
        sights = List.copyOf(sights);
        lines = List.copyOf(lines);
        problems = List.copyOf(problems);
        if (sights.size() != lines.size()) {
            throw new IllegalArgumentException("one line number per sight");
        }
    }
}
