package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Darby (2001) 3-K, K = K₁/Re + Kᵢ (1 + K_d/Dn[in]^0.3), for the bundled standard flanged 90° elbow
 * (K₁ = 800, Kᵢ = 0.091, K_d = 4.0: Darby 3-K table, from memory — a reviewer should check the
 * row). Unbound to a nominal size, the inner diameter stands in for Dn.
 */
class Darby2001ThreeKContractTest extends FittingLossContract {

    @Override
    Fitting fitting() {
        return Catalog.bundled().fitting("darby-elbow-90-standard-flanged");
    }

    @Override
    double turbulentLimit(double inches) {
        // 0.091 (1 + 4/D^0.3), worked by hand to 6 figures
        return switch (String.valueOf(inches)) {
            case "0.5" -> 0.539137;
            case "1.0" -> 0.455000;
            case "2.067" -> 0.383752;
            case "4.026" -> 0.330684;
            case "12.0" -> 0.263722;
            default -> throw new IllegalArgumentException(String.valueOf(inches));
        };
    }

    @Override
    double laminarCoefficient() {
        return 800;
    }

    @ParameterizedTest(name = "NPS {1}, bore {2} in, Re {0}: K {3}")
    @CsvSource({
        // Re, nominal size (in), bore (in), K worked by hand with Dn = the nominal size
        "1e5, 2, 2.067, 0.394660",
        "1e4, 1, 1.049, 0.535000",
        "1e6, 6, 6.065, 0.304445"
    })
    void handWorkedPointsOnTheNominalSize(double reynolds, double nominal, double bore, double expected) {
        Fitting bound = ((Darby2001ThreeK) fitting()).atNominalSize(OptionalDouble.of(nominal * INCH));
        assertEquals(expected, bound.lossCoefficient(reynolds, bore * INCH), SIX_FIGURES * expected);
    }
}
