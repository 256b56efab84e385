package org.headway.network.design;

import static org.headway.network.design.DesignFixtures.RHO_G;
import static org.headway.network.design.DesignFixtures.hazenWilliams;
import static org.headway.network.design.DesignFixtures.hwPipe;
import static org.headway.network.design.DesignFixtures.kvFromPressureDrop;
import static org.headway.network.design.DesignFixtures.link;
import static org.headway.network.design.DesignFixtures.network;
import static org.headway.network.design.DesignFixtures.valveHead;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.InputException;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.Node;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.PumpCurve;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.junit.jupiter.api.Test;

/**
 * Balancing an invented two-pipe building circuit: a supply held at 30 m and a return at 18 m,
 * supply and return headers of Hazen–Williams pipe, three branches each with a coil (a rated
 * component) and a balancing valve. The expected Kv, authority, index valve and source head are
 * worked here by hand from the series/parallel relations: with every branch at its design flow the
 * header flows follow from continuity, each header head from Hazen–Williams written out in {@link
 * DesignFixtures}, each coil's loss from its rating, and the valve's drop is what is left; Kv then
 * follows from the IEC 60534-2-1 relation written in pressures.
 */
class BalancingTest {

    /** Relative accuracy asked of Kv and of the re-solved design flows (the issue's 1e-6). */
    private static final double RELATIVE = 1e-6;

    private static final double H_SUPPLY = 30;
    private static final double H_RETURN = 18;
    private static final double C = 130;
    private static final double[] Q = {2.0e-3, 1.5e-3, 1.0e-3};
    private static final double[] COIL_DP = {20e3, 25e3, 30e3};
    private static final double[] COIL_Q = {2.0e-3, 1.5e-3, 1.0e-3};
    private static final double[] COIL_N = {2.0, 1.9, 2.0};
    /** Header sections: length (m) and bore (m), supply S→s1, s1→s2, s2→s3, mirrored on the return. */
    private static final double[][] HEADER = {{20, 0.08}, {15, 0.065}, {15, 0.05}};

    private static Network circuit(double[] openKv) {
        return circuit(openKv, null);
    }

    /** With a pump: S becomes a junction fed by the pump from R, and R the closed loop's reference. */
    private static Network circuit(double[] openKv, PumpElement pump) {
        List<Node> nodes = new ArrayList<>();
        nodes.add(pump == null ? Node.fixedHead("S", 0, H_SUPPLY) : Node.junction("S", 0, 0));
        nodes.add(pump == null ? Node.fixedHead("R", 0, H_RETURN) : Node.reference("R", 0, H_RETURN));
        for (int i = 1; i <= 3; i++) {
            nodes.add(Node.junction("s" + i, 0, 0));
            nodes.add(Node.junction("m" + i, 0, 0));
            nodes.add(Node.junction("r" + i, 0, 0));
        }
        List<Link> links = new ArrayList<>();
        String[] sup = {"S", "s1", "s2", "s3"};
        String[] ret = {"R", "r1", "r2", "r3"};
        for (int i = 0; i < 3; i++) {
            links.add(link(hwPipe("fh" + (i + 1), HEADER[i][0], HEADER[i][1], C), sup[i], sup[i + 1]));
            links.add(link(hwPipe("rh" + (i + 1), HEADER[i][0], HEADER[i][1], C), ret[i + 1], ret[i]));
        }
        for (int i = 0; i < 3; i++) {
            String b = String.valueOf(i + 1);
            links.add(link(new RatedComponent("coil" + b, "", COIL_DP[i], COIL_Q[i], COIL_N[i]), "s" + b, "m" + b));
            links.add(link(FlowCoefficientValve.ofKv("V" + b, "", openKv[i]), "m" + b, "r" + b, Q[i]));
        }
        if (pump != null) {
            links.add(link(pump, "R", "S"));
        }
        return network(nodes, links);
    }

    /** Hand calculation: the heads of the circuit with every branch at its design flow. */
    private static final class Hand {
        final double[] hs = new double[3];
        final double[] hr = new double[3];
        final double[] drop = new double[3];

        Hand() {
            this(H_SUPPLY, H_RETURN);
        }

        Hand(double supply, double ret) {
            double[] headerFlow = {Q[0] + Q[1] + Q[2], Q[1] + Q[2], Q[2]};
            double s = supply;
            double r = ret;
            for (int i = 0; i < 3; i++) {
                s -= hazenWilliams(HEADER[i][0], HEADER[i][1], C, headerFlow[i]);
                r += hazenWilliams(HEADER[i][0], HEADER[i][1], C, headerFlow[i]);
                hs[i] = s;
                hr[i] = r;
                double coil = COIL_DP[i] / RHO_G * Math.pow(Q[i] / COIL_Q[i], COIL_N[i]);
                drop[i] = hs[i] - coil - hr[i];
            }
        }

        double kv(int i) {
            return kvFromPressureDrop(Q[i], drop[i] * RHO_G, 998.2);
        }
    }

    @Test
    void twoPipeCircuitBalancesToTheHandCalculation() {
        double[] open = {16, 16, 16};
        Network net = circuit(open);
        BalancingResult r = Balancing.standard().balance(net);
        assertTrue(r.converged(), r.cautions()::toString);
        Hand hand = new Hand();
        for (int i = 0; i < 3; i++) {
            var v = r.valve("V" + (i + 1)).orElseThrow();
            assertTrue(v.reached());
            assertEquals(hand.drop[i], v.headDrop(), 1e-9, "drop of V" + (i + 1));
            assertEquals(hand.kv(i), v.flowCoefficient(), RELATIVE * hand.kv(i), "Kv of V" + (i + 1));
            assertEquals(0, v.extraHeadNeeded(), 0);
        }
        // Branch = the series chain: V1 and V2 between their own header tees; V3's chain runs on through
        // the dead-end header sections s2→s3 and r3→r2 to the tees at s2 and r2.
        var v1 = r.valve("V1").orElseThrow();
        assertEquals("s1", v1.branchSupply());
        assertEquals("r1", v1.branchReturn());
        assertEquals(hand.drop[0] / (hand.hs[0] - hand.hr[0]), v1.authority(), 1e-12);
        var v3 = r.valve("V3").orElseThrow();
        assertEquals("s2", v3.branchSupply());
        assertEquals("r2", v3.branchReturn());
        assertEquals(hand.drop[2] / (hand.hs[1] - hand.hr[1]), v3.authority(), 1e-12);
        // Index valve: the least spare over max(3 kPa, fully open loss); source head = 30 m less that spare.
        int index = 0;
        double least = Double.POSITIVE_INFINITY;
        for (int i = 0; i < 3; i++) {
            double spare = hand.drop[i] - Math.max(3000 / RHO_G, valveHead(open[i], Q[i]));
            if (spare < least) {
                least = spare;
                index = i;
            }
        }
        assertEquals("V" + (index + 1), r.indexValve().orElseThrow());
        assertEquals("S", r.source().orElseThrow());
        assertEquals("fixed-head", r.sourceKind());
        assertEquals(H_SUPPLY - least, r.sourceHeadNeeded(), 1e-9);
        assertTrue(r.cautions().stream().noneMatch(c -> c.code().equals("source-head-approximate")), r::toString);
        assertTrue(r.cautions().stream().anyMatch(c -> c.code().equals("balancing-commissioning")));
        assertEquals(3, r.solves());
    }

    @Test
    void theCircuitSolvedAgainWithTheFoundKvCarriesEveryDesignFlow() {
        Network net = circuit(new double[] {16, 16, 16});
        BalancingResult r = Balancing.standard().balance(net);
        List<Link> links = new ArrayList<>();
        for (Link l : net.links()) {
            links.add(
                    Balancing.isBalanced(l)
                            ? new Link(
                                    FlowCoefficientValve.ofKv(
                                            l.id(),
                                            "",
                                            r.valve(l.id()).orElseThrow().flowCoefficient()),
                                    l.from(),
                                    l.to())
                            : l);
        }
        NetworkResult solved = NetworkSolver.standard().solve(net.withLinks(links));
        assertTrue(solved.converged());
        for (int i = 0; i < 3; i++) {
            double q = solved.link("V" + (i + 1)).orElseThrow().flow();
            assertEquals(Q[i], q, RELATIVE * Q[i], "flow of V" + (i + 1));
        }
        assertTrue(r.largestFlowError() <= RELATIVE, "own check " + r.largestFlowError());
    }

    @Test
    void aBranchThatCannotReachItsFlowIsNamedWithItsExtraHead() {
        // V3 fully open passes only Kv 1.2: at 1 L/s that alone loses 9 bar.
        double[] open = {16, 16, 1.2};
        BalancingResult r = Balancing.standard().balance(circuit(open));
        Hand hand = new Hand();
        var v3 = r.valve("V3").orElseThrow();
        assertFalse(v3.reached());
        assertTrue(Double.isNaN(v3.flowCoefficient()));
        double expectedExtra = valveHead(1.2, Q[2]) - hand.drop[2];
        assertEquals(expectedExtra, v3.extraHeadNeeded(), 1e-9);
        assertEquals(List.of(v3), r.shortBranches());
        assertTrue(
                r.cautions().stream()
                        .anyMatch(c ->
                                c.code().equals("branch-short") && c.message().startsWith("V3:")),
                r.cautions()::toString);
        assertEquals("V3", r.indexValve().orElseThrow());
        // The source must make up exactly the shortfall less nothing: the valve then drops its open loss.
        assertEquals(H_SUPPLY + expectedExtra, r.sourceHeadNeeded(), 1e-9);
        assertTrue(Double.isNaN(r.largestFlowError()));
        // The other valves are still balanced to the hand values.
        assertEquals(hand.kv(0), r.valve("V1").orElseThrow().flowCoefficient(), RELATIVE * hand.kv(0));
    }

    @Test
    void settingsAreInterpolatedFromTheTableAndAKvOutsideItIsRefused() {
        Hand hand = new Hand();
        double lo = 0.5 * Math.min(hand.kv(0), Math.min(hand.kv(1), hand.kv(2)));
        double hi = 2 * Math.max(hand.kv(0), Math.max(hand.kv(1), hand.kv(2)));
        double[] settings = {1, 2, 3, 4};
        double[] kvs = {lo, lo + 0.2 * (hi - lo), lo + 0.6 * (hi - lo), hi};
        ValveSettingTable all = new ValveSettingTable("", settings, kvs, "test table");
        ValveSettingTable forV2 = new ValveSettingTable(
                "V2", new double[] {0, 10}, new double[] {3 * hand.kv(1), 4 * hand.kv(1)}, "V2 table");
        BalancingResult r =
                Balancing.standard().withSettingTables(List.of(all, forV2)).balance(circuit(new double[] {16, 16, 16}));
        for (int i : new int[] {0, 2}) {
            double kv = hand.kv(i);
            int row = 0;
            while (kvs[row + 1] < kv) {
                row++;
            }
            double expected =
                    settings[row] + (kv - kvs[row]) / (kvs[row + 1] - kvs[row]) * (settings[row + 1] - settings[row]);
            assertEquals(expected, r.valve("V" + (i + 1)).orElseThrow().setting(), 1e-6, "setting of V" + (i + 1));
        }
        assertTrue(Double.isNaN(r.valve("V2").orElseThrow().setting()));
        assertTrue(r.cautions().stream()
                .anyMatch(c -> c.code().equals("kv-outside-setting-table")
                        && c.message().startsWith("V2:")));
    }

    @Test
    void aPumpedClosedLoopGivesThePumpHeadNeeded() {
        // The same circuit as a closed loop: a pump lifts from the return end R (the loop's pressure
        // reference) to the supply end S. With every branch at its design flow the pump runs at ΣQ, so the
        // differential S − R is the pump's head there and the hand calculation above applies with it.
        PumpElement pump = new PumpElement(
                "P1",
                PumpCurve.fit(
                        "invented",
                        List.of(
                                new PumpCurve.Point(0, 16),
                                new PumpCurve.Point(0.003, 15),
                                new PumpCurve.Point(0.006, 12.5),
                                new PumpCurve.Point(0.009, 8)),
                        OptionalDouble.empty()));
        double[] open = {16, 16, 16};
        BalancingResult r = Balancing.standard().balance(circuit(open, pump));
        assertTrue(r.converged(), r.cautions()::toString);
        double lift = pump.head(Q[0] + Q[1] + Q[2]);
        Hand hand = new Hand(H_RETURN + lift, H_RETURN);
        double least = Double.POSITIVE_INFINITY;
        for (int i = 0; i < 3; i++) {
            assertEquals(hand.kv(i), r.valve("V" + (i + 1)).orElseThrow().flowCoefficient(), RELATIVE * hand.kv(i));
            least = Math.min(least, hand.drop[i] - Math.max(3000 / RHO_G, valveHead(open[i], Q[i])));
        }
        assertEquals("P1", r.source().orElseThrow());
        assertEquals("pump", r.sourceKind());
        assertEquals(lift - least, r.sourceHeadNeeded(), 1e-9);
        assertTrue(r.largestFlowError() <= RELATIVE, "own check " + r.largestFlowError());
    }

    @Test
    void badInputIsRefused() {
        Network none = circuit(new double[] {16, 16, 16});
        List<Link> plain = new ArrayList<>();
        for (Link l : none.links()) {
            plain.add(new Link(l.element(), l.from(), l.to()));
        }
        InputException noValves =
                assertThrows(InputException.class, () -> Balancing.standard().balance(none.withLinks(plain)));
        assertTrue(noValves.getMessage().contains("design_flow"), noValves.getMessage());
        // Two balanced valves in series leave the node between them without a head.
        Network series = network(
                List.of(Node.fixedHead("A", 0, 20), Node.junction("j", 0, 0), Node.fixedHead("B", 0, 10)),
                List.of(
                        link(FlowCoefficientValve.ofKv("Va", "", 10), "A", "j", 1e-3),
                        link(FlowCoefficientValve.ofKv("Vb", "", 10), "j", "B", 1e-3)));
        InputException inSeries =
                assertThrows(InputException.class, () -> Balancing.standard().balance(series));
        assertTrue(inSeries.getMessage().contains("series"), inSeries.getMessage());
        assertThrows(InputException.class, () -> Balancing.standard().withMinimumValveDrop(-1));
        assertThrows(
                InputException.class,
                () -> new ValveSettingTable("", new double[] {1, 2}, new double[] {5, 4}, "falling table"));
    }
}
