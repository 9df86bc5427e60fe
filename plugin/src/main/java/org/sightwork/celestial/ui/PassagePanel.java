package org.sightwork.celestial.ui;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.property.ObjectProperty;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Slider;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.Track;

/**
 * The passage view: the passage time slider (which moves the shared passage-time cursor, hence the
 * DR marker and the lines shown), the DR legs (time, heading, speed, leeway), the GPS track loaded,
 * and the set and drift worked out between fixes.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
final class PassagePanel extends VBox {

    private static final DateTimeFormatter HM = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter DHM = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final PassageModel model;
    private final ObjectProperty<Instant> time;
    private final Slider slider = new Slider(0, 1, 0);
    private final Label timeLabel = new Label("All times shown");
    private final ListView<String> legs = new ListView<>();
    private final Label gps = new Label();
    private final ListView<String> setDrift = new ListView<>();
    private boolean syncing;

    PassagePanel(PassageModel model, ObjectProperty<Instant> passageTime) {
        this.model = model;
        this.time = passageTime;
        setPadding(new Insets(6));
        setSpacing(4);
        slider.setBlockIncrement(1.0 / 96);
        Button all = new Button("Show all");
        all.setOnAction(e -> time.set(null));
        HBox.setHgrow(slider, Priority.ALWAYS);
        HBox sliderRow = new HBox(6, slider, all);
        slider.valueProperty().addListener((o, was, now) -> {
            if (!syncing) {
                span().ifPresent(s -> time.set(s[0].plusSeconds(Math.round(now.doubleValue()
                        * Duration.between(s[0], s[1]).toSeconds()))));
            }
        });
        time.addListener((o, was, now) -> showTime(now));
        legs.setPrefHeight(110);
        setDrift.setPrefHeight(80);
        getChildren().addAll(new Label("Passage time (moves the DR marker; shows the lines of the 3 h before)"),
                sliderRow, timeLabel, new Label("DR legs: start (UTC), heading (°T), speed through water (kn), leeway (°)"),
                legs, gps, new Label("Set and drift between fixes"), setDrift);
        model.plot().addListener((o, was, now) -> refresh());
        model.addPassageListener(this::refresh);
        refresh();
    }

    /** @return the slider (for tests) */
    Slider slider() {
        return slider;
    }

    private Optional<Instant[]> span() {
        Plot p = model.plot().get();
        if (p.drTrack().size() >= 2) {
            return Optional.of(new Instant[] {p.drTrack().get(0).utc(), p.drTrack().get(p.drTrack().size() - 1).utc()});
        }
        return p.gps().filter(t -> t.size() >= 2).map(t -> new Instant[] {t.time(0), t.time(t.size() - 1)});
    }

    private void showTime(Instant t) {
        if (t == null) {
            timeLabel.setText("All times shown (move the slider to follow the passage)");
            return;
        }
        timeLabel.setText("Passage time " + DHM.format(t));
        span().ifPresent(s -> {
            syncing = true;
            try {
                double f = Duration.between(s[0], t).toSeconds() / (double) Duration.between(s[0], s[1]).toSeconds();
                slider.setValue(Math.max(0, Math.min(1, f)));
            } finally {
                syncing = false;
            }
        });
    }

    private void refresh() {
        legs.getItems().clear();
        Optional<DrLog> log = model.passage().drLog();
        if (log.isEmpty()) {
            legs.getItems().add("No DR log: lines are worked from the DR typed in each row.");
        } else {
            legs.getItems().add("Departure " + SightRowReader.formatPosition(log.get().departure()));
            for (DrLeg leg : log.get().legs()) {
                legs.getItems().add(String.format(Locale.ROOT, "%s   %03.0f°   %4.1f kn   leeway %+.0f°",
                        HM.format(leg.start()), leg.headingDeg(), leg.stwKn(), leg.leewayDeg()));
            }
            legs.getItems().add("End " + HM.format(log.get().end()));
        }
        Optional<Track> track = model.passage().gps();
        gps.setText(track.map(t -> String.format(Locale.ROOT, "GPS track: %d points, %s to %s", t.size(),
                HM.format(t.time(0)), HM.format(t.time(t.size() - 1)))).orElse("GPS track: none loaded"));
        setDrift.getItems().clear();
        for (Plot.SetDrift sd : model.plot().get().setDrifts()) {
            setDrift.getItems().add(String.format(Locale.ROOT, "%s → %s   set %03.0f°   drift %.1f kn",
                    HM.format(sd.from()), HM.format(sd.to()), sd.setDeg(), sd.driftKn()));
        }
        if (setDrift.getItems().isEmpty()) {
            setDrift.getItems().add("Needs two fixes and a DR log.");
        }
        showTime(time.get());
    }
}
