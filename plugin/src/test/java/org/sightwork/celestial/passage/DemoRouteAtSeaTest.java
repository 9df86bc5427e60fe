package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.util.AffineTransformation;
import org.sightwork.celestial.drill.Scenario;
import org.sightwork.celestial.drill.ScenarioReader;
import org.sightwork.celestial.drill.TrueTrack;
import org.sightwork.geo.chart.ChartData;
import org.sightwork.geo.chart.ChartLayer;
import org.sightwork.geo.chart.Feature;
import org.sightwork.geo.chart.GeoPackageSource;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * The demo passage and the demo drill keep to the sea: validated against the bundled chart's land,
 * {@code test-charts/demo-region.gpkg} layer {@code land}, which is GSHHG 2.3.7 full-resolution
 * shoreline data (Wessel and Smith, the Global Self-consistent, Hierarchical, High-resolution
 * Geography Database; see {@code test-charts/README.md}), read with the shell's own GeoPackage
 * reader. Every point of the demo's true track (10-minute samples), of its planned legs and of the
 * drill scenario's route must be at sea, and at least {@link #CLEARANCE_NM} from land except within
 * {@link #HARBOUR_NM} of the departure (Horta) and the arrival (Ponta Delgada), where the route
 * leaves and enters harbour.
 */
class DemoRouteAtSeaTest {

    /** Least offing on passage: a sea room a small-craft skipper keeps off a steep island shore (common practice). */
    static final double CLEARANCE_NM = 0.4;
    /** The harbour approaches, where the route is by design close to the shore. */
    static final double HARBOUR_NM = 1.5;
    /** Spacing of the points checked along a leg: well under the clearance. */
    static final double STEP_NM = 0.1;

    private static final Path CHART = Path.of("../test-charts/demo-region.gpkg");
    private static final Path DEMO = Path.of("src/main/resources/org/sightwork/celestial/demo");
    private static final GeometryFactory GF = new GeometryFactory();
    private static final List<Geometry> LAND = new ArrayList<>();
    private static final List<String> NAMES = new ArrayList<>();

    @BeforeAll
    static void readLand() {
        ChartData data = GeoPackageSource.read(CHART, f -> { });
        assertTrue(data.problems().isEmpty(), "the bundled chart reads: " + data.problems());
        ChartLayer land = data.layers().stream().filter(l -> l.name().equals("land")).findFirst().orElseThrow();
        for (Feature f : land.features()) {
            LAND.add(f.geometry());
            NAMES.add(String.valueOf(f.attributes().get("name")));
        }
        assertEquals(29, LAND.size(), "land polygons of the demo region (test-charts/README.md)");
    }

    /**
     * Distance from a point to the nearest land, nautical miles, and whether it is on land. Method:
     * the land is mapped into a local plane about the point (x = Δλ·cos φ · 60, y = Δφ · 60 nm, one
     * minute of latitude a nautical mile: plane sailing, Bowditch, <i>The American Practical
     * Navigator</i>, Pub. No. 9, chapter on dead reckoning, from memory) and JTS measures the
     * distance there; near the point (tens of miles) the error is far under the clearance.
     */
    static double landDistanceNm(GeoPosition p) {
        return landDistanceNm(p, null);
    }

    /** The same, to the land of one island only (the chart's {@code name}), or all land when null. */
    static double landDistanceNm(GeoPosition p, String island) {
        AffineTransformation t = AffineTransformation.translationInstance(-p.lonDeg(), -p.latDeg())
                .scale(60 * Math.cos(Math.toRadians(p.latDeg())), 60);
        Point origin = GF.createPoint(new Coordinate(0, 0));
        Point lonLat = GF.createPoint(new Coordinate(p.lonDeg(), p.latDeg()));
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < LAND.size(); i++) {
            Geometry g = LAND.get(i);
            if (island != null && !NAMES.get(i).contains(island)) {
                continue;
            }
            if (g.intersects(lonLat)) {
                return -1;
            }
            if (g.getEnvelopeInternal().distance(lonLat.getEnvelopeInternal()) > 1.0) {
                continue; // over 1° away: not the nearest land for these short clearances
            }
            best = Math.min(best, t.transform(g).distance(origin));
        }
        return best;
    }

    /** Checks a set of points; returns the least distance from land seen outside the harbours. */
    static double checkAtSea(String what, List<GeoPosition> points, GeoPosition from, GeoPosition to) {
        double least = Double.POSITIVE_INFINITY;
        List<String> bad = new ArrayList<>();
        for (GeoPosition p : points) {
            double d = landDistanceNm(p);
            boolean harbour = Sailings.rhumbLine(from, p).distanceNm() < HARBOUR_NM
                    || Sailings.rhumbLine(to, p).distanceNm() < HARBOUR_NM;
            if (d < 0) {
                bad.add(p + " is on land");
            } else if (!harbour && d < CLEARANCE_NM) {
                bad.add(String.format("%s is %.2f nm from land", p, d));
            }
            if (!harbour) {
                least = Math.min(least, d);
            }
        }
        assertTrue(bad.isEmpty(), what + ": " + bad);
        return least;
    }

    /** Points every {@link #STEP_NM} along each rhumb-line leg between the waypoints. */
    static List<GeoPosition> alongLegs(List<GeoPosition> wps) {
        List<GeoPosition> out = new ArrayList<>();
        for (int i = 1; i < wps.size(); i++) {
            Sailings.RhumbLine rl = Sailings.rhumbLine(wps.get(i - 1), wps.get(i));
            for (double s = 0; s < rl.distanceNm(); s += STEP_NM) {
                out.add(Sailings.rhumbDestination(wps.get(i - 1), rl.courseDeg(), s));
            }
            out.add(wps.get(i));
        }
        return out;
    }

    /**
     * The check itself against the chart script's probe points ({@code test-charts/probe-points.tsv},
     * land or sea as GDAL found them on the same GSHHG polygons when the chart was made), and a route
     * straight from Horta to Ponta Delgada, which crosses Pico and São Miguel, is refused.
     */
    @Test
    void theCheckTellsLandFromSea() throws IOException {
        int n = 0;
        for (String line : Files.readAllLines(Path.of("../test-charts/probe-points.tsv"))) {
            String[] f = line.split("\t");
            if (!f[0].startsWith("demo-")) {
                continue;
            }
            double d = landDistanceNm(new GeoPosition(Double.parseDouble(f[1]), Double.parseDouble(f[2])));
            assertEquals(f[3].equals("land"), d < 0, f[0] + " (" + f[3] + "): " + d);
            n++;
        }
        assertEquals(20, n, "demo probe points");
        List<GeoPosition> straight = alongLegs(List.of(DemoPassageGenerator.WAYPOINTS[0],
                DemoPassageGenerator.WAYPOINTS[DemoPassageGenerator.WAYPOINTS.length - 1]));
        assertTrue(straight.stream().anyMatch(p -> landDistanceNm(p) < 0), "the straight route crosses land");
    }

    @Test
    void demoTrueTrackAndLegsAreAtSea() throws IOException {
        List<GeoPosition> track = new ArrayList<>();
        for (String line : Files.readAllLines(DEMO.resolve("demo-true-track.csv"))) {
            if (line.startsWith("#") || line.startsWith("time_utc") || line.isBlank()) {
                continue;
            }
            String[] f = line.split(",");
            track.add(new GeoPosition(Double.parseDouble(f[1]), Double.parseDouble(f[2])));
        }
        assertTrue(track.size() > 100, "10-minute samples of a day's passage: " + track.size());
        List<GeoPosition> wps = List.of(DemoPassageGenerator.WAYPOINTS);
        GeoPosition from = wps.get(0);
        GeoPosition to = wps.get(wps.size() - 1);
        double a = checkAtSea("demo true track (10-minute samples)", track, from, to);
        // between the 10-minute samples too (each is about 1 nm from the next)
        double b = checkAtSea("demo true track (between samples)", alongLegs(track), from, to);
        double c = checkAtSea("demo planned legs", alongLegs(wps), from, to);
        for (String island : new String[] {"Faial", "Pico", "Miguel"}) {
            double least = Double.POSITIVE_INFINITY;
            for (GeoPosition p : alongLegs(track)) {
                if (Sailings.rhumbLine(from, p).distanceNm() >= HARBOUR_NM && Sailings.rhumbLine(to, p).distanceNm() >= HARBOUR_NM) {
                    least = Math.min(least, landDistanceNm(p, island));
                }
            }
            System.out.printf("demo true track: least offing from %s %.2f nm outside the harbours%n", island, least);
        }
        System.out.printf("demo: least offing %.2f nm (samples), %.2f nm (between), %.2f nm (planned legs)%n", a, b, c);
    }

    @Test
    void drillScenarioRouteIsAtSea() throws IOException {
        Scenario s;
        try (InputStream in = Files.newInputStream(DEMO.resolve("drill-scenario.json"))) {
            s = ScenarioReader.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), "drill-scenario.json");
        }
        List<GeoPosition> wps = new ArrayList<>();
        wps.add(s.track().start());
        s.track().waypoints().forEach(w -> wps.add(w.position()));
        TrueTrack tt = TrueTrack.of(s.track());
        List<GeoPosition> samples = new ArrayList<>();
        for (Instant t = tt.startUtc(); !t.isAfter(tt.endUtc()); t = t.plus(Duration.ofMinutes(10))) {
            samples.add(tt.positionAt(t));
        }
        GeoPosition from = wps.get(0);
        GeoPosition to = wps.get(wps.size() - 1);
        double a = checkAtSea("drill true track (10-minute samples)", samples, from, to);
        double b = checkAtSea("drill route legs", alongLegs(wps), from, to);
        System.out.printf("drill: least offing %.2f nm (samples), %.2f nm (legs)%n", a, b);
        // the instructors' drill sails the demo's route
        List<GeoPosition> demo = List.of(DemoPassageGenerator.WAYPOINTS);
        assertEquals(demo.size(), wps.size(), "drill waypoints = demo waypoints");
        for (int i = 0; i < demo.size(); i++) {
            // the drill gives its waypoints to 0.1′; the demo's are to 0.001°
            assertTrue(Sailings.rhumbLine(demo.get(i), wps.get(i)).distanceNm() < 0.1, "waypoint " + i);
        }
    }
}
