package org.sightwork.geo.spi;

/**
 * Progress of a {@link BackgroundTask}, shown in the status bar.
 *
 * <p><b>Thread safety:</b> may be called from any thread.
 */
public interface Progress {

    /**
     * Reports progress.
     *
     * @param fraction done so far, [0, 1], or a negative number when unknown
     * @param message what is being done now, or null to keep the last one
     */
    void update(double fraction, String message);

    /**
     * Whether the user asked to stop; a long task should check now and then and return early.
     *
     * @return true when cancelled
     */
    boolean isCancelled();
}
