package org.headway.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.report.SafeText;
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
        }
        RunJson.putCautions(root, r.cautions());
        return root;
    }

    static String num(double v) {
        return Double.isFinite(v) ? org.headway.units.Decimals.format(v) : "";
    }

    static void nodesCsv(NetworkResult r, Appendable out) throws IOException {
        row(out, NODE_HEADER);
        String[] cells = new String[6];
        for (NetworkResult.NodeResult n : r.nodes()) {
            cells[0] = SafeText.cell(n.id());
            cells[1] = num(n.head());
            cells[2] = num(n.pressure());
            cells[3] = num(n.elevation());
            cells[4] = num(n.demand());
            cells[5] = n.fixed() ? "yes" : "no";
            row(out, cells);
        }
    }

    static void linksCsv(NetworkResult r, Appendable out) throws IOException {
        row(out, LINK_HEADER);
        String[] cells = new String[9];
        for (NetworkResult.LinkResult l : r.links()) {
            cells[0] = SafeText.cell(l.id());
            cells[1] = l.kind();
            cells[2] = SafeText.cell(l.from());
            cells[3] = SafeText.cell(l.to());
            cells[4] = num(l.flow());
            cells[5] = num(l.velocity());
            cells[6] = num(l.headLoss());
            cells[7] = num(l.frictionFactor());
            cells[8] = l.status();
            row(out, cells);
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
        tables(out, net, r, u);
        cautions(out, r.cautions());
    }

    /** The text output without its cautions: title, fluid, solve, node and link tables. */
    static void tables(PrintWriter out, Network net, NetworkResult r, UnitSystem u) {
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
                "%-16s %-19s %-12s %-12s %11s %9s %11s %9s  %s%n",
                "link",
                "kind",
                "from",
                "to",
                "Q [" + qu + "]",
                "V [" + vu + "]",
                "h [" + hu + "]",
                "f",
                "status");
        for (NetworkResult.LinkResult l : r.links()) {
            out.printf(
                    Locale.ROOT,
                    "%-16s %-19s %-12s %-12s %11s %9s %11s %9s  %s%n",
                    clip(l.id(), 16),
                    l.kind(),
                    clip(l.from(), 12),
                    clip(l.to(), 12),
                    q(l.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    q(l.velocity(), QuantityKind.VELOCITY, u),
                    q(l.headLoss(), QuantityKind.HEAD, u),
                    Double.isFinite(l.frictionFactor()) ? Quantities.formatNumber(l.frictionFactor()) : "—",
                    l.status());
        }
        out.println("(flow positive from → to; heads are energy heads with node velocity heads neglected; pressures"
                + " gauge)");
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
}
