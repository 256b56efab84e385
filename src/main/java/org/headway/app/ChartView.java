package org.headway.app;

import java.awt.geom.Rectangle2D;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Supplier;
import javafx.beans.value.ObservableValue;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.input.MouseEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.Range;

/**
 * One chart through the JFreeChart viewer, with export to PNG and SVG and a reset of zoom and
 * pan. For the friction chart it also reads out Re, f and the ε/D of the Colebrook curve under
 * the cursor.
 */
final class ChartView extends BorderPane {

    private final ChartViewer viewer = new ChartViewer();
    private final Label readout = new Label(" ");
    private Range domain;
    private Range range;

    ChartView(
            String id,
            ObservableValue<JFreeChart> chart,
            boolean frictionReadout,
            Dialogs dialogs,
            Supplier<Path> folder,
            String fileStem) {
        setId(id);
        viewer.setId(id + "-viewer");
        Button png = new Button("Export PNG…");
        png.setId(id + "-export-png");
        Button svg = new Button("Export SVG…");
        svg.setId(id + "-export-svg");
        Button reset = new Button("Reset view");
        reset.setTooltip(
                new Tooltip("Back to the full chart after zooming (wheel or drag a box) or panning (Alt+drag)"));
        png.setOnAction(e -> export(dialogs, folder.get(), fileStem + ".png", "PNG image"));
        svg.setOnAction(e -> export(dialogs, folder.get(), fileStem + ".svg", "SVG drawing"));
        reset.setOnAction(e -> resetView());
        readout.setId(id + "-readout");
        readout.getStyleClass().add("readout");
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        // The buttons keep their width; a long readout is the one to shorten.
        for (Button b : new Button[] {reset, png, svg}) {
            b.setMinWidth(Region.USE_PREF_SIZE);
        }
        readout.setMinWidth(0);
        HBox bar = new HBox(8, readout, grow, reset, png, svg);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(6, 10, 6, 10));
        bar.getStyleClass().add("chart-bar");
        setCenter(viewer);
        setBottom(bar);
        chart.addListener((o, a, b) -> show(b));
        show(chart.getValue());
        if (frictionReadout) {
            viewer.getCanvas().addEventHandler(MouseEvent.MOUSE_MOVED, this::track);
            viewer.getCanvas().addEventHandler(MouseEvent.MOUSE_EXITED, e -> readout.setText(" "));
        } else {
            readout.setText("Wheel to zoom, drag a box to zoom in, Alt+drag to pan");
        }
    }

    ChartViewer viewer() {
        return viewer;
    }

    private void show(JFreeChart chart) {
        if (chart == null) {
            return;
        }
        // A view the engineer zoomed or panned stays where it was when the results are recomputed,
        // as long as the new chart's full extent is the same (same axes, same units).
        Range keepDomain = null;
        Range keepRange = null;
        if (viewer.getChart() != null && viewer.getChart().getPlot() instanceof XYPlot old && domain != null) {
            Range d = old.getDomainAxis().getRange();
            Range r = old.getRangeAxis().getRange();
            if (!d.equals(domain) || !r.equals(range)) {
                keepDomain = d;
                keepRange = r;
            }
        }
        if (chart.getPlot() instanceof XYPlot plot) {
            plot.setDomainPannable(true);
            plot.setRangePannable(true);
            Range newDomain = plot.getDomainAxis().getRange();
            Range newRange = plot.getRangeAxis().getRange();
            boolean sameExtent = newDomain.equals(domain) && newRange.equals(range);
            domain = newDomain;
            range = newRange;
            if (keepDomain != null && sameExtent) {
                plot.getDomainAxis().setRange(keepDomain);
                plot.getRangeAxis().setRange(keepRange);
            }
        }
        viewer.setChart(chart);
    }

    private void resetView() {
        JFreeChart chart = viewer.getChart();
        if (chart != null && chart.getPlot() instanceof XYPlot plot && domain != null) {
            plot.getDomainAxis().setRange(domain);
            plot.getRangeAxis().setRange(range);
        }
    }

    private void track(MouseEvent e) {
        JFreeChart chart = viewer.getChart();
        if (chart == null || !(chart.getPlot() instanceof XYPlot plot)) {
            return;
        }
        PlotRenderingInfo info = viewer.getCanvas().getRenderingInfo() == null
                ? null
                : viewer.getCanvas().getRenderingInfo().getPlotInfo();
        if (info == null) {
            return;
        }
        Rectangle2D area = info.getDataArea();
        if (!area.contains(e.getX(), e.getY())) {
            readout.setText(" ");
            return;
        }
        double re = plot.getDomainAxis().java2DToValue(e.getX(), area, plot.getDomainAxisEdge());
        double f = plot.getRangeAxis().java2DToValue(e.getY(), area, plot.getRangeAxisEdge());
        readout.setText(ColebrookInverse.readout(re, f));
    }

    private void export(Dialogs dialogs, Path folder, String name, String description) {
        JFreeChart chart = viewer.getChart();
        if (chart == null) {
            return;
        }
        Optional<Path> target = dialogs.chooseExportTarget(folder, name, description);
        if (target.isEmpty()) {
            return;
        }
        try {
            ChartFiles.write(chart, target.get());
        } catch (RuntimeException ex) {
            dialogs.showError("Could not export the chart", ex.getMessage());
        }
    }
}
