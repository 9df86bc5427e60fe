package org.sightwork.celestial.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;

/**
 * The plugin's state on the JavaFX application thread: the passage being edited, its worked-out
 * {@link Plot}, the selected sight, the file it came from and whether it may be saved over.
 *
 * <p>Every edit goes through {@link #edited()}, which works the plot out again (a dozen sights take
 * a few milliseconds) and tells the listeners; the overlays repaint from {@link #plot()}.
 *
 * <p><b>Thread:</b> JavaFX application thread only.
 */
final class PassageModel {

    private Passage passage;
    private PlotComputer computer;
    private final ObjectProperty<Plot> plot = new SimpleObjectProperty<>(Plot.EMPTY);
    private final IntegerProperty selectedRow = new SimpleIntegerProperty(-1);
    private final ObjectProperty<Optional<Path>> file = new SimpleObjectProperty<>(Optional.empty());
    private final BooleanProperty readOnly = new SimpleBooleanProperty(false);
    private final BooleanProperty dirty = new SimpleBooleanProperty(false);
    private final List<Runnable> passageListeners = new ArrayList<>();

    PassageModel(Passage passage) {
        this.passage = Objects.requireNonNull(passage, "passage");
    }

    Passage passage() {
        return passage;
    }

    /**
     * Replaces the passage (a file was opened).
     *
     * @param p the passage
     * @param from the file, if any
     * @param ro whether it must not be saved over
     */
    void replace(Passage p, Optional<Path> from, boolean ro) {
        passage = Objects.requireNonNull(p, "p");
        file.set(from);
        readOnly.set(ro);
        dirty.set(false);
        selectedRow.set(-1);
        recompute();
        passageListeners.forEach(Runnable::run);
    }

    /** Listens to a passage being replaced (the editors rebuild their rows). */
    void addPassageListener(Runnable r) {
        passageListeners.add(r);
    }

    /** Sets the computer once the almanac is loaded; works the plot out. */
    void setComputer(PlotComputer c) {
        computer = c;
        recompute();
    }

    boolean ready() {
        return computer != null;
    }

    /** Call after any change of the passage. */
    void edited() {
        dirty.set(true);
        recompute();
    }

    void recompute() {
        if (computer != null) {
            plot.set(computer.compute(passage));
        }
    }

    ObjectProperty<Plot> plot() {
        return plot;
    }

    IntegerProperty selectedRow() {
        return selectedRow;
    }

    ObjectProperty<Optional<Path>> file() {
        return file;
    }

    BooleanProperty readOnly() {
        return readOnly;
    }

    BooleanProperty dirty() {
        return dirty;
    }

    /** @return the selected row's result, if a row is selected and worked out */
    Optional<Plot.SightResult> selectedResult() {
        int i = selectedRow.get();
        List<Plot.SightResult> s = plot.get().sights();
        return i >= 0 && i < s.size() ? Optional.of(s.get(i)) : Optional.empty();
    }
}
