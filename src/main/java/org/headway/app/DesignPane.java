package org.headway.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.caution.Severity;
import org.headway.network.CaseResult;
import org.headway.network.NetworkResult;
import org.headway.network.PressureCheck;
import org.headway.network.design.BalancingResult;
import org.headway.network.design.FireFlowResult;
import org.headway.network.design.NetworkSizingResult;
import org.headway.project.LineList;
import org.headway.project.Project;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * The network workspace's design studies, one section each: demand cases with the pressure-limits
 * check, pipe sizing, valve balancing and a fire-flow search. Each study runs in a background task
 * with progress and cancel (one at a time); its last answer stays shown, in the chosen unit system.
 */
final class DesignPane extends VBox {

    private final NetworkEditor editor;
    private final Dialogs dialogs;
    private final Supplier<Path> startFolder;
    private final ProgressBar progress = new ProgressBar();
    private final Button cancel = new Button("Cancel");
    private final Label status = new Label("Open a study below and run it.");
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "headway-network-design");
        t.setDaemon(true);
        return t;
    });
    private Task<?> running;
    private final javafx.scene.control.Accordion studies = new javafx.scene.control.Accordion();

    /** Opens one study's section (by its id: design-cases, design-sizing, design-balancing, design-fire). */
    void expand(String id) {
        studies.getPanes().stream()
                .filter(p -> id.equals(p.getId()))
                .findFirst()
                .ifPresent(studies::setExpandedPane);
    }

    /** Runs before each study's work on the worker thread (tests put a wait in to see progress and cancel). */
    Consumer<NetworkSolution.Progress> beforeWork = p -> {};

    // demand cases
    private final TextField minPressure = field("design-min-pressure", "e.g. 200 kPa");
    private final TextField maxPressure = field("design-max-pressure", "e.g. 800 kPa");
    private final Label casesList = new Label();
    private final VBox casesOut = output("design-cases-output");
    private DesignStudies.Cases cases;
    // sizing
    private final TextField maxVelocity = field("design-max-velocity", DesignStudies.DEFAULT_MAX_VELOCITY);
    private final TextField maxGradient = field("design-max-gradient", DesignStudies.DEFAULT_MAX_GRADIENT);
    private final TextField headBudget = field("design-head-budget", "none");
    private final TextField minDiameter = field("design-min-diameter", "none");
    private final VBox sizingOut = output("design-sizing-output");
    private DesignStudies.Sizing sizing;
    // balancing
    private final TextField minValveDrop = field("design-min-valve-drop", DesignStudies.DEFAULT_MIN_VALVE_DROP);
    private final VBox balanceOut = output("design-balance-output");
    private DesignStudies.Balance balance;
    // fire flow
    private final ComboBox<String> fireNode = new ComboBox<>();
    private final TextField residual = field("design-residual-pressure", "e.g. 140 kPa");
    private final VBox fireOut = output("design-fire-output");
    private DesignStudies.Fire fire;
    // pressure ranges
    private final TextField demandRange = field("design-demand-range", "1:1");
    private final TextField samples = field("design-samples", "200");
    private final TextField seed = field("design-seed", "1");
    private final VBox spreadOut = output("design-uncertainty-output");
    private DesignStudies.Spread spread;

    DesignPane(NetworkEditor editor, Dialogs dialogs, Supplier<Path> startFolder) {
        super(6);
        this.editor = editor;
        this.dialogs = dialogs;
        this.startFolder = startFolder;
        setId("design-pane");
        setPadding(new Insets(8, 10, 8, 10));
        fireNode.setId("design-fire-node");
        fireNode.setEditable(true);
        fireNode.setMaxWidth(Double.MAX_VALUE);
        fireNode.setPromptText("junction id");

        progress.setVisible(false);
        progress.setPrefWidth(110);
        cancel.setId("design-cancel");
        cancel.setVisible(false);
        cancel.setOnAction(e -> {
            if (running != null) {
                running.cancel(true);
            }
        });
        status.setId("design-status");
        status.setWrapText(true);
        status.getStyleClass().add("status");
        progress.managedProperty().bind(progress.visibleProperty());
        cancel.managedProperty().bind(cancel.visibleProperty());
        HBox.setHgrow(status, Priority.ALWAYS);
        HBox runLine = new HBox(8, progress, cancel, status);
        runLine.setAlignment(Pos.CENTER_LEFT);

        Label intro = new Label("On the line list as it stands; estimates for review against local codes by a"
                + " qualified engineer.");
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");

        studies.getPanes()
                .addAll(
                        section("Demand cases and pressure limits", "design-cases", casesSection()),
                        section("Pipe sizing", "design-sizing", sizingSection()),
                        section("Valve balancing", "design-balancing", balancingSection()),
                        section("Fire flow", "design-fire", fireSection()),
                        section("Pressure ranges", "design-uncertainty", uncertaintySection()));
        studies.setExpandedPane(studies.getPanes().get(0));
        getChildren().addAll(intro, runLine, studies);
        editor.unitSystemProperty().addListener((o, a, b) -> redraw());
        editor.draftProperty().addListener((o, a, b) -> draftChanged());
        draftChanged();
    }

    private static TextField field(String id, String prompt) {
        TextField t = new TextField();
        t.setId(id);
        t.setPromptText(prompt);
        return t;
    }

    private static VBox output(String id) {
        VBox v = new VBox(4);
        v.setId(id);
        return v;
    }

    private static TitledPane section(String title, String id, VBox content) {
        TitledPane p = new TitledPane(title, content);
        p.setId(id);
        p.setAnimated(false);
        return p;
    }

    private static GridPane grid(Object... labelsAndFields) {
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(4);
        for (int i = 0; i < labelsAndFields.length; i += 2) {
            Label l = new Label((String) labelsAndFields[i]);
            l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            g.add(l, 0, i / 2);
            javafx.scene.Node n = (javafx.scene.Node) labelsAndFields[i + 1];
            GridPane.setHgrow(n, Priority.ALWAYS);
            g.add(n, 1, i / 2);
        }
        return g;
    }

    private static Button runButton(String text, String id, Runnable action) {
        Button b = new Button(text);
        b.setId(id);
        b.getStyleClass().add("primary");
        b.setOnAction(e -> action.run());
        return b;
    }

    private VBox casesSection() {
        Button importCases = new Button("Import cases…");
        importCases.setId("design-import-cases");
        importCases.setOnAction(e -> importCases());
        casesList.setId("design-cases-list");
        casesList.setWrapText(true);
        casesList.getStyleClass().add("hint");
        HBox buttons = new HBox(8, runButton("Run demand cases", "design-run-cases", this::runCases), importCases);
        return new VBox(
                6, casesList, grid("Least pressure", minPressure, "Greatest pressure", maxPressure), buttons, casesOut);
    }

    private VBox sizingSection() {
        Label hint = new Label("Sizes every pipe given by a catalog material and size (not one with its own"
                + " diameter): the smallest size within both limits, then upsized on the index circuit to"
                + " keep its loss within the head budget.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        return new VBox(
                6,
                hint,
                grid(
                        "Velocity limit",
                        maxVelocity,
                        "Gradient limit",
                        maxGradient,
                        "Head budget",
                        headBudget,
                        "Least bore",
                        minDiameter),
                runButton("Size pipes", "design-run-sizing", this::runSizing),
                sizingOut);
    }

    private VBox balancingSection() {
        Label hint = new Label("Finds the Kv that makes each valve with a design flow pass it (IEC 60534-2-1),"
                + " the branch authority, the index valve and the head the source must hold.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        return new VBox(
                6,
                hint,
                grid("Least valve drop", minValveDrop),
                runButton("Balance valves", "design-run-balancing", this::runBalancing),
                balanceOut);
    }

    private VBox fireSection() {
        Label hint = new Label("The largest extra draw at a junction while every junction keeps the residual"
                + " pressure. The local fire code sets the flow and pressure required.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        return new VBox(
                6,
                hint,
                grid("At junction", fireNode, "Residual pressure", residual),
                runButton("Find fire flow", "design-run-fire", this::runFire),
                fireOut);
    }

    private VBox uncertaintySection() {
        Label hint = new Label("Every junction's pressure and every pump's duty over the pipes' roughness ranges"
                + " and a range of demand multipliers: the corners where they bound the answer (a tree from one"
                + " source), otherwise a seeded random sample of that many solves.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        return new VBox(
                6,
                hint,
                grid("Demand range (low:high)", demandRange, "Random samples", samples, "Seed", seed),
                runButton("Find ranges", "design-run-uncertainty", this::runUncertainty),
                spreadOut);
    }

    private void draftChanged() {
        NetworkEditor.Draft d = editor.draft();
        List<Project.DemandCaseSpec> c = d.cases();
        casesList.setText(
                c.isEmpty()
                        ? "No demand cases in the project: the network's own demands are solved. Import a cases"
                                + " CSV (case, multiplier, node, value) to add some."
                        : c.size() + " demand case(s): "
                                + String.join(
                                        ", ",
                                        c.stream()
                                                .map(Project.DemandCaseSpec::name)
                                                .toList()));
        List<String> junctions = new ArrayList<>();
        for (Map<String, String> n : d.nodes()) {
            String fixed = n.getOrDefault("fixed_head", "") + n.getOrDefault("fixed_pressure", "");
            if (fixed.isBlank() && !n.getOrDefault("id", "").isBlank()) {
                junctions.add(n.get("id"));
            }
        }
        if (!fireNode.getItems().equals(junctions)) {
            String keep = fireNode.getValue();
            fireNode.getItems().setAll(junctions);
            fireNode.setValue(keep);
        }
        if (minPressure.getPromptText().startsWith("e.g.")) {
            Project.PressureLimitsSpec limits = d.base().pressureLimits();
            if (!limits.minimum().isEmpty()) {
                minPressure.setPromptText("project: " + limits.minimum());
            }
            if (!limits.maximum().isEmpty()) {
                maxPressure.setPromptText("project: " + limits.maximum());
            }
        }
    }

    private void importCases() {
        Optional<Path> file = dialogs.chooseDataToImport(startFolder.get());
        if (file.isEmpty()) {
            return;
        }
        try {
            editor.setCases(LineList.readCases(file.get(), editor.readDraft()));
            status.setText("Demand cases read: " + file.get().getFileName());
        } catch (InputException e) {
            dialogs.showError("Could not read the demand cases", NetworkEditor.inWords(e));
        }
    }

    // ---- running ----

    /** The work of one study, run on the worker thread. */
    @FunctionalInterface
    interface Work<T> {
        T run(DesignStudies.Input in, NetworkSolution.Progress progress);
    }

    private <T> void start(String what, Work<T> work, Consumer<T> show) {
        if (running != null && running.isRunning()) {
            running.cancel(true);
        }
        DesignStudies.Input in = new DesignStudies.Input(editor, editor.draft(), editor.catalog(), editor.baseFolder());
        Task<T> task = new Task<>() {
            @Override
            protected T call() {
                NetworkSolution.Progress p = (step, steps, text) -> {
                    updateProgress(step, steps);
                    updateMessage(what + ": " + text + "…");
                };
                beforeWork.accept(p);
                return work.run(in, p);
            }
        };
        running = task;
        progress.progressProperty().bind(task.progressProperty());
        status.textProperty().bind(task.messageProperty());
        progress.setVisible(true);
        cancel.setVisible(true);
        task.setOnSucceeded(e -> {
            if (task == running) {
                finish(what + ": done");
                show.accept(task.getValue());
                redraw();
            }
        });
        task.setOnCancelled(e -> {
            if (task == running) {
                finish(what + ": cancelled; the results shown (if any) are from before");
            }
        });
        task.setOnFailed(e -> {
            if (task != running) {
                return;
            }
            Throwable t = task.getException();
            finish(what + ": not done — "
                    + (t instanceof InputException ie
                            ? NetworkEditor.inWords(ie)
                            : t instanceof java.util.concurrent.CancellationException
                                    ? "cancelled"
                                    : "internal error (please report): " + t));
        });
        worker.execute(task);
    }

    private void finish(String text) {
        progress.progressProperty().unbind();
        status.textProperty().unbind();
        progress.setVisible(false);
        cancel.setVisible(false);
        status.setText(text);
    }

    void runCases() {
        String min = minPressure.getText();
        String max = maxPressure.getText();
        start("Demand cases", (in, p) -> DesignStudies.cases(in, min, max, p), r -> cases = r);
    }

    void runSizing() {
        String v = maxVelocity.getText();
        String g = maxGradient.getText();
        String b = headBudget.getText();
        String d = minDiameter.getText();
        start("Sizing", (in, p) -> DesignStudies.sizing(in, v, g, b, d, p), r -> sizing = r);
    }

    void runBalancing() {
        String drop = minValveDrop.getText();
        start("Balancing", (in, p) -> DesignStudies.balancing(in, drop, p), r -> balance = r);
    }

    void runFire() {
        String node = fireNode.getEditor().getText();
        String pressure = residual.getText();
        start("Fire flow", (in, p) -> DesignStudies.fireFlow(in, node, pressure, p), r -> fire = r);
    }

    void runUncertainty() {
        String range = demandRange.getText();
        String n = samples.getText();
        String s = seed.getText();
        start("Pressure ranges", (in, p) -> DesignStudies.uncertainty(in, range, n, s, p), r -> spread = r);
    }

    /** The study last started (tests). */
    Task<?> running() {
        return running;
    }

    Label statusLabel() {
        return status;
    }

    DesignStudies.Cases cases() {
        return cases;
    }

    DesignStudies.Sizing sizingResult() {
        return sizing;
    }

    DesignStudies.Balance balanceResult() {
        return balance;
    }

    DesignStudies.Fire fireResult() {
        return fire;
    }

    // ---- showing ----

    private UnitSystem units() {
        return editor.unitSystemProperty().get();
    }

    private String pressure(double pa) {
        return Double.isFinite(pa)
                ? Quantities.format(Quantities.withoutNoise(pa, 1e5), QuantityKind.PRESSURE, units())
                : "—";
    }

    private String flow(double q, double scale) {
        return Double.isFinite(q)
                ? Quantities.format(Quantities.withoutNoise(q, scale), QuantityKind.VOLUMETRIC_FLOW, units())
                : "—";
    }

    private String of(double v, QuantityKind kind) {
        return Double.isFinite(v) ? Quantities.format(v, kind, units()) : "—";
    }

    private String gradientText(double perHundred) {
        // Head per 100 of the same length unit: the same number in either unit system.
        return Double.isFinite(perHundred)
                ? Quantities.formatNumber(perHundred) + (units() == UnitSystem.SI ? " m/100 m" : " ft/100 ft")
                : "—";
    }

    private void redraw() {
        if (cases != null) {
            showCases(cases);
        }
        if (sizing != null) {
            showSizing(sizing);
        }
        if (balance != null) {
            showBalance(balance);
        }
        if (fire != null) {
            showFire(fire);
        }
        if (spread != null) {
            showSpread(spread);
        }
    }

    /** A table of text rows, sized to its rows (no inner scrolling for a few dozen). */
    static TableView<List<String>> table(String id, List<String> headings, List<List<String>> rows) {
        TableView<List<String>> t = new TableView<>();
        t.setId(id);
        t.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY);
        for (int i = 0; i < headings.size(); i++) {
            int c = i;
            TableColumn<List<String>, String> col = new TableColumn<>(headings.get(i));
            col.setSortable(false);
            col.setCellValueFactory(d -> new ReadOnlyStringWrapper(
                    c < d.getValue().size() ? d.getValue().get(c) : ""));
            // The constrained policy shares the width in proportion to these: widest text first.
            int chars = headings.get(i).length();
            for (List<String> r : rows) {
                chars = Math.max(chars, c < r.size() ? r.get(c).length() : 0);
            }
            col.setPrefWidth(16 + 7.2 * chars);
            t.getColumns().add(col);
        }
        t.getItems().setAll(rows);
        double height = 30 + 25 * Math.min(rows.size(), 14);
        t.setPrefHeight(height);
        t.setMinHeight(height);
        return t;
    }

    private static Label line(String id, String text) {
        Label l = new Label(text);
        l.setId(id);
        l.setWrapText(true);
        return l;
    }

    private List<Label> cautionLines(List<Caution> cautions) {
        List<Label> out = new ArrayList<>();
        cautions.stream()
                .filter(c -> c.severity() != Severity.NOTE && c != Caution.GENERAL_REVIEW)
                .distinct()
                .limit(6)
                .forEach(c -> {
                    Label l = new Label(c.severity().name().toLowerCase(Locale.ROOT) + ": "
                            + Quantities.inSystem(c.message(), units()));
                    l.setWrapText(true);
                    l.getStyleClass().add(c.severity() == Severity.SERIOUS ? "caution-serious" : "hint");
                    out.add(l);
                });
        return out;
    }

    /** Per-junction gauge pressures in every case, with the range and the limits check. */
    List<List<String>> caseRows(DesignStudies.Cases c) {
        List<CaseResult> all = new ArrayList<>();
        all.add(c.result().base());
        all.addAll(c.result().cases());
        Map<String, PressureCheck.NodeRange> ranges = new LinkedHashMap<>();
        Map<String, List<String>> outside = new LinkedHashMap<>();
        c.result().pressureCheck().ifPresent(pc -> {
            pc.ranges().forEach(r -> ranges.put(r.node(), r));
            pc.violations()
                    .forEach(v -> outside.computeIfAbsent(v.node(), k -> new ArrayList<>())
                            .add((v.bound().equals("minimum") ? "below in " : "above in ") + v.caseName()));
        });
        List<List<String>> rows = new ArrayList<>();
        java.util.Set<String> fixed = new java.util.HashSet<>();
        c.study().network().nodes().stream()
                .filter(org.headway.network.Node::headIsFixed)
                .forEach(x -> fixed.add(x.id()));
        for (NetworkResult.NodeResult n : c.result().base().result().nodes()) {
            if (fixed.contains(n.id())) {
                continue;
            }
            List<String> row = new ArrayList<>();
            row.add(n.id());
            for (CaseResult r : all) {
                row.add(r.result().node(n.id()).map(x -> pressure(x.pressure())).orElse("—"));
            }
            if (c.result().pressureCheck().isPresent()) {
                PressureCheck.NodeRange range = ranges.get(n.id());
                row.add(range == null ? "—" : pressure(range.minimumPressure()) + " (" + range.minimumCase() + ")");
                List<String> v = outside.get(n.id());
                row.add(v == null ? "within" : String.join(", ", v));
            }
            rows.add(row);
        }
        return rows;
    }

    private void showCases(DesignStudies.Cases c) {
        List<String> headings = new ArrayList<>();
        headings.add("Junction");
        headings.add(c.result().base().name());
        c.result().cases().forEach(r -> headings.add(r.name()));
        if (c.result().pressureCheck().isPresent()) {
            headings.add("Lowest (case)");
            headings.add("Limits");
        }
        List<javafx.scene.Node> out = new ArrayList<>();
        long outside = c.result()
                .pressureCheck()
                .map(pc -> (long) pc.violations().size())
                .orElse(0L);
        String limits = c.result()
                .pressureCheck()
                .map(pc -> outside == 0
                        ? "every junction within the pressure limits in every case"
                        : outside + " junction pressure(s) outside the limits")
                .orElse("no pressure limits given (type them above, or set them in the project)");
        out.add(line(
                "design-cases-summary",
                "Gauge pressure at each junction; " + (c.result().converged() ? "" : "NOT every case converged; ")
                        + limits + "."));
        out.add(table("design-cases-table", headings, caseRows(c)));
        out.addAll(cautionLines(
                c.result().pressureCheck().map(PressureCheck::cautions).orElse(List.of())));
        casesOut.getChildren().setAll(out);
    }

    /** Why a pipe got its size, in words: the basis and what ruled the next size down out. */
    static String reason(NetworkSizingResult.LinkSizing l) {
        String why = l.basis().words();
        List<NetworkSizingResult.CandidateCheck> c = l.candidates();
        for (int i = 0; i < c.size(); i++) {
            if (c.get(i).size().equals(l.chosenSize())
                    && i > 0
                    && !c.get(i - 1).reasons().isEmpty()) {
                return why + "; " + c.get(i - 1).size() + ": "
                        + String.join(", ", c.get(i - 1).reasons());
            }
        }
        return why;
    }

    List<List<String>> sizingRows(NetworkSizingResult s) {
        double qMax =
                s.links().stream().mapToDouble(l -> Math.abs(l.flow())).max().orElse(0);
        List<List<String>> rows = new ArrayList<>();
        for (NetworkSizingResult.LinkSizing l : s.links()) {
            rows.add(List.of(
                    l.id(),
                    l.givenSize(),
                    l.chosenSize(),
                    of(l.chosenDiameter(), QuantityKind.DIAMETER),
                    flow(l.flow(), qMax),
                    of(l.velocity(), QuantityKind.VELOCITY),
                    gradientText(l.gradient())));
        }
        return rows;
    }

    private void showSizing(DesignStudies.Sizing z) {
        NetworkSizingResult s = z.result();
        String budget = Double.isInfinite(s.headBudget())
                ? "no head budget"
                : "index circuit loss " + of(s.indexLoss(), QuantityKind.HEAD) + " against a budget of "
                        + of(s.headBudget(), QuantityKind.HEAD) + (s.withinBudget() ? " (within)" : " (OVER)");
        List<javafx.scene.Node> out = new ArrayList<>();
        out.add(line(
                "design-sizing-summary",
                (s.settled() ? "Settled" : "NOT settled") + " after " + s.rounds() + " round(s), " + s.solves()
                        + " solves; limits " + of(s.maximumVelocity(), QuantityKind.VELOCITY) + " and "
                        + gradientText(s.maximumGradient()) + "; " + budget + "."
                        + (z.notSized().isEmpty() ? "" : " Kept as given: " + String.join(", ", z.notSized()) + ".")));
        out.add(table(
                "design-sizing-table",
                List.of("Pipe", "Given", "Chosen", "Bore", "Flow", "Velocity", "Gradient"),
                sizingRows(s)));
        Label why = line(
                "design-sizing-why",
                "Why: "
                        + String.join(
                                "; ",
                                s.links().stream()
                                        .map(l -> l.id() + " " + reason(l))
                                        .toList()) + ".");
        why.getStyleClass().add("hint");
        out.add(why);
        Button apply = new Button("Apply chosen sizes to the links");
        apply.setId("design-apply-sizes");
        Label applied = line("design-apply-sizes-result", "");
        apply.setOnAction(e -> applySizes(s, applied));
        out.add(new HBox(8, apply, applied));
        out.addAll(cautionLines(s.cautions()));
        sizingOut.getChildren().setAll(out);
    }

    /** Writes the study's chosen sizes into the link rows (one undo step) and says what changed. */
    private void applySizes(NetworkSizingResult s, Label applied) {
        Map<String, String> chosen = new java.util.LinkedHashMap<>();
        for (NetworkSizingResult.LinkSizing l : s.links()) {
            chosen.put(l.id(), l.chosenSize());
        }
        try {
            List<String> changed = editor.applySizes(chosen);
            applied.setText(
                    changed.isEmpty()
                            ? "The links already have these sizes."
                            : changed.size() + " link(s) resized (" + String.join(", ", changed)
                                    + "); Edit → Undo takes them back. Solve again to see the new heads.");
        } catch (org.headway.caution.InputException e) {
            applied.setText(NetworkEditor.inWords(e));
        }
    }

    List<List<String>> balanceRows(BalancingResult b) {
        double qMax = b.valves().stream()
                .mapToDouble(v -> Math.abs(v.designFlow()))
                .max()
                .orElse(0);
        List<List<String>> rows = new ArrayList<>();
        for (BalancingResult.BalancedValve v : b.valves()) {
            rows.add(List.of(
                    v.id(),
                    flow(v.designFlow(), qMax),
                    pressure(v.pressureDrop()),
                    v.reached() ? Quantities.formatNumber(v.flowCoefficient()) : "—",
                    Double.isFinite(v.authority()) ? Quantities.formatNumber(v.authority()) : "—",
                    Double.isFinite(v.setting()) ? Quantities.formatNumber(v.setting()) : "—",
                    v.reached() ? "set" : "short by " + of(v.extraHeadNeeded(), QuantityKind.HEAD)));
        }
        return rows;
    }

    private void showBalance(DesignStudies.Balance r) {
        BalancingResult b = r.result();
        String source = b.source().isPresent() && Double.isFinite(b.sourceHeadNeeded())
                ? "; " + b.source().get() + " (" + b.sourceKind() + ") must hold "
                        + of(b.sourceHeadNeeded(), QuantityKind.HEAD)
                : "";
        List<javafx.scene.Node> out = new ArrayList<>();
        out.add(line(
                "design-balance-summary",
                (b.converged() ? "Balanced" : "NOT converged") + ": "
                        + b.valves().size() + " valve(s), index valve "
                        + b.indexValve().orElse("none") + source
                        + (Double.isFinite(b.largestFlowError())
                                ? "; re-solved with these Kv, flows within "
                                        + Quantities.formatNumber(100 * b.largestFlowError()) + " %"
                                : "")
                        + ". Kv in m³/h at 1 bar."));
        out.add(table(
                "design-balance-table",
                List.of("Valve", "Design flow", "Drop", "Kv", "Authority", "Setting", "State"),
                balanceRows(b)));
        out.addAll(cautionLines(b.cautions()));
        balanceOut.getChildren().setAll(out);
    }

    /** The fire-flow answer in words. */
    String fireText(FireFlowResult f) {
        if (!f.found()) {
            return "No fire flow found at " + f.node() + " (see the cautions).";
        }
        double scale = Math.max(Math.abs(f.fireFlow()), 1e-3);
        return "Fire flow at " + f.node() + ": " + flow(f.fireFlow(), scale) + " with every junction at or above "
                + pressure(f.residualPressure()) + ". Limiting junction " + f.limitingNode() + " at "
                + pressure(f.residualAtLimit()) + ". Before the draw the lowest pressure is "
                + pressure(f.baseMinimumPressure()) + " at " + f.baseLimitingNode() + "; " + f.solves() + " solves.";
    }

    private void showFire(DesignStudies.Fire r) {
        List<javafx.scene.Node> out = new ArrayList<>();
        Label l = line("design-fire-summary", fireText(r.result()));
        l.getStyleClass().add("total-value");
        out.add(l);
        out.addAll(cautionLines(r.result().cautions()));
        fireOut.getChildren().setAll(out);
    }

    List<List<String>> spreadRows(org.headway.network.design.NetworkUncertaintyResult u) {
        List<List<String>> rows = new ArrayList<>();
        for (var n : u.nodes()) {
            if (n.fixed()) {
                continue;
            }
            rows.add(List.of(
                    n.id(),
                    of(n.pressure().nominal(), QuantityKind.PRESSURE),
                    of(n.pressure().low(), QuantityKind.PRESSURE),
                    of(n.pressure().high(), QuantityKind.PRESSURE),
                    n.lowAt(),
                    n.highAt()));
        }
        return rows;
    }

    private void showSpread(DesignStudies.Spread z) {
        var u = z.result();
        List<javafx.scene.Node> out = new ArrayList<>();
        out.add(line(
                "design-uncertainty-summary",
                "Demand ×" + Quantities.formatNumber(u.demandLow()) + " to ×" + Quantities.formatNumber(u.demandHigh())
                        + ", " + u.solves() + " solves. How: " + u.reason()
                        + (u.failedSolves() == 0 ? "" : ", " + u.failedSolves() + " FAILED") + "."));
        out.add(table(
                "design-uncertainty-table",
                List.of("Junction", "Nominal", "Low", "High", "Low at", "High at"),
                spreadRows(u)));
        if (!u.pumps().isEmpty()) {
            List<List<String>> pumps = new ArrayList<>();
            for (var p : u.pumps()) {
                pumps.add(List.of(
                        p.id(),
                        of(p.flow().nominal(), QuantityKind.VOLUMETRIC_FLOW),
                        of(p.flow().low(), QuantityKind.VOLUMETRIC_FLOW),
                        of(p.flow().high(), QuantityKind.VOLUMETRIC_FLOW),
                        of(p.head().low(), QuantityKind.HEAD) + " – "
                                + of(p.head().high(), QuantityKind.HEAD)));
            }
            out.add(table(
                    "design-uncertainty-pumps",
                    List.of("Pump", "Flow nominal", "Flow low", "Flow high", "Head range"),
                    pumps));
        }
        out.addAll(cautionLines(u.cautions()));
        spreadOut.getChildren().setAll(out);
    }

    DesignStudies.Spread spreadResult() {
        return spread;
    }
}
