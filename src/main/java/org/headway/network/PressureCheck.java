package org.headway.network;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.system.PressureLimits;

/**
 * Gauge pressures at a network's junctions over its demand cases, against minimum and maximum
 * limits: per junction the lowest and highest pressure and the case giving each, and every
 * pressure outside a limit. Fixed-head nodes hold their given pressure and are not checked;
 * junctions cut off by closed links (no pressure) are skipped in the case that cuts them off.
 *
 * @param ranges one per junction, in node order
 * @param violations every (junction, case) outside a limit, in case then node order
 * @param limits the limits checked against
 * @param cautions one warning per case and bound with violations, deferring to local codes
 */
public record PressureCheck(
        List<NodeRange> ranges, List<Violation> violations, PressureLimits limits, List<Caution> cautions) {

    /** Basis of the limit cautions. */
    public static final String BASIS =
            "limits as given for the project; the applicable local code and the supplier's service standard govern";

    public PressureCheck {
        ranges = List.copyOf(ranges);
        violations = List.copyOf(violations);
        cautions = List.copyOf(cautions);
    }

    /**
     * A junction's pressure range over the cases.
     *
     * @param node node id
     * @param minimumPressure lowest gauge pressure (Pa); NaN when no case gives one
     * @param minimumCase the case giving it
     * @param maximumPressure highest gauge pressure (Pa)
     * @param maximumCase the case giving it
     */
    public record NodeRange(
            String node, double minimumPressure, String minimumCase, double maximumPressure, String maximumCase) {}

    /**
     * A pressure outside a limit.
     *
     * @param node node id
     * @param caseName the case
     * @param pressure gauge pressure (Pa)
     * @param limit the limit it passes (Pa, gauge)
     * @param bound {@code minimum} or {@code maximum}
     */
    public record Violation(String node, String caseName, double pressure, double limit, String bound) {}

    /**
     * The check over solved cases.
     *
     * @param cases the solved cases, in order
     * @param limits the gauge limits (either may be unset)
     */
    public static PressureCheck of(List<CaseResult> cases, PressureLimits limits) {
        List<Violation> violations = new ArrayList<>();
        List<Caution> cautions = new ArrayList<>();
        Network first = cases.get(0).network();
        List<NodeRange> ranges = new ArrayList<>();
        double[] min = new double[first.nodes().size()];
        double[] max = new double[min.length];
        String[] minCase = new String[min.length];
        String[] maxCase = new String[min.length];
        java.util.Arrays.fill(min, Double.NaN);
        java.util.Arrays.fill(max, Double.NaN);
        for (CaseResult c : cases) {
            List<String> below = new ArrayList<>();
            List<String> above = new ArrayList<>();
            for (int i = 0; i < min.length; i++) {
                if (first.nodes().get(i).headIsFixed()) {
                    continue;
                }
                NetworkResult.NodeResult n = c.result().nodes().get(i);
                double p = n.pressure();
                if (!Double.isFinite(p)) {
                    continue;
                }
                if (Double.isNaN(min[i]) || p < min[i]) {
                    min[i] = p;
                    minCase[i] = c.name();
                }
                if (Double.isNaN(max[i]) || p > max[i]) {
                    max[i] = p;
                    maxCase[i] = c.name();
                }
                if (p < limits.minimumGauge()) {
                    violations.add(new Violation(n.id(), c.name(), p, limits.minimumGauge(), "minimum"));
                    below.add(n.id());
                }
                if (p > limits.maximumGauge()) {
                    violations.add(new Violation(n.id(), c.name(), p, limits.maximumGauge(), "maximum"));
                    above.add(n.id());
                }
            }
            if (!below.isEmpty()) {
                cautions.add(Caution.warning(
                        "pressure-below-minimum",
                        String.format(
                                Locale.ROOT,
                                "case %s: gauge pressure below the minimum %.4g kPa at %s",
                                c.name(),
                                limits.minimumGauge() / 1000.0,
                                list(below)),
                        BASIS));
            }
            if (!above.isEmpty()) {
                cautions.add(Caution.warning(
                        "pressure-above-maximum",
                        String.format(
                                Locale.ROOT,
                                "case %s: gauge pressure above the maximum %.4g kPa at %s",
                                c.name(),
                                limits.maximumGauge() / 1000.0,
                                list(above)),
                        BASIS));
            }
        }
        for (int i = 0; i < min.length; i++) {
            if (!first.nodes().get(i).headIsFixed()) {
                ranges.add(new NodeRange(first.nodes().get(i).id(), min[i], minCase[i], max[i], maxCase[i]));
            }
        }
        return new PressureCheck(ranges, violations, limits, cautions);
    }

    private static String list(List<String> ids) {
        return String.join(", ", ids.subList(0, Math.min(20, ids.size()))) + (ids.size() > 20 ? ", …" : "");
    }
}
