package org.sightwork.bench;

import java.time.Instant;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;

/**
 * Almanac speed: a star's place given a snapshot, a snapshot alone, one Sun / Moon / planet
 * position given a snapshot and from scratch, and the full almanac (64 bodies + Aries) for one
 * instant. Goals (issue 2): one Sun, Moon or planet position &lt;= 1.3 us, full almanac &lt;= 50 us,
 * stars &gt;= 1 million per second once the snapshot is known.
 *
 * <p>The almanac interpolates (Chebyshev spans fitted on first use and cached, see
 * docs/METHOD-ALMANAC.md). Three regimes are measured: instants within one span (a new instant each
 * call, one second apart: the steady state, spans already fitted), instants an hour apart running
 * through the years (a table: the fits are amortised, one per span), and random instants of
 * 1900-2100 (every call misses every cache: the cost of the fits themselves).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class AlmanacBenchmark {

    private Almanac almanac;
    private AstroTime time;
    private Almanac.Snapshot snapshot;
    private Body sirius;
    private List<Body> bodies;
    private int tick;
    private AstroTime[] hourly;
    private AstroTime[] random;
    private int hour;
    private int draw;

    /** Loads the data and fixes an instant. */
    @Setup
    public void setUp() {
        almanac = Almanac.standard();
        time = AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"));
        snapshot = almanac.at(time);
        sirius = almanac.body("Sirius");
        bodies = almanac.navigationalBodies();
        hourly = new AstroTime[1 << 16]; // 7.5 years of hours from 2020
        AstroTime h0 = AstroTime.ofUtc(Instant.parse("2020-01-01T00:00:00Z"));
        for (int i = 0; i < hourly.length; i++) {
            hourly[i] = h0.plusSeconds(3600.0 * i);
        }
        random = new AstroTime[4096];
        java.util.Random r = new java.util.Random(3L);
        long t0 = Instant.parse("1900-01-01T00:00:00Z").getEpochSecond();
        long span = Instant.parse("2100-12-31T00:00:00Z").getEpochSecond() - t0;
        for (int i = 0; i < random.length; i++) {
            random[i] = AstroTime.ofUtc(Instant.ofEpochSecond(t0 + (long) (r.nextDouble() * span)));
        }
    }

    /** A new instant each call, one second apart, so nothing is cached between calls. */
    private AstroTime nextTime() {
        tick = (tick + 1) & 1023;
        return time.plusSeconds(tick);
    }

    /** @return a star's apparent place given the snapshot */
    @Benchmark
    public BodyPosition starGivenSnapshot() {
        return snapshot.position(sirius);
    }

    /** @return the Sun given the snapshot */
    @Benchmark
    public BodyPosition sunGivenSnapshot() {
        return snapshot.position(Body.SUN);
    }

    /** @return the Moon given the snapshot */
    @Benchmark
    public BodyPosition moonGivenSnapshot() {
        return snapshot.position(Body.MOON);
    }

    /** @return Saturn given the snapshot (the largest planet series) */
    @Benchmark
    public BodyPosition saturnGivenSnapshot() {
        return snapshot.position(Body.SATURN);
    }

    /** @return Mars given the snapshot */
    @Benchmark
    public BodyPosition marsGivenSnapshot() {
        return snapshot.position(Body.MARS);
    }

    /** @return the per-instant state alone (nutation, precession, GAST, Earth) */
    @Benchmark
    public Almanac.Snapshot snapshotAlone() {
        return almanac.at(nextTime());
    }

    /** @return the Sun from scratch, snapshot included */
    @Benchmark
    public BodyPosition sunFromScratch() {
        return almanac.position(Body.SUN, nextTime());
    }

    /** @return the Moon from scratch, snapshot included */
    @Benchmark
    public BodyPosition moonFromScratch() {
        return almanac.position(Body.MOON, nextTime());
    }

    /**
     * The full almanac for one instant: Sun, Moon, four planets, 58 stars and Aries.
     *
     * @param bh sink
     */
    @Benchmark
    public void fullAlmanacOneInstant(Blackhole bh) {
        Almanac.Snapshot s = almanac.at(nextTime());
        bh.consume(s.ghaAriesDeg());
        for (Body b : bodies) {
            bh.consume(s.position(b));
        }
    }

    /**
     * The full almanac at instants an hour apart (a table): fits amortised over each span.
     *
     * @param bh sink
     */
    @Benchmark
    public void fullAlmanacHourly(Blackhole bh) {
        hour = (hour + 1) & (hourly.length - 1);
        Almanac.Snapshot s = almanac.at(hourly[hour]);
        bh.consume(s.ghaAriesDeg());
        for (Body b : bodies) {
            bh.consume(s.position(b));
        }
    }

    /**
     * The full almanac at a random instant of 1900-2100: every span is fitted afresh (worst case,
     * a single look-up at a new date).
     *
     * @param bh sink
     */
    @Benchmark
    public void fullAlmanacRandomInstant(Blackhole bh) {
        draw = (draw + 1) & (random.length - 1);
        Almanac.Snapshot s = almanac.at(random[draw]);
        bh.consume(s.ghaAriesDeg());
        for (Body b : bodies) {
            bh.consume(s.position(b));
        }
    }

    /** @return the Moon at an instant an hour after the last (a table of one body, fits amortised) */
    @Benchmark
    public BodyPosition moonHourly() {
        hour = (hour + 1) & (hourly.length - 1);
        return almanac.position(Body.MOON, hourly[hour]);
    }
}
