package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.testing.HeadlessFx;

/**
 * "Add sight" leaves the new row's Body cell in edit, so that the navigator can type at once (a
 * regression seen in the window: the edit was asked for before the row was laid out, and the
 * typing was lost); the new row carries the previous row's conditions.
 */
class AddSightTest {

    @Test
    void theNewRowsBodyCellIsEditing(@TempDir Path home) {
        PluginHarness h = PluginHarness.startWithDemo(home);
        SightLogPanel log = (SightLogPanel) h.panels.get("Sight log");
        Stage[] st = new Stage[1];
        try {
            HeadlessFx.run(() -> {
                st[0] = new Stage();
                st[0].setScene(new Scene(log, 1400, 500));
                st[0].show();
                log.addSight();
            });
            HeadlessFx.run(() -> { }); // the runLater queued by addSight has run
            var editing = HeadlessFx.call(() -> log.table().getEditingCell());
            assertNotNull(editing, "a cell is in edit");
            assertEquals(7, editing.getRow(), "the new (eighth) row");
            assertEquals(SightColumn.BODY, editing.getTableColumn().getUserData(), "its Body cell");
            SightRow added = HeadlessFx.call(() -> h.plugin.model().passage().rows().get(7));
            SightRow above = HeadlessFx.call(() -> h.plugin.model().passage().rows().get(6));
            assertEquals(above.get(SightColumn.EYE), added.get(SightColumn.EYE), "height of eye carried");
            assertEquals("", added.get(SightColumn.HS), "Hs not carried");
        } finally {
            HeadlessFx.run(() -> {
                st[0].close();
                h.close();
            });
        }
    }
}
