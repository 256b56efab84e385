package org.headway.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.headway.caution.Caution;
import org.headway.project.AtomicFiles;
import org.headway.system.Element;
import org.headway.system.ElementProfile;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.Gravity;
import org.headway.system.PipeRun;
import org.headway.system.PumpElement;
import org.headway.system.RatedComponent;
import org.headway.system.RunResult;
import org.headway.system.Segment;
import org.headway.system.SegmentResult;

/**
 * Writes the head-loss workbook (.xlsx): an Inputs sheet of SI values and a Results sheet whose
 * velocity, Reynolds number, relative roughness, friction and minor losses and totals are live
 * formulas on the input cells, so a checker can change an input and see every result follow. The
 * friction factor is Headway's value (Colebrook is implicit), with the explicit Swamee–Jain estimate
 * beside it as a formula for comparison.
 */
public final class WorkbookSheetWriter {

    /** Row (0-based) of the first segment on the Inputs sheet. */
    static final int FIRST_SEGMENT_ROW = 15;
    /** Row (0-based) of the first segment on the Results sheet. */
    static final int FIRST_RESULT_ROW = 4;
    /** Row (0-based) of the first element on the Elements sheet. */
    static final int FIRST_ELEMENT_ROW = 4;

    private WorkbookSheetWriter() {}

    /**
     * @param sheet sheet content
     * @param target the .xlsx file
     * @param overwrite whether an existing file may be replaced
     */
    public static void write(HeadLossSheet sheet, Path target, boolean overwrite) {
        AtomicFiles.write(target, overwrite, content(sheet));
    }

    /** The workbook's content, for writing with other files all or none. */
    public static AtomicFiles.Writer content(HeadLossSheet sheet) {
        return out -> {
            Workbook wb = new Workbook(out, "Headway", "1.0");
            writeInputs(wb.newWorksheet("Inputs"), sheet);
            writeResults(wb.newWorksheet("Results"), sheet);
            writeElements(wb.newWorksheet("Elements"), sheet);
            writeNotes(wb.newWorksheet("Methods and cautions"), sheet);
            wb.finish();
        };
    }

    private static void writeInputs(Worksheet ws, HeadLossSheet sheet) throws IOException {
        PipeRun run = sheet.run();
        ws.value(0, 0, "Headway head-loss workbook — inputs (SI units)");
        ws.style(0, 0).bold().fontSize(13).set();
        ws.value(1, 0, SafeText.cell(sheet.project().title()));
        ws.value(2, 0, "CAUTION: " + Caution.GENERAL_REVIEW.message());
        ws.value(3, 0, "Headway " + sheet.version() + ", input hash " + sheet.inputHash());
        label(ws, 5, "standard gravity g [m/s²]", Gravity.STANDARD);
        label(ws, 6, "density ρ [kg/m³]", run.fluid().density());
        label(ws, 7, "dynamic viscosity μ [Pa·s]", run.fluid().dynamicViscosity());
        label(ws, 8, "design flow Q [m³/s]", run.designFlow());
        label(ws, 9, "source level above pipe inlet [m]", run.source().level());
        label(ws, 10, "source gauge pressure [Pa]", run.source().pressure());
        label(ws, 11, "delivery level above pipe outlet [m]", run.delivery().level());
        label(ws, 12, "delivery gauge pressure [Pa]", run.delivery().pressure());
        label(ws, 13, "site barometric pressure [Pa]", run.site().pressure());
        ws.value(13, 2, SafeText.cell(run.site().basis()));
        int h = FIRST_SEGMENT_ROW - 1;
        String[] header = {
            "segment",
            "length L [m]",
            "inner diameter D [m]",
            "roughness ε [m]",
            "ΣK at design flow [-]",
            "elevation change Δz [m]",
            "pipe",
            "roughness source"
        };
        for (int c = 0; c < header.length; c++) {
            ws.value(h, c, header[c]);
            ws.style(h, c).bold().set();
        }
        RunResult r = sheet.result();
        for (int i = 0; i < run.segments().size(); i++) {
            Segment s = run.segments().get(i);
            int row = FIRST_SEGMENT_ROW + i;
            ws.value(row, 0, SafeText.cell(s.name()));
            ws.value(row, 1, s.length());
            ws.value(row, 2, s.innerDiameter());
            ws.value(row, 3, s.roughness());
            ws.value(row, 4, r.segment(s.id()).orElseThrow().totalLossCoefficient());
            ws.value(row, 5, s.elevationChange());
            ws.value(row, 6, SafeText.cell(s.pipeDescription()));
            ws.value(row, 7, SafeText.cell(s.roughnessSource()));
        }
        int note = FIRST_SEGMENT_ROW + run.segments().size() + 1;
        ws.value(
                note,
                0,
                "ΣK is Headway's value at the design flow: 2-K and 3-K fittings depend on Re and"
                        + " bore, so it does not follow a changed flow here.");
        ws.width(0, 34);
        for (int c = 1; c < 6; c++) {
            ws.width(c, 20);
        }
        ws.width(6, 40);
        ws.width(7, 50);
    }

    private static void label(Worksheet ws, int row, String text, double value) {
        ws.value(row, 0, text);
        ws.value(row, 1, value);
    }

    /** Inputs!$B$n of a 0-based row. */
    private static String in(int row) {
        return "Inputs!$B$" + (row + 1);
    }

    private static void writeResults(Worksheet ws, HeadLossSheet sheet) throws IOException {
        PipeRun run = sheet.run();
        RunResult r = sheet.result();
        ws.value(0, 0, "Results — formulas on the Inputs sheet (SI units)");
        ws.style(0, 0).bold().fontSize(13).set();
        ws.value(
                1,
                0,
                "f is Headway's value (" + run.friction().displayName()
                        + "); the Swamee–Jain column is an explicit estimate for the checker.");
        String[] header = {
            "segment",
            "velocity V [m/s]",
            "Reynolds number Re [-]",
            "relative roughness ε/D [-]",
            "friction factor f [-] (Headway)",
            "f Swamee–Jain [-] (check)",
            "friction loss h_f [m]",
            "minor loss h_m [m]",
            "segment loss [m]"
        };
        int h = FIRST_RESULT_ROW - 1;
        for (int c = 0; c < header.length; c++) {
            ws.value(h, c, header[c]);
            ws.style(h, c).bold().set();
        }
        String g = in(5);
        String rho = in(6);
        String mu = in(7);
        String flow = in(8);
        int n = run.segments().size();
        for (int i = 0; i < n; i++) {
            int row = FIRST_RESULT_ROW + i;
            int inRow = FIRST_SEGMENT_ROW + i + 1; // 1-based row on Inputs
            int x = row + 1; // 1-based row here
            SegmentResult sr = r.segment(run.segments().get(i).id()).orElseThrow();
            ws.formula(row, 0, "Inputs!A" + inRow);
            ws.formula(row, 1, flow + "/(PI()*Inputs!C" + inRow + "^2/4)");
            ws.formula(row, 2, rho + "*B" + x + "*Inputs!C" + inRow + "/" + mu);
            ws.formula(row, 3, "Inputs!D" + inRow + "/Inputs!C" + inRow);
            ws.value(row, 4, sr.frictionFactor());
            if (sr.reynolds() > 0) {
                ws.formula(row, 5, "0.25/LOG10(D" + x + "/3.7+5.74/C" + x + "^0.9)^2");
            } else {
                ws.value(row, 5, "no flow");
            }
            ws.formula(row, 6, "E" + x + "*Inputs!B" + inRow + "/Inputs!C" + inRow + "*B" + x + "^2/(2*" + g + ")");
            ws.formula(row, 7, "Inputs!E" + inRow + "*B" + x + "^2/(2*" + g + ")");
            ws.formula(row, 8, "G" + x + "+H" + x);
        }
        int first = FIRST_RESULT_ROW + 1;
        int last = FIRST_RESULT_ROW + n;
        int t = FIRST_RESULT_ROW + n + 1;
        ws.value(t, 0, "Totals");
        ws.style(t, 0).bold().set();
        ws.value(t, 2, "formula");
        ws.value(t, 3, "Headway value");
        String inFirst = String.valueOf(FIRST_SEGMENT_ROW + 1);
        String inLast = String.valueOf(FIRST_SEGMENT_ROW + n);
        totalRow(
                ws,
                t + 1,
                "friction loss Σh_f [m]",
                "SUM(G" + first + ":G" + last + ")",
                r.totals().frictionHeadLoss());
        totalRow(
                ws,
                t + 2,
                "minor loss Σh_m [m] (fittings + components)",
                "SUM(H" + first + ":H" + last + ")+SUM(Elements!H" + (FIRST_ELEMENT_ROW + 1) + ":Elements!H"
                        + (FIRST_ELEMENT_ROW + Math.max(1, run.elements().size())) + ")",
                r.totals().minorHeadLoss());
        totalRow(
                ws,
                t + 3,
                "static head [m]",
                "SUM(Inputs!F" + inFirst + ":Inputs!F" + inLast + ")+(" + in(11) + "+" + in(12) + "/(" + rho + "*" + g
                        + "))-(" + in(9) + "+" + in(10) + "/(" + rho + "*" + g + "))",
                r.totals().staticHead());
        totalRow(
                ws,
                t + 4,
                "total head H [m]",
                "C" + (t + 2) + "+C" + (t + 3) + "+C" + (t + 4),
                r.totals().totalHead());
        totalRow(
                ws,
                t + 5,
                "pressure drop ρg(Σh_f+Σh_m) [Pa]",
                rho + "*" + g + "*(C" + (t + 2) + "+C" + (t + 3) + ")",
                r.totals().pressureDrop());
        ws.width(0, 34);
        for (int c = 1; c < 9; c++) {
            ws.width(c, 22);
        }
    }

    /**
     * One row per element in run order: its law, Headway's head loss, a live check formula where the
     * law is closed-form (valve by Kv, rated component), the component loss counted in Σh_m and the
     * gauge and absolute pressures at its ends.
     */
    private static void writeElements(Worksheet ws, HeadLossSheet sheet) throws IOException {
        PipeRun run = sheet.run();
        RunResult r = sheet.result();
        ws.value(0, 0, "Elements in run order — pressures gauge unless marked absolute (SI units)");
        ws.style(0, 0).bold().fontSize(13).set();
        ws.value(
                1,
                0,
                "Column H is the loss of valves, rated components and diameter changes, counted in Σh_m on"
                        + " the Results sheet; pipes and the pump count there through their own rows.");
        String[] header = {
            "element id",
            "kind",
            "name",
            "law",
            "flow Q [m³/s]",
            "head loss [m] (Headway)",
            "head loss [m] (check formula)",
            "component loss in Σh_m [m]",
            "inlet gauge pressure [Pa]",
            "outlet gauge pressure [Pa]",
            "lowest absolute pressure [Pa]"
        };
        int h = FIRST_ELEMENT_ROW - 1;
        for (int c = 0; c < header.length; c++) {
            ws.value(h, c, header[c]);
            ws.style(h, c).bold().set();
        }
        String g = in(5);
        String rho = in(6);
        String flow = in(8);
        String baro = in(13);
        for (int i = 0; i < run.elements().size(); i++) {
            Element e = run.elements().get(i);
            ElementProfile ep = r.element(e.id()).orElseThrow();
            int row = FIRST_ELEMENT_ROW + i;
            int x = row + 1;
            ws.value(row, 0, SafeText.cell(e.id()));
            ws.value(row, 1, e.kind());
            ws.value(row, 2, SafeText.cell(e.name()));
            ws.value(row, 3, SafeText.cell(ep.result().law()));
            ws.formula(row, 4, flow);
            ws.value(row, 5, ep.result().headLoss());
            if (e instanceof FlowCoefficientValve v) {
                ws.formula(
                        row,
                        6,
                        "(ABS(E" + x + ")*3600/" + v.flowCoefficient() + ")^2*100000/(1000*" + g + ")*SIGN(E" + x
                                + ")");
            } else if (e instanceof RatedComponent c) {
                ws.formula(
                        row,
                        6,
                        c.ratedPressureDrop() + "*(ABS(E" + x + ")/" + c.ratedFlow() + ")^" + c.exponent() + "/(" + rho
                                + "*" + g + ")*SIGN(E" + x + ")");
            } else {
                ws.value(row, 6, "see Results or law");
            }
            boolean component = !(e instanceof Segment) && !(e instanceof PumpElement);
            if (component) {
                ws.formula(row, 7, "F" + x);
            } else {
                ws.value(row, 7, 0.0);
            }
            ws.value(row, 8, ep.inletPressure());
            ws.value(row, 9, ep.outletPressure());
            ws.formula(row, 10, "MIN(I" + x + ",J" + x + ")+" + baro);
        }
        ws.width(0, 16);
        ws.width(1, 12);
        ws.width(2, 24);
        ws.width(3, 60);
        for (int c = 4; c < header.length; c++) {
            ws.width(c, 22);
        }
    }

    private static void totalRow(Worksheet ws, int row, String label, String formula, double value) {
        ws.value(row, 0, label);
        ws.formula(row, 2, formula);
        ws.value(row, 3, value);
    }

    private static void writeNotes(Worksheet ws, HeadLossSheet sheet) {
        int row = 0;
        ws.value(row++, 0, "Methods");
        ws.style(0, 0).bold().set();
        for (Method m : sheet.methods()) {
            ws.value(row, 0, m.name());
            ws.value(row, 1, m.equation());
            ws.value(row, 2, m.citation());
            row++;
        }
        row++;
        ws.value(row, 0, "Cautions");
        ws.style(row, 0).bold().set();
        row++;
        List<Caution> cautions = sheet.cautions();
        for (Caution c : cautions) {
            ws.value(row, 0, c.severity().name().toLowerCase(Locale.ROOT));
            ws.value(row, 1, SafeText.cell(c.message()));
            ws.value(row, 2, c.basis());
            row++;
        }
        ws.width(0, 30);
        ws.width(1, 80);
        ws.width(2, 80);
    }
}
