package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.headway.network.NetworkFixtures.pipe;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.caution.InputException;
import org.headway.system.Element;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowContext;
import org.headway.system.LocalLoss;
import org.headway.system.PressureControlValve;
import org.junit.jupiter.api.Test;

/**
 * Pressure-reducing and pressure-sustaining valves: active, open and shut as the heads require
 * (status rules of Rossman 2000, EPANET 2 manual Appendix D). Expected numbers are worked here from
 * the element laws. Invented networks.
 */
class PressureControlValveTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();
    private static final double RHO_G = NetworkFixtures.WATER.density() * 9.80665;

    private static PressureControlValve valve(String id, boolean reducing, double setting) {
        return valve(id, reducing, setting, 60);
    }

    private static PressureControlValve valve(String id, boolean reducing, double setting, double kv) {
        return new PressureControlValve(
                id,
                id,
                reducing,
                setting,
                LocalLoss.ofFlowCoefficient(FlowCoefficientValve.ofKv(id + "-open", "", kv)));
    }

    /** Reservoir → p1 → a → PRV → b → p2 → c (demand 10 L/s), all junctions at elevation 0. */
    private static Network reducing(double reservoirHead, double setting) {
        return network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", reservoirHead, reservoirHead),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.01)),
                List.of(
                        link(pipe("p1", 300, 0.15, 4.5e-5), "R", "a"),
                        link(valve("prv", true, setting), "a", "b"),
                        link(pipe("p2", 200, 0.1, 4.5e-5), "b", "c")));
    }

    @Test
    void activeReducingValveHoldsItsOutletPressure() {
        NetworkResult r = SOLVER.solve(reducing(100, 300_000));
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("prv").orElseThrow().status());
        assertEquals(300_000, r.node("b").orElseThrow().pressure(), 1e-3);
        assertEquals(0.01, r.link("prv").orElseThrow().flow(), 1e-12);
        // Downstream of the held node the pipe law alone sets the head at c.
        Network net = reducing(100, 300_000);
        double p2 = net.links().get(2).element().headLoss(0.01, net.context());
        assertEquals(300_000 / RHO_G - p2, r.node("c").orElseThrow().head(), 1e-6);
    }

    @Test
    void aReducingValveThatCannotReachItsSettingIsFullyOpen() {
        Network net = reducing(25, 300_000); // the reservoir gives less than the 30.6 m the setting asks
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        var v = r.link("prv").orElseThrow();
        assertEquals("open", v.status());
        FlowContext ctx = net.context();
        // Open, the valve loses its open law's head at the 10 L/s the demand takes.
        assertEquals(net.links().get(1).element().headLoss(0.01, ctx), v.headLoss(), 1e-9);
        assertTrue(r.node("b").orElseThrow().pressure() < 300_000);
    }

    @Test
    void aReducingValveTooSmallForTheDemandRunsFullyOpen() {
        // Kv 2 passes 10 L/s (36 m³/h) only with (36/2)² bar ≈ 330 m of loss: far more than the 100 m
        // reservoir leaves above the setting, so no throttling can hold 300 kPa; the valve is fully open.
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 100, 100),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.junction("c", 0, 0.01)),
                List.of(
                        link(pipe("p1", 300, 0.15, 4.5e-5), "R", "a"),
                        link(valve("prv", true, 300_000, 2), "a", "b"),
                        link(pipe("p2", 200, 0.1, 4.5e-5), "b", "c")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("open", r.link("prv").orElseThrow().status());
        FlowContext ctx = net.context();
        double hb = 100
                - net.links().get(0).element().headLoss(0.01, ctx)
                - net.links().get(1).element().headLoss(0.01, ctx);
        assertEquals(hb, r.node("b").orElseThrow().head(), 1e-6);
    }

    @Test
    void reverseHeadShutsTheReducingValve() {
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 40, 40),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.fixedHead("T", 60, 60)),
                List.of(
                        link(pipe("p1", 300, 0.15, 4.5e-5), "R", "a"),
                        link(valve("prv", true, 200_000), "a", "b"),
                        link(pipe("p2", 200, 0.1, 4.5e-5), "b", "T")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("shut", r.link("prv").orElseThrow().status());
        assertEquals(0, r.link("p1").orElseThrow().flow(), 1e-12);
    }

    @Test
    void activeSustainingValveHoldsItsInletPressure() {
        // Reservoir at 100 m → long main → a → PSV holding 400 kPa at a → b → short pipe → low tank at 10 m.
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("R", 100, 100),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 0, 0),
                        Node.fixedHead("T", 10, 10)),
                List.of(
                        link(pipe("main", 2000, 0.15, 4.5e-5), "R", "a"),
                        // Kv 400: fully open it would lose about 1 m at the ~38 L/s the main gives, so it can hold.
                        link(valve("psv", false, 400_000, 400), "a", "b"),
                        link(pipe("tail", 50, 0.15, 4.5e-5), "b", "T")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("active", r.link("psv").orElseThrow().status());
        assertEquals(400_000, r.node("a").orElseThrow().pressure(), 1e-3);
        // The main then carries the flow its own law gives for 100 m − H_a, found here by bisection.
        Element main = net.links().get(0).element();
        double target = 100 - 400_000 / RHO_G;
        double lo = 0;
        double hi = 1;
        for (int i = 0; i < 200; i++) {
            double q = 0.5 * (lo + hi);
            if (main.headLoss(q, net.context()) < target) {
                lo = q;
            } else {
                hi = q;
            }
        }
        assertEquals(0.5 * (lo + hi), r.link("psv").orElseThrow().flow(), 1e-8 * lo);
    }

    /**
     * A reducing valve bypassed by a pipe that keeps its outlet above the setting: pinned, the valve
     * would have to run backwards, so it must end shut and stay shut (a case where status switching
     * can cycle, Deuerlein, Simpson &amp; Dempe 2009).
     */
    @Test
    void aBypassedReducingValveEndsShutWithoutCycling() {
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("R", 60, 60), Node.junction("a", 0, 0), Node.junction("b", 0, 0.005)),
                List.of(
                        link(pipe("p1", 100, 0.2, 4.5e-5), "R", "a"),
                        link(valve("prv", true, 300_000), "a", "b"),
                        link(pipe("bypass", 20, 0.2, 4.5e-5), "a", "b")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("shut", r.link("prv").orElseThrow().status());
        assertEquals(0.005, r.link("bypass").orElseThrow().flow(), 1e-12);
        assertTrue(r.node("b").orElseThrow().head() > 300_000 / RHO_G);
    }

    @Test
    void aValveHoldingAFixedHeadNodeIsRefused() {
        Network net = network(
                "colebrook",
                List.of(Node.fixedHead("R", 50, 50), Node.fixedHead("T", 0, 20)),
                List.of(link(valve("prv", true, 100_000), "R", "T")));
        InputException e = assertThrows(InputException.class, () -> SOLVER.solve(net));
        assertTrue(e.getMessage().contains("already has a fixed head"), e.getMessage());
    }
}
