package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Star identification: which body was it, from its observed altitude, rough azimuth, the time and
 * the DR.
 *
 * <p><b>Method:</b> the navigational triangle solved from the horizon side
 * ({@link Horizon#toEquatorial}) gives the declination and hour angle of the observed point;
 * its GHA less GHA Aries gives its SHA. Every candidate (the four navigational planets and every
 * catalogue star brighter than magnitude {@value #CATALOGUE_MAG_LIMIT}, which includes the 58
 * navigational stars) is placed at the same instant and the candidates are ranked by their angular
 * distance from the observed point on the celestial sphere (the great-circle distance between the
 * two (Dec, GHA) points). The nearest is the answer and the runner-up shows how sure it is.
 *
 * <p><b>Accuracy:</b> as good as the observation: a rough azimuth of ±3° moves the point by about
 * {@code 3° cos H}. The altitude should be corrected for dip and refraction (approximately is
 * enough; see {@link SextantApprox#approxObservedDeg}).
 *
 * <p><b>Limits:</b> the Sun and the Moon are not candidates (no one needs to identify them).
 *
 * <p><b>Thread safety:</b> immutable; safe to share if the almanac is.
 */
public final class StarIdentifier {

    /** Catalogue stars brighter than this magnitude are candidates (brightest a sextant will take). */
    public static final double CATALOGUE_MAG_LIMIT = 3.5;

    /**
     * A best match further than this from the observed point is reported as doubtful (degrees):
     * a hand-bearing compass read to 2°-3° and a rough altitude put the point within about 3° of
     * the star (common practice).
     */
    public static final double CONVINCING_MISS_DEG = 5.0;

    /** Catalogue entries closer than this to a brighter one are one star to the eye (degrees). */
    static final double SAME_STAR_DEG = 0.05;

    private final Almanac almanac;
    private final List<Body> candidates;

    /**
     * An identifier on an almanac.
     *
     * @param almanac the almanac
     */
    public StarIdentifier(Almanac almanac) {
        this.almanac = Objects.requireNonNull(almanac, "almanac");
        Map<String, Body> byName = new LinkedHashMap<>();
        for (Body b : List.of(Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN)) {
            byName.put(b.name(), b);
        }
        // Stars: the 58 first, then the catalogue brightest first; a catalogue entry within
        // SAME_STAR_DEG of a star already kept is the other component of a double (e.g. α¹ and α²
        // Crucis, 4″ apart) and is one point of light in the sextant: it is left out.
        Almanac.Snapshot epoch = almanac.at(AstroTime.ofUtc(java.time.Instant.parse("2000-01-01T12:00:00Z")));
        List<BodyPosition> kept = new ArrayList<>();
        List<Body> stars = new ArrayList<>(almanac.navigationalStars());
        almanac.catalogueStars(CATALOGUE_MAG_LIMIT).stream()
                .sorted(Comparator.comparingDouble(almanac::starMagnitude)).forEach(stars::add);
        for (Body b : stars) {
            if (byName.containsKey(b.name())) {
                continue;
            }
            BodyPosition p = epoch.position(b);
            boolean twin = kept.stream().anyMatch(
                    k -> Horizon.separationDeg(k.decDeg(), -k.ghaDeg(), p.decDeg(), -p.ghaDeg()) < SAME_STAR_DEG);
            if (!twin) {
                byName.put(b.name(), b);
                kept.add(p);
            }
        }
        this.candidates = List.copyOf(byName.values());
    }

    /** @return the bodies considered, planets first */
    public List<Body> candidates() {
        return candidates;
    }

    /**
     * Identifies a body.
     *
     * @param t time of the observation
     * @param dr the DR
     * @param observedAltDeg observed altitude above the celestial horizon (degrees, (0°, 90°])
     * @param azimuthDeg rough azimuth true (degrees, [0°, 360°))
     * @return the identification
     */
    public Identification identify(Instant t, GeoPosition dr, double observedAltDeg, double azimuthDeg) {
        if (!(observedAltDeg > -1.0 && observedAltDeg <= 90.0)) {
            throw new IllegalArgumentException("observed altitude " + observedAltDeg + "° is outside (-1°, 90°]");
        }
        if (!(azimuthDeg >= 0.0 && azimuthDeg <= 360.0)) {
            throw new IllegalArgumentException("azimuth " + azimuthDeg + "° is outside [0°, 360°]");
        }
        HorizonPoint seen = new HorizonPoint(observedAltDeg, Horizon.norm360(azimuthDeg));
        double[] eq = Horizon.toEquatorial(seen, dr);
        double gha = eq[0];
        double dec = eq[1];
        Almanac.Snapshot snap = almanac.at(AstroTime.ofUtc(t));
        double sha = Horizon.norm360(gha - snap.ghaAriesDeg());
        List<Identification.Match> matches = new ArrayList<>();
        for (Body b : candidates) {
            BodyPosition p = snap.position(b);
            // The two points as (latitude-like Dec, longitude-like −GHA): the separation formula
            // only needs the difference of the second angle.
            double miss = Horizon.separationDeg(dec, -gha, p.decDeg(), -p.ghaDeg());
            HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
            matches.add(new Identification.Match(b, miss, h.altitudeDeg(), h.azimuthDeg(),
                    p.magnitude().orElse(Double.NaN)));
        }
        matches.sort(Comparator.comparingDouble(Identification.Match::missDeg));
        return new Identification(t, dr, observedAltDeg, seen.azimuthDeg(), dec, gha, sha, matches.get(0),
                matches.size() > 1 ? Optional.of(matches.get(1)) : Optional.empty());
    }
}
