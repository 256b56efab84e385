package org.headway.network;

import static org.headway.network.NetworkFixtures.link;
import static org.headway.network.NetworkFixtures.pipe;
import static org.headway.network.NetworkStudyTest.kvResistance;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.PressureLimits;
import org.headway.system.PumpCurve;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.headway.system.SiteAtmosphere;
import org.junit.jupiter.api.Test;

/**
 * Pumps in a network: identical pumps in parallel and in series against the closed-form combined
 * curve, NPSH available at the operating point against a hand calculation, and the closed loop's
 * index circuit.
 */
class NetworkPumpTest {

    private static final NetworkSolver SOLVER = NetworkSolver.standard();

    /** g₀ (m/s²), CGPM 1901. */
    private static final double G = 9.80665;

    /** Shut-off head a₀ (m) and curvature a₂ (m per (m³/s)²) of the invented pump H = a₀ + a₂ Q². */
    private static final double A0 = 40;

    private static final double A2 = -20_000;

    /**
     * Relative accuracy of the closed forms: the solve ends with an energy residual ≤ 10⁻⁹ m on
     * links whose slopes are ~10³ m per m³/s, so flows are good to far better than 10⁻⁹.
     */
    private static final double RELATIVE = 1e-9;

    /** Three points on H = 40 − 20 000 Q², which the quadratic fit passes through exactly. */
    private static PumpCurve curve(OptionalDouble npshRequired) {
        return PumpCurve.fit(
                "invented",
                List.of(
                        new PumpCurve.Point(0, A0),
                        new PumpCurve.Point(0.01, A0 + A2 * 1e-4),
                        new PumpCurve.Point(0.02, A0 + A2 * 4e-4)),
                npshRequired);
    }

    private static Network net(List<Node> nodes, List<Link> links, SiteAtmosphere site) {
        return new Network("pumps", NetworkFixtures.context("colebrook"), nodes, links, site);
    }

    /** Low reservoir (surface 0) → valve V1 → S → two pumps side by side → D → valve V2 → high reservoir. */
    private static Network parallel(double suctionElevation, double lift, SiteAtmosphere site, PumpCurve c) {
        return net(
                List.of(
                        Node.fixedHead("low", 0, 0),
                        Node.junction("S", suctionElevation, 0),
                        Node.junction("D", suctionElevation, 0),
                        Node.fixedHead("high", lift, lift)),
                List.of(
                        link(FlowCoefficientValve.ofKv("V1", "", 100), "low", "S"),
                        link(new PumpElement("A", c), "S", "D"),
                        link(new PumpElement("B", c), "S", "D"),
                        link(FlowCoefficientValve.ofKv("V2", "", 40), "D", "high")),
                site);
    }

    @Test
    void twoIdenticalPumpsInParallelMeetTheCombinedCurve() {
        double lift = 20;
        Network network = parallel(0, lift, SiteAtmosphere.SEA_LEVEL, curve(OptionalDouble.empty()));
        NetworkStudy.Result r = NetworkStudy.of(network).solve(SOLVER);
        assertTrue(r.converged());
        // Closed form: each pump carries Q/2, so a₀ + a₂ (Q/2)² = lift + (c₁ + c₂) Q².
        double c = kvResistance(100) + kvResistance(40);
        double q = Math.sqrt((A0 - lift) / (c - A2 / 4));
        double headEach = A0 + A2 * (q / 2) * (q / 2);
        List<PumpDuty> pumps = r.base().pumps().pumps();
        assertEquals(2, pumps.size());
        for (PumpDuty d : pumps) {
            assertEquals(q / 2, d.flow(), RELATIVE * q / 2);
            assertEquals(headEach, d.head(), RELATIVE * headEach);
            assertTrue(d.efficiency().isEmpty(), "the curve carries no efficiency");
        }
        assertEquals(q, r.base().result().link("V2").orElseThrow().flow(), RELATIVE * q);
    }

    @Test
    void twoIdenticalPumpsInSeriesMeetTheCombinedCurve() {
        double lift = 60;
        PumpCurve c = curve(OptionalDouble.empty());
        Network network = net(
                List.of(
                        Node.fixedHead("low", 0, 0),
                        Node.junction("S", 0, 0),
                        Node.junction("M", 0, 0),
                        Node.junction("D", 0, 0),
                        Node.fixedHead("high", lift, lift)),
                List.of(
                        link(FlowCoefficientValve.ofKv("V1", "", 100), "low", "S"),
                        link(new PumpElement("A", c), "S", "M"),
                        link(new PumpElement("B", c), "M", "D"),
                        link(FlowCoefficientValve.ofKv("V2", "", 40), "D", "high")),
                SiteAtmosphere.SEA_LEVEL);
        NetworkStudy.Result r = NetworkStudy.of(network).solve(SOLVER);
        assertTrue(r.converged());
        // Closed form: both carry Q, so 2 (a₀ + a₂ Q²) = lift + (c₁ + c₂) Q².
        double resistance = kvResistance(100) + kvResistance(40);
        double q = Math.sqrt((2 * A0 - lift) / (resistance - 2 * A2));
        double headEach = A0 + A2 * q * q;
        for (PumpDuty d : r.base().pumps().pumps()) {
            assertEquals(q, d.flow(), RELATIVE * q);
            assertEquals(headEach, d.head(), RELATIVE * headEach);
        }
    }

    @Test
    void npshAvailableAtTheOperatingPointMatchesAHandCalculationAndWarnsByName() {
        double lift = 20;
        double zs = 2;
        SiteAtmosphere site = SiteAtmosphere.ofPressure(90_000);
        // NPSH required 4 m with the usual 1 m margin: the hand value below is about 4.3 m, so the
        // caution must fire.
        Network network = parallel(zs, lift, site, curve(OptionalDouble.of(4.0)));
        NetworkStudy.Result r = NetworkStudy.of(network).solve(SOLVER);
        double c1 = kvResistance(100);
        double c = c1 + kvResistance(40);
        double q = Math.sqrt((A0 - lift) / (c - A2 / 4));
        // Hand: suction head H_S = 0 − c₁ Q² (the low reservoir's surface less valve V1's loss); the pump
        // sits at z_S; NPSHa = H_S − z_S + (p_atm − p_v)/(ρ g), ISO 17769-1's definition with the network's
        // node head taken as the energy head.
        double rho = NetworkFixtures.WATER.density();
        double pv = NetworkFixtures.WATER.vapourPressure().getAsDouble();
        double npsha = (0 - c1 * q * q) - zs + (90_000 - pv) / (rho * G);
        assertTrue(npsha > 4 && npsha < 5, "the case is built to sit inside the margin: " + npsha);
        for (PumpDuty d : r.base().pumps().pumps()) {
            // The suction head comes from the solve: its energy residual 10⁻⁹ m bounds the difference.
            assertEquals(npsha, d.npshAvailable(), 1e-8);
            assertEquals(4.0, d.npshRequired());
            assertEquals(npsha - 4.0, d.npshMargin(), 1e-8);
        }
        List<Caution> risks = r.cautions().stream()
                .filter(k -> k.code().equals("cavitation-risk"))
                .toList();
        assertEquals(2, risks.size(), r.cautions()::toString);
        assertTrue(risks.get(0).message().contains("pump A (node S)"), risks.get(0)::message);
        assertTrue(risks.get(1).message().contains("pump B (node S)"), risks.get(1)::message);
        assertEquals(org.headway.caution.Severity.SERIOUS, risks.get(0).severity());
        // With a 0.1 m margin the same pumps are clear (4.3 m > 4.0 + 0.1).
        NetworkStudy.Result relaxed = new NetworkStudy(network, List.of(), PressureLimits.NONE, 0.1).solve(SOLVER);
        assertFalse(relaxed.cautions().stream().anyMatch(k -> k.code().equals("cavitation-risk")));
    }

    @Test
    void aClosedLoopsIndexCircuitRunsFromThePumpDischargeBackToItsReference() {
        PumpCurve circ = PumpCurve.fit(
                "circ",
                List.of(new PumpCurve.Point(0, 18), new PumpCurve.Point(0.004, 16), new PumpCurve.Point(0.008, 11)),
                OptionalDouble.empty());
        RatedComponent coil = new RatedComponent("coil", "coil", 30_000, 0.005, 2);
        Network network = NetworkFixtures.network(
                "colebrook",
                List.of(
                        Node.reference("fill", 0, 25),
                        Node.junction("a", 0, 0),
                        Node.junction("b", 12, 0),
                        Node.junction("c", 12, 0)),
                List.of(
                        link(new PumpElement("pump", circ, 1.0), "fill", "a"),
                        link(pipe("riser", 40, 0.065, 4.5e-5), "a", "b"),
                        link(coil, "b", "c"),
                        link(pipe("return", 40, 0.065, 4.5e-5), "c", "fill")));
        NetworkStudy.Result r = NetworkStudy.of(network).solve(SOLVER);
        IndexCircuit.TerminalPath index = r.base().circuit().index().orElseThrow();
        assertEquals("a", index.source());
        assertEquals("fill", index.terminal());
        assertEquals(List.of("riser", "coil", "return"), index.links());
        // Independent: the element laws at the solved flow, summed around the loop, equal the loss (and
        // the pump's head); the solve's head tolerance 10⁻⁶ m.
        double q = r.base().result().link("pump").orElseThrow().flow();
        double sum = 0;
        for (Link l : network.links().subList(1, 4)) {
            sum += l.element().headLoss(q, network.context());
        }
        assertEquals(sum, index.headLoss(), 1e-6);
        assertEquals(new PumpElement("pump", circ, 1.0).head(q), index.headLoss(), 1e-6);
    }
}
