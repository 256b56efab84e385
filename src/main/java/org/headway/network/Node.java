package org.headway.network;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import org.headway.caution.InputException;

/**
 * A point of a network where links meet.
 *
 * <p>A <b>junction</b> has an unknown head and takes its demands out of the network (a negative
 * demand is an inflow). A <b>fixed-head</b> node (a reservoir or tank level, or a fixed pressure at
 * an elevation, converted to a head) supplies or absorbs whatever flow the network needs. A
 * <b>reference</b> node fixes the head of a closed loop (its fill or expansion point) without being
 * meant to exchange flow: the solver reports the flow it does exchange, which in a closed loop whose
 * demands balance is zero, and cautions otherwise.
 *
 * @param id stable id, unique in the network
 * @param name name the engineer gave it (the id when none)
 * @param kind junction, fixed head or reference
 * @param elevation elevation of the node (m, any datum used by the whole network)
 * @param demands named demands at a junction (m³/s, positive out of the network)
 * @param fixedHead the head of a fixed-head or reference node (m, same datum)
 * @param x drawing position, optional
 * @param y drawing position, optional
 */
public record Node(
        String id,
        String name,
        Kind kind,
        double elevation,
        List<Demand> demands,
        OptionalDouble fixedHead,
        OptionalDouble x,
        OptionalDouble y) {

    /** What fixes a node's head. */
    public enum Kind {
        /** Head unknown; demands leave here. */
        JUNCTION,
        /** Head fixed; supplies or absorbs flow (reservoir, tank, fixed pressure). */
        FIXED_HEAD,
        /** Head fixed in a closed loop without a supply of flow (fill or expansion point). */
        REFERENCE
    }

    /**
     * One named demand at a junction.
     *
     * @param name what the demand is, its category (e.g. {@code base}, {@code domestic}); demand
     *     cases scale demands by this name
     * @param flow flow out of the network (m³/s); negative for an inflow
     */
    public record Demand(String name, double flow) {
        /** Name of a demand given without one (a line list's plain {@code demand} column). */
        public static final String BASE = "base";

        public Demand {
            name = name == null || name.isBlank() ? BASE : name;
            InputException.requireFinite("demand " + name, flow);
        }
    }

    public Node {
        if (id == null || id.isBlank()) {
            throw new InputException("id", "every node needs an id");
        }
        Objects.requireNonNull(kind, "kind");
        name = name == null || name.isBlank() ? id : name;
        InputException.requireFinite(id + ".elevation", elevation);
        demands = List.copyOf(demands == null ? List.of() : demands);
        fixedHead = fixedHead == null ? OptionalDouble.empty() : fixedHead;
        x = x == null ? OptionalDouble.empty() : x;
        y = y == null ? OptionalDouble.empty() : y;
        if (kind != Kind.JUNCTION) {
            if (fixedHead.isEmpty()) {
                throw new InputException(id + ".fixed_head", "a fixed-head or reference node needs its head");
            }
            InputException.requireFinite(id + ".fixed_head", fixedHead.getAsDouble());
            if (!demands.isEmpty() && demands.stream().anyMatch(d -> d.flow() != 0)) {
                throw new InputException(
                        id + ".demand",
                        "a fixed-head node supplies what the network needs; give demands at junctions only");
            }
        } else if (fixedHead.isPresent()) {
            throw new InputException(id + ".fixed_head", "a junction has no fixed head; make it a fixed-head node");
        }
    }

    /** A junction with one demand. */
    public static Node junction(String id, double elevation, double demand) {
        return new Node(
                id,
                id,
                Kind.JUNCTION,
                elevation,
                demand == 0 ? List.of() : List.of(new Demand(Demand.BASE, demand)),
                OptionalDouble.empty(),
                OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** A fixed-head node (reservoir or tank level, or a fixed pressure at an elevation as a head). */
    public static Node fixedHead(String id, double elevation, double head) {
        return new Node(
                id,
                id,
                Kind.FIXED_HEAD,
                elevation,
                List.of(),
                OptionalDouble.of(head),
                OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** A closed loop's pressure reference at a head. */
    public static Node reference(String id, double elevation, double head) {
        return new Node(
                id,
                id,
                Kind.REFERENCE,
                elevation,
                List.of(),
                OptionalDouble.of(head),
                OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** Whether the head is given rather than solved for. */
    public boolean headIsFixed() {
        return kind != Kind.JUNCTION;
    }

    /** Sum of the demands (m³/s). */
    public double totalDemand() {
        double sum = 0;
        for (Demand d : demands) {
            sum += d.flow();
        }
        return sum;
    }

    /** The same node with its demands replaced. */
    public Node withDemands(List<Demand> newDemands) {
        return new Node(id, name, kind, elevation, newDemands, fixedHead, x, y);
    }

    /** The same node at a drawing position. */
    public Node at(double newX, double newY) {
        return new Node(
                id, name, kind, elevation, demands, fixedHead, OptionalDouble.of(newX), OptionalDouble.of(newY));
    }
}
