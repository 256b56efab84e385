package org.headway.cli;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.headway.caution.InputException;
import org.headway.network.Network;
import org.headway.network.NetworkResult;
import org.headway.network.NetworkSolver;
import org.headway.network.NetworkStudy;
import org.headway.pipe.Catalog;
import org.headway.project.AtomicFiles;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.project.ProjectFile;
import org.headway.project.ProjectResolver;
import org.headway.units.Quantities;
import org.headway.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code headway network}: a branched or looped network from a line list (nodes and links CSV). */
@Command(
        name = "network",
        mixinStandardHelpOptions = true,
        description = {
            "Solve a branched or looped network from its line list: heads and",
            "pressures at the nodes, flows and losses in the links (global gradient",
            "algorithm, Todini & Pilati 1988). Column names may carry units in",
            "brackets, e.g. \"diameter [mm]\"; without them cells are SI or carry",
            "their own unit. Exit status 1 when the solve does not converge.",
            "Results are estimates for design review against local codes by a",
            "qualified engineer."
        })
public final class NetworkCommand implements Callable<Integer> {

    /** Output formats. */
    enum Format {
        text,
        json,
        csv
    }

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--nodes", required = true, paramLabel = "NODES.csv", description = "Node list CSV.")
    Path nodes;

    @Option(names = "--links", required = true, paramLabel = "LINKS.csv", description = "Link list CSV.")
    Path links;

    @Option(names = "--fluid", defaultValue = "water", description = "Fluid id (default ${DEFAULT-VALUE}).")
    String fluid;

    @Option(
            names = "--temperature",
            defaultValue = "15 degC",
            paramLabel = "T",
            description = "Fluid temperature with its unit (default ${DEFAULT-VALUE}).")
    String temperature;

    @Option(
            names = "--friction",
            defaultValue = "auto",
            description = "Friction method for pipes: auto, colebrook, hazen-williams, … (default ${DEFAULT-VALUE}).")
    String friction;

    @Option(names = "--title", defaultValue = "", description = "Title for the output and a saved project.")
    String title;

    @Option(names = "--format", defaultValue = "text", description = "text, json or csv (default ${DEFAULT-VALUE}).")
    Format format;

    @Option(
            names = "--output",
            paramLabel = "DIR",
            description = "Also write network.json, network-nodes.csv and network-links.csv into DIR.")
    Path output;

    @Option(
            names = "--save",
            paramLabel = "PROJECT.json",
            description = "Save the network as a Headway project (format 2, nodes and links).")
    Path save;

    @Mixin
    SharedOptions.Force forceOption;

    @Mixin
    SharedOptions.TextUnits unitsOption;

    @Mixin
    SharedOptions.CatalogFolder catalogOption;

    @Option(
            names = "--timings",
            description = "Print the time of each phase (read, resolve, solve, write) to standard error.")
    boolean timings;

    @Option(
            names = "--cases",
            paramLabel = "CASES.csv",
            description = {
                "Demand cases, solved with the network's own demands in one run:",
                "columns case, multiplier, and optional demand (a category) or",
                "node and value (that junction's demand in the case)."
            })
    Path cases;

    @Option(
            names = "--min-pressure",
            paramLabel = "P",
            description = "Lowest gauge pressure at a junction in any case, with its unit (e.g. \"200 kPa\").")
    String minPressure;

    @Option(
            names = "--max-pressure",
            paramLabel = "P",
            description = "Highest gauge pressure at a junction in any case, with its unit (e.g. \"8 bar\").")
    String maxPressure;

    @Option(
            names = "--index-chart",
            paramLabel = "FILE.png",
            description = "Draw energy and hydraulic grade and elevation along the index circuit into FILE.png.")
    Path indexChart;

    @Option(
            names = "--balance",
            description = {
                "Balance every valve (kind valve, by kv or cv) that has a design_flow: the Kv",
                "that carries its design flow, its authority, branches short of head, the",
                "index valve and the source head needed."
            })
    boolean balance;

    @Option(
            names = "--min-valve-drop",
            paramLabel = "P",
            description = "Least pressure drop across a balancing valve at design flow (default 3 kPa).")
    String minValveDrop;

    @Option(
            names = "--valve-settings",
            paramLabel = "FILE.csv",
            description = "Valve setting table: columns setting,kv and optionally valve (id or name).")
    Path valveSettings;

    @Option(
            names = "--fire-flow",
            paramLabel = "NODE",
            description = "Find the largest extra demand at junction NODE for which every junction keeps"
                    + " --residual-pressure.")
    String fireFlow;

    @Option(
            names = "--residual-pressure",
            paramLabel = "P",
            description = "Least gauge pressure every junction keeps in the fire-flow search, e.g. \"140 kPa\","
                    + " \"1.4 barg\", \"20 psig\".")
    String residualPressure;

    @Option(
            names = "--size",
            description = {
                "Size every pipe given by catalog material and size: the smallest size of its",
                "table and schedule meeting --max-velocity and --max-gradient at its flow,",
                "re-solved until the sizes settle, then checked against --head-budget."
            })
    boolean size;

    @Option(
            names = "--max-velocity",
            paramLabel = "V",
            description = "Velocity limit for --size, with its unit (default \"" + NetworkDesign.DEFAULT_MAX_VELOCITY
                    + "\").")
    String maxVelocity;

    @Option(
            names = "--max-gradient",
            paramLabel = "G",
            description = "Friction-loss limit for --size, a head or pressure per length: \"4 m/100m\", \"4 ft/100ft\","
                    + " \"400 Pa/m\", \"1.2 psi/100ft\" (default \"" + NetworkDesign.DEFAULT_MAX_GRADIENT + "\").")
    String maxGradient;

    @Option(
            names = "--head-budget",
            paramLabel = "H",
            description = "For --size: largest loss from a source to any terminal, e.g. \"25 m\"; pipes on the"
                    + " index circuit grow until it is met.")
    String headBudget;

    @Option(
            names = "--min-diameter",
            paramLabel = "D",
            description = "For --size: least inner diameter a sized pipe may have, e.g. \"100 mm\" (default none).")
    String minDiameter;

    @Option(
            names = "--uncertainty",
            description = {
                "Range of every node's pressure and every pump's duty over each pipe's published",
                "roughness range and --demand-range: the two corners where they are shown to",
                "bound it (a tree from one source), otherwise a seeded Monte Carlo."
            })
    boolean uncertainty;

    @Option(
            names = "--demand-range",
            paramLabel = "LOW:HIGH",
            description = "Multipliers on every junction demand for --uncertainty, e.g. \"0.9:1.1\" (default 1:1).")
    String demandRange;

    @Option(
            names = "--samples",
            paramLabel = "N",
            description =
                    "Random samples of the Monte Carlo (default 200; the nominal and both corners are solved too).")
    Integer samples;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of the Monte Carlo (default 1).")
    Long seed;

    @Override
    public Integer call() {
        Path catalogFolder = catalogOption.catalogFolder;
        boolean force = forceOption.force;
        String units = unitsOption.units;
        long t0 = System.nanoTime();
        NetworkDesign design = NetworkDesign.of(balance, minValveDrop, valveSettings, fireFlow, residualPressure);
        UnitSystem system = CliSupport.unitSystem(units);
        Catalog catalog = catalogFolder == null ? Catalog.bundled() : Catalog.withUserFolder(catalogFolder);
        Project.NetworkSpec spec = LineList.read(nodes, links, catalog, friction.equals("hazen-williams"));
        if (cases != null) {
            spec = spec.withDemandCases(LineList.readCases(cases, spec));
        }
        if (!size && (maxVelocity != null || maxGradient != null || headBudget != null || minDiameter != null)) {
            throw new InputException(
                    maxVelocity != null
                            ? "--max-velocity"
                            : maxGradient != null
                                    ? "--max-gradient"
                                    : headBudget != null ? "--head-budget" : "--min-diameter",
                    "applies to sizing; give --size as well");
        }
        if (!uncertainty && (demandRange != null || samples != null || seed != null)) {
            throw new InputException(
                    demandRange != null ? "--demand-range" : samples != null ? "--samples" : "--seed",
                    "applies to the uncertainty study; give --uncertainty as well");
        }
        if (uncertainty) {
            design = design.withUncertainty(NetworkDesign.uncertaintySpec(demandRange, samples, seed));
        }
        if (size) {
            if (maxVelocity != null) {
                Quantities.parse(maxVelocity, org.headway.units.QuantityKind.VELOCITY, "--max-velocity");
            }
            if (maxGradient != null) {
                NetworkDesign.gradient(maxGradient, 1000 * org.headway.system.Gravity.STANDARD);
            }
            if (headBudget != null) {
                Quantities.parse(headBudget, org.headway.units.QuantityKind.HEAD, "--head-budget");
            }
            if (minDiameter != null) {
                Quantities.parse(minDiameter, org.headway.units.QuantityKind.DIAMETER, "--min-diameter");
            }
            design = design.withSizing(new NetworkDesign.SizingRequest(
                    maxVelocity == null ? NetworkDesign.DEFAULT_MAX_VELOCITY : maxVelocity,
                    maxGradient == null ? NetworkDesign.DEFAULT_MAX_GRADIENT : maxGradient,
                    headBudget,
                    minDiameter,
                    ProjectResolver.networkSizingCandidates(spec, catalog)));
        }
        Project project = Project.network(title, fluid, temperature, friction, spec);
        if (minPressure != null || maxPressure != null) {
            project = project.withPressureLimits(new Project.PressureLimitsSpec(
                    pressureOption(minPressure, "--min-pressure"), pressureOption(maxPressure, "--max-pressure")));
        }
        long t1 = System.nanoTime();
        NetworkStudy network;
        try {
            network = ProjectResolver.resolveNetworkStudy(
                    project, catalog, nodes.toAbsolutePath().getParent());
        } catch (InputException e) {
            throw new InputException(
                    "line list " + nodes.getFileName() + " / " + links.getFileName(), e.getMessage(), e);
        }
        if (save != null) {
            if (!force && Files.exists(save)) {
                throw new InputException(save.toString(), "already exists; give --force to replace it");
            }
            ProjectFile.save(project, save);
        }
        long t2 = System.nanoTime();
        // The typed line list is no longer needed: let it go before the solve needs the heap.
        spec = null;
        project = null;
        int code = solveStudyAndPrint(spec(), network, format, system, output, force, timings, indexChart, design);
        if (timings) {
            spec().commandLine()
                    .getErr()
                    .printf(
                            java.util.Locale.ROOT,
                            "timings: read %.3f s, resolve %.3f s%n",
                            (t1 - t0) * 1e-9,
                            (t2 - t1) * 1e-9);
        }
        return code;
    }

    private picocli.CommandLine.Model.CommandSpec spec() {
        return spec;
    }

    /** A pressure option's text, checked here so that a bad value names the option; empty when not given. */
    private static String pressureOption(String text, String option) {
        if (text == null) {
            return "";
        }
        Quantities.parsePressure(text, option);
        return text;
    }

    /**
     * Solves a study (the network's own demands, then each demand case) and writes it: the keys of
     * one solve unchanged, plus pumps, index circuit, terminal paths, and with cases or limits the
     * cases and the pressure table. Shared with {@code solve} for network projects.
     */
    static int solveStudyAndPrint(
            picocli.CommandLine.Model.CommandSpec spec,
            NetworkStudy study,
            Format format,
            UnitSystem system,
            Path output,
            boolean force,
            boolean timings,
            Path indexChart,
            NetworkDesign design) {
        long t0 = System.nanoTime();
        NetworkStudy.Result result = study.solve(NetworkSolver.standard());
        long t1 = System.nanoTime();
        NetworkDesign.Results designed = design.run(result.base().network());
        long t2 = System.nanoTime();
        PrintWriter out = spec.commandLine().getOut();
        NetworkResult base = result.base().result();
        try {
            switch (format) {
                case json -> out.println(NetworkStudyOutput.json(study, result, designed));
                case csv -> {
                    NetworkOutput.nodesCsv(base, out);
                    out.println();
                    NetworkOutput.linksCsv(base, designed, out);
                    if (designed.any()) {
                        out.println();
                        NetworkOutput.designCsv(designed, out);
                    }
                    if (designed.sizing() != null) {
                        out.println();
                        NetworkOutput.sizingCsv(designed.sizing(), out);
                    }
                    if (designed.uncertainty() != null) {
                        out.println();
                        NetworkOutput.uncertaintyCsv(designed.uncertainty(), out);
                    }
                    if (!result.cases().isEmpty()) {
                        out.println();
                        NetworkStudyOutput.caseNodesCsv(result, out);
                        out.println();
                        NetworkStudyOutput.caseLinksCsv(result, out);
                    }
                }
                default -> NetworkStudyOutput.text(out, study, result, system, designed);
            }
            if (output != null) {
                Files.createDirectories(output);
                write(
                        output.resolve("network.json"),
                        force,
                        w -> w.append(NetworkStudyOutput.json(study, result, designed))
                                .append('\n'));
                write(output.resolve("network-nodes.csv"), force, w -> NetworkOutput.nodesCsv(base, w));
                write(output.resolve("network-links.csv"), force, w -> NetworkOutput.linksCsv(base, designed, w));
                if (designed.any()) {
                    write(output.resolve("network-design.csv"), force, w -> NetworkOutput.designCsv(designed, w));
                }
                if (designed.uncertainty() != null) {
                    write(
                            output.resolve("network-uncertainty.csv"),
                            force,
                            w -> NetworkOutput.uncertaintyCsv(designed.uncertainty(), w));
                }
                if (designed.sizing() != null) {
                    write(
                            output.resolve("network-sizing.csv"),
                            force,
                            w -> NetworkOutput.sizingCsv(designed.sizing(), w));
                }
                if (!result.base().pumps().pumps().isEmpty()) {
                    write(output.resolve("network-pumps.csv"), force, w -> NetworkStudyOutput.pumpsCsv(result, w));
                }
                if (!result.base().circuit().paths().isEmpty()) {
                    write(
                            output.resolve("network-terminal-paths.csv"),
                            force,
                            w -> NetworkStudyOutput.terminalPathsCsv(result, w));
                }
                if (!result.cases().isEmpty()) {
                    write(
                            output.resolve("network-cases-nodes.csv"),
                            force,
                            w -> NetworkStudyOutput.caseNodesCsv(result, w));
                    write(
                            output.resolve("network-cases-links.csv"),
                            force,
                            w -> NetworkStudyOutput.caseLinksCsv(result, w));
                }
                if (result.pressureCheck().isPresent()) {
                    write(
                            output.resolve("network-pressure-checks.csv"),
                            force,
                            w -> NetworkStudyOutput.pressureChecksCsv(
                                    result.pressureCheck().get(), w));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        out.flush();
        if (indexChart != null && !NetworkStudyOutput.indexChart(result, system, indexChart, force)) {
            spec.commandLine()
                    .getErr()
                    .println(
                            "headway: --index-chart: the network has no index circuit (no terminal); no chart written");
        }
        if (timings) {
            spec.commandLine()
                    .getErr()
                    .printf(
                            java.util.Locale.ROOT,
                            "timings: solve %.3f s (%d iterations%s), write %.3f s%n",
                            (t1 - t0) * 1e-9,
                            base.iterations(),
                            result.cases().isEmpty()
                                    ? ""
                                    : " in the base solve, " + result.cases().size() + " cases more",
                            (System.nanoTime() - t2) * 1e-9);
            if (designed.balance() != null || designed.fireFlow() != null) {
                spec.commandLine()
                        .getErr()
                        .printf(
                                java.util.Locale.ROOT,
                                "timings: design %.3f s (balancing %s solves, fire flow %s solves)%n",
                                (t2 - t1) * 1e-9,
                                designed.balance() == null
                                        ? "no"
                                        : String.valueOf(designed.balance().solves()),
                                designed.fireFlow() == null
                                        ? "no"
                                        : String.valueOf(designed.fireFlow().solves()));
            }
        }
        return result.converged() && designed.complete() ? HeadwayCommand.EXIT_OK : HeadwayCommand.EXIT_FAILED;
    }

    /** Solves a network alone (no cases, no limits) and writes the result. */
    static int solveAndPrint(
            picocli.CommandLine.Model.CommandSpec spec,
            Network network,
            Format format,
            UnitSystem system,
            Path output,
            boolean force,
            boolean timings,
            NetworkDesign design) {
        return solveStudyAndPrint(spec, NetworkStudy.of(network), format, system, output, force, timings, null, design);
    }

    private interface Body {
        void write(Writer w) throws IOException;
    }

    private static void write(Path file, boolean force, Body body) {
        AtomicFiles.write(file, force, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            body.write(w);
            w.flush();
        });
    }
}
