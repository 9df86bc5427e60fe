package org.sightwork.geo.render;

import javafx.scene.paint.Color;
import org.sightwork.geo.spi.Lighting;

/**
 * The colours of the chart for one lighting. Our own choice: day is pale sea and buff land with
 * dark ink; dusk is the same scheme at lower brightness and contrast; night is near-black with dim
 * reds only (red light disturbs the eyes' dark adaptation least, common practice on the bridge).
 *
 * @param lighting which lighting this is for
 * @param sea the sea, and the background
 * @param land land areas
 * @param coast coastlines and the outline of lakes
 * @param lake inland water
 * @param depthArea depth areas
 * @param contour depth contours
 * @param other features of no known class
 * @param graticule graticule lines
 * @param ink text, scale bar, labels
 * @param halo the halo behind text
 */
public record Palette(Lighting lighting, Color sea, Color land, Color coast, Color lake, Color depthArea,
        Color contour, Color other, Color graticule, Color ink, Color halo) {

    /** Day. */
    public static final Palette DAY = new Palette(Lighting.DAY,
            Color.web("#dcebf2"), Color.web("#efe0b9"), Color.web("#5b4a30"), Color.web("#cde3ee"),
            Color.web("#c4deec"), Color.web("#7b9fb4"), Color.web("#6d5f80"), Color.web("#58788c", 0.75),
            Color.web("#1d2b35"), Color.web("#ffffff", 0.8));

    /** Dusk. */
    public static final Palette DUSK = new Palette(Lighting.DUSK,
            Color.web("#4e6470"), Color.web("#7a6e55"), Color.web("#2c261c"), Color.web("#4a606c"),
            Color.web("#485e6a"), Color.web("#6f8796"), Color.web("#7d7390"), Color.web("#aebcc4", 0.6),
            Color.web("#dfe5e8"), Color.web("#2a3840", 0.8));

    /** Night. */
    public static final Palette NIGHT = new Palette(Lighting.NIGHT,
            Color.web("#060101"), Color.web("#1f0904"), Color.web("#6b1808"), Color.web("#0b0202"),
            Color.web("#0a0201"), Color.web("#3d0d05"), Color.web("#4a1208"), Color.web("#5a1406", 0.8),
            Color.web("#8c2410"), Color.web("#000000", 0.8));

    /**
     * The palette for a lighting.
     *
     * @param lighting the lighting
     * @return its palette
     */
    public static Palette of(Lighting lighting) {
        return switch (lighting) {
            case DAY -> DAY;
            case DUSK -> DUSK;
            case NIGHT -> NIGHT;
        };
    }

    /**
     * An overlay colour given for daylight, as shown in this palette: unchanged by day, dimmed at
     * dusk, at night turned into a red whose brightness grows with the darkness of the day colour
     * (dark ink on a light chart becomes brighter red on the dark chart) and kept dim.
     *
     * @param day the colour for daylight
     * @return the colour to draw with
     */
    public Color adapt(Color day) {
        return switch (lighting) {
            case DAY -> day;
            case DUSK -> day.deriveColor(0, 0.85, 0.8, 1);
            case NIGHT -> {
                double lum = 0.299 * day.getRed() + 0.587 * day.getGreen() + 0.114 * day.getBlue();
                double v = 1 - lum;
                yield Color.color(0.28 + 0.42 * v, 0.03 + 0.07 * v, 0.02, day.getOpacity());
            }
        };
    }
}
