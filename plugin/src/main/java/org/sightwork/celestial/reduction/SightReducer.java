package org.sightwork.celestial.reduction;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.sight.AltitudeCorrector;
import org.sightwork.celestial.sight.BodyFigures;
import org.sightwork.celestial.sight.Corrections;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.sight.SightException;
import org.sightwork.celestial.sight.Worksheet;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Works a sight from the sight book to a line of position: sight time to {@link AstroTime}, the
 * almanac's {@link BodyPosition}, the corrections ({@link AltitudeCorrector}) with the oblate-Earth
 * parallax at the AP and the phase of Venus and Mars, and the reduction from the AP.
 *
 * <p><b>Limits.</b> A body more than 1° below the horizon at the AP is refused (wrong body, time
 * or date); an intercept over 30 nm gets a warning. Thread safety: immutable, thread-safe.
 */
public final class SightReducer {

    /** Intercepts larger than this get a warning (nautical miles), common practice. */
    public static final double LARGE_INTERCEPT_NM = 30.0;

    /**
     * Semi-diameters at 1 au (arcsec), Venus 8.34″ and Mars 4.68″ (Explanatory Supplement to the
     * Astronomical Almanac, 1992, table 15.5, from memory), for the phase correction when the
     * almanac gives no semi-diameter.
     */
    public static final double VENUS_SD_1AU_ARCSEC = 8.34;
    /** See {@link #VENUS_SD_1AU_ARCSEC}. */
    public static final double MARS_SD_1AU_ARCSEC = 4.68;
    /** The astronomical unit (km), IAU 2012 Resolution B2. */
    public static final double AU_KM = 149_597_870.7;

    private static final DateTimeFormatter HMS = DateTimeFormatter.ofPattern("HH:mm:ss").withZone(ZoneOffset.UTC);

    private final Almanac almanac;
    private final double dut1Seconds;

    /**
     * @param almanac the almanac
     * @param dut1Seconds DUT1 = UT1 - UTC (seconds, [-0.9, 0.9]; 0 if unknown)
     */
    public SightReducer(Almanac almanac, double dut1Seconds) {
        this.almanac = almanac;
        this.dut1Seconds = dut1Seconds;
    }

    /** @return a reducer on the standard almanac with DUT1 = 0 */
    public static SightReducer standard() {
        return new SightReducer(Almanac.standard(), 0.0);
    }

    /** @return the almanac */
    public Almanac almanac() {
        return almanac;
    }

    /**
     * @param sight the sight
     * @param ap the assumed position; empty to use the sight's DR
     * @return the worked sight
     * @throws SightException when the sight cannot be worked (no DR, below the horizon, ...)
     */
    public ReducedSight reduce(Sight sight, Optional<GeoPosition> ap) {
        Body body = almanac.body(sight.body());
        if (body.kind() == Body.Kind.ARIES) {
            throw new SightException("Aries is a point, not a body: name the star observed");
        }
        GeoPosition from = ap.or(sight::dr).orElseThrow(() -> new SightException(
                "sight of " + body.name() + " at " + HMS.format(sight.utc())
                        + "Z has no DR position: give dr_lat and dr_lon, or an assumed position"));
        AstroTime t = AstroTime.ofUtc(sight.utc(), dut1Seconds);
        BodyPosition pos = almanac.position(body, t);
        ComputedAltitude c = SightReduction.reduce(from, pos.ghaDeg(), pos.decDeg());
        if (c.hcDeg() < -1.0) {
            throw new SightException(String.format(Locale.ROOT,
                    "%s was %s below the horizon at the DR %s at %sZ: check the body's name, the time and date "
                            + "(UTC) and the DR", body.name(), Angles.formatDm(-c.hcDeg(), 2), from,
                    HMS.format(sight.utc())));
        }
        BodyFigures figures = figures(body, pos, t, from, c);
        Worksheet w = AltitudeCorrector.correct(sight, figures);
        String label = body.name() + (body.kind() == Body.Kind.SUN || body.kind() == Body.Kind.MOON
                ? " " + limbCode(sight) : "") + " " + HMS.format(sight.utc());
        LineOfPosition lop = new LineOfPosition(label, sight.utc(), from, pos.ghaDeg(), pos.decDeg(), w.hoDeg(),
                c.hcDeg(), c.znDeg(), (w.hoDeg() - c.hcDeg()) * 60.0, sight.sigmaArcmin());
        List<String> warnings = new ArrayList<>(w.warnings());
        if (Math.abs(lop.interceptNm()) > LARGE_INTERCEPT_NM) {
            warnings.add(String.format(Locale.ROOT,
                    "intercept %.1f nm is large: check the time, the body and the DR (a fix will iterate from it)",
                    Math.abs(lop.interceptNm())));
        }
        return new ReducedSight(w, pos, c, lop, warnings);
    }

    private BodyFigures figures(Body body, BodyPosition pos, AstroTime t, GeoPosition from, ComputedAltitude c) {
        double hp = pos.hpArcmin().orElse(0.0);
        double sd = pos.sdArcmin().orElse(0.0);
        BodyFigures f = new BodyFigures(hp, sd, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty()).at(from.latDeg(), c.znDeg());
        boolean phased = body.equals(Body.VENUS) || body.equals(Body.MARS);
        if (phased && pos.illuminatedFraction().isPresent()) {
            if (sd == 0.0 && pos.distanceKm().isPresent()) {
                double sd1 = body.equals(Body.VENUS) ? VENUS_SD_1AU_ARCSEC : MARS_SD_1AU_ARCSEC;
                sd = sd1 / 60.0 * AU_KM / pos.distanceKm().getAsDouble();
                f = new BodyFigures(hp, sd, OptionalDouble.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty(), OptionalDouble.empty()).at(from.latDeg(), c.znDeg());
            }
            BodyPosition sun = almanac.position(Body.SUN, t);
            ComputedAltitude cs = SightReduction.reduce(from, sun.ghaDeg(), sun.decDeg());
            double theta = Corrections.sunAngleFromVerticalDeg(c.hcDeg(), c.znDeg(), cs.hcDeg(), cs.znDeg());
            f = f.withPhase(pos.illuminatedFraction().getAsDouble(), theta);
        }
        return f;
    }

    private static String limbCode(Sight s) {
        return switch (s.limb()) {
            case LOWER -> "LL";
            case UPPER -> "UL";
            case CENTRE -> "centre";
        };
    }
}
