package org.headway.app;

import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/** The π-groups helper: variables with units, the rank, and the dimensionless groups. */
final class PiGroupsView extends VBox {

    PiGroupsView(PiGroupsModel model) {
        setId("pi-groups");
        setSpacing(8);
        setPadding(new Insets(12));

        Label heading = new Label("Dimensionless groups (Buckingham π)");
        heading.getStyleClass().add("heading");
        Label hint = new Label("List the variables of the problem with their units, the dependent one first"
                + " (units: m, g, s, K, A, mol, cd, N, Pa, bar, J, W, Hz, rpm, L, min, h, rad, with SI prefixes;"
                + " * or · multiplies, / divides, ^ raises: kg/m^3, Pa*s, m³/h).");
        hint.getStyleClass().add("hint");
        hint.setWrapText(true);

        TableView<PiGroupsModel.Variable> vars = new TableView<>(model.variables());
        vars.setId("pi-variables");
        vars.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        vars.getColumns().add(column("Symbol", 110, PiGroupsModel.Variable::symbol));
        vars.getColumns().add(column("Unit", 140, PiGroupsModel.Variable::unit));
        vars.getColumns().add(column("Dimensions (M L T Θ …)", 200, PiGroupsModel.Variable::dimensions));
        vars.setPrefHeight(210);

        TextField symbol = new TextField();
        symbol.setId("pi-symbol");
        symbol.setPromptText("symbol, e.g. mu");
        symbol.setPrefColumnCount(8);
        TextField unit = new TextField();
        unit.setId("pi-unit");
        unit.setPromptText("unit, e.g. Pa*s");
        unit.setPrefColumnCount(10);
        Button add = new Button("Add / replace");
        add.setId("pi-add");
        add.setDefaultButton(false);
        Runnable addIt = () -> {
            model.put(symbol.getText(), unit.getText());
            symbol.clear();
            unit.clear();
            symbol.requestFocus();
        };
        add.setOnAction(e -> addIt.run());
        unit.setOnAction(e -> addIt.run());
        Button remove = new Button("Remove selected");
        remove.setId("pi-remove");
        remove.disableProperty()
                .bind(vars.getSelectionModel().selectedItemProperty().isNull());
        remove.setOnAction(e -> model.remove(vars.getSelectionModel().getSelectedIndex()));
        vars.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                symbol.setText(b.symbol());
                unit.setText(b.unit());
            }
        });
        HBox edit = new HBox(8, symbol, unit, add, remove);
        edit.setAlignment(Pos.CENTER_LEFT);

        TextField repeating = new TextField();
        repeating.setId("pi-repeating");
        repeating.setPromptText("blank: density, velocity, a diameter, …");
        repeating.setPrefColumnCount(24);
        repeating.setTooltip(new Tooltip("Repeating variables, comma-separated; Enter to apply"));
        repeating.setOnAction(e -> {
            model.repeatingProperty().set(repeating.getText());
            model.analyse();
        });
        repeating.focusedProperty().addListener((o, a, focused) -> {
            if (!focused
                    && !repeating.getText().equals(model.repeatingProperty().get())) {
                model.repeatingProperty().set(repeating.getText());
                model.analyse();
            }
        });
        HBox rep = new HBox(8, new Label("Repeating variables"), repeating);
        rep.setAlignment(Pos.CENTER_LEFT);

        Label problem = new Label();
        problem.setId("pi-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(model.problemProperty());
        problem.visibleProperty().bind(model.problemProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());

        Label summary = new Label();
        summary.setId("pi-summary");
        summary.getStyleClass().add("subheading");
        summary.textProperty()
                .bind(Bindings.createStringBinding(
                        () -> model.problemProperty().get().isEmpty()
                                ? model.variables().size() + " variables, rank "
                                        + model.rankProperty().get() + ": "
                                        + model.groups().size() + " dimensionless group"
                                        + (model.groups().size() == 1 ? "" : "s")
                                : "No groups until the problem above is fixed",
                        model.variables(),
                        model.groups(),
                        model.rankProperty(),
                        model.problemProperty()));
        TableView<PiGroupsModel.GroupRow> groups = new TableView<>(model.groups());
        groups.setId("pi-groups-table");
        groups.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        groups.getColumns().add(groupColumn("Group", 220, PiGroupsModel.GroupRow::name));
        groups.getColumns().add(groupColumn("As a product of powers", 300, PiGroupsModel.GroupRow::formula));
        groups.setPrefHeight(190);
        groups.setPlaceholder(new Label("No groups"));
        Label explanation = new Label();
        explanation.setId("pi-explanation");
        explanation.setWrapText(true);
        explanation.textProperty().bind(model.explanationProperty());

        getChildren().addAll(heading, hint, vars, edit, rep, problem, summary, groups, explanation);
    }

    private static TableColumn<PiGroupsModel.Variable, String> column(
            String title, double width, Function<PiGroupsModel.Variable, String> value) {
        TableColumn<PiGroupsModel.Variable, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }

    private static TableColumn<PiGroupsModel.GroupRow, String> groupColumn(
            String title, double width, Function<PiGroupsModel.GroupRow, String> value) {
        TableColumn<PiGroupsModel.GroupRow, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }
}
