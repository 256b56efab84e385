package org.headway.network;

import java.util.List;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.system.ElementResult;

/**
 * A solved network: heads and pressures at nodes, flows and losses in links, and how the solve
 * went.
 *
 * @param nodes per node, in the network's order
 * @param links per link, in the network's order
 * @param iterations Newton iterations taken (all status rounds together)
 * @param converged whether every criterion was met; if not, the results are the best iterate
 * @param headChange largest head change of the last iteration (m)
 * @param energyResidual largest |h(Q) − (H_from − H_to)| over open links at the end (m)
 * @param continuityResidual largest |inflow − outflow − demand| over junctions at the end (m³/s)
 * @param cautions cautions of the elements, the pressures and the solve
 */
public record NetworkResult(
        List<NodeResult> nodes,
        List<LinkResult> links,
        int iterations,
        boolean converged,
        double headChange,
        double energyResidual,
        double continuityResidual,
        List<Caution> cautions) {

    public NetworkResult {
        nodes = List.copyOf(nodes);
        links = List.copyOf(links);
        cautions = List.copyOf(cautions);
    }

    /**
     * A node's result.
     *
     * @param id node id
     * @param head energy head (m); NaN for a node cut off by closed links
     * @param pressure gauge pressure ρ g (H − z) (Pa); NaN when the head is
     * @param elevation elevation (m)
     * @param demand total demand (m³/s) at a junction; at a fixed-head or reference node the flow it
     *     takes from the network (negative: it supplies)
     * @param fixed whether the head was given
     */
    public record NodeResult(String id, double head, double pressure, double elevation, double demand, boolean fixed) {}

    /**
     * A link's result.
     *
     * @param id link id
     * @param kind element kind
     * @param from from-node id
     * @param to to-node id
     * @param flow flow, positive from → to (m³/s)
     * @param velocity mean velocity in a pipe (m/s), NaN for other elements
     * @param headLoss head lost from → to (m): H_from − H_to; negative across a pump
     * @param frictionFactor Darcy friction factor of a pipe, NaN for other elements
     * @param status {@code open}, {@code closed} (set closed), or {@code shut} (a check valve or pump
     *     the solve found would pass reverse flow)
     * @param element the element's law evaluated at the flow, with its cautions (empty when closed)
     */
    public record LinkResult(
            String id,
            String kind,
            String from,
            String to,
            double flow,
            double velocity,
            double headLoss,
            double frictionFactor,
            String status,
            Optional<ElementResult> element) {}

    /** The node with an id. */
    public Optional<NodeResult> node(String id) {
        return nodes.stream().filter(n -> n.id().equals(id)).findFirst();
    }

    /** The link with an id. */
    public Optional<LinkResult> link(String id) {
        return links.stream().filter(l -> l.id().equals(id)).findFirst();
    }
}
