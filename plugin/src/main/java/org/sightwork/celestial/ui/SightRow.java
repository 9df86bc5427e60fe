package org.sightwork.celestial.ui;

import java.util.EnumMap;
import java.util.Map;

/**
 * One row of the sight log as the navigator typed it: a text per column, plus whether the circle of
 * equal altitude is to be drawn. Parsing is done by {@link SightRowReader}; the row keeps the text
 * so that a half-typed value is never lost.
 *
 * <p><b>Thread safety:</b> not thread-safe; the editor uses it on the JavaFX application thread.
 */
final class SightRow {

    private final EnumMap<SightColumn, String> cells = new EnumMap<>(SightColumn.class);
    private boolean circleWanted;

    SightRow() {
        for (SightColumn c : SightColumn.values()) {
            cells.put(c, "");
        }
    }

    /**
     * A row from column texts.
     *
     * @param values the texts; missing columns are blank
     * @return the row
     */
    static SightRow of(Map<SightColumn, String> values) {
        SightRow r = new SightRow();
        values.forEach(r::set);
        return r;
    }

    /**
     * A new row that carries the previous row's conditions (height of eye, index error, watch error,
     * temperature, pressure, DR) and nothing else.
     *
     * @param previous the row above
     * @return the new row
     */
    static SightRow carriedFrom(SightRow previous) {
        SightRow r = new SightRow();
        for (SightColumn c : SightColumn.values()) {
            if (c.carried()) {
                r.set(c, previous.get(c));
            }
        }
        return r;
    }

    String get(SightColumn c) {
        return cells.get(c);
    }

    void set(SightColumn c, String text) {
        cells.put(c, text == null ? "" : text.strip());
    }

    boolean circleWanted() {
        return circleWanted;
    }

    void setCircleWanted(boolean wanted) {
        circleWanted = wanted;
    }

    /** @return a copy of the texts */
    Map<SightColumn, String> cells() {
        return new EnumMap<>(cells);
    }

    SightRow copy() {
        SightRow r = of(cells);
        r.circleWanted = circleWanted;
        return r;
    }
}
