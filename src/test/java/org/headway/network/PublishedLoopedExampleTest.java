package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.network;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.headway.system.RatedComponent;
import org.junit.jupiter.api.Test;

/**
 * A looped worked example from the literature: CE 3620 Water Resources Engineering, lecture 9 "Pipe
 * Network Systems (Hardy Cross)", 6 February 2013, worked problem: two reservoirs A and B, four
 * junctions 1–4 (demands 2, 4, 1 and 3 cfs), seven pipes with fixed Darcy friction factors, each
 * reduced to h = K Q² (h in ft, Q in cfs) with K as printed: A–1 0.38, 1–2 2.89, 1–4 2.53, 4–2
 * 12.13, 3–2 2.17, 3–4 2.89, B–3 0.94. Its Hardy Cross table after 16 iterations prints Q(1→2) =
 * 2.13, Q(4→2) = 0.32 and Q(1→4) = 2.16 cfs.
 *
 * <p>The reservoir levels are on the problem's figure, which the text available to us does not
 * carry; the printed flows imply H_A − H_B = 10.0 ft (solving for the difference that gives the
 * printed inflow from A, 2 + 2.13 + 2.16 = 6.29 cfs, gives 10.002 ft), a round number, so the test
 * takes A 10 ft above B. That uses one printed number to set one input; the other two printed flows
 * are independent checks. Tolerance: half the last printed digit, 0.005 cfs.
 */
class PublishedLoopedExampleTest {

    private static final double CFS = 0.028316846592; // m³/s, exact by definition of the foot
    private static final double FOOT = 0.3048;

    /** h = K Q² in ft and cfs, as a rated component: K ft of head at 1 cfs. */
    private static RatedComponent pipe(String id, double k) {
        double rhoG = NetworkFixtures.WATER.density() * 9.80665;
        return new RatedComponent(id, id, k * FOOT * rhoG, CFS, RatedComponent.QUADRATIC);
    }

    @Test
    void flowsMatchThePrintedHardyCrossSolution() {
        double hb = 400 * FOOT; // any level: only the difference drives the flows
        double ha = hb + 10 * FOOT;
        Network net = network(
                "colebrook",
                List.of(
                        Node.fixedHead("A", ha, ha),
                        Node.fixedHead("B", hb, hb),
                        Node.junction("1", 320 * FOOT, 2 * CFS),
                        Node.junction("2", 330 * FOOT, 4 * CFS),
                        Node.junction("3", 310 * FOOT, 1 * CFS),
                        Node.junction("4", 300 * FOOT, 3 * CFS)),
                List.of(
                        link(pipe("A-1", 0.38), "A", "1"),
                        link(pipe("1-2", 2.89), "1", "2"),
                        link(pipe("1-4", 2.53), "1", "4"),
                        link(pipe("4-2", 12.13), "4", "2"),
                        link(pipe("3-2", 2.17), "3", "2"),
                        link(pipe("3-4", 2.89), "3", "4"),
                        link(pipe("B-3", 0.94), "B", "3")));
        NetworkResult r = NetworkSolver.standard().solve(net);
        assertTrue(r.converged(), r.cautions()::toString);
        assertEquals(2.13, r.link("1-2").orElseThrow().flow() / CFS, 0.005);
        assertEquals(0.32, r.link("4-2").orElseThrow().flow() / CFS, 0.005);
        assertEquals(2.16, r.link("1-4").orElseThrow().flow() / CFS, 0.005);
        assertEquals(6.29, r.link("A-1").orElseThrow().flow() / CFS, 0.01);
        assertEquals(10 - 6.29, r.link("B-3").orElseThrow().flow() / CFS, 0.01);
    }
}
