package org.lodestep.capture;

import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.Utf8Text;

/**
 * A JSON file read as a tree, remembering the line of every value so a reader's complaint names it: for our own
 * JSON inputs (motor cards, avoid-lists).
 */
final class JsonDocument {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    final String source;
    final JsonNode root;
    private final Map<String, Integer> lines;

    private JsonDocument(String source, JsonNode root, Map<String, Integer> lines) {
        this.source = source;
        this.root = root;
        this.lines = lines;
    }

    static JsonDocument read(Path file) throws IOException, InputFormatException {
        String source = file.toString();
        String text = Utf8Text.read(file, "a JSON document");
        Map<String, Integer> lines = new HashMap<>();
        try (JsonParser p = new JsonFactory().createParser(text)) {
            for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                if (t.isScalarValue() || t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
                    lines.putIfAbsent(p.getParsingContext().pathAsPointer().toString(),
                            p.currentTokenLocation().getLineNr());
                }
            }
            JsonNode root = MAPPER.readTree(text);
            if (root == null || !root.isObject()) {
                throw new InputFormatException(source, 1, null, null, "is not a JSON object: expected { ... }");
            }
            return new JsonDocument(source, root, lines);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? InputFormatException.NO_LINE : e.getLocation().getLineNr();
            throw new InputFormatException(source, line, null, null, "is not valid JSON: " + problem(e));
        }
    }

    /**
     * The parser's own words for what is wrong, on one line, without its note of where the input came from (a
     * "[Source: ...]" part that names the parser's settings, not the user's file).
     */
    static String problem(JsonProcessingException e) {
        String msg = e.getOriginalMessage();
        if (msg == null) {
            return "unreadable";
        }
        String first = msg.lines().findFirst().orElse("");
        return first.replaceAll("\\s*\\(start marker at \\[Source:.*$", "").replaceAll("\\s*at \\[Source:.*$", "")
                .strip();
    }

    /** Line of the value at a JSON pointer ({@code /phases/0/resistance_ohm}), or the nearest parent's. */
    int lineOf(String pointer) {
        String p = pointer;
        while (true) {
            Integer l = lines.get(p);
            if (l != null) {
                return l;
            }
            if (p.isEmpty()) {
                return InputFormatException.NO_LINE;
            }
            p = p.substring(0, Math.max(0, p.lastIndexOf('/')));
        }
    }

    /** A number at a pointer; null when absent or JSON null and not required. */
    Double number(JsonNode parent, String parentPointer, String key, String what, boolean required)
            throws InputFormatException {
        JsonNode n = parent.get(key);
        String ptr = parentPointer + "/" + key;
        if (n == null || n.isNull()) {
            if (required) {
                throw new InputFormatException(source, lineOf(parentPointer), null, null, "has no " + key
                        + ": expected " + what);
            }
            return null;
        }
        if (!n.isNumber() || !Double.isFinite(n.asDouble())) {
            throw new InputFormatException(source, lineOf(ptr), null, n.toString(), "is not a number: expected "
                    + key + " as " + what);
        }
        return n.asDouble();
    }

    /** Text at a key; null when absent and not required. */
    String text(JsonNode parent, String parentPointer, String key, String what, boolean required)
            throws InputFormatException {
        JsonNode n = parent.get(key);
        if (n == null || n.isNull()) {
            if (required) {
                throw new InputFormatException(source, lineOf(parentPointer), null, null, "has no " + key
                        + ": expected " + what);
            }
            return null;
        }
        if (!n.isTextual()) {
            throw new InputFormatException(source, lineOf(parentPointer + "/" + key), null, n.toString(),
                    "is not text: expected " + key + " as " + what);
        }
        return n.asText();
    }

    InputFormatException error(String pointer, String text, String expected) {
        return new InputFormatException(source, lineOf(pointer), null, text, expected);
    }
}
