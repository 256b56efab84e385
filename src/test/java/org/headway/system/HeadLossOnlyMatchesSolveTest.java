package org.headway.system;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Catalog;
import org.headway.pipe.HazenWilliamsCoefficient;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.junit.jupiter.api.Test;

/**
 * The hot path ({@link HeadLossCalculator#headLossOnly}, used by system curves, the flow solver and
 * the uncertainty band) and the full solve compute one run's losses by the same per-element
 * formulas, so they agree bit for bit wherever the friction method gives one factor by both of its
 * routes. A consistency check between two paths of the program (no outside source): the runs are
 * the bundled example projects ({@code fluids-data/examples}, invented scenarios, with their
 * fittings, valves, components, reducers and pumps) under every friction method and by
 * Hazen–Williams, plus the invented valve-and-coil run of {@link SizingKeepsComponentLawsTest}, at
 * flows from laminar through transitional to turbulent.
 */
class HeadLossOnlyMatchesSolveTest {

    /**
     * Bound on the difference where the routes differ: Colebrook–White by its fast schedule against
     * its bracketed solve, both to a relative residual of 1e-14 (Colebrook1939), which moves f — and
     * the loss, linear in f — by a few 1e-14 relative. Set at ten times that.
     */
    private static final double ITERATIVE_ROUTE_TOLERANCE = 1e-12;

    /**
     * solve's totals add friction and minor losses as two sums, headLossOnly adds element by element,
     * so the run totals may differ by rounding: at most one unit in the last place per addition.
     */
    private static double summationBound(double total, int additions) {
        return 2.0 * additions * Math.ulp(Math.abs(total));
    }

    /** Reynolds numbers laminar, transitional (between 2300 and 4000) and turbulent. */
    private static final double[] REYNOLDS = {300, 1800, 2900, 3700, 1.2e4, 2.5e5, 3e6};

    private record Case(String name, PipeRun run) {}

    private static List<Case> cases() throws IOException {
        List<Case> cases = new ArrayList<>();
        Catalog catalog = Catalog.bundled();
        List<Path> files;
        try (Stream<Path> list = Files.list(Path.of("fluids-data/examples"))) {
            files = list.filter(f -> f.toString().endsWith(".json")).sorted().toList();
        }
        for (Path file : files) {
            String json = Files.readString(file);
            if (!json.contains("\"segments\"") && !json.contains("\"elements\"")) {
                continue; // rig data, not a project
            }
            PipeRun run = ProjectResolver.resolve(ProjectFile.parse(json), catalog, file.getParent())
                    .run();
            for (FrictionCorrelation method : FrictionMethods.all()) {
                cases.add(new Case(file.getFileName() + " by " + method.id(), run.withFriction(method)));
            }
            cases.add(new Case(file.getFileName() + " by Hazen–Williams", byHazenWilliams(run)));
        }
        PipeRun components = componentRun();
        for (FrictionCorrelation method : FrictionMethods.all()) {
            cases.add(new Case("valve and coil by " + method.id(), components.withFriction(method)));
        }
        cases.add(new Case("valve and coil by Hazen–Williams", byHazenWilliams(components)));
        return cases;
    }

    /** The run with every pipe by Hazen–Williams at C 130 (a value in the usual range; no source). */
    private static PipeRun byHazenWilliams(PipeRun run) {
        List<Element> elements = new ArrayList<>();
        for (Element e : run.elements()) {
            if (e instanceof Segment s) {
                Segment.Builder b = Segment.builder(s.name())
                        .id(s.id())
                        .length(s.length())
                        .bore(s.innerDiameter(), s.roughness())
                        .extraLossCoefficient(s.extraLossCoefficient())
                        .elevationChange(s.elevationChange())
                        .hazenWilliams(new HazenWilliamsCoefficient(130, "test"));
                for (FittingUse use : s.fittings()) {
                    b.fitting(use);
                }
                elements.add(b.build());
            } else {
                elements.add(e);
            }
        }
        return run.withElements(elements);
    }

    /** The invented valve-and-coil run of {@link SizingKeepsComponentLawsTest}. */
    private static PipeRun componentRun() {
        List<Element> elements = new ArrayList<>();
        elements.add(Segment.builder("supply")
                .id("supply")
                .length(40)
                .bore(0.05, 4.5e-5)
                .build());
        elements.add(FlowCoefficientValve.ofKv("cv-1", "control valve", 25));
        elements.add(new RatedComponent("coil", "coil", 40_000, 0.006, 2));
        elements.add(Segment.builder("return")
                .id("return")
                .length(40)
                .bore(0.05, 4.5e-5)
                .extraLossCoefficient(1.5)
                .build());
        PipeRun base =
                RunFixtures.run(RunFixtures.liquid(998, 1.0e-3, 2339), "colebrook", List.of((Segment) elements.get(0)));
        return base.withElements(elements);
    }

    /** Flows that put the run's first pipe at each of {@link #REYNOLDS}, plus none and the design flow. */
    private static List<Double> flows(PipeRun run) {
        Segment first = run.segments().get(0);
        double rho = run.fluid().density();
        double mu = run.fluid().dynamicViscosity();
        List<Double> flows = new ArrayList<>();
        flows.add(0.0);
        flows.add(run.designFlow());
        for (double re : REYNOLDS) {
            // Re = ρ V D/μ with V = 4Q/(π D²): Q = Re π D μ/(4 ρ)
            flows.add(re * Math.PI * first.innerDiameter() * mu / (4 * rho));
        }
        return flows;
    }

    /** Whether a pipe's friction factor is the same by the hot route and the full one at this flow. */
    private static boolean sameFrictionRoute(Segment s, FlowContext context, double flow) {
        if (s.hazenWilliams().isPresent() || flow == 0 || s.length() == 0) {
            return true;
        }
        double velocity = flow / (Math.PI * s.innerDiameter() * s.innerDiameter() / 4);
        double re = context.fluid().density()
                * velocity
                * s.innerDiameter()
                / context.fluid().dynamicViscosity();
        FrictionCorrelation method = s.frictionMethod(context.friction());
        return method.frictionFactor(re, s.relativeRoughness())
                == method.evaluate(re, s.relativeRoughness()).frictionFactor();
    }

    @Test
    void headLossOnlyEqualsTheSumOfSolvesElementLosses() throws IOException {
        int exactRuns = 0;
        int hazenWilliamsRuns = 0;
        int transitionalExact = 0;
        int boundedRuns = 0;
        for (Case c : cases()) {
            PipeRun run = c.run();
            FlowContext context = run.context();
            for (double q : flows(run)) {
                String where = c.name() + " at " + q + " m³/s";
                RunResult full = HeadLossCalculator.solve(run, q);
                double fast = HeadLossCalculator.headLossOnly(run, q);
                boolean exact = true;
                double elementSum = 0;
                for (int i = 0; i < run.elements().size(); i++) {
                    Element e = run.elements().get(i);
                    if (e instanceof PumpElement) {
                        continue;
                    }
                    double reported = full.elements().get(i).result().headLoss();
                    double hot = HeadLossCalculator.elementHeadLoss(e, q, context);
                    elementSum += reported;
                    if (e instanceof Segment s && !sameFrictionRoute(s, context, q)) {
                        exact = false;
                        assertEquals(
                                reported, hot, Math.abs(reported) * ITERATIVE_ROUTE_TOLERANCE, where + " " + e.id());
                    } else {
                        assertEquals(reported, hot, 0.0, where + " " + e.id());
                    }
                }
                RunTotals totals = full.totals();
                int additions = 2 * run.elements().size();
                if (exact) {
                    exactRuns++;
                    if (run.segments().get(0).hazenWilliams().isPresent()) {
                        hazenWilliamsRuns++;
                    }
                    double re = q
                            * run.segments().get(0).innerDiameter()
                            / (Math.PI * Math.pow(run.segments().get(0).innerDiameter(), 2) / 4)
                            * run.fluid().density()
                            / run.fluid().dynamicViscosity();
                    if (re > 2300
                            && re < 4000
                            && run.segments().get(0).hazenWilliams().isEmpty()) {
                        transitionalExact++;
                    }
                    assertEquals(elementSum, fast, 0.0, where);
                    if (run.elements().size() == 1) {
                        assertEquals(totals.headLoss(), fast, 0.0, where);
                    }
                    assertEquals(totals.headLoss(), fast, summationBound(fast, additions), where);
                } else {
                    boundedRuns++;
                    assertEquals(elementSum, fast, Math.abs(fast) * ITERATIVE_ROUTE_TOLERANCE, where);
                    assertEquals(
                            totals.headLoss(),
                            fast,
                            Math.abs(fast) * ITERATIVE_ROUTE_TOLERANCE + summationBound(fast, additions),
                            where);
                }
            }
        }
        // The exact branch carries the explicit methods, Hazen–Williams and the laminar and transitional
        // flows; the bounded one Colebrook–White's turbulent flows. Both must have been exercised.
        assertTrue(exactRuns > 200, "exact comparisons: " + exactRuns);
        assertTrue(hazenWilliamsRuns > 20, "Hazen–Williams comparisons: " + hazenWilliamsRuns);
        assertTrue(transitionalExact > 10, "transitional comparisons: " + transitionalExact);
        assertTrue(boundedRuns > 10, "Colebrook comparisons: " + boundedRuns);
    }

    @Test
    void aSinglePipeByAnExplicitMethodMatchesSolvesTotalsExactly() {
        // One pipe, no components: solve's friction + minor is the pipe's own f L/D V²/2g + K V²/2g.
        Segment pipe = Segment.builder("one")
                .length(85)
                .bore(0.1023, 4.6e-5)
                .extraLossCoefficient(3.2)
                .build();
        for (String method : List.of("swamee-jain", "haaland", "churchill", "serghides", "goudar-sonnad")) {
            PipeRun run = RunFixtures.run(RunFixtures.liquid(998.2, 1.002e-3, 2339), method, List.of(pipe));
            for (double q : new double[] {2e-4, 3e-3, 0.02, 0.09}) {
                RunTotals totals = HeadLossCalculator.solve(run, q).totals();
                assertEquals(totals.headLoss(), HeadLossCalculator.headLossOnly(run, q), 0.0, method + " " + q);
            }
        }
    }
}
