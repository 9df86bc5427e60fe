package org.sightwork.geo.render;

import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.FillRule;
import javafx.scene.shape.StrokeLineJoin;
import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.chart.FeatureClass;
import org.sightwork.geo.chart.PreparedLayer;

/**
 * Paints a prepared chart layer in the style of its feature class: the band for the scale in view,
 * the parts the spatial index finds in view, one path per layer (so that a tiled land layer shows
 * no seams), filled with the even-odd rule (holes and islands in lakes come out right without
 * knowing which ring is which). Rings and lines under {@link #MIN_PART_PX} across are skipped: at
 * the world scale they are most of the vertices and none of the picture.
 *
 * <p><b>Thread:</b> that of the graphics context. Allocates nothing per vertex.
 */
public final class VectorLayerRenderer implements RenderLayer {

    /** Rings and lines smaller than this across, both ways, are not drawn (pixels). */
    static final double MIN_PART_PX = 0.8;
    private final PreparedLayer layer;
    private final FeatureClass featureClass;
    private int lastVertices;

    /**
     * A renderer for a layer.
     *
     * @param layer the prepared layer
     */
    public VectorLayerRenderer(PreparedLayer layer) {
        this.layer = layer;
        this.featureClass = layer.layer().featureClass();
    }

    /**
     * The prepared layer.
     *
     * @return the layer
     */
    public PreparedLayer layer() {
        return layer;
    }

    /**
     * Vertices sent to the graphics context in the last frame (for the benchmark).
     *
     * @return the count
     */
    public int lastVertices() {
        return lastVertices;
    }

    @Override
    public void paint(Frame frame) {
        GraphicsContext gc = frame.gc();
        Viewport v = frame.viewport();
        Palette p = frame.palette();
        int band = PreparedLayer.bandFor(v.metresPerPx());
        Envelope area = v.areaM();
        area.expandBy(PathBuilder.GUARD_PX * v.metresPerPx());
        int[] count = {0};
        boolean[] anyPoints = {false};
        double minSizeM = MIN_PART_PX * v.metresPerPx();
        gc.beginPath();
        layer.query(band, area, part -> {
            if (part.n() == 1) {
                anyPoints[0] = true;
            } else if (part.widthM() < minSizeM && part.heightM() < minSizeM) {
                return; // smaller than a pixel: an islet or a pond that would not show
            } else {
                count[0] += PathBuilder.append(gc, v, part.xy(), part.n(), part.closed(), 0);
            }
        });
        lastVertices = count[0];
        gc.setFillRule(FillRule.EVEN_ODD);
        gc.setLineDashes((double[]) null);
        gc.setLineJoin(StrokeLineJoin.ROUND);
        switch (featureClass) {
            case LAND -> fill(gc, p.land());
            case LAKE -> {
                fill(gc, p.lake());
                stroke(gc, p.coast(), 0.6);
            }
            case DEPTH_AREA -> {
                fill(gc, p.depthArea());
                stroke(gc, p.contour(), 0.5);
            }
            case COASTLINE -> stroke(gc, p.coast(), 1.2);
            case DEPTH_CONTOUR -> stroke(gc, p.contour(), 0.8);
            case OTHER -> {
                fill(gc, p.other().deriveColor(0, 1, 1, 0.25));
                stroke(gc, p.other(), 1.0);
            }
        }
        if (anyPoints[0]) {
            paintPoints(gc, v, p, area);
        }
    }

    private void paintPoints(GraphicsContext gc, Viewport v, Palette p, Envelope area) {
        gc.setFill(p.other());
        layer.query(PreparedLayer.bandCount() - 1, area, part -> {
            if (part.n() == 1) {
                double sx = v.screenX(part.xy()[0]);
                double sy = v.screenY(part.xy()[1]);
                gc.fillRect(sx - 2.5, sy - 2.5, 5, 5);
            }
        });
    }

    private static void fill(GraphicsContext gc, Color c) {
        gc.setFill(c);
        gc.fill();
    }

    private static void stroke(GraphicsContext gc, Color c, double w) {
        gc.setStroke(c);
        gc.setLineWidth(w);
        gc.stroke();
    }
}
