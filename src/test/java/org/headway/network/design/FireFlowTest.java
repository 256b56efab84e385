package org.headway.network.design;

import static org.headway.network.design.DesignFixtures.RHO_G;
import static org.headway.network.design.DesignFixtures.hazenWilliamsFlow;
import static org.headway.network.design.DesignFixtures.hwPipe;
import static org.headway.network.design.DesignFixtures.link;
import static org.headway.network.design.DesignFixtures.network;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.headway.caution.InputException;
import org.headway.caution.Severity;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.junit.jupiter.api.Test;

/**
 * The fire-flow search against closed forms on invented mains fed from a reservoir: with the fire
 * flow Q_f drawn at a junction, the limiting junction sits at the residual pressure P exactly when
 * reservoir head − z − P/(ρ g) = loss(Q_demand + Q_f), which Hazen–Williams (written out in {@link
 * DesignFixtures}) solves for the flow in closed form.
 */
class FireFlowTest {

    /** 140 kPa, the common 20 psi residual criterion rounded (AWWA M31, 4th ed., 2008; value from memory). */
    private static final double P = 140e3;

    /** The issue's accuracy at the limiting junction: 1e-4 m of head. */
    private static final double HEAD_TOLERANCE = 1e-4;

    @Test
    void singlePipeFromAReservoirMatchesTheClosedForm() {
        double h0 = 60;
        double z = 10;
        double demand = 0.005;
        Network net = network(
                List.of(Node.fixedHead("R", h0, h0), Node.junction("J", z, demand)),
                List.of(link(hwPipe("main", 800, 0.15, 120), "R", "J")));
        FireFlowResult r = FireFlow.standard().search(net, "J", P);
        assertTrue(r.found(), r.cautions()::toString);
        double available = h0 - z - P / RHO_G;
        double expected = hazenWilliamsFlow(800, 0.15, 120, available) - demand;
        // 1e-6 m of head on ~36 m moves the Hazen–Williams flow by 0.54 × 1e-6 / 36 relative: 1e-7 covers it.
        assertEquals(expected, r.fireFlow(), 1e-7 * expected);
        assertEquals("J", r.limitingNode());
        assertTrue(r.residualAtLimit() >= P && r.residualAtLimit() - P <= HEAD_TOLERANCE * RHO_G);
        assertTrue(r.cautions().stream()
                .anyMatch(c -> c.code().equals("fire-flow-estimate") && c.severity() == Severity.SERIOUS));
    }

    @Test
    void aHigherJunctionUpstreamCanLimitTheFireFlowAtAnother() {
        // J1 sits 45 m above J2; the fire flow is drawn at J2 but J1 reaches 140 kPa first, so the limit is
        // the first pipe's closed form with J1's elevation (every junction is checked, not only the fire node).
        double h0 = 70;
        Network net = network(
                List.of(Node.fixedHead("R", h0, h0), Node.junction("J1", 50, 0.002), Node.junction("J2", 5, 0.003)),
                List.of(link(hwPipe("p1", 500, 0.2, 120), "R", "J1"), link(hwPipe("p2", 300, 0.2, 120), "J1", "J2")));
        FireFlowResult r = FireFlow.standard().search(net, "J2", P);
        double expected = hazenWilliamsFlow(500, 0.2, 120, h0 - 50 - P / RHO_G) - 0.005;
        assertEquals(expected, r.fireFlow(), 1e-7 * expected);
        assertEquals("J1", r.limitingNode());
    }

    @Test
    void theLoopedMainSolvedAgainAtTheFireFlowPutsTheLimitingJunctionAtTheResidualPressure() {
        Network net = loopedMain(3, 7);
        FireFlowResult r = FireFlow.standard().search(net, "n2_2", P);
        assertTrue(r.found(), r.cautions()::toString);
        assertTrue(r.fireFlow() > 0);
        List<Node> nodes = new ArrayList<>();
        for (Node n : net.nodes()) {
            nodes.add(
                    n.id().equals("n2_2")
                            ? n.withDemands(List.of(
                                    new Node.Demand("base", n.totalDemand()), new Node.Demand("fire", r.fireFlow())))
                            : n);
        }
        NetworkResult solved = NetworkSolver.standard().solve(net.withNodes(nodes));
        assertTrue(solved.converged());
        double least = Double.POSITIVE_INFINITY;
        String at = "";
        for (NetworkResult.NodeResult n : solved.nodes()) {
            if (!n.fixed() && n.pressure() < least) {
                least = n.pressure();
                at = n.id();
            }
        }
        assertEquals(r.limitingNode(), at);
        assertEquals(P / RHO_G, least / RHO_G, HEAD_TOLERANCE, "limiting junction's pressure head");
        // Just above the fire flow some junction falls below P: the answer is the largest, not merely a safe one.
        List<Node> more = new ArrayList<>(nodes);
        for (int i = 0; i < more.size(); i++) {
            if (more.get(i).id().equals("n2_2")) {
                more.set(
                        i,
                        net.nodes()
                                .get(i)
                                .withDemands(List.of(new Node.Demand(
                                        "fire",
                                        1.001 * r.fireFlow()
                                                + net.nodes().get(i).totalDemand()))));
            }
        }
        NetworkResult beyond = NetworkSolver.standard().solve(net.withNodes(more));
        assertTrue(beyond.nodes().stream().anyMatch(n -> !n.fixed() && n.pressure() < P));
    }

    @Test
    void aResidualTheBaseDemandsAlreadyBreakGivesZeroAndASeriousCaution() {
        Network net = network(
                List.of(Node.fixedHead("R", 30, 30), Node.junction("J", 20, 0.002)),
                List.of(link(hwPipe("main", 300, 0.1, 120), "R", "J")));
        // J is 10 m below the reservoir: at most 98 kPa even at no flow, so 140 kPa cannot be kept.
        FireFlowResult r = FireFlow.standard().search(net, "J", P);
        assertEquals(0, r.fireFlow(), 0);
        assertEquals("J", r.limitingNode());
        assertTrue(r.residualAtLimit() < P);
        assertTrue(r.cautions().stream()
                .anyMatch(c -> c.code().equals("residual-broken-at-base") && c.severity() == Severity.SERIOUS));
    }

    @Test
    void badInputIsRefused() {
        Network net = loopedMain(2, 1);
        FireFlow f = FireFlow.standard();
        assertTrue(assertThrows(InputException.class, () -> f.search(net, "nowhere", P))
                .getMessage()
                .contains("nowhere"));
        assertTrue(assertThrows(InputException.class, () -> f.search(net, "R", P))
                .getMessage()
                .contains("junction"));
        assertTrue(assertThrows(InputException.class, () -> f.search(net, "n0_0", -1))
                .getMessage()
                .contains("residual pressure"));
    }

    /** A k × k looped grid of Hazen–Williams mains fed from one reservoir at 80 m (invented). */
    static Network loopedMain(int k, long seed) {
        Random random = new Random(seed);
        List<Node> nodes = new ArrayList<>();
        List<Link> links = new ArrayList<>();
        nodes.add(Node.fixedHead("R", 80, 80));
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                nodes.add(Node.junction("n" + r + "_" + c, 10 * random.nextDouble(), 0.001));
            }
        }
        links.add(link(hwPipe("feed", 300, 0.25, 120), "R", "n0_0"));
        double[] bores = {0.1, 0.15, 0.2};
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                if (c + 1 < k) {
                    links.add(link(
                            hwPipe("h" + r + "_" + c, 100 + 100 * random.nextDouble(), bores[random.nextInt(3)], 110),
                            "n" + r + "_" + c,
                            "n" + r + "_" + (c + 1)));
                }
                if (r + 1 < k) {
                    links.add(link(
                            hwPipe("v" + r + "_" + c, 100 + 100 * random.nextDouble(), bores[random.nextInt(3)], 110),
                            "n" + r + "_" + c,
                            "n" + (r + 1) + "_" + c));
                }
            }
        }
        return network(nodes, links);
    }
}
