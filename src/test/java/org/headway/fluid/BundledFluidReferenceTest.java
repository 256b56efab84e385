package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Every bundled fluid at one reference state against a source outside the project (see the SOURCE
 * header of {@code bundled-fluids-reference.csv}: IAPWS, TEOS-10, ASHRAE from memory, ISO 3448), and
 * outside its range either refused with the value or flagged with a caution — never silently.
 */
class BundledFluidReferenceTest {

    private static final double ATMOSPHERE = 101_325.0;
    private static final double KELVIN = 273.15;

    @ParameterizedTest(name = "{0} at {1} °C")
    @CsvFileSource(resources = "bundled-fluids-reference.csv", numLinesToSkip = 1)
    void matchesItsReferenceState(
            String id,
            double celsius,
            double density,
            double densityTolerance,
            double viscosity,
            double viscosityTolerance,
            String viscosityKind) {
        FluidState s = Fluids.byId(id).state(celsius + KELVIN, ATMOSPHERE);
        assertTrue(Double.isFinite(s.density()) && s.density() > 0, id);
        assertTrue(Double.isFinite(s.dynamicViscosity()) && s.dynamicViscosity() > 0, id);
        assertEquals(density, s.density(), densityTolerance * density, id + " density");
        double actual = viscosityKind.equals("kinematic") ? s.kinematicViscosity() : s.dynamicViscosity();
        assertEquals(viscosity, actual, viscosityTolerance * viscosity, id + " " + viscosityKind + " viscosity");
    }

    @Test
    void theReferenceFileNamesEveryBundledFluid() throws Exception {
        String text = new String(
                BundledFluidReferenceTest.class
                        .getResourceAsStream("bundled-fluids-reference.csv")
                        .readAllBytes(),
                java.nio.charset.StandardCharsets.UTF_8);
        Set<String> rows = new HashSet<>();
        for (String line : text.split("\n")) {
            if (!line.startsWith("#") && !line.startsWith("fluid,") && !line.isBlank()) {
                rows.add(line.substring(0, line.indexOf(',')));
            }
        }
        assertEquals(Set.copyOf(Fluids.ids()), rows, "one reference row per bundled fluid");
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(
            strings = {
                "water",
                "seawater",
                "ethylene-glycol-20",
                "ethylene-glycol-50",
                "propylene-glycol-20",
                "propylene-glycol-50",
                "hydraulic-oil-vg46"
            })
    void outsideItsRangeIsRefusedOrFlagged(String id) {
        // 150 °C at atmospheric pressure lies beyond every bundled liquid's stated range (water and
        // the glycol solutions boil, the oil's data-sheet viscosities end below it).
        Fluid fluid = Fluids.byId(id);
        try {
            FluidState s = fluid.state(150 + KELVIN, ATMOSPHERE);
            List<String> codes = s.cautions().stream().map(c -> c.code()).toList();
            assertFalse(codes.isEmpty(), id + " at 150 °C gave no caution");
        } catch (InputException e) {
            assertTrue(e.getMessage().contains("423.15") || e.getMessage().contains("150"), e.getMessage());
        }
    }
}
