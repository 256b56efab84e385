package org.headway.network.design;

import java.util.List;
import java.util.OptionalDouble;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionMethods;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.Node;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.system.FlowContext;
import org.headway.system.Gravity;
import org.headway.system.Segment;
import org.headway.system.SiteAtmosphere;

/** Invented networks for the design tests, with the closed-form laws the hand calculations use. */
final class DesignFixtures {

    private DesignFixtures() {}

    /** Water near 20 °C: ρ, μ and p_v as commonly tabulated (from memory). */
    static final FluidState WATER = new FluidState(
            "test water",
            293.15,
            101_325,
            998.2,
            1.0016e-3,
            1.0016e-3 / 998.2,
            OptionalDouble.of(2339),
            "test",
            "test",
            "test",
            List.of());

    static final double RHO_G = 998.2 * Gravity.STANDARD;

    static FlowContext context() {
        return new FlowContext(WATER, FrictionMethods.byId("colebrook"));
    }

    static Network network(List<Node> nodes, List<Link> links) {
        return new Network("test", context(), nodes, links, SiteAtmosphere.SEA_LEVEL);
    }

    /** A Hazen–Williams pipe. */
    static Segment hwPipe(String id, double length, double diameter, double c) {
        return Segment.builder(id)
                .id(id)
                .length(length)
                .bore(diameter, 1.5e-6)
                .hazenWilliams(new HazenWilliamsCoefficient(c, "test"))
                .build();
    }

    /**
     * A Darcy–Weisbach pipe (friction by the network's method, Colebrook–White here) with a
     * roughness range.
     */
    static Segment dwPipe(String id, double length, double diameter, double roughness, double low, double high) {
        return Segment.builder(id)
                .id(id)
                .length(length)
                .bore(diameter, roughness)
                .roughnessRange(low, high)
                .build();
    }

    /**
     * Hazen–Williams head loss written out here, independently of {@link Segment}: V = 0.849 C R^0.63
     * S^0.54 with R = D/4 (the SI form of Williams &amp; Hazen's formula), so h = L (V / (0.849 C
     * R^0.63))^(1/0.54).
     */
    static double hazenWilliams(double length, double diameter, double c, double flow) {
        double v = flow / (Math.PI * diameter * diameter / 4);
        return length * Math.pow(v / (0.849 * c * Math.pow(diameter / 4, 0.63)), 1 / 0.54);
    }

    /** The inverse: the flow that loses h in the pipe. */
    static double hazenWilliamsFlow(double length, double diameter, double c, double head) {
        double v = 0.849 * c * Math.pow(diameter / 4, 0.63) * Math.pow(head / length, 0.54);
        return v * Math.PI * diameter * diameter / 4;
    }

    /**
     * K_v from the IEC 60534-2-1 relation for liquids, written in pressures: K_v = Q[m³/h] · √((ρ/ρ₀) /
     * (Δp / 1 bar)), ρ₀ = 1000 kg/m³.
     */
    static double kvFromPressureDrop(double flow, double pressureDrop, double density) {
        return flow * 3600 * Math.sqrt((density / 1000) / (pressureDrop / 1e5));
    }

    /** Head lost by a valve of a K_v at a flow, the same relation solved for Δp, in metres of this water. */
    static double valveHead(double kv, double flow) {
        double dp = (998.2 / 1000) * Math.pow(flow * 3600 / kv, 2) * 1e5;
        return dp / RHO_G;
    }

    static Link link(org.headway.system.Element e, String from, String to) {
        return new Link(e, from, to);
    }

    static Link link(org.headway.system.Element e, String from, String to, double designFlow) {
        return new Link(e, from, to, designFlow);
    }
}
