package org.headway.project;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.headway.caution.InputException;
import org.headway.correlation.FitStatistics;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.VariableRange;

/**
 * Saves and loads a {@link FittedCorrelation} as a small JSON file:
 *
 * <pre>
 * { "format": "headway-fitted-correlation", "version": 1,
 *   "response": "f", "form": "power: …", "expression": "a*Re^b",
 *   "variables": [ { "name": "Re", "min": 4000.0, "max": 100000.0 } ],
 *   "parameters": [ { "name": "a", "value": …, "standard_error": …, "ci95_low": …, "ci95_high": … } ],
 *   "statistics": { "residual_sum_of_squares": …, "residual_standard_deviation": …, "r_squared": …,
 *                   "adjusted_r_squared": …, "degrees_of_freedom": …, "points": … },
 *   "citation": "fitted by the user to their data" }
 * </pre>
 *
 * Numbers are written in shortest round-trip form, so a saved fit reloads to identical doubles.
 */
public final class FittedCorrelationFile {

    /** Value of the {@code format} key. */
    public static final String FORMAT = "headway-fitted-correlation";
    /** Current file version. */
    public static final int VERSION = 1;

    /** Same limits on hostile input as project files (size, nesting, string length, duplicates). */
    private static final ObjectMapper MAPPER = StrictJson.mapper();

    private FittedCorrelationFile() {}

    /** The JSON tree of a fitted correlation. */
    public static ObjectNode toJson(FittedCorrelation fit) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        root.put("response", fit.responseName());
        root.put("form", fit.formDescription());
        root.put("expression", fit.expressionText());
        ArrayNode vars = root.putArray("variables");
        for (VariableRange r : fit.variableRanges()) {
            ObjectNode v = vars.addObject();
            v.put("name", r.name());
            v.put("min", r.min());
            v.put("max", r.max());
        }
        ArrayNode params = root.putArray("parameters");
        for (FittedParameter p : fit.parameters()) {
            ObjectNode n = params.addObject();
            n.put("name", p.name());
            n.put("value", p.value());
            n.put("standard_error", p.standardError());
            n.put("ci95_low", p.ci95Low());
            n.put("ci95_high", p.ci95High());
        }
        FitStatistics s = fit.statistics();
        ObjectNode stats = root.putObject("statistics");
        stats.put("residual_sum_of_squares", s.residualSumOfSquares());
        stats.put("residual_standard_deviation", s.residualStandardDeviation());
        stats.put("r_squared", s.rSquared());
        stats.put("adjusted_r_squared", s.adjustedRSquared());
        stats.put("degrees_of_freedom", s.degreesOfFreedom());
        stats.put("points", s.pointCount());
        root.put("citation", fit.citation());
        return root;
    }

    /**
     * Writes the file atomically: a temporary file in the same folder, then a move over the target.
     *
     * @param file target path
     * @param fit the correlation
     * @throws IOException if the folder cannot be written
     */
    public static void save(Path file, FittedCorrelation fit) throws IOException {
        save(file, fit, true);
    }

    /**
     * Saves a fitted correlation atomically.
     *
     * @param overwrite whether an existing file may be replaced (refused atomically if not)
     */
    public static void save(Path file, FittedCorrelation fit, boolean overwrite) throws IOException {
        byte[] bytes = (MAPPER.writeValueAsString(toJson(fit)) + "\n").getBytes(StandardCharsets.UTF_8);
        try {
            AtomicFiles.write(file, overwrite, out -> out.write(bytes));
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * Reads a fitted-correlation file.
     *
     * @param file the file
     * @return the correlation
     * @throws InputException naming the file and JSON path of a missing, unknown or ill-typed key,
     *     or the file itself if it is missing or not JSON
     */
    public static FittedCorrelation load(Path file) {
        String text = org.headway.caution.TextFiles.read(
                file, StrictJson.MAX_DOCUMENT_LENGTH, "a fitted-correlation file is a few kilobytes");
        return parse(text, file.toString());
    }

    /**
     * Reads fitted-correlation JSON text.
     *
     * @param text the file's content (a leading byte-order mark is skipped)
     * @param label the file as errors should name it
     */
    static FittedCorrelation parse(String text, String label) {
        JsonNode root = StrictJson.read(StrictJson.withoutByteOrderMark(text), label);
        if (root == null || root.isMissingNode()) {
            throw new InputException(label, "is empty; expected a fitted-correlation JSON object");
        }
        try {
            return fromJson(root);
        } catch (InputException e) {
            throw e.at(label + ": ");
        }
    }

    /** Reads the JSON tree; errors name the JSON path ($.parameters[1].value). */
    public static FittedCorrelation fromJson(JsonNode root) {
        object(root, "$");
        StrictJson.keys(
                root,
                "$",
                Set.of(
                        "format",
                        "version",
                        "response",
                        "form",
                        "expression",
                        "variables",
                        "parameters",
                        "statistics",
                        "citation"));
        String format = text(root, "$", "format");
        if (!format.equals(FORMAT)) {
            throw new InputException("$.format", "expected \"" + FORMAT + "\", got \"" + format + "\"");
        }
        int version = StrictJson.integer(root, "$", "version");
        if (version != VERSION) {
            throw new InputException("$.version", "this Headway reads version " + VERSION + ", got " + version);
        }
        List<String> names = new ArrayList<>();
        List<VariableRange> ranges = new ArrayList<>();
        JsonNode vars = StrictJson.array(root, "$", "variables");
        for (int i = 0; i < vars.size(); i++) {
            String path = "$.variables[" + i + "]";
            JsonNode v = vars.get(i);
            object(v, path);
            StrictJson.keys(v, path, Set.of("name", "min", "max"));
            String name = text(v, path, "name");
            names.add(name);
            ranges.add(new VariableRange(name, StrictJson.number(v, path, "min"), StrictJson.number(v, path, "max")));
        }
        List<FittedParameter> parameters = new ArrayList<>();
        JsonNode params = StrictJson.array(root, "$", "parameters");
        for (int i = 0; i < params.size(); i++) {
            String path = "$.parameters[" + i + "]";
            JsonNode p = params.get(i);
            object(p, path);
            StrictJson.keys(p, path, Set.of("name", "value", "standard_error", "ci95_low", "ci95_high"));
            parameters.add(new FittedParameter(
                    text(p, path, "name"),
                    StrictJson.number(p, path, "value"),
                    StrictJson.number(p, path, "standard_error"),
                    StrictJson.number(p, path, "ci95_low"),
                    StrictJson.number(p, path, "ci95_high")));
        }
        JsonNode s = root.get("statistics");
        if (s == null) {
            throw new InputException("$.statistics", "missing");
        }
        object(s, "$.statistics");
        StrictJson.keys(
                s,
                "$.statistics",
                Set.of(
                        "residual_sum_of_squares",
                        "residual_standard_deviation",
                        "r_squared",
                        "adjusted_r_squared",
                        "degrees_of_freedom",
                        "points"));
        FitStatistics stats = new FitStatistics(
                StrictJson.number(s, "$.statistics", "residual_sum_of_squares"),
                StrictJson.number(s, "$.statistics", "residual_standard_deviation"),
                StrictJson.number(s, "$.statistics", "r_squared"),
                StrictJson.number(s, "$.statistics", "adjusted_r_squared"),
                StrictJson.integer(s, "$.statistics", "degrees_of_freedom"),
                StrictJson.integer(s, "$.statistics", "points"));
        text(root, "$", "citation");
        try {
            return new FittedCorrelation(
                    text(root, "$", "response"),
                    text(root, "$", "form"),
                    text(root, "$", "expression"),
                    names,
                    parameters,
                    ranges,
                    stats);
        } catch (InputException e) {
            throw e.at("$");
        }
    }

    /** As {@link StrictJson#object} but, as this file always has, naming the node type in capitals. */
    private static void object(JsonNode node, String path) {
        if (!node.isObject()) {
            throw new InputException(path, "expected a JSON object, got " + node.getNodeType());
        }
    }

    private static String text(JsonNode node, String path, String key) {
        return StrictJson.text(node, path, key, "text");
    }
}
