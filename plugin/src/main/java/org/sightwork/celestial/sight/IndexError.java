package org.sightwork.celestial.sight;

import java.util.Locale;

/**
 * The sextant's index error, stored as the <em>correction</em> added to the sextant altitude.
 *
 * <p>Convention (common practice): a reading ON the arc is subtracted, OFF the arc is added. So
 * {@code onArc(1.2)} has {@code correctionArcmin = -1.2} and {@code offArc(0.8)} has {@code +0.8}.
 * A bare signed number in the sight log is a <em>reading</em> with + meaning on the arc.
 *
 * @param correctionArcmin the correction added to Hs (minutes of arc, |value| at most 10′)
 */
public record IndexError(double correctionArcmin) {

    /** Largest index error accepted (minutes of arc): beyond it the sextant wants adjusting. */
    public static final double LIMIT_ARCMIN = 10.0;

    /** No index error. */
    public static final IndexError NONE = new IndexError(0.0);

    /** Checks the size. */
    public IndexError {
        if (!Double.isFinite(correctionArcmin) || Math.abs(correctionArcmin) > LIMIT_ARCMIN) {
            throw new SightException(String.format(Locale.ROOT,
                    "index error %.1f′ is larger than %.0f′: adjust the sextant, or check that the value is in minutes",
                    Math.abs(correctionArcmin), LIMIT_ARCMIN));
        }
    }

    /**
     * @param readingArcmin the index reading ON the arc (minutes, not negative)
     * @return the index error, subtracted
     */
    public static IndexError onArc(double readingArcmin) {
        return new IndexError(-Math.abs(readingArcmin));
    }

    /**
     * @param readingArcmin the index reading OFF the arc (minutes, not negative)
     * @return the index error, added
     */
    public static IndexError offArc(double readingArcmin) {
        return new IndexError(Math.abs(readingArcmin));
    }

    /**
     * @param signedReadingArcmin the reading, + on the arc, - off the arc (minutes)
     * @return the index error
     */
    public static IndexError ofSignedReading(double signedReadingArcmin) {
        return new IndexError(-signedReadingArcmin);
    }

    /** @return e.g. "1.2′ on the arc (-1.2′)" */
    public String describe() {
        if (correctionArcmin == 0.0) {
            return "none";
        }
        return String.format(Locale.ROOT, "%.1f′ %s the arc (%+.1f′)", Math.abs(correctionArcmin),
                correctionArcmin < 0 ? "on" : "off", correctionArcmin);
    }
}
