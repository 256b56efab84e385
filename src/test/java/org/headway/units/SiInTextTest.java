package org.headway.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Messages the core writes in SI, shown in the chosen system. Factors: 1 ft = 0.3048 m, 1 in = 25.4
 * mm, 1 US gal = 3.785411784 L, 1 psi = 6894.757 Pa, °F = °C × 9/5 + 32 (NIST SP 811 (2008)
 * Appendix B, from memory); the expected texts are those factors applied by hand, to the 4
 * significant digits every display number carries.
 */
class SiInTextTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            value = {
                // 0.00694504 m³/s = 6.94504 L/s = 0.00694504/3.785411784e-3 × 60 gpm = 110.08 gpm
                "0.00694504 m³/s balances 35.34 m of surplus head | 110.1 gpm balances 115.9 ft of surplus head",
                // 0.005 m³/s = 79.25 gpm; 0.382 m/s = 1.253 ft/s
                "beyond the maker's last point 0.005 m³/s at 0.382 m/s | beyond the maker's last point 79.25 gpm at 1.253 ft/s",
                // 268 kPa = 268000/6894.757 psi = 38.87 psi; 52.5 mm = 2.067 in
                "ends supply 27.3 m (268 kPa) in 52.5 mm pipe | ends supply 89.57 ft (38.87 psi) in 2.067 in pipe",
                // a gradient m per 100 m is a ratio: same number, feet per 100 ft
                "friction loss 3.2 m per 100 m above 4 m per 100 m | friction loss 3.2 ft per 100 ft above 4 ft per 100 ft",
                // 20 °C = 68 °F; 12 L/s = 190.2 gpm; a symbol inside a word stays
                "water at 20 °C, 12 L/s, 2.1 mPa·s, Re 4000 | water at 68.00 °F, 190.2 gpm, 2.1 mPa·s, Re 4000"
            })
    void siQuantitiesInTextAreShownInUsCustomary(String si, String us) {
        assertEquals(us, Quantities.inSystem(si, UnitSystem.US_CUSTOMARY));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            value = {
                // flows in m³/s are shown as SI display flows (L/s), 4 significant digits
                "0.00694504 m³/s balances 35.34 m of surplus head | 6.945 L/s balances 35.34 m of surplus head",
                "velocity 0.382 m/s is below 0.600 m/s | velocity 0.382 m/s is below 0.600 m/s"
            })
    void siTextKeepsItsUnitsButShowsFlowsInTheDisplayUnit(String si, String shown) {
        assertEquals(shown, Quantities.inSystem(si, UnitSystem.SI));
    }
}
