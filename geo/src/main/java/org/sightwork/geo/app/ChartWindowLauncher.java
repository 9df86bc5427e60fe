package org.sightwork.geo.app;

/**
 * Opens the chart window. Until the window exists this prints what the command line offers.
 */
final class ChartWindowLauncher {

    private ChartWindowLauncher() {
    }

    static int open() {
        System.err.println("The chart window is not built yet; see `sightwork --help` for the commands.");
        System.err.println(Caution.TEXT);
        return Main.EXIT_FAILED;
    }
}
