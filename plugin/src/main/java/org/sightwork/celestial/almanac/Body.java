package org.sightwork.celestial.almanac;

/**
 * A body of the almanac.
 *
 * @param name the name a navigator uses ("Sun", "Sirius"); a catalogue star without a trade name
 *     is named by its Bayer or Flamsteed designation or "HR n"
 * @param kind what sort of body it is
 * @param navNumber the trade's number of a navigational star, 1 to 57; 0 for Polaris; -1 otherwise
 * @param hrNumber Bright Star Catalogue (5th rev. ed.) HR number of a star; -1 if none
 */
public record Body(String name, Kind kind, int navNumber, int hrNumber) {

    /** What sort of body. */
    public enum Kind { SUN, MOON, PLANET, ARIES, STAR }

    /** The Sun. */
    public static final Body SUN = new Body("Sun", Kind.SUN, -1, -1);
    /** The Moon. */
    public static final Body MOON = new Body("Moon", Kind.MOON, -1, -1);
    /** Venus. */
    public static final Body VENUS = new Body("Venus", Kind.PLANET, -1, -1);
    /** Mars. */
    public static final Body MARS = new Body("Mars", Kind.PLANET, -1, -1);
    /** Jupiter. */
    public static final Body JUPITER = new Body("Jupiter", Kind.PLANET, -1, -1);
    /** Saturn. */
    public static final Body SATURN = new Body("Saturn", Kind.PLANET, -1, -1);
    /** The first point of Aries (the true equinox of date). */
    public static final Body ARIES = new Body("Aries", Kind.ARIES, -1, -1);

    /**
     * Checks the values.
     *
     * @throws IllegalArgumentException if the name is blank, the kind missing or the numbers out of range
     */
    public Body {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a body needs a name");
        }
        if (kind == null) {
            throw new IllegalArgumentException("body " + name + " needs a kind");
        }
        if (navNumber < -1 || navNumber > 57) {
            throw new IllegalArgumentException("navigational star number " + navNumber + " of " + name
                    + " is outside 0..57 (or -1 for none)");
        }
        if (navNumber >= 0 && kind != Kind.STAR) {
            throw new IllegalArgumentException(name + " is not a star but has navigational number " + navNumber);
        }
        if (hrNumber < -1 || hrNumber == 0) {
            throw new IllegalArgumentException("HR number " + hrNumber + " of " + name + " must be positive (or -1)");
        }
    }

    /**
     * Whether this is a star.
     *
     * @return true for stars
     */
    public boolean isStar() {
        return kind == Kind.STAR;
    }

    /**
     * Whether this is one of the four navigational planets.
     *
     * @return true for Venus, Mars, Jupiter and Saturn
     */
    public boolean isPlanet() {
        return kind == Kind.PLANET;
    }
}
