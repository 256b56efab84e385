package org.headway.report;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.network.CaseResult;
import org.headway.network.IndexCircuit;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.Node;
import org.headway.network.PressureCheck;
import org.headway.network.PumpDuty;
import org.headway.project.AtomicFiles;
import org.headway.project.Project;
import org.headway.system.Segment;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * The network head-loss sheet as a PDF: title block, inputs, the solve and its residuals, a schematic
 * (vector), node and link tables, the index circuit, pumps with NPSH, pressures over the demand
 * cases, methods with citations and every caution.
 */
public final class NetworkPdfWriter {

    private static final float BODY = 8f;
    private static final float SMALL = 7f;
    private static final float SCHEMATIC_WIDTH = 640f;

    /** Most terminal paths listed; the index circuit always is. */
    static final int MAX_PATHS = 30;

    private NetworkPdfWriter() {}

    /** Writes the PDF atomically. */
    public static void write(NetworkSheet sheet, Path target, boolean overwrite, UnitSystem units) {
        AtomicFiles.write(target, overwrite, content(sheet, units));
    }

    /** The PDF's content, for writing with other files all or none. */
    public static AtomicFiles.Writer content(NetworkSheet sheet, UnitSystem units) {
        return out -> {
            try (PdfLayout pdf = new PdfLayout()) {
                compose(pdf, sheet, units);
                pdf.doc.save(out);
            }
        };
    }

    private static void compose(PdfLayout pdf, NetworkSheet sheet, UnitSystem u) throws IOException {
        Project p = sheet.project();
        Network net = sheet.network();
        CaseResult base = sheet.result().base();
        NetworkResult r = base.result();
        pdf.documentInfo("Network head-loss sheet: " + p.title(), sheet.version(), sheet.inputHash());

        pdf.heading("Network head-loss sheet", 16);
        pdf.paragraph(
                p.title().isEmpty() ? "(untitled network)" : p.title(), pdf.bold, 11, PdfLayout.MARGIN, pdf.width());
        pdf.space(4);
        pdf.titleBlock(p.titleBlock(), sheet.version(), BODY, SMALL);

        // Inputs
        pdf.heading("Inputs", 12);
        var f = net.context().fluid();
        List<String[]> in = new ArrayList<>();
        in.add(row("Fluid", f.fluid(), ""));
        in.add(
                f.temperatureGiven()
                        ? row("Temperature", q(f.temperature(), QuantityKind.TEMPERATURE, u), "as given")
                        : row("Temperature", "not given", "density and viscosity given directly"));
        in.add(row("Density ρ", q(f.density(), QuantityKind.DENSITY, u), f.densitySource()));
        in.add(row(
                "Dynamic viscosity μ",
                q(f.dynamicViscosity(), QuantityKind.DYNAMIC_VISCOSITY, u),
                f.viscositySource()));
        if (f.vapourPressure().isPresent()) {
            in.add(row(
                    "Vapour pressure p_v",
                    q(f.vapourPressure().getAsDouble(), QuantityKind.PRESSURE, u),
                    f.vapourPressureSource()));
        }
        in.add(row("Friction method", net.context().friction().displayName(), "default for pipes without their own"));
        in.add(row(
                "Site atmosphere",
                q(net.site().pressure(), QuantityKind.PRESSURE, u) + " absolute",
                net.site().basis() + "; used for NPSH available"));
        long junctions = net.nodes().stream().filter(n -> !n.headIsFixed()).count();
        in.add(row(
                "Network",
                net.nodes().size() + " nodes (" + junctions + " junctions), "
                        + net.links().size() + " links",
                kinds(net)));
        var limits = sheet.study().pressureLimits();
        if (limits != null
                && (limits.minimumGauge() > Double.NEGATIVE_INFINITY
                        || limits.maximumGauge() < Double.POSITIVE_INFINITY)) {
            in.add(row(
                    "Pressure limits",
                    (limits.minimumGauge() > Double.NEGATIVE_INFINITY
                                    ? "min " + q(limits.minimumGauge(), QuantityKind.PRESSURE, u)
                                    : "")
                            + (limits.maximumGauge() < Double.POSITIVE_INFINITY
                                    ? " max " + q(limits.maximumGauge(), QuantityKind.PRESSURE, u)
                                    : ""),
                    "gauge, at every junction in every case"));
        }
        if (!sheet.study().cases().isEmpty()) {
            List<String> names = new ArrayList<>();
            sheet.study().cases().forEach(c -> names.add(c.name()));
            in.add(row("Demand cases", String.join(", ", names), "solved besides the network's own demands"));
        }
        pdf.table(new String[] {"Input", "Value", "Source / note"}, in, new float[] {0.22f, 0.33f, 0.45f}, BODY);

        // Solve
        pdf.heading("Solve", 12);
        List<String[]> solve = new ArrayList<>();
        solve.add(row("Converged", r.converged() ? "yes" : "NO — best iterate shown", ""));
        solve.add(row("Iterations", Integer.toString(r.iterations()), "Newton iterations, all status rounds"));
        solve.add(row("Head change", sci(r.headChange()) + " m", "last iteration; tolerance 1e-6 m"));
        solve.add(row("Energy residual", sci(r.energyResidual()) + " m", "largest |h(Q) − ΔH| over open links"));
        solve.add(row("Continuity residual", sci(r.continuityResidual()) + " m³/s", "largest imbalance at a junction"));
        pdf.table(new String[] {"Solve", "Value", "Note"}, solve, new float[] {0.22f, 0.33f, 0.45f}, BODY);

        // Schematic
        float schematicHeight = NetworkSchematic.preferredHeight(net, SCHEMATIC_WIDTH);
        pdf.heading("Schematic", 12, schematicHeight * pdf.width() / SCHEMATIC_WIDTH);
        PdfBoxGraphics2D g = new PdfBoxGraphics2D(pdf.doc, SCHEMATIC_WIDTH, schematicHeight);
        PdfSheetWriter.drawThenDispose(
                g, () -> NetworkSchematic.draw(g, net, r, base.circuit(), u, SCHEMATIC_WIDTH, schematicHeight));
        pdf.form(g.getXFormObject(), SCHEMATIC_WIDTH, schematicHeight);
        pdf.paragraph(
                net.nodes().stream().allMatch(n -> n.x().isPresent() && n.y().isPresent())
                        ? "Nodes drawn at their x, y from the line list."
                        : "Nodes drawn in layers by link count from the fixed-head nodes (the line list gives no"
                                + " x, y for every node).",
                SMALL);

        // Nodes
        String hu = Quantities.unitSymbol(QuantityKind.HEAD, u);
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        String qu = Quantities.unitSymbol(QuantityKind.VOLUMETRIC_FLOW, u);
        String vu = Quantities.unitSymbol(QuantityKind.VELOCITY, u);
        pdf.heading("Nodes (the network's own demands)", 12);
        var check = sheet.result().pressureCheck();
        List<String[]> nodes = new ArrayList<>();
        for (int i = 0; i < net.nodes().size(); i++) {
            Node n = net.nodes().get(i);
            NetworkResult.NodeResult nr = r.nodes().get(i);
            String range = "";
            if (check.isPresent()) {
                for (PressureCheck.NodeRange nrange : check.get().ranges()) {
                    if (nrange.node().equals(n.id())) {
                        range = q(nrange.minimumPressure(), QuantityKind.PRESSURE, u) + " (" + nrange.minimumCase()
                                + ") – " + q(nrange.maximumPressure(), QuantityKind.PRESSURE, u) + " ("
                                + nrange.maximumCase() + ")";
                    }
                }
            }
            nodes.add(new String[] {
                SafeText.cell(n.id()),
                kind(n),
                v(nr.elevation(), QuantityKind.HEAD, u),
                v(nr.demand(), QuantityKind.VOLUMETRIC_FLOW, u),
                v(nr.head(), QuantityKind.HEAD, u),
                n.headIsFixed() ? "—" : v(nr.pressure(), QuantityKind.PRESSURE, u),
                range
            });
        }
        pdf.table(
                new String[] {
                    "Node",
                    "Kind",
                    "z [" + hu + "]",
                    "Demand [" + qu + "]",
                    "Head [" + hu + "]",
                    "p [" + pu + "]",
                    check.isPresent() ? "p over cases: min – max" : ""
                },
                nodes,
                new float[] {0.14f, 0.11f, 0.09f, 0.12f, 0.11f, 0.11f, 0.32f},
                SMALL);
        pdf.paragraph(
                "Heads are energy heads with node velocity heads neglected; pressures gauge. At a fixed-head node the"
                        + " demand column is the flow it takes from the network (negative: it supplies).",
                SMALL);

        // Links
        pdf.heading("Links", 12);
        List<String[]> links = new ArrayList<>();
        for (int k = 0; k < net.links().size(); k++) {
            Link l = net.links().get(k);
            NetworkResult.LinkResult lr = r.links().get(k);
            links.add(new String[] {
                SafeText.cell(l.id()),
                l.kind(),
                SafeText.cell(l.from()) + " → " + SafeText.cell(l.to()),
                data(l, lr, u),
                v(lr.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                v(lr.velocity(), QuantityKind.VELOCITY, u),
                v(lr.headLoss(), QuantityKind.HEAD, u),
                Double.isFinite(lr.frictionFactor()) ? Quantities.formatNumber(lr.frictionFactor()) : "—",
                lr.status()
            });
        }
        pdf.table(
                new String[] {
                    "Link",
                    "Kind",
                    "From → to",
                    "Element data and sources",
                    "Q [" + qu + "]",
                    "V [" + vu + "]",
                    "h [" + hu + "]",
                    "f",
                    "Status"
                },
                links,
                new float[] {0.07f, 0.06f, 0.12f, 0.35f, 0.08f, 0.09f, 0.08f, 0.08f, 0.07f},
                SMALL);
        pdf.paragraph("Flow positive from → to; h is H_from − H_to (negative across a pump).", SMALL);

        // Index circuit
        pdf.heading("Index circuit", 12);
        IndexCircuit circuit = base.circuit();
        if (circuit.index().isPresent()) {
            IndexCircuit.TerminalPath ix = circuit.index().get();
            pdf.paragraph(
                    "The flow route of largest head loss: " + ix.source() + " → " + ix.terminal() + ", "
                            + q(ix.headLoss(), QuantityKind.HEAD, u) + " over " + q(ix.length(), QuantityKind.LENGTH, u)
                            + " of pipe. Route: " + String.join(" → ", ix.nodes()) + ".",
                    BODY);
            List<String[]> paths = new ArrayList<>();
            List<IndexCircuit.TerminalPath> sorted = new ArrayList<>(circuit.paths());
            sorted.sort((a, b) -> Double.compare(b.headLoss(), a.headLoss()));
            for (IndexCircuit.TerminalPath tp : sorted.subList(0, Math.min(MAX_PATHS, sorted.size()))) {
                paths.add(new String[] {
                    SafeText.cell(tp.terminal()),
                    SafeText.cell(tp.source()),
                    v(tp.headLoss(), QuantityKind.HEAD, u),
                    q(tp.length(), QuantityKind.LENGTH, u),
                    tp == ix || tp.terminal().equals(ix.terminal()) ? "index circuit" : ""
                });
            }
            pdf.table(
                    new String[] {"Terminal", "Source", "Loss [" + hu + "]", "Pipe length", ""},
                    paths,
                    new float[] {0.25f, 0.25f, 0.17f, 0.17f, 0.16f},
                    SMALL);
            if (sorted.size() > MAX_PATHS) {
                pdf.paragraph(
                        (sorted.size() - MAX_PATHS) + " more terminals with smaller losses are in the workbook.",
                        SMALL);
            }
        } else {
            pdf.paragraph("No terminal carries flow, so there is no index circuit.", BODY);
        }

        // Pumps
        if (!base.pumps().pumps().isEmpty()) {
            pdf.heading("Pumps at their operating points", 12);
            List<String[]> pumps = new ArrayList<>();
            for (PumpDuty d : base.pumps().pumps()) {
                pumps.add(new String[] {
                    SafeText.cell(d.id()),
                    d.status(),
                    v(d.flow(), QuantityKind.VOLUMETRIC_FLOW, u),
                    v(d.head(), QuantityKind.HEAD, u),
                    Double.isFinite(d.npshAvailable()) ? q(d.npshAvailable(), QuantityKind.HEAD, u) : "—",
                    Double.isFinite(d.npshRequired()) ? q(d.npshRequired(), QuantityKind.HEAD, u) : "not given",
                    Double.isFinite(d.npshMargin()) ? q(d.npshMargin(), QuantityKind.HEAD, u) : "—"
                });
            }
            pdf.table(
                    new String[] {"Pump", "Status", "Q [" + qu + "]", "Head [" + hu + "]", "NPSHa", "NPSHr", "Margin"},
                    pumps,
                    new float[] {0.2f, 0.1f, 0.14f, 0.14f, 0.14f, 0.14f, 0.14f},
                    SMALL);
            pdf.paragraph(
                    "NPSH available at the suction at the pump's own operating point, with the site atmosphere and the"
                            + " fluid's vapour pressure: NPSHa = H_s − z_s + (p_atm − p_v)/(ρ g).",
                    SMALL);
        }

        // Cases
        if (!sheet.result().cases().isEmpty()) {
            pdf.heading("Demand cases", 12);
            List<String[]> cases = new ArrayList<>();
            for (CaseResult c : sheet.result().cases()) {
                double minP = Double.POSITIVE_INFINITY;
                String at = "";
                for (NetworkResult.NodeResult n : c.result().nodes()) {
                    if (!n.fixed() && n.pressure() < minP) {
                        minP = n.pressure();
                        at = n.id();
                    }
                }
                cases.add(new String[] {
                    SafeText.cell(c.name()),
                    c.result().converged() ? "yes" : "NO",
                    Integer.toString(c.result().iterations()),
                    q(minP, QuantityKind.PRESSURE, u),
                    SafeText.cell(at),
                    c.circuit()
                            .index()
                            .map(x -> x.terminal() + ", " + q(x.headLoss(), QuantityKind.HEAD, u))
                            .orElse("—")
                });
            }
            pdf.table(
                    new String[] {"Case", "Converged", "Iterations", "Lowest p", "at", "Index circuit"},
                    cases,
                    new float[] {0.18f, 0.12f, 0.1f, 0.15f, 0.15f, 0.3f},
                    SMALL);
            if (check.isPresent() && !check.get().violations().isEmpty()) {
                List<String[]> v = new ArrayList<>();
                for (PressureCheck.Violation x : check.get().violations()) {
                    v.add(new String[] {
                        SafeText.cell(x.node()),
                        SafeText.cell(x.caseName()),
                        q(x.pressure(), QuantityKind.PRESSURE, u),
                        x.bound() + " " + q(x.limit(), QuantityKind.PRESSURE, u)
                    });
                }
                pdf.paragraph("Pressures outside the limits:", pdf.bold, BODY, PdfLayout.MARGIN, pdf.width());
                pdf.table(
                        new String[] {"Node", "Case", "p", "Limit"},
                        v,
                        new float[] {0.25f, 0.25f, 0.25f, 0.25f},
                        SMALL);
            }
        }

        // Methods
        pdf.methods(sheet.methods(), BODY, SMALL);
        pdf.heading("Assumptions", 12);
        pdf.paragraph(
                "Steady, incompressible, isothermal flow of a Newtonian liquid filling every pipe. Demands are"
                        + " steady and drawn at the nodes. Fluid properties are evaluated once at the network"
                        + " temperature. Check valves and pumps are shut where they would pass reverse flow; control"
                        + " valves take the status the solve finds. Gravity is standard gravity.",
                BODY);
        pdf.cautions(sheet.cautions(), u, BODY);
        pdf.footers("Headway " + sheet.version() + " · input hash "
                + sheet.inputHash().substring(0, 16) + " · estimates for design review; check against local codes");
    }

    /** The element's data as a reviewer checks it: bore, length, roughness or C and their sources, or the law. */
    static String data(Link l, NetworkResult.LinkResult lr, UnitSystem u) {
        if (l.element() instanceof Segment s) {
            StringBuilder b = new StringBuilder();
            b.append("L ")
                    .append(q(s.length(), QuantityKind.LENGTH, u))
                    .append(", D ")
                    .append(q(s.innerDiameter(), QuantityKind.DIAMETER, u));
            if (s.hazenWilliams().isPresent()) {
                b.append(", C ")
                        .append(Quantities.formatNumber(s.hazenWilliams().get().value()));
                if (!s.hazenWilliams().get().source().isEmpty()) {
                    b.append(" (").append(s.hazenWilliams().get().source()).append(')');
                }
            } else {
                b.append(", ε ").append(q(s.roughness(), QuantityKind.ROUGHNESS, u));
                if (!s.roughnessSource().isEmpty()) {
                    b.append(" (").append(s.roughnessSource()).append(')');
                }
            }
            if (!s.pipeDescription().isEmpty()) {
                b.append("; ").append(s.pipeDescription());
            }
            if (!s.fittings().isEmpty() || s.extraLossCoefficient() > 0) {
                b.append("; fittings ΣK at flow");
            }
            return SafeText.cell(b.toString());
        }
        return SafeText.cell(
                lr.element().map(e -> Quantities.inSystem(e.law(), u)).orElse(l.kind()));
    }

    private static String kinds(Network net) {
        java.util.Map<String, Integer> count = new java.util.LinkedHashMap<>();
        for (Link l : net.links()) {
            count.merge(l.kind(), 1, Integer::sum);
        }
        List<String> parts = new ArrayList<>();
        count.forEach((k, v) -> parts.add(v + " " + (v == 1 ? k : k + "s")));
        return String.join(", ", parts);
    }

    private static String kind(Node n) {
        return switch (n.kind()) {
            case JUNCTION -> "junction";
            case FIXED_HEAD -> "fixed head";
            case REFERENCE -> "reference";
        };
    }

    private static String[] row(String a, String b, String c) {
        return new String[] {a, b, c};
    }

    private static String q(double si, QuantityKind kind, UnitSystem u) {
        return Double.isFinite(si) ? Quantities.format(si, kind, u) : "—";
    }

    /** A number in the display unit, without the unit (the column header carries it). */
    private static String v(double si, QuantityKind kind, UnitSystem u) {
        return Double.isFinite(si) ? Quantities.formatNumber(Quantities.fromSi(si, kind, u)) : "—";
    }

    private static String sci(double v) {
        return String.format(Locale.ROOT, "%.2e", v);
    }
}
