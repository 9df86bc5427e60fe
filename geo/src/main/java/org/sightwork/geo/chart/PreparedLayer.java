package org.sightwork.geo.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.function.Consumer;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;
import org.sightwork.geo.earth.Mercator;

/**
 * A chart layer made ready to draw fast at every zoom: projected once to Mercator metres,
 * generalised once per zoom band, and indexed per band in a JTS {@link STRtree}.
 *
 * <p><b>Method:</b> {@link #prepare} projects the layer and indexes it at full resolution, which is
 * all the first frame needs; {@link #generalise()} (run next, in the background) fills the coarser
 * bands. Each band k has a nominal scale of {@link #bandMetresPerPixel(int)} chart metres
 * per pixel and keeps the geometry simplified with the Douglas-Peucker algorithm (JTS
 * {@link DouglasPeuckerSimplifier}, without its validity repair, which is slow and not needed for
 * drawing) to a tolerance of half a pixel at that scale. The renderer picks the coarsest band whose
 * scale is no coarser than the view's, so the simplification never exceeds half a pixel on the
 * screen; the last band is the source at full resolution. Douglas-Peucker rather than JTS's
 * topology-preserving simplifier because it prepares the full-resolution data several times faster
 * and its rare ring crossings are invisible below half a pixel. Every ring and line becomes a
 * {@link Part}: a packed array of coordinates with its envelope, the unit the index returns.
 *
 * <p><b>Limits:</b> a polygon ring is one part however large; very large rings (a continent at full
 * resolution) should be tiled in the data, as the bundled world base is.
 *
 * <p><b>Thread safety:</b> build on a worker thread, query from any thread; a band becomes visible to
 * queries atomically when it is complete.
 */
public final class PreparedLayer {

    /** Chart metres per pixel of the coarsest band: the whole world across about 2000 pixels. */
    private static final double COARSEST_M_PER_PX = 20_000.0;
    /** Each band is this many times finer than the one before. */
    private static final double BAND_RATIO = 4.0;
    /** Number of simplified bands; one more band holds the full resolution. */
    private static final int SIMPLIFIED_BANDS = 7;

    /**
     * One ring, line or point, projected.
     *
     * @param xy x, y pairs in Mercator metres, packed
     * @param n number of points
     * @param closed true for a polygon ring
     * @param featureIndex index of the feature in the layer
     * @param widthM width of the part's envelope (metres)
     * @param heightM height of the part's envelope (metres)
     */
    public record Part(double[] xy, int n, boolean closed, int featureIndex, double widthM, double heightM) {
    }

    private final ChartLayer layer;
    private final List<Geometry> projected;
    private final AtomicReferenceArray<STRtree> bands = new AtomicReferenceArray<>(SIMPLIFIED_BANDS + 1);
    private final int[] vertexCounts = new int[SIMPLIFIED_BANDS + 1];
    private final Envelope extentM;
    private volatile boolean generalised;

    private PreparedLayer(ChartLayer layer, List<Geometry> projected, Envelope extentM) {
        this.layer = layer;
        this.projected = projected;
        this.extentM = extentM;
    }

    /**
     * Prepares a layer.
     *
     * @param layer the layer, in WGS84
     * @param maskDeg an area (degrees) to cut out of the layer, where a more detailed layer lies
     *     over it; null for none
     * @return the prepared layer
     */
    public static PreparedLayer prepare(ChartLayer layer, Envelope maskDeg) {
        GeometryFactory gf = new GeometryFactory();
        Geometry mask = maskDeg == null ? null : gf.toGeometry(maskDeg);
        List<Geometry> projected = new ArrayList<>(layer.features().size());
        Envelope extentM = new Envelope();
        for (Feature f : layer.features()) {
            Geometry g = f.geometry();
            if (mask != null && g.getEnvelopeInternal().intersects(maskDeg)) {
                g = cutOut(g, mask);
            }
            g = g.copy();
            g.apply(PROJECT);
            projected.add(g);
            extentM.expandToInclude(g.getEnvelopeInternal());
        }
        PreparedLayer p = new PreparedLayer(layer, projected, extentM);
        p.buildBand(SIMPLIFIED_BANDS, projected);
        return p;
    }

    /**
     * Generalises the layer for every coarser band, finest first, each band simplified from the one
     * below it (a cascade: each step removes fewer vertices from fewer, so all bands cost about 1.3
     * full-resolution passes). The cascade's tolerances are 3/4 of the band's half pixel, so the
     * accumulated deviation, at most 3/4 (1 + 1/4 + 1/16 + ...) = 1 times the half pixel, stays within
     * half a pixel. Until a band is ready, {@link #query} draws from the nearest finer band that is:
     * correct, only slower. Slow: call from a worker thread; idempotent.
     */
    public synchronized void generalise() {
        if (generalised) {
            return;
        }
        List<Geometry> previous = projected;
        for (int b = SIMPLIFIED_BANDS - 1; b >= 0; b--) {
            double tolM = 0.75 * 0.5 * bandMetresPerPixel(b);
            List<Geometry> simplified = new ArrayList<>(previous.size());
            for (Geometry g : previous) {
                if (g.getDimension() > 0 && !g.isEmpty()) {
                    DouglasPeuckerSimplifier s = new DouglasPeuckerSimplifier(g);
                    s.setDistanceTolerance(tolM);
                    s.setEnsureValid(false);
                    g = s.getResultGeometry();
                }
                simplified.add(g);
            }
            buildBand(b, simplified);
            previous = simplified;
        }
        generalised = true;
    }

    /**
     * Whether every band is ready.
     *
     * @return true after {@link #generalise()}
     */
    public boolean isGeneralised() {
        return generalised;
    }

    private void buildBand(int b, List<Geometry> geoms) {
        STRtree tree = new STRtree();
        int count = 0;
        for (int i = 0; i < geoms.size(); i++) {
            count += addParts(tree, geoms.get(i), i);
        }
        tree.build();
        vertexCounts[b] = count;
        bands.set(b, tree);
    }

    private static Geometry cutOut(Geometry g, Geometry mask) {
        try {
            return g.difference(mask);
        } catch (RuntimeException e) {
            try {
                return g.buffer(0).difference(mask);
            } catch (RuntimeException e2) {
                return g; // drawn whole: a doubled coast is better than a missing one
            }
        }
    }

    private static int addParts(STRtree tree, Geometry g, int featureIndex) {
        int count = 0;
        for (int k = 0; k < g.getNumGeometries(); k++) {
            Geometry e = g.getGeometryN(k);
            if (e.isEmpty()) {
                continue;
            }
            if (e instanceof Polygon p) {
                count += addPart(tree, p.getExteriorRing(), true, featureIndex);
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    count += addPart(tree, p.getInteriorRingN(h), true, featureIndex);
                }
            } else if (e instanceof LineString l) {
                count += addPart(tree, l, false, featureIndex);
            } else if (e instanceof Point pt) {
                count += addPart(tree, pt, false, featureIndex);
            } else if (e.getNumGeometries() > 1 || e != g) {
                count += addParts(tree, e, featureIndex);
            }
        }
        return count;
    }

    private static int addPart(STRtree tree, Geometry line, boolean closed, int featureIndex) {
        CoordinateSequence seq = line instanceof LineString l ? l.getCoordinateSequence()
                : ((Point) line).getCoordinateSequence();
        int n = seq.size();
        if (n == 0 || (closed && n < 4)) {
            return 0;
        }
        double[] xy = new double[2 * n];
        for (int i = 0; i < n; i++) {
            xy[2 * i] = seq.getX(i);
            xy[2 * i + 1] = seq.getY(i);
        }
        Envelope e = line.getEnvelopeInternal();
        tree.insert(e, new Part(xy, n, closed, featureIndex, e.getWidth(), e.getHeight()));
        return n;
    }

    private static final CoordinateSequenceFilter PROJECT = new CoordinateSequenceFilter() {
        @Override
        public void filter(CoordinateSequence seq, int i) {
            double lon = seq.getX(i);
            double lat = seq.getY(i);
            seq.setOrdinate(i, 0, Mercator.eastingM(lon));
            seq.setOrdinate(i, 1, Mercator.northingM(lat));
        }

        @Override
        public boolean isDone() {
            return false;
        }

        @Override
        public boolean isGeometryChanged() {
            return true;
        }
    };

    /**
     * The nominal scale of a band.
     *
     * @param band the band, 0 (coarsest) to {@link #bandCount()} − 1 (full resolution)
     * @return chart metres per pixel; 0 for the full-resolution band
     */
    public static double bandMetresPerPixel(int band) {
        return band >= SIMPLIFIED_BANDS ? 0 : COARSEST_M_PER_PX / Math.pow(BAND_RATIO, band);
    }

    /**
     * The band to draw at a scale: the coarsest whose own scale is no coarser than the view's.
     *
     * @param metresPerPixel the view's scale (chart metres per pixel)
     * @return the band
     */
    public static int bandFor(double metresPerPixel) {
        for (int b = 0; b < SIMPLIFIED_BANDS; b++) {
            if (bandMetresPerPixel(b) <= metresPerPixel) {
                return b;
            }
        }
        return SIMPLIFIED_BANDS;
    }

    /**
     * Number of bands.
     *
     * @return bands, the last at full resolution
     */
    public static int bandCount() {
        return SIMPLIFIED_BANDS + 1;
    }

    /**
     * Visits the parts of a band whose envelope meets an area.
     *
     * @param band the band
     * @param areaM the area (Mercator metres)
     * @param visitor receives each part
     */
    public void query(int band, Envelope areaM, Consumer<Part> visitor) {
        STRtree t = null;
        for (int b = band; t == null && b <= SIMPLIFIED_BANDS; b++) {
            t = bands.get(b);
        }
        t.query(areaM, item -> visitor.accept((Part) item));
    }

    /**
     * Vertices kept in a band.
     *
     * @param band the band
     * @return the number of vertices
     */
    public int vertexCount(int band) {
        return vertexCounts[band];
    }

    /**
     * The source layer.
     *
     * @return the layer
     */
    public ChartLayer layer() {
        return layer;
    }

    /**
     * The extent in chart metres.
     *
     * @return a copy of the extent
     */
    public Envelope extentM() {
        return new Envelope(extentM);
    }
}
