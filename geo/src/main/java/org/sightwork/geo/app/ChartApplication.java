package org.sightwork.geo.app;

import javafx.application.Application;
import javafx.stage.Stage;

/** The JavaFX application of the chart window. Started by {@link ChartWindowLauncher}. */
public final class ChartApplication extends Application {

    @Override
    public void start(Stage stage) {
        new ChartWindow(stage).show();
    }
}
