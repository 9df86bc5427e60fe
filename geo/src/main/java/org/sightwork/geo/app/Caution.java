package org.sightwork.geo.app;

/**
 * The navigation safety caution shown in the README, in {@code --help}, on first start and in the
 * About window. One text, so that every place says the same.
 */
public final class Caution {

    /** The caution, in plain words, wrapped for a terminal. */
    public static final String TEXT =
            "CAUTION: Sightwork is an aid to navigation, not a replacement for it. A\n"
            + "computed almanac and a plotter can be wrong or be used wrongly: check what\n"
            + "they give against the official publications and every other means you have,\n"
            + "keep a proper lookout, and follow the rules and the licensed practice that\n"
            + "apply to your vessel.";

    private Caution() {
    }
}
