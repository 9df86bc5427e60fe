package org.sightwork.geo.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Locale;
import javafx.event.Event;
import javafx.geometry.Point2D;
import javafx.scene.control.MenuItem;
import javafx.scene.control.TitledPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.RangeBearing;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.testing.TestMarkPlugin;

/**
 * The window's wiring, headless (Monocle): the test plugin's panel, command, click listener and
 * passage time; pan by drag and arrow keys, zoom about the cursor, the range tool's read-out. The
 * figures are the viewport's own (non-regression) and the range figures those of
 * {@link RangeBearing}, itself checked against GeographicLib.
 */
class ChartWindowTest {

    private static ChartWindow window;
    private static Stage stage;

    @BeforeAll
    static void open() {
        System.setProperty("sightwork.user.dir", System.getProperty("java.io.tmpdir") + "/sightwork-window-test");
        HeadlessFx.run(() -> {
            stage = new Stage();
            window = new ChartWindow(stage);
            window.show();
            stage.setWidth(1200);
            stage.setHeight(800);
            window.mapView().setViewport(Viewport.fitting(36.8, -29.0, 39.2, -24.6, 900, 700));
            stage.getScene().getRoot().applyCss();
            stage.getScene().getRoot().layout();
        });
    }

    @AfterAll
    static void close() {
        HeadlessFx.run(() -> stage.close());
    }

    private static void mouse(javafx.event.EventType<MouseEvent> type, double x, double y) {
        MapView m = window.mapView();
        Point2D s = m.localToScene(x, y);
        Event.fireEvent(m, new MouseEvent(type, s.getX(), s.getY(), s.getX(), s.getY(), MouseButton.PRIMARY, 1,
                false, false, false, false, type != MouseEvent.MOUSE_RELEASED, false, false, true, false, false, null));
    }

    private static void click(double x, double y) {
        mouse(MouseEvent.MOUSE_PRESSED, x, y);
        mouse(MouseEvent.MOUSE_RELEASED, x, y);
    }

    @Test
    void pluginPartsAreInTheWindow() {
        HeadlessFx.run(() -> {
            assertTrue(window.pluginNames().contains("Test marks"), "plugin started");
            assertTrue(window.dock().getChildren().stream().anyMatch(n -> n instanceof TitledPane t
                    && t.getText().equals("Test panel")), "panel in the dock");
            MenuItem count = window.menuBar().getMenus().stream().filter(m -> m.getText().equals("Test"))
                    .findFirst().orElseThrow().getItems().get(0);
            int before = TestMarkPlugin.COMMAND_RUNS.get();
            count.fire();
            assertEquals(before + 1, TestMarkPlugin.COMMAND_RUNS.get(), "menu command runs");
            Instant t = Instant.parse("2026-06-21T12:00:00Z");
            window.model().passageTimeProperty().set(t);
            assertEquals(t, TestMarkPlugin.lastTime, "passage time shared");
            assertTrue(window.model().layers().stream().anyMatch(l -> l.name().equals(TestMarkPlugin.OVERLAY)),
                    "overlay in the layer list");
        });
    }

    @Test
    void clickTellsThePluginWhere() {
        HeadlessFx.run(() -> {
            GeoPosition expected = window.mapView().viewport().positionAt(200, 150);
            click(200, 150);
            assertEquals(expected, TestMarkPlugin.lastClick, "position of the click");
        });
    }

    @Test
    void dragPansAndWheelZoomsAboutTheCursor() {
        HeadlessFx.run(() -> {
            MapView m = window.mapView();
            GeoPosition grabbed = m.viewport().positionAt(100, 100);
            mouse(MouseEvent.MOUSE_PRESSED, 100, 100);
            mouse(MouseEvent.MOUSE_DRAGGED, 130, 110);
            mouse(MouseEvent.MOUSE_DRAGGED, 160, 130);
            mouse(MouseEvent.MOUSE_RELEASED, 160, 130);
            GeoPosition now = m.viewport().positionAt(160, 130);
            assertEquals(grabbed.latDeg(), now.latDeg(), 1e-9, "dragged point follows the pointer (lat)");
            assertEquals(grabbed.lonDeg(), now.lonDeg(), 1e-9, "dragged point follows the pointer (lon)");

            double mpp = m.viewport().metresPerPx();
            GeoPosition under = m.viewport().positionAt(300, 200);
            Point2D s = m.localToScene(300, 200);
            Event.fireEvent(m, new ScrollEvent(ScrollEvent.SCROLL, s.getX(), s.getY(), s.getX(), s.getY(), false, false,
                    false, false, false, false, 0, 120, 0, 120, ScrollEvent.HorizontalTextScrollUnits.NONE, 0,
                    ScrollEvent.VerticalTextScrollUnits.NONE, 0, 0, null));
            assertTrue(m.viewport().metresPerPx() < mpp, "wheel up zooms in");
            GeoPosition after = m.viewport().positionAt(300, 200);
            assertEquals(under.latDeg(), after.latDeg(), 1e-9, "zoom about the cursor (lat)");
            assertEquals(under.lonDeg(), after.lonDeg(), 1e-9, "zoom about the cursor (lon)");

            double before = m.viewport().centreXM();
            Event.fireEvent(m, new KeyEvent(KeyEvent.KEY_PRESSED, "", "", KeyCode.RIGHT, false, false, false, false));
            assertTrue(m.viewport().centreXM() > before, "right arrow shows what lies east");
            double mpp2 = m.viewport().metresPerPx();
            Event.fireEvent(m, new KeyEvent(KeyEvent.KEY_PRESSED, "-", "-", KeyCode.MINUS, false, false, false, false));
            assertEquals(mpp2 * 1.5, m.viewport().metresPerPx(), 1e-6, "minus zooms out by 1.5");
        });
    }

    @Test
    void rangeToolShowsBothSailings() {
        HeadlessFx.run(() -> {
            MapView m = window.mapView();
            m.setRangeTool(true);
            GeoPosition a = m.viewport().positionAt(150, 500);
            GeoPosition b = m.viewport().positionAt(700, 120);
            click(150, 500);
            click(700, 120);
            RangeBearing rb = RangeBearing.between(a, b);
            String text = window.rangeLabel().getText();
            assertTrue(text.contains(String.format(Locale.ROOT, "%05.1f°T", rb.rhumbCourseDeg())), text);
            assertTrue(text.contains(String.format(Locale.ROOT, "%.1f nm", rb.greatCircleNm())), text);
            m.setRangeTool(false);
        });
    }
}
