package org.headway.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.collections.ListChangeListener;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.headway.caution.InputException;
import org.headway.project.ProjectResolver;
import org.headway.report.HeadLossSheet;
import org.headway.units.UnitSystem;

/** Assembles the window: menus and shortcuts, the editor, results and charts, cautions, status. */
public final class MainWindow {

    /** Tab titles, also used by the screenshot test. */
    static final List<String> TABS = List.of(
            "Results", "Grade lines", "System curve", "Friction chart", "Rig data", "Rig data fitting", "π groups");

    private static final KeyCombination UNDO = KeyCombination.keyCombination("Shortcut+Z");
    private static final KeyCombination REDO = KeyCombination.keyCombination("Shortcut+Y");
    private static final KeyCombination REDO_ALT = KeyCombination.keyCombination("Shortcut+Shift+Z");

    private final ProjectEditor editor;
    private final ResultsModel results;
    private final Dialogs dialogs;
    private final BorderPane root = new BorderPane();
    private final TabPane tabs = new TabPane();
    private final RunEditorView editorView;
    private final Lazy<ChartView> grades;
    private final Lazy<ChartView> systemView;
    private final Lazy<ChartView> frictionView;
    private final FittingModel fitting;
    private final PiGroupsModel piGroups;
    private final Lazy<FittingView> fittingView;
    private final RigDataModel rigData;
    private final Lazy<RigDataView> rigView;
    private final Label status = new Label();
    private final ProgressBar progress = new ProgressBar();
    private final Button cancel = new Button("Cancel export");
    private Task<List<Path>> export;
    private final NetworkEditor network;
    /** Built the first time the network workspace is wanted: it is not on screen at start. */
    private NetworkWorkspaceView networkView;

    private final SplitPane runWorkspace;
    private final javafx.beans.property.BooleanProperty networkShown =
            new javafx.beans.property.SimpleBooleanProperty(false);
    private static final KeyCombination SOLVE = KeyCombination.keyCombination("Shortcut+Enter");

    public MainWindow(ProjectEditor editor, ResultsModel results, Dialogs dialogs) {
        this.editor = editor;
        this.results = results;
        this.dialogs = dialogs;
        editorView = new RunEditorView(editor);
        ScrollPane editorScroll = new ScrollPane(editorView);
        editorScroll.setFitToWidth(true);
        editorScroll.setMinWidth(380);

        // The chart views (and the JFreeChart viewer classes behind them) are built when their tab is
        // first shown: none is on screen at start (decision 0050). Each reads its chart's current value then.
        grades = new Lazy<>(() -> new ChartView(
                "grade-chart", results.gradeChartProperty(), false, dialogs, editor::startFolder, "grade-lines"));
        systemView = new Lazy<>(() -> new ChartView(
                "system-chart", results.systemChartProperty(), false, dialogs, editor::startFolder, "system-curve"));
        frictionView = new Lazy<>(() -> new ChartView(
                "friction-chart",
                results.frictionChartProperty(),
                true,
                dialogs,
                editor::startFolder,
                "friction-chart"));
        fitting = new FittingModel(editor, dialogs);
        // The fitting and rig-data views too are built when their tab is first shown; what they put on the
        // friction chart is wired to their models now, so the chart is the same either way (decision 0056).
        FittingView.feedFrictionChart(fitting, results);
        fittingView = new Lazy<>(() -> new FittingView(fitting, results, dialogs, editor::startFolder));
        rigData = new RigDataModel(dialogs, editor.unitSystemProperty());
        RigDataView.feedFrictionChart(rigData, results);
        rigView = new Lazy<>(() -> new RigDataView(rigData, results, editor::startFolder));
        piGroups = new PiGroupsModel();
        Lazy<javafx.scene.Node> piScroll = new Lazy<>(() -> {
            ScrollPane scroll = new ScrollPane(new PiGroupsView(piGroups));
            scroll.setFitToWidth(true);
            return scroll;
        });
        tabs.getTabs()
                .addAll(
                        tab(TABS.get(0), new ScrollPane(new ResultsView(results))),
                        lazyTab(TABS.get(1), grades),
                        lazyTab(TABS.get(2), systemView),
                        lazyTab(TABS.get(3), frictionView),
                        lazyTab(TABS.get(4), rigView),
                        lazyTab(TABS.get(5), fittingView),
                        lazyTab(TABS.get(6), piScroll));
        ((ScrollPane) tabs.getTabs().get(0).getContent()).setFitToWidth(true);
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        tabs.setId("views");

        SplitPane split = new SplitPane(editorScroll, tabs);
        split.setOrientation(Orientation.HORIZONTAL);
        split.setDividerPositions(0.44);
        runWorkspace = split;
        network = new NetworkEditor(editor.catalog(), editor.unitSystemProperty());

        CautionsView cautions = new CautionsView(results, i -> {
            editorView.select(i);
            tabs.getSelectionModel().select(0);
        });
        root.setTop(menus());
        root.setCenter(split);
        root.setBottom(new VBox(cautions, statusBar()));
        root.getStyleClass().add("headway");
        networkShown.addListener((o, a, b) -> {
            root.setCenter(b ? networkView() : runWorkspace);
            if (b) {
                javafx.application.Platform.runLater(networkView()::focusTable);
            }
            // The cautions panel speaks of the series run; the network's cautions are in its status line.
            cautions.setVisible(!b);
            cautions.setManaged(!b);
        });
        editor.onNetworkProject(this::openNetwork);
    }

    /** Shows a network project in the network workspace, after asking about unsaved network edits. */
    private boolean openNetwork(org.headway.project.Project p, Path file) {
        if (!confirmDiscardNetwork()) {
            return false;
        }
        try {
            network.load(p, file);
        } catch (InputException e) {
            dialogs.showError("Could not open " + file.getFileName(), NetworkEditor.inWords(e));
            return false;
        }
        networkShown.set(true);
        return true;
    }

    private boolean confirmDiscardNetwork() {
        if (!network.dirtyProperty().get()) {
            return true;
        }
        return switch (dialogs.askUnsavedChanges(networkName())) {
            case SAVE -> saveNetwork();
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    private String networkName() {
        Path f = network.fileProperty().get();
        return f == null ? network.draft().title() : f.getFileName().toString();
    }

    /** Asks where and saves the network project there (atomic). */
    boolean saveNetwork() {
        Path f = network.fileProperty().get();
        Optional<Path> target = dialogs.chooseProjectSaveTarget(
                networkStartFolder(),
                f == null
                        ? ProjectEditor.slug(network.draft().title()) + ".json"
                        : f.getFileName().toString());
        if (target.isEmpty()) {
            return false;
        }
        try {
            network.save(target.get());
            status.setText("Saved " + target.get().getFileName());
            return true;
        } catch (InputException e) {
            dialogs.showError("Could not save " + target.get().getFileName(), NetworkEditor.inWords(e));
        } catch (java.io.UncheckedIOException e) {
            dialogs.showError("Could not save " + target.get().getFileName(), e.getMessage());
        }
        return false;
    }

    private Path networkStartFolder() {
        return network.fileProperty().get() != null ? network.baseFolder() : editor.startFolder();
    }

    /** Shows the network workspace (true) or the series-run workspace (false). */
    void showNetwork(boolean shown) {
        networkShown.set(shown);
    }

    NetworkEditor network() {
        return network;
    }

    NetworkWorkspaceView networkView() {
        if (networkView == null) {
            networkView = new NetworkWorkspaceView(network, dialogs, this::networkStartFolder);
        }
        return networkView;
    }

    /** The scene, styled. */
    public Scene scene(double width, double height) {
        Scene scene = new Scene(root, width, height);
        scene.getStylesheets().add(MainWindow.class.getResource("headway.css").toExternalForm());
        return scene;
    }

    /** Puts the window on a stage: title bound, close asks about unsaved changes. */
    public void attach(Stage stage, double width, double height) {
        stage.setScene(scene(width, height));
        stage.titleProperty()
                .bind(Bindings.createStringBinding(
                        () -> networkShown.get()
                                ? (network.dirtyProperty().get() ? "• " : "") + networkName() + " — network — Headway"
                                : editor.windowTitleProperty().get(),
                        networkShown,
                        network.dirtyProperty(),
                        network.fileProperty(),
                        network.draftProperty(),
                        editor.windowTitleProperty()));
        stage.setOnShown(e -> editorView.focusTable());
        stage.setMinWidth(1000);
        stage.setMinHeight(640);
        // Undo and redo act on the project even while a text field has the keyboard; a text field would
        // otherwise take the keys for its own typing history and the menu accelerators would never fire.
        stage.getScene().addEventFilter(javafx.scene.input.KeyEvent.KEY_PRESSED, e -> {
            if (UNDO.match(e)) {
                e.consume();
                undo();
            } else if (REDO.match(e) || REDO_ALT.match(e)) {
                e.consume();
                redo();
            } else if (SOLVE.match(e) && networkShown.get()) {
                e.consume();
                networkView().solve();
            }
        });
        stage.setOnCloseRequest(e -> {
            if (!editor.confirmDiscard() || !confirmDiscardNetwork()) {
                e.consume();
            }
        });
    }

    /**
     * Keeps the autosave going: a copy {@value Autosave#DEBOUNCE_MS} ms after the last edit and
     * every minute while there are unsaved changes; the copy goes when the window closes cleanly.
     */
    public void keepAutosave(Stage stage, Autosave autosave) {
        javafx.animation.PauseTransition afterEdit =
                new javafx.animation.PauseTransition(javafx.util.Duration.millis(Autosave.DEBOUNCE_MS));
        afterEdit.setOnFinished(e -> autosave.saveNow());
        editor.projectProperty().addListener((o, a, b) -> afterEdit.playFromStart());
        javafx.animation.Timeline everyMinute = new javafx.animation.Timeline(new javafx.animation.KeyFrame(
                javafx.util.Duration.millis(Autosave.INTERVAL_MS), e -> autosave.saveNow()));
        everyMinute.setCycleCount(javafx.animation.Animation.INDEFINITE);
        everyMinute.play();
        autosave.problemProperty().addListener((o, a, b) -> {
            if (!b.isEmpty()) {
                status.setText(b);
            }
        });
        stage.addEventHandler(javafx.stage.WindowEvent.WINDOW_HIDDEN, e -> {
            everyMinute.stop();
            afterEdit.stop();
            autosave.discard();
        });
    }

    TabPane tabs() {
        return tabs;
    }

    ChartView frictionView() {
        return frictionView.get();
    }

    FittingModel fitting() {
        return fitting;
    }

    FittingView fittingView() {
        return fittingView.get();
    }

    RigDataModel rigData() {
        return rigData;
    }

    RigDataView rigView() {
        return rigView.get();
    }

    PiGroupsModel piGroups() {
        return piGroups;
    }

    /** A view built on first use. */
    private static final class Lazy<T extends javafx.scene.Node> implements java.util.function.Supplier<T> {
        private final java.util.function.Supplier<T> make;
        private T made;

        Lazy(java.util.function.Supplier<T> make) {
            this.make = make;
        }

        @Override
        public T get() {
            if (made == null) {
                made = make.get();
            }
            return made;
        }
    }

    /** A tab whose content is built the first time the tab is selected (or the content is asked for). */
    private static Tab lazyTab(String title, Lazy<? extends javafx.scene.Node> content) {
        Tab t = tab(title, null);
        if (t.isSelected()) {
            t.setContent(content.get());
        }
        t.selectedProperty().addListener((o, a, b) -> {
            if (b && t.getContent() == null) {
                t.setContent(content.get());
            }
        });
        return t;
    }

    private static Tab tab(String title, javafx.scene.Node content) {
        Tab t = new Tab(title, content);
        t.setId("tab-" + title.toLowerCase(java.util.Locale.ROOT).replace(' ', '-'));
        return t;
    }

    private MenuBar menus() {
        Menu file = new Menu("Project");
        MenuItem newItem = item("New", "Shortcut+N", editor::newProject);
        MenuItem open = item("Open…", "Shortcut+O", editor::open);
        Menu recent = new Menu("Open recent");
        Runnable fillRecent = () -> {
            recent.getItems().clear();
            for (Path p : editor.recentFiles().entries()) {
                MenuItem m = new MenuItem(p.getFileName() + "   —   " + p.getParent());
                m.setMnemonicParsing(false);
                m.setOnAction(e -> editor.openRecent(p));
                recent.getItems().add(m);
            }
            recent.setDisable(recent.getItems().isEmpty());
        };
        editor.recentFiles().entries().addListener((ListChangeListener<Path>) c -> fillRecent.run());
        fillRecent.run();
        MenuItem save = item("Save", "Shortcut+S", editor::save);
        MenuItem saveAs = item("Save as…", "Shortcut+Shift+S", editor::saveAs);
        MenuItem openRig = item("Open rig data…", "Shortcut+R", () -> {
            tabs.getSelectionModel().select(TABS.indexOf("Rig data"));
            rigData.chooseRigFile(editor.startFolder()).ifPresent(f -> rigView().analyseInBackground(f));
        });
        MenuItem exportSheet = item("Export head-loss sheet…", "Shortcut+E", this::exportSheet);
        MenuItem importData = item("Import measurements (CSV)…", "Shortcut+I", () -> {
            tabs.getSelectionModel().select(TABS.indexOf("Rig data fitting"));
            fitting.chooseImportFile().ifPresent(f -> fittingView().importInBackground(f));
        });
        MenuItem quit = item("Close window", "Shortcut+W", () -> {
            if (editor.confirmDiscard() && confirmDiscardNetwork() && root.getScene() != null) {
                ((Stage) root.getScene().getWindow()).close();
            }
        });
        file.getItems()
                .addAll(
                        newItem,
                        open,
                        recent,
                        new SeparatorMenuItem(),
                        save,
                        saveAs,
                        new SeparatorMenuItem(),
                        openRig,
                        importData,
                        exportSheet,
                        new SeparatorMenuItem(),
                        quit);

        Menu edit = new Menu("Edit");
        MenuItem undo = item("Undo", "Shortcut+Z", this::undo);
        MenuItem redo = item("Redo", "Shortcut+Y", this::redo);
        undo.disableProperty()
                .bind(Bindings.when(networkShown)
                        .then(network.canUndoProperty().not())
                        .otherwise(editor.canUndoProperty().not()));
        redo.disableProperty()
                .bind(Bindings.when(networkShown)
                        .then(network.canRedoProperty().not())
                        .otherwise(editor.canRedoProperty().not()));
        edit.getItems().addAll(undo, redo);

        Menu workspace = new Menu("Workspace");
        ToggleGroup spaces = new ToggleGroup();
        RadioMenuItem runSpace = new RadioMenuItem("Series run");
        RadioMenuItem netSpace = new RadioMenuItem("Network");
        runSpace.setId("workspace-run");
        netSpace.setId("workspace-network");
        runSpace.setToggleGroup(spaces);
        netSpace.setToggleGroup(spaces);
        runSpace.setSelected(true);
        runSpace.setAccelerator(KeyCombination.keyCombination("Shortcut+1"));
        netSpace.setAccelerator(KeyCombination.keyCombination("Shortcut+2"));
        runSpace.setOnAction(e -> networkShown.set(false));
        netSpace.setOnAction(e -> networkShown.set(true));
        networkShown.addListener((o, a, b) -> (b ? netSpace : runSpace).setSelected(true));
        MenuItem newNetwork = new MenuItem("New network");
        newNetwork.setOnAction(e -> {
            if (confirmDiscardNetwork()) {
                network.newNetwork();
                networkShown.set(true);
            }
        });
        MenuItem saveNetwork = new MenuItem("Save network project as…");
        saveNetwork.setId("save-network");
        saveNetwork.setOnAction(e -> saveNetwork());
        MenuItem importList = new MenuItem("Import line list (nodes and links CSV)…");
        importList.setOnAction(e -> {
            networkShown.set(true);
            networkView().importLineList();
        });
        MenuItem exportList = new MenuItem("Export line list…");
        exportList.setOnAction(e -> networkView().exportLineList());
        MenuItem solveNetwork = new MenuItem("Solve network");
        solveNetwork.setAccelerator(SOLVE);
        solveNetwork.setOnAction(e -> {
            networkShown.set(true);
            networkView().solve();
        });
        workspace
                .getItems()
                .addAll(
                        runSpace,
                        netSpace,
                        new SeparatorMenuItem(),
                        newNetwork,
                        importList,
                        exportList,
                        saveNetwork,
                        solveNetwork);

        Menu view = new Menu("Units");
        ToggleGroup units = new ToggleGroup();
        RadioMenuItem si = new RadioMenuItem("SI (m, mm, L/s, kPa)");
        RadioMenuItem us = new RadioMenuItem("US customary (ft, in, gpm, psi)");
        RadioMenuItem process = new RadioMenuItem("SI process (m, mm, m³/h, bar)");
        si.setToggleGroup(units);
        us.setToggleGroup(units);
        process.setToggleGroup(units);
        java.util.function.Function<UnitSystem, RadioMenuItem> itemOf =
                system -> system == UnitSystem.US_CUSTOMARY ? us : system == UnitSystem.SI_PROCESS ? process : si;
        itemOf.apply(editor.unitSystemProperty().get()).setSelected(true);
        si.setOnAction(e -> editor.unitSystemProperty().set(UnitSystem.SI));
        us.setOnAction(e -> editor.unitSystemProperty().set(UnitSystem.US_CUSTOMARY));
        process.setOnAction(e -> editor.unitSystemProperty().set(UnitSystem.SI_PROCESS));
        editor.unitSystemProperty().addListener((o, a, b) -> itemOf.apply(b).setSelected(true));
        view.getItems().addAll(si, process, us);

        MenuItem designStudies = item("Design studies", "Shortcut+D", () -> {
            networkShown.set(true);
            networkView().showDesign(true);
        });
        designStudies.setId("design-studies");
        workspace.getItems().add(workspace.getItems().indexOf(solveNetwork) + 1, designStudies);

        Menu help = new Menu("Help");
        MenuItem keys = item("Keyboard shortcuts", "F1", this::showShortcuts);
        keys.setId("help-shortcuts");
        MenuItem methods = new MenuItem("Methods and their sources");
        methods.setId("help-methods");
        methods.setOnAction(e -> dialogs.showText("Methods and their sources", HelpContent.methodsText()));
        Menu pages = new Menu("Reference pages");
        pages.setId("help-pages");
        for (String page : HelpContent.PAGES) {
            MenuItem m = new MenuItem(page.replace(".md", "").replace('-', ' '));
            m.setMnemonicParsing(false);
            m.setOnAction(e -> dialogs.showText(
                    "Reference: " + page,
                    HelpContent.page(page)
                            .orElse("This build does not hold the page " + page
                                    + "; it is in the source tree under src/site/docs/.")));
            pages.getItems().add(m);
        }
        MenuItem about = new MenuItem("About Headway");
        about.setId("help-about");
        about.setOnAction(e -> dialogs.showText("About Headway", HelpContent.aboutText(HeadwayApp.version())));
        help.getItems().addAll(keys, methods, pages, new SeparatorMenuItem(), about);

        MenuBar bar = new MenuBar(file, edit, workspace, view, help);
        bar.setId("menus");
        menuBar = bar;
        return bar;
    }

    private MenuBar menuBar;

    /** The window's shortcuts, read from its menus (so the list cannot drift from them), plus the keys the window takes itself. */
    List<HelpContent.Shortcut> shortcuts() {
        List<HelpContent.Shortcut> out = new java.util.ArrayList<>();
        for (Menu m : menuBar.getMenus()) {
            collect(m, m.getText(), out);
        }
        out.add(new HelpContent.Shortcut("Edit › Redo (also)", REDO_ALT.getDisplayText()));
        return out;
    }

    private static void collect(Menu menu, String path, List<HelpContent.Shortcut> out) {
        for (MenuItem i : menu.getItems()) {
            if (i instanceof Menu sub) {
                collect(sub, path + " › " + sub.getText(), out);
            } else if (i.getAccelerator() != null) {
                String keys = i.getAccelerator().getDisplayText();
                if (i.getAccelerator() instanceof javafx.scene.input.KeyCodeCombination k
                        && k.getCode() == javafx.scene.input.KeyCode.ENTER) {
                    // The platform writes Enter as an arrow glyph; a word reads better in a list.
                    keys = keys.substring(0, keys.lastIndexOf('+') + 1) + "Enter";
                }
                out.add(new HelpContent.Shortcut(path + " › " + i.getText(), keys));
            }
        }
    }

    private void showShortcuts() {
        dialogs.showText("Keyboard shortcuts", HelpContent.shortcutsText(shortcuts()));
    }

    private void undo() {
        if (networkShown.get()) {
            network.undo();
        } else {
            editor.undo();
        }
    }

    private void redo() {
        if (networkShown.get()) {
            network.redo();
        } else {
            editor.redo();
        }
    }

    private static MenuItem item(String text, String accelerator, Runnable action) {
        MenuItem m = new MenuItem(text);
        m.setAccelerator(KeyCombination.keyCombination(accelerator));
        m.setOnAction(e -> action.run());
        return m;
    }

    private static MenuItem item(String text, String accelerator, java.util.function.BooleanSupplier action) {
        return item(text, accelerator, (Runnable) action::getAsBoolean);
    }

    private HBox statusBar() {
        status.setId("status");
        status.getStyleClass().add("status");
        progress.setVisible(false);
        progress.setPrefWidth(160);
        cancel.setVisible(false);
        cancel.setId("cancel-export");
        cancel.setOnAction(e -> {
            if (export != null) {
                export.cancel(false);
            }
        });
        Label units = new Label();
        units.textProperty()
                .bind(Bindings.createStringBinding(
                        () -> editor.unitSystemProperty().get() == UnitSystem.SI ? "Units: SI" : "Units: US customary",
                        editor.unitSystemProperty()));
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox bar = new HBox(10, status, grow, progress, cancel, units);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 10, 4, 10));
        bar.getStyleClass().add("status-bar");
        editor.fileProperty().addListener((o, a, b) -> status.setText(b == null ? "" : b.toString()));
        return bar;
    }

    /** Exports the head-loss sheet (PDF, workbook, CSV) in a background task with progress and cancel. */
    void exportSheet() {
        if (export != null && export.isRunning()) {
            return;
        }
        var project = editor.project();
        var catalog = editor.catalog();
        var folder = editor.baseFolder();
        var units = editor.unitSystemProperty().get();
        Optional<Path> target = dialogs.chooseExportTarget(
                editor.startFolder(),
                ProjectEditor.slug(editor.displayName()) + "-sheet.pdf",
                "head-loss sheet (PDF, with .xlsx and .csv beside it)");
        if (target.isEmpty()) {
            return;
        }
        Task<List<Path>> task = new Task<>() {
            @Override
            protected List<Path> call() {
                updateMessage("Solving the run…");
                HeadLossSheet sheet =
                        HeadLossSheet.of(ProjectResolver.resolve(project, catalog, folder), HeadwayApp.version());
                return SheetExport.write(
                        sheet,
                        target.get(),
                        units,
                        (done, total, what) -> {
                            updateProgress(done, total);
                            updateMessage("Export: " + what + "…");
                        },
                        this::isCancelled);
            }
        };
        export = task;
        progress.progressProperty().bind(task.progressProperty());
        status.textProperty().bind(task.messageProperty());
        progress.setVisible(true);
        cancel.setVisible(true);
        task.setOnSucceeded(e -> finishExport("Exported "
                + String.join(
                        ", ",
                        task.getValue().stream()
                                .map(p -> p.getFileName().toString())
                                .toList())
                + " to " + target.get().toAbsolutePath().getParent()));
        task.setOnCancelled(e -> finishExport("Export cancelled; no files kept"));
        task.setOnFailed(e -> {
            Throwable t = task.getException();
            finishExport("Export failed");
            String message = t instanceof InputException ie
                    ? (ie.where().isEmpty() ? ie.problem() : ie.where() + ": " + ie.problem())
                    : String.valueOf(t.getMessage());
            dialogs.showError("Could not export the head-loss sheet", message);
        });
        Thread thread = new Thread(task, "headway-export");
        thread.setDaemon(true);
        thread.start();
    }

    private void finishExport(String message) {
        progress.progressProperty().unbind();
        status.textProperty().unbind();
        progress.setVisible(false);
        cancel.setVisible(false);
        status.setText(message);
    }
}
