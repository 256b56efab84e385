package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Size mode changes pipe bores only: a valve by Kv and a rated component keep their own losses at
 * the design flow whatever size is tried, and results stay keyed by element id. Invented run.
 */
class SizingKeepsComponentLawsTest {

    private static PipeRun run() {
        List<Element> elements = new ArrayList<>();
        elements.add(Segment.builder("supply")
                .id("supply")
                .length(40)
                .bore(0.05, 4.5e-5)
                .build());
        elements.add(FlowCoefficientValve.ofKv("cv-1", "control valve", 25));
        elements.add(new RatedComponent("coil", "coil", 40_000, 0.006, 2));
        elements.add(Segment.builder("return")
                .id("return")
                .length(40)
                .bore(0.05, 4.5e-5)
                .build());
        PipeRun base =
                RunFixtures.run(RunFixtures.liquid(998, 1.0e-3, 2339), "colebrook", List.of((Segment) elements.get(0)));
        return base.withElements(elements).withDesignFlow(0.006);
    }

    @Test
    void componentLossesDoNotFollowThePipeSize() {
        PipeRun run = run();
        FlowContext ctx = run.context();
        double q = 0.006;
        // IEC 60534-2-1 Kv definition: Δp = (ρ/ρ₀)(Q/Kv)² × 1 bar, so h = (Q[m³/h]/Kv)² × 10⁵ / (ρ₀ g).
        double valve = Math.pow(q * 3600 / 25, 2) * 1e5 / (1000 * Gravity.STANDARD);
        // The rating: 40 kPa at its rated 6 L/s is 40 kPa at 6 L/s, h = Δp/(ρ g).
        double coil = 40_000 / (998 * Gravity.STANDARD);
        List<SizeSelector.CandidateSize> sizes = List.of(
                new SizeSelector.CandidateSize("DN40", 0.0409),
                new SizeSelector.CandidateSize("DN50", 0.0525),
                new SizeSelector.CandidateSize("DN65", 0.0627),
                new SizeSelector.CandidateSize("DN80", 0.0779));
        for (SizeSelector.CandidateSize size : sizes) {
            PipeRun trial = SizeSelector.apply(run, size);
            RunResult r = HeadLossCalculator.solve(trial, q);
            assertEquals(valve, r.element("cv-1").orElseThrow().result().headLoss(), valve * 1e-12, size.label());
            assertEquals(coil, r.element("coil").orElseThrow().result().headLoss(), coil * 1e-12, size.label());
            assertEquals(
                    size.innerDiameter(), ((Segment) trial.element("supply").orElseThrow()).innerDiameter(), 0);
            assertEquals(
                    List.of("supply", "cv-1", "coil", "return"),
                    r.elements().stream().map(ElementProfile::id).toList());
        }
        SizeSelector.Selection sel = SizeSelector.select(run, sizes, new DesignLimits(0.3, 2.0, 8.0, 1e9, 0.5));
        // 6 L/s in DN50 (52.5 mm) runs at 4Q/(πD²) = 2.77 m/s > 2.0; in DN65 (62.7 mm) at 1.94 m/s with a
        // gradient of about f/D V²/2g × 100 ≈ 0.020/0.0627 × 0.192 × 100 ≈ 6 m per 100 m, under the 8 m limit.
        assertEquals(Optional.of("DN65"), sel.chosen().map(SizeSelector.CandidateSize::label));
        assertTrue(sel.candidates().get(0).reasons().stream().anyMatch(s -> s.startsWith("velocity")));
        RunResult chosen = HeadLossCalculator.solve(sel.run(), q);
        assertEquals(valve, chosen.element("cv-1").orElseThrow().result().headLoss(), valve * 1e-12);
    }
}
