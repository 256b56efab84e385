package org.headway.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.system.ElementProfile;
import org.headway.system.OperatingPoint;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.headway.system.SizeSelector;
import org.headway.system.SystemCurve;
import org.headway.system.UncertaintyBand;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/** Pipe-run results as a plain-text report for the terminal. */
final class RunText {

    private RunText() {}

    static void print(
            PrintWriter out,
            PipeRun run,
            RunResult r,
            UnitSystem u,
            String mode,
            String modeNote,
            List<SystemCurve.Point> curve,
            OperatingPoint operating,
            UncertaintyBand band,
            List<SizeSelector.SizeCheck> sizes) {
        out.println(run.title().isEmpty() ? "Pipe run" : run.title());
        out.println("Fluid: " + run.fluid().fluid()
                + (run.fluid().temperatureGiven()
                        ? " at " + q(run.fluid().temperature(), QuantityKind.TEMPERATURE, u)
                        : " (temperature not given)")
                + ", ρ = " + q(run.fluid().density(), QuantityKind.DENSITY, u) + ", μ = "
                + q(run.fluid().dynamicViscosity(), QuantityKind.DYNAMIC_VISCOSITY, u));
        out.println("Friction method: " + run.friction().displayName());
        out.println("Flow: " + q(r.flow(), QuantityKind.VOLUMETRIC_FLOW, u) + "   (mode: " + mode + ")");
        if (!modeNote.isEmpty()) {
            out.println("Result: " + Quantities.inSystem(modeNote, u));
        }
        out.println();
        String v = Quantities.unitSymbol(QuantityKind.VELOCITY, u);
        String h = Quantities.unitSymbol(QuantityKind.HEAD, u);
        out.printf(
                Locale.ROOT,
                "%-28s %9s %11s %-12s %9s %9s %7s %9s%n",
                "segment",
                "V [" + v + "]",
                "Re",
                "regime",
                "f",
                "hf [" + h + "]",
                "ΣK",
                "hm [" + h + "]");
        for (SegmentResult s : r.segments()) {
            out.printf(
                    Locale.ROOT,
                    "%-28s %9s %11s %-12s %9s %9s %7s %9s%n",
                    clip(s.name(), 28),
                    n(Quantities.fromSi(s.velocity(), QuantityKind.VELOCITY, u)),
                    n(s.reynolds()),
                    s.regime().name().toLowerCase(Locale.ROOT),
                    n(s.frictionFactor()),
                    n(Quantities.fromSi(s.majorHeadLoss(), QuantityKind.HEAD, u)),
                    n(s.totalLossCoefficient()),
                    n(Quantities.fromSi(s.minorHeadLoss(), QuantityKind.HEAD, u)));
        }
        out.println();
        String pUnit = Quantities.unitSymbol(QuantityKind.PRESSURE, u);
        out.printf(
                Locale.ROOT,
                "%-28s %-12s %9s %12s %12s  %s%n",
                "element",
                "kind",
                "h [" + h + "]",
                "p in [" + pUnit + "]",
                "p out [" + pUnit + "]",
                "law");
        for (ElementProfile e : r.elements()) {
            out.printf(
                    Locale.ROOT,
                    "%-28s %-12s %9s %12s %12s  %s%n",
                    clip(e.id(), 28),
                    e.kind(),
                    n(Quantities.fromSi(e.result().headLoss(), QuantityKind.HEAD, u)),
                    n(Quantities.fromSi(
                            Quantities.withoutNoise(
                                    e.inletPressure(), Math.abs(e.inletPressure()) + Math.abs(e.outletPressure())),
                            QuantityKind.PRESSURE,
                            u)),
                    n(Quantities.fromSi(
                            Quantities.withoutNoise(
                                    e.outletPressure(), Math.abs(e.inletPressure()) + Math.abs(e.outletPressure())),
                            QuantityKind.PRESSURE,
                            u)),
                    Quantities.inSystem(e.result().law(), u));
        }
        out.println(
                "(pressures are gauge; barometric pressure " + q(run.atmosphericPressure(), QuantityKind.PRESSURE, u)
                        + ", " + run.site().basis() + ")");
        out.println();
        out.println("Friction loss:    " + q(r.totals().frictionHeadLoss(), QuantityKind.HEAD, u));
        double components = componentLoss(r);
        out.println("Fitting loss:     " + q(r.totals().minorHeadLoss(), QuantityKind.HEAD, u)
                + (components != 0
                        ? " (pipe fittings " + q(r.totals().minorHeadLoss() - components, QuantityKind.HEAD, u)
                                + ", valves and components " + q(components, QuantityKind.HEAD, u) + ")"
                        : ""));
        out.println("Static head:      "
                + q(Quantities.withoutNoise(r.totals().staticHead(), run.staticHeadScale()), QuantityKind.HEAD, u));
        double scale = Math.abs(r.totals().staticHead())
                + Math.abs(r.totals().frictionHeadLoss())
                + Math.abs(r.totals().minorHeadLoss());
        double totalHead = Quantities.withoutNoise(r.totals().totalHead(), scale);
        out.println("Total head:       " + q(totalHead, QuantityKind.HEAD, u)
                + (totalHead < 0
                        ? " (surplus head " + q(-totalHead, QuantityKind.HEAD, u)
                                + ": the ends give more head than the run loses)"
                        : ""));
        out.println("Pressure drop:    " + q(r.totals().pressureDrop(), QuantityKind.PRESSURE, u)
                + " (friction and fittings)");
        r.npshAvailable().ifPresent(x -> out.println("NPSH available:   " + q(x, QuantityKind.HEAD, u)));
        run.pumpElement()
                .ifPresent(pe -> pe.npshRequiredAt(r.flow())
                        .ifPresent(x -> out.println("NPSH required:    " + q(x, QuantityKind.HEAD, u)
                                + (pe.curve().npshCurve().isEmpty() ? "" : " (maker's NPSH curve at this flow)"))));
        if (band != null && band.flowUncertainty() + 0 >= 0) {
            out.println("Head-loss band:   " + q(band.headLoss().nominal(), QuantityKind.HEAD, u) + " (low "
                    + q(band.headLoss().low(), QuantityKind.HEAD, u) + ", high "
                    + q(band.headLoss().high(), QuantityKind.HEAD, u) + "; roughness range, flow ±"
                    + Quantities.formatNumber(band.flowUncertainty() * 100) + " %)");
        }
        if (operating != null) {
            out.println("Pump: "
                    + (operating.found()
                            ? "operating point " + q(operating.flow(), QuantityKind.VOLUMETRIC_FLOW, u) + " at "
                                    + q(operating.head(), QuantityKind.HEAD, u)
                            : Quantities.inSystem(operating.message(), u)));
            for (Caution c : operating.cautions()) {
                out.println("  caution: " + Quantities.inSystem(c.message(), u));
            }
        }
        if (!sizes.isEmpty()) {
            out.println();
            out.println("Size candidates (smallest first):");
            int chosen = -1;
            for (int i = 0; i < sizes.size(); i++) {
                if (sizes.get(i).accepted()) {
                    chosen = i;
                    break;
                }
            }
            // Show the sizes around the choice; the JSON output lists every candidate.
            int from = chosen < 0 ? Math.max(0, sizes.size() - 4) : Math.max(0, chosen - 3);
            int to = chosen < 0 ? sizes.size() : Math.min(sizes.size(), chosen + 3);
            if (from > 0) {
                out.println("  (" + from + " smaller sizes rejected, not shown; --format json lists all)");
            }
            for (SizeSelector.SizeCheck c : sizes.subList(from, to)) {
                out.printf(
                        Locale.ROOT,
                        "  %-16s D %-10s V %-10s total %-10s %s%n",
                        c.size().label(),
                        q(c.size().innerDiameter(), QuantityKind.DIAMETER, u),
                        q(c.maximumVelocity(), QuantityKind.VELOCITY, u),
                        q(c.totalHead(), QuantityKind.HEAD, u),
                        c.accepted() ? "meets the limits" : "rejected: " + String.join("; ", c.reasons()));
            }
            if (to < sizes.size()) {
                out.println("  (" + (sizes.size() - to) + " larger sizes also meet the limits, not shown)");
            }
        }
        if (!curve.isEmpty()) {
            out.println();
            out.println("System curve:");
            for (SystemCurve.Point p : curve) {
                out.println("  " + q(p.flow(), QuantityKind.VOLUMETRIC_FLOW, u) + "  "
                        + q(p.totalHead(), QuantityKind.HEAD, u));
            }
        }
        out.println();
        out.println("Cautions:");
        for (Caution c : r.cautions()) {
            out.println(
                    "  [" + c.severity().name().toLowerCase(Locale.ROOT) + "] " + Quantities.inSystem(c.message(), u)
                            + " (basis: "
                            + c.basis() + ")");
        }
    }

    private static String q(double si, QuantityKind kind, UnitSystem u) {
        return Quantities.format(si, kind, u);
    }

    private static String n(double value) {
        return Quantities.formatNumber(value);
    }

    /** Loss of the elements that are neither pipes nor the pump (m), counted in the minor loss. */
    static double componentLoss(RunResult r) {
        double sum = 0;
        for (ElementProfile e : r.elements()) {
            if (!e.kind().equals("pipe") && !e.kind().equals("pump")) {
                sum += e.result().headLoss();
            }
        }
        return sum;
    }

    private static String clip(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "…";
    }
}
