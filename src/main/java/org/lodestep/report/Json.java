package org.lodestep.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;

/**
 * The one JSON convention of every {@code --json} output: snake_case keys from record component names
 * ({@code resistanceOhm} becomes {@code resistance_ohm}), indented, non-finite numbers written as null.
 */
public final class Json {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
            .build()
            .registerModule(new com.fasterxml.jackson.databind.module.SimpleModule()
                    .addSerializer(Double.class, new NonFiniteAsNull())
                    .addSerializer(double.class, new NonFiniteAsNull()));

    private Json() {
    }

    /** Serialises a result (records, lists, maps) as indented JSON text. */
    public static String write(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise " + value.getClass().getName() + ": " + e.getMessage(), e);
        }
    }

    /** The shared mapper, for readers of our own JSON (capture sidecars, avoid-lists). */
    public static ObjectMapper mapper() {
        return MAPPER.copy();
    }

    /** JSON has no NaN or infinity; a value we could not determine is null, never a string. */
    private static final class NonFiniteAsNull extends com.fasterxml.jackson.databind.ser.std.StdSerializer<Double> {
        private static final long serialVersionUID = 1L;

        NonFiniteAsNull() {
            super(Double.class);
        }

        @Override
        public void serialize(Double v, com.fasterxml.jackson.core.JsonGenerator g,
                              com.fasterxml.jackson.databind.SerializerProvider p) throws java.io.IOException {
            if (v == null || !Double.isFinite(v)) {
                g.writeNull();
            } else {
                g.writeNumber(v);
            }
        }
    }
}
