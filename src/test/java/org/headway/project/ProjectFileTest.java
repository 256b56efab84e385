package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.system.HeadLossCalculator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class ProjectFileTest {

    /** A small valid project; each bad case below changes one thing in it. */
    static final String VALID = """
            {
              "format": "headway-project",
              "version": 1,
              "title": "test line",
              "fluid": { "name": "water", "temperature": "20 degC" },
              "flow": "6 L/s",
              "friction": "colebrook",
              "segments": [
                {
                  "name": "main",
                  "length": "120 m",
                  "pipe": { "material": "steel-commercial-new", "size": "3", "schedule": "40" },
                  "fittings": [ { "kind": "elbow-90-standard", "count": 2 } ],
                  "elevationChange": "4 m"
                },
                {
                  "name": "branch",
                  "length": "30 m",
                  "innerDiameter": "52.5 mm",
                  "roughness": "0.045 mm"
                }
              ],
              "ends": { "source": { "level": "1 m" }, "delivery": { "pressure": "50 kPa" } },
              "pump": {
                "name": "p",
                "points": [ { "flow": "0 L/s", "head": "40 m" }, { "flow": "6.5 L/s", "head": "35 m" }, { "flow": "12 L/s", "head": "22 m" } ]
              }
            }
            """;

    private static ResolvedProject resolve(String json) {
        return ProjectResolver.resolve(ProjectFile.parse(json), Catalog.bundled(), Path.of("."));
    }

    @Test
    void validProjectResolvesAndSolves() {
        ResolvedProject r = resolve(VALID);
        assertEquals(0.006, r.run().designFlow(), 1e-15);
        assertEquals(2, r.run().segments().size());
        assertEquals(0.0525, r.run().segments().get(1).innerDiameter(), 1e-15);
        assertTrue(HeadLossCalculator.solve(r.run(), 0.006).totals().totalHead() > 0);
    }

    @Test
    void saveThenLoadGivesTheSameProject(@TempDir Path dir) {
        Project p = ProjectFile.parse(VALID);
        Path file = dir.resolve("p.json");
        ProjectFile.save(p, file);
        assertEquals(p, ProjectFile.load(file));
        // Saving again over the file leaves no temporary files behind.
        ProjectFile.save(p, file);
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count());
        } catch (java.io.IOException e) {
            throw new AssertionError(e);
        }
    }

    static Stream<Arguments> badProjects() {
        return Stream.of(
                Arguments.of("not JSON", "{ \"format\": ", "not valid JSON"),
                Arguments.of("array at top", "[]", "must be a JSON object"),
                Arguments.of("wrong format", VALID.replace("\"headway-project\"", "\"other\""), "format: expected"),
                Arguments.of(
                        "future version", VALID.replace("\"version\": 1", "\"version\": 9"), "version: this Headway"),
                Arguments.of("unknown top key", VALID.replace("\"title\"", "\"titel\""), "titel: unknown key"),
                Arguments.of("missing flow", VALID.replace("\"flow\": \"6 L/s\",", ""), "flow: missing"),
                Arguments.of(
                        "flow in wrong unit", VALID.replace("\"6 L/s\"", "\"6 m\""), "flow: volumetric flow expected"),
                Arguments.of(
                        "missing fluid",
                        VALID.replace("\"fluid\": { \"name\": \"water\", \"temperature\": \"20 degC\" },", ""),
                        "fluid: missing"),
                Arguments.of("unknown fluid", VALID.replace("\"water\"", "\"lemonade\""), "fluid.name"),
                Arguments.of("frozen water", VALID.replace("\"20 degC\"", "\"-10 degC\""), "fluid"),
                Arguments.of("temperature as a length", VALID.replace("\"20 degC\"", "\"20 m\""), "fluid.temperature"),
                Arguments.of(
                        "unknown friction method",
                        VALID.replace("\"colebrook\"", "\"guesswork\""),
                        "friction: unknown friction method"),
                Arguments.of(
                        "negative length",
                        VALID.replace("\"120 m\"", "\"-2 m\""),
                        "segments[0].length: must not be negative"),
                Arguments.of("length without number", VALID.replace("\"120 m\"", "\"m\""), "segments[0].length"),
                Arguments.of("NaN length", VALID.replace("\"120 m\"", "\"NaN m\""), "segments[0].length"),
                Arguments.of(
                        "unknown material",
                        VALID.replace("steel-commercial-new", "unobtainium"),
                        "segments[0].pipe.material"),
                Arguments.of(
                        "unknown size",
                        VALID.replace("\"size\": \"3\"", "\"size\": \"3-7/8\""),
                        "segments[0].pipe.size"),
                Arguments.of(
                        "unknown fitting",
                        VALID.replace("elbow-90-standard", "elbow-91"),
                        "segments[0].fittings[0].kind"),
                Arguments.of(
                        "zero fittings",
                        VALID.replace("\"count\": 2", "\"count\": 0"),
                        "segments[0].fittings[0].count"),
                Arguments.of(
                        "unknown segment key",
                        VALID.replace("\"elevationChange\"", "\"elevation\""),
                        "segments[0].elevation: unknown key"),
                Arguments.of(
                        "bore missing roughness",
                        VALID.replace("\"roughness\": \"0.045 mm\"", "\"lossCoefficient\": 0"),
                        "segments[1].roughness: missing"),
                Arguments.of(
                        "roughness above bore",
                        VALID.replace("\"0.045 mm\"", "\"60 mm\""),
                        "segments[1].roughness: roughness"),
                Arguments.of(
                        "no segments",
                        VALID.substring(0, VALID.indexOf("\"segments\"")) + "\"segments\": [] }",
                        "segments: must not be empty"),
                Arguments.of("pressure as a flow", VALID.replace("\"50 kPa\"", "\"50 L/s\""), "ends.delivery.pressure"),
                Arguments.of(
                        "pump with two points",
                        VALID.replace(", { \"flow\": \"12 L/s\", \"head\": \"22 m\" }", ""),
                        "pump.points"),
                Arguments.of(
                        "pump flows out of order", VALID.replace("\"12 L/s\"", "\"3 L/s\""), "pump.points[2].flow"),
                Arguments.of(
                        "duplicate key",
                        VALID.replace("\"title\": \"test line\",", "\"title\": \"a\", \"title\": \"b\","),
                        "Duplicate field"),
                Arguments.of(
                        "text where a list belongs",
                        VALID.replace(
                                "\"fittings\": [ { \"kind\": \"elbow-90-standard\", \"count\": 2 } ]",
                                "\"fittings\": \"two elbows\""),
                        "segments[0].fittings: expected a list"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badProjects")
    void badProjectsNameTheProblemAndItsPath(String what, String json, String expected) {
        InputException e = assertThrows(InputException.class, () -> resolve(json));
        assertTrue(e.getMessage().contains(expected), () -> what + ": got \"" + e.getMessage() + "\"");
    }

    @Test
    void everyProblemIsReportedAtOnce() {
        String json = VALID.replace("\"120 m\"", "\"-2 m\"").replace("\"6 L/s\"", "\"6 m\"");
        InputException e = assertThrows(InputException.class, () -> resolve(json));
        assertTrue(e.getMessage().startsWith("2 problems"), e.getMessage());
        assertTrue(e.getMessage().contains("segments[0].length"));
        assertTrue(e.getMessage().contains("flow:"));
    }

    @Test
    void loadNamesTheFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("broken.json");
        Files.writeString(file, VALID.replace("\"120 m\"", "true"), StandardCharsets.UTF_8);
        InputException e = assertThrows(InputException.class, () -> ProjectFile.load(file));
        assertTrue(e.getMessage().startsWith("broken.json segments[0].length"), e.getMessage());
        InputException missing = assertThrows(InputException.class, () -> ProjectFile.load(dir.resolve("nope.json")));
        assertTrue(missing.getMessage().contains("file not found"));
    }

    @Test
    void hostileNestingIsRefused() {
        String deep =
                "{\"format\":\"headway-project\",\"version\":1,\"title\":" + "[".repeat(2000) + "]".repeat(2000) + "}";
        InputException e = assertThrows(InputException.class, () -> ProjectFile.parse(deep));
        assertTrue(e.getMessage().contains("not valid JSON"), e.getMessage());
    }

    @Test
    void overridesReplaceCatalogValues() {
        String json = VALID.replace(
                        "\"elevationChange\": \"4 m\"",
                        "\"elevationChange\": \"4 m\", \"innerDiameter\": \"80 mm\", \"roughness\": \"0.1 mm\"")
                .replace(
                        "\"temperature\": \"20 degC\"",
                        "\"temperature\": \"20 degC\", \"density\": \"1000 kg/m3\", \"viscosity\": \"1 cP\"");
        ResolvedProject r = resolve(json);
        assertEquals(0.08, r.run().segments().get(0).innerDiameter(), 1e-15);
        assertEquals(1e-4, r.run().segments().get(0).roughness(), 1e-18);
        assertEquals(1000, r.run().fluid().density(), 0);
        assertEquals(1e-3, r.run().fluid().dynamicViscosity(), 1e-18);
        assertEquals("given in the project file", r.run().fluid().densitySource());
    }

    @Test
    void savedFilesAreReadableByOthersLikeAnyNewFileAndKeepTheirPermissions(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("shared.json");
        ProjectFile.save(ProjectFile.parse(VALID), file);
        // Common practice, no source: a new document gets rw-r--r-- (umask 022), not the temporary file's rw-------.
        assertEquals(
                "rw-r--r--",
                java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        Files.setPosixFilePermissions(file, java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw----"));
        ProjectFile.save(ProjectFile.parse(VALID), file);
        assertEquals(
                "rw-rw----",
                java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
    }
}
