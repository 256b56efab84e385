package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.system.PipeRun;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Gauge and absolute pressures, head of water, mass flows and friction-loss gradients in small
 * invented projects, as the resolver converts them with the project's own site and fluid.
 *
 * <p>References: gauge = absolute − barometric (ISO 80000-4, from memory); bar = 10⁵ Pa, hour =
 * 3600 s, tonne = 1000 kg, pound = 0.45359237 kg, foot = 0.3048 m (NIST SP 811 (2008) Appendix
 * B.8, from memory); conventional metre of water 9806.65 Pa (ρ = 1000 kg/m³ under g_n = 9.80665
 * m/s², NIST SP 811 B.8 and ISO 80000-3, from memory).
 */
class UnitsInProjectsTest {

    /** The invented site's barometric pressure (Pa), given in the project as 95 kPa. */
    private static final double SITE = 95_000;

    /**
     * A small format-2 project with a fluid of given properties (so every density is exact), a
     * site at 95 kPa, and markers to replace: FLOW, SOURCE_P, DELIVERY_P, MIN_P, MAX_P, GRADIENT.
     */
    private static final String TEMPLATE = """
            {
              "format": "headway-project", "version": 2, "title": "invented test line",
              "fluid": { "name": "test-oil", "temperature": "20 degC", "density": "850 kg/m3", "viscosity": "10 cP" },
              "flow": "FLOW",
              "site": { "barometricPressure": "95 kPa" },
              "pressureLimits": { "minimum": "MIN_P", "maximum": "MAX_P" },
              "elements": [
                { "id": "main", "length": "120 m", "innerDiameter": "52.5 mm", "roughness": "0.045 mm" }
              ],
              "ends": { "source": { "level": "1 m", "pressure": "SOURCE_P" }, "delivery": { "pressure": "DELIVERY_P" } },
              "limits": { "maximumFrictionLossPer100m": "GRADIENT" }
            }
            """;

    private static String project(String flow, String source, String delivery, String gradient) {
        return TEMPLATE.replace("FLOW", flow)
                .replace("SOURCE_P", source)
                .replace("DELIVERY_P", delivery)
                .replace("MIN_P", "0.5 barg")
                .replace("MAX_P", "10 barg")
                .replace("GRADIENT", gradient);
    }

    private static String project() {
        return project("6 L/s", "0 kPa", "50 kPa", "4 m per 100 m");
    }

    private static ResolvedProject resolve(String json) {
        return ProjectResolver.resolve(ProjectFile.parse(json), Catalog.bundled(), Path.of("."));
    }

    private static InputException refused(String json) {
        return assertThrows(InputException.class, () -> resolve(json));
    }

    // ---- pressures ----

    /** End pressures are gauge: gauge and plain as given, absolute less the site's 95 kPa. */
    @ParameterizedTest(name = "delivery \"{0}\" = {1} Pa gauge")
    @CsvSource({
        "3 barg,     300000",
        "3 bar(g),   300000",
        "3 bar,      300000",
        "300 kPa(g), 300000",
        "3 bara,     205000",
        "95 kPa(a),  0",
        "80 kPa(a),  -15000",
        "10 mH2O,    98066.5"
    })
    void endPressuresAreGaugeAndAbsoluteReadingsLoseTheSiteAtmosphere(String text, double gauge) {
        PipeRun run = resolve(project("6 L/s", "0 kPa", text, "4 m per 100 m")).run();
        assertEquals(gauge, run.delivery().pressure(), 1e-9, text);
    }

    @Test
    void pressureLimitsAreGaugeToo() {
        String json = project().replace("\"0.5 barg\"", "\"1.5 bara\"").replace("\"10 barg\"", "\"145 psig\"");
        PipeRun run = resolve(json).run();
        assertEquals(150_000 - SITE, run.pressureLimits().minimumGauge(), 1e-9); // 1.5 bar = 1.5e5 Pa
        // 145 psi = 145 × 0.45359237 × 9.80665 / 0.0254² Pa (NIST SP 811 B.8, from memory)
        assertEquals(
                145 * 0.45359237 * 9.80665 / (0.0254 * 0.0254),
                run.pressureLimits().maximumGauge(),
                1e-6);
    }

    @Test
    void theFluidPressureIsAbsoluteAndAGaugeReadingGainsTheSiteAtmosphere() {
        String json = project()
                .replace("\"temperature\": \"20 degC\",", "\"temperature\": \"20 degC\", \"pressure\": \"2 barg\",");
        assertEquals(200_000 + SITE, resolve(json).run().fluid().pressure(), 1e-9);
        String absolute = json.replace("\"2 barg\"", "\"2 bara\"");
        assertEquals(200_000, resolve(absolute).run().fluid().pressure(), 1e-9);
    }

    @Test
    void aVapourPressureRefusesAGaugeReading() {
        String json = project()
                .replace("\"viscosity\": \"10 cP\"", "\"viscosity\": \"10 cP\", \"vapourPressure\": \"2.3 kPag\"");
        InputException e = refused(json);
        assertEquals(
                "fluid.vapourPressure: \"2.3 kPag\" is a gauge reading, but a vapour pressure is an absolute pressure"
                        + " (measured from vacuum); give its absolute value, e.g. in kPa, kPa(a), bara or psia",
                e.getMessage());
        String absolute = json.replace("\"2.3 kPag\"", "\"2.3 kPa(a)\"");
        assertEquals(2300, resolve(absolute).run().fluid().vapourPressure().getAsDouble(), 1e-9);
    }

    @Test
    void aBarometricPressureRefusesAGaugeReading() {
        InputException e = refused(project().replace("\"95 kPa\"", "\"0 barg\""));
        assertEquals(
                "site.barometricPressure: \"0 barg\" is a gauge reading, but the site's barometric pressure is an"
                        + " absolute pressure (measured from vacuum); give its absolute value, e.g. in kPa, kPa(a), bara"
                        + " or psia",
                e.getMessage());
        assertEquals(
                95_000,
                resolve(project().replace("\"95 kPa\"", "\"0.95 bara\""))
                        .run()
                        .site()
                        .pressure(),
                1e-9);
    }

    @Test
    void aRatedPressureDropTakesHeadOfWaterButNoMarker() {
        String withCoil = project()
                .replace(
                        "\"roughness\": \"0.045 mm\" }",
                        "\"roughness\": \"0.045 mm\" },\n"
                                + " { \"id\": \"coil\", \"kind\": \"component\", \"ratedPressureDrop\": \"4 mH2O\","
                                + " \"ratedFlow\": \"RATED\" }");
        PipeRun run = resolve(withCoil.replace("RATED", "6 L/s")).run();
        RatedComponent coil = (RatedComponent) run.element("coil").orElseThrow();
        assertEquals(4 * 9806.65, coil.ratedPressureDrop(), 1e-9); // conventional metre of water
        // rated flow by mass: 5.1 kg/s of an 850 kg/m³ fluid is 0.006 m³/s
        RatedComponent byMass = (RatedComponent) resolve(withCoil.replace("RATED", "5.1 kg/s"))
                .run()
                .element("coil")
                .orElseThrow();
        assertEquals(0.006, byMass.ratedFlow(), 1e-15);
        InputException e = refused(withCoil.replace("RATED", "6 L/s").replace("\"4 mH2O\"", "\"40 kPag\""));
        assertTrue(
                e.getMessage()
                        .startsWith("elements[1] (coil).ratedPressureDrop: \"40 kPag\" is marked as a gauge pressure"),
                e.getMessage());
    }

    // ---- mass flows ----

    /** 850 kg/m³ fluid: m³/s = (kg/s)/850. */
    @ParameterizedTest(name = "flow \"{0}\"")
    @CsvSource({
        "18360 kg/h, 0.006", // 18360/3600 = 5.1 kg/s
        "5.1 kg/s, 0.006",
        "18.36 t/h, 0.006", // tonne = 1000 kg
        "6 L/s, 0.006",
        "21.6 m3/h, 0.006",
        "21.6 m³/h, 0.006",
        "21.6 m^3/h, 0.006"
    })
    void theDesignFlowMayBeGivenByMass(String text, double cubicMetresPerSecond) {
        assertEquals(
                cubicMetresPerSecond,
                resolve(project(text, "0 kPa", "50 kPa", "4 m per 100 m")).run().designFlow(),
                1e-15);
    }

    @Test
    void aPoundPerHourFlowUsesThePoundAndTheFluidAtItsState() {
        // Water at 20 °C and 101.325 kPa: 998.21 kg/m³ (IAPWS-95, from memory); 1 lb = 0.45359237 kg.
        String json = project("47600 lb/h", "0 kPa", "50 kPa", "4 m per 100 m")
                .replace(
                        "\"name\": \"test-oil\", \"temperature\": \"20 degC\", \"density\": \"850 kg/m3\", \"viscosity\":"
                                + " \"10 cP\"",
                        "\"name\": \"water\", \"temperature\": \"20 degC\"");
        double expected = 47600 * 0.45359237 / 3600 / 998.21;
        assertEquals(expected, resolve(json).run().designFlow(), expected * 2e-5);
    }

    @Test
    void pumpPointsAndTheCurveRangeMayBeGivenByMass() {
        String json = project("18360 kg/h", "0 kPa", "50 kPa", "4 m per 100 m")
                .replace(
                        "\"elements\": [",
                        "\"curve\": { \"minimumFlow\": \"0 t/h\", \"maximumFlow\": \"36.72 t/h\", \"points\": 5 },\n"
                                + "\"elements\": [ { \"id\": \"pump\", \"kind\": \"pump\", \"points\": ["
                                + " { \"flow\": \"0 kg/h\", \"head\": \"40 m\" },"
                                + " { \"flow\": \"18360 kg/h\", \"head\": \"34 m\" },"
                                + " { \"flow\": \"36720 kg/h\", \"head\": \"20 m\" } ] },");
        ResolvedProject r = resolve(json);
        PumpElement pump = (PumpElement) r.run().element("pump").orElseThrow();
        assertEquals(0.006, pump.curve().points().get(1).flow(), 1e-15); // 5.1 kg/s / 850 kg/m³
        assertEquals(0.012, pump.curve().points().get(2).flow(), 1e-15);
        assertEquals(0.012, r.curve().orElseThrow().maximumFlow(), 1e-15); // 36.72 t/h = 10.2 kg/s
    }

    @Test
    void aMassFlowWithoutAResolvedFluidIsRefusedNamingTheFlow() {
        String json = project("18360 kg/h", "0 kPa", "50 kPa", "4 m per 100 m")
                .replace(
                        "\"name\": \"test-oil\", \"temperature\": \"20 degC\", \"density\": \"850 kg/m3\",",
                        "\"name\": \"lemonade\",");
        InputException e = refused(json);
        assertTrue(e.getMessage().startsWith("2 problems"), e.getMessage());
        assertTrue(e.getMessage().contains("fluid.name"), e.getMessage());
        assertTrue(
                e.getMessage()
                        .contains("flow: \"18360 kg/h\" is a mass flow; converting it to a volumetric flow needs the"
                                + " fluid's density, and none is known here"),
                e.getMessage());
    }

    // ---- friction-loss gradient ----

    /** m of head per 100 m of pipe; head/length × 100 (NIST SP 811 B.8 for ft and mm, from memory). */
    @ParameterizedTest(name = "\"{0}\" = {1} m per 100 m")
    @CsvSource({
        "4 m per 100 m, 4",
        "4 ft per 100 ft, 4",
        "4 m/100m, 4",
        "0.04 m/m, 4",
        "40 mm/m, 4",
        "4 ft per 100 m, 1.2192",
        "5, 5"
    })
    void theFrictionLimitIsAGradient(String text, double metresPer100m) {
        assertEquals(
                metresPer100m,
                resolve(project("6 L/s", "0 kPa", "50 kPa", text)).limits().maximumFrictionLossPer100m(),
                1e-12);
    }

    @Test
    void aPressureGradientUsesTheFluidDensity() {
        // h = Δp/(ρ g): 400 Pa/m in an 850 kg/m³ fluid under g_n = 9.80665 m/s² (ISO 80000-3)
        double limit = resolve(project("6 L/s", "0 kPa", "50 kPa", "400 Pa/m"))
                .limits()
                .maximumFrictionLossPer100m();
        assertEquals(100 * 400 / (850 * 9.80665), limit, 1e-12);
    }

    @Test
    void aHeadAloneIsRefusedWithTheWayToWriteIt() {
        InputException e = refused(project("6 L/s", "0 kPa", "50 kPa", "4 ft"));
        assertEquals(
                "limits.maximumFrictionLossPer100m: \"4 ft\" is a head alone, not a head per length of pipe; write \"4 ft"
                        + " per 100 ft\" or \"4 ft per 100 m\" (a bare number is m per 100 m)",
                e.getMessage());
    }

    @Test
    void aFormatTwoLimitInMetresAloneKeepsTheMeaningHeadwayGaveIt() {
        // Saved by the first format-2 Headway: "4 m" meant 4 m per 100 m (metric practice reads it the same way).
        Project p = ProjectFile.parse(project("6 L/s", "0 kPa", "50 kPa", "4 m"));
        assertEquals("4 m per 100 m", p.limits().maximumFrictionLossPer100m());
        assertEquals(
                4.0,
                resolve(project("6 L/s", "0 kPa", "50 kPa", "4 m")).limits().maximumFrictionLossPer100m(),
                0);
    }

    @Test
    void aFormatOneHeadKeepsTheMeaningItHadThere() {
        // Format 1 read the limit as a head per 100 m of pipe: "4 ft" was 1.2192 m per 100 m (0.3048 m/ft).
        String formatOne = ProjectFileTest.VALID.replace(
                "\"ends\":", "\"limits\": { \"maximumFrictionLossPer100m\": \"LIMIT\" },\n  \"ends\":");
        Project feet = ProjectFile.parse(formatOne.replace("LIMIT", "4 ft"));
        assertEquals("4 ft per 100 m", feet.limits().maximumFrictionLossPer100m());
        assertEquals(
                1.2192,
                ProjectResolver.resolve(feet, Catalog.bundled(), Path.of("."))
                        .limits()
                        .maximumFrictionLossPer100m(),
                1e-12);
        assertEquals(
                "5", ProjectFile.parse(formatOne.replace("LIMIT", "5")).limits().maximumFrictionLossPer100m());
        assertEquals(
                "4 m/100m",
                ProjectFile.parse(formatOne.replace("LIMIT", "4 m/100m"))
                        .limits()
                        .maximumFrictionLossPer100m());
    }

    static Stream<Path> projectsWithAFrictionLimit() throws Exception {
        return Stream.of(Path.of("fluids-data/examples"), Path.of("src/test/resources/org/headway/project/format1"))
                .flatMap(dir -> {
                    try {
                        return Files.list(dir).filter(f -> f.toString().endsWith(".json")).sorted().toList().stream();
                    } catch (java.io.IOException e) {
                        throw new java.io.UncheckedIOException(e);
                    }
                })
                .filter(f -> {
                    try {
                        return Files.readString(f).contains("maximumFrictionLossPer100m");
                    } catch (java.io.IOException e) {
                        throw new java.io.UncheckedIOException(e);
                    }
                });
    }

    /** The bundled examples (format 2) and their format-1 copies keep the limit they were written with. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("projectsWithAFrictionLimit")
    void bundledProjectsStillLoadWithTheirLimit(Path file) {
        ResolvedProject r = ProjectResolver.resolve(ProjectFile.load(file), Catalog.bundled(), file.getParent());
        // the chilled-water riser was written with 4 m per 100 m, the orchard booster with 5 m per 100 m
        double expected = file.getFileName().toString().startsWith("size-chilled-water-riser") ? 4.0 : 5.0;
        assertEquals(expected, r.limits().maximumFrictionLossPer100m(), 0.0, file.toString());
    }
}
