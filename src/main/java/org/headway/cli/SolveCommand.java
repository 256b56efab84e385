package org.headway.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.project.ResolvedProject;
import org.headway.system.FlowSolver;
import org.headway.system.HeadLossCalculator;
import org.headway.system.OperatingPoint;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SizeSelector;
import org.headway.system.SystemCurve;
import org.headway.system.UncertaintyBand;
import org.headway.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code headway solve}: one of the three pipe-run problems for a project file. */
@Command(
        name = "solve",
        mixinStandardHelpOptions = true,
        description = {
            "Solve a pipe run: head loss, flow for a head, or size for limits.",
            "--mode headloss (default): losses and total head at the design flow.",
            "--mode flow: the flow an available head drives through the run (exit status 3 when no",
            "forward flow is possible; the result is still printed).",
            "--mode size: the smallest catalog size meeting the project's limits.",
            "Results are estimates for design review against local codes by a qualified engineer."
        })
public final class SolveCommand implements Callable<Integer> {

    /** What to solve. */
    enum Mode {
        headloss,
        flow,
        size
    }

    /** Output formats. */
    enum Format {
        text,
        json,
        csv
    }

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "Project file.")
    Path project;

    @Option(
            names = "--mode",
            defaultValue = "headloss",
            description = "headloss, flow or size (default ${DEFAULT-VALUE}).")
    Mode mode;

    @Option(
            names = "--available-head",
            paramLabel = "HEAD",
            description = "For --mode flow: head a pump adds at fixed head, e.g. \"12 m\" (default 0: the ends"
                    + " alone drive the flow).")
    String availableHead;

    @Option(
            names = "--curve",
            paramLabel = "QMIN:QMAX:N",
            description = "Also tabulate the system curve, e.g. \"0 L/s:20 L/s:11\".")
    String curve;

    @Option(names = "--format", defaultValue = "text", description = "text, json or csv (default ${DEFAULT-VALUE}).")
    Format format;

    @Mixin
    SharedOptions.TextUnits unitsOption;

    @Mixin
    SharedOptions.CatalogFolder catalogOption;

    /** Resolves the project, naming the project file in front of the JSON path of any problem. */
    private ResolvedProject resolve(org.headway.project.Project loaded, Catalog catalog) {
        try {
            return ProjectResolver.resolve(
                    loaded, catalog, project.toAbsolutePath().getParent());
        } catch (org.headway.caution.InputException e) {
            throw new org.headway.caution.InputException(SheetCommand.fileName(project), e.getMessage(), e);
        }
    }

    @Override
    public Integer call() {
        Path catalogFolder = catalogOption.catalogFolder;
        String units = unitsOption.units;
        UnitSystem system = CliSupport.unitSystem(units);
        Catalog catalog = catalogFolder == null ? Catalog.bundled() : Catalog.withUserFolder(catalogFolder);
        org.headway.project.Project loaded = ProjectFile.load(project);
        if (loaded.isNetwork()) {
            org.headway.network.NetworkStudy network;
            try {
                network = ProjectResolver.resolveNetworkStudy(
                        loaded, catalog, project.toAbsolutePath().getParent());
            } catch (InputException e) {
                throw new InputException(SheetCommand.fileName(project), e.getMessage(), e);
            }
            if (mode != Mode.headloss) {
                throw new InputException(
                        "--mode",
                        "a network is solved for its demands and fixed heads; --mode " + mode + " is for runs");
            }
            return NetworkCommand.solveStudyAndPrint(
                    spec,
                    network,
                    NetworkCommand.Format.valueOf(format.name()),
                    system,
                    null,
                    false,
                    false,
                    null,
                    NetworkDesign.NONE);
        }
        ResolvedProject resolved = resolve(loaded, catalog);
        PipeRun run = resolved.run();
        PrintWriter out = spec.commandLine().getOut();

        RunResult result;
        String modeNote = "";
        List<SizeSelector.SizeCheck> sizeChecks = List.of();
        FlowSolver.Solution flowSolution = null;
        switch (mode) {
            case flow -> {
                double head = availableHead == null
                        ? 0
                        : CliSupport.parse(availableHead, org.headway.units.QuantityKind.HEAD, "--available-head");
                flowSolution = FlowSolver.solve(run, head);
                result = flowSolution.result();
                modeNote = flowSolution.message();
            }
            case size -> {
                if (resolved.sizingCandidates().isEmpty()) {
                    throw new InputException(
                            project.getFileName() + " sizing",
                            "missing; --mode size needs a \"sizing\" entry naming a material and schedule");
                }
                SizeSelector.Selection selection =
                        SizeSelector.select(run, resolved.sizingCandidates(), resolved.limits());
                sizeChecks = selection.candidates();
                run = selection.run();
                result = HeadLossCalculator.solve(run, run.designFlow());
                modeNote = selection
                        .chosen()
                        .map(c -> "smallest size meeting the limits: " + c.label())
                        .orElse("no candidate size meets the limits");
            }
            default -> result = HeadLossCalculator.solve(run, run.designFlow());
        }
        List<SystemCurve.Point> curvePoints = List.of();
        if (curve != null) {
            double[] range = CliSupport.curveRange(curve, run.fluid().density());
            curvePoints = SystemCurve.compute(run, range[0], range[1], (int) range[2]);
        } else if (resolved.curve().isPresent()) {
            ResolvedProject.CurveRange c = resolved.curve().get();
            curvePoints = SystemCurve.compute(run, c.minimumFlow(), c.maximumFlow(), c.points());
        }
        OperatingPoint operating = run.pump().isPresent() ? OperatingPoint.find(run) : null;
        UncertaintyBand band = run.designFlow() > 0 && mode == Mode.headloss ? UncertaintyBand.evaluate(run) : null;

        switch (format) {
            case json ->
                out.println(
                        RunJson.toJson(run, result, mode.name(), modeNote, curvePoints, operating, band, sizeChecks));
            case csv -> {
                try {
                    org.headway.report.CsvSheetWriter.write(result, out);
                    if (!curvePoints.isEmpty()) {
                        // a blank line, then the curve: two tables as the network command writes them
                        out.println();
                        org.headway.report.CsvSheetWriter.writeCurve(curvePoints, out);
                    }
                } catch (java.io.IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            }
            default ->
                RunText.print(
                        out, run, result, system, mode.name(), modeNote, curvePoints, operating, band, sizeChecks);
        }
        out.flush();
        if (flowSolution != null && flowSolution.outcome() != FlowSolver.Outcome.FLOWING) {
            return HeadwayCommand.EXIT_NO_FLOW;
        }
        return HeadwayCommand.EXIT_OK;
    }
}
