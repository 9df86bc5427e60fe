package org.sightwork.celestial.ui;

import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.sightwork.celestial.io.export.WorksheetReport;

/**
 * Shows labelled lines (a worksheet or a fix) under a heading; warnings and rejected sights stand
 * out in their own colour.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
class ResultsPanel extends VBox {

    private final Label heading = new Label();
    private final GridPane grid = new GridPane();

    ResultsPanel() {
        setPadding(new Insets(6));
        setSpacing(4);
        heading.setStyle("-fx-font-weight: bold;");
        grid.setHgap(12);
        grid.setVgap(2);
        ColumnConstraints labels = new ColumnConstraints();
        labels.setMinWidth(210);
        grid.getColumnConstraints().add(labels);
        getChildren().addAll(heading, grid);
    }

    void show(String title, List<WorksheetReport.Row> rows) {
        heading.setText(title);
        grid.getChildren().clear();
        for (int i = 0; i < rows.size(); i++) {
            Label l = new Label(rows.get(i).label());
            Label v = new Label(rows.get(i).value());
            v.setWrapText(true);
            v.setMaxWidth(330);
            String text = rows.get(i).label() + rows.get(i).value();
            if (text.contains("REJECTED") || rows.get(i).label().equals("Warning")
                    || rows.get(i).label().startsWith("No fix") || rows.get(i).label().startsWith("Not worked")) {
                v.setStyle("-fx-text-fill: #a00000;");
            }
            grid.addRow(i, l, v);
        }
    }

    /** @return the heading text (for tests) */
    String headingText() {
        return heading.getText();
    }
}
