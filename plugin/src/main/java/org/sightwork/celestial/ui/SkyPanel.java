package org.sightwork.celestial.ui;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicLong;
import javafx.application.Platform;
import javafx.beans.property.ObjectProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.planning.SelectionCriteria;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.celestial.planning.StarSelector;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The "Sky" panel: the sky at the passage-time cursor as seen from the DR then ({@link SkyView}:
 * every navigational body above the horizon, the proposed set of three ringed), or, with no cursor,
 * at the time of the selected sight. The plan is worked out on a worker thread of its own; when the
 * slider moves faster than plans are made, only the latest time is drawn.
 *
 * <p><b>Thread:</b> JavaFX application thread, but for the plan's computation.
 */
final class SkyPanel extends VBox {

    private static final DateTimeFormatter DHM = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);
    /** Size of the sky picture (pixels): fits the side dock. */
    static final double SIZE_PX = 320;

    private final PassageModel model;
    private final ObjectProperty<Instant> time;
    private final SkyView view = new SkyView(SIZE_PX);
    private final Label caption = new Label();
    private final AtomicLong request = new AtomicLong();
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "sky plan");
        t.setDaemon(true);
        return t;
    });
    private StarSelector selector;

    SkyPanel(PassageModel model, ObjectProperty<Instant> passageTime) {
        this.model = model;
        this.time = passageTime;
        setPadding(new Insets(6));
        setSpacing(4);
        caption.setWrapText(true);
        getChildren().addAll(caption, view);
        time.addListener((o, was, now) -> refresh());
        model.selectedRow().addListener((o, was, now) -> refresh());
        model.plot().addListener((o, was, now) -> refresh());
        refresh();
    }

    /** @return the sky view (for tests) */
    SkyView view() {
        return view;
    }

    /** @return the caption (for tests) */
    Label caption() {
        return caption;
    }

    /** The time shown: the cursor, else the selected sight's time. */
    private Optional<Instant> when() {
        if (time.get() != null) {
            return Optional.of(time.get());
        }
        return model.selectedResult().flatMap(Plot.SightResult::utc);
    }

    private void refresh() {
        Optional<Instant> t = when();
        if (t.isEmpty()) {
            caption.setText("Sky: move the passage-time slider (or select a sight) to see the sky then.");
            return;
        }
        Optional<GeoPosition> dr = PlotComputer.drAt(model.passage().drLog(), t.get());
        if (dr.isEmpty()) {
            dr = model.selectedResult().flatMap(s -> s.reduced()).map(r -> r.lop().ap());
        }
        if (dr.isEmpty()) {
            caption.setText("Sky at " + DHM.format(t.get()) + ": no DR for that time (outside the DR log).");
            return;
        }
        Instant at = t.get();
        GeoPosition from = dr.get();
        long mine = request.incrementAndGet();
        caption.setText("Sky at " + DHM.format(at) + " from the DR " + SightRowReader.formatPosition(from) + " (working…)");
        worker.submit(() -> {
            if (request.get() != mine) {
                return; // a later time is wanted
            }
            if (selector == null) {
                selector = new StarSelector(Almanac.standard());
            }
            SightPlan plan = selector.plan(at, from, SelectionCriteria.DEFAULT);
            Platform.runLater(() -> {
                if (request.get() == mine) {
                    view.setPlan(plan);
                    caption.setText(String.format(Locale.ROOT, "Sky at %s from the DR %s: Sun %+.1f°, %d bodies up%s",
                            DHM.format(at), SightRowReader.formatPosition(from), plan.sunAltitudeDeg(),
                            plan.visible().size(), plan.firstNote().map(n -> "; " + n).orElse("")));
                }
            });
        });
    }

    /** Stops the worker. */
    void stop() {
        worker.shutdownNow();
    }
}
