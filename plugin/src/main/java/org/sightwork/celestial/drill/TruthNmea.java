package org.sightwork.celestial.drill;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.ArrayList;
import java.util.List;
import net.sf.marineapi.nmea.parser.SentenceFactory;
import net.sf.marineapi.nmea.sentence.GGASentence;
import net.sf.marineapi.nmea.sentence.RMCSentence;
import net.sf.marineapi.nmea.sentence.SentenceId;
import net.sf.marineapi.nmea.sentence.TalkerId;
import net.sf.marineapi.nmea.util.DataStatus;
import net.sf.marineapi.nmea.util.Date;
import net.sf.marineapi.nmea.util.FaaMode;
import net.sf.marineapi.nmea.util.GpsFixQuality;
import net.sf.marineapi.nmea.util.Position;
import net.sf.marineapi.nmea.util.Time;
import net.sf.marineapi.nmea.util.Units;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The true track as a GPS receiver would have logged it: NMEA 0183 RMC and GGA sentences, written
 * by the Java Marine API ({@code net.sf.marineapi}), which computes the checksums (XOR of the
 * characters between {@code $} and {@code *}, NMEA 0183).
 *
 * <p>A sentence pair every {@code intervalSeconds} from departure to arrival, whole seconds, fix
 * quality 1 (GPS), 8 satellites, HDOP 1.0, antenna height 0 m: the drill's truth, not a receiver's
 * noise.
 */
public final class TruthNmea {

    private TruthNmea() {
    }

    /**
     * Writes the true track.
     *
     * @param track the true track
     * @param intervalSeconds seconds between fixes (≥ 1)
     * @return the lines, CR LF not included
     */
    public static List<String> sentences(TrueTrack track, int intervalSeconds) {
        if (intervalSeconds < 1) {
            throw new IllegalArgumentException("intervalSeconds " + intervalSeconds + " is below 1 s");
        }
        SentenceFactory f = SentenceFactory.getInstance();
        List<String> out = new ArrayList<>();
        Instant t = track.startUtc().plusNanos(999_999_999L).truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
        while (!t.isAfter(track.endUtc())) {
            GeoPosition p = track.positionAt(t);
            TrueTrack.Leg leg = track.legAt(t);
            ZonedDateTime z = t.atZone(ZoneOffset.UTC);
            Time time = new Time(z.getHour(), z.getMinute(), z.getSecond());
            Position pos = new Position(p.latDeg(), p.lonDeg());

            RMCSentence rmc = (RMCSentence) f.createParser(TalkerId.GP, SentenceId.RMC);
            rmc.setTime(time);
            rmc.setDate(new Date(z.getYear(), z.getMonthValue(), z.getDayOfMonth()));
            rmc.setStatus(DataStatus.ACTIVE);
            rmc.setPosition(pos);
            rmc.setSpeed(Math.round(leg.speedOverGroundKn() * 10.0) / 10.0);
            rmc.setCourse(Math.round(leg.courseOverGroundDeg() * 10.0) / 10.0 % 360.0);
            rmc.setMode(FaaMode.AUTOMATIC);
            out.add(rmc.toSentence());

            GGASentence gga = (GGASentence) f.createParser(TalkerId.GP, SentenceId.GGA);
            gga.setTime(time);
            gga.setPosition(pos);
            gga.setFixQuality(GpsFixQuality.NORMAL);
            gga.setSatelliteCount(8);
            gga.setHorizontalDOP(1.0);
            gga.setAltitude(0.0);
            gga.setAltitudeUnits(Units.METER);
            out.add(gga.toSentence());
            t = t.plus(Duration.ofSeconds(intervalSeconds));
        }
        return out;
    }
}
