package org.headway.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.project.ResolvedProject;
import org.headway.report.CsvSheetWriter;
import org.headway.report.HeadLossSheet;
import org.headway.report.PdfSheetWriter;
import org.headway.report.SafeText;
import org.headway.report.WorkbookSheetWriter;
import org.headway.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code headway sheet}: the head-loss sheet for review (PDF, and optionally workbook and CSV). */
@Command(
        name = "sheet",
        mixinStandardHelpOptions = true,
        description = {
            "Write a project's head-loss sheet for review (PDF, workbook, CSV).",
            "With --workbook also an .xlsx whose results are live formulas; with --csv the per-segment table.",
            "Files go to reports/ unless --out says otherwise; existing files are kept unless --force is given."
        })
public final class SheetCommand implements Callable<Integer> {

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "Project file.")
    Path project;

    @Option(names = "--out", paramLabel = "FILE.pdf", description = "PDF to write (default reports/<project>.pdf).")
    Path out;

    @Option(names = "--workbook", description = "Also write an .xlsx workbook beside the PDF.")
    boolean workbook;

    @Option(names = "--csv", description = "Also write the per-segment CSV beside the PDF.")
    boolean csv;

    @Option(
            names = "--mode",
            defaultValue = "headloss",
            description = "headloss (at the design flow, default), flow (at the flow --available-head drives) or size"
                    + " (at the smallest catalog size meeting the project's limits).")
    SolveCommand.Mode mode;

    @Option(
            names = "--available-head",
            paramLabel = "HEAD",
            description = "For --mode flow: head a pump adds at fixed head, e.g. \"12 m\" (default 0).")
    String availableHead;

    @Mixin
    SharedOptions.Force forceOption;

    @Option(
            names = "--units",
            defaultValue = "si",
            description = "Units on the PDF: si, us or process (m³/h and bar) (default ${DEFAULT-VALUE}).")
    String units;

    @Mixin
    SharedOptions.CatalogFolder catalogOption;

    @Override
    public Integer call() {
        Path catalogFolder = catalogOption.catalogFolder;
        boolean force = forceOption.force;
        UnitSystem system = CliSupport.unitSystem(units);
        Catalog catalog = catalogFolder == null ? Catalog.bundled() : Catalog.withUserFolder(catalogFolder);
        org.headway.project.Project loaded = ProjectFile.load(project);
        if (loaded.isNetwork()) {
            return networkSheet(loaded, catalog, system);
        }
        ResolvedProject resolved;
        try {
            resolved = ProjectResolver.resolve(
                    loaded, catalog, project.toAbsolutePath().getParent());
        } catch (InputException e) {
            // Name the project file in front of the JSON path of a problem found while resolving.
            throw new InputException(fileName(project), e.getMessage(), e);
        }
        HeadLossSheet sheet = modeSheet(resolved);
        Path pdf = out != null ? out : Path.of("reports", stem(project) + ".pdf");
        if (pdf.getFileName() == null
                || !pdf.getFileName()
                        .toString()
                        .toLowerCase(java.util.Locale.ROOT)
                        .endsWith(".pdf")) {
            throw new InputException("--out", "the sheet is a PDF; give a name ending in .pdf, got " + pdf);
        }
        PrintWriter o = spec.commandLine().getOut();
        for (Path p : outputs(pdf)) {
            if (!force && p.toFile().exists()) {
                throw new InputException(p.toString(), "already exists; use --force to replace it");
            }
        }
        // All files or none: every one is written to a temporary before any is moved into place.
        java.util.List<org.headway.project.AtomicFiles.Entry> files = new java.util.ArrayList<>();
        files.add(new org.headway.project.AtomicFiles.Entry(pdf, PdfSheetWriter.content(sheet, system)));
        if (workbook) {
            files.add(new org.headway.project.AtomicFiles.Entry(
                    sibling(pdf, ".xlsx"), WorkbookSheetWriter.content(sheet)));
        }
        if (csv) {
            files.add(new org.headway.project.AtomicFiles.Entry(sibling(pdf, ".csv"), CsvSheetWriter.content(sheet)));
        }
        org.headway.project.AtomicFiles.writeAll(files, force);
        for (org.headway.project.AtomicFiles.Entry f : files) {
            o.println("wrote " + f.target());
        }
        o.println("input hash " + sheet.inputHash());
        o.flush();
        return HeadwayCommand.EXIT_OK;
    }

    /** The sheet at the design flow, at the flow an available head drives, or at the chosen size. */
    private HeadLossSheet modeSheet(ResolvedProject resolved) {
        if (mode == SolveCommand.Mode.headloss) {
            if (availableHead != null) {
                throw new InputException("--available-head", "applies to --mode flow");
            }
            return HeadLossSheet.of(resolved, HeadwayCommand.version());
        }
        org.headway.system.PipeRun run = resolved.run();
        if (mode == SolveCommand.Mode.flow) {
            double head = availableHead == null
                    ? 0
                    : CliSupport.parse(availableHead, org.headway.units.QuantityKind.HEAD, "--available-head");
            org.headway.system.FlowSolver.Solution s = org.headway.system.FlowSolver.solve(run, head);
            if (s.outcome() != org.headway.system.FlowSolver.Outcome.FLOWING) {
                throw new InputException("--mode flow", "no forward flow: " + s.message());
            }
            ResolvedProject atFlow = new ResolvedProject(
                    resolved.project(),
                    run.withDesignFlow(s.flow()),
                    resolved.sizingCandidates(),
                    resolved.limits(),
                    resolved.curve());
            return HeadLossSheet.of(atFlow, HeadwayCommand.version()).inMode("flow", s.message(), java.util.List.of());
        }
        if (resolved.sizingCandidates().isEmpty()) {
            throw new InputException(
                    fileName(project) + " sizing",
                    "missing; --mode size needs a \"sizing\" entry naming a material and schedule");
        }
        org.headway.system.SizeSelector.Selection selection =
                org.headway.system.SizeSelector.select(run, resolved.sizingCandidates(), resolved.limits());
        if (selection.chosen().isEmpty()) {
            throw new InputException("--mode size", "no candidate size meets the limits; see solve --mode size");
        }
        ResolvedProject sized = new ResolvedProject(
                resolved.project(), selection.run(), resolved.sizingCandidates(), resolved.limits(), resolved.curve());
        return HeadLossSheet.of(sized, HeadwayCommand.version())
                .inMode(
                        "size",
                        "smallest size meeting the limits: "
                                + selection.chosen().get().label(),
                        selection.candidates());
    }

    /** The network sheet: PDF, and the workbook and CSV (node and link tables) when asked. */
    private int networkSheet(org.headway.project.Project loaded, Catalog catalog, UnitSystem system) {
        org.headway.network.NetworkStudy study;
        try {
            study = ProjectResolver.resolveNetworkStudy(
                    loaded, catalog, project.toAbsolutePath().getParent());
        } catch (InputException e) {
            throw new InputException(fileName(project), e.getMessage(), e);
        }
        Path pdf = pdfPath();
        for (Path p : outputs(pdf)) {
            if (!forceOption.force && p.toFile().exists()) {
                throw new InputException(p.toString(), "already exists; use --force to replace it");
            }
        }
        org.headway.report.NetworkSheet sheet =
                org.headway.report.NetworkSheet.of(loaded, study, HeadwayCommand.version());
        java.util.List<org.headway.project.AtomicFiles.Entry> files = new java.util.ArrayList<>();
        files.add(new org.headway.project.AtomicFiles.Entry(
                pdf, org.headway.report.NetworkPdfWriter.content(sheet, system)));
        if (workbook) {
            files.add(new org.headway.project.AtomicFiles.Entry(
                    sibling(pdf, ".xlsx"), org.headway.report.NetworkWorkbookWriter.content(sheet)));
        }
        if (csv) {
            org.headway.network.NetworkResult base = sheet.result().base().result();
            files.add(new org.headway.project.AtomicFiles.Entry(sibling(pdf, ".csv"), out -> {
                java.io.Writer w = new java.io.OutputStreamWriter(out, java.nio.charset.StandardCharsets.UTF_8);
                NetworkOutput.nodesCsv(base, w);
                w.append('\n');
                NetworkOutput.linksCsv(base, w);
                w.flush();
            }));
        }
        org.headway.project.AtomicFiles.writeAll(files, forceOption.force);
        PrintWriter o = spec.commandLine().getOut();
        for (org.headway.project.AtomicFiles.Entry f : files) {
            o.println("wrote " + f.target());
        }
        o.println("input hash " + sheet.inputHash());
        o.flush();
        return sheet.result().converged() ? HeadwayCommand.EXIT_OK : HeadwayCommand.EXIT_FAILED;
    }

    private Path pdfPath() {
        Path pdf = out != null ? out : Path.of("reports", stem(project) + ".pdf");
        if (pdf.getFileName() == null
                || !pdf.getFileName()
                        .toString()
                        .toLowerCase(java.util.Locale.ROOT)
                        .endsWith(".pdf")) {
            throw new InputException("--out", "the sheet is a PDF; give a name ending in .pdf, got " + pdf);
        }
        return pdf;
    }

    private java.util.List<Path> outputs(Path pdf) {
        java.util.List<Path> list = new java.util.ArrayList<>();
        list.add(pdf);
        if (workbook) {
            list.add(sibling(pdf, ".xlsx"));
        }
        if (csv) {
            list.add(sibling(pdf, ".csv"));
        }
        return list;
    }

    /** The file name of a path, or the whole path for a root such as "/". */
    static String fileName(Path file) {
        return file.getFileName() == null ? file.toString() : file.getFileName().toString();
    }

    static String stem(Path project) {
        String name = project.getFileName() == null
                ? "project"
                : project.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return SafeText.fileStem(dot > 0 ? name.substring(0, dot) : name);
    }

    static Path sibling(Path pdf, String extension) {
        String name = pdf.getFileName().toString();
        String base = name.substring(0, name.length() - 4);
        return pdf.resolveSibling(base + extension);
    }
}
