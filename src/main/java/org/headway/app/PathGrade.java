package org.headway.app;

import java.util.List;
import org.headway.chart.GradeLineChart;
import org.headway.network.GradeLinePath;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.system.Gravity;
import org.headway.system.PressureLimits;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;

/**
 * The grade line along a path the engineer picks in the network workspace, plain work with no
 * toolkit: the engine's {@link GradeLinePath} through the solved network, turned into the grade-line
 * chart in display units and a one-line summary.
 *
 * <p>As on the command line's index-circuit chart, the node heads are the energy grade and the
 * hydraulic grade in each pipe is that less the pipe's velocity head.
 *
 * @param path the path through the solved network
 * @param network the network solved
 * @param result its solve
 * @param limits the project's gauge-pressure limits
 */
record PathGrade(GradeLinePath path, Network network, NetworkResult result, PressureLimits limits) {

    /**
     * The path between two nodes of a solution.
     *
     * @throws org.headway.caution.InputException an unknown node or no path, in words
     */
    static PathGrade of(NetworkSolution s, String start, String end, GradeLinePath.Metric metric) {
        Network net = s.solved().network();
        return new PathGrade(GradeLinePath.between(net, s.result(), start, end, metric), net, s.result(), s.limits());
    }

    /** The chart's data in display units. */
    GradeLineChart.Spec spec(UnitSystem u) {
        List<GradeLinePath.Station> st = path.stations();
        List<GradeLinePath.Step> steps = path.steps();
        int m = steps.size();
        double[] distance = new double[m + 1];
        double[] elevation = new double[m + 1];
        double[] energyIn = new double[m];
        double[] energyOut = new double[m];
        double[] hydraulicIn = new double[m];
        double[] hydraulicOut = new double[m];
        for (int i = 0; i <= m; i++) {
            distance[i] = Quantities.fromSi(st.get(i).distance(), QuantityKind.LENGTH, u);
            elevation[i] = Quantities.fromSi(st.get(i).elevation(), QuantityKind.HEAD, u);
        }
        for (int i = 0; i < m; i++) {
            double v = velocity(steps.get(i).link());
            double vh = Double.isFinite(v) ? v * v / (2 * Gravity.STANDARD) : 0;
            energyIn[i] = Quantities.fromSi(st.get(i).head(), QuantityKind.HEAD, u);
            energyOut[i] = Quantities.fromSi(st.get(i + 1).head(), QuantityKind.HEAD, u);
            hydraulicIn[i] = Quantities.fromSi(st.get(i).head() - vh, QuantityKind.HEAD, u);
            hydraulicOut[i] = Quantities.fromSi(st.get(i + 1).head() - vh, QuantityKind.HEAD, u);
        }
        String lu = Quantities.unitSymbol(QuantityKind.LENGTH, u);
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        return new GradeLineChart.Spec(
                st.get(0).node() + " → " + st.get(m).node(),
                "distance along the path [" + lu + "]",
                "head, elevation [" + hu + "]",
                distance,
                elevation,
                energyIn,
                energyOut,
                hydraulicIn,
                hydraulicOut);
    }

    /** The pressure limits as heads at each junction (display units; NaN at fixed-head nodes), or null when none is set. */
    GradeLineChart.Band band(UnitSystem u) {
        if (!limits.isSet()) {
            return null;
        }
        double rho = network.context().fluid().density();
        int n = path.stations().size();
        double[] low = new double[n];
        double[] high = new double[n];
        for (int i = 0; i < n; i++) {
            double z = path.stations().get(i).elevation();
            // The limits hold at junctions; a reservoir or fixed pressure is given, not checked.
            boolean fixed = result.node(path.stations().get(i).node())
                    .map(NetworkResult.NodeResult::fixed)
                    .orElse(false);
            if (fixed) {
                low[i] = Double.NaN;
                high[i] = Double.NaN;
                continue;
            }
            low[i] = Double.isFinite(limits.minimumGauge())
                    ? Quantities.fromSi(
                            GradeLinePath.headAtPressure(z, limits.minimumGauge(), rho), QuantityKind.HEAD, u)
                    : Double.NaN;
            high[i] = Double.isFinite(limits.maximumGauge())
                    ? Quantities.fromSi(
                            GradeLinePath.headAtPressure(z, limits.maximumGauge(), rho), QuantityKind.HEAD, u)
                    : Double.NaN;
        }
        return new GradeLineChart.Band("permitted pressure", low, high);
    }

    /** The chart, with the pressure band when asked for and the project sets limits. */
    JFreeChart chart(UnitSystem u, boolean withLimits) {
        return GradeLineChart.build(spec(u), withLimits ? band(u) : null);
    }

    /** One line: the route, its length and the head it loses. */
    String summary(UnitSystem u) {
        List<GradeLinePath.Station> st = path.stations();
        GradeLinePath.Station a = st.get(0);
        GradeLinePath.Station b = st.get(st.size() - 1);
        int links = path.steps().size();
        return a.node() + " → " + b.node() + ": " + links + (links == 1 ? " link, " : " links, ")
                + Quantities.format(path.length(), QuantityKind.LENGTH, u) + "; head "
                + Quantities.format(a.head(), QuantityKind.HEAD, u) + " → "
                + Quantities.format(b.head(), QuantityKind.HEAD, u) + " (drop "
                + Quantities.format(a.head() - b.head(), QuantityKind.HEAD, u) + "); via "
                + String.join(
                        ", ",
                        path.steps().stream().map(GradeLinePath.Step::link).toList());
    }

    private double velocity(String link) {
        return result.link(link).map(NetworkResult.LinkResult::velocity).orElse(Double.NaN);
    }
}
