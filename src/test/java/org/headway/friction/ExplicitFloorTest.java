package org.headway.friction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The floor below which the explicit approximations of Colebrook–White are held
 * ({@link FrictionChecks#EXPLICIT_FLOOR_REYNOLDS}, Re 100): above it each gives its published
 * formula, written out here from the papers (from memory: Swamee and Jain 1976; Haaland 1983,
 * J. Fluids Eng. 105(1) 89–90), below it the value at the floor, with the caution that says so.
 */
class ExplicitFloorTest {

    private static double swameeJain(double re, double rr) {
        double l = Math.log10(rr / 3.7 + 5.74 / Math.pow(re, 0.9));
        return 0.25 / (l * l);
    }

    private static double haaland(double re, double rr) {
        double x = -1.8 * Math.log10(Math.pow(rr / 3.7, 1.11) + 6.9 / re);
        return 1 / (x * x);
    }

    @Test
    void aboveTheFloorThePublishedFormulaBelowItTheFloorValue() {
        for (double rr : new double[] {1e-6, 2e-4, 1e-2}) {
            for (double re : new double[] {100, 150, 1000, 2.5e4}) {
                assertEquals(
                        swameeJain(re, rr), new SwameeJain1976().frictionFactor(re, rr), 1e-15 * swameeJain(re, rr));
                assertEquals(haaland(re, rr), new Haaland1983().frictionFactor(re, rr), 1e-15 * haaland(re, rr));
            }
            for (FrictionCorrelation c :
                    List.of(new SwameeJain1976(), new Haaland1983(), new Serghides1984(), new GoudarSonnad2008())) {
                double atFloor = c.frictionFactor(FrictionChecks.EXPLICIT_FLOOR_REYNOLDS, rr);
                for (double re : new double[] {99.9, 12, 7, 1, 1e-3}) {
                    assertEquals(atFloor, c.frictionFactor(re, rr), 0.0, c.id() + " at Re " + re);
                }
            }
        }
    }

    @Test
    void aValueHeldAtTheFloorSaysSo() {
        for (FrictionCorrelation c :
                List.of(new SwameeJain1976(), new Haaland1983(), new Serghides1984(), new GoudarSonnad2008())) {
            assertTrue(
                    c.evaluate(50, 1e-4).cautions().stream()
                            .anyMatch(k -> k.code().equals("friction-held-below-floor")),
                    c.id());
            assertTrue(
                    c.evaluate(150, 1e-4).cautions().stream()
                            .noneMatch(k -> k.code().equals("friction-held-below-floor")),
                    c.id());
        }
    }
}
