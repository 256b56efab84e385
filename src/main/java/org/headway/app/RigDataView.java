package org.headway.app;

import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.function.Function;
import java.util.function.Supplier;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.headway.rig.RigReport;

/** The rig-data view: open a rig file, per-point table, summary, effective roughness, cautions. */
final class RigDataView extends VBox {

    private final RigDataModel model;
    private final ProgressBar progress = new ProgressBar(ProgressBar.INDETERMINATE_PROGRESS);
    private final Button cancel = new Button("Cancel");
    private Task<RigReport> running;

    RigDataView(RigDataModel model, ResultsModel results, Supplier<Path> folder) {
        this.model = model;
        setId("rig-data");
        setSpacing(8);
        setPadding(new Insets(10, 12, 10, 12));

        Label heading = new Label("Rig data against the friction curves");
        heading.getStyleClass().add("heading");
        Button open = new Button("Open rig file…");
        open.setId("rig-open");
        open.setOnAction(e -> model.chooseRigFile(folder.get()).ifPresent(this::analyseInBackground));
        Label file = new Label();
        file.setId("rig-file");
        file.getStyleClass().add("hint");
        file.textProperty()
                .bind(Bindings.createStringBinding(
                        () -> model.fileProperty().get() == null
                                ? "A rig file (JSON) names the data CSV, the bore, tap spacing, fluid and"
                                        + " uncertainties"
                                : model.fileProperty().get().getFileName().toString(),
                        model.fileProperty()));
        cancel.setId("rig-cancel");
        cancel.setOnAction(e -> {
            if (running != null) {
                running.cancel(false);
            }
        });
        progress.setPrefWidth(140);
        progress.setVisible(false);
        cancel.setVisible(false);
        HBox bar = new HBox(8, open, file, progress, cancel);
        bar.setAlignment(Pos.CENTER_LEFT);

        Label problem = new Label();
        problem.setId("rig-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(model.problemProperty());
        problem.visibleProperty().bind(model.problemProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());

        GridPane summary = new GridPane();
        summary.setId("rig-summary");
        summary.setHgap(14);
        summary.setVgap(3);
        javafx.scene.layout.ColumnConstraints labels = new javafx.scene.layout.ColumnConstraints();
        labels.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        javafx.scene.layout.ColumnConstraints values = new javafx.scene.layout.ColumnConstraints();
        values.setHgrow(Priority.ALWAYS);
        values.setMinWidth(0);
        summary.getColumnConstraints().addAll(labels, values);
        Runnable fillSummary = () -> {
            summary.getChildren().clear();
            int row = 0;
            for (RigDataModel.SummaryRow s : model.summary()) {
                Label v = new Label(s.value());
                v.getStyleClass().add("total-value");
                v.setWrapText(true);
                summary.addRow(row++, new Label(s.label()), v);
            }
        };
        model.summary()
                .addListener((javafx.collections.ListChangeListener<RigDataModel.SummaryRow>) c -> fillSummary.run());
        // The view is built the first time its tab is shown (decision 0056): show a summary made before.
        fillSummary.run();
        Label roughness = new Label();
        roughness.setId("rig-roughness");
        roughness.getStyleClass().add("subheading");
        roughness.setWrapText(true);
        roughness.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        roughness.textProperty().bind(model.roughnessProperty());

        TableView<RigDataModel.PointRow> table = new TableView<>(model.points());
        table.setId("rig-table");
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().add(column("Line", 50, "line in the data file", r -> String.valueOf(r.line())));
        table.getColumns().add(column("Re", 80, "Reynolds number ρVD/μ", RigDataModel.PointRow::reynolds));
        table.getColumns()
                .add(column("f", 72, "measured Darcy f = 2ΔpD/(ρV²L)", RigDataModel.PointRow::frictionFactor));
        table.getColumns()
                .add(column(
                        "U(f)",
                        64,
                        "expanded uncertainty of f (k = 2), first-order propagation",
                        RigDataModel.PointRow::frictionUncertainty));
        table.getColumns()
                .add(column("f_ref", 72, "comparison correlation at (Re, ε/D)", RigDataModel.PointRow::reference));
        table.getColumns().add(column("Deviation", 76, "f/f_ref − 1", RigDataModel.PointRow::deviation));
        table.getColumns().add(column("Regime", 90, "by Re", RigDataModel.PointRow::regime));
        table.setPlaceholder(new Label("No rig data yet"));
        VBox.setVgrow(table, Priority.ALWAYS);

        Label cautions = new Label();
        cautions.setId("rig-cautions");
        cautions.getStyleClass().add("hint");
        cautions.setWrapText(true);
        cautions.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        cautions.textProperty()
                .bind(Bindings.createStringBinding(
                        () -> model.cautions().isEmpty() ? "" : "• " + String.join("\n• ", model.cautions()),
                        model.cautions()));
        cautions.visibleProperty().bind(Bindings.isNotEmpty(model.cautions()));
        cautions.managedProperty().bind(cautions.visibleProperty());

        Label status = new Label();
        status.getStyleClass().add("status");
        status.textProperty().bind(model.statusProperty());

        getChildren().addAll(heading, bar, problem, summary, roughness, table, cautions, status);
    }

    /**
     * Puts the analysed rig points on the friction chart. Wired when the window is built, so the chart
     * carries them whether or not this view has been shown.
     */
    static void feedFrictionChart(RigDataModel model, ResultsModel results) {
        model.reportProperty().addListener((o, a, b) -> results.setFrictionOverlay("rig", model.frictionOverlay()));
    }

    /** Analyses the rig file in a background task with cancel. */
    void analyseInBackground(Path rigFile) {
        if (running != null && running.isRunning()) {
            return;
        }
        Task<RigReport> task = new Task<>() {
            @Override
            protected RigReport call() {
                return RigDataModel.analyse(rigFile, this::isCancelled);
            }
        };
        running = task;
        progress.setVisible(true);
        cancel.setVisible(true);
        task.setOnSucceeded(e -> {
            done();
            model.show(rigFile, task.getValue());
        });
        task.setOnCancelled(e -> {
            done();
            model.cancelled();
        });
        task.setOnFailed(e -> {
            done();
            if (task.getException() instanceof CancellationException) {
                model.cancelled();
            } else {
                model.failed(task.getException());
            }
        });
        Thread t = new Thread(task, "headway-rig");
        t.setDaemon(true);
        t.start();
    }

    private void done() {
        progress.setVisible(false);
        cancel.setVisible(false);
    }

    Task<RigReport> rigTask() {
        return running;
    }

    private static TableColumn<RigDataModel.PointRow, String> column(
            String title, double width, String tip, Function<RigDataModel.PointRow, String> value) {
        TableColumn<RigDataModel.PointRow, String> c = new TableColumn<>();
        Label header = new Label(title);
        header.setTooltip(new Tooltip(tip));
        c.setGraphic(header);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }
}
