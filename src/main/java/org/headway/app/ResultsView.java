package org.headway.app;

import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;

/** The per-segment results table and the run totals. */
final class ResultsView extends VBox {

    private final GridPane totals = new GridPane();

    ResultsView(ResultsModel model) {
        setSpacing(10);
        setPadding(new Insets(12));
        getStyleClass().add("results");

        Label problem = new Label();
        problem.setId("results-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(model.problemProperty());
        problem.visibleProperty().bind(model.problemProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());

        TableView<ResultsModel.SegmentRow> table = new TableView<>(model.rows());
        table.setId("results-table");
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().add(column("#", 30, r -> String.valueOf(r.number())));
        table.getColumns().add(column("Segment", 150, ResultsModel.SegmentRow::name));
        table.getColumns().add(column("Velocity V", 85, ResultsModel.SegmentRow::velocity));
        table.getColumns().add(column("Re", 85, ResultsModel.SegmentRow::reynolds));
        table.getColumns().add(column("Regime", 80, ResultsModel.SegmentRow::regime));
        table.getColumns().add(column("f", 60, ResultsModel.SegmentRow::frictionFactor));
        table.getColumns().add(column("Friction h_f", 85, ResultsModel.SegmentRow::frictionLoss));
        table.getColumns().add(column("ΣK", 50, ResultsModel.SegmentRow::lossCoefficient));
        table.getColumns().add(column("Fittings h_m", 85, ResultsModel.SegmentRow::minorLoss));
        table.getColumns().add(column("Loss h_f + h_m", 95, ResultsModel.SegmentRow::totalLoss));
        table.setPrefHeight(220);
        table.setPlaceholder(new Label("No results yet"));

        Label heading = new Label("Run totals");
        heading.getStyleClass().add("heading");
        totals.setId("totals");
        totals.setHgap(16);
        totals.setVgap(4);
        model.totals().addListener((ListChangeListener<ResultsModel.TotalRow>) c -> fillTotals(model));
        fillTotals(model);

        Label computing = new Label("recalculating…");
        computing.getStyleClass().add("hint");
        computing.visibleProperty().bind(model.computingProperty());

        getChildren().addAll(problem, table, heading, totals, computing);
    }

    private void fillTotals(ResultsModel model) {
        totals.getChildren().clear();
        int row = 0;
        for (ResultsModel.TotalRow t : model.totals()) {
            Label name = new Label(t.label());
            Label value = new Label(t.value());
            value.setId("total-" + t.label().toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z]+", "-"));
            value.getStyleClass().add("total-value");
            GridPane.setHalignment(value, javafx.geometry.HPos.RIGHT);
            value.setAlignment(Pos.CENTER_RIGHT);
            totals.addRow(row++, name, value);
        }
    }

    private static TableColumn<ResultsModel.SegmentRow, String> column(
            String title, double width, Function<ResultsModel.SegmentRow, String> value) {
        TableColumn<ResultsModel.SegmentRow, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setSortable(false);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }
}
