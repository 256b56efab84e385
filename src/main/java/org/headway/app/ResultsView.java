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
        table.getColumns()
                .add(column("#", 28, "segment number, as on the friction chart", r -> String.valueOf(r.number())));
        table.getColumns().add(column("Segment", 120, "segment name", ResultsModel.SegmentRow::name));
        table.getColumns().add(column("V", 88, "mean velocity V = 4Q/(πD²)", ResultsModel.SegmentRow::velocity));
        table.getColumns().add(column("Re", 62, "Reynolds number Re = ρVD/μ", ResultsModel.SegmentRow::reynolds));
        table.getColumns()
                .add(column(
                        "Regime", 72, "laminar below Re 2300, turbulent from 4000", ResultsModel.SegmentRow::regime));
        table.getColumns().add(column("f", 56, "Darcy friction factor", ResultsModel.SegmentRow::frictionFactor));
        table.getColumns()
                .add(column("h_f", 88, "friction loss h_f = f (L/D) V²/(2g)", ResultsModel.SegmentRow::frictionLoss));
        table.getColumns()
                .add(column("ΣK", 46, "sum of fitting loss coefficients", ResultsModel.SegmentRow::lossCoefficient));
        table.getColumns().add(column("h_m", 88, "fittings loss h_m = ΣK V²/(2g)", ResultsModel.SegmentRow::minorLoss));
        table.getColumns().add(column("h_f + h_m", 88, "segment head loss", ResultsModel.SegmentRow::totalLoss));
        table.setPrefHeight(170);
        table.setPlaceholder(new Label("No results yet"));

        Label elementsHeading = new Label("Elements and pressures (gauge; lowest absolute adds the site air pressure)");
        elementsHeading.getStyleClass().add("heading");
        TableView<ResultsModel.ElementRow> elements = new TableView<>(model.elementRows());
        elements.setId("elements-table");
        elements.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column("Id", 96, "element id", ResultsModel.ElementRow::id));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "Kind", 70, "element kind", ResultsModel.ElementRow::kind));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "Head loss",
                        80,
                        "head lost across the element (negative: a pump's gain)",
                        ResultsModel.ElementRow::headLoss));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "p in", 80, "gauge pressure at the element's inlet", ResultsModel.ElementRow::inletPressure));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "p out",
                        80,
                        "gauge pressure at the element's outlet",
                        ResultsModel.ElementRow::outletPressure));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "p min abs.",
                        88,
                        "lowest absolute pressure along the element (ends and high point)",
                        ResultsModel.ElementRow::lowestAbsolutePressure));
        elements.getColumns()
                .add(ResultsView.<ResultsModel.ElementRow>column(
                        "Law", 220, "the element's law and its source", ResultsModel.ElementRow::law));
        elements.setPrefHeight(200);
        elements.setPlaceholder(new Label("No results yet"));

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

        getChildren().addAll(problem, table, elementsHeading, elements, heading, totals, computing);
    }

    private void fillTotals(ResultsModel model) {
        // Same lines as before (the usual case while editing): change the values in place, no flicker.
        if (totals.getChildren().size() == 2 * model.totals().size()) {
            boolean same = true;
            for (int i = 0; i < model.totals().size() && same; i++) {
                same = ((Label) totals.getChildren().get(2 * i))
                        .getText()
                        .equals(model.totals().get(i).label());
            }
            if (same) {
                for (int i = 0; i < model.totals().size(); i++) {
                    ((Label) totals.getChildren().get(2 * i + 1))
                            .setText(model.totals().get(i).value());
                }
                return;
            }
        }
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

    private static <R> TableColumn<R, String> column(
            String title, double width, String tip, Function<R, String> value) {
        TableColumn<R, String> c = new TableColumn<>();
        Label header = new Label(title);
        header.setTooltip(new javafx.scene.control.Tooltip(tip));
        c.setGraphic(header);
        c.setPrefWidth(width);
        c.setSortable(false);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }
}
