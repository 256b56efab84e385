package org.headway.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.system.SiteAtmosphere;
import org.junit.jupiter.api.Test;

class EffectiveRoughnessFitTest {

    private static final double D = 0.0254;

    private static EffectiveRoughness fit(List<RigPoint> points) {
        RigDescription rig = RigTestData.rig(D, 2.0, 0.0, RigUncertainty.NONE);
        return RigAnalysis.of(rig).analyse(points).roughness();
    }

    @Test
    void recoversKnownRoughnessWithinItsInterval() {
        // Synthetic data: Colebrook–White (independent fixed-point solve) at ε = 0.05 mm (ε/D ≈ 2e-3),
        // 2 % log-normal scatter in f, 30 points over 1e4 ≤ Re ≤ 1e6.
        double trueRoughness = 0.05e-3;
        EffectiveRoughness r = fit(RigTestData.turbulentPoints(30, 1e4, 1e6, D, 2.0, trueRoughness, 0.02, 42));
        assertEquals(EffectiveRoughness.Status.DETERMINED, r.status(), r.statement());
        assertTrue(r.ci95Low() <= trueRoughness && trueRoughness <= r.ci95High(), r.toString());
        assertTrue(r.ci95Low() <= r.roughness().getAsDouble() && r.roughness().getAsDouble() <= r.ci95High());
        assertEquals(30, r.pointsUsed());
        assertEquals(0.02, r.residualStandardDeviation(), 0.008);
    }

    @Test
    void noiseFreeDataGiveTheRoughnessToManyDigits() {
        double trueRoughness = 0.02e-3;
        EffectiveRoughness r = fit(RigTestData.turbulentPoints(20, 1e4, 1e6, D, 2.0, trueRoughness, 0.0, 1));
        assertEquals(trueRoughness, r.roughness().getAsDouble(), trueRoughness * 1e-6);
    }

    @Test
    void intervalCoversTheTrueRoughnessAboutNinetyFivePercentOfTheTime() {
        // Coverage of a nominal 95 % interval over 200 independent synthetic data sets; binomial
        // standard deviation √(0.95·0.05/200) ≈ 1.5 %, so 88 % to 100 % is more than 4 of them.
        double trueRoughness = 0.05e-3;
        int covered = 0;
        int runs = 200;
        for (int k = 0; k < runs; k++) {
            EffectiveRoughness r =
                    fit(RigTestData.turbulentPoints(20, 1e4, 1e6, D, 2.0, trueRoughness, 0.03, 1000 + k));
            if (r.ci95Low() <= trueRoughness && trueRoughness <= r.ci95High()) {
                covered++;
            }
        }
        assertTrue(covered >= 176, "covered " + covered + " of " + runs);
    }

    @Test
    void smoothPipeDataLeaveTheRoughnessUndetermined() {
        // ε = 0 with Re up to 5e4: hydraulically smooth throughout, ε cannot be told from zero.
        EffectiveRoughness r = fit(RigTestData.turbulentPoints(25, 4e3, 5e4, D, 2.0, 0.0, 0.02, 7));
        assertEquals(EffectiveRoughness.Status.UNDETERMINED, r.status());
        assertEquals(0.0, r.ci95Low(), 0.0);
        assertTrue(r.ci95High() > 0);
        assertTrue(
                r.statement().startsWith("undetermined; the data are consistent with a smooth pipe up to ε/D ≤ "),
                r.statement());
    }

    @Test
    void fewerThanThreeTurbulentPointsIsNotEnough() {
        EffectiveRoughness r = fit(RigTestData.turbulentPoints(2, 1e4, 1e5, D, 2.0, 1e-5, 0.0, 7));
        assertEquals(EffectiveRoughness.Status.NOT_ENOUGH_DATA, r.status());
        assertTrue(r.roughness().isEmpty());
    }

    @Test
    void moreTurbulentPointsThanTheCapAreSampledWithANote() {
        // 150,000 noisy points produced lazily, more than MAX_FIT_POINTS: the fit uses a uniform
        // sample, says so, and its interval still covers the roughness the data were made with.
        double trueRoughness = 0.05e-3;
        int count = RigAnalysis.MAX_FIT_POINTS + 50_000;
        java.util.Random random = new java.util.Random(5);
        java.util.Iterator<RigPoint> points = new java.util.Iterator<>() {
            private int i;

            @Override
            public boolean hasNext() {
                return i < count;
            }

            @Override
            public RigPoint next() {
                double re = 1e4 * Math.pow(100.0, random.nextDouble());
                double velocity = re * 1e-3 / (998.0 * D);
                double f = RigTestData.colebrook(re, trueRoughness / D) * Math.exp(0.05 * random.nextGaussian());
                double dp = RigTestData.pressureDrop(f, D, 2.0, 998.0, velocity);
                return new RigPoint(
                        ++i,
                        velocity * Math.PI * D * D / 4,
                        dp,
                        java.util.OptionalDouble.empty(),
                        RigFluidProperties.constant(998.0, 1e-3, SiteAtmosphere.SEA_LEVEL_PRESSURE),
                        List.of());
            }
        };
        RigReport report = RigAnalysis.of(RigTestData.rig(D, 2.0, 0.0, RigUncertainty.NONE))
                .analyse(points, 0, r -> {});
        EffectiveRoughness r = report.roughness();
        assertEquals(RigAnalysis.MAX_FIT_POINTS, r.pointsUsed());
        assertEquals(count, report.summary().turbulentCount());
        assertTrue(r.ci95Low() <= trueRoughness && trueRoughness <= r.ci95High(), r.toString());
        assertTrue(report.cautions().stream().anyMatch(c -> c.code().equals("roughness-fit-sampled")));
        assertTrue(report.points().isEmpty());
    }
}
