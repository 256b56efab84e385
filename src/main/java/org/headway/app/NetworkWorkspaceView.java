package org.headway.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Function;
import java.util.stream.IntStream;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.MapChangeListener;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.control.cell.TextFieldTableCell;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.headway.caution.InputException;
import org.headway.network.NetworkResult;
import org.headway.project.LineList;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;
import org.headway.units.UnitSystem;

/**
 * The network workspace: the node table and the link table side by side (each cell as typed, the
 * solved values in shaded columns next to the ids), the selected row's fields for its kind below
 * the tables, and the schematic beside those fields. The solve runs in a background task with
 * progress and cancel.
 */
final class NetworkWorkspaceView extends BorderPane {

    /** Node columns shown in the table (typed), with their headings. */
    static final List<String[]> NODE_TABLE = List.of(
            new String[] {"id", "Id"},
            new String[] {"name", "Name"},
            new String[] {"elevation", "Elevation"},
            new String[] {"demand", "Demand"},
            new String[] {"fixed_head", "Fixed head"},
            new String[] {"x", "x"},
            new String[] {"y", "y"});

    /** Link columns shown in the table (typed), with their headings. */
    static final List<String[]> LINK_TABLE = List.of(
            new String[] {"id", "Id"},
            new String[] {"from", "From"},
            new String[] {"to", "To"},
            new String[] {"kind", "Kind"},
            new String[] {"length", "Length"},
            new String[] {"diameter", "Diameter"},
            new String[] {"roughness", "Roughness ε"},
            new String[] {"material", "Material"},
            new String[] {"size", "Size"},
            new String[] {"loss_coefficient", "K"},
            new String[] {"kv", "Kv"},
            new String[] {"cv", "Cv"},
            new String[] {"setting", "Setting"},
            new String[] {"pump_curve", "Pump curve"});

    private final NetworkEditor editor;
    private final Dialogs dialogs;
    private final java.util.function.Supplier<Path> startFolder;
    private final TableView<Integer> nodes = new TableView<>();
    private final TableView<Integer> links = new TableView<>();
    private final Label nodeMessage = message("node-message");
    private final Label linkMessage = message("link-message");
    private final Label problem = new Label();
    private final Label status = new Label("Not solved yet");
    private final ProgressBar progress = new ProgressBar();
    private final Button cancel = new Button("Cancel solve");

    Button cancelButton() {
        return cancel;
    }

    Label statusLabel() {
        return status;
    }

    private final VBox form = new VBox(6);
    private final javafx.scene.control.TabPane sideTabs = new javafx.scene.control.TabPane();
    private final DesignPane design;

    DesignPane design() {
        return design;
    }

    /** Shows the design studies' tab (or the selected element's). */
    void showDesign(boolean on) {
        sideTabs.getSelectionModel().select(on ? 1 : 0);
    }

    private final GradeLinePane grade;

    GradeLinePane grade() {
        return grade;
    }

    /** Shows the grade-line tab. */
    void showGrade() {
        sideTabs.getSelectionModel().select(2);
    }

    private final SchematicView schematic;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "headway-network-solve");
        t.setDaemon(true);
        return t;
    });
    private Task<NetworkSolution> solving;

    /** The solve work (tests put a slow one in to see the progress and the cancel). */
    interface SolveWork {
        NetworkSolution solve(
                NetworkEditor editor,
                NetworkEditor.Draft draft,
                org.headway.pipe.Catalog catalog,
                Path baseFolder,
                NetworkSolution.Progress progress);
    }

    private SolveWork work = NetworkSolution::solve;

    void useSolveWork(SolveWork w) {
        work = w;
    }

    private boolean syncing;

    NetworkWorkspaceView(NetworkEditor editor, Dialogs dialogs, java.util.function.Supplier<Path> startFolder) {
        this.editor = editor;
        this.dialogs = dialogs;
        this.startFolder = startFolder;
        setId("network-workspace");
        getStyleClass().add("editor");
        schematic = new SchematicView(editor);

        buildTable(nodes, NetworkEditor.Part.NODE, "node-table", NODE_TABLE);
        buildTable(links, NetworkEditor.Part.LINK, "link-table", LINK_TABLE);
        VBox nodeBox = tableBox("Nodes", nodes, NetworkEditor.Part.NODE, "node", nodeMessage);
        VBox linkBox = tableBox("Links (flow positive from → to)", links, NetworkEditor.Part.LINK, "link", linkMessage);
        SplitPane tables = new SplitPane(nodeBox, linkBox);
        tables.setDividerPositions(0.48);

        form.setPadding(new Insets(8, 12, 8, 12));
        form.setId("element-form");
        ScrollPane formScroll = new ScrollPane(form);
        formScroll.setFitToWidth(true);
        design = new DesignPane(editor, dialogs, startFolder);
        ScrollPane designScroll = new ScrollPane(design);
        designScroll.setFitToWidth(true);
        javafx.scene.control.Tab selectedTab = new javafx.scene.control.Tab("Selected element", formScroll);
        selectedTab.setId("tab-selected");
        javafx.scene.control.Tab designTab = new javafx.scene.control.Tab("Design studies", designScroll);
        designTab.setId("tab-design");
        grade = new GradeLinePane(editor, dialogs, startFolder);
        ScrollPane gradeScroll = new ScrollPane(grade);
        gradeScroll.setFitToWidth(true);
        gradeScroll.setFitToHeight(true);
        javafx.scene.control.Tab gradeTab = new javafx.scene.control.Tab("Grade line", gradeScroll);
        gradeTab.setId("tab-grade");
        ScrollPane sheetScroll = new ScrollPane(titleBlockForm());
        sheetScroll.setFitToWidth(true);
        javafx.scene.control.Tab sheetTab = new javafx.scene.control.Tab("Sheet title block", sheetScroll);
        sheetTab.setId("tab-title-block");
        sideTabs.getTabs().addAll(selectedTab, designTab, gradeTab, sheetTab);
        sideTabs.setTabClosingPolicy(javafx.scene.control.TabPane.TabClosingPolicy.UNAVAILABLE);
        sideTabs.setId("workspace-side-tabs");
        sideTabs.setMinWidth(300);
        SplitPane lower = new SplitPane(sideTabs, schematic);
        lower.setDividerPositions(0.34);

        SplitPane body = new SplitPane(tables, lower);
        body.setOrientation(Orientation.VERTICAL);
        body.setDividerPositions(0.5);
        // The studies' tables want more room than one element's fields.
        sideTabs.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            boolean wide = b == designTab || b == gradeTab;
            lower.setDividerPositions(wide ? 0.58 : 0.34);
            body.setDividerPositions(wide ? 0.34 : 0.5);
        });

        problem.setId("network-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.setMaxWidth(Double.MAX_VALUE);
        problem.managedProperty().bind(problem.visibleProperty());
        problem.setVisible(false);

        setTop(toolbar());
        setCenter(body);
        status.setMaxWidth(Double.MAX_VALUE);
        HBox statusLine = new HBox(status);
        statusLine.setPadding(new Insets(3, 10, 3, 10));
        setBottom(new VBox(statusLine, problem));

        editor.draftProperty().addListener((o, a, b) -> refresh());
        editor.solutionProperty().addListener((o, a, b) -> {
            if (b == null && a != null && !status.textProperty().isBound()) {
                // Another network loaded or a new one begun: the last solve's summary no longer applies.
                status.setText("Not solved yet.");
                status.setTooltip(null);
            }
            refresh();
        });
        editor.unitSystemProperty().addListener((o, a, b) -> refresh());
        editor.selectionProperty().addListener((o, a, b) -> selectionChanged(a, b));
        editor.messages().addListener((MapChangeListener<String, String>) c -> showMessages());
        editor.problemProperty().addListener((o, a, b) -> showProblem(b));
        refresh();
        buildForm();
    }

    private static Label message(String id) {
        Label l = new Label();
        l.setId(id);
        l.getStyleClass().add("field-message");
        l.setWrapText(true);
        return l;
    }

    private HBox toolbar() {
        TextField fluid = runField("network-fluid", () -> editor.draft().fluid(), "fluid", 90);
        TextField temperature =
                runField("network-temperature", () -> editor.draft().temperature(), "temperature", 90);
        ComboBox<String> friction = new ComboBox<>();
        friction.setId("network-friction");
        friction.getItems().addAll(org.headway.friction.FrictionMethods.ids());
        friction.setValue(editor.draft().friction());
        friction.setOnAction(e -> {
            if (friction.getValue() != null
                    && !friction.getValue().equals(editor.draft().friction())) {
                editor.setRunField("friction", friction.getValue());
            }
        });
        editor.draftProperty().addListener((o, a, b) -> {
            if (!b.friction().equals(friction.getValue())) {
                friction.setValue(b.friction());
            }
        });
        Button importList = new Button("Import line list…");
        importList.setId("line-list-import");
        importList.setOnAction(e -> importLineList());
        Button exportList = new Button("Export line list…");
        exportList.setId("line-list-export");
        exportList.setOnAction(e -> exportLineList());
        Button solve = new Button("Solve network");
        solve.setId("network-solve");
        solve.getStyleClass().add("primary");
        solve.setTooltip(new Tooltip("Solve the line list as it stands (Ctrl+Enter)"));
        solve.setOnAction(e -> solve());
        cancel.setId("network-cancel");
        cancel.setVisible(false);
        cancel.setOnAction(e -> {
            if (solving != null) {
                solving.cancel(true);
            }
        });
        progress.setVisible(false);
        progress.setPrefWidth(120);
        status.setId("network-status");
        status.getStyleClass().add("status");
        Button drawing = new Button("Export drawing…");
        drawing.setId("schematic-export");
        drawing.setOnAction(e -> exportDrawing());
        Button fit = new Button("Fit drawing");
        fit.setId("schematic-fit");
        fit.setOnAction(e -> schematic.fit());
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox bar = new HBox(
                8,
                new Label("Fluid"),
                fluid,
                new Label("at"),
                temperature,
                new Label("Friction"),
                friction,
                importList,
                exportList,
                solve,
                progress,
                cancel,
                grow,
                fit,
                drawing);
        for (javafx.scene.Node n : bar.getChildren()) {
            if (n instanceof Region r && !(n instanceof TextField) && n != grow && n != progress) {
                r.setMinWidth(Region.USE_PREF_SIZE);
            }
        }
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(6, 10, 6, 10));
        bar.getStyleClass().add("chart-bar");
        return bar;
    }

    private TextField runField(String id, java.util.function.Supplier<String> value, String field, double width) {
        TextField t = new TextField(value.get());
        t.setId(id);
        t.setPrefWidth(width);
        Runnable commit = () -> {
            if (!t.getText().strip().equals(value.get())) {
                editor.setRunField(field, t.getText());
            }
        };
        t.setOnAction(e -> commit.run());
        t.focusedProperty().addListener((o, a, b) -> {
            if (!b) {
                commit.run();
            }
        });
        editor.draftProperty().addListener((o, a, b) -> {
            if (!t.isFocused()) {
                t.setText(value.get());
            }
        });
        return t;
    }

    private VBox tableBox(String title, TableView<Integer> table, NetworkEditor.Part part, String word, Label msg) {
        Label heading = new Label(title);
        heading.getStyleClass().add("heading");
        Button add = new Button("Add " + word);
        add.setId("add-" + word);
        add.setOnAction(e -> editor.add(part));
        Button duplicate = new Button("Duplicate");
        duplicate.setId("duplicate-" + word);
        duplicate.setOnAction(
                e -> editor.duplicate(part, table.getSelectionModel().getSelectedIndex()));
        Button remove = new Button("Remove");
        remove.setId("remove-" + word);
        remove.setOnAction(e -> editor.remove(part, table.getSelectionModel().getSelectedIndex()));
        HBox buttons = new HBox(6, add, duplicate, remove);
        VBox box = new VBox(6, heading, table, buttons, msg);
        VBox.setVgrow(table, Priority.ALWAYS);
        box.setPadding(new Insets(8, 10, 6, 10));
        return box;
    }

    private void buildTable(TableView<Integer> table, NetworkEditor.Part part, String id, List<String[]> columns) {
        table.setId(id);
        table.setEditable(true);
        table.setMinHeight(140);
        table.setPlaceholder(new Label("No rows"));
        TableColumn<Integer, String> number = new TableColumn<>("#");
        number.setPrefWidth(32);
        number.setSortable(false);
        number.setCellValueFactory(d -> new ReadOnlyStringWrapper(String.valueOf(d.getValue() + 1)));
        table.getColumns().add(number);
        for (String[] c : columns) {
            table.getColumns().add(typed(part, c[0], c[1]));
            if (c[0].equals(part == NetworkEditor.Part.NODE ? "id" : "kind")) {
                TableColumn<Integer, String> solved = new TableColumn<>("solved");
                solved.setId(id + "-solved");
                if (part == NetworkEditor.Part.NODE) {
                    solved.getColumns().add(result("Head", r -> nodeText(r, "head")));
                    solved.getColumns().add(result("Pressure", r -> nodeText(r, "pressure")));
                } else {
                    solved.getColumns().add(result("Flow", r -> linkText(r, "flow")));
                    solved.getColumns().add(result("Velocity", r -> linkText(r, "velocity")));
                    solved.getColumns().add(result("Head loss", r -> linkText(r, "headLoss")));
                }
                table.getColumns().add(solved);
            }
        }
        table.setRowFactory(t -> {
            TableRow<Integer> row = new TableRow<>();
            return row;
        });
        table.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> {
            if (!syncing && b.intValue() >= 0) {
                editor.selectionProperty().set(new NetworkEditor.Selection(part, b.intValue()));
            }
        });
    }

    private TableColumn<Integer, String> typed(NetworkEditor.Part part, String column, String heading) {
        TableColumn<Integer, String> c = new TableColumn<>(heading);
        c.setId((part == NetworkEditor.Part.NODE ? "node-" : "link-") + column);
        c.setSortable(false);
        c.setPrefWidth(
                switch (column) {
                    case "id", "from", "to", "kv", "cv", "loss_coefficient", "size" -> 52;
                    case "x", "y" -> 56;
                    case "kind" -> 64;
                    case "pump_curve", "material" -> 130;
                    case "name" -> 76;
                    case "fixed_head" -> 82;
                    case "roughness" -> 78;
                    default -> 70;
                });
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(editor.cell(part, d.getValue(), column)));
        c.setCellFactory(TextFieldTableCell.forTableColumn());
        c.setOnEditCommit(e -> {
            int row = e.getRowValue();
            if (!editor.setCell(part, row, column, e.getNewValue())) {
                e.getTableView().refresh();
            }
        });
        return c;
    }

    private TableColumn<Integer, String> result(String heading, Function<Integer, String> value) {
        TableColumn<Integer, String> c = new TableColumn<>(heading);
        c.setId("solved-" + heading.toLowerCase(java.util.Locale.ROOT).replace(' ', '-'));
        c.setSortable(false);
        c.setEditable(false);
        c.setPrefWidth(
                heading.equals("Head") ? 70 : heading.equals("Pressure") ? 84 : heading.equals("Velocity") ? 98 : 88);
        c.getStyleClass().add("solved-column");
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }

    // ---- results as text ----

    private UnitSystem units() {
        return editor.unitSystemProperty().get();
    }

    /** A node's result in the chosen units, display-rounded; blank before a solve. */
    String nodeText(int row, String what) {
        NetworkSolution s = editor.solutionProperty().get();
        if (s == null) {
            return "";
        }
        Optional<NetworkResult.NodeResult> r = s.node(editor.cell(NetworkEditor.Part.NODE, row, "id"));
        if (r.isEmpty()) {
            return "";
        }
        double scale = headScale(s);
        return switch (what) {
            case "head" ->
                Double.isFinite(r.get().head())
                        ? Quantities.format(r.get().head(), QuantityKind.HEAD, units())
                        : "no head";
            default ->
                Double.isFinite(r.get().pressure())
                        ? Quantities.format(
                                Quantities.withoutNoise(r.get().pressure(), 1000 * 9.81 * scale),
                                QuantityKind.PRESSURE,
                                units())
                        : "—";
        };
    }

    /** A link's result in the chosen units, display-rounded; blank before a solve. */
    String linkText(int row, String what) {
        NetworkSolution s = editor.solutionProperty().get();
        if (s == null) {
            return "";
        }
        Optional<NetworkResult.LinkResult> r = s.link(editor.cell(NetworkEditor.Part.LINK, row, "id"));
        if (r.isEmpty()) {
            return "";
        }
        NetworkResult.LinkResult l = r.get();
        if (l.status().equals("closed") || l.status().equals("shut")) {
            return l.status();
        }
        double qMax = 0;
        double vMax = 0;
        for (NetworkResult.LinkResult x : s.result().links()) {
            qMax = Math.max(qMax, Math.abs(x.flow()));
            if (Double.isFinite(x.velocity())) {
                vMax = Math.max(vMax, Math.abs(x.velocity()));
            }
        }
        return switch (what) {
            case "flow" ->
                Quantities.format(Quantities.withoutNoise(l.flow(), qMax), QuantityKind.VOLUMETRIC_FLOW, units());
            case "velocity" ->
                Double.isFinite(l.velocity())
                        ? Quantities.format(Quantities.withoutNoise(l.velocity(), vMax), QuantityKind.VELOCITY, units())
                        : "";
            default ->
                Quantities.format(Quantities.withoutNoise(l.headLoss(), headScale(s)), QuantityKind.HEAD, units());
        };
    }

    private static double headScale(NetworkSolution s) {
        double scale = 0;
        for (NetworkResult.NodeResult n : s.result().nodes()) {
            if (Double.isFinite(n.head())) {
                scale = Math.max(scale, Math.max(Math.abs(n.head()), Math.abs(n.elevation())));
            }
        }
        return scale;
    }

    // ---- keeping the views in step ----

    private void refresh() {
        syncing = true;
        try {
            fill(nodes, editor.draft().nodes().size());
            fill(links, editor.draft().links().size());
            NetworkEditor.Selection s = editor.selectionProperty().get();
            selectInTables(s);
        } finally {
            syncing = false;
        }
        buildForm();
        showProblem(editor.problemProperty().get());
    }

    private static void fill(TableView<Integer> table, int size) {
        if (table.getItems().size() != size) {
            table.getItems().setAll(IntStream.range(0, size).boxed().toList());
        }
        table.refresh();
    }

    private void selectInTables(NetworkEditor.Selection s) {
        TableView<Integer> mine = s.part() == NetworkEditor.Part.NODE ? nodes : links;
        TableView<Integer> other = s.part() == NetworkEditor.Part.NODE ? links : nodes;
        other.getSelectionModel().clearSelection();
        if (s.row() >= 0 && s.row() < mine.getItems().size()) {
            if (mine.getSelectionModel().getSelectedIndex() != s.row()) {
                mine.getSelectionModel().clearAndSelect(s.row());
                mine.scrollTo(s.row());
            }
        } else {
            mine.getSelectionModel().clearSelection();
        }
    }

    private void selectionChanged(NetworkEditor.Selection before, NetworkEditor.Selection after) {
        syncing = true;
        try {
            selectInTables(after);
        } finally {
            syncing = false;
        }
        buildForm();
    }

    private final Label titleBlockMessage = message("network-title-block-message");

    /** The network sheet's title block (the project file's {@code reference} entries). */
    private GridPane titleBlockForm() {
        GridPane grid = new GridPane();
        grid.setId("network-title-block");
        grid.setHgap(8);
        grid.setVgap(4);
        grid.setPadding(new Insets(8, 12, 8, 12));
        ColumnConstraints labels = new ColumnConstraints();
        labels.setMinWidth(100);
        ColumnConstraints fields = new ColumnConstraints();
        fields.setHgrow(Priority.ALWAYS);
        grid.getColumnConstraints().addAll(labels, fields);
        String[][] keys = {
            {"job", "Job number"},
            {"revision", "Revision"},
            {"preparedBy", "Prepared by"},
            {"checkedBy", "Checked by"},
            {"date", "Date"},
            {"notes", "Notes"}
        };
        int r = 0;
        for (String[] k : keys) {
            TextField t = new TextField(editor.titleBlockField(k[0]));
            t.setId("network-title-block-" + k[0]);
            Runnable commit = () -> {
                if (!t.getText().strip().equals(editor.titleBlockField(k[0]))) {
                    editor.setTitleBlockField(k[0], t.getText());
                }
            };
            t.setOnAction(e -> commit.run());
            t.focusedProperty().addListener((o, a, b) -> {
                if (!b) {
                    commit.run();
                }
            });
            editor.draftProperty().addListener((o, a, b) -> {
                if (!t.isFocused()) {
                    t.setText(editor.titleBlockField(k[0]));
                }
            });
            grid.add(new Label(k[1]), 0, r);
            grid.add(t, 1, r++);
        }
        grid.add(titleBlockMessage, 0, r++, 2, 1);
        Label hint = new Label("Printed in the network sheet's reference block with the title above (the project"
                + " file's \"reference\" entries); blank fields print a line to sign. Saved with the project.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        grid.add(hint, 0, r, 2, 1);
        return grid;
    }

    private void showMessages() {
        List<String> n = new ArrayList<>();
        List<String> l = new ArrayList<>();
        List<String> t = new ArrayList<>();
        editor.messages().forEach((k, v) -> (k.startsWith("nodes[") ? n : k.startsWith("reference.") ? t : l).add(v));
        titleBlockMessage.setText(String.join("\n", t));
        nodeMessage.setText(String.join("\n", n));
        linkMessage.setText(String.join("\n", l));
        for (javafx.scene.Node field : form.lookupAll(".text-field")) {
            if (field.getId() != null && field.getId().startsWith("form-")) {
                String column = field.getId().substring(5);
                NetworkEditor.Selection s = editor.selectionProperty().get();
                String m = editor.messages().get(NetworkEditor.key(s.part(), s.row(), column));
                field.getStyleClass().remove("rejected");
                if (m != null) {
                    field.getStyleClass().add("rejected");
                }
                form.lookupAll("#form-" + column + "-message").forEach(x -> ((Label) x).setText(m == null ? "" : m));
            }
        }
    }

    private void showProblem(String text) {
        problem.setText(text == null || text.isEmpty() ? "" : "Line list: " + text);
        problem.setVisible(text != null && !text.isEmpty());
    }

    // ---- the selected element's fields ----

    /** What the form was built for (part, row, kind) and its fields, so that an edit updates it in place. */
    private String formShape = "";

    private final Map<String, TextField> formFields = new java.util.HashMap<>();
    private Label formSolved;

    private void buildForm() {
        NetworkEditor.Selection s = editor.selectionProperty().get();
        int row = s.row();
        boolean exists = row >= 0 && row < editor.draft().rows(s.part()).size();
        String shape = exists
                ? s.part() + "/" + row + "/" + editor.cell(s.part(), row, "kind") + "/"
                        + editor.cell(s.part(), row, "id") + "/"
                        + (s.part() == NetworkEditor.Part.NODE ? editor.nodeColumns() : "")
                : "";
        if (exists && shape.equals(formShape)) {
            // The same element: refresh the values in place, so that Tab to the next field keeps the keyboard there.
            formFields.forEach((column, t) -> {
                if (!t.isFocused() && !t.getStyleClass().contains("rejected")) {
                    t.setText(editor.cell(s.part(), row, column));
                }
            });
            if (formSolved != null) {
                formSolved.setText(solvedSummary(s.part(), row));
            }
            showMessages();
            return;
        }
        formShape = shape;
        formFields.clear();
        form.getChildren().clear();
        if (row < 0 || row >= editor.draft().rows(s.part()).size()) {
            Label hint = new Label("Select a node or link in a table or on the drawing to see all its fields here.");
            hint.setWrapText(true);
            hint.getStyleClass().add("hint");
            form.getChildren().add(hint);
            return;
        }
        NetworkEditor.Part part = s.part();
        Map<String, String> cells = editor.draft().rows(part).get(row);
        String kind = cells.getOrDefault("kind", "pipe");
        Label heading = new Label((part == NetworkEditor.Part.NODE ? "Node " : "Link ")
                + cells.getOrDefault("id", "") + (part == NetworkEditor.Part.LINK ? " — " + kind : "")
                + "  (row " + (row + 1) + ")");
        heading.setId("form-heading");
        heading.getStyleClass().add("subheading");
        form.getChildren().add(heading);
        Label solved = new Label(solvedSummary(part, row));
        solved.setId("selection-results");
        solved.setWrapText(true);
        solved.getStyleClass().add("total-value");
        solved.managedProperty().bind(solved.textProperty().isNotEmpty());
        form.getChildren().add(solved);
        formSolved = solved;
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(3);
        ColumnConstraints labels = new ColumnConstraints();
        labels.setMinWidth(110);
        ColumnConstraints fields = new ColumnConstraints();
        fields.setHgrow(Priority.ALWAYS);
        grid.getColumnConstraints().addAll(labels, fields);
        List<String> columns = new ArrayList<>();
        if (part == NetworkEditor.Part.NODE) {
            columns.addAll(editor.nodeColumns());
        } else {
            columns.addAll(NetworkEditor.LINK_COMMON);
            columns.addAll(NetworkEditor.KIND_FIELDS.getOrDefault(kind, List.of()));
        }
        int r = 0;
        for (String column : columns) {
            Label label = new Label(FIELD_WORDS.getOrDefault(column, column));
            grid.add(label, 0, r);
            if (column.equals("kind")) {
                ComboBox<String> kinds = new ComboBox<>();
                kinds.setId("form-kind");
                kinds.getItems().addAll(LineList.LINK_KINDS);
                kinds.setValue(kind);
                kinds.setOnAction(e -> {
                    if (kinds.getValue() != null && !kinds.getValue().equals(kind)) {
                        editor.setCell(part, row, "kind", kinds.getValue());
                    }
                });
                grid.add(kinds, 1, r++);
                continue;
            }
            TextField t = new TextField(cells.getOrDefault(column, ""));
            t.setId("form-" + column);
            formFields.put(column, t);
            t.setPromptText(PROMPTS.getOrDefault(column, ""));
            Runnable commit = () -> {
                if (!t.getText().strip().equals(editor.cell(part, row, column))) {
                    editor.setCell(part, row, column, t.getText());
                }
            };
            t.setOnAction(e -> commit.run());
            t.focusedProperty().addListener((o, a, b) -> {
                if (!b && t.getScene() != null) {
                    commit.run();
                }
            });
            if (column.equals("material") || column.equals("size")) {
                Button find = new Button("Find…");
                find.setId("form-" + column + "-find");
                find.setMinWidth(Region.USE_PREF_SIZE);
                find.setOnAction(e -> {
                    List<CatalogPicker.Entry> entries;
                    try {
                        entries = column.equals("material")
                                ? CatalogPicker.materials(editor.catalog())
                                : CatalogPicker.sizes(
                                        editor.catalog(),
                                        editor.cell(part, row, "material"),
                                        editor.cell(part, row, "schedule"),
                                        units());
                    } catch (InputException x) {
                        entries = List.of();
                    }
                    CatalogPicker.show(
                            find,
                            column.equals("material")
                                    ? "Material"
                                    : entries.isEmpty()
                                            ? "Sizes (choose a catalog material with a size table first)"
                                            : "Nominal size",
                            entries,
                            picked -> {
                                t.setText(picked.id());
                                editor.setCell(part, row, column, picked.id());
                            });
                });
                HBox.setHgrow(t, Priority.ALWAYS);
                HBox line = new HBox(4, t, find);
                line.setAlignment(Pos.CENTER_LEFT);
                grid.add(line, 1, r++);
            } else {
                grid.add(t, 1, r++);
            }
            Label m = new Label();
            m.setId("form-" + column + "-message");
            m.getStyleClass().add("field-message");
            m.setWrapText(true);
            m.managedProperty().bind(m.textProperty().isNotEmpty());
            grid.add(m, 1, r++);
        }
        form.getChildren().add(grid);
        Label hint = new Label("Cells are as in the line-list CSV: a number with its unit (150 mm, 2.4 L/s, 96.5 m),"
                + " blank for not given. Results are estimates for review against local codes by a qualified"
                + " engineer.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        form.getChildren().add(hint);
        showMessages();
    }

    private String solvedSummary(NetworkEditor.Part part, int row) {
        if (editor.solutionProperty().get() == null) {
            return "";
        }
        String stale = editor.staleProperty().get() ? " (before the latest edits)" : "";
        if (part == NetworkEditor.Part.NODE) {
            String head = nodeText(row, "head");
            return head.isEmpty() ? "" : "Head " + head + ", gauge pressure " + nodeText(row, "pressure") + stale;
        }
        String flow = linkText(row, "flow");
        if (flow.isEmpty()) {
            return "";
        }
        if (flow.equals("closed") || flow.equals("shut")) {
            return (flow.equals("closed") ? "Closed" : "Shut by the solve (it would pass reverse flow)") + ": no flow"
                    + stale;
        }
        String v = linkText(row, "velocity");
        String status = editor.solutionProperty()
                .get()
                .link(editor.cell(part, row, "id"))
                .map(NetworkResult.LinkResult::status)
                .filter(x -> !x.equals("open"))
                .map(x -> " (" + x + ")")
                .orElse("");
        return "Flow " + flow + (v.isEmpty() ? "" : ", velocity " + v) + ", head loss " + linkText(row, "headLoss")
                + status + stale;
    }

    static final Map<String, String> FIELD_WORDS = Map.ofEntries(
            Map.entry("id", "Id"),
            Map.entry("name", "Name"),
            Map.entry("elevation", "Elevation"),
            Map.entry("demand", "Demand"),
            Map.entry("fixed_head", "Fixed head"),
            Map.entry("fixed_pressure", "Fixed pressure"),
            Map.entry("reference", "Reference (yes/no)"),
            Map.entry("x", "x"),
            Map.entry("y", "y"),
            Map.entry("from", "From node"),
            Map.entry("to", "To node"),
            Map.entry("kind", "Kind"),
            Map.entry("design_flow", "Design flow"),
            Map.entry("length", "Length"),
            Map.entry("diameter", "Inner diameter"),
            Map.entry("roughness", "Roughness ε"),
            Map.entry("material", "Material"),
            Map.entry("size", "Nominal size"),
            Map.entry("schedule", "Schedule"),
            Map.entry("loss_coefficient", "Loss coefficient K"),
            Map.entry("hw_c", "Hazen–Williams C"),
            Map.entry("pump_curve", "Pump curve"),
            Map.entry("speed_ratio", "Speed ratio"),
            Map.entry("npsh_required", "NPSH required"),
            Map.entry("rated_pressure_drop", "Rated Δp"),
            Map.entry("rated_flow", "Rated flow"),
            Map.entry("exponent", "Exponent"),
            Map.entry("kv", "Kv"),
            Map.entry("cv", "Cv"),
            Map.entry("setting", "Setting"));

    static final Map<String, String> PROMPTS = Map.of(
            "pump_curve", "0 L/s:40 m; 5 L/s:36 m; 10 L/s:25 m",
            "setting", "a flow, or a gauge pressure",
            "reference", "yes for a closed loop's reference",
            "fixed_head", "a level, e.g. 96.5 m");

    // ---- actions ----

    /** Starts a solve in the background; a running one is cancelled first. */
    void solve() {
        if (solving != null && solving.isRunning()) {
            solving.cancel(true);
        }
        NetworkEditor.Draft draft = editor.draft();
        var catalog = editor.catalog();
        Path base = editor.baseFolder();
        Task<NetworkSolution> task = new Task<>() {
            @Override
            protected NetworkSolution call() {
                return work.solve(editor, draft, catalog, base, (step, steps, what) -> {
                    updateProgress(step, steps);
                    updateMessage(what + "…");
                });
            }
        };
        solving = task;
        progress.progressProperty().bind(task.progressProperty());
        status.textProperty().bind(task.messageProperty());
        progress.setVisible(true);
        cancel.setVisible(true);
        task.setOnSucceeded(e -> {
            if (task != solving) {
                return;
            }
            NetworkSolution s = task.getValue();
            finish(summary(s));
            editor.show(s);
        });
        task.setOnCancelled(e -> {
            if (task == solving) {
                finish("Solve cancelled; the results shown (if any) are from before");
            }
        });
        task.setOnFailed(e -> {
            if (task != solving) {
                return;
            }
            Throwable t = task.getException();
            finish("Not solved");
            problem.setText("Cannot solve: "
                    + (t instanceof InputException ie
                            ? NetworkEditor.inWords(ie)
                            : "internal error (please report): " + t));
            problem.setVisible(true);
        });
        worker.execute(task);
    }

    private String summary(NetworkSolution s) {
        NetworkResult r = s.result();
        String how = r.converged() ? "Solved" : "NOT converged (best iterate shown)";
        List<org.headway.caution.Caution> shown = s.solved().cautions().stream()
                .filter(c -> c.severity() != org.headway.caution.Severity.NOTE)
                .toList();
        long cautions = shown.size();
        status.setTooltip(
                shown.isEmpty()
                        ? null
                        : new Tooltip(String.join(
                                "\n",
                                shown.stream()
                                        .limit(20)
                                        .map(c -> c.severity().name().toLowerCase(java.util.Locale.ROOT) + ": "
                                                + Quantities.inSystem(c.message(), units()))
                                        .toList())));
        return how + ": " + r.nodes().size() + " nodes, " + r.links().size() + " links, " + r.iterations()
                + " iterations, " + String.format(java.util.Locale.ROOT, "%.2f s", s.nanos() * 1e-9)
                + (cautions == 1
                        ? "; 1 caution (see its tooltip)"
                        : cautions > 1 ? "; " + cautions + " cautions (see the tooltip)" : "")
                + (s.indexLinks().isEmpty()
                        ? ""
                        : "; index circuit to "
                                + s.solved().circuit().index().get().terminal());
    }

    private void finish(String text) {
        progress.progressProperty().unbind();
        status.textProperty().unbind();
        progress.setVisible(false);
        cancel.setVisible(false);
        status.setText(text);
        showProblem(editor.problemProperty().get());
    }

    /** Puts the keyboard in the node table (not the fluid field) when the workspace shows. */
    void focusTable() {
        nodes.requestFocus();
    }

    /** The solve last started (tests). */
    Task<NetworkSolution> solving() {
        return solving;
    }

    SchematicView schematic() {
        return schematic;
    }

    private static Path linksBeside(Path nodes) {
        String name = nodes.getFileName().toString();
        String links =
                name.contains("nodes") ? name.replace("nodes", "links") : name.replaceFirst("(\\.csv)?$", "-links.csv");
        return nodes.resolveSibling(links);
    }

    void exportLineList() {
        Optional<Path> target = dialogs.chooseExportTarget(
                startFolder.get(), "network-nodes.csv", "line list (nodes; the links CSV is written beside it)");
        if (target.isEmpty()) {
            return;
        }
        Path links = linksBeside(target.get());
        try {
            editor.exportLineList(target.get(), links);
            status.setText("Line list written: " + target.get().getFileName() + " and " + links.getFileName());
        } catch (InputException e) {
            dialogs.showError("Could not write the line list", NetworkEditor.inWords(e));
        } catch (java.io.UncheckedIOException e) {
            dialogs.showError("Could not write the line list", e.getMessage());
        }
    }

    void importLineList() {
        Optional<Path> nodesFile = dialogs.chooseDataToImport(startFolder.get());
        if (nodesFile.isEmpty()) {
            return;
        }
        Path links = linksBeside(nodesFile.get());
        if (!java.nio.file.Files.isRegularFile(links)) {
            Optional<Path> chosen =
                    dialogs.chooseDataToImport(nodesFile.get().toAbsolutePath().getParent());
            if (chosen.isEmpty()) {
                return;
            }
            links = chosen.get();
        }
        try {
            editor.importLineList(nodesFile.get(), links);
            status.setText("Line list read: " + nodesFile.get().getFileName() + " and " + links.getFileName());
        } catch (InputException e) {
            dialogs.showError("Could not read the line list", NetworkEditor.inWords(e));
        }
    }

    void exportDrawing() {
        Optional<Path> target = dialogs.chooseExportTarget(
                startFolder.get(), "network-schematic.png", "network drawing (PNG, or SVG by the .svg extension)");
        if (target.isEmpty()) {
            return;
        }
        try {
            SchematicView.export(editor, target.get());
            status.setText("Drawing written: " + target.get().getFileName());
        } catch (InputException e) {
            dialogs.showError("Could not write the drawing", NetworkEditor.inWords(e));
        } catch (java.io.UncheckedIOException e) {
            dialogs.showError("Could not write the drawing", e.getMessage());
        }
    }
}
