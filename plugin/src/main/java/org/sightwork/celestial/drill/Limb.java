package org.sightwork.celestial.drill;

import java.util.Locale;

/** Which part of the body the observer brought down to the horizon. */
public enum Limb {
    /** Lower limb (Sun, Moon: the usual sight). */
    LOWER,
    /** Upper limb (Sun, Moon). */
    UPPER,
    /** Centre: stars and planets, which show no disc in a sextant. */
    CENTRE;

    /**
     * Reads {@code lower}, {@code upper}, {@code centre}/{@code center} (any case).
     *
     * @param text the written limb
     * @return the limb
     * @throws IllegalArgumentException naming the allowed words
     */
    public static Limb parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        switch (t) {
            case "lower": case "l": return LOWER;
            case "upper": case "u": return UPPER;
            case "centre": case "center": case "c": case "": return CENTRE;
            default:
                throw new IllegalArgumentException("'" + text + "' is not a limb: expected lower, upper or centre");
        }
    }

    /** @return the word used in files ({@code lower}, {@code upper}, {@code centre}) */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }
}
