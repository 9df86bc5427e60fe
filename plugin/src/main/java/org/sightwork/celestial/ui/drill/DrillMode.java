package org.sightwork.celestial.ui.drill;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ScrollPane;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.celestial.drill.DrillGrader;
import org.sightwork.celestial.drill.StudentAnswers;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Severity;
import org.sightwork.geo.track.ImportResult;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.Track;

/**
 * The drill mode of the celestial plugin: the "Drill" menu, the drill panel and the three drill
 * layers (student's fixes, key's fixes, truth).
 *
 * <ul>
 * <li><b>Open drill pack…</b>: a drill directory made by {@code sightwork drill new}, or a student
 * pack. The sight log and DR log become a passage ({@link DrillPassage}) that the plugin opens as
 * any passage; the GPS is withheld. The instructor's answer key and true track are read but not
 * drawn.</li>
 * <li><b>Load student answers…</b>: the answers CSV (docs/DRILLS.md), graded at once by
 * {@link DrillGrader}; the student's fixes are drawn.</li>
 * <li><b>Reveal truth…</b> (after a confirmation: the class cannot unsee it) draws the true track,
 * the key's fixes and the line from each student fix to the truth with its error in nm, and lists
 * the grade; <b>Hide truth</b> hides them again.</li>
 * <li><b>Close drill</b> leaves the mode (the passage stays open).</li>
 * </ul>
 *
 * <p><b>Thread:</b> JavaFX application thread; files are read and graded in the plugin's
 * background tasks.
 */
public final class DrillMode {

    private final PluginContext ctx;
    private final Consumer<Path> openPassage;
    private final DrillState state = new DrillState();
    private final DrillOverlays painters = new DrillOverlays(state);
    private final List<Overlay> overlays = new ArrayList<>();
    private DrillPanel panel;

    private DrillMode(PluginContext ctx, Consumer<Path> openPassage) {
        this.ctx = ctx;
        this.openPassage = openPassage;
    }

    /**
     * Installs the drill mode: its layers, and (with a window) its panel and the "Drill" menu.
     *
     * @param ctx the plugin's context
     * @param openPassage opens a passage file in the plugin (as "Open passage…" does)
     * @return the drill mode
     */
    public static DrillMode install(PluginContext ctx, Consumer<Path> openPassage) {
        DrillMode m = new DrillMode(ctx, openPassage);
        // Each new layer goes on top: the truth last, so that nothing hides it once revealed.
        m.overlays.add(ctx.addOverlay("Drill: student's fixes", m.painters::paintStudentFixes));
        m.overlays.add(ctx.addOverlay("Drill: key's fixes", m.painters::paintKeyFixes));
        m.overlays.add(ctx.addOverlay("Drill: truth (true track, true positions)", m.painters::paintTruth));
        Runnable repaint = ctx::requestRepaint;
        m.state.revealed().addListener((o, a, b) -> repaint.run());
        m.state.selected().addListener((o, a, b) -> repaint.run());
        m.state.files().addListener((o, a, b) -> repaint.run());
        m.state.grades().addListener((javafx.collections.ListChangeListener<StudentGrade>) c -> repaint.run());
        if (!ctx.isHeadless()) {
            m.panel = new DrillPanel(m.state, m::openDialog, m::answersDialog, m::revealOrHide);
            ScrollPane s = new ScrollPane(m.panel);
            s.setFitToWidth(true);
            s.setPrefViewportHeight(420);
            ctx.addPanel("Drill", s);
            ctx.addCommand("Drill", "Open drill pack…", m::openDialog);
            ctx.addCommand("Drill", "Load student answers…", m::answersDialog);
            ctx.addCommand("Drill", "Reveal truth…", m::confirmAndReveal);
            ctx.addCommand("Drill", "Hide truth", m::hide);
            ctx.addCommand("Drill", "Close drill", m::close);
        }
        return m;
    }

    /** @return the state */
    public DrillState state() {
        return state;
    }

    /** @return what the truth layer drew at its last frame: zero while hidden */
    public int truthFiguresPainted() {
        return painters.truthFiguresPainted();
    }

    /** What a drill pack gives, read off the FX thread. */
    private record Opened(DrillFiles files, Optional<AnswerKey> key, Optional<Track> track,
            DrillPassage.Written passage, List<String> notes) {
    }

    /**
     * Opens a drill pack: reads it on a worker thread, writes the drill's passage, and opens it in
     * the plugin; the truth is hidden.
     *
     * @param dir the directory chosen
     * @return done when the drill is open (on the FX thread); failed with the reason, which is
     *     also notified
     */
    public CompletableFuture<DrillState> open(Path dir) {
        Path user = ctx.userDirectory();
        return ctx.runInBackground("Opening drill pack", progress -> {
            DrillFiles f = DrillFiles.locate(dir);
            List<String> notes = new ArrayList<>();
            Optional<AnswerKey> key = f.answerKey().isPresent()
                    ? Optional.of(AnswerKeyIo.read(f.answerKey().get())) : Optional.empty();
            Optional<Track> track = Optional.empty();
            if (f.trueTrack().isPresent()) {
                ImportResult<Track> r = NmeaTrackReader.read(f.trueTrack().get(), NmeaTrackReader.Options.DEFAULT);
                if (r.problemCount() > 0) {
                    notes.add(f.trueTrack().get().getFileName() + ": " + r.problemCount() + " line(s) left out"
                            + (r.problems().isEmpty() ? "" : ", first: " + r.problems().get(0)));
                }
                track = Optional.of(r.value());
            }
            DrillPassage.Written w = DrillPassage.write(f, key, DrillPassage.target(user, f));
            return new Opened(f, key, track, w, notes);
        }).thenApplyAsync(o -> {
            state.clear();
            state.key().set(o.key());
            state.trueTrack().set(o.track());
            state.bannerAt().set(o.passage().firstDr());
            state.files().set(Optional.of(o.files()));
            openPassage.accept(o.passage().file());
            ctx.notify(Severity.INFO, "Drill opened: " + o.passage().sights() + " sights, " + o.passage().fixes().size()
                    + " fix(es) to work; GPS withheld"
                    + (o.files().isInstructorsCopy() ? " (answer key loaded, truth hidden)." : " (student pack)."));
            List<String> notes = new ArrayList<>(o.passage().notes());
            notes.addAll(o.notes());
            if (!notes.isEmpty()) {
                ctx.notify(Severity.WARNING, String.join("; ", notes));
            }
            return state;
        }, Platform::runLater);
    }

    /**
     * Loads and grades students' answers (each replaces an earlier one of the same student); the
     * last is shown.
     *
     * @param files the answers CSV files
     * @return done when graded (on the FX thread)
     */
    public CompletableFuture<DrillState> loadAnswers(List<Path> files) {
        Optional<AnswerKey> key = state.key().get();
        if (key.isEmpty()) {
            String why = state.isOpen() ? "this is a student pack: grading needs the answer key; open the instructor's "
                    + "drill directory (with key/" + DrillFiles.ANSWER_KEY + ")" : "open a drill pack first";
            ctx.notify(Severity.WARNING, "Student answers not loaded: " + why + ".");
            return CompletableFuture.failedFuture(new IllegalStateException(why));
        }
        AnswerKey k = key.get();
        return ctx.runInBackground("Grading answers", progress -> {
            List<StudentGrade> grades = new ArrayList<>();
            for (Path f : files) {
                grades.add(DrillGrader.grade(k, StudentAnswers.read(f)));
            }
            return grades;
        }).thenApplyAsync(grades -> {
            for (StudentGrade g : grades) {
                int same = -1;
                for (int i = 0; i < state.grades().size(); i++) {
                    if (state.grades().get(i).student().equals(g.student())) {
                        same = i;
                    }
                }
                if (same >= 0) {
                    state.grades().set(same, g);
                } else {
                    state.grades().add(g);
                }
                if (!g.problems().isEmpty()) {
                    ctx.notify(Severity.WARNING, g.file() + ": " + String.join("; ", g.problems()));
                }
            }
            if (!grades.isEmpty()) {
                String last = grades.get(grades.size() - 1).student();
                for (int i = 0; i < state.grades().size(); i++) {
                    if (state.grades().get(i).student().equals(last)) {
                        state.selected().set(i);
                    }
                }
            }
            ctx.notify(Severity.INFO, grades.size() + " student answer file(s) graded"
                    + (state.revealed().get() ? "." : "; the grade shows when the truth is revealed."));
            return state;
        }, Platform::runLater);
    }

    /**
     * Reveals the truth, without asking (the menu and the button ask first).
     *
     * @return whether it is now shown (false when the drill has no key or true track)
     */
    public boolean reveal() {
        if (!state.isOpen() || state.key().get().isEmpty() || state.trueTrack().get().isEmpty()) {
            ctx.notify(Severity.WARNING, "Nothing to reveal: the truth is in the instructor's drill directory "
                    + "(key/" + DrillFiles.ANSWER_KEY + " and key/" + DrillFiles.TRUE_TRACK + "); open that.");
            return false;
        }
        state.revealed().set(true);
        return true;
    }

    /** Hides the truth again. */
    public void hide() {
        state.revealed().set(false);
    }

    /** Leaves the drill mode: the drill layers are emptied (the passage stays open in the plugin). */
    public void close() {
        if (state.isOpen()) {
            state.clear();
            ctx.notify(Severity.INFO, "Drill closed; the drill's passage stays open as a passage.");
        }
    }

    private void revealOrHide() {
        if (state.revealed().get()) {
            hide();
        } else {
            confirmAndReveal();
        }
    }

    private void confirmAndReveal() {
        if (state.revealed().get()) {
            return;
        }
        if (!state.isOpen() || state.key().get().isEmpty() || state.trueTrack().get().isEmpty()) {
            reveal();
            return;
        }
        ButtonType yes = new ButtonType("Reveal the truth", ButtonBar.ButtonData.OK_DONE);
        ButtonType no = new ButtonType("Not yet", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The true track (the withheld GPS) and the key's fixes "
                + "will be drawn on the chart, with each student's error. What the class has seen cannot be unseen: "
                + "reveal only when every answer is in.", yes, no);
        a.setTitle("Reveal the truth");
        a.setHeaderText("Reveal the truth of this drill?");
        if (window() != null) {
            a.initOwner(window());
        }
        ((javafx.scene.control.Button) a.getDialogPane().lookupButton(no)).setDefaultButton(true);
        ((javafx.scene.control.Button) a.getDialogPane().lookupButton(yes)).setDefaultButton(false);
        if (a.showAndWait().filter(b -> b == yes).isPresent()) {
            reveal();
        }
    }

    private javafx.stage.Window window() {
        return panel == null || panel.getScene() == null ? null : panel.getScene().getWindow();
    }

    private void openDialog() {
        DirectoryChooser dc = new DirectoryChooser();
        dc.setTitle("Open drill pack (the drill directory, or its student folder)");
        File f = dc.showDialog(window());
        if (f != null) {
            open(f.toPath());
        }
    }

    private void answersDialog() {
        if (state.key().get().isEmpty()) {
            loadAnswers(List.of());
            return;
        }
        FileChooser fc = new FileChooser();
        fc.setTitle("Load student answers");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Drill answers (CSV)", "*.csv"));
        state.files().get().ifPresent(f -> fc.setInitialDirectory(f.root().toFile()));
        List<File> fs = fc.showOpenMultipleDialog(window());
        if (fs != null && !fs.isEmpty()) {
            loadAnswers(fs.stream().map(File::toPath).toList());
        }
    }
}
