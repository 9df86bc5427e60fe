package org.sightwork.celestial.ui;

import java.nio.file.Path;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.reduction.SightReducer;

/**
 * For {@link RoundTripAcrossRunsTest}, run in a child JVM: opens a passage file and saves it under
 * another name, the editor's way (worked out, then saved with its fixes).
 *
 * <p>Arguments: the file to open, the file to write.
 */
public final class ResaveMain {

    public static void main(String[] args) throws Exception {
        PassageFiles.Opened o = PassageFiles.open(Path.of(args[0]));
        Passage p = o.passage().orElseThrow(() -> new IllegalStateException(o.message()));
        Plot plot = new PlotComputer(SightReducer.standard(), FixOptions.DEFAULTS).compute(p);
        PassageFiles.save(p, plot, Path.of(args[1]));
    }

    private ResaveMain() {
    }
}
