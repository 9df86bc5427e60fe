package org.sightwork.celestial.ui.drill;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.sightwork.celestial.drill.StudentGrade;

/**
 * The drill panel: a banner that says what the class sees ("Drill: GPS withheld" or "Drill: truth
 * revealed"), the drill's files, the buttons, the student shown, and, once revealed, the grader's
 * table (per fix: the student's fix, the key's fix, the truth, the errors in nm, the points and
 * the mistakes), its comments and the score.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
public final class DrillPanel extends VBox {

    /** Banner style while the truth is withheld: dark on amber, readable across a classroom. */
    private static final String WITHHELD_STYLE = "-fx-background-color: #ffd27a; -fx-text-fill: #3a2000;"
            + " -fx-font-weight: bold; -fx-padding: 6 8 6 8;";
    /** Banner style once revealed: white on green (the truth colour). */
    private static final String REVEALED_STYLE = "-fx-background-color: #137a2a; -fx-text-fill: white;"
            + " -fx-font-weight: bold; -fx-padding: 6 8 6 8;";
    private static final String IDLE_STYLE = "-fx-padding: 6 8 6 8;";

    private final DrillState state;
    private final Label banner = new Label();
    private final Label filesText = new Label();
    private final Label score = new Label();
    private final ChoiceBox<String> student = new ChoiceBox<>();
    private final TableView<DrillRow> table = new TableView<>();
    private final TextArea comments = new TextArea();
    private List<String> commentLines = List.of();
    private final Button reveal = new Button();
    private boolean updating;

    /**
     * @param state the drill state
     * @param open opens a drill pack (asks for the directory)
     * @param loadAnswers loads students' answers (asks for the files)
     * @param revealOrHide reveals the truth after a confirmation, or hides it
     */
    public DrillPanel(DrillState state, Runnable open, Runnable loadAnswers, Runnable revealOrHide) {
        this.state = state;
        setSpacing(6);
        setPadding(new Insets(6));
        banner.setMaxWidth(Double.MAX_VALUE);
        banner.setWrapText(true);
        filesText.setWrapText(true);
        score.setStyle("-fx-font-weight: bold;");
        Button openB = new Button("Open drill pack…");
        openB.setOnAction(e -> open.run());
        Button answersB = new Button("Load student answers…");
        answersB.setOnAction(e -> loadAnswers.run());
        reveal.setOnAction(e -> revealOrHide.run());
        HBox buttons = new HBox(6, openB, answersB, reveal);
        student.setOnAction(e -> {
            if (!updating) {
                state.selected().set(student.getSelectionModel().getSelectedIndex());
            }
        });
        HBox who = new HBox(6, new Label("Student:"), student, score);
        table.getColumns().add(column("Fix", DrillRow::fixText, 190));
        table.getColumns().add(column("Student", DrillRow::studentText, 160));
        table.getColumns().add(column("Key fix", DrillRow::keyText, 160));
        table.getColumns().add(column("Truth", DrillRow::truthText, 160));
        table.getColumns().add(column("From key (nm)", DrillRow::errorFromKeyText, 90));
        table.getColumns().add(column("From truth (nm)", DrillRow::errorFromTruthText, 100));
        table.getColumns().add(column("Points", DrillRow::pointsText, 60));
        table.getColumns().add(column("Mistakes", DrillRow::mistakesText, 260));
        table.setPrefHeight(150);
        comments.setPrefHeight(120);
        comments.setEditable(false);
        comments.setWrapText(true);
        VBox.setVgrow(comments, Priority.ALWAYS);
        getChildren().addAll(banner, filesText, buttons, who, table, new Label("The grader's comments:"), comments);
        state.files().addListener((o, a, b) -> refresh());
        state.key().addListener((o, a, b) -> refresh());
        state.trueTrack().addListener((o, a, b) -> refresh());
        state.revealed().addListener((o, a, b) -> refresh());
        state.selected().addListener((o, a, b) -> refresh());
        state.grades().addListener((javafx.collections.ListChangeListener<StudentGrade>) c -> refresh());
        refresh();
    }

    private static TableColumn<DrillRow, String> column(String title, Function<DrillRow, String> text, double width) {
        TableColumn<DrillRow, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setPrefWidth(width);
        c.setSortable(false);
        return c;
    }

    /** @return the table's rows as shown (for tests) */
    public List<DrillRow> rows() {
        return List.copyOf(table.getItems());
    }

    /** @return the comments as shown (for tests) */
    public List<String> comments() {
        return commentLines;
    }

    /** @return the banner's text */
    public String bannerText() {
        return banner.getText();
    }

    /** @return the score line as shown */
    public String scoreText() {
        return score.getText();
    }

    private void showComments(List<String> lines) {
        commentLines = List.copyOf(lines);
        comments.setText(lines.isEmpty() ? "" : "• " + String.join("\n• ", lines));
    }

    private void refresh() {
        updating = true;
        try {
            boolean open = state.isOpen();
            boolean shown = state.truthShown();
            if (!open) {
                banner.setText("No drill open: Drill ▸ Open drill pack…");
                banner.setStyle(IDLE_STYLE);
            } else if (shown) {
                banner.setText("Drill: truth revealed (true track and key's fixes on the chart)");
                banner.setStyle(REVEALED_STYLE);
            } else {
                banner.setText(DrillOverlays.BANNER + " (true track and key hidden)");
                banner.setStyle(WITHHELD_STYLE);
            }
            filesText.setText(state.files().get().map(f -> "Pack: " + f.root() + "\nAnswer key: "
                    + (f.isInstructorsCopy() ? "here (instructor's copy)" : "not in this pack (student pack)"))
                    .orElse(""));
            reveal.setText(state.revealed().get() ? "Hide truth" : "Reveal truth…");
            reveal.setDisable(!open || state.key().get().isEmpty());
            List<String> names = new ArrayList<>();
            state.grades().forEach(g -> names.add(g.student()));
            if (!student.getItems().equals(names)) {
                student.getItems().setAll(names);
            }
            student.getSelectionModel().select(state.selected().get());
            StudentGrade g = state.selectedGrade().orElse(null);
            if (g == null) {
                table.getItems().clear();
                showComments(List.of());
                score.setText("");
                table.setPlaceholder(new Label(open && state.key().get().isPresent()
                        ? "Load a student's answers (Drill ▸ Load student answers…)" : ""));
            } else if (!shown) {
                table.getItems().clear();
                showComments(List.of());
                score.setText(String.format(Locale.ROOT, "%d fix(es) handed in", g.fixes().stream()
                        .filter(f -> f.student().isPresent()).count()));
                table.setPlaceholder(new Label("Graded; reveal the truth to see the grade (Drill ▸ Reveal truth…)"));
            } else {
                table.getItems().setAll(DrillRow.of(g));
                List<String> all = new ArrayList<>(g.comments());
                g.problems().forEach(p -> all.add("Not read: " + p));
                showComments(all);
                score.setText(String.format(Locale.ROOT, "score %.1f / 100%s", g.score(),
                        g.fixesOnly() ? " (fixes only)" : ""));
            }
        } finally {
            updating = false;
        }
    }
}
