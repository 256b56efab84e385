package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.system.PumpElement;
import org.headway.system.SuctionHead;

/**
 * A pump's operating point in a solved network and the NPSH available at its suction there.
 *
 * <p>The pump is taken to sit at its suction (from) node's elevation z_s, and its inlet energy head
 * is that node's solved head H_s. Node heads in a network are energy heads with the velocity head
 * at nodes neglected (see {@link Network}), so H_s − z_s is the gauge pressure head plus velocity
 * head as the network knows it, and NPSHa = H_s − z_s + (p_atm − p_v)/(ρ g) ({@link
 * SuctionHead#available}); no velocity head is added on top, which would count it twice. The
 * margin is NPSHa − NPSHr at the pump's own flow.
 *
 * @param id the pump link's id
 * @param suctionNode the from node
 * @param dischargeNode the to node
 * @param status the link's status ({@code open}, {@code shut}, {@code closed})
 * @param flow flow through the pump (m³/s)
 * @param head head it adds, H_to − H_from (m)
 * @param efficiency pump efficiency (ratio) when its curve gives one; pump curves carry no
 *     efficiency yet, so it is empty
 * @param npshAvailable NPSH available at the suction at this flow (m); NaN when the fluid has no
 *     vapour pressure or the pump does not run
 * @param npshRequired NPSH required at this flow (m); NaN when the maker gave none
 * @param npshMargin NPSHa − NPSHr (m); NaN when either is unknown
 */
public record PumpDuty(
        String id,
        String suctionNode,
        String dischargeNode,
        String status,
        double flow,
        double head,
        OptionalDouble efficiency,
        double npshAvailable,
        double npshRequired,
        double npshMargin) {

    /**
     * The duties of a network's pumps and their cautions.
     *
     * @param pumps one per pump link, in link order
     * @param cautions cavitation risk (serious, naming the pump), NPSH required read outside the
     *     maker's points, NPSH unknown
     */
    public record Duties(List<PumpDuty> pumps, List<Caution> cautions) {
        public Duties {
            pumps = List.copyOf(pumps);
            cautions = List.copyOf(cautions);
        }
    }

    /**
     * Every pump's operating point and NPSH check.
     *
     * @param network the network solved
     * @param result its result
     * @param npshMargin margin NPSHa must exceed NPSHr by (m)
     */
    public static Duties of(Network network, NetworkResult result, double npshMargin) {
        List<PumpDuty> out = new ArrayList<>();
        List<Caution> cautions = new ArrayList<>();
        Map<String, Integer> index = network.nodeIndex();
        double rho = network.context().fluid().density();
        OptionalDouble vapour = network.context().fluid().vapourPressure();
        boolean unknownNoted = false;
        for (int k = 0; k < network.links().size(); k++) {
            Link link = network.links().get(k);
            if (!(link.element() instanceof PumpElement pump)) {
                continue;
            }
            NetworkResult.LinkResult lr = result.links().get(k);
            NetworkResult.NodeResult suction = result.nodes().get(index.get(link.from()));
            double q = lr.flow();
            double head = -lr.headLoss();
            double required = q > 0 ? pump.npshRequiredAt(q).orElse(Double.NaN) : Double.NaN;
            double available = Double.NaN;
            boolean running = lr.status().equals("open") && q > 0 && Double.isFinite(suction.head());
            if (running && vapour.isPresent()) {
                available = SuctionHead.available(
                        suction.head() - suction.elevation(), network.site().pressure(), vapour.getAsDouble(), rho);
                cautions.addAll(SuctionHead.check(
                        pump,
                        q,
                        available,
                        npshMargin,
                        "the suction of pump " + pump.id() + " (node " + link.from() + ")"));
            } else if (running && !unknownNoted) {
                unknownNoted = true;
                cautions.add(Caution.note(
                        "npsh-unknown",
                        "the fluid model gives no vapour pressure, so NPSH available at the pumps was not computed",
                        "fluid model"));
            }
            if (!running && lr.status().equals("shut")) {
                cautions.add(Caution.note(
                                "pump-not-running",
                                String.format(
                                        Locale.ROOT,
                                        "the pump is shut: the head across it (%.3g m) is above what it can lift at"
                                                + " zero flow",
                                        head),
                                "pump status rule")
                        .about(pump.id()));
            }
            out.add(new PumpDuty(
                    pump.id(),
                    link.from(),
                    link.to(),
                    lr.status(),
                    q,
                    head,
                    OptionalDouble.empty(),
                    available,
                    required,
                    available - required));
        }
        return new Duties(out, cautions);
    }
}
