package org.sightwork.celestial.almanac;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.time.AstroTime;

/**
 * Validation against a JPL-based reference: apparent geocentric places printed by swetest (Swiss
 * Ephemeris 2.10.03 with its DE431-based files), 2000 random instants of 1950-2050 for the Sun, Moon
 * and planets and 35 per navigational star, made by {@code reference/*.py} (see the table headers).
 *
 * <p>GHA: the table gives RA and Dec at a TT instant and swetest's own UT1 (jd_ut); we build the
 * instant from both and compare GHA = GAST - RA with the reference GAST of SOFA iauGst06a, so
 * dGHA = GAST error - RA error. Goals (issue 2): Sun, planets, Aries, stars |dGHA cos Dec| and |dDec|
 * &lt;= 0.05', Moon &lt;= 0.1', HP and SD &lt;= 0.05'. The stars' reference uses swetest's own
 * catalogue (Hipparcos via SIMBAD), ours the Bright Star Catalogue: their J2000 places differ by up
 * to 0.042' (Rigil Kentaurus, the pair's combined entry), which is inside the comparison.
 *
 * <p>Writes the per-body RMS and maximum to {@code target/almanac-accuracy.md}.
 */
class AlmanacVsSwetestTest {

    private static final Almanac A = Almanac.standard();

    /** Accumulates errors of one body. */
    private static final class Stat {
        final List<double[]> rows = new ArrayList<>(); // dGHA cos dec, dDec, dHP, dSD, dMag (arcmin; mag)

        double rms(int k) {
            double s = 0;
            int n = 0;
            for (double[] r : rows) {
                if (!Double.isNaN(r[k])) {
                    s += r[k] * r[k];
                    n++;
                }
            }
            return n == 0 ? Double.NaN : Math.sqrt(s / n);
        }

        double max(int k) {
            double m = Double.NaN;
            for (double[] r : rows) {
                if (!Double.isNaN(r[k]) && !(Math.abs(r[k]) <= m)) {
                    m = Math.abs(r[k]);
                }
            }
            return m;
        }
    }

    private static List<String[]> table(String name) throws IOException {
        List<String[]> rows = new ArrayList<>();
        try (InputStream in = AlmanacVsSwetestTest.class.getResourceAsStream("/reference/" + name)) {
            assertTrue(in != null, "reference table " + name + " is on the test class path");
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            boolean header = true;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                rows.add(line.split("\t", -1));
            }
        }
        return rows;
    }

    private static AstroTime instant(double jdTt, double jdUt1) {
        long ms = Math.round((jdUt1 - AstroTime.JD_UNIX_EPOCH) * 86400000.0);
        return new AstroTime(Instant.ofEpochMilli(ms), 0.0, jdUt1, jdTt);
    }

    private static double ghaRefDeg(AstroTime t, double raDeg) {
        double gst = JSOFA.jauGst06a(AstroTime.JD_J2000, t.jdUt1() - AstroTime.JD_J2000, AstroTime.JD_J2000,
                t.jdTt() - AstroTime.JD_J2000);
        return Almanac.normalizeDeg(Math.toDegrees(gst) - raDeg);
    }

    private static double wrap(double dDeg) {
        return dDeg - 360.0 * Math.rint(dDeg / 360.0);
    }

    private static double parse(String s) {
        return s == null || s.isBlank() ? Double.NaN : Double.parseDouble(s);
    }

    @Test
    void almanacMeetsItsAccuracyGoalsAgainstSwetest() throws IOException {
        Map<String, Stat> stats = new LinkedHashMap<>();
        for (String b : List.of("Sun", "Moon", "Venus", "Mars", "Jupiter", "Saturn", "Aries", "Stars (57)",
                "Rigil Kentaurus")) {
            stats.put(b, new Stat());
        }
        for (String[] f : table("almanac-swetest.tsv")) {
            double jdTt = Double.parseDouble(f[1]);
            double jdUt = Double.parseDouble(f[2]);
            AstroTime t = instant(jdTt, jdUt);
            Body body = A.body(f[0]);
            BodyPosition p = A.position(body, t);
            double ra = Double.parseDouble(f[4]);
            double dec = Double.parseDouble(f[5]);
            double distTrueKm = Double.parseDouble(f[7]) * Almanac.AU_KM;
            double sdRef = parse(f[8]) / 2.0 / 60.0;
            double hpRef = Math.toDegrees(Math.asin(Almanac.EARTH_RADIUS_KM / distTrueKm)) * 60.0;
            double dGha = wrap(p.ghaDeg() - ghaRefDeg(t, ra)) * 60.0 * Math.cos(Math.toRadians(dec));
            double dDec = (p.decDeg() - dec) * 60.0;
            double dHp = p.hpArcmin().getAsDouble() - hpRef;
            double dSd = p.sdArcmin().getAsDouble() - sdRef;
            double dMag = p.magnitude().getAsDouble() - parse(f[9]);
            if (body.equals(Body.MOON) && p.illuminatedFraction().getAsDouble() < 0.1) {
                dMag = Double.NaN; // the lunar formula holds for phase angles up to about 145°
            }
            stats.get(body.name()).rows.add(new double[] {dGha, dDec, dHp, dSd, dMag});
            if (body.equals(Body.SUN)) {
                double gast = Math.toDegrees(JSOFA.jauGst06a(AstroTime.JD_J2000, jdUt - AstroTime.JD_J2000,
                        AstroTime.JD_J2000, jdTt - AstroTime.JD_J2000));
                double dAries = wrap(A.at(t).ghaAriesDeg() - gast) * 60.0;
                stats.get("Aries").rows.add(new double[] {dAries, 0.0, Double.NaN, Double.NaN, Double.NaN});
            }
        }
        for (String[] f : table("stars-swetest.tsv")) {
            double jdTt = Double.parseDouble(f[4]);
            // The star table has no UT1 column: use TT - 69.184 s; GHA then compares RA only,
            // since both sides use the same UT1.
            AstroTime t = instant(jdTt, jdTt - 69.184 / 86400.0);
            Body body = A.body("HR " + f[3]);
            BodyPosition p = A.position(body, t);
            double ra = Double.parseDouble(f[5]);
            double dec = Double.parseDouble(f[6]);
            double dGha = wrap(p.ghaDeg() - ghaRefDeg(t, ra)) * 60.0 * Math.cos(Math.toRadians(dec));
            stats.get(body.name().equals("Rigil Kentaurus") ? "Rigil Kentaurus" : "Stars (57)").rows.add(new double[] {dGha, (p.decDeg() - dec) * 60.0, Double.NaN, Double.NaN,
                p.magnitude().getAsDouble() - parse(f[7])});
        }
        StringBuilder md = new StringBuilder();
        md.append("| body | n | dGHA cos Dec RMS | max | dDec RMS | max | dHP max | dSD max | dMag max |\n");
        md.append("|---|---|---|---|---|---|---|---|---|\n");
        for (Map.Entry<String, Stat> e : stats.entrySet()) {
            Stat s = e.getValue();
            md.append(String.format(Locale.ROOT, "| %s | %d | %.4f' | %.4f' | %.4f' | %.4f' | %s | %s | %s |%n", e.getKey(),
                    s.rows.size(), s.rms(0), s.max(0), s.rms(1), s.max(1), fmt(s.max(2), "'"), fmt(s.max(3), "'"),
                    fmt(s.max(4), "")));
        }
        Path out = Path.of("target", "almanac-accuracy.md");
        Files.createDirectories(out.getParent());
        Files.writeString(out, md.toString(), StandardCharsets.UTF_8);
        System.out.print(md);
        for (Map.Entry<String, Stat> e : stats.entrySet()) {
            Stat s = e.getValue();
            // Rigil Kentaurus: the reference's entry is the A-B pair (its file's combined entry), ours the
            // A component of BSC5: 0.042' apart at J2000 already (table header); allow 0.1'.
            double goal = e.getKey().equals("Moon") || e.getKey().equals("Rigil Kentaurus") ? 0.1 : 0.05;
            assertTrue(s.rows.size() >= 35, e.getKey() + " rows " + s.rows.size());
            assertTrue(s.max(0) <= goal, e.getKey() + " max |dGHA cos Dec| " + s.max(0) + "' over " + goal + "'");
            assertTrue(s.max(1) <= goal, e.getKey() + " max |dDec| " + s.max(1) + "' over " + goal + "'");
            if (!Double.isNaN(s.max(2))) {
                assertTrue(s.max(2) <= 0.05, e.getKey() + " max |dHP| " + s.max(2) + "'");
                assertTrue(s.max(3) <= 0.05, e.getKey() + " max |dSD| " + s.max(3) + "'");
            }
        }
    }

    private static String fmt(double v, String unit) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.4f%s", v, unit);
    }
}
