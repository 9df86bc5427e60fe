package org.sightwork.geo.app;

import java.util.List;
import org.sightwork.geo.spi.CommandProvider;

/** The shell's own sub-commands: {@code chart}. */
public final class ShellCommands implements CommandProvider {

    @Override
    public List<Object> commands() {
        return List.of(new ChartCommand());
    }
}
