package org.sightwork.geo.app;

import java.io.File;
import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.animation.FadeTransition;
import javafx.animation.KeyFrame;
import javafx.animation.PauseTransition;
import javafx.animation.SequentialTransition;
import javafx.animation.Timeline;
import javafx.application.Platform;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.TextArea;
import javafx.scene.control.TitledPane;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.chart.ChartProblem;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.spi.Lighting;
import org.sightwork.geo.spi.Severity;

/**
 * The chart window: menu bar, the chart, a side dock (layer list and plugins' panels), a status bar
 * (cursor read-out, range and bearing, progress of background work) and non-blocking notifications
 * over the chart.
 *
 * <p><b>Thread contract:</b> every method runs on the JavaFX application thread except
 * {@link #notify} and {@link #requestRepaint}, which hop onto it. Nothing slow runs on it: reading
 * and preparing chart files go through {@link TaskRunner} (worker threads); the result is handed
 * back with {@code Platform.runLater}; a frame only draws prepared data.
 */
final class ChartWindow extends ShellBase {

    private static final String CAUTION_KEY = "caution.shown";
    private static final String PALETTE_KEY = "palette";

    private final Stage stage;
    private final PluginHost plugins = new PluginHost(this);
    private final Label cursorLabel = new Label();
    private final Label rangeLabel = new Label();
    private final Label taskLabel = new Label();
    private final ProgressBar progress = new ProgressBar();
    private final Button cancelTask = new Button("Stop");
    private final VBox notices = new VBox(6);
    private final VBox dock = new VBox(4);
    private final MenuBar menuBar = new MenuBar();
    private final MapView map;
    private final BorderPane root = new BorderPane();
    private final Envelope dataExtent = new Envelope();

    ChartWindow(Stage stage) {
        this.stage = stage;
        map = new MapView(model, this, cursorLabel::setText, rangeLabel::setText);
        model.layers().add(BundledChart.graticuleEntry());
        model.layers().add(0, BundledChart.namesEntry(model));
        model.layers().addListener((javafx.collections.ListChangeListener<LayerEntry>) c -> {
            while (c.next()) {
                for (LayerEntry e : c.getAddedSubList()) {
                    e.visibleProperty().addListener((o, a, b) -> requestRepaint());
                }
            }
            requestRepaint();
        });
        model.layers().forEach(e -> e.visibleProperty().addListener((o, a, b) -> requestRepaint()));
        model.paletteProperty().addListener((o, a, p) -> {
            applyChrome(p);
            requestRepaint();
        });

        buildMenus();
        StackPane centre = new StackPane(map);
        notices.setPickOnBounds(false);
        notices.setMaxWidth(440);
        notices.setPadding(new Insets(10));
        notices.setAlignment(Pos.TOP_RIGHT);
        StackPane.setAlignment(notices, Pos.TOP_RIGHT);
        centre.getChildren().add(notices);
        root.setTop(menuBar);
        dock.setPadding(new Insets(4));
        dock.setPrefWidth(260);
        dock.getChildren().add(titled("Layers", layerList()));
        ScrollPane dockScroll = new ScrollPane(dock);
        dockScroll.setFitToWidth(true);
        dockScroll.setPrefWidth(270);
        // The dock beside the chart in a split pane: the user drags the divider to give the panels
        // (a wide table, say) more room; the chart keeps the rest when the window is resized.
        javafx.scene.control.SplitPane split = new javafx.scene.control.SplitPane(centre, dockScroll);
        split.setDividerPositions(0.74);
        javafx.scene.control.SplitPane.setResizableWithParent(dockScroll, false);
        dockScroll.setMinWidth(200);
        root.setCenter(split);
        root.setBottom(statusBar());

        Scene scene = new Scene(root, 1400, 900);
        stage.setScene(scene);
        stage.setTitle("Sightwork chart");
        stage.setOnHidden(e -> {
            plugins.stopAll();
            tasks.shutdown();
        });
        String saved = userFiles.get(PALETTE_KEY);
        if (saved != null) {
            try {
                model.paletteProperty().set(Palette.of(Lighting.valueOf(saved)));
            } catch (IllegalArgumentException ignored) {
                // an unknown value in the settings file: keep the day palette
            }
        }
        applyChrome(model.paletteProperty().get());
        Timeline poll = new Timeline(new KeyFrame(Duration.millis(150), e -> showTasks()));
        poll.setCycleCount(Timeline.INDEFINITE);
        poll.play();
        plugins.startAll();
    }

    /** Shows the window, starts loading the bundled chart, and shows the caution on first start. */
    void show() {
        stage.show();
        map.requestFocus();
        openBundledChart();
        if (userFiles.get(CAUTION_KEY) == null) {
            Alert a = new Alert(Alert.AlertType.INFORMATION);
            a.initOwner(stage);
            a.setTitle("Sightwork: caution");
            a.setHeaderText("Before you use Sightwork");
            a.setContentText(Caution.TEXT.replace('\n', ' '));
            a.setOnHidden(e -> {
                try {
                    userFiles.put(CAUTION_KEY, "true");
                } catch (java.io.IOException ex) {
                    notify(Severity.WARNING, "Could not remember that the caution was shown: " + ex.getMessage());
                }
            });
            a.show();
        }
    }

    private void openBundledChart() {
        List<Path> files = BundledChart.files();
        if (files.isEmpty()) {
            notify(Severity.WARNING, "The bundled chart is not in " + BundledChart.directory()
                    + "; open a chart with File > Open chart.");
            return;
        }
        boolean timing = Boolean.getBoolean("sightwork.timing");
        long t0 = System.nanoTime();
        map.onFirstChartFrame(() -> {
            if (timing) {
                long sinceJvm = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
                System.err.printf(Locale.ROOT, "sightwork: first chart frame %.0f ms after loading began, "
                        + "%d ms after the JVM started%n", (System.nanoTime() - t0) / 1e6, sinceJvm);
            }
        });
        // The detailed region first (it is what the first view shows), then the world base under it,
        // cut away where the region lies.
        Path detail = files.get(files.size() - 1);
        List<Path> base = files.subList(0, files.size() - 1);
        tasks.submit("Opening the bundled chart", p -> ChartSet.load(List.of(detail), false, f -> p.update(f, null)))
                .thenAcceptAsync(chart -> {
                    addChart(chart, false);
                    Envelope d = chart.detailExtentDeg();
                    if (!d.isNull()) {
                        Envelope view = new Envelope(d);
                        view.expandBy(Math.max(d.getWidth(), d.getHeight()) * 0.05);
                        map.showArea(view.getMinY(), view.getMinX(), view.getMaxY(), view.getMaxX());
                    }
                    if (!base.isEmpty()) {
                        Envelope mask = d.isNull() ? null : d;
                        tasks.submit("Opening the world base", p -> ChartSet.loadUnder(base, mask, f -> p.update(f, null)))
                                .thenAcceptAsync(world -> addChart(world, true), Platform::runLater);
                    }
                }, Platform::runLater);
    }

    private void openChart() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Open chart");
        fc.getExtensionFilters().addAll(
                new FileChooser.ExtensionFilter("Chart files (GeoPackage, GeoJSON)", "*.gpkg", "*.geojson", "*.json"),
                new FileChooser.ExtensionFilter("All files", "*"));
        List<File> chosen = fc.showOpenMultipleDialog(stage);
        if (chosen == null) {
            return;
        }
        for (File f : chosen) {
            openChartFile(f.toPath());
        }
    }

    /**
     * Opens a chart file in the background and adds its layers.
     *
     * @param file the file
     */
    void openChartFile(Path file) {
        tasks.submit("Opening " + file.getFileName(), p -> ChartSet.load(List.of(file), false, f -> p.update(f, null)))
                .thenAcceptAsync(chart -> {
                    addChart(chart, false);
                    if (!chart.layers().isEmpty()) {
                        notify(Severity.INFO, "Opened " + file.getFileName() + ": " + chart.layers().size()
                                + " layer(s)");
                        fitTo(chart.extentDeg());
                    }
                }, Platform::runLater);
    }

    private void addChart(ChartSet chart, boolean underneath) {
        if (underneath) {
            model.addBaseChartLayers(BundledChart.entriesOf(chart.layers()));
        } else {
            model.addChartLayers(BundledChart.entriesOf(chart.layers()));
        }
        if (!chart.layers().isEmpty()) {
            tasks.submit("Preparing the chart for every zoom", p -> {
                chart.generalise(f -> p.update(f, null));
                requestRepaint();
                return null;
            });
        }
        if (!chart.extentDeg().isNull()) {
            dataExtent.expandToInclude(chart.extentDeg());
        }
        for (ChartProblem p : chart.problems()) {
            notify(chart.layers().isEmpty() ? Severity.ERROR : Severity.WARNING, p.toString());
        }
        if (chart.layers().isEmpty() && chart.problems().isEmpty()) {
            notify(Severity.WARNING, "Nothing to draw was found.");
        }
        requestRepaint();
    }

    private void fitTo(Envelope e) {
        if (e.isNull()) {
            notify(Severity.INFO, "No chart data to fit to.");
            return;
        }
        Envelope g = new Envelope(e);
        double pad = Math.max(0.01, Math.max(g.getWidth(), g.getHeight()) * 0.03);
        g.expandBy(pad);
        map.showArea(Math.max(-85, g.getMinY()), g.getMinX(), Math.min(85, g.getMaxY()), g.getMaxX());
    }

    private void buildMenus() {
        Menu file = new Menu("File");
        MenuItem open = new MenuItem("Open chart…");
        open.setAccelerator(new KeyCodeCombination(KeyCode.O, KeyCombination.SHORTCUT_DOWN));
        open.setOnAction(e -> openChart());
        MenuItem quit = new MenuItem("Quit");
        quit.setAccelerator(new KeyCodeCombination(KeyCode.Q, KeyCombination.SHORTCUT_DOWN));
        quit.setOnAction(e -> stage.close());
        file.getItems().addAll(open, new SeparatorMenuItem(), quit);

        Menu view = new Menu("View");
        MenuItem fit = new MenuItem("Fit to data");
        fit.setAccelerator(new KeyCodeCombination(KeyCode.F));
        fit.setOnAction(e -> fitTo(dataExtent));
        CheckMenuItem range = new CheckMenuItem("Range and bearing tool");
        range.setAccelerator(new KeyCodeCombination(KeyCode.R));
        range.setOnAction(e -> map.setRangeTool(range.isSelected()));
        ToggleGroup lights = new ToggleGroup();
        view.getItems().addAll(fit, range, new SeparatorMenuItem());
        int k = 1;
        for (Lighting l : Lighting.values()) {
            RadioMenuItem item = new RadioMenuItem(l.name().charAt(0) + l.name().substring(1).toLowerCase(Locale.ROOT)
                    + " palette");
            item.setToggleGroup(lights);
            item.setAccelerator(new KeyCodeCombination(KeyCode.valueOf("DIGIT" + k++), KeyCombination.SHORTCUT_DOWN));
            item.setSelected(model.paletteProperty().get().lighting() == l);
            model.paletteProperty().addListener((o, a, p) -> item.setSelected(p.lighting() == l));
            item.setOnAction(e -> {
                model.paletteProperty().set(Palette.of(l));
                try {
                    userFiles.put(PALETTE_KEY, l.name());
                } catch (java.io.IOException ex) {
                    notify(Severity.WARNING, "Could not remember the palette: " + ex.getMessage());
                }
            });
            view.getItems().add(item);
        }

        Menu help = new Menu("Help");
        MenuItem about = new MenuItem("About Sightwork");
        about.setOnAction(e -> about());
        MenuItem keys = new MenuItem("Keys and mouse");
        keys.setOnAction(e -> notify(Severity.INFO, "Drag or arrow keys: pan. Wheel or + and −: zoom about the "
                + "cursor. F: fit to data. R: range and bearing (click start, click end; Esc clears)."));
        help.getItems().addAll(keys, about);
        menuBar.getMenus().addAll(file, view, help);
    }

    private void about() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(stage);
        a.setTitle("About Sightwork");
        a.setHeaderText("Sightwork: chart shell");
        String pluginList = plugins.names().isEmpty() ? "none" : String.join(", ", plugins.names());
        TextArea text = new TextArea(Caution.TEXT + "\n\nPlugins: " + pluginList
                + "\n\nBundled chart: shorelines from GSHHG (Wessel and Smith), LGPL; see test-charts/."
                + "\nMercator projection on WGS84 (EPSG:3395) through Apache SIS; geometry by JTS.");
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(10);
        a.getDialogPane().setContent(text);
        a.show();
    }

    private Node layerList() {
        ListView<LayerEntry> list = new ListView<>(model.layers());
        list.setPrefHeight(220);
        list.setCellFactory(lv -> new ListCell<>() {
            private final CheckBox box = new CheckBox();
            private LayerEntry bound;

            @Override
            protected void updateItem(LayerEntry item, boolean empty) {
                super.updateItem(item, empty);
                if (bound != null) {
                    box.selectedProperty().unbindBidirectional(bound.visibleProperty());
                    bound = null;
                }
                if (empty || item == null) {
                    setGraphic(null);
                    setText(null);
                    return;
                }
                box.setText(item.name());
                box.selectedProperty().bindBidirectional(item.visibleProperty());
                bound = item;
                setGraphic(box);
                setText(null);
            }
        });
        Button up = new Button("Up");
        Button down = new Button("Down");
        up.setOnAction(e -> move(list, -1));
        down.setOnAction(e -> move(list, 1));
        Label hint = new Label("Top of the list is drawn on top.");
        hint.setWrapText(true);
        HBox buttons = new HBox(6, up, down);
        return new VBox(6, list, buttons, hint);
    }

    private void move(ListView<LayerEntry> list, int by) {
        int i = list.getSelectionModel().getSelectedIndex();
        int j = i + by;
        if (i < 0 || j < 0 || j >= model.layers().size()) {
            return;
        }
        LayerEntry e = model.layers().remove(i);
        model.layers().add(j, e);
        list.getSelectionModel().select(j);
        requestRepaint();
    }

    private Node statusBar() {
        cursorLabel.setMinWidth(220);
        progress.setPrefWidth(160);
        progress.setVisible(false);
        cancelTask.setVisible(false);
        taskLabel.setVisible(false);
        Region spring = new Region();
        HBox.setHgrow(spring, Priority.ALWAYS);
        HBox bar = new HBox(12, cursorLabel, rangeLabel, spring, taskLabel, progress, cancelTask);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(3, 8, 3, 8));
        return bar;
    }

    private void showTasks() {
        List<TaskRunner.Running> r = tasks.running();
        boolean any = !r.isEmpty();
        progress.setVisible(any);
        taskLabel.setVisible(any);
        cancelTask.setVisible(any);
        if (any) {
            TaskRunner.Running t = r.get(r.size() - 1);
            taskLabel.setText(t.title() + (t.message() == null ? "" : ": " + t.message())
                    + (r.size() > 1 ? " (+" + (r.size() - 1) + " more)" : ""));
            progress.setProgress(t.fraction() < 0 ? ProgressBar.INDETERMINATE_PROGRESS : t.fraction());
            cancelTask.setOnAction(e -> t.cancel());
        }
    }

    private static TitledPane titled(String title, Node content) {
        TitledPane t = new TitledPane(title, content);
        t.setExpanded(true);
        return t;
    }

    private void applyChrome(Palette p) {
        switch (p.lighting()) {
            case DAY -> root.setStyle("");
            case DUSK -> root.setStyle("-fx-base: #3b4246; -fx-background: #2d3336; "
                    + "-fx-control-inner-background: #343b3f; -fx-accent: #6f8796;");
            case NIGHT -> root.setStyle("-fx-base: #1c0603; -fx-background: #0d0201; "
                    + "-fx-control-inner-background: #140301; -fx-accent: #5a1406; -fx-focus-color: #5a1406; "
                    + "-fx-text-base-color: #a8321a; -fx-text-background-color: #a8321a; "
                    + "-fx-text-inner-color: #a8321a; -fx-mark-color: #a8321a; -fx-selection-bar: #3a0c05;");
        }
        for (Node n : notices.getChildren()) {
            n.setStyle(noticeStyle(p, (Severity) n.getUserData()));
        }
    }

    private static String noticeStyle(Palette p, Severity s) {
        String edge = switch (s) {
            case INFO -> "#58788c";
            case WARNING -> "#b07a10";
            case ERROR -> "#b02020";
        };
        return switch (p.lighting()) {
            case DAY -> "-fx-background-color: rgba(255,255,255,0.94); -fx-border-color: " + edge
                    + "; -fx-border-width: 0 0 0 4; -fx-padding: 6 8 6 8; -fx-text-fill: #1d2b35;";
            case DUSK -> "-fx-background-color: rgba(45,51,54,0.94); -fx-border-color: " + edge
                    + "; -fx-border-width: 0 0 0 4; -fx-padding: 6 8 6 8;";
            case NIGHT -> "-fx-background-color: rgba(13,2,1,0.94); -fx-border-color: #6b1808;"
                    + " -fx-border-width: 0 0 0 4; -fx-padding: 6 8 6 8;";
        };
    }

    // ---- Shell ----

    @Override
    public boolean isHeadless() {
        return false;
    }

    @Override
    public void addPanel(String title, Node content) {
        dock.getChildren().add(titled(title, content));
    }

    @Override
    public void addCommand(String menu, String label, Runnable action) {
        Menu m = menuBar.getMenus().stream().filter(x -> x.getText().equals(menu)).findFirst().orElseGet(() -> {
            Menu made = new Menu(menu);
            menuBar.getMenus().add(Math.max(0, menuBar.getMenus().size() - 1), made);
            return made;
        });
        MenuItem item = new MenuItem(label);
        item.setOnAction(e -> action.run());
        m.getItems().add(item);
    }

    @Override
    public void notify(Severity severity, String message) {
        System.err.println("sightwork: " + severity.name().toLowerCase(Locale.ROOT) + ": " + message);
        if (!Platform.isFxApplicationThread()) {
            Platform.runLater(() -> notify0(severity, message));
        } else {
            notify0(severity, message);
        }
    }

    private void notify0(Severity severity, String message) {
        Label text = new Label(message);
        text.setWrapText(true);
        text.setMaxWidth(380);
        Button close = new Button("×");
        close.setStyle("-fx-padding: 0 6 0 6;");
        HBox box = new HBox(8, text, close);
        box.setUserData(severity);
        box.setAlignment(Pos.TOP_LEFT);
        box.setMaxWidth(420);
        box.setStyle(noticeStyle(model.paletteProperty().get(), severity));
        close.setOnAction(e -> notices.getChildren().remove(box));
        notices.getChildren().add(box);
        while (notices.getChildren().size() > 6) {
            notices.getChildren().remove(0);
        }
        if (severity != Severity.ERROR) {
            PauseTransition wait = new PauseTransition(Duration.seconds(severity == Severity.INFO ? 6 : 15));
            FadeTransition fade = new FadeTransition(Duration.millis(600), box);
            fade.setToValue(0);
            SequentialTransition t = new SequentialTransition(wait, fade);
            t.setOnFinished(e -> notices.getChildren().remove(box));
            t.play();
        }
    }

    @Override
    public void requestRepaint() {
        map.requestRepaint();
    }

    @Override
    public void showArea(double southDeg, double westDeg, double northDeg, double eastDeg) {
        map.showArea(southDeg, westDeg, northDeg, eastDeg);
    }

    MapView mapView() {
        return map;
    }

    MenuBar menuBar() {
        return menuBar;
    }

    VBox dock() {
        return dock;
    }

    Label rangeLabel() {
        return rangeLabel;
    }

    Label cursorLabel() {
        return cursorLabel;
    }

    @Override
    public javafx.scene.image.WritableImage renderChart() {
        return map.renderToImage();
    }

    List<String> pluginNames() {
        return new ArrayList<>(plugins.names());
    }
}
