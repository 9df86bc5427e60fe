package org.sightwork.geo.track;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * Reads an NMEA 0183 log into a {@link Track}: position, time, course and speed over ground from
 * RMC, GGA, GLL, VTG and ZDA; heading and speed through the water from HDT, HDG and VHW. Any
 * talker ID is accepted; other sentences are counted and passed over.
 *
 * <p><b>Method.</b> Sentence layouts as in NMEA 0183 version 2.3 and 4.1 (fields by position; the
 * mode and status fields where they exist). A fix is one UTC second of the log (an "epoch"): the
 * sentences with the same time are merged. GGA and GLL carry no date: the date comes from the last
 * RMC or ZDA, and a time of day that falls by more than 12 h is the next day (midnight). Fixes
 * before the first date are held and dated when it arrives; without any date in the log the caller
 * must give one. A time that goes back or repeats an earlier epoch is reported and the fix skipped.
 * HDG's magnetic heading becomes true with its deviation and variation fields (east positive).
 *
 * <p><b>Why not the Java Marine API here.</b> marineapi 0.12.0 is kept as the reference that the
 * tests compare this reader with, sentence by sentence. In our JMH benchmark it parsed about 0.11
 * million sentences a second against 0.9 million for this reader in the same run, on a shared and
 * heavily loaded machine (docs/PERFORMANCE.md, "Track import"): eight times slower, far from the goal
 * of 1 million a second on one core, because of its sentence objects and string splitting. This
 * reader works on the bytes of each line, without objects per line.
 *
 * <p><b>Checks.</b> Each line must have a checksum ({@code *hh}, the XOR of the characters between
 * {@code $} and {@code *}) that matches, only printable ASCII, and fields that read as numbers where
 * numbers belong; a line failing any of these is reported with its line and column, and skipped.
 *
 * <p><b>Limits.</b> A fix without a valid position (RMC or GLL status V, GGA quality 0) gives no
 * point. Heading and speed through the water attach to the fix of their epoch (or the last fix).
 *
 * <p><b>Thread safety.</b> Each call reads with its own state; safe.
 */
public final class NmeaTrackReader {

    /** The longest line accepted (NMEA allows 82 characters; some devices write longer ones). */
    static final int MAX_LINE = 512;
    private static final int MAX_FIELDS = 40;
    private static final long DAY_MS = 86_400_000L;
    private static final long HALF_DAY_MS = DAY_MS / 2;
    private static final double[] POW10 = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15, 1e16, 1e17, 1e18};

    /**
     * How to read.
     *
     * @param requireChecksum refuse a sentence without {@code *hh} (the default: a line cut short
     *        loses it)
     * @param startDate the UTC date of the log's first fix, for a log without RMC or ZDA
     */
    public record Options(boolean requireChecksum, Optional<LocalDate> startDate) {
        /** The defaults: checksum required, no given date. */
        public static final Options DEFAULT = new Options(true, Optional.empty());
    }

    private final Problems problems;
    private final Options options;
    private final Track.Builder track = new Track.Builder(4096);
    private final byte[] line = new byte[MAX_LINE];
    private final int[] fs = new int[MAX_FIELDS];
    private final int[] fe = new int[MAX_FIELDS];
    private int nf;
    private long lineNo;

    // the epoch being gathered
    private long pTod = -1;
    private long pLine;
    private double pLat = Double.NaN;
    private double pLon = Double.NaN;
    private double pCog = Double.NaN;
    private double pSog = Double.NaN;
    private double pHdg = Double.NaN;
    private double pStw = Double.NaN;
    private long pDay = Long.MIN_VALUE;

    private long epochDay = Long.MIN_VALUE;
    private long lastTod = -1;
    private long sentences;
    private long ignored;
    private boolean hdgWithoutVariationReported;

    // fixes before the first date: time of day and values
    private long[] uTod = new long[0];
    private long[] uLine = new long[0];
    private double[][] uVal = new double[6][0];
    private int uN;

    private NmeaTrackReader(String fileName, Options options) {
        this.problems = new Problems(fileName);
        this.options = options;
        options.startDate().ifPresent(d -> epochDay = d.toEpochDay());
    }

    /**
     * Reads a log file.
     *
     * @param file the file
     * @param options how to read
     * @return the track and the problems with its lines
     * @throws IOException if the file cannot be read
     */
    public static ImportResult<Track> read(Path file, Options options) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, file.toString(), options);
        }
    }

    /**
     * Reads a log from a stream.
     *
     * @param in the stream (not closed)
     * @param fileName the name used in problem reports
     * @param options how to read
     * @return the track and the problems with its lines
     * @throws IOException if the stream cannot be read
     */
    public static ImportResult<Track> read(InputStream in, String fileName, Options options) throws IOException {
        NmeaTrackReader r = new NmeaTrackReader(fileName, options);
        r.readAll(in);
        return r.problems.result(r.track.build());
    }

    private void readAll(InputStream in) throws IOException {
        byte[] buf = new byte[1 << 16];
        int len = 0;
        boolean tooLong = false;
        boolean prevCr = false;
        lineNo = 1;
        int n;
        while ((n = in.read(buf)) > 0) {
            for (int i = 0; i < n; i++) {
                byte b = buf[i];
                if (b == '\n' || b == '\r') {
                    if (b == '\n' && prevCr) {
                        prevCr = false;
                        continue;
                    }
                    prevCr = b == '\r';
                    endLine(len, tooLong);
                    len = 0;
                    tooLong = false;
                    lineNo++;
                } else {
                    prevCr = false;
                    if (len < MAX_LINE) {
                        line[len++] = b;
                    } else {
                        tooLong = true;
                    }
                }
            }
        }
        if (len > 0 || tooLong) {
            endLine(len, tooLong);
        }
        flushEpoch();
        if (uN > 0) {
            problems.add(0, 0, uN + " fixes before the first date (no RMC or ZDA sentence gives one) were left out:"
                    + " give the log's start date");
        }
        if (sentences == 0 && problems.count() == 0 && lineNo > 1) {
            problems.add(0, 0, "no NMEA 0183 sentence found");
        }
    }

    private void endLine(int len, boolean tooLong) {
        if (tooLong) {
            problems.add(lineNo, MAX_LINE + 1, "line longer than " + MAX_LINE + " characters: not an NMEA 0183 sentence");
            return;
        }
        int start = -1;
        for (int i = 0; i < len; i++) {
            if (line[i] == '$' || line[i] == '!') {
                start = i;
                break;
            }
        }
        if (start < 0) {
            for (int i = 0; i < len; i++) {
                if (line[i] != ' ' && line[i] != '\t') {
                    problems.add(lineNo, 1, "not an NMEA 0183 sentence: expected '$' at the start" + describeBytes(len));
                    return;
                }
            }
            return; // a blank line
        }
        if (start > 0) {
            problems.add(lineNo, 1, start + " characters before '$' left out");
        }
        int star = -1;
        for (int i = len - 1; i > start; i--) {
            if (line[i] == '*') {
                star = i;
                break;
            }
        }
        int end = star < 0 ? len : star;
        for (int i = start + 1; i < end; i++) {
            int c = line[i] & 0xff;
            if (c < 0x20 || c > 0x7e) {
                problems.add(lineNo, i + 1, String.format(Locale.ROOT,
                        "unreadable byte 0x%02X: NMEA 0183 allows printable ASCII only", c));
                return;
            }
        }
        if (star < 0) {
            if (options.requireChecksum()) {
                problems.add(lineNo, len + 1, "no checksum '*hh' at the end (a line cut short?)");
                return;
            }
        } else {
            if (star + 2 >= len || hex(line[star + 1]) < 0 || hex(line[star + 2]) < 0) {
                problems.add(lineNo, star + 2, "checksum after '*' is not two hexadecimal digits (a line cut short?)");
                return;
            }
            int given = hex(line[star + 1]) * 16 + hex(line[star + 2]);
            int x = 0;
            for (int i = start + 1; i < star; i++) {
                x ^= line[i];
            }
            x &= 0xff;
            if (x != given) {
                problems.add(lineNo, star + 2, String.format(Locale.ROOT,
                        "checksum mismatch: the sentence gives %02X, its characters give %02X", given, x));
                return;
            }
        }
        // fields
        nf = 0;
        int fstart = start + 1;
        for (int i = start + 1; i <= end; i++) {
            if (i == end || line[i] == ',') {
                if (nf == MAX_FIELDS) {
                    break;
                }
                fs[nf] = fstart;
                fe[nf] = i;
                nf++;
                fstart = i + 1;
            }
        }
        sentences++;
        int a0 = fs[0];
        int alen = fe[0] - a0;
        if (alen != 5 || line[a0] == 'P') {
            ignored++;
            return;
        }
        byte s0 = line[a0 + 2];
        byte s1 = line[a0 + 3];
        byte s2 = line[a0 + 4];
        try {
            if (s0 == 'R' && s1 == 'M' && s2 == 'C') {
                rmc();
            } else if (s0 == 'G' && s1 == 'G' && s2 == 'A') {
                gga();
            } else if (s0 == 'G' && s1 == 'L' && s2 == 'L') {
                gll();
            } else if (s0 == 'V' && s1 == 'T' && s2 == 'G') {
                vtg();
            } else if (s0 == 'Z' && s1 == 'D' && s2 == 'A') {
                zda();
            } else if (s0 == 'H' && s1 == 'D' && s2 == 'T') {
                hdt();
            } else if (s0 == 'H' && s1 == 'D' && s2 == 'G') {
                hdg();
            } else if (s0 == 'V' && s1 == 'H' && s2 == 'W') {
                vhw();
            } else {
                ignored++;
            }
        } catch (FieldException e) {
            problems.add(lineNo, e.column, e.getMessage());
        }
    }

    private String describeBytes(int len) {
        for (int i = 0; i < len; i++) {
            int c = line[i] & 0xff;
            if ((c < 0x20 && c != '\t') || c > 0x7e) {
                return " (the line holds unreadable bytes: binary data?)";
            }
        }
        return "";
    }

    // ---- sentences ----

    private void rmc() throws FieldException {
        need(10, "RMC");
        long tod = time(1);
        long day = date(9);
        boolean valid = isChar(2, 'A');
        double lat = valid ? latitude(3, 4) : Double.NaN;
        double lon = valid ? longitude(5, 6) : Double.NaN;
        double sog = optNumber(7, "speed over ground");
        double cog = optNumber(8, "course over ground");
        epoch(tod, day);
        position(lat, lon);
        ground(cog, sog);
    }

    private void gga() throws FieldException {
        need(7, "GGA");
        long tod = time(1);
        int quality = empty(6) ? 0 : (int) number(6, "fix quality");
        boolean valid = quality > 0 && !empty(2);
        double lat = valid ? latitude(2, 3) : Double.NaN;
        double lon = valid ? longitude(4, 5) : Double.NaN;
        epoch(tod, Long.MIN_VALUE);
        position(lat, lon);
    }

    private void gll() throws FieldException {
        need(6, "GLL");
        if (empty(5)) {
            return; // version 1.5 GLL without time: nothing to place in time
        }
        long tod = time(5);
        boolean valid = nf <= 6 || isChar(6, 'A');
        double lat = valid && !empty(1) ? latitude(1, 2) : Double.NaN;
        double lon = valid && !empty(1) ? longitude(3, 4) : Double.NaN;
        epoch(tod, Long.MIN_VALUE);
        position(lat, lon);
    }

    private void vtg() throws FieldException {
        need(5, "VTG");
        double cog;
        double sog;
        if (isChar(2, 'T') || (nf > 2 && empty(2) && nf >= 8)) {
            cog = optNumber(1, "course over ground");
            sog = nf > 5 ? optNumber(5, "speed over ground") : Double.NaN;
        } else { // the old layout without unit letters: true, magnetic, knots, km/h
            cog = optNumber(1, "course over ground");
            sog = optNumber(3, "speed over ground");
        }
        ground(cog, sog);
    }

    private void zda() throws FieldException {
        need(5, "ZDA");
        long tod = time(1);
        int d = (int) number(2, "day");
        int m = (int) number(3, "month");
        int y = (int) number(4, "year");
        long day;
        try {
            day = LocalDate.of(y, m, d).toEpochDay();
        } catch (DateTimeException e) {
            throw new FieldException(fs[2] + 1, "ZDA date " + y + "-" + m + "-" + d + " does not exist");
        }
        epoch(tod, day);
    }

    private void hdt() throws FieldException {
        need(2, "HDT");
        water(optNumber(1, "heading"), Double.NaN);
    }

    private void hdg() throws FieldException {
        need(2, "HDG");
        double h = optNumber(1, "heading");
        if (Double.isNaN(h)) {
            return;
        }
        if (nf <= 5 || empty(4)) {
            if (!hdgWithoutVariationReported) {
                hdgWithoutVariationReported = true;
                problems.add(lineNo, 0, "HDG gives no magnetic variation: its heading cannot be made true and is left out"
                        + " (reported once)");
            }
            return;
        }
        double dev = nf > 3 && !empty(2) ? signed(2, 3, 'E', 'W', "deviation") : 0.0;
        double var = signed(4, 5, 'E', 'W', "variation");
        double t = (h + dev + var) % 360.0;
        water(t < 0 ? t + 360.0 : t, Double.NaN);
    }

    private void vhw() throws FieldException {
        need(6, "VHW");
        water(optNumber(1, "heading"), optNumber(5, "speed through the water"));
    }

    // ---- epochs ----

    private void epoch(long tod, long day) {
        if (tod != pTod) {
            flushEpoch();
            pTod = tod;
            pLine = lineNo;
            pDay = Long.MIN_VALUE;
        }
        if (day != Long.MIN_VALUE) {
            pDay = day;
        }
    }

    private void position(double lat, double lon) {
        if (Double.isNaN(pLat) && !Double.isNaN(lat)) {
            pLat = lat;
            pLon = lon;
        }
    }

    private void ground(double cog, double sog) {
        if (pTod < 0) {
            track.setLastGroundData(cog, sog);
            return;
        }
        if (!Double.isNaN(cog)) {
            pCog = cog;
        }
        if (!Double.isNaN(sog)) {
            pSog = sog;
        }
    }

    private void water(double hdg, double stw) {
        if (pTod < 0) {
            track.setLastWaterData(hdg, stw);
            return;
        }
        if (!Double.isNaN(hdg)) {
            pHdg = hdg;
        }
        if (!Double.isNaN(stw)) {
            pStw = stw;
        }
    }

    private void flushEpoch() {
        if (pTod < 0) {
            return;
        }
        long tod = pTod;
        if (pDay != Long.MIN_VALUE) {
            if (epochDay == Long.MIN_VALUE) {
                dateBuffered(pDay, tod);
            }
            epochDay = pDay;
        } else if (epochDay != Long.MIN_VALUE && lastTod >= 0 && tod < lastTod - HALF_DAY_MS) {
            epochDay++; // past midnight, before the next RMC or ZDA says so
        }
        if (epochDay == Long.MIN_VALUE) {
            buffer(tod);
        } else {
            emit(epochDay * DAY_MS + tod, pLine, pLat, pLon, pCog, pSog, pHdg, pStw);
            lastTod = tod;
        }
        pTod = -1;
        pLat = pLon = pCog = pSog = pHdg = pStw = Double.NaN;
    }

    private void emit(long t, long srcLine, double lat, double lon, double cog, double sog, double hdg, double stw) {
        if (Double.isNaN(lat)) {
            return;
        }
        long last = track.lastTimeMs();
        if (t <= last) {
            problems.add(srcLine, 0, (t == last ? "time repeats " : "time goes back to ")
                    + java.time.Instant.ofEpochMilli(t) + " after " + java.time.Instant.ofEpochMilli(last)
                    + ": fix left out");
            return;
        }
        track.add(t, lat, lon, cog, sog, hdg, stw);
    }

    private void buffer(long tod) {
        if (uN == uTod.length) {
            int c = Math.max(16, uN * 2);
            uTod = Arrays.copyOf(uTod, c);
            uLine = Arrays.copyOf(uLine, c);
            for (int k = 0; k < 6; k++) {
                uVal[k] = Arrays.copyOf(uVal[k], c);
            }
        }
        uTod[uN] = tod;
        uLine[uN] = pLine;
        double[] v = {pLat, pLon, pCog, pSog, pHdg, pStw};
        for (int k = 0; k < 6; k++) {
            uVal[k][uN] = v[k];
        }
        uN++;
    }

    /** Dates the buffered fixes that came before the first date, walking back across midnights. */
    private void dateBuffered(long day, long tod) {
        if (uN == 0) {
            return;
        }
        long[] days = new long[uN];
        long d = day;
        long later = tod;
        for (int i = uN - 1; i >= 0; i--) {
            if (uTod[i] > later + HALF_DAY_MS) {
                d--;
            }
            days[i] = d;
            later = uTod[i];
        }
        for (int i = 0; i < uN; i++) {
            emit(days[i] * DAY_MS + uTod[i], uLine[i], uVal[0][i], uVal[1][i], uVal[2][i], uVal[3][i], uVal[4][i],
                    uVal[5][i]);
        }
        lastTod = uTod[uN - 1];
        uN = 0;
    }

    // ---- fields ----

    /** A field that cannot be read; the message names the field and what was expected. */
    private static final class FieldException extends Exception {
        private static final long serialVersionUID = 1L;
        final int column;

        FieldException(int column, String message) {
            super(message, null, false, false);
            this.column = column;
        }
    }

    private void need(int fields, String type) throws FieldException {
        if (nf - 1 < fields) {
            throw new FieldException(fe[nf - 1] + 1, type + " has " + (nf - 1) + " fields, expected at least " + fields
                    + " (a line cut short?)");
        }
    }

    private boolean empty(int f) {
        return f >= nf || fe[f] == fs[f];
    }

    private boolean isChar(int f, char c) {
        return f < nf && fe[f] - fs[f] == 1 && line[fs[f]] == c;
    }

    private String text(int f) {
        return new String(line, fs[f], fe[f] - fs[f], java.nio.charset.StandardCharsets.US_ASCII);
    }

    private FieldException bad(int f, String what) {
        return new FieldException(fs[f] + 1, "field " + f + " (" + what + ") '" + text(f) + "' is not a number");
    }

    /** Reads an unsigned decimal into mantissa and scale, without objects; returns false if it is not one. */
    private long mant;
    private int scale;

    private boolean decimal(int f) {
        long m = 0;
        int sc = -1;
        int digits = 0;
        for (int i = fs[f]; i < fe[f]; i++) {
            byte b = line[i];
            if (b >= '0' && b <= '9') {
                if (digits >= 18) {
                    return false;
                }
                m = m * 10 + (b - '0');
                digits++;
                if (sc >= 0) {
                    sc++;
                }
            } else if (b == '.' && sc < 0) {
                sc = 0;
            } else {
                return false;
            }
        }
        if (digits == 0) {
            return false;
        }
        mant = m;
        scale = Math.max(sc, 0);
        return true;
    }

    private double number(int f, String what) throws FieldException {
        if (f >= nf) {
            throw new FieldException(fe[nf - 1] + 1, "field " + f + " (" + what + ") is missing");
        }
        boolean neg = fe[f] > fs[f] && line[fs[f]] == '-';
        if (neg) {
            fs[f]++;
        }
        boolean ok = decimal(f);
        if (neg) {
            fs[f]--;
        }
        if (!ok) {
            throw bad(f, what);
        }
        double v = mant / POW10[scale];
        return neg ? -v : v;
    }

    private double optNumber(int f, String what) throws FieldException {
        return empty(f) ? Double.NaN : number(f, what);
    }

    private double signed(int f, int hemi, char plus, char minus, String what) throws FieldException {
        double v = number(f, what);
        if (isChar(hemi, minus)) {
            return -v;
        }
        if (!isChar(hemi, plus)) {
            throw new FieldException(fs[Math.min(hemi, nf - 1)] + 1, "field " + hemi + " (" + what
                    + " direction) should be " + plus + " or " + minus);
        }
        return v;
    }

    /** hhmmss or hhmmss.sss to milliseconds of the day. */
    private long time(int f) throws FieldException {
        if (empty(f) || !decimal(f) || fe[f] - fs[f] < 6) {
            throw new FieldException(fs[Math.min(f, nf - 1)] + 1, "field " + f + " (UTC time) '"
                    + (f < nf ? text(f) : "") + "' is not a time hhmmss.ss");
        }
        long p = (long) POW10[scale];
        long whole = mant / p;
        long frac = mant % p;
        int hh = (int) (whole / 10000);
        int mm = (int) (whole / 100 % 100);
        int ss = (int) (whole % 100);
        if (hh > 23 || mm > 59 || ss > 60) {
            throw new FieldException(fs[f] + 1, "field " + f + " (UTC time) '" + text(f) + "' is not a time of day");
        }
        long fracMs = scale <= 3 ? frac * (long) POW10[3 - scale] : frac / (long) POW10[scale - 3];
        long ms = ((hh * 60L + mm) * 60L + Math.min(ss, 59)) * 1000L + fracMs;
        return ss == 60 ? ms + 999 : ms; // a leap second is held in the last instant of :59
    }

    /** ddmmyy to the epoch day; years 80-99 are 19xx, 00-79 are 20xx (common practice of receivers). */
    private long date(int f) throws FieldException {
        if (empty(f) || fe[f] - fs[f] != 6 || !decimal(f) || scale != 0) {
            throw new FieldException(fs[Math.min(f, nf - 1)] + 1, "field " + f + " (date) '" + (f < nf ? text(f) : "")
                    + "' is not a date ddmmyy");
        }
        int dd = (int) (mant / 10000);
        int mo = (int) (mant / 100 % 100);
        int yy = (int) (mant % 100);
        try {
            return LocalDate.of(yy < 80 ? 2000 + yy : 1900 + yy, mo, dd).toEpochDay();
        } catch (DateTimeException e) {
            throw new FieldException(fs[f] + 1, "field " + f + " (date) '" + text(f) + "' is not a real date");
        }
    }

    /** ddmm.mmm with N/S. */
    private double latitude(int f, int hemi) throws FieldException {
        double v = degMin(f, "latitude", 90);
        if (isChar(hemi, 'S')) {
            return -v;
        }
        if (!isChar(hemi, 'N')) {
            throw new FieldException(hemiColumn(hemi), "field " + hemi + " (latitude hemisphere) should be N or S");
        }
        return v;
    }

    /** dddmm.mmm with E/W. */
    private double longitude(int f, int hemi) throws FieldException {
        double v = degMin(f, "longitude", 180);
        if (isChar(hemi, 'W')) {
            return v >= 180 ? -180 : -v;
        }
        if (!isChar(hemi, 'E')) {
            throw new FieldException(hemiColumn(hemi), "field " + hemi + " (longitude hemisphere) should be E or W");
        }
        return v >= 180 ? -180 : v;
    }

    private int hemiColumn(int hemi) {
        return hemi < nf ? fs[hemi] + 1 : fe[nf - 1] + 1;
    }

    private double degMin(int f, String what, int max) throws FieldException {
        if (empty(f) || !decimal(f)) {
            throw bad(f, what);
        }
        long p = (long) POW10[scale];
        long deg = mant / (100 * p);
        long minMant = mant - deg * 100 * p;
        if (minMant >= 60 * p || deg > max || (deg == max && minMant > 0)) {
            throw new FieldException(fs[f] + 1, "field " + f + " (" + what + ") '" + text(f) + "' is out of range");
        }
        return deg + minMant / POW10[scale] / 60.0;
    }

    private static int hex(byte b) {
        if (b >= '0' && b <= '9') {
            return b - '0';
        }
        if (b >= 'A' && b <= 'F') {
            return b - 'A' + 10;
        }
        if (b >= 'a' && b <= 'f') {
            return b - 'a' + 10;
        }
        return -1;
    }
}
