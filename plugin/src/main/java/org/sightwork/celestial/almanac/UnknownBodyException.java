package org.sightwork.celestial.almanac;

import java.util.List;

/** A body name the almanac does not know; the message lists the nearest valid names. */
public final class UnknownBodyException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final transient List<String> nearest;

    /**
     * Creates the exception.
     *
     * @param name the name asked for
     * @param nearest the nearest valid names, best first
     */
    public UnknownBodyException(String name, List<String> nearest) {
        super("unknown body '" + name + "'; nearest valid names: " + String.join(", ", nearest)
                + " (also: sun, moon, venus, mars, jupiter, saturn, aries, or a star as 'HR n')");
        this.nearest = List.copyOf(nearest);
    }

    /**
     * The nearest valid names, best first.
     *
     * @return names
     */
    public List<String> nearest() {
        return nearest;
    }
}
