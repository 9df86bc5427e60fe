package org.sightwork.geo.spi;

/**
 * Slow work run off the JavaFX application thread.
 *
 * @param <T> the result type
 */
@FunctionalInterface
public interface BackgroundTask<T> {

    /**
     * Does the work. Runs on a worker thread: never touch JavaFX nodes here.
     *
     * @param progress where to report progress and ask whether to stop
     * @return the result
     * @throws Exception if the work fails; reported to the user in a notification
     */
    T run(Progress progress) throws Exception;
}
