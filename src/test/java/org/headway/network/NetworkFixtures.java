package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.headway.fluid.FluidState;
import org.headway.friction.FrictionMethods;
import org.headway.system.Element;
import org.headway.system.FlowContext;
import org.headway.system.Segment;
import org.headway.system.SiteAtmosphere;

/** Invented networks built directly in SI for the solver tests. */
final class NetworkFixtures {

    private NetworkFixtures() {}

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

    static FlowContext context(String friction) {
        return new FlowContext(WATER, FrictionMethods.byId(friction));
    }

    static Segment pipe(String id, double length, double diameter, double roughness) {
        return Segment.builder(id)
                .id(id)
                .length(length)
                .bore(diameter, roughness)
                .build();
    }

    static Link link(Element e, String from, String to) {
        return new Link(e, from, to);
    }

    static Network network(String friction, List<Node> nodes, List<Link> links) {
        return new Network("test", context(friction), nodes, links, SiteAtmosphere.SEA_LEVEL);
    }

    /**
     * A k × k grid of junctions (looped), pipes of random bore between neighbours, fed from one
     * reservoir at a corner. Node ids {@code n<row>_<col>}, reservoir {@code R}.
     */
    static Network grid(int k, long seed, double reservoirHead, double demandEach) {
        return grid(k, seed, reservoirHead, demandEach, "colebrook");
    }

    static Network grid(int k, long seed, double reservoirHead, double demandEach, String friction) {
        Random random = new Random(seed);
        List<Node> nodes = new ArrayList<>();
        List<Link> links = new ArrayList<>();
        nodes.add(Node.fixedHead("R", 0, reservoirHead));
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                nodes.add(Node.junction(id(r, c), random.nextDouble() * 10, demandEach));
            }
        }
        double[] bores = {0.1, 0.125, 0.15, 0.2, 0.25};
        links.add(link(pipe("feed", 200, 0.4, 4.5e-5), "R", id(0, 0)));
        for (int r = 0; r < k; r++) {
            for (int c = 0; c < k; c++) {
                if (c + 1 < k) {
                    links.add(link(
                            pipe("h" + r + "_" + c, 50 + 150 * random.nextDouble(), bores[random.nextInt(5)], 4.5e-5),
                            id(r, c),
                            id(r, c + 1)));
                }
                if (r + 1 < k) {
                    links.add(link(
                            pipe("v" + r + "_" + c, 50 + 150 * random.nextDouble(), bores[random.nextInt(5)], 4.5e-5),
                            id(r, c),
                            id(r + 1, c)));
                }
            }
        }
        return network(friction, nodes, links);
    }

    static String id(int r, int c) {
        return "n" + r + "_" + c;
    }
}
