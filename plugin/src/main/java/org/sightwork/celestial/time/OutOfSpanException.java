package org.sightwork.celestial.time;

/**
 * An instant outside the span the almanac covers (1900-01-01 to 2100-12-31 UTC). The message names
 * the instant and the span.
 */
public final class OutOfSpanException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * Creates the exception.
     *
     * @param message what was asked and the span allowed
     */
    public OutOfSpanException(String message) {
        super(message);
    }
}
