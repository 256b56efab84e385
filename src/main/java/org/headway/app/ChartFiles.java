package org.headway.app;

import java.awt.Rectangle;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.headway.project.AtomicFiles;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Writes a chart to PNG or SVG, atomically, at a chosen size. No toolkit needed. */
public final class ChartFiles {

    /** Default export size (px): wide enough for the Re axis labels at one per decade. */
    public static final int WIDTH = 1200;

    public static final int HEIGHT = 800;

    private ChartFiles() {}

    /**
     * @param chart the chart
     * @param target file to write (replaced if it exists)
     * @param width image width (px)
     * @param height image height (px)
     */
    public static void png(JFreeChart chart, Path target, int width, int height) {
        AtomicFiles.write(target, true, out -> ChartUtils.writeChartAsPNG(out, chart, width, height));
    }

    /**
     * @param chart the chart
     * @param target file to write (replaced if it exists)
     * @param width drawing width (px)
     * @param height drawing height (px)
     */
    public static void svg(JFreeChart chart, Path target, int width, int height) {
        SVGGraphics2D g2 = new SVGGraphics2D(width, height);
        chart.draw(g2, new Rectangle(0, 0, width, height));
        byte[] bytes = g2.getSVGDocument().getBytes(StandardCharsets.UTF_8);
        AtomicFiles.write(target, true, out -> out.write(bytes));
    }

    /** Writes PNG or SVG by the target's extension ({@code .svg}, otherwise PNG). */
    public static void write(JFreeChart chart, Path target) {
        if (target.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".svg")) {
            svg(chart, target, WIDTH, HEIGHT);
        } else {
            png(chart, target, WIDTH, HEIGHT);
        }
    }
}
