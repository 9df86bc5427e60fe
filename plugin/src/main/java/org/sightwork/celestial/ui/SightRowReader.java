package org.sightwork.celestial.ui;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.sightwork.celestial.sight.IndexError;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.sight.SightException;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Reads a {@link SightRow} into a {@link Sight}: every cell is read on its own, and each bad cell
 * gets its own reason, so that the editor can mark exactly the cells to fix. What the sight's own
 * checks refuse (an altitude over 90°, an index error over 10′) is put on the cell it concerns.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class SightRowReader {

    /** 1 foot = 0.3048 m (international foot, 1959). */
    static final double FOOT_M = 0.3048;

    private static final Pattern INDEX = Pattern.compile("([+-−]?\\s*\\d+(?:[.,]\\d*)?)\\s*['′]?\\s*(on|off)?",
            Pattern.CASE_INSENSITIVE);
    private static final Pattern EYE = Pattern.compile("(\\d+(?:[.,]\\d*)?)\\s*(m|ft|feet|')?", Pattern.CASE_INSENSITIVE);

    /**
     * What a row says.
     *
     * @param sight the sight, when every cell it needs was read
     * @param ap the assumed position typed, if any
     * @param fixGroup the fix the sight belongs to ("" for a line alone)
     * @param problems the reason for each bad cell
     */
    record Read(Optional<Sight> sight, Optional<GeoPosition> ap, String fixGroup, Map<SightColumn, String> problems) {
        Read {
            problems = Map.copyOf(problems);
        }

        boolean ok() {
            return problems.isEmpty() && sight.isPresent();
        }
    }

    private SightRowReader() {
    }

    /**
     * Reads a row.
     *
     * @param row the row
     * @param passageDay the day a time without a date belongs to
     * @return the sight or the problems
     */
    static Read read(SightRow row, LocalDate passageDay) {
        Map<SightColumn, String> problems = new EnumMap<>(SightColumn.class);
        String body = row.get(SightColumn.BODY);
        if (body.isEmpty()) {
            problems.put(SightColumn.BODY, "the body is missing");
        }
        Limb limb = null;
        String limbText = row.get(SightColumn.LIMB).toUpperCase(Locale.ROOT);
        switch (limbText) {
            case "" -> limb = null;
            case "LL", "L", "LOWER" -> limb = Limb.LOWER;
            case "UL", "U", "UPPER" -> limb = Limb.UPPER;
            case "C", "CENTRE", "CENTER" -> limb = Limb.CENTRE;
            default -> problems.put(SightColumn.LIMB, "'" + row.get(SightColumn.LIMB) + "' is not a limb: LL, UL or blank");
        }
        Instant time = null;
        try {
            time = parseTime(row.get(SightColumn.TIME), passageDay);
        } catch (IllegalArgumentException e) {
            problems.put(SightColumn.TIME, e.getMessage());
        }
        double watchFast = number(row, SightColumn.WATCH_FAST, 0.0, "seconds", problems);
        double hs = Double.NaN;
        try {
            hs = Angles.parse(row.get(SightColumn.HS));
        } catch (IllegalArgumentException e) {
            problems.put(SightColumn.HS, e.getMessage());
        }
        IndexError ie = IndexError.NONE;
        try {
            ie = parseIndex(row.get(SightColumn.INDEX));
        } catch (IllegalArgumentException e) {
            problems.put(SightColumn.INDEX, e.getMessage());
        }
        double eye = 0.0;
        try {
            eye = parseEye(row.get(SightColumn.EYE));
        } catch (IllegalArgumentException e) {
            problems.put(SightColumn.EYE, e.getMessage());
        }
        double t = number(row, SightColumn.TEMPERATURE, Sight.DEFAULT_TEMPERATURE_C, "°C", problems);
        double p = number(row, SightColumn.PRESSURE, Sight.DEFAULT_PRESSURE_HPA, "hPa", problems);
        Optional<GeoPosition> dr = position(row, SightColumn.DR, problems);
        Optional<GeoPosition> ap = position(row, SightColumn.AP, problems);

        Optional<Sight> sight = Optional.empty();
        if (problems.isEmpty()) {
            try {
                Sight.Builder b = Sight.builder(body, time, hs).watchFastSeconds(watchFast).indexError(ie)
                        .eyeHeightM(eye).temperatureC(t).pressureHpa(p);
                if (limb != null) {
                    b.limb(limb);
                }
                dr.ifPresent(b::dr);
                // The builder takes the watch time as UTC when the watch error is zero; with an
                // error, the row's time is what the watch showed.
                sight = Optional.of(b.build());
            } catch (IllegalArgumentException e) {
                problems.put(columnOf(e.getMessage()), e.getMessage());
            }
        }
        return new Read(sight, ap, row.get(SightColumn.FIX), problems);
    }

    /** Puts a sight's own refusal on the cell it names. */
    private static SightColumn columnOf(String message) {
        String m = message == null ? "" : message.toLowerCase(Locale.ROOT);
        if (m.contains("index error")) {
            return SightColumn.INDEX;
        } else if (m.contains("height of eye")) {
            return SightColumn.EYE;
        } else if (m.contains("temperature")) {
            return SightColumn.TEMPERATURE;
        } else if (m.contains("pressure")) {
            return SightColumn.PRESSURE;
        } else if (m.contains("watch")) {
            return SightColumn.WATCH_FAST;
        } else if (m.contains("body")) {
            return SightColumn.BODY;
        }
        return SightColumn.HS;
    }

    static Instant parseTime(String text, LocalDate day) {
        if (text.isEmpty()) {
            throw new IllegalArgumentException("the time is missing: yyyy-mm-dd hh:mm:ss (UTC)");
        }
        String t = text.replace('T', ' ').replace("Z", "").replace("UTC", "").strip();
        try {
            if (t.length() <= 8) {
                return LocalDateTime.of(day, LocalTime.parse(t.length() == 5 ? t + ":00" : t)).toInstant(ZoneOffset.UTC);
            }
            String[] parts = t.split("\\s+");
            if (parts.length != 2) {
                throw new DateTimeParseException("", t, 0);
            }
            String hms = parts[1].length() == 5 ? parts[1] + ":00" : parts[1];
            return LocalDateTime.of(LocalDate.parse(parts[0]), LocalTime.parse(hms)).toInstant(ZoneOffset.UTC);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("'" + text + "' is not a time: yyyy-mm-dd hh:mm:ss or hh:mm:ss (UTC)");
        }
    }

    static IndexError parseIndex(String text) {
        if (text.isEmpty()) {
            return IndexError.NONE;
        }
        Matcher m = INDEX.matcher(text.strip());
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text + "' is not an index error: e.g. 1.5 on, 2.0 off, or +2.0");
        }
        double v = Double.parseDouble(m.group(1).replace('−', '-').replace(" ", "").replace(',', '.'));
        if (m.group(2) == null) {
            return new IndexError(v);
        }
        return m.group(2).equalsIgnoreCase("on") ? IndexError.onArc(v) : IndexError.offArc(v);
    }

    static double parseEye(String text) {
        if (text.isEmpty()) {
            throw new IllegalArgumentException("the height of eye is missing (metres, or e.g. 9 ft)");
        }
        Matcher m = EYE.matcher(text.strip());
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + text + "' is not a height of eye: metres, or e.g. 9 ft");
        }
        double v = Double.parseDouble(m.group(1).replace(',', '.'));
        boolean feet = m.group(2) != null && !m.group(2).equalsIgnoreCase("m");
        return feet ? v * FOOT_M : v;
    }

    private static double number(SightRow row, SightColumn c, double blank, String unit,
            Map<SightColumn, String> problems) {
        String text = row.get(c).replace('−', '-').replace(',', '.');
        if (text.isEmpty()) {
            return blank;
        }
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            problems.put(c, "'" + row.get(c) + "' is not a number (" + unit + ")");
            return blank;
        }
    }

    private static Optional<GeoPosition> position(SightRow row, SightColumn c, Map<SightColumn, String> problems) {
        String text = row.get(c);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(parsePosition(text));
        } catch (IllegalArgumentException e) {
            problems.put(c, e.getMessage());
            return Optional.empty();
        }
    }

    /**
     * Reads "latitude longitude": the latitude ends at its N or S, or the two are separated by a
     * comma or semicolon.
     *
     * @param text e.g. {@code 38°20.0'N 027°10.0'W}
     * @return the position
     */
    static GeoPosition parsePosition(String text) {
        String t = text.strip();
        int split = -1;
        for (int i = 0; i < t.length(); i++) {
            char ch = Character.toUpperCase(t.charAt(i));
            if (ch == 'N' || ch == 'S') {
                split = i + 1;
                break;
            }
        }
        if (split < 0) {
            split = Math.max(t.indexOf(','), t.indexOf(';'));
            if (split < 0) {
                throw new IllegalArgumentException("'" + text + "' is not a position: latitude with N or S, then "
                        + "longitude with E or W, e.g. 38°20.0'N 027°10.0'W");
            }
            t = t.substring(0, split) + " " + t.substring(split + 1);
        }
        double lat = Angles.parseLatitude(t.substring(0, split).strip());
        double lon = Angles.parseLongitude(t.substring(split).strip());
        return GeoPosition.of(lat, lon);
    }

    /**
     * Writes a position as the editor shows it.
     *
     * @param p the position
     * @return e.g. {@code 38°20.0′N 027°10.0′W}
     */
    static String formatPosition(GeoPosition p) {
        return Angles.formatLatitude(p.latDeg()) + " " + Angles.formatLongitude(p.lonDeg());
    }
}
