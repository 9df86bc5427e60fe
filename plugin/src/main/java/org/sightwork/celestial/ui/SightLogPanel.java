package org.sightwork.celestial.ui;

import java.util.Locale;
import java.util.Optional;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.control.cell.CheckBoxTableCell;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.sightwork.celestial.reduction.LineOfPosition;

/**
 * The sight log editor: a table with a row per sight and a column per quantity (units in the
 * headings). A cell is checked as it is typed: a bad value turns the cell red and its reason shows
 * under the table and in the cell's tooltip; the good cells of the row are kept. A new row carries
 * the previous row's height of eye, index error, watch error, temperature, pressure and DR.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
final class SightLogPanel extends VBox {

    /** What the next chart click does. */
    enum ClickMode { SELECT, PICK_DR, PICK_AP }

    private static final String BAD_CELL = "-fx-background-color: #ffd6d6; -fx-text-fill: #8a0000;";

    private final PassageModel model;
    private final TableView<SightRow> table = new TableView<>();
    private final ObservableList<SightRow> rows = FXCollections.observableArrayList();
    private final Label status = new Label();
    private final ToggleGroup clickModes = new ToggleGroup();
    private final ToggleButton pickDr = new ToggleButton("Pick DR on chart");
    private final ToggleButton pickAp = new ToggleButton("Pick AP on chart");
    private boolean syncing;

    SightLogPanel(PassageModel model) {
        this.model = model;
        setSpacing(6);
        setPadding(new Insets(6));
        table.setEditable(true);
        table.setItems(rows);
        table.setPlaceholder(new Label("No sights yet: press Add sight"));
        table.setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
        table.setPrefHeight(260);
        for (SightColumn c : SightColumn.values()) {
            TableColumn<SightRow, String> col = new TableColumn<>(c.heading());
            col.setUserData(c);
            col.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(cd.getValue().get(c)));
            col.setCellFactory(tc -> new CheckedCell(c));
            col.setPrefWidth(switch (c) {
                case TIME -> 150;
                case DR, AP -> 175;
                case HS -> 90;
                case BODY -> 80;
                default -> 62;
            });
            col.setSortable(false);
            table.getColumns().add(col);
        }
        TableColumn<SightRow, Boolean> circle = new TableColumn<>("Circle");
        circle.setEditable(true);
        circle.setSortable(false);
        circle.setCellValueFactory(cd -> {
            SightRow r = cd.getValue();
            SimpleBooleanProperty p = new SimpleBooleanProperty(r.circleWanted());
            p.addListener((o, was, now) -> {
                r.setCircleWanted(now);
                model.edited();
            });
            return p;
        });
        circle.setCellFactory(CheckBoxTableCell.forTableColumn(circle));
        circle.setPrefWidth(52);
        table.getColumns().add(circle);
        TableColumn<SightRow, String> result = new TableColumn<>("Line (nm, Zn)");
        result.setSortable(false);
        result.setEditable(false);
        result.setPrefWidth(190);
        result.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(resultOf(rows.indexOf(cd.getValue()))));
        table.getColumns().add(result);

        table.getSelectionModel().selectedIndexProperty().addListener((o, was, now) -> {
            if (!syncing) {
                model.selectedRow().set(now.intValue());
            }
        });
        model.selectedRow().addListener((o, was, now) -> {
            syncing = true;
            try {
                if (now.intValue() >= 0 && now.intValue() < rows.size()) {
                    table.getSelectionModel().select(now.intValue());
                    table.scrollTo(now.intValue());
                } else {
                    table.getSelectionModel().clearSelection();
                }
            } finally {
                syncing = false;
            }
        });
        model.plot().addListener((o, was, now) -> {
            table.refresh();
            showStatus();
        });
        model.addPassageListener(this::reload);

        Button add = new Button("Add sight");
        add.setOnAction(e -> addSight());
        Button delete = new Button("Delete sight");
        delete.setOnAction(e -> deleteSelected());
        pickDr.setToggleGroup(clickModes);
        pickAp.setToggleGroup(clickModes);
        pickDr.setTooltip(new Tooltip("The next click on the chart sets the DR of the selected sight"));
        pickAp.setTooltip(new Tooltip("The next click on the chart sets the AP of the selected sight"));
        // A flow, not a row: the dock may be narrow, and a cut-off button label helps no one.
        javafx.scene.layout.FlowPane buttons = new javafx.scene.layout.FlowPane(6, 4, add, delete, pickDr, pickAp);
        status.setWrapText(true);
        status.setMinHeight(36);
        VBox.setVgrow(table, Priority.ALWAYS);
        getChildren().addAll(buttons, table, status);
        reload();
    }

    /** @return the table (for tests) */
    TableView<SightRow> table() {
        return table;
    }

    ClickMode clickMode() {
        if (pickDr.isSelected()) {
            return ClickMode.PICK_DR;
        }
        return pickAp.isSelected() ? ClickMode.PICK_AP : ClickMode.SELECT;
    }

    /** The chart was clicked in a pick mode: puts the position in the selected row. */
    void picked(SightColumn c, org.sightwork.geo.earth.GeoPosition at) {
        int i = model.selectedRow().get();
        clickModes.selectToggle(null);
        if (i < 0 || i >= rows.size()) {
            status.setText("Select a sight first, then pick its " + (c == SightColumn.DR ? "DR" : "AP") + " on the chart.");
            return;
        }
        setCell(i, c, SightRowReader.formatPosition(at));
    }

    /**
     * Sets a cell as if typed and committed (the editor's path, for the chart and for tests).
     *
     * @param row the row
     * @param c the column
     * @param text the text
     */
    void setCell(int row, SightColumn c, String text) {
        rows.get(row).set(c, text);
        model.edited();
    }

    void addSight() {
        SightRow r = rows.isEmpty() ? new SightRow() : SightRow.carriedFrom(rows.get(rows.size() - 1));
        model.passage().rows().add(r);
        rows.add(r);
        model.edited();
        int i = rows.size() - 1;
        table.getSelectionModel().select(i);
        table.scrollTo(i);
        table.requestFocus();
        // Start editing the new row's Body cell once the table has laid the row out (an edit asked
        // for before the cell exists is lost, and the navigator's typing with it).
        javafx.application.Platform.runLater(() -> {
            table.layout();
            table.edit(i, table.getColumns().get(0));
        });
    }

    private void deleteSelected() {
        int i = table.getSelectionModel().getSelectedIndex();
        if (i >= 0) {
            model.passage().rows().remove(i);
            rows.remove(i);
            model.edited();
        }
    }

    private void reload() {
        rows.setAll(model.passage().rows());
        showStatus();
    }

    private void showStatus() {
        long bad = model.plot().get().sights().stream().filter(s -> s.problem().isPresent()).count();
        Optional<Plot.SightResult> sel = model.selectedResult();
        if (sel.isPresent() && sel.get().problem().isPresent()) {
            status.setText("Row " + (sel.get().row() + 1) + ": " + sel.get().problem().get());
        } else if (bad > 0) {
            status.setText(bad + " row(s) not worked: select one to see why (red cells show the reason as a tooltip).");
        } else if (!model.ready()) {
            status.setText("Loading the almanac…");
        } else {
            status.setText(rows.size() + " sight(s). Click a line on the chart to select its sight.");
        }
    }

    private String resultOf(int row) {
        var sights = model.plot().get().sights();
        if (row < 0 || row >= sights.size()) {
            return "";
        }
        Plot.SightResult s = sights.get(row);
        if (s.reduced().isPresent()) {
            LineOfPosition l = s.reduced().get().lop();
            return String.format(Locale.ROOT, "%.1f %s  Zn %03.0f°", Math.abs(l.interceptNm()),
                    l.isToward() ? "toward" : "away", l.znDeg());
        }
        return "not worked";
    }

    /** A text cell that checks its value as it is typed. */
    private final class CheckedCell extends TableCell<SightRow, String> {
        private final SightColumn column;
        private TextField field;

        CheckedCell(SightColumn column) {
            this.column = column;
        }

        @Override
        public void startEdit() {
            if (model.readOnly().get()) {
                status.setText("This passage is open read-only: save it under a new name to edit.");
                return;
            }
            super.startEdit();
            field = new TextField(getItem());
            field.textProperty().addListener((o, was, now) -> check(now));
            field.setOnAction(e -> commitEdit(field.getText()));
            field.setOnKeyPressed(e -> {
                if (e.getCode() == KeyCode.ESCAPE) {
                    cancelEdit();
                }
            });
            field.focusedProperty().addListener((o, was, now) -> {
                if (!now && isEditing()) {
                    commitEdit(field.getText());
                }
            });
            setText(null);
            setGraphic(field);
            field.selectAll();
            field.requestFocus();
            check(field.getText());
        }

        private void check(String text) {
            SightRow probe = getTableRow().getItem().copy();
            probe.set(column, text);
            String why = SightRowReader.read(probe, model.passage().day()).problems().get(column);
            if (why == null) {
                field.setStyle("");
                field.setTooltip(new Tooltip(column.hint()));
                status.setText(column.heading() + ": " + column.hint());
            } else {
                field.setStyle(BAD_CELL);
                field.setTooltip(new Tooltip(why));
                status.setText(column.heading() + ": " + why);
            }
        }

        @Override
        public void commitEdit(String value) {
            super.commitEdit(value);
            int i = getIndex();
            if (i >= 0 && i < rows.size()) {
                setCell(i, column, value);
            }
        }

        @Override
        public void cancelEdit() {
            super.cancelEdit();
            show(getItem(), false);
        }

        @Override
        protected void updateItem(String item, boolean empty) {
            super.updateItem(item, empty);
            show(item, empty);
        }

        private void show(String item, boolean empty) {
            setGraphic(null);
            if (empty || getTableRow() == null || getTableRow().getItem() == null) {
                setText(null);
                setStyle("");
                setTooltip(null);
                return;
            }
            setText(item);
            int i = getIndex();
            var sights = model.plot().get().sights();
            String why = i >= 0 && i < sights.size() ? sights.get(i).read().problems().get(column) : null;
            if (why != null) {
                setStyle(BAD_CELL);
                setTooltip(new Tooltip(why));
            } else {
                setStyle("");
                setTooltip(new Tooltip(column.hint()));
            }
        }
    }
}
