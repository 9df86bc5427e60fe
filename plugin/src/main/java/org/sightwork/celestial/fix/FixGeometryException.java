package org.sightwork.celestial.fix;

/**
 * The lines cannot make a fix (too few, or crossing too shallow): the message says why in a
 * navigator's words and what would help.
 */
public class FixGeometryException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /**
     * @param message the navigator's message
     */
    public FixGeometryException(String message) {
        super(message);
    }
}
