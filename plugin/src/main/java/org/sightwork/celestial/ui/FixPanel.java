package org.sightwork.celestial.ui;

import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.ComboBox;
import javafx.scene.layout.VBox;

/**
 * The fix view: choose a fix; see its position, 95 % ellipse, cocked hat, every line's residual,
 * the sights rejected and why, and the geometry warnings.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
final class FixPanel extends VBox {

    private final PassageModel model;
    private final ComboBox<String> choice = new ComboBox<>();
    private final ResultsPanel results = new ResultsPanel();

    FixPanel(PassageModel model) {
        this.model = model;
        setPadding(new Insets(6));
        setSpacing(4);
        choice.setPromptText("No fix: give sights the same name in the Fix column");
        choice.setOnAction(e -> show());
        getChildren().addAll(choice, results);
        model.plot().addListener((o, was, now) -> refresh());
        refresh();
    }

    private void refresh() {
        String keep = choice.getValue();
        List<Plot.FixResult> fixes = model.plot().get().fixes();
        choice.getItems().setAll(fixes.stream().map(WorksheetText::heading).toList());
        if (keep != null && choice.getItems().contains(keep)) {
            choice.setValue(keep);
        } else if (!choice.getItems().isEmpty()) {
            choice.setValue(choice.getItems().get(choice.getItems().size() - 1));
        }
        show();
    }

    private void show() {
        int i = choice.getSelectionModel().getSelectedIndex();
        List<Plot.FixResult> fixes = model.plot().get().fixes();
        if (i < 0 || i >= fixes.size()) {
            results.show("", List.of());
            return;
        }
        results.show(WorksheetText.heading(fixes.get(i)), WorksheetText.fix(fixes.get(i), model.plot().get().sights()));
    }

    /** @return the panel's results (for tests) */
    ResultsPanel results() {
        return results;
    }
}
