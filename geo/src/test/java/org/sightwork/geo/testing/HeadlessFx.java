package org.sightwork.geo.testing;

import java.util.concurrent.Callable;
import org.sightwork.geo.app.HeadlessPlatform;

/**
 * For tests: starts the JavaFX platform headless once (Monocle, software rendering) and runs code
 * on the JavaFX application thread. Published in geo's test jar for the plugin module's tests.
 *
 * <pre>{@code
 * HeadlessFx.start();
 * BufferedImage img = HeadlessFx.call(() -> new HeadlessChart(chart, Palette.DAY, true).render(viewport));
 * }</pre>
 */
public final class HeadlessFx {

    private HeadlessFx() {
    }

    /** Starts the platform (once; later calls return at once). */
    public static void start() {
        HeadlessPlatform.start();
    }

    /**
     * Runs code on the JavaFX application thread and waits for it.
     *
     * @param <T> the result type
     * @param work the code
     * @return its result
     */
    public static <T> T call(Callable<T> work) {
        start();
        return HeadlessPlatform.call(work);
    }

    /**
     * Runs code on the JavaFX application thread and waits for it.
     *
     * @param work the code
     */
    public static void run(Runnable work) {
        call(() -> {
            work.run();
            return null;
        });
    }
}
