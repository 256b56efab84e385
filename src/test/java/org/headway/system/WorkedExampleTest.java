package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.headway.fluid.FluidState;
import org.junit.jupiter.api.Test;

/** Textbook worked examples, each within the rounding the source printed. */
class WorkedExampleTest {

    private static final double FT = 0.3048;

    /**
     * F. M. White, Fluid Mechanics (McGraw-Hill), the example of 200 ft of 6-in asphalted cast-iron
     * pipe carrying water at 6 ft/s, ν = 1.1e-5 ft²/s, ε = 0.0004 ft: f ≈ 0.0197, h_f ≈ 4.4 ft. From
     * memory (edition and example number not at hand), so the check allows 3 %, about the rounding
     * of a chart-read answer.
     */
    @Test
    void whiteCastIronPipeExample() {
        double nu = 1.1e-5 * FT * FT;
        FluidState water = RunFixtures.liquid(1000, nu * 1000, 2339);
        double d = 0.5 * FT;
        Segment pipe = RunFixtures.pipe("cast iron", 200 * FT, d, 0.0004 * FT);
        PipeRun run = RunFixtures.run(water, "colebrook", List.of(pipe));
        double flow = 6 * FT * Math.PI * d * d / 4;
        RunResult r = HeadLossCalculator.solve(run, flow);
        assertEquals(0.0197, r.segments().get(0).frictionFactor(), 0.0197 * 0.02);
        assertEquals(4.4, r.totals().frictionHeadLoss() / FT, 4.4 * 0.03);
    }
}
