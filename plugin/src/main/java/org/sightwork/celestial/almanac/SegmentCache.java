package org.sightwork.celestial.almanac;

import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * Chebyshev interpolants of a group of channels, one per span of fixed length, fitted on first use
 * and kept in a small direct-mapped cache.
 *
 * <p>Spans are anchored at J2000.0 (span i covers [i L, (i + 1) L) TT days), so a result never
 * depends on what was asked before: a span fitted twice gives the same coefficients.
 *
 * <p><b>Thread safety:</b> thread-safe without locks. Span i lives in slot i mod {@link #SLOTS};
 * segments are immutable and published through an {@link AtomicReferenceArray}; two threads that
 * miss the same span at once both fit it and one result wins (same numbers either way).
 */
final class SegmentCache {

    /** Slots per group: 64 spans, i.e. 512 days of the 8-day frame and Moon spans, 11 years of the planets' 64. */
    static final int SLOTS = 64;

    private final double lengthDays;
    private final int degree;
    private final int channels;
    private final ChebyshevSegment.Channels f;
    private final AtomicReferenceArray<ChebyshevSegment> slots = new AtomicReferenceArray<>(SLOTS);

    /**
     * A cache.
     *
     * @param lengthDays span length (days)
     * @param degree Chebyshev degree
     * @param channels number of channels
     * @param f the functions to interpolate
     */
    SegmentCache(double lengthDays, int degree, int channels, ChebyshevSegment.Channels f) {
        this.lengthDays = lengthDays;
        this.degree = degree;
        this.channels = channels;
        this.f = f;
    }

    /**
     * Number of channels.
     *
     * @return channels
     */
    int channels() {
        return channels;
    }

    /**
     * Interpolated values of all channels.
     *
     * @param days TT days from J2000.0
     * @param out receives {@link #channels()} values
     */
    void evaluate(double days, double[] out) {
        long i = (long) Math.floor(days / lengthDays);
        int slot = (int) (i & (SLOTS - 1));
        ChebyshevSegment s = slots.get(slot);
        if (s == null || s.index != i) {
            s = ChebyshevSegment.fit(i, lengthDays, degree, channels, f);
            slots.set(slot, s);
        }
        s.evaluate(days, out);
    }
}
