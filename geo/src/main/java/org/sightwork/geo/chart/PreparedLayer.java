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
 * drawing) to a tolerance of {@link #bandTolerancePx(int)} pixels at that scale: 1.5 px at the
 * overview bands (the world to an ocean), half a pixel from the coastal bands down. The renderer
 * picks the coarsest band whose scale is no coarser than the view's, so the simplification never
 * exceeds that on the screen; the last band is the source at full resolution. Douglas-Peucker rather
 * than JTS's topology-preserving simplifier because it prepares the full-resolution data several
 * times faster and its rare ring crossings are invisible at a pixel or so. Every ring and line
 * becomes a {@link Part}: a packed array of coordinates with its envelope, the unit the index
 * returns; a feature the simplification left unchanged shares its parts with the finer band.
 * {@code PreparedCache} keeps every band of a file for its next opening.
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
    /** Fraction of a band's tolerance used at each step of the cascade (see {@link #generalise()}). */
    private static final double CASCADE_FRACTION = 0.75;
    /** Number of simplified bands; one more band holds the full resolution. */
    private static final int SIMPLIFIED_BANDS = 7;
    /**
     * Bands up to this one are overview scales (1.25 km/px and coarser: the world to an ocean), where
     * the simplification may reach {@link #OVERVIEW_TOLERANCE_PX}; finer bands keep
     * {@link #DETAIL_TOLERANCE_PX}.
     */
    private static final int LAST_OVERVIEW_BAND = 2;
    /**
     * Simplification allowed at the overview bands (pixels at the band's scale). The world base
     * (Natural Earth 1:10 m) is itself generalised to a few kilometres, and at 0.5 px the world view
     * still drew its coastline at about one vertex per pixel (35 000 vertices, 21 ms a frame in the
     * software pipeline); at 1.5 px it draws less than half of them, and a view between this band's
     * scale and the next coarser one sees 1.5 px to 0.4 px of it.
     */
    static final double OVERVIEW_TOLERANCE_PX = 1.5;
    /** Simplification allowed at the coastal and harbour bands (pixels at the band's scale). */
    static final double DETAIL_TOLERANCE_PX = 0.5;

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

    /**
     * A name to write inside an area feature.
     *
     * @param text the name (the feature's {@code name} attribute)
     * @param xM easting of a point inside the feature (metres)
     * @param yM northing of that point (metres)
     * @param sizeM the larger side of the feature's envelope (metres)
     */
    public record NameLabel(String text, double xM, double yM, double sizeM) {
    }

    private final ChartLayer layer;
    private final List<Geometry> projected;
    private final List<NameLabel> labels = new ArrayList<>();
    private final AtomicReferenceArray<STRtree> bands = new AtomicReferenceArray<>(SIMPLIFIED_BANDS + 1);
    private final AtomicReferenceArray<List<Part>> bandParts = new AtomicReferenceArray<>(SIMPLIFIED_BANDS + 1);
    private final int[] vertexCounts = new int[SIMPLIFIED_BANDS + 1];
    private final Envelope extentM;
    private final Envelope maskDeg;
    private final boolean restored;
    /** The full-resolution parts per feature, kept until {@link #generalise()} has used them. */
    private List<List<Part>> fullParts;
    private volatile boolean generalised;

    private PreparedLayer(ChartLayer layer, List<Geometry> projected, Envelope extentM, Envelope maskDeg,
            boolean restored) {
        this.layer = layer;
        this.projected = projected;
        this.extentM = extentM;
        this.maskDeg = maskDeg == null ? null : new Envelope(maskDeg);
        this.restored = restored;
    }

    /**
     * A layer prepared before and read back from {@code PreparedCache}: every band given.
     *
     * @param layer the layer (its features need not be kept)
     * @param extentM the extent (metres)
     * @param maskDeg the mask it was prepared with, or null
     * @param labels the names
     * @param parts the parts of each band, coarsest first, {@link #bandCount()} lists
     * @return the layer, generalised
     */
    static PreparedLayer restore(ChartLayer layer, Envelope extentM, Envelope maskDeg, List<NameLabel> labels,
            List<List<Part>> parts) {
        if (parts.size() != SIMPLIFIED_BANDS + 1) {
            throw new IllegalArgumentException("expected " + (SIMPLIFIED_BANDS + 1) + " bands, got " + parts.size());
        }
        PreparedLayer p = new PreparedLayer(layer, null, extentM, maskDeg, true);
        p.labels.addAll(labels);
        for (int b = 0; b <= SIMPLIFIED_BANDS; b++) {
            p.setBand(b, parts.get(b));
        }
        p.generalised = true;
        return p;
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
        PreparedLayer p = new PreparedLayer(layer, projected, extentM, maskDeg, false);
        p.fullParts = partsPerFeature(projected, null, null);
        p.setBand(SIMPLIFIED_BANDS, flatten(p.fullParts));
        for (int i = 0; i < projected.size(); i++) {
            Object name = layer.features().get(i).attributes().get("name");
            Geometry g = projected.get(i);
            if (name instanceof String text && !text.isBlank() && g.getDimension() == 2 && !g.isEmpty()) {
                org.locationtech.jts.geom.Point in = g.getInteriorPoint();
                Envelope e = g.getEnvelopeInternal();
                p.labels.add(new NameLabel(text.strip(), in.getX(), in.getY(), Math.max(e.getWidth(), e.getHeight())));
            }
        }
        return p;
    }

    /**
     * Generalises the layer for every coarser band, finest first, each band simplified from the one
     * below it (a cascade: each step removes fewer vertices from fewer, so all bands cost about 1.3
     * full-resolution passes). The cascade's tolerances are 3/4 of the band's own, and a finer band's
     * tolerance in metres is at most 1/4 of the next coarser one's, so the accumulated deviation, at
     * most 3/4 (1 + 1/4 + 1/16 + ...) = 1 times the band's tolerance, stays within it. Until a band is
     * ready, {@link #query} draws from the nearest finer band that is:
     * correct, only slower. Slow: call from a worker thread; idempotent.
     */
    public synchronized void generalise() {
        if (generalised || projected == null) {
            return;
        }
        List<Geometry> previous = projected;
        List<List<Part>> previousParts = fullParts;
        for (int b = SIMPLIFIED_BANDS - 1; b >= 0; b--) {
            double tolM = CASCADE_FRACTION * bandTolerancePx(b) * bandMetresPerPixel(b);
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
            List<List<Part>> parts = partsPerFeature(simplified, previous, previousParts);
            setBand(b, flatten(parts));
            previous = simplified;
            previousParts = parts;
        }
        fullParts = null;
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

    /**
     * The parts of each feature; a feature that the simplification left as it was (Douglas-Peucker
     * only removes vertices, so the same count means the same line) shares the finer band's parts,
     * which keeps the near-full-resolution bands from each holding a copy of the data.
     */
    private static List<List<Part>> partsPerFeature(List<Geometry> geoms, List<Geometry> finer,
            List<List<Part>> finerParts) {
        List<List<Part>> out = new ArrayList<>(geoms.size());
        for (int i = 0; i < geoms.size(); i++) {
            Geometry g = geoms.get(i);
            if (finer != null && g.getNumPoints() == finer.get(i).getNumPoints()) {
                out.add(finerParts.get(i));
            } else {
                List<Part> parts = new ArrayList<>(1);
                addParts(parts, g, i);
                out.add(parts);
            }
        }
        return out;
    }

    private static List<Part> flatten(List<List<Part>> perFeature) {
        List<Part> all = new ArrayList<>();
        perFeature.forEach(all::addAll);
        return all;
    }

    private void setBand(int b, List<Part> parts) {
        STRtree tree = new STRtree();
        int count = 0;
        for (Part part : parts) {
            double x0 = Double.POSITIVE_INFINITY;
            double y0 = Double.POSITIVE_INFINITY;
            double x1 = Double.NEGATIVE_INFINITY;
            double y1 = Double.NEGATIVE_INFINITY;
            double[] xy = part.xy();
            for (int i = 0; i < part.n(); i++) {
                x0 = Math.min(x0, xy[2 * i]);
                x1 = Math.max(x1, xy[2 * i]);
                y0 = Math.min(y0, xy[2 * i + 1]);
                y1 = Math.max(y1, xy[2 * i + 1]);
            }
            tree.insert(new Envelope(x0, x1, y0, y1), part);
            count += part.n();
        }
        tree.build();
        vertexCounts[b] = count;
        bandParts.set(b, List.copyOf(parts));
        bands.set(b, tree);
    }

    /**
     * The parts of a band, for {@code PreparedCache}.
     *
     * @param band the band
     * @return the parts (unmodifiable), or null if the band is not ready
     */
    List<Part> parts(int band) {
        return bandParts.get(band);
    }

    /**
     * The mask the layer was prepared with.
     *
     * @return the area cut out (degrees), or null
     */
    Envelope maskDeg() {
        return maskDeg == null ? null : new Envelope(maskDeg);
    }

    /**
     * Whether the layer was read back prepared from {@code PreparedCache} rather than prepared here.
     *
     * @return true if restored
     */
    boolean isRestored() {
        return restored;
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

    private static int addParts(List<Part> tree, Geometry g, int featureIndex) {
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

    private static int addPart(List<Part> tree, Geometry line, boolean closed, int featureIndex) {
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
        tree.add(new Part(xy, n, closed, featureIndex, e.getWidth(), e.getHeight()));
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
     * The simplification a band allows.
     *
     * @param band the band, 0 (coarsest) to {@link #bandCount()} − 1 (full resolution)
     * @return the largest distance of the drawn line from the source, in pixels at the band's scale
     *     (0 at full resolution)
     */
    public static double bandTolerancePx(int band) {
        if (band >= SIMPLIFIED_BANDS) {
            return 0;
        }
        return band <= LAST_OVERVIEW_BAND ? OVERVIEW_TOLERANCE_PX : DETAIL_TOLERANCE_PX;
    }

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
     * Names to write inside area features (from their {@code name} attribute).
     *
     * @return the labels (unmodifiable)
     */
    public List<NameLabel> labels() {
        return java.util.Collections.unmodifiableList(labels);
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
