package org.headway.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The built-in glycol tables: interpolation, margins, and physical sense against IAPWS water. */
class GlycolTablesTest {

    static Stream<String> glycolIds() {
        List<String> ids = new ArrayList<>();
        for (String g : List.of("ethylene-glycol", "propylene-glycol")) {
            for (int c : Fluids.GLYCOL_CONCENTRATIONS) {
                ids.add(g + "-" + c);
            }
        }
        return ids.stream();
    }

    /** The raw rows of a table file as packaged: temperature (°C), density (kg/m³), viscosity (mPa·s). */
    private static List<double[]> rawRows(String id) throws IOException {
        try (InputStream in = GlycolTablesTest.class.getResourceAsStream("/fluids-data/fluids/" + id + ".csv")) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            List<double[]> rows = new ArrayList<>();
            for (String line : text.split("\\R")) {
                if (line.isBlank() || line.startsWith("#") || line.startsWith("temperature")) {
                    continue;
                }
                String[] cells = line.split(",");
                rows.add(new double[] {
                    Double.parseDouble(cells[0].strip()),
                    Double.parseDouble(cells[1].strip()),
                    Double.parseDouble(cells[2].strip())
                });
            }
            return rows;
        }
    }

    @ParameterizedTest
    @MethodSource("glycolIds")
    void reproducesRowsAndInterpolatesBetweenThem(String id) throws IOException {
        Fluid fluid = Fluids.byId(id);
        List<double[]> rows = rawRows(id);
        for (int i = 0; i < rows.size(); i++) {
            double[] row = rows.get(i);
            FluidState s = fluid.state(row[0] + 273.15, 101_325);
            assertEquals(row[1], s.density(), 1e-9 * row[1], id + " density at " + row[0]);
            assertEquals(row[2] * 1e-3, s.dynamicViscosity(), 1e-9 * row[2] * 1e-3, id + " viscosity at " + row[0]);
            if (i + 1 < rows.size()) {
                double[] next = rows.get(i + 1);
                FluidState mid = fluid.state((row[0] + next[0]) / 2 + 273.15, 101_325);
                // Density linear in T: the mean; viscosity with ln μ linear in T: the geometric mean.
                assertEquals((row[1] + next[1]) / 2, mid.density(), 1e-9 * row[1]);
                assertEquals(Math.sqrt(row[2] * next[2]) * 1e-3, mid.dynamicViscosity(), 1e-9 * row[2] * 1e-3);
            }
        }
    }

    /** Glycol solutions are denser and more viscous than water (IAPWS water as the comparison). */
    @ParameterizedTest
    @MethodSource("glycolIds")
    void isDenserAndMoreViscousThanWater(String id) throws IOException {
        Fluid fluid = Fluids.byId(id);
        Water water = new Water();
        for (double[] row : rawRows(id)) {
            if (row[0] < 0.5) {
                continue; // water is frozen there
            }
            FluidState g = fluid.state(row[0] + 273.15, 200_000);
            FluidState w = water.state(row[0] + 273.15, 200_000);
            assertTrue(g.density() > w.density(), id + " at " + row[0]);
            assertTrue(g.dynamicViscosity() > w.dynamicViscosity(), id + " at " + row[0]);
        }
    }

    @ParameterizedTest
    @MethodSource("glycolIds")
    void carriesTheFromMemoryCaution(String id) {
        FluidState s = Fluids.byId(id).state(293.15, 101_325);
        assertEquals(
                List.of("values-from-memory"),
                s.cautions().stream().map(Caution::code).toList());
        assertTrue(s.densitySource().startsWith("from memory"), s.densitySource());
    }

    @Test
    void extendsTheEndSegmentWithinTheMarginWithACaution() {
        TabulatedFluid fluid = (TabulatedFluid) Fluids.byId("ethylene-glycol-30");
        FluidState s = fluid.state(fluid.maxTemperature() + 1.0, 101_325);
        assertTrue(s.cautions().stream().anyMatch(c -> c.code().equals("outside-table")));
        FluidState last = fluid.state(fluid.maxTemperature(), 101_325);
        assertTrue(s.density() < last.density());
    }

    @Test
    void refusesBeyondTheMargin() {
        InputException e = assertThrows(
                InputException.class, () -> Fluids.byId("ethylene-glycol-30").state(233.15, 101_325));
        assertEquals(
                "temperature: Ethylene glycol, 30 % by mass in water is tabulated from 263.15 K (-10 °C) to 373.15 K"
                        + " (100 °C); got 233.15 K (-40 °C)",
                e.getMessage());
    }
}
