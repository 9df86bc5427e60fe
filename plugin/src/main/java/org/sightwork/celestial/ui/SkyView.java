package org.sightwork.celestial.ui;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.VPos;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import javax.imageio.ImageIO;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.celestial.planning.VisibleBody;
import org.sightwork.geo.earth.Angles;

/**
 * A polar plot of the sky at a planned time: azimuth round the circle (north up, east to the
 * right, as on a compass rose and a chart), altitude inward (the horizon is the outer circle, the
 * zenith the centre; rings at 30° and 60°). Each body is a dot sized by its magnitude and labelled
 * with its name and magnitude; the proposed set is ringed and labelled in bold; bodies set aside
 * are drawn dim.
 *
 * <p>The colours are our own: a deep blue night sky, pale blue rings, warm amber for the chosen set.
 *
 * <p><b>Threading:</b> a JavaFX node: construct it, call {@link #setPlan} and snapshot it on the
 * JavaFX Application Thread. {@link #writePng} may be called from any thread; it starts the JavaFX
 * toolkit on the headless Monocle platform if no toolkit runs yet.
 */
public final class SkyView extends Canvas {

    /** Sky background. */
    static final Color SKY = Color.web("#0b1a30");
    /** Outside the horizon circle. */
    static final Color FRAME = Color.web("#050c18");
    /** Horizon circle. */
    static final Color HORIZON = Color.web("#9cc3e6");
    /** Altitude rings and azimuth spokes. */
    static final Color RING = Color.web("#2f4d73");
    /** Labels and stars. */
    static final Color INK = Color.web("#e8eef6");
    /** Planets. */
    static final Color PLANET = Color.web("#f2d479");
    /** The Moon. */
    static final Color MOON = Color.web("#c9ccd3");
    /** The chosen set. */
    static final Color CHOSEN = Color.web("#ff9a3d");
    /** Bodies set aside. */
    static final Color DIM = Color.web("#6b7a90");

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm'Z'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /** JavaFX's own logger, held so that its level stays set. */
    private static final java.util.logging.Logger FX_LOGGER = java.util.logging.Logger.getLogger("javafx");

    private SightPlan plan;

    /**
     * An empty square sky view.
     *
     * @param sizePx width and height (pixels)
     */
    public SkyView(double sizePx) {
        super(sizePx, sizePx);
        draw();
    }

    /**
     * Shows a plan. FX thread.
     *
     * @param p the plan to draw
     */
    public void setPlan(SightPlan p) {
        this.plan = Objects.requireNonNull(p, "plan");
        draw();
    }

    /** @return the plan shown, or null before the first (FX thread; for tests) */
    SightPlan plan() {
        return plan;
    }

    /** The radius of the horizon circle (pixels). */
    double horizonRadius() {
        return Math.min(getWidth(), getHeight()) / 2.0 - 34.0;
    }

    /**
     * Where a direction in the sky lands on the canvas.
     *
     * @param altDeg altitude (degrees)
     * @param znDeg azimuth (degrees true)
     * @return {x, y} (pixels)
     */
    double[] toCanvas(double altDeg, double znDeg) {
        double r = horizonRadius() * (90.0 - altDeg) / 90.0;
        double z = Math.toRadians(znDeg);
        return new double[] {getWidth() / 2.0 + r * Math.sin(z), getHeight() / 2.0 + 12.0 - r * Math.cos(z)};
    }

    /**
     * Dot radius for a magnitude: brighter is bigger.
     *
     * @param magnitude visual magnitude
     * @return radius (pixels)
     */
    static double dotRadius(double magnitude) {
        return Math.max(1.6, Math.min(8.0, 4.4 - 0.95 * magnitude));
    }

    private void draw() {
        GraphicsContext g = getGraphicsContext2D();
        double w = getWidth();
        double h = getHeight();
        double cx = w / 2.0;
        double cy = h / 2.0 + 12.0;
        double rh = horizonRadius();
        g.setFill(FRAME);
        g.fillRect(0, 0, w, h);
        g.setFill(SKY);
        g.fillOval(cx - rh, cy - rh, 2 * rh, 2 * rh);

        g.setStroke(RING);
        g.setLineWidth(1.0);
        for (int az = 0; az < 360; az += 30) {
            double[] p = toCanvas(0, az);
            g.strokeLine(cx, cy, p[0], p[1]);
        }
        g.setFont(Font.font("System", 10));
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.BOTTOM);
        for (int alt : new int[] {30, 60}) {
            double r = rh * (90 - alt) / 90.0;
            g.setStroke(RING);
            g.strokeOval(cx - r, cy - r, 2 * r, 2 * r);
            g.setFill(RING.brighter());
            g.fillText(alt + "°", cx + 3, cy - r - 1);
        }
        g.setStroke(HORIZON);
        g.setLineWidth(1.6);
        g.strokeOval(cx - rh, cy - rh, 2 * rh, 2 * rh);

        g.setFill(HORIZON);
        g.setFont(Font.font("System", FontWeight.BOLD, 13));
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.CENTER);
        String[] card = {"N", "E", "S", "W"};
        for (int i = 0; i < 4; i++) {
            double z = Math.toRadians(90 * i);
            g.fillText(card[i], cx + (rh + 14) * Math.sin(z), cy - (rh + 14) * Math.cos(z));
        }

        if (plan == null) {
            return;
        }
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.setFill(INK);
        g.setFont(Font.font("System", FontWeight.BOLD, 12));
        g.fillText(TIME.format(plan.timeUtc()) + "   " + plan.dr(), 8, 6);
        g.setFont(Font.font("System", 10));
        g.setFill(CHOSEN);
        String legend = plan.chosen().isEmpty() ? "no set proposed"
                : String.format(Locale.ROOT, "ringed: proposed set of %d (HDOP %.2f)", plan.chosen().size(), plan.hdop());
        g.fillText(legend, 8, 22);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setFill(DIM);
        g.fillText(String.format(Locale.ROOT, "Sun %s", Angles.formatDm(plan.sunAltitudeDeg(), 2)), w - 8, 6);

        // Dots: dim ones first, so that the chosen set is drawn on top; labels the other way round,
        // the chosen set first, each put where it overlaps no label already placed.
        List<VisibleBody> order = new ArrayList<>(plan.visible());
        order.sort(Comparator.comparingInt(b -> plan.isChosen(b) ? 2 : b.eligible() ? 1 : 0));
        for (VisibleBody b : order) {
            drawDot(g, b, plan.isChosen(b));
        }
        List<double[]> placed = new ArrayList<>();
        for (int i = order.size() - 1; i >= 0; i--) {
            drawLabel(g, order.get(i), plan.isChosen(order.get(i)), placed);
        }
    }

    private double dotRadiusOf(VisibleBody b) {
        Body body = b.body();
        return body.kind() == Body.Kind.MOON || body.kind() == Body.Kind.SUN ? 8.0 : dotRadius(b.magnitude());
    }

    private void drawDot(GraphicsContext g, VisibleBody b, boolean chosen) {
        double[] p = toCanvas(b.hcDeg(), b.znDeg());
        Body body = b.body();
        double r = dotRadiusOf(b);
        Color fill = body.kind() == Body.Kind.MOON ? MOON : body.kind() == Body.Kind.SUN ? PLANET
                : body.isPlanet() ? PLANET : INK;
        if (!b.eligible() && !chosen) {
            fill = fill.interpolate(DIM, 0.6);
        }
        g.setFill(fill);
        g.fillOval(p[0] - r, p[1] - r, 2 * r, 2 * r);
        if (chosen) {
            g.setStroke(CHOSEN);
            g.setLineWidth(2.0);
            double rr = r + 4.0;
            g.strokeOval(p[0] - rr, p[1] - rr, 2 * rr, 2 * rr);
        }
    }

    private void drawLabel(GraphicsContext g, VisibleBody b, boolean chosen, List<double[]> placed) {
        double[] p = toCanvas(b.hcDeg(), b.znDeg());
        double r = dotRadiusOf(b) + (chosen ? 7 : 3);
        double size = chosen ? 12 : 9.5;
        String text = String.format(Locale.ROOT, "%s %.1f", b.body().name(),
                Math.round(b.magnitude() * 10) / 10.0 + 0.0);
        double w = text.length() * size * 0.58;
        double h = size + 2;
        boolean preferRight = p[0] <= getWidth() / 2.0 + horizonRadius() * 0.55;
        double[][] tries = {
            {preferRight ? r : -r - w, -h / 2}, {preferRight ? -r - w : r, -h / 2},
            {preferRight ? r : -r - w, -h - r / 2}, {preferRight ? r : -r - w, r / 2},
            {-w / 2, -h - r}, {-w / 2, r}};
        double[] box = null;
        for (double[] t : tries) {
            double[] cand = {p[0] + t[0], p[1] + t[1], w, h};
            if (placed.stream().noneMatch(q -> overlaps(q, cand))) {
                box = cand;
                break;
            }
        }
        if (box == null) {
            box = new double[] {p[0] + tries[0][0], p[1] + tries[0][1], w, h};
        }
        placed.add(box);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        g.setFont(chosen ? Font.font("System", FontWeight.BOLD, size) : Font.font("System", size));
        g.setFill(chosen ? CHOSEN : b.eligible() ? INK : DIM);
        g.fillText(text, box[0], box[1] + h / 2);
    }

    private static boolean overlaps(double[] a, double[] b) {
        return a[0] < b[0] + b[2] && b[0] < a[0] + a[2] && a[1] < b[1] + b[3] && b[1] < a[1] + a[3];
    }

    /**
     * Renders a plan headless and writes it as a PNG (through a temporary file in the same folder,
     * then a rename, so an existing file is never left half-written). Any thread except the FX
     * thread.
     *
     * @param p the plan
     * @param sizePx width and height (pixels)
     * @param file the PNG to write
     * @throws IOException if the file cannot be written
     */
    public static void writePng(SightPlan p, double sizePx, Path file) throws IOException {
        if (Platform.isFxApplicationThread()) {
            throw new IllegalStateException("writePng waits for the FX thread: call it from another thread");
        }
        startToolkitIfNeeded();
        CompletableFuture<BufferedImage> image = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                SkyView v = new SkyView(sizePx);
                v.setPlan(p);
                WritableImage snap = v.snapshot(new SnapshotParameters(), null);
                image.complete(SwingFXUtils.fromFXImage(snap, null));
            } catch (RuntimeException e) {
                image.completeExceptionally(e);
            }
        });
        BufferedImage img;
        try {
            img = image.get(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while drawing the sky view", e);
        } catch (ExecutionException | TimeoutException e) {
            throw new IOException("could not draw the sky view: " + e.getMessage(), e);
        }
        Path abs = file.toAbsolutePath();
        Path dir = abs.getParent();
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
        try {
            if (!ImageIO.write(img, "png", tmp.toFile())) {
                throw new IOException("no PNG writer available");
            }
            Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * Starts the JavaFX toolkit if it is not running: on the headless Monocle platform with software
     * rendering unless the caller chose a platform already. Any thread.
     */
    public static synchronized void startToolkitIfNeeded() {
        try {
            Platform.runLater(() -> { });
            return; // already running
        } catch (IllegalStateException notStarted) {
            // start it below
        }
        if (System.getProperty("glass.platform") == null) {
            System.setProperty("glass.platform", "Monocle");
            System.setProperty("monocle.platform", "Headless");
        }
        if (System.getProperty("prism.order") == null) {
            System.setProperty("prism.order", "sw");
        }
        // JavaFX warns that it runs from the class path, not as modules: true and harmless here
        // (the launcher's class path), so that one start-up warning is not shown to the user.
        FX_LOGGER.setLevel(java.util.logging.Level.SEVERE);
        CompletableFuture<Void> started = new CompletableFuture<>();
        try {
            Platform.startup(() -> started.complete(null));
        } catch (IllegalStateException alreadyStarted) {
            return;
        }
        Platform.setImplicitExit(false);
        try {
            started.get(60, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (ExecutionException | TimeoutException e) {
            throw new IllegalStateException("the JavaFX toolkit did not start: " + e.getMessage(), e);
        }
    }
}
