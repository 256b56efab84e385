package org.headway.report;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.headway.project.AtomicFiles;
import org.headway.project.Project;
import org.headway.system.Element;
import org.headway.system.ElementProfile;
import org.headway.system.FittingUse;
import org.headway.system.PipeRun;
import org.headway.system.PumpElement;
import org.headway.system.RunResult;
import org.headway.system.Segment;
import org.headway.system.SegmentResult;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import org.jfree.chart.JFreeChart;

/** Writes the head-loss sheet as a PDF: title block, inputs, results, charts, methods, cautions. */
public final class PdfSheetWriter {

    /** Chart drawing size in points before scaling to the text width. */
    private static final float CHART_WIDTH = 640f;

    private static final float CHART_HEIGHT = 400f;
    private static final float BODY = 8.5f;
    private static final float SMALL = 7.5f;

    private PdfSheetWriter() {}

    /**
     * Writes the PDF atomically.
     *
     * @param sheet the sheet content
     * @param target the file
     * @param overwrite whether an existing file may be replaced
     * @param units units the sheet is printed in
     */
    public static void write(HeadLossSheet sheet, Path target, boolean overwrite, UnitSystem units) {
        AtomicFiles.write(target, overwrite, content(sheet, units));
    }

    /** The PDF's content, for writing with other files all or none. */
    public static AtomicFiles.Writer content(HeadLossSheet sheet, UnitSystem units) {
        return out -> {
            try (PdfLayout pdf = new PdfLayout()) {
                compose(pdf, sheet, units);
                pdf.doc.save(out);
            }
        };
    }

    private static void compose(PdfLayout pdf, HeadLossSheet sheet, UnitSystem u) throws IOException {
        Project p = sheet.project();
        PipeRun run = sheet.run();
        pdf.documentInfo("Head-loss sheet: " + p.title(), sheet.version(), sheet.inputHash());

        pdf.heading("Head-loss sheet", 16);
        pdf.paragraph(p.title().isEmpty() ? "(untitled run)" : p.title(), pdf.bold, 11, PdfLayout.MARGIN, pdf.width());
        pdf.space(4);
        pdf.titleBlock(p.titleBlock(), sheet.version(), BODY, SMALL);

        if (!sheet.mode().equals("headloss")) {
            pdf.heading(sheet.mode().equals("flow") ? "Flow mode" : "Size mode", 12);
            pdf.paragraph(
                    (sheet.mode().equals("flow")
                                    ? "The flow the available head drives through the run; every result below is at"
                                            + " that flow. "
                                    : "The run at the smallest catalog size meeting the limits; every result below is"
                                            + " for that size. ")
                            + Quantities.inSystem(sheet.modeNote(), u),
                    BODY);
            if (!sheet.sizeChecks().isEmpty()) {
                List<String[]> rows = new ArrayList<>();
                for (org.headway.system.SizeSelector.SizeCheck c : sheet.sizeChecks()) {
                    rows.add(new String[] {
                        c.size().label(),
                        q(c.size().innerDiameter(), QuantityKind.DIAMETER, u),
                        c.reasons().isEmpty() && c.maximumVelocity() == 0
                                ? "—"
                                : q(c.maximumVelocity(), QuantityKind.VELOCITY, u),
                        n(c.maximumFrictionLossPer100m()),
                        q(c.totalHead(), QuantityKind.HEAD, u),
                        c.accepted() ? "meets the limits" : Quantities.inSystem(String.join("; ", c.reasons()), u)
                    });
                }
                pdf.table(
                        new String[] {"Size", "Bore", "Largest V", "Loss per 100 m", "Total head", "Verdict"},
                        rows,
                        new float[] {0.16f, 0.11f, 0.12f, 0.12f, 0.12f, 0.37f},
                        SMALL);
            }
        }

        composeInputs(pdf, sheet, u);
        composeResults(pdf, sheet, u);
        composeCharts(pdf, sheet, u);
        composeMethods(pdf, sheet, u);
    }

    private static void composeInputs(PdfLayout pdf, HeadLossSheet sheet, UnitSystem u) throws IOException {
        PipeRun run = sheet.run();
        RunResult r = sheet.result();
        // Inputs
        pdf.heading("Inputs", 12);
        var f = run.fluid();
        List<String[]> fluid = new ArrayList<>();
        fluid.add(row("Fluid", f.fluid(), ""));
        fluid.add(
                f.temperatureGiven()
                        ? row("Temperature", q(f.temperature(), QuantityKind.TEMPERATURE, u), "as given")
                        : row("Temperature", "not given", "density and viscosity given directly; none needed"));
        fluid.add(row(
                "Pressure (absolute)",
                q(f.pressure(), QuantityKind.PRESSURE, u),
                "as given, else the site barometric pressure"));
        fluid.add(row("Density ρ", q(f.density(), QuantityKind.DENSITY, u), f.densitySource()));
        fluid.add(row(
                "Dynamic viscosity μ",
                q(f.dynamicViscosity(), QuantityKind.DYNAMIC_VISCOSITY, u),
                f.viscositySource()));
        fluid.add(row("Kinematic viscosity ν", q(f.kinematicViscosity(), QuantityKind.KINEMATIC_VISCOSITY, u), "μ/ρ"));
        if (f.vapourPressure().isPresent()) {
            fluid.add(row(
                    "Vapour pressure p_v",
                    q(f.vapourPressure().getAsDouble(), QuantityKind.PRESSURE, u),
                    f.vapourPressureSource()));
        }
        fluid.add(row(
                "Design flow Q",
                q(run.designFlow(), QuantityKind.VOLUMETRIC_FLOW, u),
                "flow uncertainty ±" + Quantities.formatNumber(run.flowUncertainty() * 100) + " %"));
        fluid.add(row(
                "Friction method", run.friction().displayName(), run.friction().id()));
        fluid.add(row(
                "Source end",
                end(run.source().level(), run.source().pressure(), u),
                "level above pipe inlet; gauge pressure"));
        fluid.add(row(
                "Delivery end",
                end(run.delivery().level(), run.delivery().pressure(), u),
                "level above pipe outlet; gauge pressure"));
        fluid.add(row(
                "Site atmosphere",
                q(run.site().pressure(), QuantityKind.PRESSURE, u) + " absolute",
                run.site().basis() + "; used for NPSH available and every absolute pressure"));
        if (run.pump().isPresent()) {
            var pump = run.pump().get();
            var pumpElement = run.pumpElement().orElseThrow();
            fluid.add(row(
                    "Pump",
                    pump.name() + " (element " + pumpElement.id() + ")"
                            + (pumpElement.speedRatio() != 1.0
                                    ? ", speed ratio " + Quantities.formatNumber(pumpElement.speedRatio())
                                    : ""),
                    pump.points().size() + " points, quadratic fit R² = "
                            + String.format(Locale.ROOT, "%.5f", pump.rSquared())
                            + pumpElement.npshRequiredAt(r.flow()).stream()
                                    .mapToObj(v -> ", NPSH required " + q(v, QuantityKind.HEAD, u)
                                            + (pump.npshCurve().isEmpty()
                                                    ? ""
                                                    : " at " + q(r.flow(), QuantityKind.VOLUMETRIC_FLOW, u)
                                                            + " from the maker's NPSH curve ("
                                                            + pump.npshCurve().size() + " points)"))
                                    .findFirst()
                                    .orElse("")));
        }
        pdf.table(new String[] {"Quantity", "Value", "Source / note"}, fluid, new float[] {0.25f, 0.3f, 0.45f}, BODY);

        List<String[]> pipes = new ArrayList<>();
        for (int i = 0; i < run.segments().size(); i++) {
            Segment s = run.segments().get(i);
            pipes.add(new String[] {
                (i + 1) + ". " + s.name(),
                q(s.length(), QuantityKind.LENGTH, u),
                s.pipeDescription(),
                q(s.innerDiameter(), QuantityKind.DIAMETER, u),
                q(s.roughness(), QuantityKind.ROUGHNESS, u) + " (" + q(s.roughnessLow(), QuantityKind.ROUGHNESS, u)
                        + "–" + q(s.roughnessHigh(), QuantityKind.ROUGHNESS, u) + ")",
                s.roughnessSource(),
                q(s.elevationChange(), QuantityKind.LENGTH, u)
            });
        }
        pdf.space(4);
        pdf.table(
                new String[] {"Segment", "Length", "Pipe", "Inner dia.", "Roughness ε (range)", "ε source", "Δz"},
                pipes,
                new float[] {0.15f, 0.08f, 0.22f, 0.09f, 0.17f, 0.21f, 0.08f},
                SMALL);

        List<String[]> fittings = new ArrayList<>();
        for (int i = 0; i < run.segments().size(); i++) {
            Segment s = run.segments().get(i);
            SegmentResult sr = r.segment(s.id()).orElseThrow();
            for (FittingUse use : s.fittings()) {
                double k = sr.reynolds() > 0 ? use.fitting().lossCoefficient(sr.reynolds(), s.innerDiameter()) : 0;
                fittings.add(new String[] {
                    s.name(),
                    use.count() + " × " + use.fitting().description(),
                    use.fitting().method(),
                    Quantities.formatNumber(k),
                    use.fitting().source()
                });
            }
            if (s.extraLossCoefficient() > 0) {
                fittings.add(new String[] {
                    s.name(), "additional K", "given in project", Quantities.formatNumber(s.extraLossCoefficient()), ""
                });
            }
        }
        if (!fittings.isEmpty()) {
            pdf.space(4);
            pdf.table(
                    new String[] {"Segment", "Fitting", "Method", "K each", "Source"},
                    fittings,
                    new float[] {0.15f, 0.3f, 0.15f, 0.08f, 0.32f},
                    SMALL);
        }

        List<String[]> components = new ArrayList<>();
        for (Element e : run.elements()) {
            if (e instanceof Segment || e instanceof PumpElement) {
                continue;
            }
            ElementProfile ep = r.element(e.id()).orElseThrow();
            components.add(new String[] {
                e.id(), e.kind(), e.name(), Quantities.inSystem(ep.result().law(), u)
            });
        }
        if (!components.isEmpty()) {
            pdf.space(4);
            pdf.table(
                    new String[] {"Element", "Kind", "Name", "Law and source"},
                    components,
                    new float[] {0.12f, 0.1f, 0.2f, 0.58f},
                    SMALL);
        }
    }

    private static void composeResults(PdfLayout pdf, HeadLossSheet sheet, UnitSystem u) throws IOException {
        Project p = sheet.project();
        PipeRun run = sheet.run();
        RunResult r = sheet.result();
        // Results
        pdf.heading("Results at the design flow", 12);
        String h = Quantities.unitSymbol(QuantityKind.HEAD, u);
        List<String[]> res = new ArrayList<>();
        for (int i = 0; i < r.segments().size(); i++) {
            SegmentResult s = r.segments().get(i);
            res.add(new String[] {
                (i + 1) + ". " + s.name(),
                n(Quantities.fromSi(s.velocity(), QuantityKind.VELOCITY, u)),
                n(s.reynolds()),
                s.regime().name().toLowerCase(Locale.ROOT),
                n(s.relativeRoughness()),
                n(s.frictionFactor()) + " (" + s.frictionMethod() + ")",
                n(Quantities.fromSi(s.majorHeadLoss(), QuantityKind.HEAD, u)),
                n(s.totalLossCoefficient()),
                n(Quantities.fromSi(s.minorHeadLoss(), QuantityKind.HEAD, u))
            });
        }
        pdf.table(
                new String[] {
                    "Segment",
                    "V [" + Quantities.unitSymbol(QuantityKind.VELOCITY, u) + "]",
                    "Re",
                    "Regime",
                    "ε/D",
                    "f (method)",
                    "h_f [" + h + "]",
                    "ΣK",
                    "h_m [" + h + "]"
                },
                res,
                new float[] {0.16f, 0.08f, 0.1f, 0.1f, 0.09f, 0.17f, 0.1f, 0.08f, 0.12f},
                SMALL);
        pdf.space(4);
        pdf.paragraph(
                "Pressures along the run (gauge; absolute = gauge + site barometric pressure "
                        + q(run.site().pressure(), QuantityKind.PRESSURE, u) + ")",
                pdf.bold,
                BODY,
                PdfLayout.MARGIN,
                pdf.width());
        String pu = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        List<String[]> pressures = new ArrayList<>();
        for (ElementProfile ep : r.elements()) {
            pressures.add(new String[] {
                ep.id(),
                ep.kind(),
                n(Quantities.fromSi(ep.result().headLoss(), QuantityKind.HEAD, u)),
                n(Quantities.fromSi(
                        Quantities.withoutNoise(
                                ep.inletPressure(), Math.abs(ep.inletPressure()) + Math.abs(ep.outletPressure())),
                        QuantityKind.PRESSURE,
                        u)),
                n(Quantities.fromSi(
                        Quantities.withoutNoise(
                                ep.outletPressure(), Math.abs(ep.inletPressure()) + Math.abs(ep.outletPressure())),
                        QuantityKind.PRESSURE,
                        u)),
                ep.highPointPressure().isPresent()
                        ? n(Quantities.fromSi(ep.highPointPressure().getAsDouble(), QuantityKind.PRESSURE, u))
                        : "—",
                n(Quantities.fromSi(ep.lowestPressure() + run.site().pressure(), QuantityKind.PRESSURE, u)),
                ep.cautions().isEmpty() ? "" : "see cautions"
            });
        }
        pdf.table(
                new String[] {
                    "Element",
                    "Kind",
                    "Head loss [" + h + "]",
                    "p inlet [" + pu + "]",
                    "p outlet [" + pu + "]",
                    "p high point [" + pu + "]",
                    "lowest p abs. [" + pu + "]",
                    "Check"
                },
                pressures,
                new float[] {0.17f, 0.1f, 0.11f, 0.12f, 0.12f, 0.13f, 0.15f, 0.10f},
                SMALL);
        List<String[]> totals = new ArrayList<>();
        totals.add(row("Friction loss Σh_f", q(r.totals().frictionHeadLoss(), QuantityKind.HEAD, u), ""));
        totals.add(row(
                "Fitting and component loss Σh_m",
                q(r.totals().minorHeadLoss(), QuantityKind.HEAD, u),
                "pipe fittings plus valves, rated components and diameter changes"));
        totals.add(row(
                "Static head",
                q(Quantities.withoutNoise(r.totals().staticHead(), run.staticHeadScale()), QuantityKind.HEAD, u),
                "elevation and end heads"));
        double scale = Math.abs(r.totals().staticHead())
                + Math.abs(r.totals().frictionHeadLoss())
                + Math.abs(r.totals().minorHeadLoss());
        double totalHead = Quantities.withoutNoise(r.totals().totalHead(), scale);
        totals.add(row(
                "Total head H",
                q(totalHead, QuantityKind.HEAD, u),
                totalHead < 0
                        ? "negative: surplus head of " + q(-totalHead, QuantityKind.HEAD, u)
                                + " that the ends give beyond the losses; no pump head is needed at this flow"
                        : run.pump().isPresent() ? "what the pump must supply" : "what a pump would have to supply"));
        totals.add(row("Pressure drop", q(r.totals().pressureDrop(), QuantityKind.PRESSURE, u), "ρ g (Σh_f + Σh_m)"));
        r.npshAvailable()
                .ifPresent(v -> totals.add(row("NPSH available", q(v, QuantityKind.HEAD, u), "at the pump inlet")));
        if (sheet.operatingPoint() != null) {
            var op = sheet.operatingPoint();
            totals.add(row(
                    "Pump operating point",
                    op.found()
                            ? q(op.flow(), QuantityKind.VOLUMETRIC_FLOW, u) + " at "
                                    + q(op.head(), QuantityKind.HEAD, u)
                            : "none",
                    Quantities.inSystem(op.message(), u)));
        }
        if (sheet.band() != null) {
            var b = sheet.band();
            totals.add(row(
                    "Head-loss band",
                    q(b.headLoss().nominal(), QuantityKind.HEAD, u) + " ("
                            + q(b.headLoss().low(), QuantityKind.HEAD, u) + " to "
                            + q(b.headLoss().high(), QuantityKind.HEAD, u) + ")",
                    "roughness range and flow ±" + Quantities.formatNumber(b.flowUncertainty() * 100) + " %"));
            totals.add(row(
                    "Total-head band",
                    q(b.totalHead().low(), QuantityKind.HEAD, u) + " to "
                            + q(b.totalHead().high(), QuantityKind.HEAD, u),
                    "same corners"));
        }
        pdf.space(4);
        pdf.table(new String[] {"Total", "Value", "Note"}, totals, new float[] {0.25f, 0.35f, 0.4f}, BODY);
    }

    private static void composeCharts(PdfLayout pdf, HeadLossSheet sheet, UnitSystem u) throws IOException {
        // Charts
        pdf.heading("Charts", 12, CHART_HEIGHT * pdf.width() / CHART_WIDTH);
        chart(pdf, SheetCharts.system(sheet, u));
        chart(pdf, SheetCharts.grades(sheet, u));
        chart(pdf, SheetCharts.friction(sheet));
    }

    private static void composeMethods(PdfLayout pdf, HeadLossSheet sheet, UnitSystem u) throws IOException {
        PipeRun run = sheet.run();
        // Methods
        pdf.methods(sheet.methods(), BODY, SMALL);
        pdf.heading("Assumptions", 12);
        pdf.paragraph(
                "Steady, incompressible, isothermal flow of a Newtonian liquid filling every pipe. Elevations are"
                        + " measured from the run inlet. Velocity at the source and delivery ends is neglected; a"
                        + " discharge into a tank carries its exit loss as a fitting. Minor losses use the K of each"
                        + " fitting referred to the velocity in its own segment; valves, rated"
                        + " components and diameter changes carry their own laws, whatever the pipe size. Fluid properties are evaluated once"
                        + " at the run temperature. Gravity is standard gravity.",
                BODY);

        pdf.cautions(sheet.cautions(), u, BODY);
        pdf.footers("Headway " + sheet.version() + " · input hash "
                + sheet.inputHash().substring(0, 16) + " · estimates for design review; check against local codes");
    }

    private static void chart(PdfLayout pdf, JFreeChart chart) throws IOException {
        PdfBoxGraphics2D g = new PdfBoxGraphics2D(pdf.doc, CHART_WIDTH, CHART_HEIGHT);
        drawThenDispose(g, () -> chart.draw(g, new Rectangle2D.Double(0, 0, CHART_WIDTH, CHART_HEIGHT)));
        PDFormXObject form = g.getXFormObject();
        pdf.form(form, CHART_WIDTH, CHART_HEIGHT);
    }

    /**
     * Draws, then disposes of the graphics. If drawing fails (out of memory under a tight heap, say),
     * a failure of the disposal itself — PDFBox's "SaveCounter should be 0" when the drawing stopped
     * half-way — is attached to the real error instead of replacing it.
     */
    static void drawThenDispose(PdfBoxGraphics2D g, Runnable draw) {
        try {
            draw.run();
        } catch (RuntimeException | Error e) {
            try {
                g.dispose();
            } catch (RuntimeException suppressed) {
                e.addSuppressed(suppressed);
            }
            throw e;
        }
        g.dispose();
    }

    private static String[] row(String a, String b, String c) {
        return new String[] {a, b, c};
    }

    private static String end(double level, double pressure, UnitSystem u) {
        return "level " + q(level, QuantityKind.LENGTH, u) + ", " + q(pressure, QuantityKind.PRESSURE, u);
    }

    private static String q(double si, QuantityKind kind, UnitSystem u) {
        return Quantities.format(si, kind, u);
    }

    private static String n(double v) {
        return Quantities.formatNumber(v);
    }
}
