package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the topocentric altitude and azimuth (the almanac's place, then
 * {@link Horizon#topocentric}) against swetest 2.10.03 on JPL DE431 files:
 * {@code topocentric-swetest.tsv}, written by {@code reference/topocentric_swetest.py} (500
 * random observers and instants 2000-2040, the Sun, Moon, four planets and ten stars). The table's
 * own UT1 and TT are fed in, so the time scales match; only bodies above the horizon are compared
 * (the ones planning uses).
 */
class TopocentricSwetestTest {

    /**
     * 0.1′ (6″): the almanac's claim for its places, and the precision the navigator reads Hc to;
     * the geometry itself is exact (HorizonTest).
     */
    private static final double TENTH_ARCMIN_DEG = 0.1 / 60.0;

    private static final Map<String, String> STARS = Map.of(
            "STAR18", "Sirius", "STAR17", "Canopus", "STAR37", "Arcturus", "STAR49", "Vega", "STAR12", "Capella",
            "STAR38", "Rigil Kentaurus", "STAR0", "Polaris", "STAR5", "Achernar", "STAR42", "Antares",
            "STAR56", "Fomalhaut");

    @Test
    void altitudeAndAzimuthAgreeWithSwetest() {
        Almanac almanac = Almanac.standard();
        Map<String, double[]> worst = new LinkedHashMap<>();
        int n = 0;
        for (Map<String, String> row : ReferenceTables.read("/reference/topocentric-swetest.tsv")) {
            double altRef = Double.parseDouble(row.get("alt_deg"));
            if (altRef <= 0.0) {
                continue;
            }
            String code = row.get("body");
            Body body = code.startsWith("STAR") ? almanac.body(STARS.get(code))
                    : almanac.body(code.toLowerCase(Locale.ROOT));
            AstroTime t = new AstroTime(Instant.parse(row.get("utc")), 0.0,
                    Double.parseDouble(row.get("jd_ut1")), Double.parseDouble(row.get("jd_tt")));
            GeoPosition at = new GeoPosition(Double.parseDouble(row.get("lat_deg")), Double.parseDouble(row.get("lon_deg")));
            HorizonPoint h = Horizon.topocentric(almanac.position(body, t), at, Double.parseDouble(row.get("height_m")));
            double dAlt = h.altitudeDeg() - altRef;
            double dZn = Horizon.norm180(h.azimuthDeg() - Double.parseDouble(row.get("zn_deg")))
                    * Math.cos(Math.toRadians(altRef));
            assertEquals(0.0, dAlt, TENTH_ARCMIN_DEG, "altitude of " + code + ", case " + row.get("case"));
            assertEquals(0.0, dZn, TENTH_ARCMIN_DEG, "azimuth × cos alt of " + code + ", case " + row.get("case"));
            String k = code.startsWith("STAR") ? "stars" : code;
            double[] w = worst.computeIfAbsent(k, x -> new double[3]);
            w[0] = Math.max(w[0], Math.abs(dAlt) * 3600);
            w[1] = Math.max(w[1], Math.abs(dZn) * 3600);
            w[2]++;
            n++;
        }
        worst.forEach((k, w) -> System.out.printf(Locale.ROOT,
                "swetest topocentric %-8s n=%4.0f  max |dAlt| %5.2f\"  max |dZn cos h| %5.2f\"%n", k, w[2], w[0], w[1]));
        assertTrue(n > 3000, "compared " + n + " rows above the horizon");
    }
}
