package org.sightwork.bench;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.TimeUnit;
import net.sf.marineapi.nmea.parser.SentenceFactory;
import net.sf.marineapi.nmea.sentence.PositionSentence;
import net.sf.marineapi.nmea.sentence.Sentence;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.Track;

/**
 * NMEA 0183 import speed, in sentences per second on one thread: our byte-level reader against the
 * Java Marine API 0.12.0 on the same log (an hour at 1 Hz: 3,600 GGA and 3,600 RMC). Run:
 * {@code java -cp bench/target/classes:$(cat bench/target/bench-classpath.txt) org.openjdk.jmh.Main NmeaBenchmark -f1 -wi 3 -i 5 -w 1s -r 1s}.
 * Results: docs/PERFORMANCE.md, "Track import".
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class NmeaBenchmark {

    static final int SECONDS = 3600;
    static final int SENTENCES = 2 * SECONDS;

    byte[] log;

    /** Builds the log once. */
    @Setup
    public void setup() {
        log = NmeaLogs.inMemory(SECONDS);
    }

    /**
     * Our reader: checksum, fields, epochs, the track in arrays.
     *
     * @return the track
     * @throws IOException never (in memory)
     */
    @Benchmark
    @OperationsPerInvocation(SENTENCES)
    public Track leanReader() throws IOException {
        return NmeaTrackReader.read(new ByteArrayInputStream(log), "bench", NmeaTrackReader.Options.DEFAULT).value();
    }

    /**
     * The Java Marine API: line reading, parsing each sentence and reading its position.
     *
     * @param bh sink
     * @throws IOException never (in memory)
     */
    @Benchmark
    @OperationsPerInvocation(SENTENCES)
    public void marineApi(Blackhole bh) throws IOException {
        SentenceFactory sf = SentenceFactory.getInstance();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(new ByteArrayInputStream(log),
                StandardCharsets.US_ASCII))) {
            String s;
            while ((s = r.readLine()) != null) {
                Sentence sentence = sf.createParser(s);
                if (sentence instanceof PositionSentence p) {
                    bh.consume(p.getPosition());
                }
            }
        }
    }
}
