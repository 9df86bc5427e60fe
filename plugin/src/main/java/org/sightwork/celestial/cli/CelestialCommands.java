package org.sightwork.celestial.cli;

import java.util.List;
import org.sightwork.geo.spi.CommandProvider;

/**
 * The celestial plugin's commands on the {@code sightwork} command line. Each command is a thin
 * layer over a computing package: it reads options, calls the package, and prints text, CSV or JSON.
 */
public final class CelestialCommands implements CommandProvider {

    @Override
    public List<Object> commands() {
        return List.of(new AlmanacCommand(), new ReduceCommand(), new FixCommand(), new PlanCommand(),
                new IdentifyCommand(), new CompassCommand(), new DrillCommand(), new CompareCommand());
    }
}
