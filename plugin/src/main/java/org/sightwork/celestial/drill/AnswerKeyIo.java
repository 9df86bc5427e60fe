package org.sightwork.celestial.drill;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.datatype.jsr310.JavaTimeModule;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes and reads an {@link AnswerKey} as JSON. The output is the same bytes for the same key on
 * every machine: properties in the records' declared order, numbers rounded to
 * {@value #DECIMALS} decimals and written in plain notation (not {@code Double.toString}, whose
 * digits changed between Java versions), times in ISO 8601 UTC, LF line ends.
 */
public final class AnswerKeyIo {

    /** Decimals of every number in the key: 1e-9° is 0.1 mm on the Earth. */
    static final int DECIMALS = 9;

    private static final ObjectMapper JSON = mapper();

    private AnswerKeyIo() {
    }

    private static ObjectMapper mapper() {
        SimpleModule numbers = new SimpleModule("fixed-decimals");
        JsonSerializer<Double> fixed = new JsonSerializer<>() {
            @Override
            public void serialize(Double v, JsonGenerator g, SerializerProvider p) throws IOException {
                if (v == null || !Double.isFinite(v)) {
                    g.writeNull();
                } else {
                    g.writeNumber(plain(v));
                }
            }
        };
        numbers.addSerializer(Double.class, fixed);
        numbers.addSerializer(double.class, fixed);
        ObjectMapper m = new ObjectMapper().registerModule(new JavaTimeModule()).registerModule(numbers);
        m.disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS);
        m.enable(SerializationFeature.INDENT_OUTPUT);
        m.enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);
        return m;
    }

    /**
     * A number as fixed decimals, trailing zeros dropped.
     *
     * @param v a finite number
     * @return its text
     */
    static String plain(double v) {
        BigDecimal b = new BigDecimal(v).setScale(DECIMALS, RoundingMode.HALF_EVEN).stripTrailingZeros();
        String s = b.toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    /**
     * @param key the key
     * @return its JSON text, LF line ends, ending with a line end
     */
    public static String toJson(AnswerKey key) {
        try {
            return JSON.writeValueAsString(key).replace("\r\n", "\n") + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the answer key cannot be written as JSON: " + e.getOriginalMessage(), e);
        }
    }

    /**
     * Reads a key.
     *
     * @param path the key file
     * @return the key
     * @throws DrillException if it is not a key of this format
     * @throws IOException if it cannot be read
     */
    public static AnswerKey read(Path path) throws IOException {
        String text = Files.readString(path, StandardCharsets.UTF_8);
        try {
            AnswerKey k = JSON.readValue(text, AnswerKey.class);
            if (k.formatVersion() != AnswerKey.FORMAT_VERSION) {
                throw new DrillException(path + ": an answer key of format version " + k.formatVersion()
                        + "; this program reads version " + AnswerKey.FORMAT_VERSION);
            }
            return k;
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? "" : ": line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr();
            throw new DrillException(path + where + ": not an answer key made by 'drill new' ("
                    + e.getOriginalMessage() + ")");
        }
    }
}
