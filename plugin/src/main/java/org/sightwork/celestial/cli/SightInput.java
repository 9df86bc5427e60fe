package org.sightwork.celestial.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.sightwork.celestial.io.LogProblem;
import org.sightwork.celestial.io.SightLog;
import org.sightwork.celestial.io.SightLogReader;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/** Reads a sight log and works every sight, collecting problems with file and line. */
final class SightInput {

    final List<ReducedSight> reduced = new ArrayList<>();
    final List<Integer> lines = new ArrayList<>();
    final List<LogProblem> problems = new ArrayList<>();

    private SightInput() {
    }

    static SightInput load(Path file, Optional<GeoPosition> ap, double dut1) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException("sight log " + file + " does not exist or is not a file");
        }
        SightLog log = SightLogReader.read(file);
        SightInput in = new SightInput();
        in.problems.addAll(log.problems());
        SightReducer reducer = new SightReducer(org.sightwork.celestial.almanac.Almanac.standard(), dut1);
        for (int i = 0; i < log.sights().size(); i++) {
            Sight s = log.sights().get(i);
            int line = log.lines().get(i);
            try {
                in.reduced.add(reducer.reduce(s, ap));
                in.lines.add(line);
            } catch (IllegalArgumentException e) {
                in.problems.add(new LogProblem(log.file(), line, 0, "", e.getMessage()));
            }
        }
        in.problems.sort(java.util.Comparator.comparingInt(LogProblem::line));
        return in;
    }

    void reportProblems(PrintWriter err) {
        for (LogProblem p : problems) {
            err.println(p);
        }
        err.flush();
    }

    static Optional<GeoPosition> parseAp(String text) {
        if (text == null) {
            return Optional.empty();
        }
        String[] parts = text.split(",");
        if (parts.length != 2) {
            throw new IllegalArgumentException("--ap '" + text + "': expected LAT,LON such as 38°30'N,028°40'W or 38.5,-28.67");
        }
        return Optional.of(GeoPosition.of(Angles.parseLatitude(parts[0]), Angles.parseLongitude(parts[1])));
    }
}
