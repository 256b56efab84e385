package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.junit.jupiter.api.Test;

/**
 * The maker's NPSH-required curve: read by straight lines between its points, scaled by the affinity
 * laws, used at the run's own flow. Curves and numbers are invented for the tests.
 */
class PumpNpshCurveTest {

    private static final List<PumpCurve.Point> HEAD =
            List.of(new PumpCurve.Point(0, 40), new PumpCurve.Point(0.01, 36), new PumpCurve.Point(0.02, 25));
    private static final List<PumpCurve.Point> NPSH =
            List.of(new PumpCurve.Point(0.005, 1.5), new PumpCurve.Point(0.01, 2.0), new PumpCurve.Point(0.02, 4.4));

    private static PumpCurve curve() {
        return PumpCurve.fit("p", HEAD, OptionalDouble.empty()).withNpshCurve(NPSH);
    }

    @Test
    void readsStraightLinesBetweenPointsAndHoldsTheEnds() {
        PumpCurve c = curve();
        // Linear interpolation, arithmetic by hand: 2.0 + (0.015 − 0.01)/(0.02 − 0.01) × (4.4 − 2.0) = 3.2.
        assertEquals(3.2, c.npshRequiredAt(0.015).getAsDouble(), 1e-12);
        assertEquals(1.5, c.npshRequiredAt(0.005).getAsDouble(), 0);
        assertEquals(2.0, c.npshRequiredAt(0.01).getAsDouble(), 0);
        assertEquals(1.5, c.npshRequiredAt(0.001).getAsDouble(), 0);
        assertEquals(4.4, c.npshRequiredAt(0.03).getAsDouble(), 0);
        assertTrue(c.npshRequiredOutsideCurve(0.03));
        assertTrue(c.npshRequiredOutsideCurve(0.001));
        assertFalse(c.npshRequiredOutsideCurve(0.015));
    }

    @Test
    void speedRatioScalesByTheAffinityLaws() {
        // Affinity laws: at speed ratio s, flow scales by s and NPSH required by s² (common practice, no source).
        PumpElement slow = new PumpElement("pump", curve(), 0.8);
        assertEquals(0.64 * 3.2, slow.npshRequiredAt(0.8 * 0.015).getAsDouble(), 1e-12);
    }

    @Test
    void refusesTooFewPointsDescendingFlowsAndNegativeValues() {
        PumpCurve base = PumpCurve.fit("p", HEAD, OptionalDouble.empty());
        assertThrows(InputException.class, () -> base.withNpshCurve(List.of(new PumpCurve.Point(0.01, 2))));
        InputException order = assertThrows(
                InputException.class,
                () -> base.withNpshCurve(List.of(new PumpCurve.Point(0.02, 2), new PumpCurve.Point(0.01, 3))));
        assertTrue(order.getMessage().contains("ascending"), order.getMessage());
        InputException negative = assertThrows(
                InputException.class,
                () -> base.withNpshCurve(List.of(new PumpCurve.Point(0.01, -2), new PumpCurve.Point(0.02, 3))));
        assertTrue(negative.getMessage().contains("npshRequired"), negative.getMessage());
    }

    /** A short suction at sea level; the required value comes from the curve at the solved flow. */
    private static PipeRun run(PumpCurve pump) {
        Segment suction = Segment.builder("suction")
                .length(8)
                .bore(0.08, 4.5e-5)
                .elevationChange(2.5)
                .build();
        Segment discharge = Segment.builder("discharge")
                .length(120)
                .bore(0.08, 4.5e-5)
                .elevationChange(15)
                .build();
        return PipeRun.of(
                "t",
                RunFixtures.liquid(998, 1.0e-3, 2339),
                RunFixtures.method("colebrook"),
                List.of(suction, discharge),
                new EndCondition(0, 0),
                new EndCondition(0, 0),
                Optional.of(pump),
                1,
                SiteAtmosphere.SEA_LEVEL_PRESSURE,
                0.01,
                0,
                new DesignLimits(0.3, 3.0, 100, Double.POSITIVE_INFINITY, 0.5));
    }

    @Test
    void runUsesTheCurveAtItsFlowAndCautionsOutsideIt() {
        PumpCurve steep = PumpCurve.fit("p", HEAD, OptionalDouble.empty())
                .withNpshCurve(List.of(new PumpCurve.Point(0.005, 2.0), new PumpCurve.Point(0.02, 9.0)));
        RunResult low = HeadLossCalculator.solve(run(steep), 0.006);
        RunResult high = HeadLossCalculator.solve(run(steep), 0.019);
        double npshaHigh = high.npshAvailable().getAsDouble();
        // The suction lift is 2.5 m, so NPSH available is about 10.3 − 2.5 − losses ≈ 7.5 m: enough for the
        // 2.47 m the curve asks at 6 L/s, not for the 8.53 m it asks at 19 L/s (plus the 0.5 m margin).
        assertTrue(npshaHigh > 6 && npshaHigh < 8.5, "NPSHa " + npshaHigh);
        assertFalse(low.cautions().stream().anyMatch(c -> c.code().equals("cavitation-risk")));
        assertTrue(high.cautions().stream().anyMatch(c -> c.code().equals("cavitation-risk")));
        RunResult beyond = HeadLossCalculator.solve(run(steep), 0.022);
        assertTrue(beyond.cautions().stream().anyMatch(c -> c.code().equals("npsh-required-extrapolated")));
        assertFalse(low.cautions().stream().anyMatch(c -> c.code().equals("npsh-required-extrapolated")));
    }

    private static final String PROJECT = """
            {"format": "headway-project", "version": 2, "fluid": {"name": "water", "temperature": "15 degC"},
             "flow": "8 L/s",
             "elements": [
               {"id": "s", "length": "5 m", "innerDiameter": "80 mm", "roughness": "0.045 mm"},
               {"id": "pump", "kind": "pump", "points": [
                  {"flow": "0 L/s", "head": "40 m"},
                  {"flow": "5 L/s", "head": "38 m", "npshRequired": "1.8 m"},
                  {"flow": "10 L/s", "head": "33 m", "npshRequired": "2.6 m"},
                  {"flow": "15 L/s", "head": "24 m", "npshRequired": "4.1 m"}]},
               {"id": "d", "length": "50 m", "innerDiameter": "80 mm", "roughness": "0.045 mm"}]}
            """;

    @Test
    void projectCarriesTheCurveOnItsPointsAndSavesIt() {
        Project p = ProjectFile.parse(PROJECT);
        PipeRun run =
                ProjectResolver.resolve(p, Catalog.bundled(), Path.of(".")).run();
        // 1.8 + (8 − 5)/(10 − 5) × (2.6 − 1.8) = 2.28 m, by hand.
        assertEquals(2.28, run.pumpElement().orElseThrow().npshRequiredAt(0.008).getAsDouble(), 1e-12);
        Project again = ProjectFile.parse(ProjectFile.toJson(p));
        assertEquals(p, again);
        InputException both = assertThrows(
                InputException.class,
                () -> ProjectResolver.resolve(
                        ProjectFile.parse(PROJECT.replace(
                                "\"kind\": \"pump\",", "\"kind\": \"pump\", \"npshRequired\": \"3 m\",")),
                        Catalog.bundled(),
                        Path.of(".")));
        assertTrue(both.getMessage().contains("not both"), both.getMessage());
    }
}
