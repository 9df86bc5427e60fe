package org.sightwork.bench;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.fix.FixPlanner;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.GeoPosition;

/**
 * 10,000 sights reduced (almanac, corrections, Hc/Zn) and fixed in groups of four (2,500 least-
 * squares fixes with ellipses). Goal: under 100 ms for the lot. Run:
 * {@code java -cp bench/target/classes:$(cat bench/target/bench-classpath.txt) org.openjdk.jmh.Main FixBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FixBenchmark {

    private static final String[] STARS = {"Sirius", "Arcturus", "Vega", "Capella", "Canopus", "Rigel", "Procyon",
        "Betelgeuse", "Aldebaran", "Antares", "Spica", "Pollux", "Deneb", "Regulus", "Altair", "Fomalhaut"};

    private List<Sight> sights;
    private List<ReducedSight> reduced;
    private SightReducer reducer;

    /** Builds 10,000 sights of 2,500 invented observers, four stars each, visible ones only. */
    @Setup
    public void setup() {
        reducer = new SightReducer(Almanac.standard(), 0.0);
        Random random = new Random(1L);
        sights = new ArrayList<>();
        Instant t0 = Instant.parse("2025-01-01T00:00:00Z");
        while (sights.size() < 10_000) {
            GeoPosition dr = GeoPosition.of(random.nextDouble() * 120 - 60, random.nextDouble() * 360 - 180);
            Instant t = t0.plusSeconds(random.nextInt(365 * 86400));
            List<Sight> group = new ArrayList<>();
            for (int k = 0; k < STARS.length && group.size() < 4; k++) {
                String star = STARS[random.nextInt(STARS.length)];
                Sight probe = Sight.builder(star, t.plusSeconds(60L * group.size()), 30.0).eyeHeightM(3).dr(dr).build();
                double hc;
                try {
                    hc = reducer.reduce(probe, Optional.empty()).computed().hcDeg();
                } catch (IllegalArgumentException belowTheHorizon) {
                    continue;
                }
                if (hc > 15 && hc < 70 && group.stream().noneMatch(g -> g.body().equals(star))) {
                    group.add(Sight.builder(star, probe.utc(), hc + 0.1 + 0.05 * random.nextGaussian())
                            .eyeHeightM(3).dr(dr).courseDeg(90).speedKn(6).build());
                }
            }
            if (group.size() == 4) {
                sights.addAll(group);
            }
        }
        reduced = reduceAll();
    }

    private List<ReducedSight> reduceAll() {
        List<ReducedSight> out = new ArrayList<>(sights.size());
        for (Sight s : sights) {
            out.add(reducer.reduce(s, Optional.empty()));
        }
        return out;
    }

    /** Reduce 10,000 sights and fix them in 2,500 groups. */
    @Benchmark
    public void reduceAndFix(Blackhole bh) {
        List<ReducedSight> r = reduceAll();
        for (int i = 0; i < r.size(); i += 4) {
            bh.consume(FixPlanner.fixes(r.subList(i, i + 4), 30.0, FixOptions.DEFAULTS));
        }
    }

    /** The almanac's part alone: the 10,000 body positions the reduction asks for. */
    @Benchmark
    public void almanacOnly(Blackhole bh) {
        Almanac a = reducer.almanac();
        for (Sight s : sights) {
            bh.consume(a.position(a.body(s.body()), org.sightwork.celestial.time.AstroTime.ofUtc(s.utc())));
        }
    }

    /** Fix only (the 10,000 sights already reduced). */
    @Benchmark
    public void fixOnly(Blackhole bh) {
        for (int i = 0; i < reduced.size(); i += 4) {
            bh.consume(FixPlanner.fixes(reduced.subList(i, i + 4), 30.0, FixOptions.DEFAULTS));
        }
    }
}
