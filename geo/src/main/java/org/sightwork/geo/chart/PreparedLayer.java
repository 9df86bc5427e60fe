package org.sightwork.geo.chart;

import java.util.ArrayList;
import java.util.List;
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
 * <p><b>Method:</b> each band k has a nominal scale of {@link #bandMetresPerPixel(int)} chart metres
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
 * <p><b>Thread safety:</b> immutable once built; build on a worker thread, query from any thread.
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
     */
    public record Part(double[] xy, int n, boolean closed, int featureIndex) {
    }

    private final ChartLayer layer;
    private final STRtree[] bands;
    private final int[] vertexCounts;
    private final Envelope extentM;

    private PreparedLayer(ChartLayer layer, STRtree[] bands, int[] vertexCounts, Envelope extentM) {
        this.layer = layer;
        this.bands = bands;
        this.vertexCounts = vertexCounts;
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
        STRtree[] bands = new STRtree[SIMPLIFIED_BANDS + 1];
        int[] counts = new int[SIMPLIFIED_BANDS + 1];
        for (int b = 0; b <= SIMPLIFIED_BANDS; b++) {
            STRtree tree = new STRtree();
            double tolM = b == SIMPLIFIED_BANDS ? 0 : 0.5 * bandMetresPerPixel(b);
            for (int i = 0; i < projected.size(); i++) {
                Geometry g = projected.get(i);
                if (tolM > 0 && g.getDimension() > 0) {
                    DouglasPeuckerSimplifier s = new DouglasPeuckerSimplifier(g);
                    s.setDistanceTolerance(tolM);
                    s.setEnsureValid(false);
                    g = s.getResultGeometry();
                }
                counts[b] += addParts(tree, g, i);
            }
            tree.build();
            bands[b] = tree;
        }
        return new PreparedLayer(layer, bands, counts, extentM);
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
        tree.insert(line.getEnvelopeInternal(), new Part(xy, n, closed, featureIndex));
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
        bands[band].query(areaM, item -> visitor.accept((Part) item));
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
