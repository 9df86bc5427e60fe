package org.sightwork.geo.track;

import java.time.Duration;
import java.time.Instant;
import java.util.Arrays;
import java.util.Optional;
import java.util.OptionalDouble;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A time-ordered track, stored in primitive arrays: about 40 bytes a point, so that a 30-day log
 * at 1 Hz (2.6 million fixes) takes about 100 MB.
 *
 * <p>Times strictly increase. Values a source did not give are held as NaN inside and come out as
 * empty {@link OptionalDouble}s.
 *
 * <p><b>Interpolation.</b> Linear in time between the two neighbouring points, in latitude and in
 * longitude taken the short way across the date line: between fixes seconds or minutes apart the
 * difference from the rhumb or great circle is far below a GPS fix's own error (at 10 kn a minute
 * is 0.17 nm, over which the two differ by millimetres).
 *
 * <p><b>Thread safety.</b> Immutable; safe to share.
 */
public final class Track {

    private final long[] timeMs;
    private final double[] latDeg;
    private final double[] lonDeg;
    private final float[] cogDeg;
    private final float[] sogKn;
    private final float[] headingDeg;
    private final float[] stwKn;

    Track(long[] timeMs, double[] latDeg, double[] lonDeg, float[] cogDeg, float[] sogKn, float[] headingDeg,
            float[] stwKn) {
        this.timeMs = timeMs;
        this.latDeg = latDeg;
        this.lonDeg = lonDeg;
        this.cogDeg = cogDeg;
        this.sogKn = sogKn;
        this.headingDeg = headingDeg;
        this.stwKn = stwKn;
    }

    /** @return a builder for a new track */
    public static Builder builder() {
        return new Builder(1024);
    }

    /** @return the number of points */
    public int size() {
        return timeMs.length;
    }

    /** @return true when the track has no point */
    public boolean isEmpty() {
        return timeMs.length == 0;
    }

    /**
     * @param i index, [0, size)
     * @return time of point i (milliseconds since 1970-01-01T00:00Z, UTC)
     */
    public long timeMs(int i) {
        return timeMs[i];
    }

    /**
     * @param i index
     * @return time of point i (UTC)
     */
    public Instant time(int i) {
        return Instant.ofEpochMilli(timeMs[i]);
    }

    /**
     * @param i index
     * @return latitude of point i (degrees)
     */
    public double latDeg(int i) {
        return latDeg[i];
    }

    /**
     * @param i index
     * @return longitude of point i (degrees)
     */
    public double lonDeg(int i) {
        return lonDeg[i];
    }

    /**
     * @param i index
     * @return the point i with everything the source gave
     */
    public TrackPoint point(int i) {
        return new TrackPoint(time(i), new GeoPosition(latDeg[i], lonDeg[i]), opt(cogDeg[i]), opt(sogKn[i]),
                opt(headingDeg[i]), opt(stwKn[i]));
    }

    /**
     * @param i index
     * @return heading at point i (degrees true), if given
     */
    public OptionalDouble headingDeg(int i) {
        return opt(headingDeg[i]);
    }

    /**
     * @param i index
     * @return speed through the water at point i (knots), if given
     */
    public OptionalDouble stwKn(int i) {
        return opt(stwKn[i]);
    }

    /**
     * @param i index
     * @return course over ground at point i (degrees true), if given
     */
    public OptionalDouble cogDeg(int i) {
        return opt(cogDeg[i]);
    }

    /**
     * @param i index
     * @return speed over ground at point i (knots), if given
     */
    public OptionalDouble sogKn(int i) {
        return opt(sogKn[i]);
    }

    /** @return the first time, if any */
    public Optional<Instant> start() {
        return isEmpty() ? Optional.empty() : Optional.of(time(0));
    }

    /** @return the last time, if any */
    public Optional<Instant> end() {
        return isEmpty() ? Optional.empty() : Optional.of(time(size() - 1));
    }

    /**
     * The position at a time, interpolated between the neighbouring points.
     *
     * @param t the time (UTC)
     * @param maxGap the longest gap between two points across which to interpolate
     * @return the position, or empty outside the track or inside a longer gap
     */
    public Optional<GeoPosition> positionAt(Instant t, Duration maxGap) {
        long ms = t.toEpochMilli();
        int n = timeMs.length;
        if (n == 0 || ms < timeMs[0] || ms > timeMs[n - 1]) {
            return Optional.empty();
        }
        int k = Arrays.binarySearch(timeMs, ms);
        if (k >= 0) {
            return Optional.of(new GeoPosition(latDeg[k], lonDeg[k]));
        }
        int hi = -k - 1;
        int lo = hi - 1;
        if (timeMs[hi] - timeMs[lo] > maxGap.toMillis()) {
            return Optional.empty();
        }
        double f = (double) (ms - timeMs[lo]) / (timeMs[hi] - timeMs[lo]);
        double dLon = lonDeg[hi] - lonDeg[lo];
        if (dLon > 180) {
            dLon -= 360;
        } else if (dLon < -180) {
            dLon += 360;
        }
        return Optional.of(GeoPosition.of(latDeg[lo] + f * (latDeg[hi] - latDeg[lo]), lonDeg[lo] + f * dLon));
    }

    /**
     * The index of the last point at or before a time.
     *
     * @param t the time
     * @return the index, or -1 when t is before the first point
     */
    public int indexAtOrBefore(Instant t) {
        int k = Arrays.binarySearch(timeMs, t.toEpochMilli());
        return k >= 0 ? k : -k - 2;
    }

    private static OptionalDouble opt(float v) {
        return Float.isNaN(v) ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    /**
     * Builds a track point by point, in time order; growth by doubling keeps it linear in time.
     * Not thread-safe.
     */
    public static final class Builder {
        private long[] t;
        private double[] lat;
        private double[] lon;
        private float[] cog;
        private float[] sog;
        private float[] hdg;
        private float[] stw;
        private int n;

        Builder(int capacity) {
            t = new long[capacity];
            lat = new double[capacity];
            lon = new double[capacity];
            cog = new float[capacity];
            sog = new float[capacity];
            hdg = new float[capacity];
            stw = new float[capacity];
        }

        /** @return the number of points so far */
        public int size() {
            return n;
        }

        /** @return time of the last point added (ms since the epoch), or Long.MIN_VALUE */
        public long lastTimeMs() {
            return n == 0 ? Long.MIN_VALUE : t[n - 1];
        }

        /**
         * Adds a point; missing values are NaN.
         *
         * @param timeMs time (ms since 1970-01-01T00:00Z), after the last one added
         * @param latDeg latitude (degrees)
         * @param lonDeg longitude (degrees)
         * @param cogDeg course over ground (degrees true) or NaN
         * @param sogKn speed over ground (knots) or NaN
         * @param headingDeg heading (degrees true) or NaN
         * @param stwKn speed through the water (knots) or NaN
         * @return this builder
         * @throws IllegalArgumentException if the time does not increase or the position is out of range
         */
        public Builder add(long timeMs, double latDeg, double lonDeg, double cogDeg, double sogKn,
                double headingDeg, double stwKn) {
            if (n > 0 && timeMs <= t[n - 1]) {
                throw new IllegalArgumentException("time " + Instant.ofEpochMilli(timeMs)
                        + " is not after the previous point's " + Instant.ofEpochMilli(t[n - 1]));
            }
            if (!(latDeg >= -90 && latDeg <= 90) || !(lonDeg >= -180 && lonDeg <= 180)) {
                throw new IllegalArgumentException("position " + latDeg + ", " + lonDeg + " is out of range");
            }
            if (n == t.length) {
                int c = n * 2;
                t = Arrays.copyOf(t, c);
                lat = Arrays.copyOf(lat, c);
                lon = Arrays.copyOf(lon, c);
                cog = Arrays.copyOf(cog, c);
                sog = Arrays.copyOf(sog, c);
                hdg = Arrays.copyOf(hdg, c);
                stw = Arrays.copyOf(stw, c);
            }
            t[n] = timeMs;
            lat[n] = latDeg;
            lon[n] = lonDeg >= 180 ? lonDeg - 360 : lonDeg;
            cog[n] = (float) cogDeg;
            sog[n] = (float) sogKn;
            hdg[n] = (float) headingDeg;
            stw[n] = (float) stwKn;
            n++;
            return this;
        }

        /**
         * Adds a point.
         *
         * @param p the point, after the last one added
         * @return this builder
         */
        public Builder add(TrackPoint p) {
            return add(p.time().toEpochMilli(), p.position().latDeg(), p.position().lonDeg(),
                    p.cogDeg().orElse(Double.NaN), p.sogKn().orElse(Double.NaN),
                    p.headingDeg().orElse(Double.NaN), p.stwKn().orElse(Double.NaN));
        }

        /** Sets heading and/or speed through the water of the last point (NaN leaves a value as is). */
        void setLastWaterData(double headingDeg, double stwKn) {
            if (n == 0) {
                return;
            }
            if (!Double.isNaN(headingDeg)) {
                hdg[n - 1] = (float) headingDeg;
            }
            if (!Double.isNaN(stwKn)) {
                stw[n - 1] = (float) stwKn;
            }
        }

        /** Sets course and speed over ground of the last point. */
        void setLastGroundData(double cogDeg, double sogKn) {
            if (n == 0) {
                return;
            }
            if (!Double.isNaN(cogDeg)) {
                cog[n - 1] = (float) cogDeg;
            }
            if (!Double.isNaN(sogKn)) {
                sog[n - 1] = (float) sogKn;
            }
        }

        /** @return the track (the arrays trimmed to size) */
        public Track build() {
            return new Track(Arrays.copyOf(t, n), Arrays.copyOf(lat, n), Arrays.copyOf(lon, n), Arrays.copyOf(cog, n),
                    Arrays.copyOf(sog, n), Arrays.copyOf(hdg, n), Arrays.copyOf(stw, n));
        }
    }
}
