package org.headway.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.headway.chart.GradeLineChart;
import org.headway.network.CaseResult;
import org.headway.network.IndexCircuit;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkStudy;
import org.headway.network.PressureCheck;
import org.headway.network.PumpDuty;
import org.headway.project.AtomicFiles;
import org.headway.report.SafeText;
import org.headway.system.Gravity;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;

/**
 * A solved network study as JSON, text and CSV: the base solve with the keys of {@link
 * NetworkOutput} unchanged, plus pumps, the index circuit and terminal paths, and with demand cases
 * the cases and the pressure table.
 */
final class NetworkStudyOutput {

    /** Long table of node results by case. */
    static final String[] CASE_NODE_HEADER = {"case", "node", "head [m]", "pressure [Pa]", "demand [m3/s]", "check"};

    /** Long table of link results by case. */
    static final String[] CASE_LINK_HEADER = {"case", "link", "flow [m3/s]", "velocity [m/s]", "head_loss [m]", "status"
    };

    /** Pressure check table. */
    static final String[] PRESSURE_CHECK_HEADER = {
        "node", "minimum_pressure [Pa]", "minimum_case", "maximum_pressure [Pa]", "maximum_case", "violations"
    };

    /** Pump table. */
    static final String[] PUMP_HEADER = {
        "case",
        "pump",
        "suction_node",
        "discharge_node",
        "status",
        "flow [m3/s]",
        "head [m]",
        "npsh_available [m]",
        "npsh_required [m]",
        "npsh_margin [m]"
    };

    /** Terminal path table. */
    static final String[] TERMINAL_HEADER = {
        "case", "terminal", "source", "head_loss [m]", "length [m]", "index_circuit", "links"
    };

    /** Terminal paths listed in the text output; the rest are counted. */
    static final int TEXT_PATHS = 20;

    private NetworkStudyOutput() {}

    // ---------------------------------------------------------------- JSON

    static String json(NetworkStudy study, NetworkStudy.Result r) {
        return json(study, r, NetworkDesign.Results.NONE);
    }

    /** The study's JSON with the design runs (balancing, fire flow) on the base network. */
    static String json(NetworkStudy study, NetworkStudy.Result r, NetworkDesign.Results design) {
        CaseResult base = r.base();
        ObjectNode root = NetworkOutput.tree(base.network(), base.result(), design);
        java.util.List<org.headway.caution.Caution> all = new java.util.ArrayList<>(r.cautions());
        all.addAll(design.cautions());
        RunJson.putCautions(root, all);
        putPumps(root, base.pumps());
        putCircuit(root, base.circuit());
        ArrayNode paths = root.putArray("terminal_paths");
        for (IndexCircuit.TerminalPath p : base.circuit().paths()) {
            ObjectNode o = paths.addObject();
            o.put("terminal", p.terminal());
            o.put("source", p.source());
            NetworkOutput.put(o, "head_loss_m", p.headLoss());
            NetworkOutput.put(o, "length_m", p.length());
        }
        if (!r.cases().isEmpty()) {
            ArrayNode cases = root.putArray("cases");
            for (CaseResult c : r.cases()) {
                ObjectNode o = cases.addObject();
                o.put("name", c.name());
                o.put("converged", c.result().converged());
                o.put("iterations", c.result().iterations());
                ArrayNode nodes = o.putArray("nodes");
                for (NetworkResult.NodeResult n : c.result().nodes()) {
                    ObjectNode x = nodes.addObject();
                    x.put("id", n.id());
                    NetworkOutput.put(x, "head_m", n.head());
                    NetworkOutput.put(x, "pressure_pa", n.pressure());
                    NetworkOutput.put(x, "demand_m3_per_s", n.demand());
                }
                ArrayNode links = o.putArray("links");
                for (NetworkResult.LinkResult l : c.result().links()) {
                    ObjectNode x = links.addObject();
                    x.put("id", l.id());
                    NetworkOutput.put(x, "flow_m3_per_s", l.flow());
                    NetworkOutput.put(x, "velocity_m_per_s", l.velocity());
                    NetworkOutput.put(x, "head_loss_m", l.headLoss());
                    x.put("status", l.status());
                }
                putPumps(o, c.pumps());
                putCircuit(o, c.circuit());
            }
        }
        r.pressureCheck().ifPresent(p -> {
            ObjectNode o = root.putObject("pressure_checks");
            NetworkOutput.put(o, "minimum_pa", p.limits().minimumGauge());
            NetworkOutput.put(o, "maximum_pa", p.limits().maximumGauge());
            ArrayNode nodes = o.putArray("nodes");
            for (PressureCheck.NodeRange n : p.ranges()) {
                ObjectNode x = nodes.addObject();
                x.put("id", n.node());
                NetworkOutput.put(x, "minimum_pressure_pa", n.minimumPressure());
                x.put("minimum_case", n.minimumCase());
                NetworkOutput.put(x, "maximum_pressure_pa", n.maximumPressure());
                x.put("maximum_case", n.maximumCase());
            }
            ArrayNode violations = o.putArray("violations");
            for (PressureCheck.Violation v : p.violations()) {
                ObjectNode x = violations.addObject();
                x.put("node", v.node());
                x.put("case", v.caseName());
                NetworkOutput.put(x, "pressure_pa", v.pressure());
                NetworkOutput.put(x, "limit_pa", v.limit());
                x.put("bound", v.bound());
            }
        });
        return NetworkOutput.write(root);
    }

    private static void putPumps(ObjectNode root, PumpDuty.Duties duties) {
        ArrayNode pumps = root.putArray("pumps");
        for (PumpDuty d : duties.pumps()) {
            ObjectNode o = pumps.addObject();
            o.put("id", d.id());
            o.put("suction_node", d.suctionNode());
            o.put("discharge_node", d.dischargeNode());
            o.put("status", d.status());
            NetworkOutput.put(o, "flow_m3_per_s", d.flow());
            NetworkOutput.put(o, "head_m", d.head());
            NetworkOutput.put(o, "efficiency", d.efficiency().orElse(Double.NaN));
            NetworkOutput.put(o, "npsh_available_m", d.npshAvailable());
            NetworkOutput.put(o, "npsh_required_m", d.npshRequired());
            NetworkOutput.put(o, "npsh_margin_m", d.npshMargin());
        }
    }

    private static void putCircuit(ObjectNode root, IndexCircuit circuit) {
        if (circuit.index().isEmpty()) {
            root.putNull("index_circuit");
            return;
        }
        IndexCircuit.TerminalPath p = circuit.index().get();
        ObjectNode o = root.putObject("index_circuit");
        o.put("terminal", p.terminal());
        o.put("source", p.source());
        ArrayNode links = o.putArray("links");
        p.links().forEach(links::add);
        ArrayNode nodes = o.putArray("nodes");
        p.nodes().forEach(nodes::add);
        NetworkOutput.put(o, "head_loss_m", p.headLoss());
        NetworkOutput.put(o, "length_m", p.length());
    }

    // ---------------------------------------------------------------- text

    static void text(PrintWriter out, NetworkStudy study, NetworkStudy.Result r, UnitSystem u) {
        text(out, study, r, u, NetworkDesign.Results.NONE);
    }

    /** The study's text with the design runs (balancing, fire flow) on the base network. */
    static void text(
            PrintWriter out, NetworkStudy study, NetworkStudy.Result r, UnitSystem u, NetworkDesign.Results design) {
        CaseResult base = r.base();
        NetworkOutput.tables(out, base.network(), base.result(), u, design);
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        pumpsText(out, base.pumps(), u, hu, qu);
        circuitText(out, base.circuit(), u, hu);
        if (!r.cases().isEmpty()) {
            out.println();
            out.println("Demand cases:");
            out.printf(Locale.ROOT, "  %-16s %-13s %10s  %s%n", "case", "solve", "iterations", "index circuit");
            for (CaseResult c : r.cases()) {
                String index = c.circuit()
                        .index()
                        .map(p -> p.source() + " → " + p.terminal() + ", "
                                + Quantities.format(p.headLoss(), QuantityKind.HEAD, u))
                        .orElse("—");
                out.printf(
                        Locale.ROOT,
                        "  %-16s %-13s %10d  %s%n",
                        NetworkOutput.clip(c.name(), 16),
                        c.result().converged() ? "converged" : "NOT CONVERGED",
                        c.result().iterations(),
                        index);
                for (PumpDuty d : c.pumps().pumps()) {
                    out.printf(
                            Locale.ROOT,
                            "  %-16s pump %s: Q %s %s, H %s %s, NPSHa %s %s%n",
                            "",
                            d.id(),
                            NetworkOutput.q(d.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                            qu,
                            NetworkOutput.q(d.head(), QuantityKind.HEAD, u),
                            hu,
                            NetworkOutput.q(d.npshAvailable(), QuantityKind.HEAD, u),
                            hu);
                }
            }
        }
        r.pressureCheck().ifPresent(p -> pressureText(out, r, p, u, pu));
        java.util.List<org.headway.caution.Caution> all = new java.util.ArrayList<>(r.cautions());
        all.addAll(design.cautions());
        NetworkOutput.cautions(out, all);
    }

    private static void pumpsText(PrintWriter out, PumpDuty.Duties duties, UnitSystem u, String hu, String qu) {
        if (duties.pumps().isEmpty()) {
            return;
        }
        out.println();
        out.println("Pumps at their operating points (NPSH available at the suction node, at this flow):");
        out.printf(
                Locale.ROOT,
                "  %-14s %-12s %11s %9s %10s %10s %10s  %s%n",
                "pump",
                "suction",
                "Q [" + qu + "]",
                "H [" + hu + "]",
                "NPSHa [" + hu + "]",
                "NPSHr [" + hu + "]",
                "margin",
                "status");
        for (PumpDuty d : duties.pumps()) {
            out.printf(
                    Locale.ROOT,
                    "  %-14s %-12s %11s %9s %10s %10s %10s  %s%n",
                    NetworkOutput.clip(d.id(), 14),
                    NetworkOutput.clip(d.suctionNode(), 12),
                    NetworkOutput.q(d.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    NetworkOutput.q(d.head(), QuantityKind.HEAD, u),
                    NetworkOutput.q(d.npshAvailable(), QuantityKind.HEAD, u),
                    NetworkOutput.q(d.npshRequired(), QuantityKind.HEAD, u),
                    NetworkOutput.q(d.npshMargin(), QuantityKind.HEAD, u),
                    d.status());
        }
    }

    private static void circuitText(PrintWriter out, IndexCircuit circuit, UnitSystem u, String hu) {
        if (circuit.paths().isEmpty()) {
            return;
        }
        IndexCircuit.TerminalPath index = circuit.index().orElseThrow();
        out.println();
        out.printf(
                Locale.ROOT,
                "Index circuit: %s → %s, head loss %s over %s of pipe%n",
                index.source(),
                index.terminal(),
                Quantities.format(index.headLoss(), QuantityKind.HEAD, u),
                Quantities.format(index.length(), QuantityKind.LENGTH, u));
        List<String> route = new ArrayList<>();
        for (int i = 0; i < index.links().size(); i++) {
            route.add(index.nodes().get(i));
            route.add("[" + index.links().get(i) + "]");
        }
        route.add(index.nodes().get(index.nodes().size() - 1));
        out.println("  route: " + String.join(" ", route));
        out.printf(Locale.ROOT, "  %-16s %-16s %12s%n", "terminal", "source", "loss [" + hu + "]");
        List<IndexCircuit.TerminalPath> shown =
                circuit.paths().subList(0, Math.min(TEXT_PATHS, circuit.paths().size()));
        if (!shown.contains(index)) {
            shown = new ArrayList<>(shown);
            shown.add(index);
        }
        for (IndexCircuit.TerminalPath p : shown) {
            out.printf(
                    Locale.ROOT,
                    "  %-16s %-16s %12s%s%n",
                    NetworkOutput.clip(p.terminal(), 16),
                    NetworkOutput.clip(p.source(), 16),
                    NetworkOutput.q(p.headLoss(), QuantityKind.HEAD, u),
                    p == index ? "  ← index circuit" : "");
        }
        if (circuit.paths().size() > shown.size()) {
            out.printf(
                    Locale.ROOT,
                    "  … and %d more terminals (all in the JSON and in --output's network-terminal-paths.csv)%n",
                    circuit.paths().size() - shown.size());
        }
    }

    private static void pressureText(PrintWriter out, NetworkStudy.Result r, PressureCheck p, UnitSystem u, String pu) {
        List<CaseResult> checked = r.cases().isEmpty() ? List.of(r.base()) : r.cases();
        out.println();
        out.printf(
                Locale.ROOT,
                "Junction pressures [%s] by case (limits: minimum %s, maximum %s;%n  \"<\" below the minimum,"
                        + " \">\" above the maximum):%n",
                pu,
                Double.isFinite(p.limits().minimumGauge())
                        ? Quantities.format(p.limits().minimumGauge(), QuantityKind.PRESSURE, u)
                        : "none",
                Double.isFinite(p.limits().maximumGauge())
                        ? Quantities.format(p.limits().maximumGauge(), QuantityKind.PRESSURE, u)
                        : "none");
        StringBuilder head = new StringBuilder(String.format(Locale.ROOT, "  %-16s", "node"));
        for (CaseResult c : checked) {
            head.append(String.format(Locale.ROOT, " %12s", NetworkOutput.clip(c.name(), 12)));
        }
        out.println(head);
        Map<String, Integer> index = checked.get(0).network().nodeIndex();
        for (PressureCheck.NodeRange n : p.ranges()) {
            StringBuilder line =
                    new StringBuilder(String.format(Locale.ROOT, "  %-16s", NetworkOutput.clip(n.node(), 16)));
            int i = index.get(n.node());
            for (CaseResult c : checked) {
                double pa = c.result().nodes().get(i).pressure();
                String flag =
                        pa < p.limits().minimumGauge() ? "<" : pa > p.limits().maximumGauge() ? ">" : " ";
                line.append(String.format(Locale.ROOT, " %11s%s", NetworkOutput.q(pa, QuantityKind.PRESSURE, u), flag));
            }
            out.println(line);
        }
        out.printf(
                Locale.ROOT,
                "  %d pressure(s) outside the limits; the applicable local code and the supplier's service"
                        + " standard govern%n",
                p.violations().size());
    }

    // ---------------------------------------------------------------- CSV

    private static CSVPrinter printer(Appendable out) throws IOException {
        return new CSVPrinter(
                out, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
    }

    static void caseNodesCsv(NetworkStudy.Result r, Appendable out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord((Object[]) CASE_NODE_HEADER);
        var limits = r.pressureCheck().map(PressureCheck::limits).orElse(org.headway.system.PressureLimits.NONE);
        for (CaseResult c : r.cases()) {
            for (int i = 0; i < c.result().nodes().size(); i++) {
                NetworkResult.NodeResult n = c.result().nodes().get(i);
                String check = n.fixed() || !Double.isFinite(n.pressure())
                        ? ""
                        : n.pressure() < limits.minimumGauge()
                                ? "below minimum"
                                : n.pressure() > limits.maximumGauge() ? "above maximum" : "ok";
                p.printRecord(
                        SafeText.cell(c.name()),
                        SafeText.cell(n.id()),
                        NetworkOutput.num(n.head()),
                        NetworkOutput.num(n.pressure()),
                        NetworkOutput.num(n.demand()),
                        check);
            }
        }
        p.flush();
    }

    static void caseLinksCsv(NetworkStudy.Result r, Appendable out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord((Object[]) CASE_LINK_HEADER);
        for (CaseResult c : r.cases()) {
            for (NetworkResult.LinkResult l : c.result().links()) {
                p.printRecord(
                        SafeText.cell(c.name()),
                        SafeText.cell(l.id()),
                        NetworkOutput.num(l.flow()),
                        NetworkOutput.num(l.velocity()),
                        NetworkOutput.num(l.headLoss()),
                        l.status());
            }
        }
        p.flush();
    }

    static void pressureChecksCsv(PressureCheck check, Appendable out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord((Object[]) PRESSURE_CHECK_HEADER);
        for (PressureCheck.NodeRange n : check.ranges()) {
            List<String> v = new ArrayList<>();
            for (PressureCheck.Violation x : check.violations()) {
                if (x.node().equals(n.node())) {
                    v.add(x.caseName() + " " + x.bound());
                }
            }
            p.printRecord(
                    SafeText.cell(n.node()),
                    NetworkOutput.num(n.minimumPressure()),
                    SafeText.cell(n.minimumCase() == null ? "" : n.minimumCase()),
                    NetworkOutput.num(n.maximumPressure()),
                    SafeText.cell(n.maximumCase() == null ? "" : n.maximumCase()),
                    SafeText.cell(String.join("; ", v)));
        }
        p.flush();
    }

    private static List<CaseResult> all(NetworkStudy.Result r) {
        List<CaseResult> all = new ArrayList<>();
        all.add(r.base());
        all.addAll(r.cases());
        return all;
    }

    static void pumpsCsv(NetworkStudy.Result r, Appendable out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord((Object[]) PUMP_HEADER);
        for (CaseResult c : all(r)) {
            for (PumpDuty d : c.pumps().pumps()) {
                p.printRecord(
                        SafeText.cell(c.name()),
                        SafeText.cell(d.id()),
                        SafeText.cell(d.suctionNode()),
                        SafeText.cell(d.dischargeNode()),
                        d.status(),
                        NetworkOutput.num(d.flow()),
                        NetworkOutput.num(d.head()),
                        NetworkOutput.num(d.npshAvailable()),
                        NetworkOutput.num(d.npshRequired()),
                        NetworkOutput.num(d.npshMargin()));
            }
        }
        p.flush();
    }

    static void terminalPathsCsv(NetworkStudy.Result r, Appendable out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord((Object[]) TERMINAL_HEADER);
        for (CaseResult c : all(r)) {
            IndexCircuit.TerminalPath index = c.circuit().index().orElse(null);
            for (IndexCircuit.TerminalPath t : c.circuit().paths()) {
                p.printRecord(
                        SafeText.cell(c.name()),
                        SafeText.cell(t.terminal()),
                        SafeText.cell(t.source()),
                        NetworkOutput.num(t.headLoss()),
                        NetworkOutput.num(t.length()),
                        t == index ? "yes" : "no",
                        SafeText.cell(String.join(" ", t.links())));
            }
        }
        p.flush();
    }

    // ---------------------------------------------------------------- chart

    /**
     * The grade-line chart along the base solve's index circuit: energy grade (the node heads), the
     * hydraulic grade in each pipe (energy grade less its velocity head) and the node elevations,
     * against cumulative pipe length. Returns false when there is no index circuit.
     */
    static boolean indexChart(NetworkStudy.Result r, UnitSystem u, Path file, boolean force) {
        CaseResult base = r.base();
        if (base.circuit().index().isEmpty()) {
            return false;
        }
        JFreeChart chart = GradeLineChart.build(indexChartSpec(base, u));
        AtomicFiles.write(file, force, out -> ChartUtils.writeChartAsPNG(out, chart, 1000, 600));
        return true;
    }

    static GradeLineChart.Spec indexChartSpec(CaseResult c, UnitSystem u) {
        IndexCircuit.TerminalPath path = c.circuit().index().orElseThrow();
        Network net = c.network();
        Map<String, Integer> nodeIndex = net.nodeIndex();
        Map<String, Integer> linkIndex = new java.util.HashMap<>();
        for (int k = 0; k < net.links().size(); k++) {
            linkIndex.put(net.links().get(k).id(), k);
        }
        int m = path.links().size();
        double[] distance = new double[m + 1];
        double[] elevation = new double[m + 1];
        double[] energyIn = new double[m];
        double[] energyOut = new double[m];
        double[] hydraulicIn = new double[m];
        double[] hydraulicOut = new double[m];
        for (int i = 0; i <= m; i++) {
            int n = nodeIndex.get(path.nodes().get(i));
            elevation[i] = Quantities.fromSi(net.nodes().get(n).elevation(), QuantityKind.HEAD, u);
        }
        double along = 0;
        for (int i = 0; i < m; i++) {
            int k = linkIndex.get(path.links().get(i));
            double hIn =
                    c.result().nodes().get(nodeIndex.get(path.nodes().get(i))).head();
            double hOut = c.result()
                    .nodes()
                    .get(nodeIndex.get(path.nodes().get(i + 1)))
                    .head();
            double v = c.result().links().get(k).velocity();
            double velocityHead = Double.isFinite(v) ? v * v / (2 * Gravity.STANDARD) : 0;
            if (net.links().get(k).element() instanceof org.headway.system.Segment s) {
                along += s.length();
            }
            distance[i + 1] = Quantities.fromSi(along, QuantityKind.LENGTH, u);
            energyIn[i] = Quantities.fromSi(hIn, QuantityKind.HEAD, u);
            energyOut[i] = Quantities.fromSi(hOut, QuantityKind.HEAD, u);
            hydraulicIn[i] = Quantities.fromSi(hIn - velocityHead, QuantityKind.HEAD, u);
            hydraulicOut[i] = Quantities.fromSi(hOut - velocityHead, QuantityKind.HEAD, u);
        }
        String lu = Quantities.unitSymbol(QuantityKind.LENGTH, u);
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        return new GradeLineChart.Spec(
                "Index circuit " + path.source() + " → " + path.terminal(),
                "distance along the index circuit [" + lu + "]",
                "head, elevation [" + hu + "]",
                distance,
                elevation,
                energyIn,
                energyOut,
                hydraulicIn,
                hydraulicOut);
    }
}
