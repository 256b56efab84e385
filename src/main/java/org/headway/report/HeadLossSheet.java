package org.headway.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ResolvedProject;
import org.headway.system.FittingUse;
import org.headway.system.HeadLossCalculator;
import org.headway.system.OperatingPoint;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.Segment;
import org.headway.system.SystemCurve;
import org.headway.system.UncertaintyBand;

/**
 * Everything a head-loss sheet shows, computed once and shared by the PDF, workbook and CSV
 * writers so the three always agree.
 *
 * @param project the project as written
 * @param run the resolved run
 * @param result hydraulics at the design flow
 * @param curve system curve points
 * @param operatingPoint the pump operating point, or null without a pump
 * @param band uncertainty band at the design flow
 * @param methods methods used, with equations and citations
 * @param cautions every caution raised, standing caution last
 * @param inputHash SHA-256 of the project's canonical JSON, hex
 * @param version Headway version
 * @param mode what the sheet reports: {@code headloss} (the run at its design flow), {@code flow} (at
 *     the flow an available head drives) or {@code size} (at the size chosen for the limits)
 * @param modeNote the mode's result in words (empty for head loss)
 * @param sizeChecks every size candidate with its figures (size mode only)
 */
public record HeadLossSheet(
        Project project,
        PipeRun run,
        RunResult result,
        List<SystemCurve.Point> curve,
        OperatingPoint operatingPoint,
        UncertaintyBand band,
        List<Method> methods,
        List<Caution> cautions,
        String inputHash,
        String version,
        String mode,
        String modeNote,
        List<org.headway.system.SizeSelector.SizeCheck> sizeChecks) {

    public HeadLossSheet {
        mode = mode == null ? "headloss" : mode;
        modeNote = modeNote == null ? "" : modeNote;
        sizeChecks = sizeChecks == null ? List.of() : List.copyOf(sizeChecks);
    }

    /** The same content reported for another mode (the run already at that mode's flow or size). */
    public HeadLossSheet inMode(String newMode, String note, List<org.headway.system.SizeSelector.SizeCheck> checks) {
        return new HeadLossSheet(
                project,
                run,
                result,
                curve,
                operatingPoint,
                band,
                methods,
                cautions,
                inputHash,
                version,
                newMode,
                note,
                checks);
    }

    /** Points on the system curve when the project gives no range. */
    public static final int DEFAULT_CURVE_POINTS = 41;

    /** Builds the sheet content for a resolved project. */
    public static HeadLossSheet of(ResolvedProject resolved, String version) {
        PipeRun run = resolved.run();
        RunResult result = HeadLossCalculator.solve(run, run.designFlow());
        OperatingPoint op = run.pump().isPresent() ? OperatingPoint.find(run) : null;
        double qMax;
        double qMin = 0;
        int n = DEFAULT_CURVE_POINTS;
        if (resolved.curve().isPresent()) {
            qMin = resolved.curve().get().minimumFlow();
            qMax = resolved.curve().get().maximumFlow();
            n = resolved.curve().get().points();
        } else {
            qMax = Math.max(run.designFlow(), op != null && op.found() ? op.flow() : 0) * 1.5;
            if (run.pump().isPresent()) {
                qMax = Math.max(qMax, run.pump().get().maximumDataFlow());
            }
            if (qMax <= 0) {
                qMax = 1e-3;
            }
        }
        List<SystemCurve.Point> curve = SystemCurve.compute(run, qMin, qMax, n);
        UncertaintyBand band = run.designFlow() > 0 ? UncertaintyBand.evaluate(run) : null;
        Set<Caution> cautions = new LinkedHashSet<>();
        for (Caution c : result.cautions()) {
            if (!c.equals(Caution.GENERAL_REVIEW)) {
                cautions.add(c);
            }
        }
        if (op != null) {
            cautions.addAll(op.cautions());
        }
        cautions.add(Caution.GENERAL_REVIEW);
        return new HeadLossSheet(
                resolved.project(),
                run,
                result,
                curve,
                op,
                band,
                methods(run),
                Caution.grouped(new ArrayList<>(cautions)),
                inputHash(resolved.project()),
                version,
                "headloss",
                "",
                List.of());
    }

    /** SHA-256 of the project's canonical JSON: the same project always gives the same hash. */
    public static String inputHash(Project project) {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            byte[] hash = digest.digest(ProjectFile.toJson(project).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(hash);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    private static List<Method> methods(PipeRun run) {
        List<Method> list = new ArrayList<>();
        list.add(new Method(
                "Darcy–Weisbach friction loss",
                "h_f = f · (L/D) · V²/(2g),  V = 4Q/(πD²),  Re = ρVD/μ",
                "H. Darcy (1857), Recherches expérimentales relatives au mouvement de l'eau dans les tuyaux;"
                        + " J. Weisbach (1845), Lehrbuch der Ingenieur- und Maschinen-Mechanik. g = 9.80665 m/s²"
                        + " (standard gravity, ISO 80000-3)."));
        Map<String, FrictionCorrelation> friction = new LinkedHashMap<>();
        friction.put(run.friction().id(), run.friction());
        if ("auto".equals(run.friction().id())) {
            // The automatic method switches between these two, so both are cited.
            friction.putIfAbsent("laminar", FrictionMethods.byId("laminar"));
            friction.putIfAbsent("colebrook", FrictionMethods.byId("colebrook"));
        }
        for (FrictionCorrelation fc : friction.values()) {
            list.add(new Method(fc.displayName(), fc.equation(), fc.citation()));
        }
        list.add(new Method(
                "Minor (fitting) losses",
                "h_m = ΣK · V²/(2g), K of each fitting at the segment's Re and bore",
                "Loss-coefficient method of each fitting as listed in the inputs."));
        Map<String, String> fittingMethods = new LinkedHashMap<>();
        for (Segment s : run.segments()) {
            for (FittingUse use : s.fittings()) {
                fittingMethods.putIfAbsent(use.fitting().method(), use.fitting().source());
            }
        }
        for (Map.Entry<String, String> e : fittingMethods.entrySet()) {
            list.add(new Method("Fittings: " + e.getKey(), "see the fittings table", e.getValue()));
        }
        list.add(new Method(
                "Fluid properties",
                "ρ, μ at the run temperature and pressure",
                "density: " + run.fluid().densitySource() + "; viscosity: "
                        + run.fluid().viscositySource()
                        + (run.fluid().vapourPressureSource().isEmpty()
                                ? ""
                                : "; vapour pressure: " + run.fluid().vapourPressureSource())));
        list.add(new Method(
                "Total head and static head",
                "H = (z_out − z_in) + (h_delivery − h_source) + Σh_f + Σh_m, h_end = level + p/(ρg)",
                "Energy equation between the two free surfaces (or pressure points), velocity at the ends"
                        + " neglected; common practice, no source."));
        if (run.pump().isPresent()) {
            list.add(new Method(
                    "Pump curve and operating point",
                    "H_pump(Q) = a₀ + a₁Q + a₂Q² by least squares (QR); operating point where H_pump(Q) = H(Q),"
                            + " by Brent's method",
                    "R. P. Brent (1973), Algorithms for Minimization without Derivatives, Prentice-Hall, ch. 4."));
            list.add(new Method(
                    "NPSH available",
                    "NPSHa = (p_atm + p_suction,gauge)/(ρg) + V²/(2g) − p_v/(ρg) at the pump inlet",
                    "Definition as in ISO 17769-1 (liquid pumps and installation; general terms)."));
        }
        list.add(new Method(
                "Uncertainty band",
                "low: every ε at the low end of its range and Q(1 − u); high: every ε at its high end and Q(1 + u)",
                "Corner (one-at-a-time) bounds, not a statistical interval; common practice, no source."));
        return list;
    }
}
