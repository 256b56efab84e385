package org.headway.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.project.RigFile;
import org.headway.rig.EffectiveRoughness;
import org.headway.rig.PointUncertainty;
import org.headway.rig.RigDescription;
import org.headway.rig.RigPointResult;
import org.headway.rig.RigReport;
import org.headway.rig.RigSummary;
import org.headway.rig.UncertaintySource;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code headway rig}: the user's rig friction data against a friction correlation. */
@Command(
        name = "rig",
        mixinStandardHelpOptions = true,
        description = {
            "Check rig friction data against a friction correlation.",
            "Reads a rig file (JSON: bore, tap spacing, fluid, roughness estimate,",
            "instrument uncertainties, and a data CSV with units in its header).",
            "Per point: Re, the friction factor measured by Darcy–Weisbach, its",
            "deviation from the correlation and its expanded uncertainty (k = 2,",
            "first-order propagation as in ISO/IEC Guide 98-3 and ASME PTC 19.1).",
            "Then a summary and the effective roughness fitted to the turbulent",
            "points with its 95 %% interval."
        })
public final class RigCommand implements Callable<Integer> {

    /** Rows of the per-point table printed as text; csv prints all. */
    static final int TEXT_ROWS = 40;
    /** Per-point results written into the JSON output. */
    static final int JSON_ROWS = 10_000;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "RIG.json", description = "rig description file")
    Path rigFile;

    @Option(names = "--format", defaultValue = "text", description = "text, json or csv (default: ${DEFAULT-VALUE})")
    String format;

    @Option(
            names = "--units",
            defaultValue = "si",
            description = "si, us or process (m³/h and bar) display units (default: ${DEFAULT-VALUE})")
    String units;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        UnitSystem system = CliSupport.unitSystem(units);
        RigFile rig = RigFile.load(rigFile);
        switch (format.toLowerCase(Locale.ROOT)) {
            case "text" -> {
                RigReport report = rig.analyse(TEXT_ROWS, r -> {});
                printText(out, report, rig.dataName(), system, TEXT_ROWS, true);
            }
            case "json" -> {
                RigReport report = rig.analyse(JSON_ROWS, r -> {});
                out.println(json(report, rig.dataName()));
            }
            case "csv" -> writeCsv(out, rig, system);
            default -> throw new InputException("--format", "expected text, json or csv, got \"" + format + "\"");
        }
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    /** A display unit as an affine map from SI, resolved once so that long tables convert quickly. */
    record Display(String symbol, double scale, double offset) {
        static Display of(QuantityKind kind, UnitSystem system) {
            double offset = Quantities.fromSi(0.0, kind, system);
            double scale = Quantities.fromSi(1.0, kind, system) - offset;
            return new Display(Quantities.unitSymbol(kind, system), scale, offset);
        }

        double convert(double si) {
            return scale * si + offset;
        }
    }

    static String num(double v) {
        return Quantities.formatNumber(v);
    }

    static String percent(double ratio) {
        return String.format(Locale.ROOT, "%.2f %%", 100 * ratio);
    }

    static String signedPercent(double ratio) {
        return String.format(Locale.ROOT, "%+.2f %%", 100 * ratio);
    }

    private static String length(double metres, QuantityKind kind, UnitSystem system) {
        return Quantities.format(metres, kind, system);
    }

    /** Prints the summary, effective roughness, uncertainty, point table and cautions. */
    static void printText(
            PrintWriter out, RigReport report, String dataName, UnitSystem system, int rows, boolean table) {
        RigDescription d = report.description();
        RigSummary s = report.summary();
        out.println("Rig: " + d.name() + " (data " + dataName + ")");
        out.println("  test section: bore " + length(d.innerDiameter(), QuantityKind.DIAMETER, system)
                + ", taps " + length(d.tapSpacing(), QuantityKind.LENGTH, system) + " apart, roughness estimate "
                + length(d.roughnessEstimate(), QuantityKind.ROUGHNESS, system) + " (ε/D " + num(d.relativeRoughness())
                + ")");
        out.println("  fluid: " + d.fluidDescription());
        out.println("  compared with: " + d.comparison().displayName());
        out.println();
        out.println("Summary: " + s.pointCount() + " points (" + s.laminarCount() + " laminar, " + s.transitionalCount()
                + " transitional, " + s.turbulentCount() + " turbulent), Re " + num(s.minReynolds()) + " to "
                + num(s.maxReynolds()));
        if (s.comparedCount() > 0) {
            out.println("  deviation of measured f from " + d.comparison().displayName() + " over " + s.comparedCount()
                    + " points inside its validity range: mean "
                    + signedPercent(s.meanDeviation().getAsDouble())
                    + ", RMS " + percent(s.rmsDeviation().getAsDouble()) + ", largest "
                    + signedPercent(s.maxDeviation().getAsDouble()) + " (line " + s.maxDeviationLine() + ")");
        } else {
            out.println("  no point lies inside the validity range of "
                    + d.comparison().displayName());
        }
        if (s.outsideValidityCount() + s.notEvaluatedCount() + s.transitionalCount() > 0) {
            out.println("  not in the statistics: " + s.transitionalCount() + " transitional, "
                    + s.outsideValidityCount() + " outside the validity range, " + s.notEvaluatedCount()
                    + " not evaluated");
        }
        out.println();
        EffectiveRoughness r = report.roughness();
        out.println("Effective roughness (Colebrook–White fitted to " + r.pointsUsed() + " turbulent points):");
        out.println("  " + roughnessLine(r, system));
        out.println("  " + r.statement());
        out.println();
        out.println("Uncertainty (first-order propagation, ISO/IEC Guide 98-3 (GUM) 5.1 / ASME PTC 19.1;"
                + " expanded, k = 2):");
        out.println("  U(f)/f mean " + percent(s.meanFrictionExpandedUncertainty()) + ", largest "
                + percent(s.maxFrictionExpandedUncertainty()) + "; U(Re)/Re mean "
                + percent(s.meanReynoldsExpandedUncertainty()) + ", largest "
                + percent(s.maxReynoldsExpandedUncertainty()));
        if (s.dominantFrictionSource().isPresent()) {
            UncertaintySource dom = s.dominantFrictionSource().get();
            StringBuilder shares = new StringBuilder();
            for (UncertaintySource src : UncertaintySource.values()) {
                double share = s.frictionVarianceShares().get(src);
                if (share >= 0.005) {
                    shares.append(shares.length() == 0 ? "" : ", ")
                            .append(src.label())
                            .append(' ')
                            .append(String.format(Locale.ROOT, "%.0f %%", 100 * share));
                }
            }
            out.println(
                    "  dominant contributor to u(f): " + dom.label() + " (mean share of the variance: " + shares + ")");
            if (s.significantDeviationCount() > 0) {
                out.println("  " + s.significantDeviationCount() + " of " + s.comparedCount()
                        + " compared points deviate by more than their U(f)");
            }
        } else {
            out.println("  no instrument uncertainty stated");
        }
        if (table) {
            out.println();
            printTable(out, report, system, rows);
        }
        if (!report.cautions().isEmpty()) {
            out.println();
            out.println("Cautions:");
            for (Caution c : report.cautions()) {
                out.println("  - [" + c.severity().name().toLowerCase(Locale.ROOT) + "] " + c.message() + " ("
                        + c.basis() + ")");
            }
        }
    }

    static String roughnessLine(EffectiveRoughness r, UnitSystem system) {
        return switch (r.status()) {
            case DETERMINED ->
                "ε = " + length(r.roughness().getAsDouble(), QuantityKind.ROUGHNESS, system)
                        + ", 95 % interval " + length(r.ci95Low(), QuantityKind.ROUGHNESS, system) + " to "
                        + length(r.ci95High(), QuantityKind.ROUGHNESS, system);
            case UNDETERMINED ->
                r.ci95Low() == 0
                        ? "undetermined; data consistent with a smooth pipe up to ε ≤ "
                                + length(r.ci95High(), QuantityKind.ROUGHNESS, system)
                        : "undetermined; 95 % interval " + length(r.ci95Low(), QuantityKind.ROUGHNESS, system) + " to "
                                + (r.upperOpen() ? "beyond " : "")
                                + length(r.ci95High(), QuantityKind.ROUGHNESS, system);
            case NOT_ENOUGH_DATA -> "not determined (too few turbulent points)";
        };
    }

    private static void printTable(PrintWriter out, RigReport report, UnitSystem system, int rows) {
        Display q = Display.of(QuantityKind.VOLUMETRIC_FLOW, system);
        Display p = Display.of(QuantityKind.PRESSURE, system);
        Display t = Display.of(QuantityKind.TEMPERATURE, system);
        Display v = Display.of(QuantityKind.VELOCITY, system);
        String fmt = "%6s %11s %11s %8s %9s %10s %9s %8s %9s %9s %-13s %s%n";
        out.printf(
                Locale.ROOT,
                fmt,
                "line",
                "Q [" + q.symbol() + "]",
                "Δp [" + p.symbol() + "]",
                "T [" + t.symbol() + "]",
                "V [" + v.symbol() + "]",
                "Re",
                "f",
                "U(f)",
                "f_ref",
                "dev",
                "regime",
                "dominant");
        int shown = 0;
        for (RigPointResult r : report.points()) {
            if (shown++ >= rows) {
                break;
            }
            out.printf(
                    Locale.ROOT,
                    fmt,
                    r.line(),
                    num(q.convert(r.flow())),
                    num(p.convert(r.pressureDrop())),
                    r.temperature().isPresent() ? num(t.convert(r.temperature().getAsDouble())) : "-",
                    num(v.convert(r.velocity())),
                    num(r.reynolds()),
                    num(r.frictionFactor()),
                    String.format(Locale.ROOT, "%.1f%%", 100 * r.uncertainty().frictionExpandedRelative()),
                    r.referenceFrictionFactor().isPresent()
                            ? num(r.referenceFrictionFactor().getAsDouble())
                            : "-",
                    r.deviation().isPresent()
                            ? String.format(
                                    Locale.ROOT,
                                    "%+.1f%%%s",
                                    100 * r.deviation().getAsDouble(),
                                    r.insideValidity() && r.regime() != org.headway.friction.FlowRegime.TRANSITIONAL
                                            ? ""
                                            : "*")
                            : "-",
                    r.regime().name().toLowerCase(Locale.ROOT),
                    r.uncertainty().frictionRelative() > 0
                            ? r.uncertainty().dominantFrictionSource().label()
                            : "-");
        }
        long total = report.summary().pointCount();
        if (total > Math.min(rows, report.points().size())) {
            out.println("  … " + (total - Math.min(rows, report.points().size()))
                    + " more points; use --format csv for every point");
        }
        out.println("  * transitional, or outside the validity range of "
                + report.description().comparison().displayName() + ": not in the statistics");
    }

    private static void writeCsv(PrintWriter out, RigFile rig, UnitSystem system) {
        Display q = Display.of(QuantityKind.VOLUMETRIC_FLOW, system);
        Display p = Display.of(QuantityKind.PRESSURE, system);
        Display t = Display.of(QuantityKind.TEMPERATURE, system);
        Display rho = Display.of(QuantityKind.DENSITY, system);
        Display mu = Display.of(QuantityKind.DYNAMIC_VISCOSITY, system);
        Display v = Display.of(QuantityKind.VELOCITY, system);
        try {
            CSVPrinter csv = new CSVPrinter(
                    out, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get());
            boolean[] headerWritten = {false};
            List<String> carriedNames = new ArrayList<>();
            try (var reader = rig.openData()) {
                carriedNames.addAll(reader.carriedColumns());
            }
            Consumer<RigPointResult> sink = r -> {
                try {
                    if (!headerWritten[0]) {
                        List<Object> header = new ArrayList<>(List.of(
                                "line",
                                "flow [" + q.symbol() + "]",
                                "dp [" + p.symbol() + "]",
                                "T [" + t.symbol() + "]",
                                "density [" + rho.symbol() + "]",
                                "viscosity [" + mu.symbol() + "]",
                                "velocity [" + v.symbol() + "]",
                                "Re",
                                "f",
                                "eps_over_D",
                                "regime",
                                "f_ref",
                                "deviation",
                                "inside_validity",
                                "U_Re",
                                "U_f",
                                "dominant_f"));
                        for (String name : carriedNames) {
                            header.add(org.headway.report.SafeText.echoedCell(name));
                        }
                        csv.printRecord(header);
                        headerWritten[0] = true;
                    }
                    PointUncertainty u = r.uncertainty();
                    csv.print(r.line());
                    // converted columns: 15 significant digits, without the conversion's binary noise
                    csv.print(Quantities.formatConverted(q.convert(r.flow())));
                    csv.print(Quantities.formatConverted(p.convert(r.pressureDrop())));
                    csv.print(
                            r.temperature().isPresent()
                                    ? Quantities.formatConverted(
                                            t.convert(r.temperature().getAsDouble()))
                                    : "");
                    csv.print(Quantities.formatConverted(rho.convert(r.density())));
                    csv.print(Quantities.formatConverted(mu.convert(r.dynamicViscosity())));
                    csv.print(Quantities.formatConverted(v.convert(r.velocity())));
                    csv.print(Double.toString(r.reynolds()));
                    csv.print(Double.toString(r.frictionFactor()));
                    csv.print(Double.toString(r.relativeRoughness()));
                    csv.print(r.regime().name().toLowerCase(Locale.ROOT));
                    csv.print(
                            r.referenceFrictionFactor().isPresent()
                                    ? Double.toString(
                                            r.referenceFrictionFactor().getAsDouble())
                                    : "");
                    csv.print(
                            r.deviation().isPresent()
                                    ? Double.toString(r.deviation().getAsDouble())
                                    : "");
                    csv.print(r.insideValidity());
                    csv.print(Double.toString(u.reynoldsExpanded()));
                    csv.print(Double.toString(u.frictionExpanded()));
                    csv.print(
                            u.frictionRelative() > 0
                                    ? u.dominantFrictionSource().label()
                                    : "");
                    for (String c : r.carried()) {
                        csv.print(org.headway.report.SafeText.echoedCell(c));
                    }
                    csv.println();
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            };
            RigReport report = rig.analyse(0, sink);
            csv.flush();
            RigSummary s = report.summary();
            out.println("# points " + s.pointCount() + "; compared " + s.comparedCount() + "; mean deviation "
                    + (s.meanDeviation().isPresent() ? s.meanDeviation().getAsDouble() : "none") + "; RMS deviation "
                    + (s.rmsDeviation().isPresent() ? s.rmsDeviation().getAsDouble() : "none"));
            out.println("# effective roughness: " + roughnessLine(report.roughness(), system));
            out.println("# U_f and U_Re are expanded uncertainties (k = 2) in the units of f and Re");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** The report as JSON: SI values, keys in snake_case with the unit in the name. */
    static String json(RigReport report, String dataName) {
        ObjectNode root = MAPPER.createObjectNode();
        RigDescription d = report.description();
        ObjectNode rig = root.putObject("rig");
        rig.put("name", d.name());
        rig.put("data", dataName);
        rig.put("inner_diameter_m", d.innerDiameter());
        rig.put("tap_spacing_m", d.tapSpacing());
        rig.put("roughness_estimate_m", d.roughnessEstimate());
        rig.put("fluid", d.fluidDescription());
        rig.put("compare_with", d.comparison().id());
        RigSummary s = report.summary();
        ObjectNode sum = root.putObject("summary");
        sum.put("points", s.pointCount());
        sum.put("laminar", s.laminarCount());
        sum.put("transitional", s.transitionalCount());
        sum.put("turbulent", s.turbulentCount());
        sum.put("compared", s.comparedCount());
        sum.put("outside_validity", s.outsideValidityCount());
        sum.put("not_evaluated", s.notEvaluatedCount());
        if (s.comparedCount() > 0) {
            sum.put("mean_deviation", s.meanDeviation().getAsDouble());
            sum.put("rms_deviation", s.rmsDeviation().getAsDouble());
            sum.put("max_deviation", s.maxDeviation().getAsDouble());
            sum.put("max_deviation_line", s.maxDeviationLine());
        }
        sum.put("significant_deviations", s.significantDeviationCount());
        sum.put("min_reynolds", s.minReynolds());
        sum.put("max_reynolds", s.maxReynolds());
        ObjectNode unc = root.putObject("uncertainty");
        unc.put("coverage_factor", 2.0);
        unc.put("mean_relative_expanded_f", s.meanFrictionExpandedUncertainty());
        unc.put("max_relative_expanded_f", s.maxFrictionExpandedUncertainty());
        unc.put("mean_relative_expanded_re", s.meanReynoldsExpandedUncertainty());
        unc.put("max_relative_expanded_re", s.maxReynoldsExpandedUncertainty());
        s.dominantFrictionSource().ifPresent(src -> unc.put("dominant_f", src.label()));
        ObjectNode shares = unc.putObject("variance_shares_f");
        for (Map.Entry<UncertaintySource, Double> e : s.frictionVarianceShares().entrySet()) {
            shares.put(e.getKey().label(), e.getValue());
        }
        EffectiveRoughness r = report.roughness();
        ObjectNode er = root.putObject("effective_roughness");
        er.put("status", r.status().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        r.roughness().ifPresent(v -> er.put("roughness_m", v));
        er.put("ci95_low_m", r.ci95Low());
        er.put("ci95_high_m", r.ci95High());
        er.put("upper_open", r.upperOpen());
        er.put("points_used", r.pointsUsed());
        er.put("residual_standard_deviation_ln_f", r.residualStandardDeviation());
        er.put("statement", r.statement());
        ArrayNode points = root.putArray("points");
        for (RigPointResult p : report.points()) {
            ObjectNode n = points.addObject();
            n.put("line", p.line());
            n.put("flow_m3_s", p.flow());
            n.put("pressure_drop_pa", p.pressureDrop());
            p.temperature().ifPresent(t -> n.put("temperature_k", t));
            n.put("density_kg_m3", p.density());
            n.put("viscosity_pa_s", p.dynamicViscosity());
            n.put("velocity_m_s", p.velocity());
            n.put("reynolds", p.reynolds());
            n.put("friction_factor", p.frictionFactor());
            n.put("relative_roughness", p.relativeRoughness());
            n.put("regime", p.regime().name().toLowerCase(Locale.ROOT));
            p.referenceFrictionFactor().ifPresent(f -> n.put("reference_friction_factor", f));
            p.deviation().ifPresent(f -> n.put("deviation", f));
            n.put("inside_validity", p.insideValidity());
            n.put("expanded_uncertainty_re", p.uncertainty().reynoldsExpanded());
            n.put("expanded_uncertainty_f", p.uncertainty().frictionExpanded());
            if (p.uncertainty().frictionRelative() > 0) {
                n.put("dominant_f", p.uncertainty().dominantFrictionSource().label());
            }
            if (!p.carried().isEmpty()) {
                ObjectNode c = n.putObject("carried");
                for (int i = 0; i < p.carried().size() && i < d.carriedColumns().size(); i++) {
                    c.put(d.carriedColumns().get(i), p.carried().get(i));
                }
            }
        }
        root.put("points_omitted", s.pointCount() - report.points().size());
        ArrayNode cautions = root.putArray("cautions");
        for (Caution c : report.cautions()) {
            ObjectNode n = cautions.addObject();
            n.put("code", c.code());
            n.put("severity", c.severity().name().toLowerCase(Locale.ROOT));
            n.put("message", c.message());
            n.put("basis", c.basis());
        }
        try {
            return MAPPER.writeValueAsString(root);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
