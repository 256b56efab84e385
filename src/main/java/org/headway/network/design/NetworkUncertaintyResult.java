package org.headway.network.design;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.network.NetworkResult;
import org.headway.system.UncertaintyBand.Band;

/**
 * The range of each node's pressure and head and of each pump's duty over the pipes' roughness
 * ranges and a demand multiplier, and how it was found.
 *
 * <p>Solves are labelled {@code low corner}, {@code high corner}, {@code nominal}, {@code sample 1}
 * … {@code sample N}; where several give the same extreme, the first in that order is named.
 *
 * @param method corners or Monte Carlo
 * @param reason why that method, in words, with the sampling convention for Monte Carlo
 * @param demandLow the low demand multiplier (ratio)
 * @param demandHigh the high demand multiplier (ratio)
 * @param randomSamples random samples drawn (0 for corners)
 * @param seed the seed of the random samples (as given, also for corners, where it is unused)
 * @param solves network solves made: the nominal, the two corners and the random samples
 * @param failedSolves solves that did not converge; they are left out of every range
 * @param nodes one per node, in the network's order
 * @param pumps one per pump link, in link order
 * @param nominal the solve of the network as given (its own cautions are not repeated here)
 * @param cautions cautions of the uncertainty study, the standing review caution last
 */
public record NetworkUncertaintyResult(
        NetworkUncertainty.Method method,
        String reason,
        double demandLow,
        double demandHigh,
        int randomSamples,
        long seed,
        int solves,
        int failedSolves,
        List<NodeRange> nodes,
        List<PumpRange> pumps,
        NetworkResult nominal,
        List<Caution> cautions) {

    public NetworkUncertaintyResult {
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(nominal, "nominal");
        reason = reason == null ? "" : reason;
        nodes = List.copyOf(nodes);
        pumps = List.copyOf(pumps);
        cautions = List.copyOf(cautions);
    }

    /**
     * A node's range. The head's extremes come from the same solves as the pressure's (p = ρ g (H −
     * z) with z fixed).
     *
     * @param id node id
     * @param fixed whether the node's head is given (its range is then that head)
     * @param pressure gauge pressure: nominal, low, high (Pa); NaN where no converged solve gave a head
     * @param head energy head: nominal, low, high (m)
     * @param lowAt the solve that gave the low pressure, e.g. {@code low corner} or {@code sample 17}
     * @param highAt the solve that gave the high pressure
     * @param solvesWithoutHead converged solves in which the node was cut off by shut or closed links
     *     and had no head (left out of its range)
     */
    public record NodeRange(
            String id, boolean fixed, Band pressure, Band head, String lowAt, String highAt, int solvesWithoutHead) {}

    /**
     * A pump link's range of duty.
     *
     * @param id pump link id
     * @param flow flow through it: nominal, low, high (m³/s); 0 in a solve where it is shut
     * @param head head across it H_to − H_from: nominal, low, high (m); where it is shut, the head it
     *     faces
     * @param lowFlowAt the solve that gave the low flow
     * @param highFlowAt the solve that gave the high flow
     * @param shutSolves converged solves in which the pump was shut
     */
    public record PumpRange(String id, Band flow, Band head, String lowFlowAt, String highFlowAt, int shutSolves) {}

    /** The range of the node with an id. */
    public Optional<NodeRange> node(String id) {
        return nodes.stream().filter(n -> n.id().equals(id)).findFirst();
    }

    /** The range of the pump with an id. */
    public Optional<PumpRange> pump(String id) {
        return pumps.stream().filter(p -> p.id().equals(id)).findFirst();
    }
}
