package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The units engineers type beyond plain SI: gauge and absolute pressure readings, head of water,
 * mass flows, friction-loss gradients, and left-to-right reading of a unit with several solidi.
 *
 * <p>Reference values are built from defined constants, not from Headway's own tables: the bar
 * (10⁵ Pa), the pound (0.45359237 kg), the foot (0.3048 m), the inch (0.0254 m), the pound-force
 * per square inch (6894.757293168 Pa, from the pound, standard gravity and the inch), the hour
 * (3600 s), the tonne (1000 kg) and standard gravity g_n = 9.80665 m/s² (NIST SP 811 (2008),
 * Appendix B.8 and B.9; ISO 80000-3 for g_n; from memory). Each check names its source beside it.
 */
class UnitsEngineersTypeTest {

    /** Conversions are exact by definition; allow double round-off only. */
    private static final double ROUND_OFF = 1e-12;

    /** Pound-force per square inch in Pa: 0.45359237 × 9.80665 / 0.0254² (NIST SP 811 B.8, from memory). */
    private static final double PSI = 0.45359237 * 9.80665 / (0.0254 * 0.0254);

    /** Conventional metre of water: ρ = 1000 kg/m³ under g_n (NIST SP 811 B.8 "conventional", from memory). */
    private static final double METRE_OF_WATER = 1000 * 9.80665;

    private static void close(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * ROUND_OFF);
    }

    // ---- gauge and absolute pressure ----

    /** Factors: bar = 1e5 Pa, psi as PSI above, kPa by the SI prefix (NIST SP 811 B.8, from memory). */
    @ParameterizedTest(name = "\"{0}\" = {1} × {2} Pa, {3}")
    @CsvSource({
        "3 barg,        3,     100000, GAUGE",
        "3 bar(g),      3,     100000, GAUGE",
        "3 bar (g),     3,     100000, GAUGE",
        "250 kPag,      250,   1000,   GAUGE",
        "250 kPa(g),    250,   1000,   GAUGE",
        "40 kPa gauge,  40,    1000,   GAUGE",
        "450 mbarg,     450,   100,    GAUGE",
        "45 psig,       45,    PSI,    GAUGE",
        "14.7 psia,     14.7,  PSI,    ABSOLUTE",
        "1.2 bara,      1.2,   100000, ABSOLUTE",
        "80 kPa(a),     80,    1000,   ABSOLUTE",
        "80 kPa (abs),  80,    1000,   ABSOLUTE",
        "80 kPa abs,    80,    1000,   ABSOLUTE",
        "3 bar,         3,     100000, UNSPECIFIED",
        "250 kPa,       250,   1000,   UNSPECIFIED",
        "35 psi,        35,    PSI,    UNSPECIFIED",
        "101325,        101325, 1,     UNSPECIFIED"
    })
    void readsGaugeAbsoluteAndPlainPressures(
            String text, double number, String factor, PressureReading.Reference reference) {
        double pascalsPerUnit = factor.equals("PSI") ? PSI : Double.parseDouble(factor);
        PressureReading r = Quantities.parsePressure(text, "ends.delivery.pressure");
        close(number * pascalsPerUnit, r.pascals());
        assertEquals(reference, r.reference(), text);
    }

    @Test
    void convertsAReadingWithTheBarometricPressure() {
        double site = 95_000; // an invented site's barometric pressure
        // gauge = absolute − barometric (definition of gauge pressure, ISO 80000-4, from memory)
        close(200_000 - site, Quantities.parsePressure("2 bara", "p").asGauge(site));
        close(200_000, Quantities.parsePressure("2 barg", "p").asGauge(site));
        close(200_000, Quantities.parsePressure("2 bar", "p").asGauge(site));
        close(100_000 + site, Quantities.parsePressure("1 barg", "p").asAbsolute(site));
        close(100_000, Quantities.parsePressure("1 bara", "p").asAbsolute(site));
        close(100_000, Quantities.parsePressure("1 bar", "p").asAbsolute(site));
    }

    @Test
    void aPlainPressureFieldRefusesAMarkerSayingHowToWriteIt() {
        InputException e = assertThrows(
                InputException.class, () -> Quantities.parse("40 kPag", QuantityKind.PRESSURE, "ratedPressureDrop"));
        assertEquals(
                "ratedPressureDrop: \"40 kPag\" is marked as a gauge pressure, which this field does not take; write it"
                        + " as a plain pressure in the field's own convention, e.g. 40 kPa",
                e.getMessage());
        InputException abs = assertThrows(
                InputException.class, () -> Quantities.parse("2 bar(a)", QuantityKind.PRESSURE, "--pressure"));
        assertTrue(
                abs.getMessage().startsWith("--pressure: \"2 bar(a)\" is marked as an absolute pressure"),
                abs.getMessage());
        InputException length =
                assertThrows(InputException.class, () -> Quantities.parse("3 barg", QuantityKind.LENGTH, "length"));
        assertEquals("length: length expected, got \"3 barg\" (pressure)", length.getMessage());
    }

    @Test
    void aMarkerOnSomethingNotAPressureIsNamed() {
        InputException e =
                assertThrows(InputException.class, () -> Quantities.parsePressure("3 m(g)", "pressureLimits.minimum"));
        assertEquals("pressureLimits.minimum: pressure expected, got \"3 m(g)\" (length)", e.getMessage());
        InputException flow = assertThrows(InputException.class, () -> Quantities.parsePressure("3 L/s", "p"));
        assertEquals("p: pressure expected, got \"3 L/s\" (volumetric flow)", flow.getMessage());
    }

    // ---- head of water ----

    @ParameterizedTest(name = "\"{0}\" = {1} Pa")
    @CsvSource({
        // conventional metre of water = 1000 kg/m³ × 9.80665 m/s² × 1 m (NIST SP 811 B.8, from memory)
        "1 mH2O, 9806.65",
        "1 m H2O, 9806.65",
        "1 mH₂O, 9806.65",
        "1000 mmH2O, 9806.65",
        // conventional foot of water = 0.3048 m × 9806.65 Pa/m (NIST SP 811 B.8, from memory)
        "1 ftH2O, 2989.06692",
        "12 ft H2O, 35868.80304",
        // conventional inch of water = 0.0254 m × 9806.65 Pa/m (NIST SP 811 B.8, from memory)
        "1 inH2O, 249.08891"
    })
    void headOfWaterIsAConventionalPressure(String text, double pascals) {
        close(pascals, Quantities.parse(text, QuantityKind.PRESSURE, "p"));
        assertEquals(
                PressureReading.Reference.UNSPECIFIED,
                Quantities.parsePressure(text, "p").reference());
    }

    @Test
    void headOfWaterAgreesWithTheRoundedTableValues() {
        // NIST SP 811 B.8 prints the conventional foot of water as 2.989 067 E+03 Pa and the
        // conventional inch of water as 2.490 889 E+02 Pa (from memory): agree to half the last digit.
        assertEquals(2.989067e3, Quantities.parse("1 ftH2O", QuantityKind.PRESSURE), 0.5e-3);
        assertEquals(2.490889e2, Quantities.parse("1 inH2O", QuantityKind.PRESSURE), 0.5e-4);
        close(0.3048 * METRE_OF_WATER, Quantities.parse("1 ftH2O", QuantityKind.PRESSURE));
        // Not the foot of water at 39.2 °F, 2.988 98 E+03 Pa in the same table (from memory).
        assertTrue(Math.abs(Quantities.parse("1 ftH2O", QuantityKind.PRESSURE) - 2988.98) > 0.05);
    }

    @Test
    void headOfWaterIsNotALengthOfTheFluid() {
        // A metre of water is a pressure; a head in m of the pumped fluid is a length (ISO 80000-4, from memory).
        InputException e =
                assertThrows(InputException.class, () -> Quantities.parse("3 mH2O", QuantityKind.HEAD, "headBudget"));
        assertEquals("headBudget: length expected, got \"3 mH2O\" (pressure)", e.getMessage());
    }

    // ---- mass flow ----

    /** Factors: hour 3600 s, pound 0.45359237 kg, tonne 1000 kg (NIST SP 811 B.8, from memory). */
    @ParameterizedTest(name = "\"{0}\" = {1} kg/s")
    @CsvSource({
        "3600 kg/h, 1.0",
        "1.5 kg/s, 1.5",
        "3600 lb/h, 0.45359237",
        "3600 lb/hr, 0.45359237",
        "3.6 t/h, 1.0",
        "60 kg/min, 1.0"
    })
    void readsMassFlows(String text, double kilogramsPerSecond) {
        FlowReading r = Quantities.parseFlow(text, "flow");
        assertTrue(r.isMass(), text);
        close(kilogramsPerSecond, r.value());
        // m³/s = (kg/s) / (kg/m³), with an invented density
        close(kilogramsPerSecond / 850.0, r.volumetric(850.0, "flow"));
    }

    @Test
    void volumetricFlowsPassThroughWithoutADensity() {
        FlowReading r = Quantities.parseFlow("43 m3/h", "flow");
        assertFalse(r.isMass());
        close(43.0 / 3600, r.volumetric(Double.NaN, "flow")); // h = 3600 s (NIST SP 811 B.8, from memory)
        close(0.012, Quantities.parseFlow("0.012", "flow").volumetric(Double.NaN, "flow")); // bare number is SI
    }

    @Test
    void aMassFlowWithoutADensityIsRefusedNamingTheField() {
        FlowReading r = Quantities.parseFlow("21600 kg/h", "pump.points[1].flow");
        InputException e = assertThrows(InputException.class, () -> r.volumetric(Double.NaN, "pump.points[1].flow"));
        assertEquals(
                "pump.points[1].flow: \"21600 kg/h\" is a mass flow; converting it to a volumetric flow needs the fluid's"
                        + " density, and none is known here (give the fluid, or the flow in L/s, m3/h or gpm)",
                e.getMessage());
    }

    @Test
    void aFlowOfTheWrongDimensionNamesWhatItIs() {
        InputException e = assertThrows(InputException.class, () -> Quantities.parseFlow("6 m", "flow"));
        assertEquals(
                "flow: volumetric flow expected (or a mass flow such as 4300 kg/h), got \"6 m\" (length)",
                e.getMessage());
        InputException plain = assertThrows(
                InputException.class, () -> Quantities.parse("3600 kg/h", QuantityKind.VOLUMETRIC_FLOW, "--curve"));
        assertEquals("--curve: volumetric flow expected, got \"3600 kg/h\" (mass flow)", plain.getMessage());
    }

    // ---- m³/h and bar together ----

    @ParameterizedTest(name = "\"{0}\"")
    @CsvSource({"43 m3/h", "43 m³/h", "43 m^3/h", "43 m3 / h", "43 m**3/h"})
    void cubicMetresPerHourParseInEverySpelling(String text) {
        close(43.0 / 3600, Quantities.parse(text, QuantityKind.VOLUMETRIC_FLOW, "flow")); // h = 3600 s (NIST SP 811)
    }

    @Test
    void cubicMetresPerHourPerBarIsReadLeftToRight() {
        // (m³/h)/bar has dimension L³T⁻¹ / (M L⁻¹ T⁻²) = L⁴ T M⁻¹ (ISO 80000-1 dimensional products, from memory).
        InputException e = assertThrows(
                InputException.class, () -> Quantities.parse("180 m³/h/bar", QuantityKind.VOLUMETRIC_FLOW, "kv"));
        assertEquals("kv: volumetric flow expected, got \"180 m³/h/bar\" (dimension [L]^4·[T]/[M])", e.getMessage());
        close(2.4e5, Quantities.parse("2.4 bar", QuantityKind.PRESSURE, "p")); // bar = 1e5 Pa (NIST SP 811 B.8)
    }

    // ---- friction-loss gradient ----

    /** Gradients as head per 100 m: head/length × 100, feet and metres cancelling (NIST SP 811 B.8 for ft, mm). */
    @ParameterizedTest(name = "\"{0}\" = {1} m per 100 m")
    @CsvSource(
            delimiter = '|',
            value = {
                "4 m per 100 m | 4",
                "4 ft per 100 ft | 4",
                "4 ft PER 100 ft | 4",
                "4 m/100m | 4",
                "4 ft/100 ft | 4",
                "0.04 m/m | 4",
                "40 mm/m | 4",
                "4 m per km | 0.4",
                "1.2192 m per 100 m | 1.2192",
                "4 ft per 100 m | 1.2192",
                "5 | 5"
            })
    void readsHeadGradients(String text, double metresPer100m) {
        FrictionGradient g = Quantities.parseGradient(text, "maximumFrictionLossPer100m");
        assertEquals(FrictionGradient.Basis.HEAD_PER_100_M, g.basis(), text);
        assertEquals(metresPer100m, g.headPer100m(Double.NaN, 9.80665, "g"), 1e-12, text);
    }

    @Test
    void readsPressureGradientsAndConvertsThemWithTheDensity() {
        FrictionGradient pa = Quantities.parseGradient("400 Pa/m", "g");
        assertEquals(FrictionGradient.Basis.PRESSURE_PER_METRE, pa.basis());
        close(400, pa.value());
        // h = Δp/(ρ g): 400 Pa/m at 1000 kg/m³ under g_n is 400/9806.65 m/m (ISO 80000-3 for g_n)
        close(100 * 400 / (1000 * 9.80665), pa.headPer100m(1000, 9.80665, "g"));
        close(400, Quantities.parseGradient("0.4 kPa/m", "g").value());
        // 1.2 psi per 100 ft: 1.2 × PSI / 30.48 m (NIST SP 811 B.8 for psi and ft, from memory)
        close(1.2 * PSI / 30.48, Quantities.parseGradient("1.2 psi/100ft", "g").value());
        close(
                1.2 * PSI / 30.48,
                Quantities.parseGradient("1.2 psi per 100 ft", "g").value());
        InputException e = assertThrows(
                InputException.class,
                () -> Quantities.parseGradient("400 Pa/m", "limits.maximumFrictionLossPer100m")
                        .headPer100m(Double.NaN, 9.80665, "limits.maximumFrictionLossPer100m"));
        assertTrue(
                e.getMessage()
                        .startsWith("limits.maximumFrictionLossPer100m: \"400 Pa/m\" is a pressure per length;"
                                + " reading it as head per length needs the fluid's density"),
                e.getMessage());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @CsvSource(
            delimiter = '|',
            value = {
                "4 ft | maximumFrictionLossPer100m: \"4 ft\" is a head alone, not a head per length of pipe; write \"4 ft"
                        + " per 100 ft\" or \"4 ft per 100 m\" (a bare number is m per 100 m)",
                "4 m | maximumFrictionLossPer100m: \"4 m\" is a head alone, not a head per length of pipe; write \"4 m per"
                        + " 100 m\" (a bare number is m per 100 m)",
                "40 kPa | maximumFrictionLossPer100m: \"40 kPa\" is a pressure alone, not a pressure per length of pipe;"
                        + " write e.g. \"40 kPa per 100 m\" or a value in Pa/m",
                "4 L/s | maximumFrictionLossPer100m: friction-loss gradient expected, got \"4 L/s\" (volumetric flow)",
                "4 m per 100 s | maximumFrictionLossPer100m: the length of pipe in \"4 m per 100 s\" must be a length,"
                        + " got \"100 s\" (dimension [T])",
                "4 m per 0 m | maximumFrictionLossPer100m: the length of pipe in \"4 m per 0 m\" must be greater than"
                        + " zero",
                "4 per 100 m | maximumFrictionLossPer100m: the loss in \"4 per 100 m\" needs its unit, e.g. 4 m per 100 m",
                "steep | maximumFrictionLossPer100m: friction-loss gradient expected as a number and unit (e.g. 4 m per"
                        + " 100 m, 4 ft per 100 ft or 400 Pa/m), got \"steep\""
            })
    void refusesWhatIsNotAGradientSayingHowToWriteIt(String text, String message) {
        InputException e =
                assertThrows(InputException.class, () -> Quantities.parseGradient(text, "maximumFrictionLossPer100m"));
        assertEquals(message, e.getMessage());
        assertEquals("maximumFrictionLossPer100m", e.where());
    }

    // ---- left to right ----

    @Test
    void severalSolidiAreReadLeftToRight() {
        // Our rule: a/b/c = (a/b)/c. (The SI Brochure, 9th ed., 5.4.6, asks for brackets or negative
        // exponents instead of a second solidus; from memory.) Expected dimensions by exponent arithmetic.
        InputException length = assertThrows(
                InputException.class, () -> Quantities.parse("1 m/s/s/s/s", QuantityKind.LENGTH, "length"));
        assertEquals("length: length expected, got \"1 m/s/s/s/s\" (dimension [L]/[T]^4)", length.getMessage());
        InputException flow = assertThrows(
                InputException.class, () -> Quantities.parse("9 L/s/s", QuantityKind.VOLUMETRIC_FLOW, "flow"));
        assertEquals(
                "flow: volumetric flow expected, got \"9 L/s/s\" (volumetric flow per second, dimension [L]³/[T]²)",
                flow.getMessage());
        // kg/m/s = kg·m⁻¹·s⁻¹ = Pa·s (SI Brochure, 9th ed., Table 5, from memory)
        close(1.0, Quantities.parse("1 kg/m/s", QuantityKind.DYNAMIC_VISCOSITY, "viscosity"));
        // a/b*c = (a/b)·c: m/s*s is a length
        close(1.0, Quantities.parse("1 m/s*s", QuantityKind.LENGTH, "length"));
        // brackets still group as written: kg/(m·s) = Pa·s
        close(1.0, Quantities.parse("1 kg/(m·s)", QuantityKind.DYNAMIC_VISCOSITY, "viscosity"));
        close(1e-3, Quantities.parse("1 mPa*s", QuantityKind.DYNAMIC_VISCOSITY, "viscosity"));
        // A prefix binds before the power: mm² = (10⁻³ m)² = 10⁻⁶ m² (SI Brochure, 9th ed., 3, from memory),
        // also when the symbol stands alone between solidi.
        close(1e-6, Quantities.parse("1 mm²/s", QuantityKind.KINEMATIC_VISCOSITY, "viscosity"));
        close(1e-6, Quantities.parse("1 mm2/s", QuantityKind.KINEMATIC_VISCOSITY, "viscosity"));
        close(1e-6, Quantities.parse("1 (mm)^2/s", QuantityKind.KINEMATIC_VISCOSITY, "viscosity"));
    }

    @org.junit.jupiter.api.Test
    void aTemperatureWithoutItsUnitIsRefusedNotReadAsKelvin() {
        // "5" is 5 °C to a reader and 5 K by the bare-number-is-SI rule: common practice, no source.
        org.headway.caution.InputException e = org.junit.jupiter.api.Assertions.assertThrows(
                org.headway.caution.InputException.class,
                () -> Quantities.parse("5", QuantityKind.TEMPERATURE, "--temperature"));
        org.junit.jupiter.api.Assertions.assertEquals(
                "--temperature: a temperature needs its unit, got \"5\" (write e.g. 5 degC, 5 degF or 5 K)",
                e.getMessage());
        org.junit.jupiter.api.Assertions.assertEquals(
                278.15, Quantities.parse("5 degC", QuantityKind.TEMPERATURE, "t"), 1e-12);
    }
}
