package org.sightwork.celestial.planning;

/**
 * The few altitude corrections planning needs, to the precision of a pre-set sextant or of star
 * identification (about 0.1′-0.5′): dip, mean refraction both ways, and parallax in altitude. The
 * full step-by-step corrections of a sight belong to the sight package; these are kept here so that
 * planning stands alone, at planning precision.
 *
 * <p><b>Method:</b> dip {@code 1.76′ √(height of eye in metres)} (from memory of the nautical
 * almanac's dip table; 2.4 m gives 2.7′); refraction from an apparent altitude by Bennett (1982),
 * {@code R = cot(Ha + 7.31/(Ha + 4.4))′}, and from a true altitude by Sæmundsson (1986),
 * {@code R = 1.02 cot(h + 10.3/(h + 5.11))′} (both as given in Meeus, <i>Astronomical
 * Algorithms</i>, 2nd ed., eq. 16.3 and 16.4; from memory), at 1010 hPa and 10 °C; parallax in
 * altitude {@code HP cos H} to first order.
 *
 * <p><b>Accuracy:</b> mean refraction is good to about 0.1′ above 15° and about 1′-2′ at the horizon,
 * where the real atmosphere varies far more than that.
 *
 * <p><b>Limits:</b> refraction below −1° (apparent) is not defined and is clamped there.
 */
public final class SextantApprox {

    /** Dip coefficient (arcminutes per √metre), from memory of the almanac's dip table. */
    public static final double DIP_ARCMIN_PER_SQRT_M = 1.76;

    /** Standard refraction at the horizon used for rising and setting (arcminutes), by convention. */
    public static final double HORIZON_REFRACTION_ARCMIN = 34.0;

    private SextantApprox() {
    }

    /**
     * Dip of the sea horizon.
     *
     * @param eyeHeightM height of eye above the sea (metres, ≥ 0)
     * @return dip (arcminutes, ≥ 0)
     */
    public static double dipArcmin(double eyeHeightM) {
        if (!(eyeHeightM >= 0.0 && eyeHeightM <= 1000.0)) {
            throw new IllegalArgumentException("height of eye " + eyeHeightM + " m is outside [0, 1000] m");
        }
        return DIP_ARCMIN_PER_SQRT_M * Math.sqrt(eyeHeightM);
    }

    /**
     * Mean refraction of a body seen at an apparent altitude (Bennett).
     *
     * @param apparentAltDeg apparent altitude (degrees)
     * @return refraction (arcminutes), to be subtracted
     */
    public static double refractionFromApparentArcmin(double apparentAltDeg) {
        double h = Math.max(apparentAltDeg, -1.0);
        return 1.0 / Math.tan(Math.toRadians(h + 7.31 / (h + 4.4)));
    }

    /**
     * Mean refraction of a body at a true (airless) altitude (Sæmundsson).
     *
     * @param trueAltDeg true altitude (degrees)
     * @return refraction (arcminutes), to be added to get the apparent altitude
     */
    public static double refractionFromTrueArcmin(double trueAltDeg) {
        double h = Math.max(trueAltDeg, -1.5);
        return 1.02 / Math.tan(Math.toRadians(h + 10.3 / (h + 5.11)));
    }

    /**
     * Parallax in altitude, to first order.
     *
     * @param hpArcmin horizontal parallax (arcminutes)
     * @param altDeg altitude (degrees)
     * @return parallax (arcminutes)
     */
    public static double parallaxArcmin(double hpArcmin, double altDeg) {
        return hpArcmin * Math.cos(Math.toRadians(altDeg));
    }

    /**
     * The sextant reading to pre-set for a body of computed (geocentric) altitude Hc: Hc less
     * parallax, plus refraction, plus dip; the body's centre, index error not included.
     *
     * @param hcDeg computed altitude (degrees)
     * @param hpArcmin horizontal parallax (arcminutes; 0 for a star)
     * @param eyeHeightM height of eye (metres)
     * @return the approximate sextant altitude (degrees)
     */
    public static double presetHsDeg(double hcDeg, double hpArcmin, double eyeHeightM) {
        double topo = hcDeg - parallaxArcmin(hpArcmin, hcDeg) / 60.0;
        return topo + refractionFromTrueArcmin(topo) / 60.0 + dipArcmin(eyeHeightM) / 60.0;
    }

    /**
     * The approximate true altitude of a sextant reading: less dip and refraction (no parallax,
     * no semi-diameter, no index error); enough to identify a body.
     *
     * @param hsDeg sextant altitude (degrees)
     * @param eyeHeightM height of eye (metres)
     * @return the approximate observed altitude above the celestial horizon (degrees)
     */
    public static double approxObservedDeg(double hsDeg, double eyeHeightM) {
        double ha = hsDeg - dipArcmin(eyeHeightM) / 60.0;
        return ha - refractionFromApparentArcmin(ha) / 60.0;
    }
}
