package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

/** IAPWS-IF97 Region 1 against the release's own verification values. */
class If97Region1Test {

    /** Source: IAPWS R7-97(2012) Table 5, via if97-region1-table5.csv; tolerance 0.6 of the last printed digit. */
    @ParameterizedTest(name = "{2} at {0} K, {1} MPa = {3}")
    @CsvFileSource(resources = "if97-region1-table5.csv", numLinesToSkip = 1)
    void reproducesTable5(double temperature, double pressureMpa, String property, String printed) {
        If97Region1.Properties p = If97Region1.properties(temperature, pressureMpa * 1e6);
        double computed = switch (property) {
            case "v" -> p.specificVolume();
            case "h" -> p.specificEnthalpy() / 1e3;
            case "u" -> p.specificInternalEnergy() / 1e3;
            case "s" -> p.specificEntropy() / 1e3;
            case "cp" -> p.isobaricHeatCapacity() / 1e3;
            case "w" -> p.speedOfSound();
            default -> throw new IllegalArgumentException(property);
        };
        assertEquals(Double.parseDouble(printed), computed, PrintedDigits.tolerance(printed));
    }

    /** The fast density path sums only γ_π; source: IAPWS R7-97(2012) Table 5, v rows. */
    @ParameterizedTest(name = "v at {0} K, {1} MPa = {2}")
    @CsvSource({"300, 3, 0.100215168e-2", "300, 80, 0.971180894e-3", "500, 3, 0.120241800e-2"})
    void fastDensityMatchesTable5Volume(double temperature, double pressureMpa, String printed) {
        double density = If97Region1.density(temperature, pressureMpa * 1e6);
        assertEquals(Double.parseDouble(printed), 1 / density, PrintedDigits.tolerance(printed));
    }

    /** The written-out density path and the Table 2 loop are the same equation: agreement to round-off. */
    @Test
    void fastDensityEqualsTheTable2Loop() {
        for (double t = 273.15; t <= 623.15; t += 10) {
            for (double p = If97Region4.saturationPressure(t) * 1.0001; p <= 100e6; p = p * 3 + 1e5) {
                double loop = 1 / If97Region1.properties(t, p).specificVolume();
                assertEquals(loop, If97Region1.density(t, p), loop * 1e-13, t + " K, " + p + " Pa");
            }
        }
    }
}
