package org.sightwork.celestial.io.export;

import java.util.List;
import java.util.Objects;

/**
 * A printable worksheet: a title, a line under it and sections of labelled values, such as each
 * sight's corrections and reduction, and each fix.
 *
 * @param title the title, e.g. "Sights of 2026-06-21"
 * @param subtitle a line under the title (vessel, passage), may be empty
 * @param sections the sections in order
 * @param footer a closing paragraph (the caution), may be empty
 */
public record WorksheetReport(String title, String subtitle, List<Section> sections, String footer) {

    /** Copies the list and checks that nothing is null. */
    public WorksheetReport {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(subtitle, "subtitle");
        Objects.requireNonNull(footer, "footer");
        sections = List.copyOf(sections);
    }

    /**
     * A section: a heading and rows.
     *
     * @param heading the heading, e.g. "Sun LL 09:12:30 UTC"
     * @param rows label and value pairs
     */
    public record Section(String heading, List<Row> rows) {
        /** Copies the list. */
        public Section {
            Objects.requireNonNull(heading, "heading");
            rows = List.copyOf(rows);
        }
    }

    /**
     * One labelled value.
     *
     * @param label what, e.g. "Dip (2.4 m)"
     * @param value the value, e.g. "−2.7′"
     */
    public record Row(String label, String value) {
        /** Checks that nothing is null. */
        public Row {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(value, "value");
        }
    }
}
