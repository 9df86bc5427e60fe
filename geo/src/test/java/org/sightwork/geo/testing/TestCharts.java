package org.sightwork.geo.testing;

import java.nio.file.Files;
import java.nio.file.Path;

/** For tests: where the repository's {@code test-charts/} directory is (found upwards from the working directory). */
public final class TestCharts {

    private TestCharts() {
    }

    /**
     * The {@code test-charts} directory.
     *
     * @return its path
     * @throws IllegalStateException if there is none above the working directory
     */
    public static Path dir() {
        Path p = Path.of(System.getProperty("user.dir")).toAbsolutePath();
        while (p != null) {
            Path c = p.resolve("test-charts");
            if (Files.isDirectory(c)) {
                return c;
            }
            p = p.getParent();
        }
        throw new IllegalStateException("no test-charts directory above " + System.getProperty("user.dir"));
    }

    /**
     * A file in {@code test-charts}.
     *
     * @param relative e.g. "fixtures/points.geojson"
     * @return its path
     */
    public static Path file(String relative) {
        return dir().resolve(relative);
    }
}
