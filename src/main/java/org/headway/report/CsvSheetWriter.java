package org.headway.report;

import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.headway.project.AtomicFiles;
import org.headway.system.ElementProfile;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;

/** Writes the per-segment results as CSV: one header row with units, SI values, round-trippable numbers. */
public final class CsvSheetWriter {

    /** Column headers, units in brackets. */
    public static final String[] HEADER = {
        "segment",
        "velocity [m/s]",
        "reynolds [-]",
        "relative_roughness [-]",
        "regime",
        "friction_factor [-]",
        "friction_method",
        "major_head_loss [m]",
        "loss_coefficient_total [-]",
        "minor_head_loss [m]",
        "outlet_energy_grade [m]",
        "outlet_hydraulic_grade [m]",
        "id",
        "inlet_gauge_pressure [Pa]",
        "outlet_gauge_pressure [Pa]",
        "high_point_gauge_pressure [Pa]"
    };

    private CsvSheetWriter() {}

    /** Writes the CSV atomically. */
    public static void write(HeadLossSheet sheet, Path target, boolean overwrite) {
        AtomicFiles.write(target, overwrite, content(sheet));
    }

    /** The CSV's content, for writing with other files all or none. */
    public static AtomicFiles.Writer content(HeadLossSheet sheet) {
        return out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            write(sheet.result(), w);
            w.flush();
        };
    }

    /**
     * Writes the table to a writer (used by the CLI for stdout too). Columns after the grade lines
     * were added with the element model: the pipe's id and the gauge pressures at its ends and high
     * point (blank when no high point is given).
     */
    public static void write(RunResult result, Appendable w) throws java.io.IOException {
        CSVPrinter p = new CSVPrinter(
                w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
        p.printRecord((Object[]) HEADER);
        for (SegmentResult s : result.segments()) {
            ElementProfile ep = result.element(s.id()).orElseThrow();
            p.printRecord(
                    SafeText.cell(s.name()),
                    Double.toString(s.velocity()),
                    Double.toString(s.reynolds()),
                    Double.toString(s.relativeRoughness()),
                    s.regime().name().toLowerCase(Locale.ROOT),
                    Double.toString(s.frictionFactor()),
                    s.frictionMethod(),
                    Double.toString(s.majorHeadLoss()),
                    Double.toString(s.totalLossCoefficient()),
                    Double.toString(s.minorHeadLoss()),
                    Double.toString(s.outletEnergyGrade()),
                    Double.toString(s.outletHydraulicGrade()),
                    SafeText.cell(s.id()),
                    Double.toString(ep.inletPressure()),
                    Double.toString(ep.outletPressure()),
                    ep.highPointPressure().isPresent()
                            ? Double.toString(ep.highPointPressure().getAsDouble())
                            : "");
        }
        p.flush();
    }

    /** Column headers of the system-curve table, units in brackets. */
    public static final String[] CURVE_HEADER = {"flow [m3/s]", "total_head [m]", "head_loss [m]"};

    /**
     * Writes a system curve as a table of its own (SI, round-trippable numbers).
     *
     * @param curve points of the curve
     * @param w where to write
     */
    public static void writeCurve(java.util.List<org.headway.system.SystemCurve.Point> curve, Appendable w)
            throws java.io.IOException {
        CSVPrinter p = new CSVPrinter(
                w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
        p.printRecord((Object[]) CURVE_HEADER);
        for (org.headway.system.SystemCurve.Point point : curve) {
            p.printRecord(
                    Double.toString(point.flow()),
                    Double.toString(point.totalHead()),
                    Double.toString(point.headLoss()));
        }
        p.flush();
    }
}
