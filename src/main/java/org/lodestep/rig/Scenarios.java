package org.lodestep.rig;

import java.io.IOException;
import java.io.InputStream;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;

/** The bundled virtual-rig scenarios ({@code scenarios.toml} beside this class), by name. */
public final class Scenarios {
    private static final String RESOURCE = "scenarios.toml";
    private static volatile Map<String, Scenario> cache;

    private Scenarios() {
    }

    /** Every bundled scenario, sorted by name. */
    public static Map<String, Scenario> all() {
        Map<String, Scenario> c = cache;
        if (c == null) {
            try (InputStream in = Scenarios.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("resource " + RESOURCE + " is missing from the build");
                }
                c = parse(in);
            } catch (IOException e) {
                throw new IllegalStateException("bundled " + RESOURCE + " is unreadable: " + e.getMessage(), e);
            }
            cache = c;
        }
        return c;
    }

    /** Parses a scenario file of our TOML format: one table per scenario, keys as in {@link Scenario}. */
    static Map<String, Scenario> parse(InputStream in) throws IOException {
        TomlMapper m = TomlMapper.builder()
                .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .build();
        Map<String, Scenario> map = m.readValue(in, new TypeReference<Map<String, Scenario>>() { });
        return java.util.Collections.unmodifiableMap(new TreeMap<>(map));
    }

    /** The scenario with this name; the message lists the names when there is none. */
    public static Scenario get(String name) throws RigException {
        Scenario s = all().get(name);
        if (s == null) {
            throw new RigException("no virtual-rig scenario '" + name + "'; known: " + String.join(", ", all().keySet()));
        }
        return s;
    }
}
