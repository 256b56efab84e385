package org.headway.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.headway.caution.Caution;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.design.BalancingResult;
import org.headway.network.design.FireFlow;
import org.headway.network.design.FireFlowResult;
import org.headway.network.design.NetworkSizingResult;
import org.headway.network.design.NetworkUncertaintyResult;
import org.headway.report.SafeText;
import org.headway.system.UncertaintyBand;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/** A solved network as JSON, CSV or text: the same values in each, SI in JSON and CSV. */
final class NetworkOutput {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** Node CSV columns, units in brackets. */
    static final String[] NODE_HEADER = {
        "id", "head [m]", "pressure [Pa]", "elevation [m]", "demand [m3/s]", "fixed_head"
    };

    /** Link CSV columns, units in brackets. */
    static final String[] LINK_HEADER = {
        "id", "kind", "from", "to", "flow [m3/s]", "velocity [m/s]", "head_loss [m]", "friction_factor [-]", "status"
    };

    private NetworkOutput() {}

    static void put(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }

    static String json(Network net, NetworkResult r) {
        return write(tree(net, r));
    }

    static String json(Network net, NetworkResult r, NetworkDesign.Results design) {
        return write(tree(net, r, design));
    }

    /** The JSON text of a tree, indented. */
    static String write(ObjectNode root) {
        try {
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** A fresh JSON object of this output's mapper. */
    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    /** The JSON tree of one solve, the keys of {@link #json}. */
    static ObjectNode tree(Network net, NetworkResult r) {
        return tree(net, r, NetworkDesign.Results.NONE);
    }

    /** The JSON tree of one solve with the design runs (balancing, fire flow) that ran on it. */
    static ObjectNode tree(Network net, NetworkResult r, NetworkDesign.Results design) {
        BalancingResult balance = design.balance();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("title", net.title());
        root.put("fluid", net.context().fluid().fluid());
        root.put("density_kg_per_m3", net.context().fluid().density());
        root.put("dynamic_viscosity_pa_s", net.context().fluid().dynamicViscosity());
        root.put("friction", net.context().friction().id());
        root.put("barometric_pressure_pa", net.site().pressure());
        root.put("converged", r.converged());
        root.put("iterations", r.iterations());
        ObjectNode res = root.putObject("residuals");
        put(res, "head_change_m", r.headChange());
        put(res, "energy_m", r.energyResidual());
        put(res, "continuity_m3_per_s", r.continuityResidual());
        res.put("head_tolerance_m", NetworkSolver.DEFAULT_HEAD_TOLERANCE);
        ArrayNode nodes = root.putArray("nodes");
        for (NetworkResult.NodeResult n : r.nodes()) {
            ObjectNode o = nodes.addObject();
            o.put("id", n.id());
            put(o, "head_m", n.head());
            put(o, "pressure_pa", n.pressure());
            put(o, "elevation_m", n.elevation());
            put(o, "demand_m3_per_s", n.demand());
            o.put("fixed_head", n.fixed());
        }
        ArrayNode links = root.putArray("links");
        for (NetworkResult.LinkResult l : r.links()) {
            ObjectNode o = links.addObject();
            o.put("id", l.id());
            o.put("kind", l.kind());
            o.put("from", l.from());
            o.put("to", l.to());
            put(o, "flow_m3_per_s", l.flow());
            put(o, "velocity_m_per_s", l.velocity());
            put(o, "head_loss_m", l.headLoss());
            put(o, "friction_factor", l.frictionFactor());
            o.put("status", l.status());
            l.element().ifPresent(e -> o.put("law", e.law()));
            if (balance != null) {
                var v = balance.valve(l.id());
                put(
                        o,
                        "balancing_kv",
                        v.map(BalancingResult.BalancedValve::flowCoefficient).orElse(Double.NaN));
                put(
                        o,
                        "balancing_setting",
                        v.map(BalancingResult.BalancedValve::setting).orElse(Double.NaN));
            }
        }
        List<Caution> cautions = new ArrayList<>(r.cautions());
        cautions.addAll(design.cautions());
        RunJson.putCautions(root, cautions);
        if (balance != null) {
            balanceJson(root.putObject("balance"), balance);
        }
        FireFlowResult fire = design.fireFlow();
        if (fire != null) {
            put(root, "fire_flow_m3_per_s", fire.fireFlow());
            putText(root, "fire_flow_limiting_node", fire.limitingNode());
            ObjectNode f = root.putObject("fire_flow");
            f.put("node", fire.node());
            f.put("residual_pressure_pa", fire.residualPressure());
            f.put("found", fire.found());
            put(f, "fire_flow_m3_per_s", fire.fireFlow());
            putText(f, "limiting_node", fire.limitingNode());
            put(f, "residual_pressure_at_limit_pa", fire.residualAtLimit());
            put(f, "base_minimum_pressure_pa", fire.baseMinimumPressure());
            putText(f, "base_limiting_node", fire.baseLimitingNode());
            f.put("solves", fire.solves());
            f.put("head_accuracy_m", FireFlow.HEAD_ACCURACY);
            RunJson.putCautions(f, fire.cautions());
        }
        if (design.sizing() != null) {
            sizingJson(root.putObject("sizing"), design.sizing(), design.notSized());
        }
        if (design.uncertainty() != null) {
            uncertaintyJson(root.putObject("uncertainty"), design.uncertainty());
        }
        return root;
    }

    private static void band(ObjectNode o, String prefix, String unit, UncertaintyBand.Band b) {
        put(o, prefix + "_nominal_" + unit, b.nominal());
        put(o, prefix + "_low_" + unit, b.low());
        put(o, prefix + "_high_" + unit, b.high());
    }

    private static void uncertaintyJson(ObjectNode o, NetworkUncertaintyResult u) {
        o.put("method", u.method().id());
        o.put("reason", u.reason());
        o.put("demand_low", u.demandLow());
        o.put("demand_high", u.demandHigh());
        o.put("samples", u.randomSamples());
        o.put("seed", u.seed());
        o.put("solves", u.solves());
        o.put("failed_solves", u.failedSolves());
        ArrayNode nodes = o.putArray("nodes");
        for (NetworkUncertaintyResult.NodeRange n : u.nodes()) {
            ObjectNode x = nodes.addObject();
            x.put("id", n.id());
            x.put("fixed_head", n.fixed());
            band(x, "pressure", "pa", n.pressure());
            band(x, "head", "m", n.head());
            putText(x, "low_at", n.lowAt());
            putText(x, "high_at", n.highAt());
            x.put("solves_without_head", n.solvesWithoutHead());
        }
        ArrayNode pumps = o.putArray("pumps");
        for (NetworkUncertaintyResult.PumpRange p : u.pumps()) {
            ObjectNode x = pumps.addObject();
            x.put("id", p.id());
            band(x, "flow", "m3_per_s", p.flow());
            band(x, "head", "m", p.head());
            putText(x, "low_flow_at", p.lowFlowAt());
            putText(x, "high_flow_at", p.highFlowAt());
            x.put("shut_solves", p.shutSolves());
        }
        RunJson.putCautions(o, u.cautions());
    }

    /** Columns of the uncertainty CSV's node table. */
    static final String[] UNCERTAINTY_NODE_HEADER = {
        "node",
        "pressure_nominal [Pa]",
        "pressure_low [Pa]",
        "pressure_high [Pa]",
        "head_nominal [m]",
        "head_low [m]",
        "head_high [m]",
        "low_at",
        "high_at"
    };

    /** Columns of the uncertainty CSV's pump table. */
    static final String[] UNCERTAINTY_PUMP_HEADER = {
        "pump",
        "flow_nominal [m3/s]",
        "flow_low [m3/s]",
        "flow_high [m3/s]",
        "head_nominal [m]",
        "head_low [m]",
        "head_high [m]",
        "low_flow_at",
        "high_flow_at"
    };

    /** The uncertainty study: junction ranges, then (after a blank line) pump ranges when there are pumps. */
    static void uncertaintyCsv(NetworkUncertaintyResult u, Appendable out) throws IOException {
        row(out, UNCERTAINTY_NODE_HEADER);
        for (NetworkUncertaintyResult.NodeRange n : u.nodes()) {
            if (n.fixed()) {
                continue;
            }
            row(
                    out,
                    SafeText.cell(n.id()),
                    num(n.pressure().nominal()),
                    num(n.pressure().low()),
                    num(n.pressure().high()),
                    num(n.head().nominal()),
                    num(n.head().low()),
                    num(n.head().high()),
                    SafeText.cell(n.lowAt()),
                    SafeText.cell(n.highAt()));
        }
        if (!u.pumps().isEmpty()) {
            out.append('\n');
            row(out, UNCERTAINTY_PUMP_HEADER);
            for (NetworkUncertaintyResult.PumpRange p : u.pumps()) {
                row(
                        out,
                        SafeText.cell(p.id()),
                        num(p.flow().nominal()),
                        num(p.flow().low()),
                        num(p.flow().high()),
                        num(p.head().nominal()),
                        num(p.head().low()),
                        num(p.head().high()),
                        SafeText.cell(p.lowFlowAt()),
                        SafeText.cell(p.highFlowAt()));
            }
        }
    }

    private static void sizingJson(ObjectNode o, NetworkSizingResult s, List<String> notSized) {
        o.put("max_velocity_m_per_s", s.maximumVelocity());
        o.put("max_gradient_m_per_100m", s.maximumGradient());
        put(o, "head_budget_m", s.headBudget());
        o.put("settled", s.settled());
        o.put("rounds", s.rounds());
        o.put("solves", s.solves());
        putText(o, "index_terminal", s.indexPath().map(p -> p.terminal()).orElse(""));
        put(o, "index_loss_m", s.indexLoss());
        o.put("within_budget", s.withinBudget());
        o.put("sized_converged", s.solved().converged());
        ArrayNode links = o.putArray("links");
        for (NetworkSizingResult.LinkSizing l : s.links()) {
            ObjectNode x = links.addObject();
            x.put("id", l.id());
            x.put("given_size", l.givenSize());
            x.put("given_diameter_m", l.givenDiameter());
            x.put("chosen_size", l.chosenSize());
            x.put("chosen_diameter_m", l.chosenDiameter());
            put(x, "flow_m3_per_s", l.flow());
            put(x, "velocity_m_per_s", l.velocity());
            put(x, "gradient_m_per_100m", l.gradient());
            x.put("meets_limits", l.meetsLimits());
            x.put("basis", l.basis().key());
            ArrayNode cands = x.putArray("candidates");
            for (NetworkSizingResult.CandidateCheck c : l.candidates()) {
                ObjectNode y = cands.addObject();
                y.put("size", c.size());
                y.put("inner_diameter_m", c.innerDiameter());
                put(y, "velocity_m_per_s", c.velocity());
                put(y, "gradient_m_per_100m", c.gradient());
                y.put("accepted", c.accepted());
                ArrayNode reasons = y.putArray("reasons");
                c.reasons().forEach(reasons::add);
            }
        }
        ArrayNode kept = o.putArray("not_sized");
        notSized.forEach(kept::add);
        RunJson.putCautions(o, s.cautions());
    }

    /** Columns of the sizing CSV, units in brackets. */
    static final String[] SIZING_HEADER = {
        "link",
        "given_size",
        "chosen_size",
        "chosen_diameter [m]",
        "flow [m3/s]",
        "velocity [m/s]",
        "gradient [m/100m]",
        "meets_limits",
        "basis",
        "smaller_size_rejected_for"
    };

    /** The sizing: one row per sized pipe, with why the next smaller size was refused. */
    static void sizingCsv(NetworkSizingResult s, Appendable out) throws IOException {
        row(out, SIZING_HEADER);
        for (NetworkSizingResult.LinkSizing l : s.links()) {
            row(
                    out,
                    SafeText.cell(l.id()),
                    SafeText.cell(l.givenSize()),
                    SafeText.cell(l.chosenSize()),
                    num(l.chosenDiameter()),
                    num(l.flow()),
                    num(l.velocity()),
                    num(l.gradient()),
                    l.meetsLimits() ? "yes" : "no",
                    l.basis().key(),
                    SafeText.cell(smallerRejected(l)));
        }
    }

    /** Why the candidate just below the chosen one was refused ("" for the smallest). */
    static String smallerRejected(NetworkSizingResult.LinkSizing l) {
        String last = "";
        for (NetworkSizingResult.CandidateCheck c : l.candidates()) {
            if (c.innerDiameter() >= l.chosenDiameter()) {
                break;
            }
            last = c.size() + ": " + (c.reasons().isEmpty() ? "meets the limits" : String.join("; ", c.reasons()));
        }
        return last;
    }

    private static void putText(ObjectNode n, String key, String v) {
        if (v == null || v.isEmpty()) {
            n.putNull(key);
        } else {
            n.put(key, v);
        }
    }

    private static void balanceJson(ObjectNode b, BalancingResult balance) {
        b.put("converged", balance.converged());
        b.put("minimum_valve_drop_pa", balance.minimumValveDrop());
        putText(b, "index_valve", balance.indexValve().orElse(""));
        put(b, "index_spare_head_m", balance.indexSpareHead());
        putText(b, "source", balance.source().orElse(""));
        putText(b, "source_kind", balance.sourceKind());
        put(b, "source_head_needed_m", balance.sourceHeadNeeded());
        put(b, "largest_flow_error", balance.largestFlowError());
        b.put("solves", balance.solves());
        ArrayNode valves = b.putArray("valves");
        for (BalancingResult.BalancedValve v : balance.valves()) {
            ObjectNode o = valves.addObject();
            o.put("id", v.id());
            o.put("from", v.from());
            o.put("to", v.to());
            o.put("design_flow_m3_per_s", v.designFlow());
            o.put("fully_open_kv", v.fullyOpenFlowCoefficient());
            put(o, "kv", v.flowCoefficient());
            put(o, "setting", v.setting());
            put(o, "head_drop_m", v.headDrop());
            put(o, "pressure_drop_pa", v.pressureDrop());
            o.put("reached", v.reached());
            put(o, "extra_head_needed_m", v.extraHeadNeeded());
            o.put("branch_supply", v.branchSupply());
            o.put("branch_return", v.branchReturn());
            put(o, "branch_differential_m", v.branchDifferential());
            put(o, "authority", v.authority());
        }
        ArrayNode shortOnes = b.putArray("short_branches");
        for (BalancingResult.BalancedValve v : balance.shortBranches()) {
            ObjectNode o = shortOnes.addObject();
            o.put("valve", v.id());
            o.put("branch_supply", v.branchSupply());
            o.put("branch_return", v.branchReturn());
            put(o, "extra_head_needed_m", v.extraHeadNeeded());
        }
        RunJson.putCautions(b, balance.cautions());
    }

    /** Valve table columns of the design CSV, units in brackets. */
    static final String[] VALVE_HEADER = {
        "valve",
        "design_flow [m3/s]",
        "fully_open_kv [m3/h]",
        "kv [m3/h]",
        "setting",
        "pressure_drop [Pa]",
        "reached",
        "extra_head_needed [m]",
        "branch_supply",
        "branch_return",
        "branch_differential [m]",
        "authority [-]"
    };

    /**
     * The design runs as CSV: the balanced valves, a blank line, the summary as key,value rows with the
     * JSON key names, a blank line, the design cautions.
     */
    static void designCsv(NetworkDesign.Results design, Appendable out) throws IOException {
        CSVPrinter p = new CSVPrinter(
                out, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
        BalancingResult balance = design.balance();
        if (balance != null) {
            p.printRecord((Object[]) VALVE_HEADER);
            for (BalancingResult.BalancedValve v : balance.valves()) {
                p.printRecord(
                        SafeText.cell(v.id()),
                        num(v.designFlow()),
                        num(v.fullyOpenFlowCoefficient()),
                        num(v.flowCoefficient()),
                        num(v.setting()),
                        num(v.pressureDrop()),
                        v.reached() ? "yes" : "no",
                        num(v.extraHeadNeeded()),
                        SafeText.cell(v.branchSupply()),
                        SafeText.cell(v.branchReturn()),
                        num(v.branchDifferential()),
                        num(v.authority()));
            }
            p.println();
        }
        p.printRecord("key", "value");
        if (balance != null) {
            p.printRecord("balance.minimum_valve_drop_pa", num(balance.minimumValveDrop()));
            p.printRecord(
                    "balance.index_valve", SafeText.cell(balance.indexValve().orElse("")));
            p.printRecord("balance.index_spare_head_m", num(balance.indexSpareHead()));
            p.printRecord("balance.source", SafeText.cell(balance.source().orElse("")));
            p.printRecord("balance.source_kind", balance.sourceKind());
            p.printRecord("balance.source_head_needed_m", num(balance.sourceHeadNeeded()));
            p.printRecord("balance.largest_flow_error", num(balance.largestFlowError()));
            p.printRecord("balance.solves", balance.solves());
        }
        FireFlowResult fire = design.fireFlow();
        if (fire != null) {
            p.printRecord("fire_flow.node", SafeText.cell(fire.node()));
            p.printRecord("fire_flow.residual_pressure_pa", num(fire.residualPressure()));
            p.printRecord("fire_flow_m3_per_s", num(fire.fireFlow()));
            p.printRecord("fire_flow_limiting_node", SafeText.cell(fire.limitingNode()));
            p.printRecord("fire_flow.residual_pressure_at_limit_pa", num(fire.residualAtLimit()));
            p.printRecord("fire_flow.solves", fire.solves());
        }
        NetworkSizingResult sized = design.sizing();
        if (sized != null) {
            p.printRecord("sizing.max_velocity_m_per_s", num(sized.maximumVelocity()));
            p.printRecord("sizing.max_gradient_m_per_100m", num(sized.maximumGradient()));
            p.printRecord("sizing.head_budget_m", num(sized.headBudget()));
            p.printRecord("sizing.settled", sized.settled());
            p.printRecord("sizing.rounds", sized.rounds());
            p.printRecord(
                    "sizing.index_terminal",
                    SafeText.cell(sized.indexPath().map(x -> x.terminal()).orElse("")));
            p.printRecord("sizing.index_loss_m", num(sized.indexLoss()));
            p.printRecord("sizing.within_budget", sized.withinBudget());
            p.printRecord("sizing.pipes_sized", sized.links().size());
            p.printRecord("sizing.pipes_not_sized", design.notSized().size());
        }
        p.println();
        p.printRecord("severity", "code", "message", "basis");
        for (Caution c : design.cautions()) {
            p.printRecord(
                    c.severity().name().toLowerCase(Locale.ROOT),
                    c.code(),
                    SafeText.cell(c.message()),
                    SafeText.cell(c.basis()));
        }
        p.flush();
    }

    static String num(double v) {
        return Double.isFinite(v) ? org.headway.units.Decimals.format(v) : "";
    }

    static void nodesCsv(NetworkResult r, Appendable out) throws IOException {
        row(out, NODE_HEADER);
        List<NetworkResult.NodeResult> nodes = r.nodes();
        inChunks(nodes.size(), out, (from, to, sb) -> {
            String[] cells = new String[6];
            for (int i = from; i < to; i++) {
                NetworkResult.NodeResult n = nodes.get(i);
                cells[0] = SafeText.cell(n.id());
                cells[1] = num(n.head());
                cells[2] = num(n.pressure());
                cells[3] = num(n.elevation());
                cells[4] = num(n.demand());
                cells[5] = n.fixed() ? "yes" : "no";
                row(sb, cells);
            }
        });
    }

    static void linksCsv(NetworkResult r, Appendable out) throws IOException {
        linksCsv(r, NetworkDesign.Results.NONE, out);
    }

    /** Extra link columns when balancing ran. */
    static final String[] BALANCING_COLUMNS = {"balancing_kv [m3/h]", "balancing_setting"};

    static void linksCsv(NetworkResult r, NetworkDesign.Results design, Appendable out) throws IOException {
        BalancingResult balance = design.balance();
        int width = balance == null ? 9 : 11;
        if (balance == null) {
            row(out, LINK_HEADER);
        } else {
            String[] header = new String[width];
            System.arraycopy(LINK_HEADER, 0, header, 0, 9);
            System.arraycopy(BALANCING_COLUMNS, 0, header, 9, 2);
            row(out, header);
        }
        List<NetworkResult.LinkResult> links = r.links();
        inChunks(links.size(), out, (from, to, sb) -> {
            String[] cells = new String[width];
            for (int i = from; i < to; i++) {
                NetworkResult.LinkResult l = links.get(i);
                cells[0] = SafeText.cell(l.id());
                cells[1] = l.kind();
                cells[2] = SafeText.cell(l.from());
                cells[3] = SafeText.cell(l.to());
                cells[4] = num(l.flow());
                cells[5] = num(l.velocity());
                cells[6] = num(l.headLoss());
                cells[7] = num(l.frictionFactor());
                cells[8] = l.status();
                if (balance != null) {
                    var v = balance.valve(l.id());
                    cells[9] = num(v.map(BalancingResult.BalancedValve::flowCoefficient)
                            .orElse(Double.NaN));
                    cells[10] =
                            num(v.map(BalancingResult.BalancedValve::setting).orElse(Double.NaN));
                }
                row(sb, cells);
            }
        });
    }

    /** Formats rows [from, to) of a table into a buffer. */
    @FunctionalInterface
    interface RowRange {
        void format(int from, int to, StringBuilder sb) throws IOException;
    }

    /** Rows per chunk when a large table is formatted on every core. */
    static final int CHUNK_ROWS = 4096;

    /**
     * Formats rows 0 .. count−1 and appends them in order. A large table's rows are formatted in
     * chunks of {@value #CHUNK_ROWS}, a window of chunks at a time on every core (rows depend only on
     * their own result), so the text held at once stays bounded; a small one is formatted in order.
     */
    static void inChunks(int count, Appendable out, RowRange rows) throws IOException {
        if (count < 2 * CHUNK_ROWS) {
            StringBuilder sb = new StringBuilder();
            rows.format(0, count, sb);
            out.append(sb);
            return;
        }
        int chunks = (count + CHUNK_ROWS - 1) / CHUNK_ROWS;
        int window = 4 * Math.max(1, Runtime.getRuntime().availableProcessors());
        for (int w0 = 0; w0 < chunks; w0 += window) {
            int w1 = Math.min(chunks, w0 + window);
            String[] parts = java.util.stream.IntStream.range(w0, w1)
                    .parallel()
                    .mapToObj(c -> {
                        StringBuilder sb = new StringBuilder(CHUNK_ROWS * 96);
                        try {
                            rows.format(c * CHUNK_ROWS, Math.min(count, (c + 1) * CHUNK_ROWS), sb);
                        } catch (IOException e) {
                            throw new java.io.UncheckedIOException(e);
                        }
                        return sb.toString();
                    })
                    .toArray(String[]::new);
            for (String part : parts) {
                out.append(part);
            }
        }
    }

    /**
     * One CSV record (RFC 4180), LF-terminated: a cell is quoted, its quotes doubled, only when it
     * holds a comma, a quote, a line break or surrounding spaces. Written directly rather than
     * through a CSV library: a 10⁵-node network writes 3·10⁵ records.
     */
    static void row(Appendable out, String... cells) throws IOException {
        for (int i = 0; i < cells.length; i++) {
            if (i > 0) {
                out.append(',');
            }
            String c = cells[i];
            if (needsQuotes(c)) {
                out.append('"').append(c.replace("\"", "\"\"")).append('"');
            } else {
                out.append(c);
            }
        }
        out.append('\n');
    }

    private static boolean needsQuotes(String c) {
        int n = c.length();
        if (n == 0) {
            return false;
        }
        if (c.charAt(0) <= ' ' || c.charAt(n - 1) <= ' ') {
            return true;
        }
        for (int i = 0; i < n; i++) {
            char ch = c.charAt(i);
            if (ch == ',' || ch == '"' || ch == '\n' || ch == '\r') {
                return true;
            }
        }
        return false;
    }

    static String q(double si, QuantityKind kind, UnitSystem u) {
        return Double.isFinite(si) ? Quantities.formatNumber(Quantities.fromSi(si, kind, u)) : "—";
    }

    static String clip(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "…";
    }

    static void text(PrintWriter out, Network net, NetworkResult r, UnitSystem u) {
        text(out, net, r, u, NetworkDesign.Results.NONE);
    }

    static void text(PrintWriter out, Network net, NetworkResult r, UnitSystem u, NetworkDesign.Results design) {
        tables(out, net, r, u, design);
        List<Caution> cautions = new ArrayList<>(r.cautions());
        cautions.addAll(design.cautions());
        cautions(out, cautions);
    }

    /** The text output without its cautions: title, fluid, solve, node and link tables. */
    static void tables(PrintWriter out, Network net, NetworkResult r, UnitSystem u) {
        tables(out, net, r, u, NetworkDesign.Results.NONE);
    }

    /** The tables, with the balancing column and the design sections when they ran. */
    static void tables(PrintWriter out, Network net, NetworkResult r, UnitSystem u, NetworkDesign.Results design) {
        BalancingResult balance = design.balance();
        out.println(net.title().isEmpty() ? "Network" : net.title());
        var f = net.context().fluid();
        out.printf(
                Locale.ROOT,
                "Fluid: %s, ρ = %s, μ = %s; friction: %s%n",
                f.fluid(),
                Quantities.format(f.density(), QuantityKind.DENSITY, u),
                Quantities.format(f.dynamicViscosity(), QuantityKind.DYNAMIC_VISCOSITY, u),
                net.context().friction().displayName());
        out.printf(
                Locale.ROOT,
                "Solve: %s after %d iterations (head change %.3g m, energy residual %.3g m, continuity residual"
                        + " %.3g m³/s)%n%n",
                r.converged() ? "converged" : "NOT CONVERGED",
                r.iterations(),
                r.headChange(),
                r.energyResidual(),
                r.continuityResidual());
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        String vu = Quantities.unitSymbol(QuantityKind.VELOCITY, u);
        out.printf(
                Locale.ROOT,
                "%-20s %11s %12s %11s %12s  %s%n",
                "node",
                "head [" + hu + "]",
                "p [" + pu + "]",
                "z [" + hu + "]",
                "demand [" + qu + "]",
                "");
        for (NetworkResult.NodeResult n : r.nodes()) {
            out.printf(
                    Locale.ROOT,
                    "%-20s %11s %12s %11s %12s  %s%n",
                    clip(n.id(), 20),
                    q(n.head(), QuantityKind.HEAD, u),
                    q(n.pressure(), QuantityKind.PRESSURE, u),
                    q(n.elevation(), QuantityKind.HEAD, u),
                    q(n.demand(), QuantityKind.VOLUMETRIC_FLOW, u),
                    n.fixed() ? "fixed head (demand: flow it takes; negative supplies)" : "");
        }
        out.println();
        out.printf(
                Locale.ROOT,
                "%-16s %-19s %-12s %-12s %11s %9s %11s %9s  %s%s%n",
                "link",
                "kind",
                "from",
                "to",
                "Q [" + qu + "]",
                "V [" + vu + "]",
                "h [" + hu + "]",
                "f",
                balance == null ? "status" : String.format(Locale.ROOT, "%-7s", "status"),
                balance == null ? "" : String.format(Locale.ROOT, " %14s", "Kv bal [m³/h]"));
        for (NetworkResult.LinkResult l : r.links()) {
            out.printf(
                    Locale.ROOT,
                    "%-16s %-19s %-12s %-12s %11s %9s %11s %9s  %s%s%n",
                    clip(l.id(), 16),
                    l.kind(),
                    clip(l.from(), 12),
                    clip(l.to(), 12),
                    q(l.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    q(l.velocity(), QuantityKind.VELOCITY, u),
                    q(l.headLoss(), QuantityKind.HEAD, u),
                    Double.isFinite(l.frictionFactor()) ? Quantities.formatNumber(l.frictionFactor()) : "—",
                    balance == null ? l.status() : String.format(Locale.ROOT, "%-7s", l.status()),
                    balance == null
                            ? ""
                            : String.format(
                                    Locale.ROOT,
                                    " %14s",
                                    balance.valve(l.id())
                                            .map(v -> Double.isFinite(v.flowCoefficient())
                                                    ? Quantities.formatNumber(v.flowCoefficient())
                                                    : "short")
                                            .orElse("")));
        }
        out.println("(flow positive from → to; heads are energy heads with node velocity heads neglected; pressures"
                + " gauge)");
        if (balance != null) {
            balanceText(out, balance, u);
        }
        if (design.fireFlow() != null) {
            fireFlowText(out, design.fireFlow(), u);
        }
        if (design.sizing() != null) {
            sizingText(out, design.sizing(), design.notSized(), u);
        }
        if (design.uncertainty() != null) {
            uncertaintyText(out, design.uncertainty(), u);
        }
    }

    /** Junctions listed in the text uncertainty table; the lowest low pressures first when there are more. */
    static final int UNCERTAINTY_TEXT_ROWS = 30;

    private static void uncertaintyText(PrintWriter out, NetworkUncertaintyResult r, UnitSystem u) {
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        out.println();
        out.printf(
                Locale.ROOT,
                "Uncertainty (%s, demands × %s to %s, %d solves%s): %s%n",
                r.method().id(),
                Quantities.formatNumber(r.demandLow()),
                Quantities.formatNumber(r.demandHigh()),
                r.solves(),
                r.failedSolves() == 0 ? "" : ", " + r.failedSolves() + " NOT CONVERGED and left out",
                r.reason());
        List<NetworkUncertaintyResult.NodeRange> junctions = new ArrayList<>();
        for (NetworkUncertaintyResult.NodeRange n : r.nodes()) {
            if (!n.fixed()) {
                junctions.add(n);
            }
        }
        boolean cut = junctions.size() > UNCERTAINTY_TEXT_ROWS;
        if (cut) {
            junctions.sort(java.util.Comparator.comparingDouble((NetworkUncertaintyResult.NodeRange n) ->
                    Double.isNaN(n.pressure().low())
                            ? Double.NEGATIVE_INFINITY
                            : n.pressure().low()));
            junctions = junctions.subList(0, UNCERTAINTY_TEXT_ROWS);
            out.printf(
                    Locale.ROOT,
                    "(the %d junctions with the lowest low pressure; all in the JSON and CSV output)%n",
                    UNCERTAINTY_TEXT_ROWS);
        }
        out.printf(Locale.ROOT, "%-20s %12s %12s %12s  %s%n", "junction", "p [" + pu + "]", "low", "high", "low at");
        for (NetworkUncertaintyResult.NodeRange n : junctions) {
            out.printf(
                    Locale.ROOT,
                    "%-20s %12s %12s %12s  %s%n",
                    clip(n.id(), 20),
                    q(n.pressure().nominal(), QuantityKind.PRESSURE, u),
                    q(n.pressure().low(), QuantityKind.PRESSURE, u),
                    q(n.pressure().high(), QuantityKind.PRESSURE, u),
                    n.lowAt());
        }
        if (!r.pumps().isEmpty()) {
            String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
            String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
            out.printf(
                    Locale.ROOT,
                    "%-20s %12s %12s %12s %12s %12s%n",
                    "pump",
                    "Q [" + qu + "]",
                    "Q low",
                    "Q high",
                    "H low [" + hu + "]",
                    "H high");
            for (NetworkUncertaintyResult.PumpRange p : r.pumps()) {
                out.printf(
                        Locale.ROOT,
                        "%-20s %12s %12s %12s %12s %12s%n",
                        clip(p.id(), 20),
                        q(p.flow().nominal(), QuantityKind.VOLUMETRIC_FLOW, u),
                        q(p.flow().low(), QuantityKind.VOLUMETRIC_FLOW, u),
                        q(p.flow().high(), QuantityKind.VOLUMETRIC_FLOW, u),
                        q(p.head().low(), QuantityKind.HEAD, u),
                        q(p.head().high(), QuantityKind.HEAD, u));
            }
        }
    }

    /** Most sized pipes listed in text; the JSON and CSV list all. */
    static final int SIZING_TEXT_ROWS = 40;

    private static void sizingText(PrintWriter out, NetworkSizingResult s, List<String> notSized, UnitSystem u) {
        String vu = Quantities.unitSymbol(QuantityKind.VELOCITY, u);
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        out.println();
        out.printf(
                Locale.ROOT,
                "Sizing: velocity at most %s, friction loss at most %s m per 100 m%s; %s after %d round%s%n",
                Quantities.format(s.maximumVelocity(), QuantityKind.VELOCITY, u),
                Quantities.formatNumber(s.maximumGradient()),
                Double.isFinite(s.headBudget())
                        ? ", head budget " + Quantities.format(s.headBudget(), QuantityKind.HEAD, u)
                        : "",
                s.settled() ? "settled" : "NOT SETTLED",
                s.rounds(),
                s.rounds() == 1 ? "" : "s");
        out.printf(
                Locale.ROOT,
                "%-16s %-16s %-16s %11s %9s %10s  %s%n",
                "pipe",
                "given",
                "chosen",
                "Q [" + qu + "]",
                "V [" + vu + "]",
                "m/100m",
                "basis (next size down refused for)");
        int shown = 0;
        for (NetworkSizingResult.LinkSizing l : s.links()) {
            if (shown++ == SIZING_TEXT_ROWS) {
                out.printf(
                        Locale.ROOT,
                        "… %d more pipes in the JSON and CSV output%n",
                        s.links().size() - SIZING_TEXT_ROWS);
                break;
            }
            String why = smallerRejected(l);
            out.printf(
                    Locale.ROOT,
                    "%-16s %-16s %-16s %11s %9s %10s  %s%s%n",
                    clip(l.id(), 16),
                    clip(l.givenSize(), 16),
                    clip(l.chosenSize(), 16),
                    q(l.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    q(l.velocity(), QuantityKind.VELOCITY, u),
                    Quantities.formatNumber(l.gradient()),
                    l.basis().words(),
                    why.isEmpty() ? "" : " (" + why + ")");
        }
        s.indexPath()
                .ifPresent(p -> out.printf(
                        Locale.ROOT,
                        "Index circuit of the sized network: to %s, loss %s%s%n",
                        p.terminal(),
                        Quantities.format(p.headLoss(), QuantityKind.HEAD, u),
                        Double.isFinite(s.headBudget())
                                ? (s.withinBudget() ? " (within the budget)" : " (ABOVE THE BUDGET)")
                                : ""));
        if (!notSized.isEmpty()) {
            out.printf(
                    Locale.ROOT,
                    "Kept as given (explicit bore, or a material without a size table): %d pipe%s%n",
                    notSized.size(),
                    notSized.size() == 1 ? "" : "s");
        }
    }

    /** The cautions, one a line with severity and basis. */
    static void cautions(PrintWriter out, java.util.List<Caution> cautions) {
        out.println();
        out.println("Cautions:");
        for (Caution c : cautions) {
            out.println("  [" + c.severity().name().toLowerCase(Locale.ROOT) + "] " + c.message() + " (basis: "
                    + c.basis() + ")");
        }
    }

    private static void balanceText(PrintWriter out, BalancingResult b, UnitSystem u) {
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        out.println();
        out.printf(
                Locale.ROOT,
                "Balancing (every valve with a design flow held at it; %d solves%s)%n",
                b.solves(),
                b.converged() ? "" : ", NOT CONVERGED");
        out.printf(
                Locale.ROOT,
                "%-16s %12s %10s %10s %9s %12s %9s %-25s %s%n",
                "valve",
                "Q_d [" + qu + "]",
                "Kv [m³/h]",
                "open Kv",
                "setting",
                "Δp [" + pu + "]",
                "authority",
                "branch",
                "short by [" + hu + "]");
        for (BalancingResult.BalancedValve v : b.valves()) {
            out.printf(
                    Locale.ROOT,
                    "%-16s %12s %10s %10s %9s %12s %9s %-25s %s%n",
                    clip(v.id(), 16),
                    q(v.designFlow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    Double.isFinite(v.flowCoefficient()) ? Quantities.formatNumber(v.flowCoefficient()) : "—",
                    Quantities.formatNumber(v.fullyOpenFlowCoefficient()),
                    Double.isFinite(v.setting()) ? Quantities.formatNumber(v.setting()) : "—",
                    q(v.pressureDrop(), QuantityKind.PRESSURE, u),
                    Double.isFinite(v.authority()) ? String.format(Locale.ROOT, "%.3f", v.authority()) : "—",
                    clip(v.branchSupply() + " → " + v.branchReturn(), 25),
                    v.reached() ? "" : q(v.extraHeadNeeded(), QuantityKind.HEAD, u));
        }
        out.printf(
                Locale.ROOT,
                "Index valve: %s (spare head %s %s over max(minimum drop %s %s, fully open loss))%n",
                b.indexValve().orElse("—"),
                q(b.indexSpareHead(), QuantityKind.HEAD, u),
                hu,
                q(b.minimumValveDrop(), QuantityKind.PRESSURE, u),
                pu);
        if (b.source().isPresent()) {
            out.printf(
                    Locale.ROOT,
                    "Source head needed: %s %s at %s (%s)%n",
                    q(b.sourceHeadNeeded(), QuantityKind.HEAD, u),
                    hu,
                    b.source().get(),
                    b.sourceKind().equals("pump") ? "head the pump must add at its flow" : "fixed-head node's head");
        }
        if (Double.isFinite(b.largestFlowError())) {
            out.printf(
                    Locale.ROOT,
                    "Check: solved again with these Kv values, every design flow is met to %.2g (relative)%n",
                    b.largestFlowError());
        }
    }

    private static void fireFlowText(PrintWriter out, FireFlowResult f, UnitSystem u) {
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        out.println();
        out.printf(
                Locale.ROOT,
                "Fire flow at %s with every junction at %s %s or more (%d solves)%n",
                f.node(),
                q(f.residualPressure(), QuantityKind.PRESSURE, u),
                pu,
                f.solves());
        if (!f.found()) {
            out.println("  not found (see cautions)");
            return;
        }
        out.printf(
                Locale.ROOT,
                "  fire flow %s %s; limiting junction %s at %s %s%n",
                q(f.fireFlow(), QuantityKind.VOLUMETRIC_FLOW, u),
                qu,
                f.limitingNode(),
                q(f.residualAtLimit(), QuantityKind.PRESSURE, u),
                pu);
        out.println("  ESTIMATE ONLY: the authority having jurisdiction and the local fire code govern.");
    }
}
