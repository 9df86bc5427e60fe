package org.sightwork.celestial.drill;

/**
 * The common mistakes of working a sight that the grader recognises. Each is recognised by
 * recomputing the sight with that one mistake (the answer key holds the result) and matching the
 * student's number, never by guessing from the size of an error.
 */
public enum Mistake {
    /** Index error added when it should be subtracted, or the other way round. */
    INDEX_ERROR_WRONG_SIGN(Stage.ALTITUDE,
            "the index error was applied with the wrong sign: subtract it when it is on the arc, add it when off"),
    /** No dip correction. */
    DIP_FORGOTTEN(Stage.ALTITUDE,
            "the dip was left out: the sea horizon lies below the true horizontal, so dip is always subtracted"),
    /** Dip added instead of subtracted. */
    DIP_WRONG_SIGN(Stage.ALTITUDE,
            "the dip was added: it is always subtracted from the sextant altitude"),
    /** No semi-diameter for a limb sight. */
    SEMI_DIAMETER_FORGOTTEN(Stage.ALTITUDE,
            "the semi-diameter was left out: a limb sight needs it to reach the body's centre"),
    /** Semi-diameter with the sign of the other limb. */
    WRONG_LIMB(Stage.ALTITUDE,
            "the semi-diameter was applied for the wrong limb: add it for a lower-limb sight, subtract it for an upper"),
    /** GHA and declination taken for the hour after. */
    HOUR_LATE(Stage.ALMANAC,
            "the almanac was read for the hour after the sight (GHA for 1 h too late): check the UTC hour"),
    /** GHA and declination taken for the hour before. */
    HOUR_EARLY(Stage.ALMANAC,
            "the almanac was read for the hour before the sight (GHA for 1 h too early): check the UTC hour"),
    /** The almanac's page for the next day. */
    DAY_LATE(Stage.ALMANAC,
            "the almanac was read for the next day: check the UTC date (it can differ from the local date)"),
    /** The almanac's page for the day before. */
    DAY_EARLY(Stage.ALMANAC,
            "the almanac was read for the day before: check the UTC date (it can differ from the local date)"),
    /** West longitude used as east, or east as west, in LHA. */
    LONGITUDE_SIGN(Stage.ALMANAC,
            "the longitude was used with the wrong sign in LHA: LHA = GHA − west longitude, GHA + east longitude"),
    /** The watch error not taken off the watch time. */
    WATCH_ERROR_NOT_APPLIED(Stage.ALMANAC,
            "the watch error was not applied: take a fast watch's error off the watch time to get UTC"),
    /** The watch error applied the wrong way. */
    WATCH_ERROR_WRONG_SIGN(Stage.ALMANAC,
            "the watch error was applied the wrong way: a fast watch's error is subtracted from the watch time"),
    /** Toward and away swapped: the intercept with the wrong sign. */
    TOWARD_AWAY_SWAPPED(Stage.INTERCEPT,
            "toward and away were swapped: when Ho is greater than Hc the intercept is toward the body"),
    /** The fix plotted with east and west swapped. */
    FIX_LONGITUDE_SIGN(Stage.FIX,
            "the fix was written with east and west swapped: west longitudes are W (negative in a signed file)");

    /** Where in the working the mistake happens. */
    public enum Stage {
        /** In the corrections from Hs to Ho: changes Ho (and with it the intercept). */
        ALTITUDE,
        /** In reading the almanac or the time: changes Hc and Zn (and with them the intercept). */
        ALMANAC,
        /** In naming the intercept toward or away. */
        INTERCEPT,
        /** In writing the fix. */
        FIX
    }

    private final Stage stage;
    private final String advice;

    Mistake(Stage stage, String advice) {
        this.stage = stage;
        this.advice = advice;
    }

    /** @return where in the working it happens */
    public Stage stage() {
        return stage;
    }

    /** @return a plain-language comment for the student */
    public String advice() {
        return advice;
    }
}
