package org.headway.project;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.Iterator;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.headway.caution.InputException;

/**
 * The one strict reader of Headway's own JSON files (project, rig, fitted correlation): duplicate
 * keys and text after the document are refused, limits guard against hostile input, and a syntax
 * error names the file, line and column. The field readers below name the JSON path
 * ({@code $.parameters[1].value}) of a missing, unknown or ill-typed key.
 */
public final class StrictJson {

    /** Largest document accepted (bytes). */
    public static final long MAX_DOCUMENT_LENGTH = 16L * 1024 * 1024;
    /** Deepest nesting accepted; a project needs about six levels. */
    public static final int MAX_NESTING_DEPTH = 64;
    /** Longest string accepted (characters). */
    public static final int MAX_STRING_LENGTH = 100_000;
    /** Longest number accepted (characters). */
    static final int MAX_NUMBER_LENGTH = 100;

    private static final ObjectMapper MAPPER = createMapper();

    private StrictJson() {}

    /** The JSON reader/writer with Headway's limits on hostile input and no polymorphic typing. */
    private static ObjectMapper createMapper() {
        JsonFactory factory = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(MAX_NESTING_DEPTH)
                        .maxStringLength(MAX_STRING_LENGTH)
                        .maxDocumentLength(MAX_DOCUMENT_LENGTH)
                        .maxNumberLength(MAX_NUMBER_LENGTH)
                        .build())
                .build();
        ObjectMapper mapper = new ObjectMapper(factory);
        mapper.enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY);
        mapper.enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
        // Text after the closing brace (a merge marker, a second project) is an error, not ignored.
        mapper.enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);
        mapper.enable(SerializationFeature.INDENT_OUTPUT);
        return mapper;
    }

    /** The shared mapper, also for writing our files (indented output). */
    static ObjectMapper mapper() {
        return MAPPER;
    }

    /** The text without a leading byte-order mark. */
    static String withoutByteOrderMark(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /**
     * Parses a whole document strictly.
     *
     * @param text the document (a byte-order mark, if any, is the caller's to drop)
     * @param label the file as errors should name it; empty for none
     * @return the tree; a missing node for an empty document
     * @throws InputException "label line l, column c: not valid JSON: …" for a syntax error, a
     *     duplicate key, trailing content or an exceeded limit
     */
    static JsonNode read(String text, String label) {
        try {
            return MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            String at = location(e, text);
            String where = label.isEmpty() ? at : at.isEmpty() ? label : label + " " + at;
            throw new InputException(where, "not valid JSON: " + problem(e));
        }
    }

    /**
     * Where a JSON error is: line and column from the parser, or, for a limit the parser reports
     * without a place (nesting too deep), the place found by scanning the text.
     */
    static String location(JsonProcessingException e, String text) {
        if (e.getLocation() != null && e.getLocation().getLineNr() > 0) {
            return "line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr();
        }
        int depth = 0;
        int line = 1;
        int column = 0;
        boolean inString = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            column++;
            if (c == '\n') {
                line++;
                column = 0;
            } else if (inString) {
                if (c == '\\') {
                    i++;
                    column++;
                } else if (c == '"') {
                    inString = false;
                }
            } else if (c == '"') {
                inString = true;
            } else if (c == '{' || c == '[') {
                if (++depth > MAX_NESTING_DEPTH) {
                    return "line " + line + ", column " + column;
                }
            } else if (c == '}' || c == ']') {
                depth--;
            }
        }
        return "";
    }

    /** The parser's message in words, without the library's names for its limits. */
    static String problem(JsonProcessingException e) {
        String m = e.getOriginalMessage();
        if (m != null && m.contains("nesting depth")) {
            return "nested deeper than " + MAX_NESTING_DEPTH + " levels of objects and arrays";
        }
        if (m != null && m.contains("String value length")) {
            return "a text value is longer than " + MAX_STRING_LENGTH + " characters";
        }
        if (m != null && m.contains("Number value length")) {
            return "a number is written with more than " + MAX_NUMBER_LENGTH + " characters";
        }
        return m;
    }

    /** Refuses anything but an object at {@code path}; the type is named in lower case. */
    static void object(JsonNode node, String path) {
        if (!node.isObject()) {
            throw new InputException(
                    path,
                    "expected a JSON object, got " + node.getNodeType().name().toLowerCase(Locale.ROOT));
        }
    }

    /** Refuses a key not in {@code allowed}, naming its path and the allowed keys. */
    static void keys(JsonNode node, String path, Set<String> allowed) {
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String key = it.next();
            if (!allowed.contains(key)) {
                throw new InputException(path + "." + key, "unknown key; allowed keys are " + new TreeSet<>(allowed));
            }
        }
    }

    /** The value at {@code key}; absent or null is "missing". */
    static JsonNode required(JsonNode node, String path, String key) {
        JsonNode v = node.get(key);
        if (v == null || v.isNull()) {
            throw new InputException(path + "." + key, "missing");
        }
        return v;
    }

    /**
     * A required text value.
     *
     * @param expected what the message says was expected, e.g. {@code text}
     */
    static String text(JsonNode node, String path, String key, String expected) {
        JsonNode v = required(node, path, key);
        if (!v.isTextual()) {
            throw new InputException(path + "." + key, "expected " + expected + ", got " + v);
        }
        return v.asText();
    }

    /** A required finite number. */
    static double number(JsonNode node, String path, String key) {
        JsonNode v = required(node, path, key);
        if (!v.isNumber()) {
            throw new InputException(path + "." + key, "expected a number, got " + v);
        }
        double value = v.doubleValue();
        if (!Double.isFinite(value)) {
            throw new InputException(path + "." + key, "must be a finite number, got " + v.asText());
        }
        return value;
    }

    /** A required whole number within {@code int}. */
    static int integer(JsonNode node, String path, String key) {
        JsonNode v = required(node, path, key);
        if (!v.isIntegralNumber() || !v.canConvertToInt()) {
            throw new InputException(path + "." + key, "expected a whole number, got " + v);
        }
        return v.intValue();
    }

    /** A required list. */
    static JsonNode array(JsonNode node, String path, String key) {
        JsonNode v = required(node, path, key);
        if (!v.isArray()) {
            throw new InputException(path + "." + key, "expected a list, got " + v);
        }
        return v;
    }
}
