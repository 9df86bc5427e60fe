package org.sightwork.celestial.almanac;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import org.jastronomy.jsofa.JSOFA;
import org.sightwork.celestial.time.AstroTime;

/**
 * The almanac: apparent geocentric places of date of the Sun, Moon, planets, Aries and stars.
 *
 * <p><b>Method</b> (details and sources in {@code docs/METHOD-ALMANAC.md}):
 * <ul>
 * <li>Earth, Venus, Mars, Jupiter, Saturn: VSOP87D (Bretagnon and Francou 1988), heliocentric,
 * mean ecliptic and equinox of date. Geocentric vector with light time (planet at t - tau, two
 * evaluations) and annual aberration to first order (+ v_Earth tau, v from the derivative of the
 * Earth's series); the Sun is the planet at the heliocentric origin. The VSOP87-to-FK5 correction of
 * J. Meeus, <i>Astronomical Algorithms</i>, 2nd ed. (1998), eq. 32.3 (dL = -0.09033",
 * dB = 0.03916"(cos L' - sin L')), applied as a small rotation; then ecliptic of date to mean equator
 * of date with the IAU 2006 mean obliquity, and to the true equator with the IAU 2000B nutation
 * matrix (SOFA iauPn06 with iauNut00b, through jsofa).</li>
 * <li>Moon: ELP/MPP02 (Chapront and Francou 2003) to the J2000 ecliptic (Laskar's P, Q), to the
 * J2000 mean equator (obliquity 84381.406"), then IAU 2006 precession and IAU 2000B nutation; light
 * time as a fixed 1.282 s (the Moon's annual aberration cancels against the Earth's, so none is
 * applied).</li>
 * <li>Stars: the catalogue place (BSC5, J2000) with space motion and annual parallax (SOFA iauPmpx),
 * light deflection by the Sun (iauLd), annual aberration (iauAb, the Earth's heliocentric velocity
 * from VSOP87 rotated to the GCRS) and the IAU 2006/2000B bias-precession-nutation matrix, written
 * out by hand for speed.</li>
 * <li>GHA = GAST - RA with GAST from SOFA iauGst06 (ERA of UT1 minus the equation of the origins from
 * the same bias-precession-nutation matrix); SHA = 360° - RA; HP = asin(6378.137 km / distance); SD:
 * Sun 959.63"/R, Moon asin(0.272493 sin HP), planets from their semi-diameters at 1 au (Meeus ch. 55).</li>
 * <li>Speed: what depends on TT only is interpolated with Chebyshev polynomials fitted to the chain
 * above at the nodes of fixed spans ({@link #STANDARD_SPANS}): the frame (the three rotation
 * matrices, the equation of the origins, the Earth's position and velocity; 8 days, degree 10), the
 * Moon's J2000 vector (8 days, degree 14) and each planet's heliocentric vector (64 days, degree
 * 14). A span is fitted on first use and cached ({@link SegmentCache}); light time, aberration, GHA
 * and the rest are computed per call as before. ERA is computed exactly from UT1.</li>
 * </ul>
 *
 * <p><b>Accuracy:</b> measured against in-process references by the tests of this package, and
 * against a JPL-based reference table where present; see {@code docs/ALMANAC.md}. Truncation of the
 * series (thresholds below) was measured against the full series over 1950-2050. The interpolation
 * adds under 1e-5" (measured, 1000 random instants of 1900-2100 against the direct chain:
 * Moon 7.4e-6", all others under 5e-7"; {@code AlmanacInterpolationTest} holds it to 1e-4").
 *
 * <p><b>Speed</b> (JMH, {@code bench/}, docs/PERFORMANCE.md): a position costs well under a
 * microsecond once its span is fitted; the first instant in a new span pays for the fit
 * (about 11 direct evaluations of the frame, 15 of the Moon or a planet: some 0.15 ms for the Sun
 * alone, 0.6 ms for every body).
 *
 * <p><b>Limits:</b> 1900-2100 (see {@link AstroTime}); geocentric places only (parallax in altitude
 * and the Moon's augmentation belong to the sight corrections).
 *
 * <p><b>Thread safety:</b> thread-safe; {@link #standard()} loads the data once. The only mutable state
 * is the span caches, lock-free, whose content never changes a result (spans are anchored at J2000).
 */
public final class Almanac {

    /**
     * Truncation thresholds of the series: Earth, Venus, Mars, Jupiter, Saturn (VSOP87D, the same
     * number for L and B in radians and for R in au), then the Moon (ELP/MPP02, L and B in arcsec
     * and R in km). Measured against the full series at 1000 instants of 1950-2050 (fixed seed;
     * {@code AlmanacTruncationTest}): max error of the apparent place 0.07" (Sun), 0.20" (Venus),
     * 0.21" (Mars), 0.26" (Jupiter), 0.32" (Saturn), 0.28" (Moon), all under 0.006'; the Moon's HP
     * within 0.003".
     */
    static final double[] STANDARD_THRESHOLDS = {2e-8, 2e-8, 2e-8, 1e-7, 1e-7, 0.01};

    /** Astronomical unit (km), IAU 2012 Resolution B2. */
    static final double AU_KM = 149597870.7;
    /** Light time for one au (days): 149597870.7 km / 299792.458 km/s. */
    static final double LIGHT_DAYS_PER_AU = AU_KM / 299792.458 / 86400.0;
    /** Earth's equatorial radius (km), WGS 84 / IERS 2010. */
    static final double EARTH_RADIUS_KM = 6378.137;
    /** Sun's semi-diameter at 1 au (arcsec), the Astronomical Almanac's value (959.63"). */
    static final double SUN_SD_1AU_ARCSEC = 959.63;
    /** Moon radius / Earth equatorial radius for the semi-diameter, the Astronomical Almanac's k. */
    static final double MOON_K = 0.272493;
    /** Mean light time of the Moon (s): 384400 km / c. */
    static final double MOON_LIGHT_TIME_S = 384400.0 / 299792.458;
    /** Mean obliquity of J2000 (arcsec), IAU 2006 (Hilton et al. 2006). */
    static final double EPS0_ARCSEC = 84381.406;

    private static final double ARCSEC = Math.PI / (180.0 * 3600.0);
    private static final double TWO_PI = 2.0 * Math.PI;

    private static volatile Almanac standard;

    private final Vsop87 earth;
    private final Vsop87[] planets = new Vsop87[4];
    private final ElpMpp02 moon;
    private final StarCatalogue catalogue;
    private final Map<String, Body> names = new LinkedHashMap<>();
    private final List<Body> navigationalBodies;
    /** Interpolants, or null where the series are evaluated directly. */
    private final SegmentCache frameCache;
    private final SegmentCache moonCache;
    private final SegmentCache[] planetCaches = new SegmentCache[4];

    /**
     * Chebyshev spans (days) and degrees of the interpolants: the per-instant frame (precession,
     * nutation, equation of the origins, Earth), the Moon (geocentric, J2000 ecliptic) and the four
     * planets (heliocentric, ecliptic of date).
     *
     * @param frameDays span of the frame interpolant (days)
     * @param frameDegree its degree
     * @param moonDays span of the Moon's interpolant (days)
     * @param moonDegree its degree
     * @param planetDays span of the planets' interpolants (days)
     * @param planetDegree their degree
     */
    record Spans(double frameDays, int frameDegree, double moonDays, int moonDegree, double planetDays,
            int planetDegree) {
    }

    /**
     * The spans and degrees used. Measured against the direct evaluation of the same series
     * ({@code AlmanacInterpolationTest}, random instants of 1900-2100, fixed seed): see the bound
     * written there and in {@code docs/METHOD-ALMANAC.md}.
     */
    static final Spans STANDARD_SPANS = new Spans(8.0, 10, 8.0, 14, 64.0, 14);

    private Almanac(double[] thresholds, Spans spans) {
        earth = new Vsop87("earth", thresholds[0], thresholds[0]);
        String[] p = {"venus", "mars", "jupiter", "saturn"};
        for (int i = 0; i < 4; i++) {
            planets[i] = new Vsop87(p[i], thresholds[i + 1], thresholds[i + 1]);
        }
        moon = new ElpMpp02(thresholds[5], thresholds[5]);
        catalogue = new StarCatalogue();
        for (Body b : List.of(Body.SUN, Body.MOON, Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN, Body.ARIES)) {
            names.put(key(b.name()), b);
        }
        for (StarCatalogue.Star s : catalogue.stars()) {
            names.putIfAbsent(key(s.body().name()), s.body());
            names.putIfAbsent(key("HR " + s.body().hrNumber()), s.body());
        }
        List<Body> nb = new ArrayList<>(List.of(Body.SUN, Body.MOON, Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN));
        nb.addAll(catalogue.navigational());
        navigationalBodies = Collections.unmodifiableList(nb);
        if (spans == null) {
            frameCache = null;
            moonCache = null;
        } else {
            frameCache = new SegmentCache(spans.frameDays(), spans.frameDegree(), FRAME_CHANNELS, this::frameAt);
            moonCache = new SegmentCache(spans.moonDays(), spans.moonDegree(), 3,
                    (d, xyz) -> moon.eclipticJ2000(d / 36525.0, xyz));
            for (int i = 0; i < 4; i++) {
                int index = i;
                planetCaches[i] = new SegmentCache(spans.planetDays(), spans.planetDegree(), 3,
                        (d, xyz) -> planetAt(index, d, xyz));
            }
        }
    }

    /**
     * The almanac with the standard (truncated) series; loads the data once.
     *
     * @return the shared almanac
     */
    public static Almanac standard() {
        Almanac a = standard;
        if (a == null) {
            synchronized (Almanac.class) {
                a = standard;
                if (a == null) {
                    a = new Almanac(STANDARD_THRESHOLDS, STANDARD_SPANS);
                    standard = a;
                }
            }
        }
        return a;
    }

    /**
     * An almanac with the full series as shipped, evaluated directly at each instant (for measuring
     * the truncation).
     *
     * @return a new almanac
     */
    static Almanac fullSeries() {
        return new Almanac(new double[6], null);
    }

    /**
     * An almanac with chosen truncation thresholds, evaluated directly (for measuring the truncation).
     *
     * @param thresholds as {@link #STANDARD_THRESHOLDS}
     * @return a new almanac
     */
    static Almanac truncated(double... thresholds) {
        return new Almanac(thresholds.clone(), null);
    }

    /**
     * The standard series evaluated directly at each instant, without interpolation: the reference
     * of the interpolation and the function it is fitted to.
     *
     * @return a new almanac
     */
    static Almanac direct() {
        return new Almanac(STANDARD_THRESHOLDS, null);
    }

    /**
     * The standard series interpolated with other spans (for measuring the interpolation).
     *
     * @param spans spans and degrees
     * @return a new almanac
     */
    static Almanac interpolated(Spans spans) {
        return new Almanac(STANDARD_THRESHOLDS, spans);
    }

    /** Terms kept per series, for the method note: earth, venus, mars, jupiter, saturn, moon. */
    int[] termCounts() {
        return new int[] {earth.terms(), planets[0].terms(), planets[1].terms(), planets[2].terms(),
            planets[3].terms(), moon.terms()};
    }

    /**
     * Sun, Moon, Venus, Mars, Jupiter, Saturn, then the 58 navigational stars (Polaris, 1..57).
     *
     * @return the bodies, unmodifiable
     */
    public List<Body> navigationalBodies() {
        return navigationalBodies;
    }

    /**
     * The 58 navigational stars ordered by number (Polaris, 0, first).
     *
     * @return the stars, unmodifiable
     */
    public List<Body> navigationalStars() {
        return catalogue.navigational();
    }

    /**
     * Catalogue stars brighter than a magnitude (the navigational stars are among them).
     *
     * @param brighterThanMag V limit (the catalogue here holds V &lt; 3.5 and the 58)
     * @return the stars, in catalogue (HR) order
     */
    public List<Body> catalogueStars(double brighterThanMag) {
        List<Body> out = new ArrayList<>();
        for (StarCatalogue.Star s : catalogue.stars()) {
            if (s.vMag() < brighterThanMag) {
                out.add(s.body());
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The catalogue visual magnitude of a star.
     *
     * @param star a star of this almanac
     * @return V
     */
    public double starMagnitude(Body star) {
        return star(star).vMag();
    }

    /**
     * A body by name, case-insensitive: "sun", "Sirius", "aries", "polaris", "HR 2491", "Alp1 Cen".
     *
     * @param name the name
     * @return the body
     * @throws UnknownBodyException if there is no such body; its message lists the nearest names
     */
    public Body body(String name) {
        if (name == null || name.isBlank()) {
            throw new UnknownBodyException(String.valueOf(name), nearest(""));
        }
        Body b = names.get(key(name));
        if (b == null) {
            String k = key(name);
            if (k.startsWith("hr") && k.length() > 2 && k.substring(2).chars().allMatch(Character::isDigit)) {
                b = names.get("hr" + Integer.parseInt(k.substring(2)));
            }
        }
        if (b == null) {
            throw new UnknownBodyException(name, nearest(name));
        }
        return b;
    }

    /**
     * The place of one body at one instant (computes the per-instant quantities each time; for many
     * bodies use {@link #at}).
     *
     * @param body the body
     * @param t the instant
     * @return the place
     */
    public BodyPosition position(Body body, AstroTime t) {
        return at(t).position(body);
    }

    /**
     * Precession-nutation, sidereal time and the Earth's position and velocity, computed once for
     * many bodies at one instant (interpolated: see the class comment).
     *
     * @param t the instant
     * @return the snapshot (immutable, thread-safe)
     */
    public Snapshot at(AstroTime t) {
        return new InstantState(t);
    }

    /** The almanac at one instant. */
    public interface Snapshot {
        /**
         * The instant.
         *
         * @return the instant
         */
        AstroTime time();

        /**
         * GHA of Aries, i.e. Greenwich apparent sidereal time.
         *
         * @return GHA Aries (degrees, [0°, 360°))
         */
        double ghaAriesDeg();

        /**
         * The place of a body.
         *
         * @param body the body
         * @return the place
         */
        BodyPosition position(Body body);
    }

    private StarCatalogue.Star star(Body body) {
        StarCatalogue.Star s = body.hrNumber() > 0 ? catalogue.byHr(body.hrNumber()) : null;
        if (s == null || !s.body().equals(body)) {
            throw new IllegalArgumentException("star " + body.name() + " is not in this almanac's catalogue");
        }
        return s;
    }

    private static String key(String name) {
        return name.toLowerCase(Locale.ROOT).replaceAll("[\\s'_.-]", "");
    }

    private List<String> nearest(String name) {
        String k = key(name);
        List<String> all = new ArrayList<>();
        for (Body b : names.values()) {
            if (!all.contains(b.name())) {
                all.add(b.name());
            }
        }
        all.sort(Comparator.comparingInt((String s) -> distance(k, key(s))).thenComparing(s -> s));
        return all.subList(0, Math.min(5, all.size()));
    }

    /** Levenshtein distance, with a bonus for a prefix match. */
    private static int distance(String a, String b) {
        if (!a.isEmpty() && b.startsWith(a)) {
            return 0;
        }
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] tmp = prev;
            prev = cur;
            cur = tmp;
        }
        return prev[b.length()];
    }

    /** To [0°, 360°) with floor: a double % is a library call (fmod), and a star needs three of these. */
    static double normalizeDeg(double deg) {
        double d = deg;
        if (d < 0.0 || d >= 360.0) {
            d -= 360.0 * Math.floor(d / 360.0);
        }
        return d >= 360.0 || d < 0.0 ? 0.0 : d;
    }

    /** Flat 3x3 matrix (row-major) times a vector, into out at offset 0. */
    private static void mul(double[] m, int o, double x, double y, double z, double[] out) {
        out[0] = m[o] * x + m[o + 1] * y + m[o + 2] * z;
        out[1] = m[o + 3] * x + m[o + 4] * y + m[o + 5] * z;
        out[2] = m[o + 6] * x + m[o + 7] * y + m[o + 8] * z;
    }

    private static double[][] mul(double[][] a, double[][] b) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                c[i][j] = a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j];
            }
        }
        return c;
    }

    private static double[] mul(double[][] m, double[] v) {
        return new double[] {
            m[0][0] * v[0] + m[0][1] * v[1] + m[0][2] * v[2],
            m[1][0] * v[0] + m[1][1] * v[1] + m[1][2] * v[2],
            m[2][0] * v[0] + m[2][1] * v[1] + m[2][2] * v[2]};
    }

    private static double[][] transpose(double[][] a) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                c[i][j] = a[j][i];
            }
        }
        return c;
    }

    private static void put(double[][] m, double[] out, int o) {
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                out[o + 3 * i + j] = m[i][j];
            }
        }
    }

    /** Ecliptic to equator: rotation about x by -eps (equatorial = R1(-eps) ecliptic). */
    private static double[][] eclipticToEquator(double eps) {
        double c = Math.cos(eps);
        double s = Math.sin(eps);
        return new double[][] {{1, 0, 0}, {0, c, -s}, {0, s, c}};
    }

    /** Writes RA [0, 2 pi), Dec and length of v into sph. */
    private static void sphericalOf(double[] v, double[] sph) {
        double rxy2 = v[0] * v[0] + v[1] * v[1];
        double ra = Math.atan2(v[1], v[0]);
        if (ra < 0) {
            ra += TWO_PI;
        }
        sph[0] = ra;
        sph[1] = Math.atan2(v[2], Math.sqrt(rxy2));
        sph[2] = Math.sqrt(rxy2 + v[2] * v[2]);
    }

    // Layout of the per-instant frame channels (frameAt): 3x3 matrices row-major, vectors x, y, z.
    /** GCRS to true equator of date (bias, precession, nutation). */
    private static final int F_RBPN = 0;
    /** Ecliptic of date (VSOP87) to true equator of date, FK5 correction included. */
    private static final int F_ECL_DATE = 9;
    /** Mean ecliptic and equinox J2000 to true equator of date. */
    private static final int F_ECL_J2000 = 18;
    /** Equation of the origins (rad): GAST = ERA - EO. */
    private static final int F_EO = 27;
    /** Earth heliocentric, ecliptic of date (au). */
    private static final int F_EARTH = 28;
    /** Earth heliocentric velocity, ecliptic of date (au/day). */
    private static final int F_EARTH_VEL = 31;
    /** Earth heliocentric in the GCRS (au). */
    private static final int F_EARTH_GCRS = 34;
    /** Earth heliocentric velocity in the GCRS (au/day). */
    private static final int F_EARTH_VEL_GCRS = 37;
    /** Number of frame channels. */
    static final int FRAME_CHANNELS = 40;

    /**
     * The per-instant quantities that depend on TT only, from the series and SOFA directly: the
     * function the frame interpolant is fitted to.
     *
     * @param d TT days from J2000.0
     * @param f receives {@link #FRAME_CHANNELS} values (layout F_*)
     */
    private void frameAt(double d, double[] f) {
        double tCenturies = d / 36525.0;
        JSOFA.NutationTerms nut = JSOFA.jauNut00b(AstroTime.JD_J2000, d);
        JSOFA.PrecessionNutation pn = JSOFA.jauPn06(AstroTime.JD_J2000, d, nut.dpsi, nut.deps);
        put(pn.rbpn, f, F_RBPN);
        double[][] toMeanEq = eclipticToEquator(pn.epsa);
        put(mul(mul(pn.rn, toMeanEq), fk5Correction(tCenturies)), f, F_ECL_DATE);
        put(mul(mul(pn.rn, pn.rp), eclipticToEquator(EPS0_ARCSEC * ARCSEC)), f, F_ECL_J2000);
        // iauGst06 is ERA - iauEors(rbpn, iauS06(x, y)); the second term depends on TT only.
        JSOFA.CelestialIntermediatePole xy = JSOFA.jauBpn2xy(pn.rbpn);
        f[F_EO] = JSOFA.jauEors(pn.rbpn, JSOFA.jauS06(AstroTime.JD_J2000, d, xy.x, xy.y));
        double[] e = new double[6];
        earth.lbrWithRates(d / 365250.0, e);
        double[] xyz = new double[3];
        double[] vel = new double[3];
        toCartesian(e, xyz, vel);
        System.arraycopy(xyz, 0, f, F_EARTH, 3);
        System.arraycopy(vel, 0, f, F_EARTH_VEL, 3);
        double[][] eclToGcrs = mul(transpose(pn.rbp), toMeanEq);
        System.arraycopy(mul(eclToGcrs, xyz), 0, f, F_EARTH_GCRS, 3);
        System.arraycopy(mul(eclToGcrs, vel), 0, f, F_EARTH_VEL_GCRS, 3);
    }

    /** A planet's heliocentric position, ecliptic of date (au), from the series. */
    private void planetAt(int index, double d, double[] p) {
        double[] lbr = new double[3];
        planets[index].lbr(d / 365250.0, lbr);
        double cb = Math.cos(lbr[1]);
        p[0] = lbr[2] * cb * Math.cos(lbr[0]);
        p[1] = lbr[2] * cb * Math.sin(lbr[0]);
        p[2] = lbr[2] * Math.sin(lbr[1]);
    }

    /** The per-instant state. */
    private final class InstantState implements Snapshot {
        private final AstroTime time;
        private final double days;
        private final double tCenturies;
        private final double gastRad;
        /** Frame channels (layout F_*). */
        private final double[] f = new double[FRAME_CHANNELS];
        private final double earthR;
        /** For stars: unit Sun-to-Earth (GCRS), Earth velocity in units of c. */
        private final double[] sunToEarth = new double[3];
        private final double[] vC = new double[3];
        private final double bm1;
        private final double dtYears;
        /** Apparent geocentric Sun (true equator, km). */
        private final double[] sunTrueKm = new double[3];

        InstantState(AstroTime t) {
            this.time = t;
            days = t.jdTt() - AstroTime.JD_J2000;
            tCenturies = days / 36525.0;
            dtYears = days / 365.25;
            if (frameCache != null) {
                frameCache.evaluate(days, f);
            } else {
                frameAt(days, f);
            }
            gastRad = JSOFA.jauAnp(JSOFA.jauEra00(AstroTime.JD_J2000, t.jdUt1() - AstroTime.JD_J2000) - f[F_EO]);
            double ex = f[F_EARTH];
            double ey = f[F_EARTH + 1];
            double ez = f[F_EARTH + 2];
            earthR = Math.sqrt(ex * ex + ey * ey + ez * ez);
            for (int j = 0; j < 3; j++) {
                sunToEarth[j] = f[F_EARTH_GCRS + j] / earthR;
                vC[j] = f[F_EARTH_VEL_GCRS + j] * LIGHT_DAYS_PER_AU; // au/day to units of c
            }
            bm1 = Math.sqrt(1.0 - (vC[0] * vC[0] + vC[1] * vC[1] + vC[2] * vC[2]));
            // The Sun: the heliocentric origin with light time and aberration (+ v tau).
            double tau = earthR * LIGHT_DAYS_PER_AU;
            mul(f, F_ECL_DATE, -ex + f[F_EARTH_VEL] * tau, -ey + f[F_EARTH_VEL + 1] * tau,
                    -ez + f[F_EARTH_VEL + 2] * tau, sunTrueKm);
            for (int j = 0; j < 3; j++) {
                sunTrueKm[j] *= AU_KM;
            }
        }

        @Override
        public AstroTime time() {
            return time;
        }

        @Override
        public double ghaAriesDeg() {
            return normalizeDeg(Math.toDegrees(gastRad));
        }

        @Override
        public BodyPosition position(Body body) {
            switch (body.kind()) {
                case ARIES:
                    return new BodyPosition(body, time, ghaAriesDeg(), 0.0, 0.0, OptionalDouble.empty(),
                            OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                            OptionalDouble.empty(), OptionalDouble.empty());
                case SUN:
                    return sun();
                case MOON:
                    return moon();
                case PLANET:
                    return planet(body);
                case STAR:
                    return star(body);
                default:
                    throw new IllegalArgumentException("no method for body kind " + body.kind());
            }
        }

        private BodyPosition sun() {
            double[] sph = new double[3];
            sphericalOf(sunTrueKm, sph);
            double distAu = sph[2] / AU_KM;
            return solarSystem(Body.SUN, sph, SUN_SD_1AU_ARCSEC / distAu / 60.0, Magnitudes.sun(distAu),
                    OptionalDouble.empty(), OptionalDouble.empty());
        }

        private BodyPosition moon() {
            double[] xyz = new double[3];
            double dm = days - MOON_LIGHT_TIME_S / 86400.0;
            if (moonCache != null) {
                moonCache.evaluate(dm, xyz);
            } else {
                moon.eclipticJ2000(dm / 36525.0, xyz);
            }
            double[] v = new double[3];
            mul(f, F_ECL_J2000, xyz[0], xyz[1], xyz[2], v);
            double[] sph = new double[3];
            sphericalOf(v, sph);
            double hp = Math.asin(EARTH_RADIUS_KM / sph[2]);
            double sd = Math.asin(MOON_K * Math.sin(hp));
            double[] s = sunTrueKm;
            double rs = Math.sqrt(s[0] * s[0] + s[1] * s[1] + s[2] * s[2]);
            double cosPsi = (s[0] * v[0] + s[1] * v[1] + s[2] * v[2]) / (rs * sph[2]);
            double psi = Math.acos(Math.max(-1.0, Math.min(1.0, cosPsi)));
            // Meeus (1998) eq. 48.3: phase angle from the elongation; 48.1: illuminated fraction.
            double i = Math.atan2(rs * Math.sin(psi), sph[2] - rs * Math.cos(psi));
            double k = (1.0 + Math.cos(i)) / 2.0;
            double mag = Magnitudes.moon(rs / AU_KM, sph[2], Math.toDegrees(i));
            return new BodyPosition(Body.MOON, time, gha(sph[0]), Math.toDegrees(sph[1]), Math.toDegrees(sph[0]),
                    OptionalDouble.empty(), OptionalDouble.of(sph[2]), OptionalDouble.of(Math.toDegrees(hp) * 60.0),
                    OptionalDouble.of(Math.toDegrees(sd) * 60.0), OptionalDouble.of(mag), OptionalDouble.of(k));
        }

        private void heliocentric(int index, double d, double[] p) {
            if (planetCaches[index] != null) {
                planetCaches[index].evaluate(d, p);
            } else {
                planetAt(index, d, p);
            }
        }

        private BodyPosition planet(Body body) {
            int index;
            double sd1au;
            // Semi-diameters at 1 au (arcsec), Meeus (1998) ch. 55 (equatorial for Jupiter, Saturn).
            if (body.equals(Body.VENUS)) {
                index = 0;
                sd1au = 8.34;
            } else if (body.equals(Body.MARS)) {
                index = 1;
                sd1au = 4.68;
            } else if (body.equals(Body.JUPITER)) {
                index = 2;
                sd1au = 98.44;
            } else if (body.equals(Body.SATURN)) {
                index = 3;
                sd1au = 82.73;
            } else {
                throw new IllegalArgumentException("no theory for planet " + body.name());
            }
            double[] p = new double[3];
            double[] rho = new double[3];
            double tau = 0;
            double r = 0;
            double delta = 0;
            for (int iter = 0; iter < 2; iter++) {
                heliocentric(index, days - tau, p);
                r = Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]);
                for (int j = 0; j < 3; j++) {
                    rho[j] = p[j] - f[F_EARTH + j];
                }
                delta = Math.sqrt(rho[0] * rho[0] + rho[1] * rho[1] + rho[2] * rho[2]);
                if (iter == 0) {
                    tau = delta * LIGHT_DAYS_PER_AU;
                }
            }
            // The geocentric distance and phase are those of the light-time corrected geometric place.
            double ringLat = index == 3 ? saturnRingLatitude(Math.atan2(rho[1], rho[0]),
                    Math.atan2(rho[2], Math.sqrt(rho[0] * rho[0] + rho[1] * rho[1]))) : 0.0;
            tau = delta * LIGHT_DAYS_PER_AU;
            double[] v = new double[3];
            mul(f, F_ECL_DATE, rho[0] + f[F_EARTH_VEL] * tau, rho[1] + f[F_EARTH_VEL + 1] * tau,
                    rho[2] + f[F_EARTH_VEL + 2] * tau, v);
            double[] sph = new double[3];
            sphericalOf(v, sph);
            sph[2] = delta * AU_KM;
            double cosI = (r * r + delta * delta - earthR * earthR) / (2.0 * r * delta);
            double phaseDeg = Math.toDegrees(Math.acos(Math.max(-1.0, Math.min(1.0, cosI))));
            double k = (1.0 + cosI) / 2.0;
            double mag;
            switch (index) {
                case 0:
                    mag = Magnitudes.venus(r, delta, phaseDeg);
                    break;
                case 1:
                    mag = Magnitudes.mars(r, delta, phaseDeg);
                    break;
                case 2:
                    mag = Magnitudes.jupiter(r, delta, phaseDeg);
                    break;
                default:
                    mag = Magnitudes.saturn(r, delta, phaseDeg, ringLat);
                    break;
            }
            return solarSystem(body, sph, sd1au / delta / 60.0, mag, OptionalDouble.of(Normal.sha(sph[0])),
                    OptionalDouble.of(k));
        }

        /** Meeus (1998) ch. 45: the Earth's latitude B referred to the plane of Saturn's rings. */
        private double saturnRingLatitude(double lon, double lat) {
            double t = tCenturies;
            double i = Math.toRadians(28.075216 - 0.012998 * t + 0.000004 * t * t);
            double om = Math.toRadians(169.508470 + 1.394681 * t + 0.000412 * t * t);
            return Math.asin(Math.sin(i) * Math.cos(lat) * Math.sin(lon - om) - Math.cos(i) * Math.sin(lat));
        }

        private BodyPosition solarSystem(Body body, double[] sph, double sdArcmin, double mag,
                OptionalDouble sha, OptionalDouble fraction) {
            double hp = Math.asin(EARTH_RADIUS_KM / sph[2]);
            return new BodyPosition(body, time, gha(sph[0]), Math.toDegrees(sph[1]), Math.toDegrees(sph[0]),
                    sha, OptionalDouble.of(sph[2]), OptionalDouble.of(Math.toDegrees(hp) * 60.0),
                    OptionalDouble.of(sdArcmin), OptionalDouble.of(mag), fraction);
        }

        private BodyPosition star(Body body) {
            StarCatalogue.Star s = Almanac.this.star(body);
            double[] raDec = new double[2];
            starPlace(s, raDec);
            return new BodyPosition(body, time, gha(raDec[0]), Math.toDegrees(raDec[1]), Normal.deg(raDec[0]),
                    OptionalDouble.of(Normal.sha(raDec[0])), OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty(), OptionalDouble.of(s.vMag()), OptionalDouble.empty());
        }

        /** Apparent RA and Dec of date (radians) of a catalogue star; no allocation. */
        void starPlace(StarCatalogue.Star s, double[] raDec) {
            double[] p0 = s.p0();
            double[] pm = s.pmPerYear();
            double pxr = s.parallaxArcsec() * ARCSEC;
            double ox = f[F_EARTH_GCRS];
            double oy = f[F_EARTH_GCRS + 1];
            double oz = f[F_EARTH_GCRS + 2];
            // iauPmpx: space motion to date (with the light time across the Earth's orbit) and parallax.
            double dt = dtYears + (p0[0] * ox + p0[1] * oy + p0[2] * oz) * LIGHT_DAYS_PER_AU / 365.25;
            double x = p0[0] + dt * pm[0] - pxr * ox;
            double y = p0[1] + dt * pm[1] - pxr * oy;
            double z = p0[2] + dt * pm[2] - pxr * oz;
            double n = 1.0 / Math.sqrt(x * x + y * y + z * z);
            x *= n;
            y *= n;
            z *= n;
            // iauLd with q = p (a star at infinity): deflection by the Sun, Schwarzschild radius 1.974e-8 au.
            double[] e = sunToEarth;
            double qdqpe = x * (x + e[0]) + y * (y + e[1]) + z * (z + e[2]);
            double w = 1.97412574336e-8 / earthR / Math.max(qdqpe, 1e-6);
            double eqx = e[1] * z - e[2] * y;
            double eqy = e[2] * x - e[0] * z;
            double eqz = e[0] * y - e[1] * x;
            double px = x + w * (y * eqz - z * eqy);
            double py = y + w * (z * eqx - x * eqz);
            double pz = z + w * (x * eqy - y * eqx);
            // iauAb: annual aberration.
            double pdv = px * vC[0] + py * vC[1] + pz * vC[2];
            double w1 = 1.0 + pdv / (1.0 + bm1);
            double w2 = 1.97412574336e-8 / earthR;
            double ax = px * bm1 + w1 * vC[0] + w2 * (vC[0] - pdv * px);
            double ay = py * bm1 + w1 * vC[1] + w2 * (vC[1] - pdv * py);
            double az = pz * bm1 + w1 * vC[2] + w2 * (vC[2] - pdv * pz);
            double[] m = f;
            double tx = m[F_RBPN] * ax + m[F_RBPN + 1] * ay + m[F_RBPN + 2] * az;
            double ty = m[F_RBPN + 3] * ax + m[F_RBPN + 4] * ay + m[F_RBPN + 5] * az;
            double tz = m[F_RBPN + 6] * ax + m[F_RBPN + 7] * ay + m[F_RBPN + 8] * az;
            double ra = Math.atan2(ty, tx);
            raDec[0] = ra < 0 ? ra + TWO_PI : ra;
            raDec[1] = Math.atan2(tz, Math.sqrt(tx * tx + ty * ty));
        }

        private double gha(double raRad) {
            return normalizeDeg(Math.toDegrees(gastRad - raRad));
        }
    }

    /** Normalised outputs. */
    private static final class Normal {
        static double deg(double rad) {
            return normalizeDeg(Math.toDegrees(rad));
        }

        static double sha(double raRad) {
            return normalizeDeg(360.0 - Math.toDegrees(raRad));
        }
    }

    /**
     * The VSOP87-to-FK5 correction of Meeus (1998) eq. 32.3 as a small rotation of ecliptic vectors,
     * with the precession-rate change from IAU 1976 to IAU 2006 added to dL:
     * dL = -0.09033" + 0.03916"(cos L' + sin L') tan B, dB = 0.03916"(cos L' - sin L'),
     * L' = L - 1.397° T - 0.00031° T^2.
     */
    private static double[][] fk5Correction(double tCenturies) {
        double c = 0.03916 * ARCSEC;
        double delta = Math.toRadians(1.397 * tCenturies + 0.00031 * tCenturies * tCenturies);
        double wx = c * (Math.sin(delta) - Math.cos(delta));
        double wy = -c * (Math.cos(delta) + Math.sin(delta));
        // Longitude: Meeus' constant, and the change of the precession rate in longitude from the IAU
        // 1976 value (5029.0966"/cy) that VSOP87's equinox of date follows to IAU 2006 (5028.796195"/cy,
        // Capitaine et al. 2003, A&A 412, 567, eq. 39): -0.300405" T. Measured: without it the Sun's
        // GHA drifts by -0.3"/cy against SOFA's IAU 2006 (AlmanacReferenceTest).
        double wz = (-0.09033 - 0.300405 * tCenturies) * ARCSEC;
        // r' = r + w x r
        return new double[][] {{1, -wz, wy}, {wz, 1, -wx}, {-wy, wx, 1}};
    }

    /** Spherical (L, B, R and rates) to Cartesian position and velocity per day. */
    private static void toCartesian(double[] e, double[] xyz, double[] vel) {
        double cl = Math.cos(e[0]);
        double sl = Math.sin(e[0]);
        double cb = Math.cos(e[1]);
        double sb = Math.sin(e[1]);
        double r = e[2];
        xyz[0] = r * cb * cl;
        xyz[1] = r * cb * sl;
        xyz[2] = r * sb;
        double dl = e[3] / 365250.0;
        double db = e[4] / 365250.0;
        double dr = e[5] / 365250.0;
        vel[0] = dr * cb * cl - r * sb * db * cl - r * cb * sl * dl;
        vel[1] = dr * cb * sl - r * sb * db * sl + r * cb * cl * dl;
        vel[2] = dr * sb + r * cb * db;
    }
}
