package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile JSON: nesting depth, string length and document size are limited with clear errors in
 * both JSON readers (project and fitted correlation), and no polymorphic type handling exists
 * anywhere in the program.
 */
class JsonLimitsTest {

    @Test
    void deepNestingIsRefusedWithTheLimit() {
        String deep = "{\"format\": " + "[".repeat(500) + "]".repeat(500) + "}";
        InputException fitted = assertThrows(InputException.class, () -> FittedCorrelationFile.parse(deep, "fit.json"));
        // The 64th bracket after the root object (column 11 + 64 on line 1) is level 65.
        assertEquals(
                "fit.json line 1, column 75: not valid JSON: nested deeper than 64 levels of objects and arrays",
                fitted.getMessage());
        InputException project = assertThrows(InputException.class, () -> ProjectFile.parse(deep));
        assertTrue(project.getMessage().contains("line 1, column 75"), project.getMessage());
        assertTrue(project.getMessage().contains("nested deeper than 64 levels"), project.getMessage());
    }

    @Test
    void aLongStringIsRefusedWithTheLimit() {
        String json = "{\"format\": \"" + "x".repeat(ProjectFile.MAX_STRING_LENGTH + 1) + "\"}";
        InputException e = assertThrows(InputException.class, () -> FittedCorrelationFile.parse(json, "fit.json"));
        assertTrue(e.getMessage().contains("a text value is longer than 100000 characters"), e.getMessage());
    }

    @Test
    void anOversizedFileIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("huge-fit.json");
        try (RandomAccessFile sparse = new RandomAccessFile(file.toFile(), "rw")) {
            sparse.setLength(ProjectFile.MAX_DOCUMENT_LENGTH + 1); // sparse: nothing is written
        }
        InputException e = assertThrows(InputException.class, () -> FittedCorrelationFile.load(file));
        assertEquals(
                file + ": file is larger than 16 MB; a fitted-correlation file is a few kilobytes", e.getMessage());
        InputException p = assertThrows(InputException.class, () -> ProjectFile.load(file));
        assertEquals("huge-fit.json: file is larger than 16 MB", p.getMessage());
    }

    @Test
    void infinityWrittenAsAHugeNumberIsRefused() throws Exception {
        String valid = FittedCorrelationFile.toJson(FittedCorrelationFile.parse(sample(), "fit.json"))
                .toPrettyString();
        String overflowing = valid.replace("\"r_squared\" : 0.998", "\"r_squared\" : 1e999");
        InputException e =
                assertThrows(InputException.class, () -> FittedCorrelationFile.parse(overflowing, "fit.json"));
        assertEquals("fit.json: $.statistics.r_squared: must be a finite number, got Infinity", e.getMessage());
    }

    @Test
    void noPolymorphicTypeHandlingAnywhere() throws IOException {
        List<String> offenders = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String text = Files.readString(f);
                for (String marker : List.of(
                        "enableDefaultTyping",
                        "activateDefaultTyping",
                        "JsonTypeInfo",
                        "PolymorphicTypeValidator",
                        "@JsonSubTypes")) {
                    if (text.contains(marker)) {
                        offenders.add(f + ": " + marker);
                    }
                }
            }
        }
        assertEquals(List.of(), offenders);
    }

    private static String sample() {
        return """
                {"format": "headway-fitted-correlation", "version": 1, "response": "f",
                 "form": "power", "expression": "a*Re^b",
                 "variables": [{"name": "Re", "min": 4000.0, "max": 100000.0}],
                 "parameters": [
                   {"name": "a", "value": 0.3164, "standard_error": 0.01, "ci95_low": 0.29, "ci95_high": 0.34},
                   {"name": "b", "value": -0.25, "standard_error": 0.002, "ci95_low": -0.254, "ci95_high": -0.246}],
                 "statistics": {"residual_sum_of_squares": 1.2e-7, "residual_standard_deviation": 1.1e-4,
                   "r_squared": 0.998, "adjusted_r_squared": 0.997, "degrees_of_freedom": 10, "points": 12},
                 "citation": "fitted by the user to their data"}
                """;
    }
}
