package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.headway.network.NetworkFixtures.pipe;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.system.Element;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowContext;
import org.headway.system.LocalLoss;
import org.headway.system.PressureControlValve;
import org.junit.jupiter.api.Test;

/**
 * Control-valve combinations where status switching is known to go wrong — valves in series, in
 * parallel, and a reducing valve sharing its outlet with a second source — after the cases Deuerlein,
 * Simpson &amp; Dempe (2009), "Modeling the behavior of flow control devices in water distribution
 * systems: a stable and efficient approach", Journal of Hydraulic Engineering 135(3), discuss:
 * each has one physical answer (or, for equal valves in parallel, one set of heads), worked here from
 * the element laws alone (bisection on a pipe's own law), which the solver must reach without
 * cycling. Invented networks; all junctions at elevation 0 so that head equals pressure head.
 */
class ControlValveSwitchingTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();
    private static final double RHO_G = NetworkFixtures.WATER.density() * 9.80665;

    private static PressureControlValve prv(String id, double settingPa) {
        return prv(id, settingPa, 80);
    }

    private static PressureControlValve prv(String id, double settingPa, double kv) {
        return new PressureControlValve(
                id, id, true, settingPa, LocalLoss.ofFlowCoefficient(FlowCoefficientValve.ofKv(id + "-open", "", kv)));
    }

    /** The flow an element passes for a head difference, by bisection on its own law (an independent check). */
    private static double flowFor(Element e, FlowContext ctx, double head) {
        double lo = 0;
        double hi = 10;
        for (int i = 0; i < 200; i++) {
            double q = 0.5 * (lo + hi);
            if (e.headLoss(q, ctx) < head) {
                lo = q;
            } else {
                hi = q;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    void reducingValvesInSeriesEachHoldTheirOwnSetting() {
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 90, 90),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0),
                        Node.junction("d", 0, 0.012)),
                List.of(
                        link(pipe("p1", 400, 0.15, 4.5e-5), "R", "a"),
                        link(prv("v1", 500_000), "a", "b"),
                        link(prv("v2", 300_000), "b", "c"),
                        link(pipe("p2", 150, 0.1, 4.5e-5), "c", "d")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("v1").orElseThrow().status());
        assertEquals("active", r.link("v2").orElseThrow().status());
        assertEquals(500_000, r.node("b").orElseThrow().pressure(), 1e-3);
        assertEquals(300_000, r.node("c").orElseThrow().pressure(), 1e-3);
        assertEquals(0.012, r.link("v1").orElseThrow().flow(), 1e-12);
        assertEquals(0.012, r.link("v2").orElseThrow().flow(), 1e-12);
    }

    @Test
    void aDownstreamValveSetAboveTheUpstreamOneEndsOpen() {
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 90, 90),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.012)),
                List.of(
                        link(pipe("p1", 400, 0.15, 4.5e-5), "R", "a"),
                        link(prv("v1", 300_000), "a", "b"),
                        link(prv("v2", 500_000), "b", "c")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("v1").orElseThrow().status());
        assertEquals("open", r.link("v2").orElseThrow().status());
        assertEquals(300_000, r.node("b").orElseThrow().pressure(), 1e-3);
        // Open, v2 loses its fully open law's head at the 12 L/s.
        double open = net.links().get(2).element().headLoss(0.012, net.context());
        assertEquals(300_000 / RHO_G - open, r.node("c").orElseThrow().head(), 1e-6);
    }

    @Test
    void ofTwoReducingValvesInParallelTheHigherSetOneHoldsAndTheOtherShuts() {
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 90, 90),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.015)),
                List.of(
                        link(pipe("p1", 400, 0.2, 4.5e-5), "R", "a"),
                        link(prv("high", 350_000), "a", "b"),
                        link(prv("low", 250_000), "a", "b"),
                        link(pipe("p2", 100, 0.15, 4.5e-5), "b", "c")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("high").orElseThrow().status());
        assertEquals("shut", r.link("low").orElseThrow().status());
        assertEquals(350_000, r.node("b").orElseThrow().pressure(), 1e-3);
        assertEquals(0.015, r.link("high").orElseThrow().flow(), 1e-12);
        assertEquals(0, r.link("low").orElseThrow().flow(), 0);
    }

    @Test
    void equalReducingValvesInParallelShareTheFlowAndHoldOneHead() {
        // The split between two valves holding the same head is not fixed by the physics (Deuerlein et
        // al. 2009 call it non-unique); the heads are, and so is the total.
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 90, 90),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.015)),
                List.of(
                        link(pipe("p1", 400, 0.2, 4.5e-5), "R", "a"),
                        link(prv("v1", 300_000), "a", "b"),
                        link(prv("v2", 300_000), "a", "b"),
                        link(pipe("p2", 100, 0.15, 4.5e-5), "b", "c")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals(300_000, r.node("b").orElseThrow().pressure(), 1e-3);
        double q1 = r.link("v1").orElseThrow().flow();
        double q2 = r.link("v2").orElseThrow().flow();
        assertTrue(q1 >= 0 && q2 >= 0, q1 + ", " + q2);
        assertEquals(0.015, q1 + q2, 1e-12);
        double p2 = net.links().get(3).element().headLoss(0.015, net.context());
        assertEquals(300_000 / RHO_G - p2, r.node("c").orElseThrow().head(), 1e-6);
    }

    @Test
    void aSmallValveSetHighRunsFullyOpenWhileTheLargeOneSetLowerHolds() {
        // Staggered settings, common practice for a low-flow valve beside a duty valve (no source): at a
        // demand beyond the small valve's capacity the head falls to the large valve's setting; the
        // small one then passes what its fully open law gives for the heads at its ends.
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 90, 90),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.015)),
                List.of(
                        link(pipe("p1", 400, 0.2, 4.5e-5), "R", "a"),
                        link(prv("small", 350_000, 2), "a", "b"),
                        link(prv("large", 300_000, 80), "a", "b"),
                        link(pipe("p2", 100, 0.15, 4.5e-5), "b", "c")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("open", r.link("small").orElseThrow().status());
        assertEquals("active", r.link("large").orElseThrow().status());
        FlowContext ctx = net.context();
        double ha = 90 - net.links().get(0).element().headLoss(0.015, ctx);
        double hb = 300_000 / RHO_G;
        double small = flowFor(net.links().get(1).element(), ctx, ha - hb);
        assertEquals(hb, r.node("b").orElseThrow().head(), 1e-6);
        assertEquals(small, r.link("small").orElseThrow().flow(), 1e-9);
        assertEquals(0.015 - small, r.link("large").orElseThrow().flow(), 1e-9);
    }

    /** R1 (60 m) → PRV holding 30 m → b (10 L/s) ← long pipe ← R2 (45 m). */
    private static Network sharedOutlet(double secondPipeDiameter) {
        return network(
                "colebrook",
                List.of(
                        Node.fixedHead("R1", 60, 60),
                        Node.fixedHead("R2", 45, 45),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0.010)),
                List.of(
                        link(pipe("p1", 50, 0.2, 4.5e-5), "R1", "a"),
                        link(prv("prv", 30 * RHO_G), "a", "b"),
                        link(pipe("p2", 1500, secondPipeDiameter, 4.5e-5), "R2", "b")));
    }

    @Test
    void aReducingValveTopsUpWhatASecondSourceCannotGive() {
        Network net = sharedOutlet(0.08);
        FlowContext ctx = net.context();
        double fromSecond = flowFor(net.links().get(2).element(), ctx, 45 - 30);
        assertTrue(fromSecond < 0.010, "the case needs the second source short: " + fromSecond);
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("prv").orElseThrow().status());
        assertEquals(30, r.node("b").orElseThrow().head(), 1e-6);
        assertEquals(fromSecond, r.link("p2").orElseThrow().flow(), 1e-9);
        assertEquals(0.010 - fromSecond, r.link("prv").orElseThrow().flow(), 1e-9);
    }

    @Test
    void aReducingValveShutsWhenASecondSourceKeepsItsOutletAboveTheSetting() {
        Network net = sharedOutlet(0.2);
        FlowContext ctx = net.context();
        assertTrue(
                flowFor(net.links().get(2).element(), ctx, 45 - 30) > 0.010, "the case needs a strong second source");
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("shut", r.link("prv").orElseThrow().status());
        double loss = net.links().get(2).element().headLoss(0.010, ctx);
        assertEquals(45 - loss, r.node("b").orElseThrow().head(), 1e-6);
        assertEquals(0.010, r.link("p2").orElseThrow().flow(), 1e-12);
    }
}
