package org.headway.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.headway.caution.Caution;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.network.Link;
import org.headway.network.Network;
import org.headway.network.NetworkSolver;
import org.headway.network.NetworkStudy;
import org.headway.project.Project;
import org.headway.system.FlowCoefficientValve;
import org.headway.system.Segment;

/**
 * Everything a network head-loss sheet shows, computed once and shared by the PDF and workbook
 * writers: the study (the network's own demands and each demand case) solved, with the methods used
 * and every caution.
 *
 * @param project the project as written
 * @param study the resolved study
 * @param result the solved study
 * @param methods methods used, with equations and citations
 * @param cautions every caution of every case, grouped, the standing review caution last
 * @param inputHash SHA-256 of the project's canonical JSON, hex
 * @param version Headway version
 */
public record NetworkSheet(
        Project project,
        NetworkStudy study,
        NetworkStudy.Result result,
        List<Method> methods,
        List<Caution> cautions,
        String inputHash,
        String version) {

    public NetworkSheet {
        methods = List.copyOf(methods);
        cautions = List.copyOf(cautions);
    }

    /** Solves the study with the standard solver and gathers the sheet's content. */
    public static NetworkSheet of(Project project, NetworkStudy study, String version) {
        NetworkStudy.Result result = study.solve(NetworkSolver.standard());
        Set<Caution> all = new LinkedHashSet<>();
        for (Caution c : result.cautions()) {
            if (!c.equals(Caution.GENERAL_REVIEW)) {
                all.add(c);
            }
        }
        all.add(Caution.GENERAL_REVIEW);
        return new NetworkSheet(
                project,
                study,
                result,
                methods(study.network()),
                Caution.grouped(new ArrayList<>(all)),
                HeadLossSheet.inputHash(project),
                version);
    }

    /** The network with its base demands. */
    public Network network() {
        return study.network();
    }

    static List<Method> methods(Network network) {
        List<Method> list = new ArrayList<>();
        list.add(new Method(
                "Network solution: global gradient algorithm",
                "[A₁₁ A₁₂; A₂₁ 0]·[Q; H] = [−A₁₀H₀; q]: Newton on link energy and node continuity, the head"
                        + " system A₂₁ D⁻¹ A₁₂ solved each iteration (D = diagonal of link slopes dh/dQ)",
                "E. Todini and S. Pilati (1988), A gradient algorithm for the analysis of pipe networks, in"
                        + " Computer Applications in Water Supply, Vol. 1, Research Studies Press, pp. 1–20; exact"
                        + " Jacobian with df/dRe after J. Simpson and S. Elhay (2011), Jacobian matrix for solving"
                        + " water distribution system equations with the Darcy–Weisbach head-loss model, J. Hydraulic"
                        + " Eng. 137(6), 696–700."));
        list.add(new Method(
                "Convergence",
                "largest head change ≤ " + NetworkSolver.DEFAULT_HEAD_TOLERANCE + " m, energy residual |h(Q) − ΔH| and"
                        + " continuity residual reported with the iteration count",
                "Headway network solver; residuals are printed in the solve table"));
        list.add(new Method(
                "Node heads and pressures",
                "p = ρ g (H − z), velocity head at nodes neglected",
                "the usual convention of network analysis (Todini & Pilati 1988; L. A. Rossman, EPANET 2 Users"
                        + " Manual, EPA/600/R-00/057, 2000, §3.1)"));
        list.add(new Method(
                "Sparse solve",
                "L Lᵀ (Cholesky) of the head system, fill-reducing ordering computed once per topology",
                "approximate minimum degree: P. R. Amestoy, T. A. Davis and I. S. Duff (1996), An approximate"
                        + " minimum degree ordering algorithm, SIAM J. Matrix Anal. Appl. 17(4), 886–905"));
        boolean darcy = false;
        boolean hazen = false;
        boolean valves = false;
        Map<String, FrictionCorrelation> friction = new LinkedHashMap<>();
        for (Link l : network.links()) {
            if (l.element() instanceof Segment s) {
                if (s.hazenWilliams().isPresent()) {
                    hazen = true;
                } else {
                    darcy = true;
                    FrictionCorrelation fc = s.frictionMethod(network.context().friction());
                    friction.putIfAbsent(fc.id(), fc);
                }
            } else if (l.element() instanceof FlowCoefficientValve) {
                valves = true;
            }
        }
        if (darcy) {
            list.add(new Method(
                    "Darcy–Weisbach friction loss",
                    "h_f = f · (L/D) · V²/(2g),  V = 4Q/(πD²),  Re = ρVD/μ",
                    "H. Darcy (1857); J. Weisbach (1845). g = 9.80665 m/s² (standard gravity)."));
            if (friction.containsKey("auto")) {
                friction.putIfAbsent("laminar", FrictionMethods.byId("laminar"));
                friction.putIfAbsent("colebrook", FrictionMethods.byId("colebrook"));
            }
            for (FrictionCorrelation fc : friction.values()) {
                list.add(new Method(fc.displayName(), fc.equation(), fc.citation()));
            }
        }
        if (hazen) {
            list.add(new Method(
                    "Hazen–Williams friction loss",
                    "V = 0.849 C R^0.63 S^0.54 (SI), R = D/4",
                    "A. Hazen and G. S. Williams (1905), Hydraulic Tables; for water near ordinary temperatures in"
                            + " pipes of 50 mm and more"));
        }
        if (valves) {
            list.add(new Method(
                    "Valves by flow coefficient",
                    "Δp = (ρ/ρ₀) · (Q/Kv)² · 1 bar, Q in m³/h, ρ₀ = 1000 kg/m³; Cv = 1.156 Kv",
                    "IEC 60534-2-1, Industrial-process control valves — Flow capacity, sizing equations for"
                            + " incompressible fluids"));
        }
        var f = network.context().fluid();
        list.add(new Method(
                "Fluid properties",
                "ρ, μ at the network temperature and pressure",
                "density: " + f.densitySource() + "; viscosity: " + f.viscositySource()
                        + (f.vapourPressureSource().isEmpty()
                                ? ""
                                : "; vapour pressure: " + f.vapourPressureSource())));
        return list;
    }
}
