package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The registry, and the contract every fluid keeps (one parameterized contract test over all of them). */
class FluidsTest {

    static Stream<Fluid> everyFluid() {
        return Stream.concat(Fluids.all().stream(), Stream.of(new Seawater(80), Fluids.constant("slurry", 1200, 5e-3)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("everyFluid")
    void keepsTheFluidContract(Fluid fluid) {
        double previousViscosity = Double.POSITIVE_INFINITY;
        for (double t = 283.15; t <= 353.15; t += 10) {
            FluidState s = fluid.state(t, 300_000);
            assertTrue(Double.isFinite(s.density()) && s.density() > 500 && s.density() < 2000, fluid.id());
            assertTrue(Double.isFinite(s.dynamicViscosity()) && s.dynamicViscosity() > 0, fluid.id());
            assertEquals(s.dynamicViscosity() / s.density(), s.kinematicViscosity(), 1e-15, fluid.id());
            assertFalse(s.densitySource().isBlank(), fluid.id());
            assertFalse(s.viscositySource().isBlank(), fluid.id());
            assertEquals(
                    s.vapourPressure().isPresent(), !s.vapourPressureSource().isBlank(), fluid.id());
            assertEquals(fluid.id(), s.fluid());
            if (!(fluid instanceof ConstantFluid)) {
                assertTrue(s.dynamicViscosity() < previousViscosity, fluid.id() + ": viscosity falls as T rises");
            }
            previousViscosity = s.dynamicViscosity();
        }
    }

    @Test
    void findsEveryListedId() {
        for (String id : Fluids.ids()) {
            assertEquals(id, Fluids.byId(id).id());
        }
        assertEquals(11, Fluids.all().size());
    }

    @Test
    void readsSalinityFromTheId() {
        Seawater sea = assertInstanceOf(Seawater.class, Fluids.byId("seawater:40"));
        assertEquals(40, sea.salinity());
        assertEquals(
                35, assertInstanceOf(Seawater.class, Fluids.byId("Seawater")).salinity());
    }

    @Test
    void refusesUnknownIdsListingTheKnownOnes() {
        InputException e = assertThrows(InputException.class, () -> Fluids.byId("brandy"));
        assertEquals(
                "fluid: unknown fluid \"brandy\"; known: water, seawater, ethylene-glycol-20, ethylene-glycol-30,"
                        + " ethylene-glycol-40, ethylene-glycol-50, propylene-glycol-20, propylene-glycol-30,"
                        + " propylene-glycol-40, propylene-glycol-50, hydraulic-oil-vg46 (seawater:S sets the salinity S"
                        + " in g/kg)",
                e.getMessage());
        assertEquals(
                "fluid: seawater salinity must be a number in g/kg (e.g. seawater:40), got \"seawater:lots\"",
                assertThrows(InputException.class, () -> Fluids.byId("seawater:lots"))
                        .getMessage());
        assertEquals(
                "fluid seawater:-3, salinity: must be from 0 to below 1000 g/kg, got -3 g/kg",
                assertThrows(InputException.class, () -> Fluids.byId("seawater:-3"))
                        .getMessage());
    }

    @Test
    void constantFluidKeepsItsValues() {
        Fluid f = Fluids.constant("slurry", 1200, 5e-3);
        FluidState s = f.state(400, 1e5);
        assertEquals(1200, s.density());
        assertEquals(5e-3, s.dynamicViscosity());
        assertEquals(
                List.of("constant-properties"),
                s.cautions().stream().map(c -> c.code()).toList());
        assertEquals(
                "density: must be greater than zero, got -1.0",
                assertThrows(InputException.class, () -> Fluids.constant("x", -1, 1e-3))
                        .getMessage());
    }
}
