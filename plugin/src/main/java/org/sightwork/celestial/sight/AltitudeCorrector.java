package org.sightwork.celestial.sight;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sightwork.geo.earth.Angles;

/**
 * Works a sight from the sextant altitude Hs to the observed altitude Ho, and back.
 *
 * <p><b>Method.</b> The order of the almanac's altitude corrections (see {@link Worksheet}), each
 * step a formula of {@link Corrections}. Refraction is taken at the apparent altitude of the
 * observed limb; the semi-diameter is the augmented (topocentric) one; parallax comes last, from
 * the topocentric altitude of the centre. An artificial horizon halves the reading after the index
 * correction and has no dip.
 *
 * <p><b>Accuracy.</b> The arithmetic is exact; the error is that of the formulas in
 * {@link Corrections} (refraction 0.07′ above 5° in standard air) and of the almanac's HP and SD.
 * {@link #hsFor} inverts {@link #correct} to 1e-9′ (test {@code AltitudeCorrectorTest}).
 *
 * <p><b>Limits.</b> Below 5° apparent altitude a warning is given; below -1° the sight is refused.
 * Thread safety: stateless.
 */
public final class AltitudeCorrector {

    private AltitudeCorrector() {
    }

    /**
     * Corrects a sight.
     *
     * @param sight the sight
     * @param figures the almanac's figures for the body at the sight's time
     * @return the worksheet, ending with Ho
     * @throws SightException when the apparent altitude is below -1°
     */
    public static Worksheet correct(Sight sight, BodyFigures figures) {
        List<String> warnings = new ArrayList<>();
        double ie = sight.indexError().correctionArcmin();
        HorizonKind horizon;
        double dip;
        double afterIndexDeg = sight.hsDeg() + ie / 60.0;
        if (sight.artificialHorizon()) {
            horizon = HorizonKind.ARTIFICIAL;
            dip = 0.0;
            afterIndexDeg /= 2.0;
        } else if (sight.dipShortNm().isPresent()) {
            horizon = HorizonKind.SHORE;
            dip = Corrections.dipShortArcmin(sight.eyeHeightM(), sight.dipShortNm().getAsDouble());
            if (sight.dipShortNm().getAsDouble() >= Corrections.seaHorizonNm(sight.eyeHeightM())) {
                warnings.add(String.format(Locale.ROOT,
                        "the shore at %.1f nm is beyond the sea horizon (%.1f nm): sea-horizon dip used",
                        sight.dipShortNm().getAsDouble(), Corrections.seaHorizonNm(sight.eyeHeightM())));
            }
        } else {
            horizon = HorizonKind.SEA;
            dip = Corrections.dipArcmin(sight.eyeHeightM());
        }
        double ha = afterIndexDeg + dip / 60.0;
        if (ha < Corrections.REFRACTION_FLOOR_DEG) {
            throw new SightException("apparent altitude " + Angles.formatDm(ha, 2)
                    + " is below -1°: refraction there is unknowable and the sight cannot be used");
        }
        if (ha < Corrections.LOW_ALTITUDE_WARNING_DEG) {
            warnings.add("low altitude (Ha " + Angles.formatDm(ha, 2)
                    + "): refraction below 5° varies with the weather by several tenths of a minute or more; "
                    + "trust this line less");
        }
        double refr = Corrections.refractionArcmin(ha, sight.temperatureC(), sight.pressureHpa());
        double limbTopo = ha + refr / 60.0;
        double lat = figures.latDeg().orElse(Double.NaN);
        double zn = figures.znDeg().orElse(Double.NaN);
        double sign = switch (sight.limb()) {
            case LOWER -> 1.0;
            case UPPER -> -1.0;
            case CENTRE -> 0.0;
        };
        // The augmentation depends on the centre's altitude: two passes settle it to 1e-6′.
        double sd = sign * figures.sdArcmin();
        Corrections.Topocentric topo = Corrections.topocentric(limbTopo + sd / 60.0, figures.hpArcmin(),
                figures.sdArcmin(), lat, zn);
        for (int i = 0; i < 2; i++) {
            sd = sign * topo.augmentedSdArcmin();
            topo = Corrections.topocentric(limbTopo + sd / 60.0, figures.hpArcmin(), figures.sdArcmin(), lat, zn);
        }
        double phase = 0.0;
        if (figures.illuminatedFraction().isPresent() && figures.sunAngleFromVerticalDeg().isPresent()) {
            phase = Corrections.phaseArcmin(figures.sdArcmin(), figures.illuminatedFraction().getAsDouble(),
                    figures.sunAngleFromVerticalDeg().getAsDouble());
        }
        double centreTopo = limbTopo + (sd + phase) / 60.0;
        Corrections.Topocentric pTopo = Corrections.topocentric(centreTopo, figures.hpArcmin(), figures.sdArcmin(),
                lat, zn);
        double ho = centreTopo + pTopo.parallaxArcmin() / 60.0;
        return new Worksheet(sight, horizon, sight.hsDeg(), ie, dip, ha, refr, sd, phase, pTopo.parallaxArcmin(),
                ho, warnings);
    }

    /**
     * The sextant altitude that the given sight's conditions turn into the given Ho: the
     * corrections in reverse (for drills and for tests), by fixed-point iteration on
     * {@link #correct}, which converges because dHo/dHs is within 1 ± 0.01 above -1°.
     *
     * @param hoDeg the wanted observed altitude (degrees)
     * @param conditions a sight giving body, limb, index error, height of eye, T, P, horizon; its
     *     Hs is only the starting value
     * @param figures the almanac's figures
     * @return the sextant altitude (degrees)
     */
    public static double hsFor(double hoDeg, Sight conditions, BodyFigures figures) {
        double hs = conditions.artificialHorizon() ? 2.0 * hoDeg : hoDeg;
        for (int i = 0; i < 60; i++) {
            Sight trial = withHs(conditions, hs);
            double ho = correct(trial, figures).hoDeg();
            double step = (hoDeg - ho) * (conditions.artificialHorizon() ? 2.0 : 1.0);
            hs += step;
            if (Math.abs(step) < 1e-12) {
                break;
            }
        }
        return hs;
    }

    private static Sight withHs(Sight c, double hsDeg) {
        return new Sight(c.body(), c.limb(), c.watchTime(), c.watchFastSeconds(), hsDeg, c.indexError(),
                c.eyeHeightM(), c.temperatureC(), c.pressureHpa(), c.dr(), c.courseDeg(), c.speedKn(),
                c.sigmaArcmin(), c.artificialHorizon(), c.dipShortNm(), c.note());
    }
}
