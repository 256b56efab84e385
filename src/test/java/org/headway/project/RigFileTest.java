package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.fluid.FluidState;
import org.headway.fluid.Fluids;
import org.headway.rig.EffectiveRoughness;
import org.headway.rig.InstrumentUncertainty;
import org.headway.rig.RigFluid;
import org.headway.rig.RigPoint;
import org.headway.rig.RigPointResult;
import org.headway.rig.RigReport;
import org.headway.rig.UncertaintySource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RigFileTest {

    @TempDir
    Path dir;

    private static final String RIG = """
            { "format": "headway-rig", "version": 1, "data": "points.csv",
              "innerDiameter": "25.4 mm", "tapSpacing": "2 m", "roughness": "0.0015 mm",
              "fluid": %s,
              "uncertainty": { "flow": "1 %%", "pressureDrop": "0.25 kPa", "innerDiameter": "0.05 mm",
                               "tapSpacing": "2 mm", "temperature": "0.2 K" },
              "compareWith": "colebrook" }
            """;

    private Path write(String fluid, String csv) throws IOException {
        Files.writeString(dir.resolve("points.csv"), csv);
        Path rig = dir.resolve("rig.json");
        Files.writeString(rig, RIG.formatted(fluid));
        return rig;
    }

    @Test
    void bundledDemoRigRunsFromTheClassPathAndFindsTheGeneratedRoughness() {
        // The demo data are INVENTED: generated (RigDataGenerator) from Colebrook–White at ε = 0.15 mm.
        RigFile rig = RigFile.loadResource("/fluids-data/examples/demo-rig.json");
        RigReport report = rig.analyse(100, r -> {});
        assertEquals(25, report.summary().pointCount());
        EffectiveRoughness e = report.roughness();
        assertEquals(EffectiveRoughness.Status.DETERMINED, e.status(), e.statement());
        assertTrue(e.ci95Low() <= 0.15e-3 && 0.15e-3 <= e.ci95High(), e.toString());
        assertEquals("fluids-data/examples/demo-rig-points.csv", rig.dataName());
        assertEquals(List.of("run"), report.description().carriedColumns());
        assertEquals("R01", report.points().get(0).carried().get(0));
    }

    @Test
    void unitsInTheHeaderAreConvertedToSi() throws IOException {
        // 1 US gal = 3.785411784 L and 1 psi = 6894.757293168 Pa exactly (NIST SP 811, App. B);
        // t/°F = 1.8 t/°C + 32.
        Path rig = write(
                "{ \"name\": \"water\" }", "flow [gpm],dp [psi],T [degF],tag\n15.850323141489,1.4503773773,68,a\n");
        List<RigPoint> points = new ArrayList<>();
        try (RigDataReader reader = RigFile.load(rig).openData()) {
            reader.forEachRemaining(points::add);
        }
        RigPoint p = points.get(0);
        assertEquals(1.0e-3, p.flow(), 1e-12);
        assertEquals(10_000.0, p.pressureDrop(), 1e-6);
        assertEquals(293.15, p.temperature().getAsDouble(), 1e-9);
        assertEquals(List.of("a"), p.carried());
        assertEquals(2, p.line());
        // Properties are water by IAPWS at the point's temperature.
        FluidState water = Fluids.byId("water").state(293.15, RigFile.DEFAULT_PRESSURE);
        assertEquals(water.density(), p.fluid().density(), 1e-9);
        assertEquals(water.dynamicViscosity(), p.fluid().dynamicViscosity(), 1e-15);
        // Water near 20 °C gets lighter and thinner as it warms (IAPWS; sign only).
        assertTrue(p.fluid().densityTemperatureSlope() < 0 && p.fluid().viscosityTemperatureSlope() < 0);
    }

    @Test
    void uncertaintyTextForms() {
        assertEquals(
                new InstrumentUncertainty(2.0, 0.005),
                RigFile.instrumentUncertainty("0.5 % + 2 Pa", UncertaintySource.PRESSURE_DROP, "u"));
        assertEquals(
                InstrumentUncertainty.absolute(250.0),
                RigFile.instrumentUncertainty("0.25 kPa", UncertaintySource.PRESSURE_DROP, "u"));
        assertEquals(
                0.2,
                RigFile.instrumentUncertainty("0.2 degC", UncertaintySource.TEMPERATURE, "u")
                        .absolute(),
                1e-12);
        assertEquals(
                0.2,
                RigFile.instrumentUncertainty("0.36 degF", UncertaintySource.TEMPERATURE, "u")
                        .absolute(),
                1e-12);
        InputException e = assertThrows(
                InputException.class,
                () -> RigFile.instrumentUncertainty("1 % + 2 %", UncertaintySource.FLOW, "$.uncertainty.flow"));
        assertEquals("$.uncertainty.flow: two % values in \"1 % + 2 %\"", e.getMessage());
    }

    @Test
    void unknownKeyNamesItsJsonPath() throws IOException {
        Path rig = write("{ \"name\": \"water\", \"colour\": \"blue\" }", "flow [L/s],dp [kPa],T [degC]\n1,1,20\n");
        InputException e = assertThrows(InputException.class, () -> RigFile.load(rig));
        assertTrue(
                e.getMessage()
                        .startsWith(rig + ": $.fluid.colour: unknown key; allowed keys are [density, name, pressure,"),
                e.getMessage());
    }

    @Test
    void badCellNamesFileLineColumnAndValue() throws IOException {
        Path rig = write(
                "{ \"name\": \"water\", \"temperature\": \"20 degC\" }",
                "# comment line\nflow [L/s],dp [kPa]\n1.0,2.0\n1.1,abc\n");
        RigFile file = RigFile.load(rig);
        InputException e = assertThrows(InputException.class, () -> file.analyse(0, r -> {}));
        assertEquals(dir.resolve("points.csv") + " line 4, column dp: 'abc' is not a finite number", e.getMessage());
    }

    @Test
    void headerWithoutUnitIsRefused() throws IOException {
        Path rig = write("{ \"name\": \"water\", \"temperature\": \"20 degC\" }", "flow,dp [kPa]\n1,2\n");
        InputException e =
                assertThrows(InputException.class, () -> RigFile.load(rig).openData());
        assertEquals(
                dir.resolve("points.csv") + " line 1, column flow: the header must give the unit in brackets, e.g."
                        + " 'flow [L/s]'",
                e.getMessage());
    }

    @Test
    void temperatureInBothPlacesIsRefused() throws IOException {
        Path rig = write(
                "{ \"name\": \"water\", \"temperature\": \"20 degC\" }", "flow [L/s],dp [kPa],T [degC]\n1,2,20\n");
        InputException e =
                assertThrows(InputException.class, () -> RigFile.load(rig).openData());
        assertTrue(e.getMessage().contains("give one or the other"), e.getMessage());
    }

    @Test
    void constantPropertiesNeedNoTemperature() throws IOException {
        Path rig = write(
                "{ \"name\": \"test oil\", \"density\": \"870 kg/m3\", \"viscosity\": \"40 mPa*s\" }",
                "flow [L/s],dp [kPa]\n0.5,3.0\n");
        RigReport report = RigFile.load(rig).analyse(10, r -> {});
        RigPointResult p = report.points().get(0);
        assertEquals(870.0, p.density(), 1e-12);
        assertEquals(0.040, p.dynamicViscosity(), 1e-15);
        assertTrue(p.temperature().isEmpty());
    }

    @Test
    void aHugeLineIsRefusedWithoutFillingTheHeap() {
        // A 1 GiB line with no line break, produced lazily; buffering it would need 2 GiB of chars
        // (more than the test JVM's heap), so only the length cap lets this test pass.
        Reader huge = new Reader() {
            private final Reader header = new StringReader("flow [L/s],dp [kPa]\n");
            private long left = 1L << 30;

            @Override
            public int read(char[] buffer, int offset, int length) throws IOException {
                int n = header.read(buffer, offset, length);
                if (n > 0) {
                    return n;
                }
                if (left == 0) {
                    return -1;
                }
                int k = (int) Math.min(length, left);
                java.util.Arrays.fill(buffer, offset, offset + k, '7');
                left -= k;
                return k;
            }

            @Override
            public void close() {}
        };
        RigFluid fluid = new RigFluid(null, null, RigFile.DEFAULT_PRESSURE, 998.0, 1e-3);
        RigFile.Columns columns = new RigFile.Columns("flow", "dp", "T");
        InputException e = assertThrows(InputException.class, () -> {
            try (RigDataReader reader = new RigDataReader(huge, "huge.csv", columns, fluid)) {
                reader.forEachRemaining(p -> {});
            }
        });
        assertEquals(
                "huge.csv line 2: a line is longer than 1048576 characters; this is not a rig data file (or a line"
                        + " break is missing)",
                e.getMessage());
    }

    @Test
    void fluidCautionsReachTheReportWithTheirFirstLine() throws IOException {
        // Water within 1 K of freezing carries the fluid model's near-freezing caution (Water).
        Path rig = write("{ \"name\": \"water\" }", "flow [L/s],dp [kPa],T [degC]\n0.5,3.0,0.5\n0.6,4.0,0.02\n");
        RigReport report = RigFile.load(rig).analyse(10, r -> {});
        List<String> messages = report.cautions().stream()
                .filter(c -> c.code().equals("near-freezing"))
                .map(org.headway.caution.Caution::message)
                .toList();
        assertEquals(1, messages.size(), report.cautions().toString());
        // 0.02 °C is within the 0.05 K slope step of freezing: a one-sided difference lets the point through
        // (colder water is more viscous, IAPWS; sign only).
        assertTrue(report.points().get(1).dynamicViscosity()
                > report.points().get(0).dynamicViscosity());
        assertTrue(
                messages.get(0).startsWith("first at " + dir.resolve("points.csv") + " line 2, column T: water at "),
                messages.get(0));
    }

    @Test
    void aFluidModelWithoutTemperatureIsRefused() throws IOException {
        Path rig = write("{ \"name\": \"water\" }", "flow [L/s],dp [kPa]\n0.5,3.0\n");
        InputException e =
                assertThrows(InputException.class, () -> RigFile.load(rig).openData());
        assertEquals(
                dir.resolve("points.csv") + " line 1: the fluid water needs a temperature: add a column 'T [degC]' or"
                        + " give fluid.temperature in the rig file",
                e.getMessage());
    }
}
