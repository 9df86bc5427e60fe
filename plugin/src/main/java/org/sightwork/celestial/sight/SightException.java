package org.sightwork.celestial.sight;

/**
 * A sight that cannot be worked as given: the message is written for the navigator, names the
 * quantity, its value with its unit and what is allowed (e.g. "sextant altitude 95°00.0′ is above
 * 90°"). An {@link IllegalArgumentException}, so that the command line reports it as bad input.
 */
public class SightException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /**
     * @param message the navigator's message
     */
    public SightException(String message) {
        super(message);
    }
}
