package org.sightwork.geo.render;

import javafx.scene.canvas.GraphicsContext;

/**
 * Appends projected coordinate runs to the current path of a graphics context, with two cheap
 * steps that keep a frame fast without changing what is seen: vertices are clamped to a guard
 * rectangle a little outside the screen (which keeps every fill inside the screen exactly as it
 * was, because clamping to a convex set never crosses an inside point, and keeps the coordinates
 * small for the rasteriser), and a vertex less than {@link #MIN_STEP_PX} from the last one drawn is
 * skipped.
 *
 * <p>Allocates nothing. <b>Thread:</b> that of the graphics context.
 */
final class PathBuilder {

    /** Vertices closer than this to the previous drawn vertex are skipped (pixels). */
    static final double MIN_STEP_PX = 0.6;
    /** How far outside the screen the guard rectangle lies (pixels): wider than any stroke. */
    static final double GUARD_PX = 24;

    private PathBuilder() {
    }

    /**
     * Appends a run of chart coordinates to the current path.
     *
     * @param gc the graphics context
     * @param v the viewport
     * @param xy packed x, y (Mercator metres)
     * @param n number of points
     * @param closed close the run (a ring)
     * @param offsetXM easting added to every point (a whole turn of longitude, or 0)
     * @return number of vertices emitted
     */
    static int append(GraphicsContext gc, Viewport v, double[] xy, int n, boolean closed, double offsetXM) {
        double inv = 1 / v.metresPerPx();
        double cx = v.centreXM() - offsetXM;
        double cy = v.centreYM();
        double hw = v.widthPx() * 0.5;
        double hh = v.heightPx() * 0.5;
        double minX = -GUARD_PX;
        double maxX = v.widthPx() + GUARD_PX;
        double minY = -GUARD_PX;
        double maxY = v.heightPx() + GUARD_PX;
        double lx = 0;
        double ly = 0;
        int emitted = 0;
        for (int i = 0; i < n; i++) {
            double sx = (xy[2 * i] - cx) * inv + hw;
            double sy = hh - (xy[2 * i + 1] - cy) * inv;
            sx = sx < minX ? minX : (sx > maxX ? maxX : sx);
            sy = sy < minY ? minY : (sy > maxY ? maxY : sy);
            if (i == 0) {
                gc.moveTo(sx, sy);
                emitted++;
            } else if (Math.abs(sx - lx) >= MIN_STEP_PX || Math.abs(sy - ly) >= MIN_STEP_PX
                    || (i == n - 1 && !closed)) {
                gc.lineTo(sx, sy);
                emitted++;
            } else {
                continue;
            }
            lx = sx;
            ly = sy;
        }
        if (closed) {
            gc.closePath();
        }
        return emitted;
    }
}
