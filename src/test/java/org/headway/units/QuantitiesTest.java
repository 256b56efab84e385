package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import javax.measure.format.MeasurementParseException;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;
import tech.units.indriya.format.SimpleUnitFormat;

class QuantitiesTest {

    /** Conversions are exact by definition; allow double round-off only. */
    private static final double ROUND_OFF = 1e-12;

    /** Source: spellings.csv (exact factors of NIST SP 811 Appendix B, from memory, evaluated as fractions). */
    @ParameterizedTest(name = "\"{0}\" as {1} = {2}")
    @CsvFileSource(resources = "spellings.csv", numLinesToSkip = 1)
    void parsesEverySpelling(String text, QuantityKind kind, double si) {
        assertEquals(si, Quantities.parse(text, kind), Math.abs(si) * ROUND_OFF);
    }

    @ParameterizedTest(name = "\"{0}\" as {1}")
    @CsvSource(
            delimiter = '|',
            value = {
                "12 L/s | LENGTH | length: length expected, got \"12 L/s\" (volumetric flow)",
                "35 psi | TEMPERATURE | temperature: temperature expected, got \"35 psi\" (pressure)",
                "2 kg | PRESSURE | pressure: pressure expected, got \"2 kg\" (dimension [M])",
                "68 F | TEMPERATURE | temperature: unit \"F\" in \"68 F\" is ambiguous (farad or Fahrenheit?): write °F or"
                        + " degF",
                "20 C | TEMPERATURE | temperature: unit \"C\" in \"20 C\" is ambiguous (coulomb or Celsius?): write °C or"
                        + " degC",
                "12 furlongs | LENGTH | length: length expected, got \"12 furlongs\": unknown unit \"furlongs\" (e.g. 35 m"
                        + " or 12 ft)",
                "NaN | PRESSURE | pressure: a finite number is required, got \"NaN\"",
                "Infinity kPa | PRESSURE | pressure: a finite number is required, got \"Infinity kPa\"",
                "-inf | PRESSURE | pressure: a finite number is required, got \"-inf\"",
                "fast | VELOCITY | velocity: velocity expected as a number and unit (e.g. 2.5 m/s or 8 ft/s), got"
                        + " \"fast\"",
                "1e999 Pa | PRESSURE | pressure: number out of range in \"1e999 Pa\""
            })
    void refusesWithAMessageNamingExpectedAndFound(String text, QuantityKind kind, String message) {
        InputException e = assertThrows(InputException.class, () -> Quantities.parse(text, kind));
        assertEquals(message, e.getMessage());
    }

    @Test
    void refusesEmptyTextNamingTheField() {
        InputException e = assertThrows(
                InputException.class, () -> Quantities.parse("  ", QuantityKind.DIAMETER, "segments[2].diameter"));
        assertEquals("segments[2].diameter: length expected, got an empty value", e.getMessage());
        assertEquals("segments[2].diameter", e.where());
    }

    @Test
    void refusesBareFWithoutASpace() {
        // "F" alone would be read by the unit library as farad; our check comes first.
        InputException e = assertThrows(InputException.class, () -> Quantities.parse("68F", QuantityKind.TEMPERATURE));
        assertEquals(
                "temperature: unit \"F\" in \"68F\" is ambiguous (farad or Fahrenheit?): write °F or degF",
                e.getMessage());
    }

    @ParameterizedTest(name = "{0} {1} in {2} = {3}")
    @CsvSource({
        "998.2071, DENSITY, SI, 998.2 kg/m³",
        "998.2071, DENSITY, US_CUSTOMARY, 62.32 lb/ft³",
        "0.15, DIAMETER, SI, 150.0 mm",
        "0.1524, DIAMETER, US_CUSTOMARY, 6.000 in",
        "0.012, VOLUMETRIC_FLOW, SI, 12.00 L/s",
        "0.011987137316, VOLUMETRIC_FLOW, US_CUSTOMARY, 190.0 gpm",
        "241316.50526089265, PRESSURE, US_CUSTOMARY, 35.00 psi",
        "250000, PRESSURE, SI, 250.0 kPa",
        "293.15, TEMPERATURE, SI, 20.00 °C",
        "293.15, TEMPERATURE, US_CUSTOMARY, 68.00 °F",
        "0.0010016, DYNAMIC_VISCOSITY, SI, 1.002 mPa·s",
        "0.0010016, DYNAMIC_VISCOSITY, US_CUSTOMARY, 1.002 cP",
        "1.0034e-6, KINEMATIC_VISCOSITY, US_CUSTOMARY, 1.003 cSt",
        "1.0034e-6, KINEMATIC_VISCOSITY, SI, 1.003 mm²/s",
        "4.5e-5, ROUGHNESS, SI, 0.04500 mm",
        "1.5e-6, ROUGHNESS, SI, 0.001500 mm",
        "3.6576, HEAD, US_CUSTOMARY, 12.00 ft",
        "2.4384, VELOCITY, US_CUSTOMARY, 8.000 ft/s",
        "1234567, LENGTH, SI, 1.235e6 m",
        "0.000012345, DIMENSIONLESS, SI, 1.234e-5"
    })
    void formatsWithFourSignificantDigits(double si, QuantityKind kind, UnitSystem system, String expected) {
        assertEquals(expected, Quantities.format(si, kind, system));
    }

    @Test
    void formatThenParseReturnsTheValueToFourDigits() {
        for (QuantityKind kind : QuantityKind.values()) {
            for (UnitSystem system : UnitSystem.values()) {
                double si = kind == QuantityKind.TEMPERATURE ? 300.0 : 0.0123;
                double back = Quantities.parse(Quantities.format(si, kind, system), kind);
                // 4 significant digits of the display value: relative error at most 5e-4 of that value.
                double display = Quantities.fromSi(si, kind, system);
                double slack = kind == QuantityKind.TEMPERATURE ? Math.abs(display) * 5e-4 * 1.0 : si * 5e-4;
                assertEquals(si, back, slack, kind + " " + system);
            }
        }
    }

    /** Our aliases live on our own format instance; the library's shared one stays as it was. */
    @Test
    void aliasesDoNotLeakIntoTheSharedFormat() {
        assertEquals(241316.50526089265, Quantities.parse("35 psi", QuantityKind.PRESSURE), 1e-6);
        assertThrows(
                MeasurementParseException.class,
                () -> SimpleUnitFormat.getInstance().parse("psi"));
    }

    @Test
    void symbolsAndFromSi() {
        assertEquals("gpm", Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, UnitSystem.US_CUSTOMARY));
        assertEquals("kPa", Quantities.unitSymbol(QuantityKind.PRESSURE, UnitSystem.SI));
        assertEquals(1.0, Quantities.fromSi(0.3048, QuantityKind.LENGTH, UnitSystem.US_CUSTOMARY), ROUND_OFF);
        assertEquals(212.0, Quantities.fromSi(373.15, QuantityKind.TEMPERATURE, UnitSystem.US_CUSTOMARY), 1e-10);
        assertEquals(1.0, Quantities.fromSi(1e-3, QuantityKind.DYNAMIC_VISCOSITY, UnitSystem.US_CUSTOMARY), ROUND_OFF);
    }
}
