package org.headway.app;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.function.Supplier;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.headway.caution.InputException;
import org.headway.network.GradeLinePath;
import org.jfree.chart.JFreeChart;

/**
 * The network workspace's grade-line tab: two nodes chosen from lists or picked on the drawing, the
 * route between them through the solved network (fewest links or least pipe length), and the chart
 * of head and node elevation against the distance along it, with the project's pressure limits as
 * a band when asked. The path and chart take milliseconds even at 10⁴ links, so they are built on
 * the FX thread.
 */
final class GradeLinePane extends VBox {

    static final String FEWEST_LINKS = "fewest links";
    static final String LEAST_LENGTH = "least pipe length";

    private final NetworkEditor editor;
    private final ComboBox<String> start = new ComboBox<>();
    private final ComboBox<String> end = new ComboBox<>();
    private final ComboBox<String> route = new ComboBox<>();
    private final CheckBox limits = new CheckBox("Pressure limits");
    private final ToggleButton pick = new ToggleButton("Pick on the drawing");
    private final Label summary = new Label();
    private final ObjectProperty<JFreeChart> chart = new SimpleObjectProperty<>();
    private final ChartView view;
    private PathGrade shown;
    /** Whether the next node picked on the drawing is the start. */
    private boolean pickStart = true;

    GradeLinePane(NetworkEditor editor, Dialogs dialogs, Supplier<Path> folder) {
        super(6);
        this.editor = editor;
        setId("grade-pane");
        setPadding(new Insets(8, 10, 8, 10));
        start.setId("grade-start");
        end.setId("grade-end");
        route.setId("grade-route");
        route.getItems().addAll(FEWEST_LINKS, LEAST_LENGTH);
        route.setValue(LEAST_LENGTH);
        limits.setId("grade-limits");
        limits.setSelected(true);
        limits.setTooltip(new Tooltip("The heads at the project's minimum and maximum gauge pressures at each node"));
        pick.setId("grade-pick");
        pick.setTooltip(new Tooltip("Click a node on the drawing for the start, then one for the end"));
        summary.setId("grade-summary");
        summary.setWrapText(true);
        summary.getStyleClass().add("total-value");
        Label heading = new Label("Grade line along a path");
        heading.getStyleClass().add("subheading");
        FlowPane controls = new FlowPane(
                8, 4, new Label("From"), start, new Label("to"), end, new Label("by"), route, limits, pick);
        controls.setAlignment(Pos.CENTER_LEFT);
        view = new ChartView("grade-chart", chart, false, dialogs, folder, "grade-line");
        view.setMinHeight(260);
        view.setPrefHeight(380);
        VBox.setVgrow(view, Priority.ALWAYS);
        Label caution = new Label("Heads are estimates for review against local codes by a qualified engineer.");
        caution.setWrapText(true);
        caution.getStyleClass().add("hint");
        getChildren().addAll(heading, controls, summary, view, caution);

        start.setOnAction(e -> redraw());
        end.setOnAction(e -> redraw());
        route.setOnAction(e -> redraw());
        limits.setOnAction(e -> redraw());
        editor.draftProperty().addListener((o, a, b) -> nodeIds());
        editor.solutionProperty().addListener((o, a, b) -> redraw());
        editor.unitSystemProperty().addListener((o, a, b) -> redraw());
        editor.selectionProperty().addListener((o, a, b) -> picked(b));
        nodeIds();
        redraw();
    }

    ComboBox<String> start() {
        return start;
    }

    ComboBox<String> end() {
        return end;
    }

    ComboBox<String> route() {
        return route;
    }

    ToggleButton pick() {
        return pick;
    }

    Label summary() {
        return summary;
    }

    ChartView chartView() {
        return view;
    }

    /** The path drawn, or null. */
    PathGrade shown() {
        return shown;
    }

    /** The start and end nodes by id (tests, and the drawing's picks). */
    void choose(String from, String to) {
        start.setValue(from);
        end.setValue(to);
        redraw();
    }

    private void nodeIds() {
        List<String> ids = editor.draft().nodes().stream()
                .map(m -> m.getOrDefault("id", ""))
                .filter(s -> !s.isBlank())
                .toList();
        if (!ids.equals(start.getItems())) {
            String a = start.getValue();
            String b = end.getValue();
            start.getItems().setAll(ids);
            end.getItems().setAll(ids);
            start.setValue(ids.contains(a) ? a : null);
            end.setValue(ids.contains(b) ? b : null);
        }
    }

    private void picked(NetworkEditor.Selection s) {
        if (!pick.isSelected() || s == null || s.part() != NetworkEditor.Part.NODE || s.row() < 0) {
            return;
        }
        String id = editor.cell(NetworkEditor.Part.NODE, s.row(), "id");
        if (id.isBlank()) {
            return;
        }
        if (pickStart) {
            start.setValue(id);
        } else {
            end.setValue(id);
        }
        pickStart = !pickStart;
        redraw();
    }

    private void redraw() {
        NetworkSolution s = editor.solutionProperty().get();
        String a = start.getValue();
        String b = end.getValue();
        shown = null;
        if (s == null) {
            summary.setText("Solve the network, then choose two nodes.");
            view.setVisible(false);
            return;
        }
        if (a == null || b == null) {
            view.setVisible(false);
            summary.setText("Choose the start and end nodes (or pick them on the drawing).");
            return;
        }
        if (Objects.equals(a, b)) {
            view.setVisible(false);
            summary.setText("The start and end are the same node; choose two.");
            return;
        }
        GradeLinePath.Metric metric =
                LEAST_LENGTH.equals(route.getValue()) ? GradeLinePath.Metric.LENGTH : GradeLinePath.Metric.LINK_COUNT;
        try {
            PathGrade p = PathGrade.of(s, a, b, metric);
            var u = editor.unitSystemProperty().get();
            String stale = editor.staleProperty().get() ? " (from the solve before the latest edits)" : "";
            String band = limits.isSelected() && !p.limits().isSet() ? "; the project sets no pressure limits" : "";
            summary.setText(p.summary(u) + stale + band);
            shown = p;
            chart.set(p.chart(u, limits.isSelected()));
            view.setVisible(true);
        } catch (InputException x) {
            summary.setText("No grade line: " + NetworkEditor.inWords(x));
            view.setVisible(false);
        }
    }
}
