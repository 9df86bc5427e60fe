package org.sightwork.celestial.ui;

/**
 * The columns of the sight log editor, with the heading (unit in brackets) and a hint of what a
 * cell accepts. The order is the order on the screen and in the demo sight log.
 */
enum SightColumn {
    /** The body's name as the almanac knows it. */
    BODY("Body", "Sun, Moon, Venus, Mars, Jupiter, Saturn or a star's name", false),
    /** The limb observed. */
    LIMB("Limb", "LL, UL or blank (centre; Sun and Moon default to LL)", false),
    /** The watch time. */
    TIME("Watch (UTC)", "yyyy-mm-dd hh:mm:ss, or hh:mm:ss on the passage day", false),
    /** Watch error. */
    WATCH_FAST("W.E. (s fast)", "seconds the watch is fast (negative when slow)", true),
    /** The sextant altitude. */
    HS("Hs (d°m.m′)", "sextant altitude such as 45°12.3' or 45 12.3", false),
    /** Index error. */
    INDEX("IE (′)", "index error such as 1.5 on, 2.0 off, or a signed correction (+ off, − on)", true),
    /** Height of eye. */
    EYE("HoE (m)", "height of eye in metres (or 9 ft)", true),
    /** Air temperature. */
    TEMPERATURE("T (°C)", "air temperature, °C (blank: 10 °C)", true),
    /** Air pressure. */
    PRESSURE("P (hPa)", "air pressure, hPa (blank: 1010 hPa)", true),
    /** DR position. */
    DR("DR (lat lon)", "blank: from the passage DR; or e.g. 38°20.0'N 027°10.0'W", true),
    /** Assumed position. */
    AP("AP (lat lon)", "blank: the DR; or e.g. 38°N 27°W", false),
    /** The fix the sight belongs to. */
    FIX("Fix", "a name shared by the sights of one fix, e.g. twilight; blank: a line alone", false);

    private final String heading;
    private final String hint;
    private final boolean carried;

    SightColumn(String heading, String hint, boolean carried) {
        this.heading = heading;
        this.hint = hint;
        this.carried = carried;
    }

    /** @return the heading shown over the column, with its unit */
    String heading() {
        return heading;
    }

    /** @return what the cell accepts, shown as its tooltip */
    String hint() {
        return hint;
    }

    /** @return whether a new row starts with the previous row's value */
    boolean carried() {
        return carried;
    }
}
