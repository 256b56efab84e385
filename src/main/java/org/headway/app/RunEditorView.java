package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.function.Supplier;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.MapChangeListener;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.headway.caution.InputException;
import org.headway.fluid.Fluids;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.headway.project.Project;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/** The pipe-run editor: run fields, the segment table, and the selected segment's fields. */
final class RunEditorView extends VBox {

    /** An id with the words shown for it. */
    record Choice(String id, String label) {
        @Override
        public String toString() {
            return label;
        }
    }

    private final ProjectEditor editor;
    private final TableView<ProjectEditor.SegmentSummary> table = new TableView<>();
    private final List<Runnable> refreshers = new ArrayList<>();
    private final GridPane segmentForm = form();
    private final Label segmentHeading = new Label();
    private boolean refreshing;
    /** Segment whose field has focus: a commit on focus loss goes to it even if the selection moved. */
    private int editingIndex = -1;
    /** Commit of the field being edited, run before the selection changes. */
    private Runnable pendingCommit;

    RunEditorView(ProjectEditor editor) {
        this.editor = editor;
        getStyleClass().add("editor");
        setSpacing(10);
        setPadding(new Insets(12));

        Label runHeading = heading("Pipe run");
        GridPane run = form();
        int row = 0;
        textField(
                run,
                row++,
                "Title",
                "title",
                "run-title",
                () -> editor.project().title(),
                editor::setTitle);
        choiceField(
                run,
                row++,
                "Fluid",
                "fluid",
                "fluid",
                fluidChoices(),
                () -> editor.project().fluid().name(),
                editor::setFluid);
        textField(
                run,
                row++,
                "Temperature",
                "temperature",
                "temperature",
                () -> editor.project().fluid().temperature(),
                editor::setTemperature);
        textField(
                run,
                row++,
                "Design flow",
                "flow",
                "flow",
                () -> editor.project().flow(),
                editor::setFlow);
        choiceField(
                run,
                row++,
                "Friction method",
                "friction",
                "friction",
                frictionChoices(),
                () -> editor.project().friction(),
                editor::setFriction);

        GridPane endsGrid = form();
        int r = 0;
        for (ProjectEditor.RunField f : ProjectEditor.RunField.values()) {
            textField(
                    endsGrid,
                    r++,
                    runFieldLabel(f),
                    f.key(),
                    "run-" + f.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'),
                    () -> editor.runField(f),
                    t -> editor.setRunField(f, t));
        }
        textField(
                endsGrid,
                r++,
                "Pump curve",
                "pump.points",
                "pump-points",
                editor::pumpPointsText,
                editor::setPumpPoints);
        textField(
                endsGrid,
                r++,
                "Pump feeds segment",
                "pump.position",
                "pump-position",
                editor::pumpPositionText,
                editor::setPumpPosition);
        Label endsHint =
                new Label("Levels are water surfaces above the pipe end next to them; pressures are gauge. Blank: an"
                        + " open end at pipe level, or the usual limit. Pump curve: flow: head pairs separated by"
                        + " semicolons, at least three, e.g. \"0 L/s: 58 m; 10 L/s: 50 m; 18 L/s: 28 m\"; blank for"
                        + " no pump.");
        endsHint.setWrapText(true);
        endsHint.getStyleClass().add("hint");
        endsGrid.add(endsHint, 0, r, 3, 1);
        javafx.scene.control.TitledPane ends =
                new javafx.scene.control.TitledPane("Ends, pump and design limits", endsGrid);
        ends.setId("ends-and-limits");
        ends.setExpanded(false);
        ends.setAnimated(false);

        GridPane sheetGrid = form();
        String[][] titleBlock = {
            {"job", "Job number"},
            {"revision", "Revision"},
            {"preparedBy", "Prepared by"},
            {"checkedBy", "Checked by"},
            {"date", "Date"},
            {"notes", "Notes"}
        };
        int tb = 0;
        for (String[] f : titleBlock) {
            textField(
                    sheetGrid,
                    tb++,
                    f[1],
                    "reference." + f[0],
                    "title-block-" + f[0],
                    () -> editor.titleBlockField(f[0]),
                    text -> editor.setTitleBlockField(f[0], text));
        }
        Label sheetHint = new Label("Printed in the head-loss sheet's reference block with the title above (the"
                + " project file's \"reference\" entries); blank fields print a line to sign.");
        sheetHint.setWrapText(true);
        sheetHint.getStyleClass().add("hint");
        sheetGrid.add(sheetHint, 0, tb, 3, 1);
        javafx.scene.control.TitledPane sheet = new javafx.scene.control.TitledPane("Sheet title block", sheetGrid);
        sheet.setId("sheet-title-block");
        sheet.setExpanded(false);
        sheet.setAnimated(false);

        Label segmentsHeading = heading("Segments, in flow order");
        buildTable();
        HBox buttons = new HBox(6);
        Button add = button("Add", "add-segment", "Add a segment after the last one, with the same pipe");
        Button remove = button("Remove", "remove-segment", "Remove the selected segment");
        Button up = button("Move up", "move-up", "Move the selected segment one place upstream");
        Button down = button("Move down", "move-down", "Move the selected segment one place downstream");
        add.setOnAction(e -> {
            editor.addSegment();
            table.getSelectionModel().select(table.getItems().size() - 1);
        });
        remove.setOnAction(e -> {
            int i = selected();
            if (editor.removeSegment(i)) {
                table.getSelectionModel().select(Math.min(i, table.getItems().size() - 1));
            }
        });
        up.setOnAction(e -> table.getSelectionModel().select(editor.moveSegment(selected(), -1)));
        down.setOnAction(e -> table.getSelectionModel().select(editor.moveSegment(selected(), +1)));
        buttons.getChildren().addAll(add, remove, up, down);

        segmentHeading.getStyleClass().add("subheading");
        buildSegmentForm();

        getChildren()
                .addAll(runHeading, run, ends, sheet, segmentsHeading, table, buttons, segmentHeading, segmentForm);

        editor.projectProperty().addListener((o, a, b) -> refresh());
        editor.unitSystemProperty().addListener((o, a, b) -> refresh());
        table.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> {
            if (!refreshing) {
                if (pendingCommit != null) {
                    Runnable c = pendingCommit;
                    pendingCommit = null;
                    c.run();
                }
                refreshFields();
            }
        });
        editor.messages().addListener((MapChangeListener<String, String>) c -> refreshFields());
        refresh();
        table.getSelectionModel().select(0);
    }

    /** Puts the keyboard in the segment table (rather than in the title field) when the window opens. */
    void focusTable() {
        table.requestFocus();
    }

    /** Selects a segment, e.g. from the cautions panel. */
    void select(int index) {
        table.getSelectionModel().select(index);
        table.scrollTo(index);
    }

    private int selected() {
        int i = table.getSelectionModel().getSelectedIndex();
        return Math.max(0, Math.min(i, editor.project().segments().size() - 1));
    }

    private void refresh() {
        refreshing = true;
        int keep = selected();
        table.getItems().setAll(editor.summaries());
        table.getSelectionModel().select(Math.min(keep, table.getItems().size() - 1));
        refreshing = false;
        refreshFields();
    }

    private void refreshFields() {
        refreshing = true;
        try {
            int i = selected();
            segmentHeading.setText("Segment " + (i + 1) + ": "
                    + editor.project().segments().get(i).name());
            refreshers.forEach(Runnable::run);
        } finally {
            refreshing = false;
        }
    }

    private void buildTable() {
        table.setId("segment-table");
        table.setPrefHeight(180);
        table.setMinHeight(120);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().add(column("#", 28, s -> String.valueOf(s.number())));
        table.getColumns().add(editable(column("Name", 112, ProjectEditor.SegmentSummary::name), SegmentField.NAME));
        table.getColumns()
                .add(editable(column("Length", 58, ProjectEditor.SegmentSummary::length), SegmentField.LENGTH));
        table.getColumns().add(column("Material", 130, ProjectEditor.SegmentSummary::material));
        table.getColumns().add(column("Size", 48, ProjectEditor.SegmentSummary::size));
        table.getColumns().add(column("Bore", 72, ProjectEditor.SegmentSummary::bore));
        table.getColumns().add(column("Fittings", 70, ProjectEditor.SegmentSummary::fittings));
        table.getColumns()
                .add(editable(column("Rise", 50, ProjectEditor.SegmentSummary::elevation), SegmentField.ELEVATION));
        table.setPlaceholder(new Label("No segments"));
        table.setEditable(true);
    }

    /**
     * Lets a column be edited in place (double-click, type, Enter). The edit goes through the same
     * check as the field below; a rejected value puts the message beside that field and the cell
     * shows the kept value again.
     */
    private TableColumn<ProjectEditor.SegmentSummary, String> editable(
            TableColumn<ProjectEditor.SegmentSummary, String> column, SegmentField field) {
        column.setCellFactory(javafx.scene.control.cell.TextFieldTableCell.forTableColumn());
        column.setOnEditCommit(e -> {
            int row = e.getTablePosition().getRow();
            editingIndex = -1;
            if (!editor.setSegmentField(row, field, e.getNewValue())) {
                refresh();
            }
            table.getSelectionModel().select(row);
        });
        return column;
    }

    private static TableColumn<ProjectEditor.SegmentSummary, String> column(
            String title, double width, Function<ProjectEditor.SegmentSummary, String> value) {
        TableColumn<ProjectEditor.SegmentSummary, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setSortable(false);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }

    private void buildSegmentForm() {
        int row = 0;
        textField(
                segmentForm, row++, "Name", null, "segment-name", () -> spec().name(), t -> set(SegmentField.NAME, t));
        textField(
                segmentForm,
                row++,
                "Length",
                null,
                "segment-length",
                () -> spec().length(),
                t -> set(SegmentField.LENGTH, t));
        segmentChoice(
                row++,
                "Material",
                SegmentField.MATERIAL,
                "segment-material",
                this::materialChoices,
                s -> s.pipe().map(Project.PipeSpec::material).orElse(""));
        segmentChoice(
                row++,
                "Schedule",
                SegmentField.SCHEDULE,
                "segment-schedule",
                this::scheduleChoices,
                s -> s.pipe().map(Project.PipeSpec::schedule).orElse(""));
        segmentChoice(
                row++,
                "Nominal size",
                SegmentField.SIZE,
                "segment-size",
                this::sizeChoices,
                s -> s.pipe().map(Project.PipeSpec::size).orElse(""));
        TextField bore = textField(
                segmentForm,
                row++,
                "Inner diameter",
                null,
                "segment-bore",
                () -> spec().innerDiameter(),
                t -> set(SegmentField.BORE, t));
        TextField rough = textField(
                segmentForm,
                row++,
                "Roughness ε",
                null,
                "segment-roughness",
                () -> spec().roughness(),
                t -> set(SegmentField.ROUGHNESS, t));
        TextField fittings = textField(
                segmentForm,
                row++,
                "Fittings",
                null,
                "segment-fittings",
                () -> FittingsText.format(spec().fittings()),
                t -> set(SegmentField.FITTINGS, t));
        Button addFitting = new Button("Add fitting from the catalog…");
        addFitting.setId("segment-add-fitting");
        addFitting.setOnAction(e ->
                CatalogPicker.show(addFitting, "Add a fitting", CatalogPicker.fittings(editor.catalog()), f -> {
                    String now = FittingsText.format(spec().fittings());
                    String next = now.isBlank() ? f.id() : now + ", " + f.id();
                    fittings.setText(next);
                    set(SegmentField.FITTINGS, next);
                }));
        segmentForm.add(addFitting, 1, row++);
        textField(
                segmentForm,
                row++,
                "Elevation rise",
                null,
                "segment-elevation",
                () -> spec().elevationChange(),
                t -> set(SegmentField.ELEVATION, t));
        refreshers.add(() -> {
            boolean catalogPipe = spec().pipe().isPresent();
            ProjectEditor.SegmentSummary summary = editor.summaries().get(selected());
            bore.setPromptText(catalogPipe ? "catalog: " + summary.bore() + " (type to override)" : "required");
            rough.setPromptText(catalogPipe ? "catalog: " + summary.roughness() + " (type to override)" : "required");
        });
        Label hint = new Label(
                "Fittings: catalog ids separated by commas, with ×N for a count and K=… to give a"
                        + " coefficient, e.g. \"gate-valve ×2, exit\". A number typed without a unit is read in the units shown.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        segmentForm.add(hint, 0, row, 3, 1);
    }

    private static String runFieldLabel(ProjectEditor.RunField f) {
        return switch (f) {
            case SOURCE_LEVEL -> "Source level";
            case SOURCE_PRESSURE -> "Source pressure";
            case DELIVERY_LEVEL -> "Delivery level";
            case DELIVERY_PRESSURE -> "Delivery pressure";
            case MAXIMUM_VELOCITY -> "Max. velocity";
            case MAXIMUM_FRICTION_LOSS -> "Max. h_f / 100 m";
            case HEAD_BUDGET -> "Head budget";
        };
    }

    private Project.SegmentSpec spec() {
        return editor.project().segments().get(selected());
    }

    private boolean set(SegmentField field, String text) {
        int n = editor.project().segments().size();
        int index = editingIndex >= 0 && editingIndex < n ? editingIndex : selected();
        return editor.setSegmentField(index, field, text);
    }

    private String segmentKey(SegmentField field) {
        return field.key(selected());
    }

    private List<Choice> materialChoices() {
        List<Choice> list = new ArrayList<>();
        for (Material m : editor.catalog().materials()) {
            list.add(new Choice(m.id(), m.name() + "   [" + m.id() + "]"));
        }
        list.add(new Choice("", "— explicit bore and roughness —"));
        return list;
    }

    private List<Choice> scheduleChoices() {
        List<Choice> list = new ArrayList<>();
        spec().pipe().ifPresent(p -> {
            try {
                String table = editor.catalog().material(p.material()).sizeTable();
                for (String s : editor.catalog().schedules(table)) {
                    list.add(new Choice(s, s.isEmpty() ? "(one series)" : s));
                }
            } catch (InputException e) {
                // An unknown material in a hand-edited file: no choices; the results line names the problem.
            }
        });
        return list;
    }

    private List<Choice> sizeChoices() {
        List<Choice> list = new ArrayList<>();
        spec().pipe().ifPresent(p -> {
            try {
                String table = editor.catalog().material(p.material()).sizeTable();
                String schedule = p.schedule().isEmpty() ? null : p.schedule();
                for (PipeSize z : editor.catalog().sizes(table, schedule)) {
                    list.add(new Choice(
                            z.nominal(),
                            z.nominal() + "   (bore "
                                    + Quantities.format(
                                            z.innerDiameter(),
                                            QuantityKind.DIAMETER,
                                            editor.unitSystemProperty().get())
                                    + ")"));
                }
            } catch (InputException e) {
                // As above: the results line names the problem.
            }
        });
        return list;
    }

    private List<Choice> fluidChoices() {
        List<Choice> list = new ArrayList<>();
        for (String id : Fluids.ids()) {
            list.add(new Choice(id, id));
        }
        return list;
    }

    private List<Choice> frictionChoices() {
        List<Choice> list = new ArrayList<>();
        for (FrictionCorrelation f : FrictionMethods.all()) {
            list.add(new Choice(f.id(), f.displayName()));
        }
        return list;
    }

    private void segmentChoice(
            int row,
            String label,
            SegmentField field,
            String id,
            Supplier<List<Choice>> choices,
            Function<Project.SegmentSpec, String> value) {
        ComboBox<Choice> box = new ComboBox<>();
        box.setId(id);
        box.setMaxWidth(Double.MAX_VALUE);
        // Wide enough for the catalog's longer material names at the default window size; the
        // tooltip shows any longer one whole.
        Tooltip whole = new Tooltip();
        box.setTooltip(whole);
        box.valueProperty().addListener((o, a, b) -> whole.setText(b == null ? "" : b.label()));
        Label message = messageLabel(id);
        segmentForm.add(new Label(label), 0, row);
        segmentForm.add(
                withFinder(
                        box,
                        id,
                        label,
                        () -> choices.get().stream()
                                .filter(c -> !c.id().isEmpty())
                                .map(c -> new CatalogPicker.Entry(
                                        c.id(), c.label().replace("   [" + c.id() + "]", "")))
                                .toList(),
                        e -> set(field, e.id())),
                1,
                row);
        segmentForm.add(message, 2, row);
        refreshers.add(() -> {
            List<Choice> list = choices.get();
            String current = value.apply(spec());
            box.getItems().setAll(list);
            box.setDisable(list.isEmpty());
            list.stream()
                    .filter(c -> c.id().equals(current))
                    .findFirst()
                    .ifPresentOrElse(box::setValue, () -> box.setValue(null));
            message.setText(editor.messages().getOrDefault(segmentKey(field), ""));
        });
        box.valueProperty().addListener((o, a, b) -> {
            if (!refreshing && b != null) {
                set(field, b.id());
            }
        });
    }

    private void choiceField(
            GridPane grid,
            int row,
            String label,
            String key,
            String id,
            List<Choice> choices,
            Supplier<String> value,
            Predicate<String> setter) {
        ComboBox<Choice> box = new ComboBox<>(FXCollections.observableArrayList(choices));
        box.setId(id);
        box.setMaxWidth(Double.MAX_VALUE);
        Label message = messageLabel(id);
        grid.add(new Label(label), 0, row);
        if (id.equals("fluid")) {
            grid.add(
                    withFinder(box, id, "Fluid", CatalogPicker::fluids, e -> {
                        if (!refreshing) {
                            setter.test(e.id());
                        }
                    }),
                    1,
                    row);
        } else {
            grid.add(box, 1, row);
        }
        grid.add(message, 2, row);
        ObservableList<Choice> items = box.getItems();
        refreshers.add(() -> {
            String current = value.get();
            Choice match = items.stream()
                    .filter(c -> c.id().equals(current))
                    .findFirst()
                    .orElse(null);
            if (match == null) {
                // A value from a file that the list lacks (e.g. seawater:40) is shown as it is.
                match = new Choice(current, current);
                items.add(match);
            }
            box.setValue(match);
            message.setText(editor.messages().getOrDefault(key, ""));
        });
        // A long name (the auto friction method's) may be cut by the column: the tooltip shows it whole.
        Tooltip whole = new Tooltip();
        box.setTooltip(whole);
        box.valueProperty().addListener((o, a, b) -> {
            whole.setText(b == null ? "" : b.label());
            if (!refreshing && b != null) {
                setter.test(b.id());
            }
        });
    }

    /** A control with a "Find…" button beside it that opens the searchable catalog list. */
    private static javafx.scene.layout.HBox withFinder(
            javafx.scene.control.Control control,
            String id,
            String what,
            Supplier<List<CatalogPicker.Entry>> entries,
            java.util.function.Consumer<CatalogPicker.Entry> picked) {
        Button find = new Button("Find…");
        find.setId(id + "-find");
        find.setMinWidth(Region.USE_PREF_SIZE);
        find.setTooltip(new Tooltip("Search the list by id or name"));
        find.setOnAction(e -> CatalogPicker.show(find, what, entries.get(), picked));
        control.setMaxWidth(Double.MAX_VALUE);
        javafx.scene.layout.HBox.setHgrow(control, Priority.ALWAYS);
        javafx.scene.layout.HBox line = new javafx.scene.layout.HBox(4, control, find);
        line.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        return line;
    }

    /**
     * A text field that commits on Enter or when it loses focus. A rejected value stays in the field
     * for the engineer to correct, marked, with the message beside it; the project keeps the last
     * good value.
     */
    private TextField textField(
            GridPane grid,
            int row,
            String label,
            String fixedKey,
            String id,
            Supplier<String> value,
            Predicate<String> setter) {
        TextField field = new TextField();
        field.setId(id);
        Label message = messageLabel(id);
        grid.add(new Label(label), 0, row);
        grid.add(field, 1, row);
        grid.add(message, 2, row);
        Supplier<String> key = () -> fixedKey != null ? fixedKey : segmentKeyFor(id);
        Runnable commit = () -> {
            if (refreshing) {
                return;
            }
            String typed = field.getText();
            if (typed.equals(value.get()) && !editor.messages().containsKey(key.get())) {
                return;
            }
            setter.test(typed);
        };
        field.setOnAction(e -> {
            if (fixedKey == null) {
                editingIndex = selected();
            }
            commit.run();
        });
        field.focusedProperty().addListener((o, was, now) -> {
            if (now) {
                editingIndex = fixedKey == null ? selected() : -1;
                pendingCommit = commit;
            } else {
                pendingCommit = null;
                commit.run();
                editingIndex = -1;
            }
        });
        refreshers.add(() -> {
            String msg = editor.messages().get(key.get());
            message.setText(msg == null ? "" : msg);
            field.getStyleClass().remove("rejected");
            if (msg == null) {
                field.setText(value.get());
            } else {
                field.getStyleClass().add("rejected");
            }
        });
        return field;
    }

    private String segmentKeyFor(String id) {
        return switch (id) {
            case "segment-name" -> segmentKey(SegmentField.NAME);
            case "segment-length" -> segmentKey(SegmentField.LENGTH);
            case "segment-bore" -> segmentKey(SegmentField.BORE);
            case "segment-roughness" -> segmentKey(SegmentField.ROUGHNESS);
            case "segment-fittings" -> segmentKey(SegmentField.FITTINGS);
            case "segment-elevation" -> segmentKey(SegmentField.ELEVATION);
            default -> id;
        };
    }

    private static Label messageLabel(String id) {
        Label message = new Label();
        message.setId(id + "-message");
        message.getStyleClass().add("field-message");
        message.setWrapText(true);
        message.setMaxWidth(260);
        return message;
    }

    private static GridPane form() {
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(6);
        ColumnConstraints labels = new ColumnConstraints(122);
        // The fields take the room first so that long catalog names show whole at the default
        // window size; a message beside a field wraps in what is left.
        ColumnConstraints fields = new ColumnConstraints(180, 390, 440);
        fields.setHgrow(Priority.ALWAYS);
        ColumnConstraints messages = new ColumnConstraints(0, 60, 260);
        messages.setHgrow(Priority.SOMETIMES);
        grid.getColumnConstraints().addAll(labels, fields, messages);
        return grid;
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("heading");
        return l;
    }

    private static Button button(String text, String id, String tip) {
        Button b = new Button(text);
        b.setId(id);
        b.setTooltip(new Tooltip(tip));
        return b;
    }
}
