package org.sightwork.celestial.ui.drill;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.drill.DrillGenerator;
import org.sightwork.celestial.drill.DrillPackWriter;
import org.sightwork.celestial.drill.ScenarioReader;

/**
 * Drill packs for the tests, made by the drill generator from the shipped demo scenario (an
 * invented yacht on an invented passage) with a fixed seed: inputs, never check values.
 */
public final class DrillPacks {

    /** The seed of the test packs. */
    public static final long SEED = 7;

    private DrillPacks() {
    }

    /**
     * Writes the instructor's drill directory ({@code student/} and {@code key/}).
     *
     * @param dir an empty directory
     * @return the directory
     * @throws IOException if it cannot be written
     */
    public static Path demo(Path dir) throws IOException {
        String json;
        try (InputStream in = DrillPacks.class.getResourceAsStream("/org/sightwork/celestial/demo/drill-scenario.json")) {
            json = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        DrillPackWriter.write(DrillGenerator.generate(ScenarioReader.parse(json, "drill-scenario.json"), SEED,
                Almanac.standard()), dir, false);
        return dir;
    }
}
