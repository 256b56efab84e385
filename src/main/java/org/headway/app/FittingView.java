package org.headway.app;

import java.nio.file.Path;
import java.util.function.Function;
import java.util.function.Supplier;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.headway.fitting.FitComparison;

/**
 * The fitting view: import, column choice, forms, the fits side by side, the residual plot of the
 * chosen fit, save and use in the pipe run. Fits run in a background task with progress and cancel.
 */
final class FittingView extends BorderPane {

    private final FittingModel model;
    private final ProgressBar progress = new ProgressBar(0);
    private final Button fit = new Button("Fit the ticked forms");
    private final Button cancel = new Button("Cancel");
    private final Label progressText = new Label();
    private Task<FitComparison> running;
    private Task<DataTable> importing;

    FittingView(FittingModel model, ResultsModel results, Dialogs dialogs, Supplier<Path> folder) {
        this.model = model;
        setId("fitting");
        getStyleClass().add("fitting");

        Button importCsv = new Button("Import CSV…");
        importCsv.setId("fit-import");
        importCsv.setOnAction(e -> model.chooseImportFile().ifPresent(this::importInBackground));
        Label file = new Label();
        file.setId("fit-file");
        file.getStyleClass().add("hint");
        file.textProperty()
                .bind(Bindings.createStringBinding(
                        () -> model.tableProperty().get() == null
                                ? "No data yet: a CSV with a header row, units in brackets (Re [-], f [-])"
                                : model.tableProperty().get().file().getFileName() + " — "
                                        + model.tableProperty().get().rows() + " rows",
                        model.tableProperty()));
        ComboBox<String> y = new ComboBox<>(model.columnLabels());
        y.setId("fit-y");
        y.valueProperty().bindBidirectional(model.responseColumnProperty());
        ComboBox<String> x = new ComboBox<>(model.columnLabels());
        x.setId("fit-x");
        x.valueProperty().bindBidirectional(model.explanatoryColumnProperty());
        HBox columns =
                new HBox(8, importCsv, file, spacer(), new Label("y (response)"), y, new Label("x (explanatory)"), x);
        columns.setAlignment(Pos.CENTER_LEFT);

        FlowPane forms = new FlowPane(14, 4);
        for (FittingModel.FormChoice c : model.forms()) {
            CheckBox box = new CheckBox(c.label());
            box.setId("form-" + c.form().id().replace(':', '-'));
            box.selectedProperty().bindBidirectional(c.chosenProperty());
            forms.getChildren().add(box);
        }

        fit.setId("fit-run");
        fit.setDefaultButton(false);
        fit.setOnAction(e -> runFits());
        fit.disableProperty().bind(model.tableProperty().isNull());
        cancel.setId("fit-cancel");
        cancel.setOnAction(e -> {
            if (running != null) {
                running.cancel(false);
            }
            if (importing != null) {
                importing.cancel(false);
            }
        });
        progress.setPrefWidth(180);
        setRunning(false);
        Label problem = new Label();
        problem.setId("fit-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(model.problemProperty());
        problem.visibleProperty().bind(model.problemProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());
        HBox run = new HBox(8, fit, progress, progressText, cancel);
        run.setAlignment(Pos.CENTER_LEFT);

        Label heading = new Label("Fit a correlation to your measurements");
        heading.getStyleClass().add("heading");
        VBox top = new VBox(6, heading, columns, forms, run, problem);
        top.setPadding(new Insets(10, 12, 6, 12));
        setTop(top);

        TableView<FittingModel.FitRow> table = new TableView<>(model.fits());
        table.setId("fit-table");
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().add(column("#", 26, "rank by AICc, lowest first", r -> String.valueOf(r.rank())));
        table.getColumns().add(column("Form", 92, "fitted form", FittingModel.FitRow::form));
        table.getColumns()
                .add(column(
                        "Parameters  (95 % confidence interval)",
                        270, "least-squares estimates with Student-t 95 % intervals", FittingModel.FitRow::parameters));
        table.getColumns().add(column("R²", 64, "coefficient of determination", FittingModel.FitRow::rSquared));
        table.getColumns()
                .add(column("adj. R²", 64, "R² adjusted for the parameters", FittingModel.FitRow::adjustedRSquared));
        table.getColumns()
                .add(column("AICc", 64, "corrected Akaike criterion; lower is better", FittingModel.FitRow::aicc));
        table.getColumns()
                .add(column("resid. SD", 72, "residual standard deviation √(RSS/ν)", FittingModel.FitRow::residualSd));
        table.setPlaceholder(new Label("No fits yet: import data, choose the columns, tick forms and fit"));
        table.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                model.selectedProperty().set(b);
            }
        });
        model.selectedProperty().addListener((o, a, b) -> {
            if (b != null && table.getSelectionModel().getSelectedItem() != b) {
                table.getSelectionModel().select(b);
            }
        });

        ChartView residuals =
                new ChartView("residual-chart", model.residualChartProperty(), false, dialogs, folder, "residuals");
        SplitPane centre = new SplitPane(table, residuals);
        centre.setOrientation(Orientation.VERTICAL);
        centre.setDividerPositions(0.42);
        setCenter(centre);

        Button save = new Button("Save chosen fit…");
        save.setId("fit-save");
        save.disableProperty().bind(model.selectedProperty().isNull());
        save.setOnAction(e -> model.chooseAndSave());
        Button use = new Button("Use in the pipe run");
        use.setId("fit-use");
        use.setTooltip(new Tooltip("Sets the run's friction method to fitted:FILE (the saved fit, relative to the"
                + " project's folder)"));
        use.disableProperty().bind(model.savedFitProperty().isNull());
        use.setOnAction(e -> model.useInPipeRun());
        CheckBox onChart = new CheckBox("Show points and fit on the friction chart");
        onChart.setId("fit-on-chart");
        onChart.setTooltip(new Tooltip("When x is Re and y is f"));
        onChart.selectedProperty().bindBidirectional(model.onFrictionChartProperty());
        Label status = new Label();
        status.setId("fit-status");
        status.getStyleClass().add("status");
        status.textProperty().bind(model.statusProperty());
        status.setMinWidth(0);
        Label chosen = new Label();
        chosen.setId("fit-chosen");
        chosen.getStyleClass().add("subheading");
        Label cautions = new Label();
        cautions.setId("fit-cautions");
        cautions.getStyleClass().add("hint");
        cautions.setWrapText(true);
        Runnable showChosen = () -> {
            FittingModel.FitRow b = model.selectedProperty().get();
            chosen.setText(b == null ? "" : "Chosen: " + b.form() + ",  " + b.model());
            cautions.setText(String.join("\n", model.selectedCautions()));
        };
        model.selectedProperty().addListener((o, a, b) -> showChosen.run());
        // The view is built the first time its tab is shown (decision 0056): show what is chosen already.
        showChosen.run();
        if (model.selectedProperty().get() != null) {
            table.getSelectionModel().select(model.selectedProperty().get());
        }
        HBox actions = new HBox(8, save, use, onChart);
        actions.setAlignment(Pos.CENTER_LEFT);
        for (Button b : new Button[] {save, use}) {
            b.setMinWidth(Region.USE_PREF_SIZE);
        }
        VBox bottom = new VBox(4, chosen, cautions, actions, status);
        bottom.setPadding(new Insets(6, 12, 8, 12));
        setBottom(bottom);
    }

    /**
     * Keeps the fitting's points and chosen fit on the friction chart while "on the chart" is ticked.
     * Wired when the window is built, so the chart carries them whether or not this view has been shown.
     */
    static void feedFrictionChart(FittingModel model, ResultsModel results) {
        Runnable overlay = () -> results.setFrictionOverlay(
                "fitting", model.onFrictionChartProperty().get() ? model.frictionOverlay() : FrictionOverlay.NONE);
        model.onFrictionChartProperty().addListener((o, a, b) -> overlay.run());
        model.selectedProperty().addListener((o, a, b) -> overlay.run());
        results.projectFrictionProperty().addListener((o, a, b) -> overlay.run());
        model.tableProperty().addListener((o, a, b) -> overlay.run());
        model.responseColumnProperty().addListener((o, a, b) -> overlay.run());
        model.explanatoryColumnProperty().addListener((o, a, b) -> overlay.run());
    }

    private static Region spacer() {
        Region r = new Region();
        HBox.setHgrow(r, Priority.ALWAYS);
        return r;
    }

    private void setRunning(boolean on) {
        progress.setVisible(on);
        cancel.setVisible(on);
        progressText.setVisible(on);
    }

    /** Reads a CSV in a background task with progress (rows read) and cancel. */
    void importInBackground(Path file) {
        if ((importing != null && importing.isRunning()) || (running != null && running.isRunning())) {
            return;
        }
        Task<DataTable> task = new Task<>() {
            @Override
            protected DataTable call() {
                updateMessage("reading " + file.getFileName() + "…");
                return DataTable.read(
                        file,
                        this::isCancelled,
                        rows -> updateMessage(String.format(java.util.Locale.ROOT, "read %,d rows…", rows)));
            }
        };
        importing = task;
        progress.progressProperty().unbind();
        progress.setProgress(ProgressBar.INDETERMINATE_PROGRESS);
        progressText.textProperty().bind(task.messageProperty());
        setRunning(true);
        task.setOnSucceeded(e -> {
            finish();
            model.showTable(task.getValue());
        });
        task.setOnCancelled(e -> {
            finish();
            model.importCancelled();
        });
        task.setOnFailed(e -> {
            finish();
            if (task.getException() instanceof java.util.concurrent.CancellationException) {
                model.importCancelled();
            } else {
                model.importFailed(task.getException());
            }
        });
        Thread thread = new Thread(task, "headway-import");
        thread.setDaemon(true);
        thread.start();
    }

    /** Starts the ticked forms in a background task; a run in progress is left to finish. */
    void runFits() {
        if ((running != null && running.isRunning()) || (importing != null && importing.isRunning())) {
            return;
        }
        FittingModel.FitJob job = model.prepareFits();
        if (job == null) {
            return;
        }
        Task<FitComparison> task = new Task<>() {
            @Override
            protected FitComparison call() {
                return model.runFits(
                        job,
                        (done, total, form) -> {
                            updateProgress(done, total);
                            updateMessage(form.isEmpty() ? "ranking…" : "fitting " + form + "…");
                        },
                        this::isCancelled);
            }
        };
        running = task;
        progress.progressProperty().bind(task.progressProperty());
        progressText.textProperty().bind(task.messageProperty());
        setRunning(true);
        task.setOnSucceeded(e -> {
            finish();
            if (task.getValue() == null) {
                model.fitsCancelled();
            } else {
                model.showFits(job, task.getValue());
            }
        });
        task.setOnCancelled(e -> {
            finish();
            model.fitsCancelled();
        });
        task.setOnFailed(e -> {
            finish();
            model.fitsFailed(task.getException());
        });
        Thread thread = new Thread(task, "headway-fit");
        thread.setDaemon(true);
        thread.start();
    }

    private void finish() {
        progress.progressProperty().unbind();
        progressText.textProperty().unbind();
        setRunning(false);
    }

    private static TableColumn<FittingModel.FitRow, String> column(
            String title, double width, String tip, Function<FittingModel.FitRow, String> value) {
        TableColumn<FittingModel.FitRow, String> c = new TableColumn<>();
        Label header = new Label(title);
        header.setTooltip(new Tooltip(tip));
        c.setGraphic(header);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }
}
