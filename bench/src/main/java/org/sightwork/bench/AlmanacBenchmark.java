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

    /** Loads the data and fixes an instant. */
    @Setup
    public void setUp() {
        almanac = Almanac.standard();
        time = AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"));
        snapshot = almanac.at(time);
        sirius = almanac.body("Sirius");
        bodies = almanac.navigationalBodies();
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
}
