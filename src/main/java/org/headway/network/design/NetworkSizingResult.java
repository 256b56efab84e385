package org.headway.network.design;

import java.util.List;
import java.util.Optional;
import org.headway.caution.Caution;
import org.headway.network.IndexCircuit;
import org.headway.network.Network;
import org.headway.network.NetworkResult;

/**
 * A sized network: the size chosen for each pipe that was sized, every candidate with its figures
 * at the sized network's flows, and the head-budget check along the index circuit.
 *
 * @param maximumVelocity the velocity limit sized to (m/s)
 * @param maximumGradient the friction-gradient limit sized to (m of head per 100 m of pipe)
 * @param headBudget the largest loss allowed from a source to any terminal (m); infinite when none
 * @param settled whether a sizing round left every size unchanged (the sizes meet the limits at the
 *     flows they themselves produce)
 * @param rounds sizing rounds taken (each a network solve)
 * @param solves network solves in all (rounds, then head-budget steps)
 * @param links the sized pipes, in the network's order
 * @param sized the network with the chosen sizes
 * @param solved the solve of the sized network
 * @param indexPath the index circuit of the sized network, when one was traced
 * @param withinBudget whether the index circuit's loss is within the head budget
 * @param cautions cautions of the sizing
 */
public record NetworkSizingResult(
        double maximumVelocity,
        double maximumGradient,
        double headBudget,
        boolean settled,
        int rounds,
        int solves,
        List<LinkSizing> links,
        Network sized,
        NetworkResult solved,
        Optional<IndexCircuit.TerminalPath> indexPath,
        boolean withinBudget,
        List<Caution> cautions) {

    public NetworkSizingResult {
        links = List.copyOf(links);
        cautions = List.copyOf(cautions);
    }

    /** How a pipe's size was decided. */
    public enum Basis {
        /** the smallest candidate meeting the velocity and gradient limits */
        SMALLEST_MEETING_LIMITS("smallest size meeting the velocity and gradient limits"),
        /** made larger than that to bring the index circuit within the head budget */
        HEAD_BUDGET("upsized to bring the index circuit within the head budget"),
        /** no candidate meets the limits: the largest is kept and flagged */
        NONE_MEETS_LIMITS("no size meets the limits; the largest is kept"),
        /** sizes held from shrinking back after loop flows kept shifting */
        HELD("held at a larger size after loop flows kept shifting between rounds");

        private final String words;

        Basis(String words) {
            this.words = words;
        }

        /** The basis in words. */
        public String words() {
            return words;
        }

        /** The basis as a lower-case key. */
        public String key() {
            return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        }
    }

    /**
     * One sized pipe.
     *
     * @param id link id
     * @param givenSize the size the network was given with
     * @param givenDiameter its inner diameter (m)
     * @param chosenSize the size chosen
     * @param chosenDiameter its inner diameter (m)
     * @param flow the pipe's flow in the sized network (m³/s, positive from → to)
     * @param velocity its velocity at the chosen size (m/s)
     * @param gradient its friction loss per 100 m at the chosen size (m)
     * @param meetsLimits whether the chosen size meets the velocity and gradient limits
     * @param basis how the size was decided
     * @param candidates every candidate, smallest first, evaluated at the pipe's flow in the sized
     *     network
     */
    public record LinkSizing(
            String id,
            String givenSize,
            double givenDiameter,
            String chosenSize,
            double chosenDiameter,
            double flow,
            double velocity,
            double gradient,
            boolean meetsLimits,
            Basis basis,
            List<CandidateCheck> candidates) {
        public LinkSizing {
            candidates = List.copyOf(candidates);
        }
    }

    /**
     * One candidate size of a pipe at its flow.
     *
     * @param size the size's label
     * @param innerDiameter its inner diameter (m)
     * @param velocity velocity (m/s)
     * @param gradient friction loss per 100 m (m)
     * @param accepted whether it meets both limits
     * @param reasons why not (empty when accepted)
     */
    public record CandidateCheck(
            String size,
            double innerDiameter,
            double velocity,
            double gradient,
            boolean accepted,
            List<String> reasons) {
        public CandidateCheck {
            reasons = List.copyOf(reasons);
        }
    }

    /** The index circuit's loss (m), NaN without one. */
    public double indexLoss() {
        return indexPath.map(IndexCircuit.TerminalPath::headLoss).orElse(Double.NaN);
    }
}
