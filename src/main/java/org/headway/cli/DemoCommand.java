package org.headway.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import org.headway.pipe.Catalog;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.project.ResolvedProject;
import org.headway.project.RigFile;
import org.headway.report.CsvSheetWriter;
import org.headway.report.HeadLossSheet;
import org.headway.report.PdfSheetWriter;
import org.headway.report.WorkbookSheetWriter;
import org.headway.rig.RigReport;
import org.headway.system.FlowSolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.OperatingPoint;
import org.headway.system.RunResult;
import org.headway.system.UncertaintyBand;
import org.headway.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code headway demo}: the main job on the bundled, invented demo project. */
@Command(
        name = "demo",
        mixinStandardHelpOptions = true,
        description = {
            "Run the whole job on the bundled, invented demo project.",
            "Solves an invented orchard booster line, prints the results and writes its head-loss sheet",
            "(PDF, workbook, CSV) into reports/, replacing the demo's own earlier files, and checks an",
            "invented coil branch with valves and rated components in flow mode, an invented looped",
            "village main from its line list, and checks an",
            "invented rig data set against the friction curves.",
            "The demo data are invented; do not use them for design."
        })
public final class DemoCommand implements Callable<Integer> {

    /** Classpath location of the demo project. */
    static final String DEMO_PROJECT = "/fluids-data/examples/demo-orchard-booster.json";

    /** Classpath location of the demo coil branch (components between two headers). */
    static final String DEMO_BRANCH = "/fluids-data/examples/coil-branch.json";

    /** Classpath locations of the demo network's line list. */
    static final String DEMO_NODES = "/fluids-data/examples/network/hillcrest-nodes.csv";

    static final String DEMO_LINKS = "/fluids-data/examples/network/hillcrest-links.csv";

    /** Classpath location of the demo network's demand cases. */
    static final String DEMO_CASES = "/fluids-data/examples/network/hillcrest-cases.csv";

    /** Classpath location of the demo rig; its data file sits beside it. */
    static final String DEMO_RIG = "/fluids-data/examples/demo-rig.json";

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(
            names = "--reports",
            paramLabel = "DIR",
            defaultValue = "reports",
            description = "Folder for the sheet (default ${DEFAULT-VALUE}).")
    Path reports;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("Headway demo — invented data, for demonstration only.");
        out.println();
        out.println("1. Friction factors for a few invented cases");
        out.printf("   %-10s %-10s %-20s %-12s %s%n", "Re", "ε/D", "method", "f", "regime");
        double[][] cases = {{1500, 0}, {3000, 1e-4}, {5e4, 0}, {2e5, 2.5e-4}, {1e6, 1e-3}, {1e7, 0.01}};
        for (double[] c : cases) {
            FrictionResult fr = FrictionMethods.byId("auto").evaluate(c[0], c[1]);
            out.printf(
                    java.util.Locale.ROOT,
                    "   %-10.4g %-10.3g %-20s %-12.6f %s%n",
                    c[0],
                    c[1],
                    fr.method(),
                    fr.frictionFactor(),
                    fr.regime().name().toLowerCase(java.util.Locale.ROOT));
        }
        out.println();
        out.println("2. Pipe run: " + DEMO_PROJECT.substring(1));
        Project project = ProjectFile.parse(resource(DEMO_PROJECT));
        ResolvedProject resolved = ProjectResolver.resolve(project, Catalog.bundled(), Path.of("."));
        RunResult result =
                HeadLossCalculator.solve(resolved.run(), resolved.run().designFlow());
        OperatingPoint op = resolved.run().pump().isPresent() ? OperatingPoint.find(resolved.run()) : null;
        RunText.print(
                out,
                resolved.run(),
                result,
                UnitSystem.SI,
                "headloss",
                "",
                List.of(),
                op,
                UncertaintyBand.evaluate(resolved.run()),
                List.of());
        out.println();
        out.println("3. Head-loss sheet");
        HeadLossSheet sheet = HeadLossSheet.of(resolved, HeadwayCommand.version());
        Path pdf = reports.resolve("demo-orchard-booster.pdf");
        PdfSheetWriter.write(sheet, pdf, true, UnitSystem.SI);
        Path xlsx = reports.resolve("demo-orchard-booster.xlsx");
        WorkbookSheetWriter.write(sheet, xlsx, true);
        Path csv = reports.resolve("demo-orchard-booster.csv");
        CsvSheetWriter.write(sheet, csv, true);
        out.println("   wrote " + pdf);
        out.println("   wrote " + xlsx);
        out.println("   wrote " + csv);
        out.println("   input hash " + sheet.inputHash());
        out.println();
        out.println("4. A coil branch between two headers: " + DEMO_BRANCH.substring(1));
        out.println("   valves by Kv, rated coil and strainer, reducers; what flow does it take unbalanced?");
        ResolvedProject branch =
                ProjectResolver.resolve(ProjectFile.parse(resource(DEMO_BRANCH)), Catalog.bundled(), Path.of("."));
        FlowSolver.Solution unbalanced = FlowSolver.solve(branch.run(), 0);
        RunText.print(
                out,
                branch.run(),
                unbalanced.result(),
                UnitSystem.SI,
                "flow",
                unbalanced.message(),
                List.of(),
                null,
                null,
                List.of());
        out.println();
        out.println("5. A looped village main from its line list: " + DEMO_NODES.substring(1) + ", "
                + DEMO_LINKS.substring(DEMO_LINKS.lastIndexOf('/') + 1));
        var spec = org.headway.project.LineList.parse(
                DEMO_NODES.substring(1),
                resource(DEMO_NODES),
                DEMO_LINKS.substring(1),
                resource(DEMO_LINKS),
                Catalog.bundled(),
                false);
        out.println("   with its demand cases (" + DEMO_CASES.substring(DEMO_CASES.lastIndexOf('/') + 1)
                + "), a 250 kPa minimum pressure and the fire flow at J7 with 140 kPa residual everywhere");
        spec = spec.withDemandCases(
                org.headway.project.LineList.parseCases(DEMO_CASES.substring(1), resource(DEMO_CASES), spec));
        Project networkProject = Project.network(
                        "Hillcrest village main (INVENTED DEMO DATA)", "water", "10 degC", "auto", spec)
                .withPressureLimits(new Project.PressureLimitsSpec("250 kPa", ""));
        org.headway.network.NetworkStudy study =
                ProjectResolver.resolveNetworkStudy(networkProject, Catalog.bundled(), Path.of("."));
        org.headway.network.NetworkStudy.Result studied = study.solve(org.headway.network.NetworkSolver.standard());
        NetworkDesign.Results designed = NetworkDesign.of(false, null, null, "J7", "140 kPa")
                .run(studied.base().network());
        NetworkStudyOutput.text(out, study, studied, UnitSystem.SI, designed);
        org.headway.report.NetworkSheet networkSheet =
                org.headway.report.NetworkSheet.of(networkProject, study, HeadwayCommand.version());
        Path networkPdf = reports.resolve("demo-hillcrest-main.pdf");
        org.headway.report.NetworkPdfWriter.write(networkSheet, networkPdf, true, UnitSystem.SI);
        Path networkXlsx = reports.resolve("demo-hillcrest-main.xlsx");
        org.headway.report.NetworkWorkbookWriter.write(networkSheet, networkXlsx, true);
        out.println("   wrote " + networkPdf);
        out.println("   wrote " + networkXlsx);
        out.println();
        out.println("6. Rig data: " + DEMO_RIG.substring(1) + " (invented measurements)");
        RigFile rig = RigFile.loadResource(DEMO_RIG);
        RigReport rigReport = rig.analyse(0, point -> {});
        RigCommand.printText(out, rigReport, rig.dataName(), UnitSystem.SI, 0, false);
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    static String resource(String path) {
        try (InputStream in = DemoCommand.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("demo resource missing from the build: " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
