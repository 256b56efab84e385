package org.headway.network;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.headway.caution.InputException;

/**
 * One demand case of a network (peak hour, night, fire…): the network's own demands scaled, or
 * some nodes given other values.
 *
 * <p>At a junction not named in {@code nodeDemands}, every named demand d of category c becomes
 * multiplier × categoryMultipliers[c] × d (a category not listed keeps factor 1). A junction named
 * in {@code nodeDemands} has that one total demand in this case instead of its own demands (no
 * multiplier applies to it). Fixed-head nodes are unchanged.
 *
 * @param name the case's name, unique in a study
 * @param multiplier factor on every demand (ratio, ≥ 0)
 * @param categoryMultipliers factor on the demands of a category, by category name (ratio, ≥ 0),
 *     on top of the multiplier
 * @param nodeDemands a junction's total demand in this case, by node id (m³/s)
 */
public record DemandCase(
        String name, double multiplier, Map<String, Double> categoryMultipliers, Map<String, Double> nodeDemands) {

    /** Largest multiplier accepted: beyond it a unit slip (percent for a ratio) is more likely than a design case. */
    public static final double MAX_MULTIPLIER = 1000;

    public DemandCase {
        if (name == null || name.isBlank()) {
            throw new InputException("demand case", "every demand case needs a name");
        }
        checkMultiplier(name + ".multiplier", multiplier);
        categoryMultipliers = Collections.unmodifiableMap(new LinkedHashMap<>(categoryMultipliers));
        nodeDemands = Collections.unmodifiableMap(new LinkedHashMap<>(nodeDemands));
        for (var e : categoryMultipliers.entrySet()) {
            checkMultiplier(name + ".demandMultipliers." + e.getKey(), e.getValue());
        }
        for (var e : nodeDemands.entrySet()) {
            InputException.requireFinite(name + ".nodeDemands." + e.getKey(), e.getValue());
        }
    }

    /** A case that scales every demand by one factor. */
    public static DemandCase scaled(String name, double multiplier) {
        return new DemandCase(name, multiplier, Map.of(), Map.of());
    }

    private static void checkMultiplier(String where, double m) {
        if (!(m >= 0) || m > MAX_MULTIPLIER) {
            throw new InputException(
                    where, "a demand multiplier must be a ratio from 0 to " + (int) MAX_MULTIPLIER + ", got " + m);
        }
    }

    /**
     * The network with this case's demands.
     *
     * @throws InputException naming the case when it names a node that is not a junction of the
     *     network, or a category no node has
     */
    public Network applyTo(Network network) {
        Map<String, Integer> index = network.nodeIndex();
        for (String id : nodeDemands.keySet()) {
            Integer i = index.get(id);
            if (i == null) {
                throw new InputException(
                        "demand case " + name + ", nodeDemands", "node \"" + id + "\" is not in the network");
            }
            if (network.nodes().get(i).headIsFixed()) {
                throw new InputException(
                        "demand case " + name + ", nodeDemands",
                        "node \"" + id + "\" has a fixed head; a demand case changes junction demands only");
            }
        }
        Set<String> categories = categories(network);
        for (String c : categoryMultipliers.keySet()) {
            if (!categories.contains(c)) {
                throw new InputException(
                        "demand case " + name + ", demandMultipliers",
                        "no node has a demand of category \"" + c + "\"; the network's categories are "
                                + String.join(", ", categories));
            }
        }
        List<Node> nodes = new ArrayList<>(network.nodes().size());
        for (Node n : network.nodes()) {
            if (n.headIsFixed()) {
                nodes.add(n);
            } else if (nodeDemands.containsKey(n.id())) {
                double q = nodeDemands.get(n.id());
                nodes.add(n.withDemands(q == 0 ? List.of() : List.of(new Node.Demand(name, q))));
            } else {
                List<Node.Demand> scaled = new ArrayList<>(n.demands().size());
                for (Node.Demand d : n.demands()) {
                    double factor = multiplier * categoryMultipliers.getOrDefault(d.name(), 1.0);
                    scaled.add(new Node.Demand(d.name(), factor * d.flow()));
                }
                nodes.add(n.withDemands(scaled));
            }
        }
        return network.withNodes(nodes);
    }

    /** The demand categories of a network's junctions, in order of first appearance. */
    public static Set<String> categories(Network network) {
        Set<String> out = new java.util.LinkedHashSet<>();
        for (Node n : network.nodes()) {
            for (Node.Demand d : n.demands()) {
                out.add(d.name());
            }
        }
        return out;
    }

    /** Refuses two cases of one name. */
    public static void requireUniqueNames(List<DemandCase> cases) {
        Set<String> seen = new HashSet<>();
        for (DemandCase c : cases) {
            if (!seen.add(c.name())) {
                throw new InputException("demand cases", "the case name \"" + c.name() + "\" is used twice");
            }
        }
    }
}
