package org.headway.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.LongStream;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.FlowRegime;
import org.headway.friction.FrictionMethods;
import org.headway.system.SiteAtmosphere;
import org.junit.jupiter.api.Test;

class RigAnalysisTest {

    /** Round-trip tolerance: the analysis and the test build Δp and f in a few double operations. */
    private static final double ROUND_TRIP = 1e-12;

    @Test
    void frictionFactorFromMeasuredDropInvertsDarcyWeisbach() {
        // Δp built from Darcy–Weisbach with Colebrook's f (independent fixed-point solve) must give
        // back that f, the velocity 4Q/(πD²) and Re = ρVD/μ (definitions; common practice, no source).
        double d = 0.0254;
        double length = 2.0;
        double rho = 998.2;
        double mu = 1.0016e-3;
        double q = 1.0e-3;
        double v = 4 * q / (Math.PI * d * d);
        double re = rho * v * d / mu;
        double fTrue = RigTestData.colebrook(re, 1.5e-6 / d);
        double dp = RigTestData.pressureDrop(fTrue, d, length, rho, v);
        RigDescription rig = RigTestData.rig(d, length, 1.5e-6, RigUncertainty.NONE);
        RigPointResult r = RigAnalysis.of(rig)
                .analysePoint(new RigPoint(
                        7,
                        q,
                        dp,
                        OptionalDouble.of(293.15),
                        RigFluidProperties.constant(rho, mu, SiteAtmosphere.SEA_LEVEL_PRESSURE),
                        List.of("a")));
        assertEquals(v, r.velocity(), v * ROUND_TRIP);
        assertEquals(re, r.reynolds(), re * ROUND_TRIP);
        assertEquals(fTrue, r.frictionFactor(), fTrue * ROUND_TRIP);
        assertEquals(0.0, r.deviation().getAsDouble(), 1e-12);
        assertEquals(FlowRegime.TURBULENT, r.regime());
        assertTrue(r.insideValidity());
        assertEquals(List.of("a"), r.carried());
        assertEquals(1.5e-6 / d, r.relativeRoughness(), 1e-18);
    }

    @Test
    void laminarPointAgainstHagenPoiseuilleHasNoDeviation() {
        // Hagen–Poiseuille: f = 64/Re in laminar flow (textbook result; common practice, no source).
        double d = 0.01;
        double rho = 1000;
        double mu = 0.05;
        double q = 1e-5;
        double v = 4 * q / (Math.PI * d * d);
        double re = rho * v * d / mu;
        double dp = RigTestData.pressureDrop(64 / re, d, 1.0, rho, v);
        RigDescription rig = new RigDescription(
                "lam", d, 1.0, 0, FrictionMethods.byId("auto"), "const", RigUncertainty.NONE, List.of());
        RigReport report = RigAnalysis.of(rig)
                .analyse(List.of(new RigPoint(
                        2,
                        q,
                        dp,
                        OptionalDouble.empty(),
                        RigFluidProperties.constant(rho, mu, SiteAtmosphere.SEA_LEVEL_PRESSURE),
                        List.of())));
        assertEquals(1, report.summary().laminarCount());
        assertEquals(0.0, report.summary().maxDeviation().getAsDouble(), 1e-12);
        assertEquals(
                EffectiveRoughness.Status.NOT_ENOUGH_DATA, report.roughness().status());
    }

    @Test
    void summaryStatisticsMatchTheKeptPoints() {
        List<RigPoint> points = RigTestData.turbulentPoints(40, 5e3, 3e5, 0.0254, 2.0, 1.5e-6, 0.03, 11);
        RigDescription rig = RigTestData.rig(0.0254, 2.0, 1.5e-6, RigUncertainty.NONE);
        RigReport report = RigAnalysis.of(rig).analyse(points);
        double sum = 0;
        double squares = 0;
        double max = 0;
        for (RigPointResult r : report.points()) {
            double dev = r.deviation().getAsDouble();
            sum += dev;
            squares += dev * dev;
            max = Math.abs(dev) > Math.abs(max) ? dev : max;
        }
        RigSummary s = report.summary();
        assertEquals(40, s.pointCount());
        assertEquals(40, s.turbulentCount());
        assertEquals(40, s.comparedCount());
        assertEquals(sum / 40, s.meanDeviation().getAsDouble(), 1e-15);
        assertEquals(Math.sqrt(squares / 40), s.rmsDeviation().getAsDouble(), 1e-15);
        assertEquals(max, s.maxDeviation().getAsDouble(), 0.0);
        assertTrue(report.allPointsKept());
        assertTrue(report.cautions().stream().anyMatch(c -> c.code().equals("uncertainty-not-stated")));
    }

    @Test
    void streamingKeepsOnlyTheCapButSinksEveryPoint() {
        List<RigPoint> points = RigTestData.turbulentPoints(500, 1e3, 1e5, 0.0254, 2.0, 1.5e-6, 0.02, 3);
        RigDescription rig = RigTestData.rig(0.0254, 2.0, 1.5e-6, RigUncertainty.NONE);
        List<Long> sunk = new ArrayList<>();
        Iterator<RigPoint> it = points.iterator();
        RigReport report = RigAnalysis.of(rig).analyse(it, 10, r -> sunk.add(r.line()));
        assertEquals(10, report.points().size());
        assertFalse(report.allPointsKept());
        assertEquals(LongStream.range(2, 502).boxed().toList(), sunk);
        RigSummary s = report.summary();
        assertEquals(500, s.pointCount());
        assertEquals(s.pointCount(), s.laminarCount() + s.transitionalCount() + s.turbulentCount());
        assertTrue(s.laminarCount() > 0 && s.transitionalCount() > 0 && s.turbulentCount() > 0);
        // Laminar points lie outside Colebrook's stated range (Re ≥ 4000); transitional ones are never compared.
        assertEquals(s.laminarCount(), s.outsideValidityCount());
        assertEquals(s.turbulentCount(), s.comparedCount());
        List<String> codes = report.cautions().stream().map(Caution::code).toList();
        assertTrue(codes.contains("transitional-flow"), codes::toString);
        assertTrue(codes.contains("outside-validity-range"), codes::toString);
    }

    @Test
    void noPointsIsAnInputError() {
        RigDescription rig = RigTestData.rig(0.0254, 2.0, 0, RigUncertainty.NONE);
        InputException e =
                assertThrows(InputException.class, () -> RigAnalysis.of(rig).analyse(List.of()));
        assertEquals("data: there are no data points", e.getMessage());
    }

    @Test
    void negativePressureDropIsRefusedNamingTheLine() {
        InputException e = assertThrows(
                InputException.class,
                () -> new RigPoint(
                        12,
                        1e-3,
                        -5,
                        OptionalDouble.empty(),
                        RigFluidProperties.constant(998, 1e-3, SiteAtmosphere.SEA_LEVEL_PRESSURE),
                        List.of()));
        assertEquals("point at line 12, pressure drop: must be finite and greater than zero, got -5.0", e.getMessage());
    }

    @Test
    void roughnessAtLeastTheBoreIsRefused() {
        InputException e =
                assertThrows(InputException.class, () -> RigTestData.rig(0.01, 1, 0.02, RigUncertainty.NONE));
        assertTrue(e.getMessage().startsWith("roughness: must be smaller than the inner diameter"), e.getMessage());
    }
}
