package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.headway.network.NetworkFixtures.pipe;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.FlowContext;
import org.headway.system.FlowControlValve;
import org.headway.system.LocalLoss;
import org.headway.system.Segment;
import org.junit.jupiter.api.Test;

/**
 * Flow-control valves in a network: active when the heads allow the setting, open when even fully
 * open they cannot reach it, shut against reverse flow (status rules of Rossman 2000, EPANET 2
 * manual §3.1). Every expected number is worked here from the element laws. Invented networks.
 */
class FlowControlValveTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();

    private static FlowControlValve fcv(String id, double setting) {
        return new FlowControlValve(
                id, id, setting, LocalLoss.ofFlowCoefficient(FlowCoefficientValve.ofKv(id + "-open", "", 40)));
    }

    private static Network line(double upHead, double downHead, double setting) {
        return network(
                "colebrook",
                List.of(Node.fixedHead("up", 0, upHead), Node.junction("j", 0, 0), Node.fixedHead("down", 0, downHead)),
                List.of(link(pipe("p", 200, 0.1, 4.5e-5), "up", "j"), link(fcv("fcv", setting), "j", "down")));
    }

    @Test
    void activeValveHoldsItsSettingAndTakesTheSpareHead() {
        NetworkResult r = SOLVER.solve(line(40, 20, 0.008));
        assertTrue(r.converged(), r.cautions()::toString);
        var v = r.link("fcv").orElseThrow();
        assertEquals("active", v.status());
        assertEquals(0.008, v.flow(), 0);
        assertEquals(0.008, r.link("p").orElseThrow().flow(), 1e-12);
        // The pipe loses its own law's head at 8 L/s; the valve takes the rest of the 20 m.
        Network net = line(40, 20, 0.008);
        double pipeLoss = net.links().get(0).element().headLoss(0.008, net.context());
        assertEquals(20 - pipeLoss, v.headLoss(), 1e-9);
        assertEquals(40 - pipeLoss, r.node("j").orElseThrow().head(), 1e-9);
    }

    @Test
    void aSettingTheHeadsCannotDriveLeavesTheValveFullyOpen() {
        Network net = line(22, 20, 0.05);
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        var v = r.link("fcv").orElseThrow();
        assertEquals("open", v.status());
        // Fully open, pipe and valve in series share the 2 m: solve Σh(Q) = 2 by bisection on the laws.
        FlowContext ctx = net.context();
        double lo = 0;
        double hi = 1;
        for (int i = 0; i < 200; i++) {
            double q = 0.5 * (lo + hi);
            double h = net.links().get(0).element().headLoss(q, ctx)
                    + net.links().get(1).element().headLoss(q, ctx);
            if (h < 2) {
                lo = q;
            } else {
                hi = q;
            }
        }
        assertEquals(0.5 * (lo + hi), v.flow(), 1e-9 * v.flow());
        assertTrue(v.flow() < 0.05);
    }

    @Test
    void reverseHeadShutsTheValve() {
        NetworkResult r = SOLVER.solve(line(20, 30, 0.008));
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals("shut", r.link("fcv").orElseThrow().status());
        assertEquals(0, r.link("p").orElseThrow().flow(), 1e-12);
    }

    @Test
    void parallelBranchesBetweenHeadersEachCarryTheirSetting() {
        // A flow header and a return header held 15 m apart; three branches of different length, each with
        // a flow-control valve: every branch must carry its own setting, and the headers the sum.
        Segment a = pipe("a", 50, 0.05, 4.5e-5);
        Segment b = pipe("b", 150, 0.05, 4.5e-5);
        Segment c = pipe("c", 300, 0.065, 4.5e-5);
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("flow", 0, 45),
                        Node.fixedHead("return", 0, 30),
                        Node.junction("ja", 0, 0),
                        Node.junction("jb", 0, 0),
                        Node.junction("jc", 0, 0)),
                List.of(
                        link(a, "flow", "ja"),
                        link(fcv("va", 0.002), "ja", "return"),
                        link(b, "flow", "jb"),
                        link(fcv("vb", 0.003), "jb", "return"),
                        link(c, "flow", "jc"),
                        link(fcv("vc", 0.004), "jc", "return")));
        NetworkResult r = SOLVER.solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals(0.002, r.link("a").orElseThrow().flow(), 1e-12);
        assertEquals(0.003, r.link("b").orElseThrow().flow(), 1e-12);
        assertEquals(0.004, r.link("c").orElseThrow().flow(), 1e-12);
        assertEquals(-0.009, r.node("flow").orElseThrow().demand(), 1e-12);
        for (String v : new String[] {"va", "vb", "vc"}) {
            assertEquals("active", r.link(v).orElseThrow().status());
        }
    }
}
