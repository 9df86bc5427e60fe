package org.sightwork.celestial.ui;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Platform;
import javafx.scene.control.ChoiceDialog;
import javafx.scene.control.ScrollPane;
import javafx.scene.image.WritableImage;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import javafx.util.Duration;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.io.export.GeoJsonExport;
import org.sightwork.celestial.io.export.GeoPackageExport;
import org.sightwork.celestial.io.export.GpxExport;
import org.sightwork.celestial.io.export.PdfWorksheetExport;
import org.sightwork.celestial.io.export.PngExport;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.geo.spi.ChartPlugin;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Severity;

/**
 * The celestial plugin on the chart: the sight log editor, the worksheet, fix and passage views,
 * the chart overlays (DR, GPS, APs, lines of position, circles of equal altitude, geographical
 * positions, cocked hats, fixes with their ellipses, running-fix lines, set and drift), the
 * passage file commands and the exports. With no passage given it opens the bundled demo
 * passage (an invented vessel on an invented passage).
 *
 * <p>System properties: {@code sightwork.passage} names a passage file to open instead of the
 * demo.
 *
 * <p><b>Thread:</b> {@link #start} and every listener run on the JavaFX application thread; the
 * almanac is loaded and the first plot worked out on a worker thread.
 */
public final class CelestialPlugin implements ChartPlugin {

    /** Autosave interval (seconds) of a changed passage that has a file. */
    static final double AUTOSAVE_SECONDS = 60;
    /** The demo resources, beside this class. */
    static final String DEMO = "/org/sightwork/celestial/demo/";
    static final List<String> DEMO_FILES = List.of("demo-passage.json", "demo-gps.nmea", "demo-dr.csv",
            "demo-sights.csv", "README.md");

    private PluginContext ctx;
    private PassageModel model;
    private PlotOverlays painters;
    private SightLogPanel log;
    private ResultsPanel worksheet;
    private RecentFiles recent;
    private Timeline autosave;
    private SkyPanel sky;
    private final List<Overlay> overlays = new ArrayList<>();

    /** The no-argument constructor ServiceLoader needs. */
    public CelestialPlugin() {
    }

    @Override
    public String name() {
        return "Celestial";
    }

    /** @return the model (for tests, FX thread) */
    PassageModel model() {
        return model;
    }

    /** @return the sight log editor (for tests, FX thread) */
    SightLogPanel sightLog() {
        return log;
    }

    /** @return the painters (for tests, FX thread) */
    PlotOverlays painters() {
        return painters;
    }

    @Override
    public void start(PluginContext context) {
        ctx = context;
        model = new PassageModel(new Passage("Passage", LocalDate.now(ZoneOffset.UTC)));
        painters = new PlotOverlays(() -> model.plot().get(), () -> model.selectedRow().get() < 0 ? null
                : model.selectedRow().get(), () -> ctx.passageTime().get());
        recent = new RecentFiles(ctx.userDirectory().resolve("recent.json"));
        addOverlays();
        model.plot().addListener((o, was, now) -> ctx.requestRepaint());
        model.selectedRow().addListener((o, was, now) -> ctx.requestRepaint());
        ctx.passageTime().addListener((o, was, now) -> ctx.requestRepaint());

        if (!ctx.isHeadless()) {
            log = new SightLogPanel(model);
            worksheet = new ResultsPanel();
            model.selectedRow().addListener((o, was, now) -> showWorksheet());
            model.plot().addListener((o, was, now) -> showWorksheet());
            ctx.addPanel("Sight log", log);
            ctx.addPanel("Sight worksheet", scroll(worksheet));
            ctx.addPanel("Fix", scroll(new FixPanel(model)));
            ctx.addPanel("Passage", new PassagePanel(model, ctx.passageTime()));
            sky = new SkyPanel(model, ctx.passageTime());
            ctx.addPanel("Sky", sky);
            ctx.addChartClickListener(at -> {
                switch (log.clickMode()) {
                    case PICK_DR -> log.picked(SightColumn.DR, at);
                    case PICK_AP -> log.picked(SightColumn.AP, at);
                    default -> painters.lineNear(at, 8).ifPresent(r -> model.selectedRow().set(r));
                }
            });
            addCommands();
            autosave = new Timeline(new KeyFrame(Duration.seconds(AUTOSAVE_SECONDS), e -> autosave()));
            autosave.setCycleCount(Timeline.INDEFINITE);
            autosave.play();
        }

        org.sightwork.celestial.ui.drill.DrillMode.install(ctx, f -> openInBackground(Optional.of(f)));
        Optional<Path> wanted = Optional.ofNullable(System.getProperty("sightwork.passage")).map(Path::of);
        ctx.runInBackground("Loading the almanac and the passage", progress -> {
            SightReducer reducer = SightReducer.standard();
            Path file = wanted.isPresent() ? wanted.get() : demoCopy();
            PassageFiles.Opened opened = PassageFiles.open(file);
            return new Object[] {reducer, file, opened};
        }).thenAcceptAsync(r -> {
            model.setComputer(new PlotComputer((SightReducer) r[0], FixOptions.DEFAULTS));
            adopt((Path) r[1], (PassageFiles.Opened) r[2], wanted.isEmpty());
        }, Platform::runLater);
    }

    /** Copies the demo passage into {@code ~/.sightwork/celestial/demo/}, afresh, and names its file. */
    private Path demoCopy() throws IOException {
        Path dir = ctx.userDirectory().resolve("celestial").resolve("demo");
        Files.createDirectories(dir);
        for (String f : DEMO_FILES) {
            try (InputStream in = CelestialPlugin.class.getResourceAsStream(DEMO + f)) {
                if (in == null) {
                    throw new IOException("the demo resource " + f + " is missing from the plugin");
                }
                Path tmp = Files.createTempFile(dir, "." + f, ".tmp");
                Files.copy(in, tmp, StandardCopyOption.REPLACE_EXISTING);
                Files.move(tmp, dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
            }
        }
        return dir.resolve("demo-passage.json");
    }

    private void adopt(Path file, PassageFiles.Opened opened, boolean demo) {
        if (opened.passage().isEmpty()) {
            ctx.notify(Severity.ERROR, opened.message());
            return;
        }
        model.replace(opened.passage().get(), Optional.of(file), opened.readOnly());
        if (!opened.message().isEmpty()) {
            ctx.notify(opened.readOnly() ? Severity.WARNING : Severity.INFO, opened.message());
        }
        if (demo) {
            ctx.notify(Severity.INFO, "Demo passage opened: an invented vessel on an invented passage, "
                    + "Horta to Ponta Delgada, 2026-06-21. A copy is in " + file.getParent() + ".");
        }
        showPassageArea();
        try {
            recent.add(file);
        } catch (IOException e) {
            ctx.notify(Severity.WARNING, "The recent-files list could not be written: " + e.getMessage());
        }
    }

    private void showPassageArea() {
        Plot p = model.plot().get();
        double s = 90, n = -90, w = 180, e = -180;
        List<org.sightwork.geo.earth.GeoPosition> pts = new ArrayList<>();
        p.drTrack().forEach(t -> pts.add(t.position()));
        p.fixes().forEach(f -> f.fix().ifPresent(x -> pts.add(x.position())));
        for (var q : pts) {
            s = Math.min(s, q.latDeg());
            n = Math.max(n, q.latDeg());
            w = Math.min(w, q.lonDeg());
            e = Math.max(e, q.lonDeg());
        }
        if (!pts.isEmpty()) {
            double m = 0.15;
            ctx.showArea(s - m, w - m, n + m, e + m);
        }
    }

    private void addOverlays() {
        overlays.add(ctx.addOverlay("Celestial: DR track", painters::paintDr));
        overlays.add(ctx.addOverlay("Celestial: GPS track", painters::paintGps));
        overlays.add(ctx.addOverlay("Celestial: set and drift", painters::paintSetDrift));
        overlays.add(ctx.addOverlay("Celestial: assumed positions", painters::paintAps));
        overlays.add(ctx.addOverlay("Celestial: circles of equal altitude", painters::paintCircles));
        overlays.add(ctx.addOverlay("Celestial: body GPs", painters::paintGeographicalPositions));
        overlays.add(ctx.addOverlay("Celestial: cocked hats", painters::paintCockedHats));
        overlays.add(ctx.addOverlay("Celestial: running-fix lines", painters::paintAdvancedLines));
        overlays.add(ctx.addOverlay("Celestial: lines of position", painters::paintLines));
        overlays.add(ctx.addOverlay("Celestial: fixes", painters::paintFixes));
    }

    private static ScrollPane scroll(javafx.scene.Node n) {
        ScrollPane s = new ScrollPane(n);
        s.setFitToWidth(true);
        s.setPrefViewportHeight(320);
        return s;
    }

    private void showWorksheet() {
        Optional<Plot.SightResult> s = model.selectedResult();
        if (s.isEmpty()) {
            worksheet.show("Select a sight in the log (or click its line on the chart)", List.of());
        } else {
            worksheet.show(WorksheetText.heading(s.get()), WorksheetText.sight(s.get()));
        }
    }

    private void addCommands() {
        ctx.addCommand("Passage", "Open passage…", this::openDialog);
        ctx.addCommand("Passage", "Open recent passage…", this::openRecent);
        ctx.addCommand("Passage", "Open the demo passage", () -> openInBackground(Optional.empty()));
        ctx.addCommand("Passage", "Save passage", this::save);
        ctx.addCommand("Passage", "Save passage as…", this::saveAs);
        ctx.addCommand("Passage", "Load GPS track…", this::loadGps);
        ctx.addCommand("Sights", "Add sight", () -> log.addSight());
        ctx.addCommand("Export", "Lines and fixes as GeoJSON…", () -> export("GeoJSON", "*.geojson",
                f -> GeoJsonExport.write(ExportAdapter.plot(model), f)));
        ctx.addCommand("Export", "Lines, fixes and tracks as GPX…", () -> export("GPX", "*.gpx",
                f -> GpxExport.write(ExportAdapter.plot(model), f)));
        ctx.addCommand("Export", "Lines, fixes and tracks as GeoPackage…", () -> export("GeoPackage", "*.gpkg",
                f -> GeoPackageExport.write(ExportAdapter.plot(model), f)));
        ctx.addCommand("Export", "Worksheet of the day as PDF…", () -> export("PDF", "*.pdf",
                f -> PdfWorksheetExport.write(ExportAdapter.worksheet(model), f)));
        ctx.addCommand("Export", "Chart view as PNG…", this::exportPng);
    }

    @FunctionalInterface
    private interface FileWork {
        void write(Path file) throws IOException;
    }

    private Window window() {
        return log.getScene() == null ? null : log.getScene().getWindow();
    }

    private void export(String what, String pattern, FileWork work) {
        FileChooser fc = new FileChooser();
        fc.setTitle("Export " + what);
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter(what, pattern));
        fc.setInitialFileName(model.passage().title().replaceAll("[^A-Za-z0-9._-]+", "-") + pattern.substring(1));
        var f = fc.showSaveDialog(window());
        if (f != null) {
            exportTo(what, f.toPath(), work);
        }
    }

    /** Writes an export on a worker thread and says where (FX thread). */
    private void exportTo(String what, Path target, FileWork work) {
        ctx.runInBackground("Exporting " + what, progress -> {
            work.write(target);
            return target;
        }).thenAcceptAsync(t -> ctx.notify(Severity.INFO, what + " written: " + t), Platform::runLater);
    }

    private void exportPng() {
        // The chart view as it is now, painted by the shell's renderer (no panels or menus).
        WritableImage img = ctx.renderChart();
        export("PNG", "*.png", f -> PngExport.write(img, f));
    }

    /**
     * Writes the chart view as it is now to a PNG file, without asking for the file (FX thread).
     *
     * @param target the file
     */
    void exportChartPng(Path target) {
        WritableImage img = ctx.renderChart();
        exportTo("PNG", target, f -> PngExport.write(img, f));
    }

    private void openDialog() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Open passage");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Sightwork passage", "*.json"));
        var f = fc.showOpenDialog(window());
        if (f != null) {
            openInBackground(Optional.of(f.toPath()));
        }
    }

    private void openRecent() {
        List<Path> list = recent.list();
        if (list.isEmpty()) {
            ctx.notify(Severity.INFO, "No passage opened yet.");
            return;
        }
        ChoiceDialog<Path> d = new ChoiceDialog<>(list.get(0), list);
        d.setTitle("Open recent passage");
        d.setHeaderText("Passages opened lately");
        d.showAndWait().ifPresent(p -> openInBackground(Optional.of(p)));
    }

    void openInBackground(Optional<Path> file) {
        ctx.runInBackground("Opening passage", progress -> {
            Path f = file.isPresent() ? file.get() : demoCopy();
            return new Object[] {f, PassageFiles.open(f)};
        }).thenAcceptAsync(r -> adopt((Path) r[0], (PassageFiles.Opened) r[1], file.isEmpty()), Platform::runLater);
    }

    private void save() {
        Optional<Path> f = model.file().get();
        if (f.isEmpty() || model.readOnly().get()) {
            saveAs();
            return;
        }
        saveTo(f.get(), true);
    }

    private void saveAs() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Save passage as");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Sightwork passage", "*.json"));
        fc.setInitialFileName(model.passage().title().replaceAll("[^A-Za-z0-9._-]+", "-") + ".json");
        var f = fc.showSaveDialog(window());
        if (f != null) {
            Path p = f.toPath();
            // A name typed without an extension gets the passage extension, so that Open finds it.
            if (!p.getFileName().toString().contains(".")) {
                p = p.resolveSibling(p.getFileName() + ".json");
            }
            saveTo(p, true);
        }
    }

    /**
     * Saves the passage on a worker thread (a snapshot of it, taken here).
     *
     * @param file the file
     * @param tell whether to say so in a notification
     */
    void saveTo(Path file, boolean tell) {
        Passage snapshot = model.passage().copy();
        Plot plot = model.plot().get();
        boolean existed = java.nio.file.Files.exists(file);
        ctx.runInBackground("Saving passage", progress -> {
            PassageFiles.save(snapshot, plot, file);
            return file;
        }).thenAcceptAsync(f -> {
            model.file().set(Optional.of(f));
            model.readOnly().set(false);
            model.dirty().set(false);
            try {
                recent.add(f);
            } catch (IOException e) {
                ctx.notify(Severity.WARNING, "The recent-files list could not be written: " + e.getMessage());
            }
            if (tell) {
                ctx.notify(Severity.INFO, "Passage saved: " + f + (existed ? " (previous version kept as "
                        + org.sightwork.celestial.io.SessionFile.backupOf(f).getFileName() + ")" : ""));
            }
        }, Platform::runLater);
    }

    private void autosave() {
        Optional<Path> f = model.file().get();
        if (model.dirty().get() && f.isPresent() && !model.readOnly().get()) {
            saveTo(f.get(), false);
        }
    }

    private void loadGps() {
        FileChooser fc = new FileChooser();
        fc.setTitle("Load GPS track");
        fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("NMEA 0183, GPX or CSV track",
                "*.nmea", "*.txt", "*.log", "*.gpx", "*.csv"));
        var f = fc.showOpenDialog(window());
        if (f == null) {
            return;
        }
        Path file = f.toPath();
        ctx.runInBackground("Reading GPS track", progress -> {
            List<String> notes = new ArrayList<>();
            var t = PassageFiles.readTrack(file, notes);
            return new Object[] {t, notes};
        }).thenAcceptAsync(r -> {
            model.passage().setGps(Optional.of((org.sightwork.geo.track.Track) r[0]));
            model.passage().setGpsFile(Optional.of(file));
            model.edited();
            @SuppressWarnings("unchecked")
            List<String> notes = (List<String>) r[1];
            if (!notes.isEmpty()) {
                ctx.notify(Severity.WARNING, String.join("; ", notes));
            }
        }, Platform::runLater);
    }

    @Override
    public void stop() {
        if (autosave != null) {
            autosave.stop();
        }
        if (sky != null) {
            sky.stop();
        }
    }
}
