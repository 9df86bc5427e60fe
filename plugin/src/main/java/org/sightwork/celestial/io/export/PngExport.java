package org.sightwork.celestial.io.export;

import org.sightwork.geo.files.SafeWrite;
import java.io.IOException;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.Image;
import javax.imageio.ImageIO;

/**
 * Writes a picture of the chart view (a JavaFX snapshot) as a PNG file.
 *
 * <p><b>Thread safety:</b> may run on any thread once the snapshot is taken (take it on the JavaFX
 * application thread).
 */
public final class PngExport {

    private PngExport() {
    }

    /**
     * Writes the image (through a temporary file and a rename).
     *
     * @param image the snapshot
     * @param target the file
     * @throws IOException if the file cannot be written; the target is then unchanged
     */
    public static void write(Image image, Path target) throws IOException {
        var buffered = SwingFXUtils.fromFXImage(image, null);
        SafeWrite.writeFile(target, SafeWrite.Previous.DISCARD, tmp -> {
            if (!ImageIO.write(buffered, "png", tmp.toFile())) {
                throw new IOException("no PNG writer is available in this Java runtime");
            }
        });
    }
}
