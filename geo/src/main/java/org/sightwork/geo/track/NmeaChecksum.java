package org.sightwork.geo.track;

/**
 * The NMEA 0183 checksum: the exclusive OR of every character between the {@code $} (or {@code !})
 * and the {@code *}, written as two hexadecimal digits (NMEA 0183 standard, sentence structure).
 */
public final class NmeaChecksum {

    private NmeaChecksum() {
    }

    /**
     * The checksum of a sentence, with or without its leading {@code $} and trailing {@code *hh}.
     *
     * @param sentence the sentence text
     * @return the checksum, [0, 255]
     */
    public static int of(CharSequence sentence) {
        int start = sentence.length() > 0 && (sentence.charAt(0) == '$' || sentence.charAt(0) == '!') ? 1 : 0;
        int x = 0;
        for (int i = start; i < sentence.length(); i++) {
            char c = sentence.charAt(i);
            if (c == '*') {
                break;
            }
            x ^= c;
        }
        return x & 0xff;
    }

    /**
     * Appends {@code *hh} to a sentence that has none.
     *
     * @param sentence a sentence from {@code $} to its last field
     * @return the sentence with its checksum
     */
    public static String append(String sentence) {
        return sentence + "*" + String.format("%02X", of(sentence));
    }
}
