package org.headway.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.headway.caution.Caution;
import org.headway.network.CaseResult;
import org.headway.network.IndexCircuit;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.PumpDuty;
import org.headway.project.AtomicFiles;
import org.headway.system.Gravity;
import org.headway.system.Segment;

/**
 * The network sheet as a workbook a checker can audit, in SI units: the inputs, every node and link
 * with the engine's values, and for each Darcy–Weisbach pipe the velocity, Reynolds number and
 * friction loss recomputed by formulas from the bore, length, flow, friction factor and the fluid on
 * the Inputs sheet, beside the engine's loss for comparison. Terminal paths, pumps, cases, methods and
 * cautions follow.
 */
public final class NetworkWorkbookWriter {

    private NetworkWorkbookWriter() {}

    /** Writes the workbook atomically. */
    public static void write(NetworkSheet sheet, Path target, boolean overwrite) {
        AtomicFiles.write(target, overwrite, content(sheet));
    }

    /** The workbook's content, for writing with other files all or none. */
    public static AtomicFiles.Writer content(NetworkSheet sheet) {
        return out -> {
            Workbook wb = new Workbook(out, "Headway", "1.0");
            inputs(wb.newWorksheet("Inputs"), sheet);
            nodes(wb.newWorksheet("Nodes"), sheet);
            links(wb.newWorksheet("Links"), sheet);
            paths(wb.newWorksheet("Terminal paths"), sheet);
            pumpsAndCases(wb.newWorksheet("Pumps and cases"), sheet);
            notes(wb.newWorksheet("Methods and cautions"), sheet);
            wb.finish();
        };
    }

    /** Row (0-based) of the density on the Inputs sheet: formulas refer to Inputs!B5. */
    static final int DENSITY_ROW = 4;

    private static void inputs(Worksheet ws, NetworkSheet sheet) throws IOException {
        Network net = sheet.network();
        var f = net.context().fluid();
        ws.value(0, 0, "Headway network workbook — inputs (SI units)");
        ws.value(1, 0, SafeText.cell(sheet.project().title()));
        ws.value(2, 0, "CAUTION: " + Caution.GENERAL_REVIEW.message());
        ws.value(3, 0, "Headway " + sheet.version() + ", input hash " + sheet.inputHash());
        ws.value(DENSITY_ROW, 0, "density [kg/m3]");
        ws.value(DENSITY_ROW, 1, f.density());
        ws.value(DENSITY_ROW, 2, SafeText.cell(f.densitySource()));
        ws.value(DENSITY_ROW + 1, 0, "dynamic viscosity [Pa s]");
        ws.value(DENSITY_ROW + 1, 1, f.dynamicViscosity());
        ws.value(DENSITY_ROW + 1, 2, SafeText.cell(f.viscositySource()));
        ws.value(DENSITY_ROW + 2, 0, "gravity [m/s2]");
        ws.value(DENSITY_ROW + 2, 1, Gravity.STANDARD);
        ws.value(DENSITY_ROW + 2, 2, "standard gravity");
        ws.value(DENSITY_ROW + 3, 0, "friction method");
        ws.value(DENSITY_ROW + 3, 1, net.context().friction().id());
        ws.value(DENSITY_ROW + 3, 2, SafeText.cell(net.context().friction().displayName()));
        ws.value(DENSITY_ROW + 4, 0, "barometric pressure [Pa]");
        ws.value(DENSITY_ROW + 4, 1, net.site().pressure());
        ws.value(DENSITY_ROW + 4, 2, SafeText.cell(net.site().basis()));
        NetworkResult r = sheet.result().base().result();
        ws.value(DENSITY_ROW + 6, 0, "converged");
        ws.value(DENSITY_ROW + 6, 1, r.converged() ? "yes" : "no");
        ws.value(DENSITY_ROW + 7, 0, "iterations");
        ws.value(DENSITY_ROW + 7, 1, r.iterations());
        ws.value(DENSITY_ROW + 8, 0, "head change [m]");
        ws.value(DENSITY_ROW + 8, 1, r.headChange());
        ws.value(DENSITY_ROW + 9, 0, "energy residual [m]");
        ws.value(DENSITY_ROW + 9, 1, r.energyResidual());
        ws.value(DENSITY_ROW + 10, 0, "continuity residual [m3/s]");
        ws.value(DENSITY_ROW + 10, 1, r.continuityResidual());
    }

    private static void nodes(Worksheet ws, NetworkSheet sheet) throws IOException {
        String[] header = {
            "node", "kind", "elevation [m]", "demand [m3/s]", "head [m]", "pressure [Pa]", "pressure check [Pa]"
        };
        for (int c = 0; c < header.length; c++) {
            ws.value(0, c, header[c]);
        }
        NetworkResult r = sheet.result().base().result();
        Network net = sheet.network();
        for (int i = 0; i < r.nodes().size(); i++) {
            NetworkResult.NodeResult n = r.nodes().get(i);
            int row = i + 1;
            ws.value(row, 0, SafeText.cell(n.id()));
            ws.value(
                    row,
                    1,
                    net.nodes().get(i).kind().name().toLowerCase(Locale.ROOT).replace('_', '-'));
            number(ws, row, 2, n.elevation());
            number(ws, row, 3, n.demand());
            number(ws, row, 4, n.head());
            number(ws, row, 5, n.pressure());
            if (Double.isFinite(n.head())) {
                // p = ρ g (H − z), from the Inputs sheet.
                int excel = row + 1;
                ws.formula(
                        row,
                        6,
                        "Inputs!B" + (DENSITY_ROW + 1) + "*Inputs!B" + (DENSITY_ROW + 3) + "*(E" + excel + "-C" + excel
                                + ")");
            }
        }
    }

    /** Column letters of the link sheet, for its formulas. */
    static final String[] LINK_HEADER = {
        "link",
        "kind",
        "from",
        "to",
        "length [m]",
        "inner diameter [m]",
        "roughness [m]",
        "flow [m3/s]",
        "friction factor",
        "head loss [m]",
        "velocity check [m/s]",
        "Reynolds check",
        "friction loss check [m]",
        "element data",
        "status"
    };

    private static void links(Worksheet ws, NetworkSheet sheet) throws IOException {
        for (int c = 0; c < LINK_HEADER.length; c++) {
            ws.value(0, c, LINK_HEADER[c]);
        }
        NetworkResult r = sheet.result().base().result();
        Network net = sheet.network();
        String rho = "Inputs!B" + (DENSITY_ROW + 1);
        String mu = "Inputs!B" + (DENSITY_ROW + 2);
        String g = "Inputs!B" + (DENSITY_ROW + 3);
        for (int k = 0; k < net.links().size(); k++) {
            Link l = net.links().get(k);
            NetworkResult.LinkResult lr = r.links().get(k);
            int row = k + 1;
            int x = row + 1;
            ws.value(row, 0, SafeText.cell(l.id()));
            ws.value(row, 1, l.kind());
            ws.value(row, 2, SafeText.cell(l.from()));
            ws.value(row, 3, SafeText.cell(l.to()));
            number(ws, row, 7, lr.flow());
            number(ws, row, 9, lr.headLoss());
            if (l.element() instanceof Segment s) {
                ws.value(row, 4, s.length());
                ws.value(row, 5, s.innerDiameter());
                ws.value(row, 6, s.roughness());
                number(ws, row, 8, lr.frictionFactor());
                ws.formula(row, 10, "H" + x + "/(PI()*F" + x + "^2/4)");
                ws.formula(row, 11, rho + "*ABS(K" + x + ")*F" + x + "/" + mu);
                if (Double.isFinite(lr.frictionFactor())) {
                    // Darcy–Weisbach with the engine's f: the friction part of the loss (fittings excluded).
                    ws.formula(row, 12, "SIGN(H" + x + ")*I" + x + "*E" + x + "/F" + x + "*K" + x + "^2/(2*" + g + ")");
                }
            }
            ws.value(row, 13, NetworkPdfWriter.data(l, lr, org.headway.units.UnitSystem.SI));
            ws.value(row, 14, lr.status());
        }
    }

    private static void paths(Worksheet ws, NetworkSheet sheet) throws IOException {
        String[] header = {"terminal", "source", "head loss [m]", "pipe length [m]", "index circuit", "route"};
        for (int c = 0; c < header.length; c++) {
            ws.value(0, c, header[c]);
        }
        IndexCircuit circuit = sheet.result().base().circuit();
        String index = circuit.index().map(IndexCircuit.TerminalPath::terminal).orElse("");
        int row = 1;
        for (IndexCircuit.TerminalPath p : circuit.paths()) {
            ws.value(row, 0, SafeText.cell(p.terminal()));
            ws.value(row, 1, SafeText.cell(p.source()));
            ws.value(row, 2, p.headLoss());
            ws.value(row, 3, p.length());
            ws.value(row, 4, p.terminal().equals(index) ? "yes" : "");
            ws.value(row, 5, SafeText.cell(String.join(" > ", p.nodes())));
            row++;
        }
    }

    private static void pumpsAndCases(Worksheet ws, NetworkSheet sheet) throws IOException {
        String[] header = {
            "pump", "status", "flow [m3/s]", "head [m]", "NPSH available [m]", "NPSH required [m]", "margin [m]"
        };
        for (int c = 0; c < header.length; c++) {
            ws.value(0, c, header[c]);
        }
        int row = 1;
        for (PumpDuty d : sheet.result().base().pumps().pumps()) {
            ws.value(row, 0, SafeText.cell(d.id()));
            ws.value(row, 1, d.status());
            number(ws, row, 2, d.flow());
            number(ws, row, 3, d.head());
            number(ws, row, 4, d.npshAvailable());
            number(ws, row, 5, d.npshRequired());
            number(ws, row, 6, d.npshMargin());
            row++;
        }
        row += 1;
        ws.value(row++, 0, "case / node / pressure [Pa] / head [m]");
        for (CaseResult c : sheet.result().cases()) {
            for (NetworkResult.NodeResult n : c.result().nodes()) {
                ws.value(row, 0, SafeText.cell(c.name()));
                ws.value(row, 1, SafeText.cell(n.id()));
                number(ws, row, 2, n.pressure());
                number(ws, row, 3, n.head());
                row++;
            }
        }
    }

    private static void notes(Worksheet ws, NetworkSheet sheet) throws IOException {
        int row = 0;
        ws.value(row++, 0, "Methods");
        for (Method m : sheet.methods()) {
            ws.value(row, 0, SafeText.cell(m.name()));
            ws.value(row, 1, SafeText.cell(m.equation()));
            ws.value(row, 2, SafeText.cell(m.citation()));
            row++;
        }
        row++;
        ws.value(row++, 0, "Cautions");
        for (Caution c : sheet.cautions()) {
            ws.value(row, 0, c.severity().name().toLowerCase(Locale.ROOT));
            ws.value(row, 1, SafeText.cell(c.message()));
            ws.value(row, 2, SafeText.cell(c.basis()));
            row++;
        }
    }

    private static void number(Worksheet ws, int row, int col, double v) {
        if (Double.isFinite(v)) {
            ws.value(row, col, v);
        }
    }
}
