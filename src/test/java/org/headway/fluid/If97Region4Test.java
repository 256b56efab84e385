package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** IAPWS-IF97 Region 4 against the release's verification values. */
class If97Region4Test {

    /** Source: IAPWS R7-97(2012) Tables 35 and 36; tolerance 0.6 of the last printed digit. */
    @ParameterizedTest(name = "table {0}: T = {1} K, p = {2} MPa")
    @CsvFileSource(resources = "if97-region4-tables35-36.csv", numLinesToSkip = 1)
    void reproducesTables35And36(int table, String temperature, String pressureMpa) {
        if (table == 35) {
            double ps = If97Region4.saturationPressure(Double.parseDouble(temperature)) / 1e6;
            assertEquals(Double.parseDouble(pressureMpa), ps, PrintedDigits.tolerance(pressureMpa));
        } else {
            double ts = If97Region4.saturationTemperature(Double.parseDouble(pressureMpa) * 1e6);
            assertEquals(Double.parseDouble(temperature), ts, PrintedDigits.tolerance(temperature));
        }
    }

    /** The backward equation inverts the forward one; IF97 states their consistency as better than ±0.00002 K (from memory). */
    @Test
    void backwardEquationInvertsForward() {
        for (double t = 273.15; t <= 423.15; t += 5) {
            assertEquals(t, If97Region4.saturationTemperature(If97Region4.saturationPressure(t)), 2e-5);
        }
    }
}
