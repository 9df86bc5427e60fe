package org.sightwork.geo.earth;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Angles in the navigator's notation: degrees and decimal minutes (d°m.m′), read and written.
 *
 * <p>Reading accepts the common written forms: {@code 34°12.4'}, {@code 34°12.4′}, {@code 34 12.4},
 * {@code 34-12.4}, {@code 34d12.4}, degrees-minutes-seconds {@code 34°12'24"}, and decimal degrees
 * {@code 34.2067}; a sign in front, or for latitude and longitude a hemisphere letter (N, S, E, W)
 * in front or behind. Writing rounds to 0.1′ and never shows 60.0′.
 */
public final class Angles {

    /** The written forms accepted, for error messages. */
    public static final String ACCEPTED_FORMS =
            "d°m.m′ such as 34°12.4', 34 12.4 or 34-12.4, or decimal degrees such as 34.2067";

    private static final Pattern DMS = Pattern.compile(
            "([+-]?)\\s*(\\d{1,3})(?:\\s*[°d]\\s*|\\s+|-)(\\d{1,2}(?:[.,]\\d*)?)\\s*['′m]?"
            + "(?:\\s*(\\d{1,2}(?:[.,]\\d*)?)\\s*(?:\"|″|''|s)?)?");
    private static final Pattern DECIMAL = Pattern.compile("([+-]?)\\s*(\\d+(?:[.,]\\d*)?|[.,]\\d+)\\s*°?");

    private Angles() {
    }

    /**
     * Reads an angle written in one of the {@linkplain #ACCEPTED_FORMS accepted forms}.
     *
     * @param text the written angle
     * @return the angle (degrees), signed
     * @throws IllegalArgumentException if the text is not an angle; the message shows the forms
     */
    public static double parse(String text) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("an angle is missing: expected " + ACCEPTED_FORMS);
        }
        String t = text.strip();
        Matcher m = DMS.matcher(t);
        if (m.matches()) {
            double deg = Integer.parseInt(m.group(2));
            double min = Double.parseDouble(m.group(3).replace(',', '.'));
            double sec = m.group(4) == null ? 0 : Double.parseDouble(m.group(4).replace(',', '.'));
            if (min >= 60.0 || sec >= 60.0 || (m.group(4) != null && min != Math.floor(min))) {
                throw new IllegalArgumentException("'" + text + "' has minutes or seconds out of range: expected "
                        + ACCEPTED_FORMS);
            }
            double v = deg + min / 60.0 + sec / 3600.0;
            return m.group(1).equals("-") ? -v : v;
        }
        m = DECIMAL.matcher(t);
        if (m.matches()) {
            double v = Double.parseDouble(m.group(2).replace(',', '.'));
            return m.group(1).equals("-") ? -v : v;
        }
        throw new IllegalArgumentException("'" + text + "' is not an angle: expected " + ACCEPTED_FORMS);
    }

    /**
     * Reads a latitude: an angle with N or S before or after it, or signed (north positive).
     *
     * @param text the written latitude
     * @return latitude (degrees, [-90°, 90°])
     * @throws IllegalArgumentException if it cannot be read or is out of range
     */
    public static double parseLatitude(String text) {
        double v = parseWithHemisphere(text, 'N', 'S', "latitude");
        if (Math.abs(v) > 90.0) {
            throw new IllegalArgumentException("latitude '" + text + "' is beyond 90°");
        }
        return v;
    }

    /**
     * Reads a longitude: an angle with E or W before or after it, or signed (east positive).
     *
     * @param text the written longitude
     * @return longitude (degrees, [-180°, 180°])
     * @throws IllegalArgumentException if it cannot be read or is out of range
     */
    public static double parseLongitude(String text) {
        double v = parseWithHemisphere(text, 'E', 'W', "longitude");
        if (Math.abs(v) > 180.0) {
            throw new IllegalArgumentException("longitude '" + text + "' is beyond 180°");
        }
        return v;
    }

    private static double parseWithHemisphere(String text, char plus, char minus, String what) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("a " + what + " is missing");
        }
        String t = text.strip().toUpperCase(Locale.ROOT);
        int sign = 0;
        char first = t.charAt(0);
        char last = t.charAt(t.length() - 1);
        if (first == plus || first == minus) {
            sign = first == plus ? 1 : -1;
            t = t.substring(1).strip();
        } else if (last == plus || last == minus) {
            sign = last == plus ? 1 : -1;
            t = t.substring(0, t.length() - 1).strip();
        }
        double v;
        try {
            v = parse(t);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("'" + text + "' is not a " + what + ": expected "
                    + ACCEPTED_FORMS + ", with " + plus + " or " + minus + " or a sign");
        }
        if (sign != 0) {
            if (v < 0 || t.startsWith("-") || t.startsWith("+")) {
                throw new IllegalArgumentException("'" + text + "' has both a sign and a hemisphere letter");
            }
            return sign * v;
        }
        return v;
    }

    /**
     * Writes an unsigned-style angle as d°m.m′ with the given number of degree digits, e.g. GHA
     * {@code 347°05.3′} or an altitude {@code 34°12.4′}; negative values get a minus sign.
     *
     * @param deg the angle (degrees)
     * @param degreeDigits minimum digits of the degrees (3 for GHA, SHA, Zn; 2 otherwise)
     * @return the written angle
     */
    public static String formatDm(double deg, int degreeDigits) {
        if (!Double.isFinite(deg)) {
            return "—";
        }
        long tenths = Math.round(Math.abs(deg) * 600.0);
        long d = tenths / 600;
        long m10 = tenths % 600;
        String sign = deg < 0 && tenths != 0 ? "-" : "";
        return String.format(Locale.ROOT, "%s%0" + degreeDigits + "d°%02d.%d′", sign, d, m10 / 10, m10 % 10);
    }

    /**
     * Writes a latitude or declination, e.g. {@code 38°32.1′N}.
     *
     * @param latDeg latitude (degrees, north positive)
     * @return the written latitude
     */
    public static String formatLatitude(double latDeg) {
        String h = Math.round(latDeg * 600.0) == 0 ? " " : latDeg < 0 ? "S" : "N";
        return formatDm(Math.abs(latDeg), 2) + h;
    }

    /**
     * Writes a longitude, e.g. {@code 028°37.9′W}.
     *
     * @param lonDeg longitude (degrees, east positive)
     * @return the written longitude
     */
    public static String formatLongitude(double lonDeg) {
        long tenths = Math.round(lonDeg * 600.0);
        String h = tenths == 0 || Math.abs(tenths) == 180 * 600 ? " " : lonDeg < 0 ? "W" : "E";
        return formatDm(Math.abs(lonDeg), 3) + h;
    }

    /**
     * Writes a signed declination with N/S, as {@link #formatLatitude}.
     *
     * @param decDeg declination (degrees, north positive)
     * @return e.g. {@code 23°26.2′S}
     */
    public static String formatDeclination(double decDeg) {
        return formatLatitude(decDeg);
    }
}
