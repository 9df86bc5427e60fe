package org.sightwork.celestial.passage;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.track.NmeaChecksum;

/**
 * Writes the bundled demo passage's GPS log, DR log, stand-in observations and true track: an
 * invented training passage of the invented yacht <i>Petrel</i> from Horta, Faial, to Ponta Delgada,
 * São Miguel, 2026-06-20/21, with an invented GPS spoofing episode. Fixed seed; run
 * {@code main} with the target folder to rewrite the files; {@link DemoPassageTest} checks that the
 * committed files are what this writes.
 */
public final class DemoPassageGenerator {

    static final long SEED = 20260621L;
    static final Instant DEPARTURE = Instant.parse("2026-06-20T23:30:00Z");
    /**
     * The planned route (invented), kept off the land of the bundled chart (checked by
     * {@code DemoRouteAtSeaTest}): Horta, through the Faial-Pico channel, round the south-west and
     * south of Pico, across to south-west of Ponta Delgada, Ponta Delgada.
     */
    static final GeoPosition[] WAYPOINTS = {
        new GeoPosition(38.530, -28.620), new GeoPosition(38.450, -28.590), new GeoPosition(38.340, -28.400),
        new GeoPosition(38.310, -28.000), new GeoPosition(37.690, -25.800), new GeoPosition(37.725, -25.665)};
    static final String[] WAYPOINT_NAMES = {"Horta (off the breakwater)", "WP1 Faial-Pico channel",
        "WP2 south-west of Pico", "WP3 south of Pico", "WP4 south-west of Ponta Delgada",
        "Ponta Delgada (off the marina)"};
    /** Invented truth: current set 160° drift 0.5 kn, log reads 3 % high, compass 1.5° low. */
    static final double CURRENT_SET_DEG = 160;
    static final double CURRENT_DRIFT_KN = 0.5;
    static final double LOG_SCALE = 0.03;   // log speed = true speed through the water × (1 + this)
    static final double COMPASS_ERROR_DEG = -1.5; // compass heading = true heading + this
    static final double STW_KN = 6.2;
    /** The invented spoofing episode. */
    static final Instant STEP_ON = Instant.parse("2026-06-21T07:00:00Z");
    static final Instant STEP_OFF = Instant.parse("2026-06-21T12:00:00Z");
    static final double STEP_NM = 3.0;
    static final double STEP_TOWARD_DEG = 20;
    static final Instant DRIFT_ON = Instant.parse("2026-06-21T15:00:00Z");
    static final double DRIFT_KN = 0.5;
    static final double DRIFT_TOWARD_DEG = 340;
    /** Planned sight times (stand-in observations; the lead's sight log may use its own). */
    static final String[][] SIGHTS = {
        {"2026-06-21T05:20:00Z", "morning stars"}, {"2026-06-21T09:30:00Z", "Sun"},
        {"2026-06-21T13:50:00Z", "Sun at noon"}, {"2026-06-21T17:30:00Z", "Sun"},
        {"2026-06-21T21:50:00Z", "evening stars"}};
    static final double LOP_SIGMA_NM = 0.6;

    private DemoPassageGenerator() {
    }

    /** One leg as logged, with the time the vessel truly reached its waypoint. */
    record Leg(Instant start, int headingDeg, double logKn) {
    }

    /** The whole invented passage. */
    record Demo(List<Leg> legs, Instant arrival, List<Instant> times, List<GeoPosition> truth, List<double[]> velocity) {
    }

    /** Works out the logged legs (course to steer against the current) and the true track at 1-minute steps. */
    static Demo build() {
        double ce = CURRENT_DRIFT_KN * Math.sin(Math.toRadians(CURRENT_SET_DEG));
        double cn = CURRENT_DRIFT_KN * Math.cos(Math.toRadians(CURRENT_SET_DEG));
        List<Leg> legs = new ArrayList<>();
        List<Instant> times = new ArrayList<>();
        List<GeoPosition> truth = new ArrayList<>();
        List<double[]> vel = new ArrayList<>();
        GeoPosition p = WAYPOINTS[0];
        Instant t = DEPARTURE;
        Duration step = Duration.ofMinutes(1);
        for (int w = 1; w < WAYPOINTS.length; w++) {
            Sailings.RhumbLine toGo = Sailings.rhumbLine(p, WAYPOINTS[w]);
            double c = Math.toRadians(toGo.courseDeg());
            // course to steer: water velocity = ground velocity − current, |water| = STW (Bowditch ch. 7, current triangle)
            double cross = -ce * Math.cos(c) + cn * Math.sin(c);
            double along = ce * Math.sin(c) + cn * Math.cos(c);
            double sog = along + Math.sqrt(STW_KN * STW_KN - cross * cross);
            double we = sog * Math.sin(c) - ce;
            double wn = sog * Math.cos(c) - cn;
            double trueHeading = (Math.toDegrees(Math.atan2(we, wn)) + 360) % 360;
            int logged = (int) Math.round((trueHeading + COMPASS_ERROR_DEG + 360) % 360) % 360;
            double loggedKn = Math.round(STW_KN * (1 + LOG_SCALE) * 10) / 10.0;
            legs.add(new Leg(t, logged, loggedKn));
            // run the truth on the logged leg: true heading = logged − compass error, true STW = log / (1 + scale)
            double h = Math.toRadians(logged - COMPASS_ERROR_DEG);
            double s = loggedKn / (1 + LOG_SCALE);
            double ve = s * Math.sin(h) + ce;
            double vn = s * Math.cos(h) + cn;
            double course = (Math.toDegrees(Math.atan2(ve, vn)) + 360) % 360;
            double speed = Math.hypot(ve, vn);
            double remaining = Sailings.rhumbLine(p, WAYPOINTS[w]).distanceNm();
            while (remaining > speed / 60 / 2) {
                times.add(t);
                truth.add(p);
                vel.add(new double[] {course, speed});
                p = Sailings.rhumbDestination(p, course, speed / 60);
                t = t.plus(step);
                double before = remaining;
                remaining = Sailings.rhumbLine(p, WAYPOINTS[w]).distanceNm();
                if (remaining > before) {
                    break; // abeam the waypoint: alter
                }
            }
        }
        times.add(t);
        truth.add(p);
        vel.add(new double[] {0, 0});
        return new Demo(legs, t, times, truth, vel);
    }

    /** GPS position reported at a time: the truth plus the spoofing offset plus noise. */
    static GeoPosition reported(GeoPosition truth, Instant t, Random rnd) {
        GeoPosition p = truth;
        if (!t.isBefore(STEP_ON) && t.isBefore(STEP_OFF)) {
            p = Sailings.rhumbDestination(p, STEP_TOWARD_DEG, STEP_NM);
        }
        if (!t.isBefore(DRIFT_ON)) {
            double nm = DRIFT_KN * Duration.between(DRIFT_ON, t).toMillis() / 3.6e6;
            if (nm > 0) {
                p = Sailings.rhumbDestination(p, DRIFT_TOWARD_DEG, nm);
            }
        }
        double noiseNm = 5.0 / 1852; // 5 m
        return Sailings.rhumbDestination(p, rnd.nextDouble() * 360, Math.abs(rnd.nextGaussian()) * noiseNm);
    }

    /**
     * Writes demo-gps.nmea, demo-dr.csv, demo-observations.csv and demo-true-track.csv.
     *
     * @param dir the target folder
     * @throws IOException if a file cannot be written
     */
    static void write(Path dir) throws IOException {
        Demo d = build();
        Random rnd = new Random(SEED);
        StringBuilder nmea = new StringBuilder();
        DateTimeFormatter hms = DateTimeFormatter.ofPattern("HHmmss'.00'").withZone(ZoneOffset.UTC);
        DateTimeFormatter dmy = DateTimeFormatter.ofPattern("ddMMyy").withZone(ZoneOffset.UTC);
        for (int i = 0; i < d.times().size(); i++) {
            Instant t = d.times().get(i);
            GeoPosition g = reported(d.truth().get(i), t, rnd);
            String lat = nmeaLat(g.latDeg());
            String lon = nmeaLon(g.lonDeg());
            double[] v = d.velocity().get(i);
            nmea.append(NmeaChecksum.append(String.format(Locale.ROOT, "$GPGGA,%s,%s,%s,1,09,0.8,3.0,M,52.0,M,,",
                    hms.format(t), lat, lon))).append("\r\n");
            nmea.append(NmeaChecksum.append(String.format(Locale.ROOT, "$GPRMC,%s,A,%s,%s,%.1f,%.1f,%s,,,A",
                    hms.format(t), lat, lon, v[1], v[0], dmy.format(t)))).append("\r\n");
            Leg leg = legAt(d.legs(), t);
            double hdg = leg.headingDeg() + rnd.nextGaussian() * 0.5;
            hdg = (hdg + 360) % 360;
            nmea.append(NmeaChecksum.append(String.format(Locale.ROOT, "$HEHDT,%.1f,T", hdg))).append("\r\n");
            nmea.append(NmeaChecksum.append(String.format(Locale.ROOT, "$VWVHW,%.1f,T,,M,%.1f,N,%.1f,K", hdg,
                    leg.logKn(), leg.logKn() * 1.852))).append("\r\n");
        }
        Files.writeString(dir.resolve("demo-gps.nmea"), nmea.toString(), StandardCharsets.US_ASCII);

        StringBuilder dr = new StringBuilder("# Invented demo passage of the invented yacht Petrel: see README.md here.\n");
        dr.append("time_utc,heading_deg,stw_kn,leeway_deg,lat,lon,note\n");
        for (int i = 0; i < d.legs().size(); i++) {
            Leg l = d.legs().get(i);
            dr.append(String.format(Locale.ROOT, "%s,%03d,%.1f,0,%s,%s,%s%n", l.start(), l.headingDeg(), l.logKn(),
                    i == 0 ? WAYPOINTS[0].latDeg() : "", i == 0 ? WAYPOINTS[0].lonDeg() : "",
                    i == 0 ? "departure Horta" : "alter course for " + WAYPOINT_NAMES[i + 1]));
        }
        dr.append(d.arrival()).append(",,,,,,arrival off Ponta Delgada\n");
        Files.writeString(dir.resolve("demo-dr.csv"), dr.toString(), StandardCharsets.UTF_8);

        StringBuilder obs = new StringBuilder("# Stand-in observations for the invented demo passage (README.md):\n"
                + "# lines of position made from the true track with " + LOP_SIGMA_NM + " nm noise, NOT reduced from sights.\n");
        obs.append(ObservationCsv.HEADER).append('\n');
        for (String[] s : SIGHTS) {
            Instant t0 = Instant.parse(s[0]);
            boolean stars = s[1].contains("stars");
            int n = stars ? 4 : 1;
            double z0 = stars ? 20 + rnd.nextDouble() * 40 : Double.NaN;
            for (int k = 0; k < n; k++) {
                Instant t = t0.plus(Duration.ofMinutes(5L * k));
                double z = stars ? (z0 + k * 90 + rnd.nextGaussian() * 8 + 360) % 360
                        : s[1].contains("noon") ? 180.0 : t.atZone(ZoneOffset.UTC).getHour() < 13 ? 95.0 : 265.0;
                GeoPosition truth = truthAt(d, t);
                GeoPosition ap = new GeoPosition(Math.round(truth.latDeg() * 6) / 6.0, Math.round(truth.lonDeg() * 6) / 6.0);
                LocalFrame f = new LocalFrame(ap);
                double[] tp = f.toLocal(truth);
                double zr = Math.toRadians(z);
                double intercept = Math.sin(zr) * tp[0] + Math.cos(zr) * tp[1] + rnd.nextGaussian() * LOP_SIGMA_NM;
                obs.append(String.format(Locale.ROOT, "%s,lop,%.4f,%.4f,%.1f,%.2f,%.1f,,,,%s%n", t, ap.latDeg(),
                        ap.lonDeg(), z, intercept, LOP_SIGMA_NM, stars ? "star " + (k + 1) : s[1]));
            }
        }
        Files.writeString(dir.resolve("demo-observations.csv"), obs.toString(), StandardCharsets.UTF_8);

        StringBuilder tt = new StringBuilder("# True track of the invented demo passage, every 10 minutes (README.md)\n"
                + "time_utc,lat_deg,lon_deg\n");
        for (int i = 0; i < d.times().size(); i += 10) {
            tt.append(String.format(Locale.ROOT, "%s,%.5f,%.5f%n", d.times().get(i), d.truth().get(i).latDeg(),
                    d.truth().get(i).lonDeg()));
        }
        Files.writeString(dir.resolve("demo-true-track.csv"), tt.toString(), StandardCharsets.UTF_8);
    }

    static GeoPosition truthAt(Demo d, Instant t) {
        int i = (int) Duration.between(d.times().get(0), t).toMinutes();
        return d.truth().get(Math.min(i, d.truth().size() - 1));
    }

    private static Leg legAt(List<Leg> legs, Instant t) {
        Leg found = legs.get(0);
        for (Leg l : legs) {
            if (!l.start().isAfter(t)) {
                found = l;
            }
        }
        return found;
    }

    private static String nmeaLat(double lat) {
        double a = Math.abs(lat);
        int deg = (int) a;
        return String.format(Locale.ROOT, "%02d%07.4f,%s", deg, (a - deg) * 60, lat < 0 ? "S" : "N");
    }

    private static String nmeaLon(double lon) {
        double a = Math.abs(lon);
        int deg = (int) a;
        return String.format(Locale.ROOT, "%03d%07.4f,%s", deg, (a - deg) * 60, lon < 0 ? "W" : "E");
    }

    /**
     * Rewrites the demo files.
     *
     * @param args the target folder (default: the plugin's demo resources)
     * @throws IOException if a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "plugin/src/main/resources/org/sightwork/celestial/demo");
        Files.createDirectories(dir);
        write(dir);
        Demo d = build();
        System.out.println("legs: " + d.legs());
        System.out.println("arrival: " + d.arrival());
    }
}
