package org.sightwork.geo.app;

import javafx.application.Application;

/**
 * Opens the chart window, or says clearly that there is no display to open it on.
 */
final class ChartWindowLauncher {

    private ChartWindowLauncher() {
    }

    static int open() {
        String display = System.getenv("DISPLAY");
        String wayland = System.getenv("WAYLAND_DISPLAY");
        if ((display == null || display.isBlank()) && (wayland == null || wayland.isBlank())) {
            System.err.println("sightwork: no display (DISPLAY is not set), so the chart window cannot open.");
            System.err.println("  Render the chart to an image instead: sightwork chart --out map.png");
            System.err.println("  Or run under a virtual display: Xvfb :99 & DISPLAY=:99 sightwork");
            return Main.EXIT_FAILED;
        }
        System.err.println(Caution.TEXT);
        try {
            Application.launch(ChartApplication.class);
        } catch (RuntimeException e) {
            System.err.println("sightwork: the chart window could not open: " + e.getMessage());
            return Main.EXIT_FAILED;
        }
        return 0;
    }
}
