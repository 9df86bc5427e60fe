package org.sightwork.celestial.ui.drill;

import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.Track;

/**
 * The drill mode's state: the drill open, its key and true track (loaded, not shown), the grades
 * of the answers loaded, the student shown, and whether the truth is revealed. The truth is drawn
 * only while {@link #revealed()} is true; opening another drill hides it again.
 *
 * <p><b>Thread:</b> JavaFX application thread only.
 */
public final class DrillState {

    private final ObjectProperty<Optional<DrillFiles>> files = new SimpleObjectProperty<>(Optional.empty());
    private final ObjectProperty<Optional<AnswerKey>> key = new SimpleObjectProperty<>(Optional.empty());
    private final ObjectProperty<Optional<Track>> trueTrack = new SimpleObjectProperty<>(Optional.empty());
    private final ObjectProperty<Optional<GeoPosition>> bannerAt = new SimpleObjectProperty<>(Optional.empty());
    private final ObservableList<StudentGrade> grades = FXCollections.observableArrayList();
    private final IntegerProperty selected = new SimpleIntegerProperty(-1);
    private final BooleanProperty revealed = new SimpleBooleanProperty(false);

    /** @return the drill open, if any */
    public ObjectProperty<Optional<DrillFiles>> files() {
        return files;
    }

    /** @return the answer key, when the instructor's directory is open */
    public ObjectProperty<Optional<AnswerKey>> key() {
        return key;
    }

    /** @return the true track, when the instructor's directory is open (drawn only when revealed) */
    public ObjectProperty<Optional<Track>> trueTrack() {
        return trueTrack;
    }

    /** @return where the chart's "GPS withheld" banner is written (the first DR of the sight log) */
    public ObjectProperty<Optional<GeoPosition>> bannerAt() {
        return bannerAt;
    }

    /** @return the grades of the answers loaded, in the order loaded */
    public ObservableList<StudentGrade> grades() {
        return grades;
    }

    /** @return the index of the student shown in {@link #grades()}, or -1 */
    public IntegerProperty selected() {
        return selected;
    }

    /** @return whether the truth is revealed */
    public BooleanProperty revealed() {
        return revealed;
    }

    /** @return whether a drill is open */
    public boolean isOpen() {
        return files.get().isPresent();
    }

    /** @return the grade of the student shown, if any */
    public Optional<StudentGrade> selectedGrade() {
        int i = selected.get();
        return i >= 0 && i < grades.size() ? Optional.of(grades.get(i)) : Optional.empty();
    }

    /** @return whether the truth can be drawn now: a drill open, revealed, key and true track loaded */
    public boolean truthShown() {
        return isOpen() && revealed.get() && key.get().isPresent() && trueTrack.get().isPresent();
    }

    /** Forgets the drill (another is being opened): hides the truth, drops key, track and grades. */
    void clear() {
        revealed.set(false);
        selected.set(-1);
        grades.clear();
        key.set(Optional.empty());
        trueTrack.set(Optional.empty());
        bannerAt.set(Optional.empty());
        files.set(Optional.empty());
    }
}
