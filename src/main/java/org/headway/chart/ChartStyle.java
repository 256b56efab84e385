package org.headway.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;

/** Headway's own chart look: a cool slate and teal palette on white, thin grid, one font. */
public final class ChartStyle {

    /** Background of the data area. */
    public static final Color PAPER = Color.WHITE;
    /** Grid lines. */
    public static final Color GRID = new Color(0xD5DCE3);
    /** Main curve colour (slate blue). */
    public static final Color INK = new Color(0x2F4B6E);
    /** Accent for the engineer's own points (burnt orange). */
    public static final Color ACCENT = new Color(0xC4622D);
    /** Second accent (teal) for pump curves and fitted correlations. */
    public static final Color TEAL = new Color(0x1F8A83);
    /** Shading of uncertain ranges (pale amber). */
    public static final Color SHADE = new Color(0xF4E3B5);
    /** Laminar line (muted plum). */
    public static final Color PLUM = new Color(0x7A4F7E);

    /** A sequence of distinguishable colours for families of curves. */
    private static final Color[] FAMILY = {
        new Color(0x2F4B6E),
        new Color(0x3F6E9A),
        new Color(0x4E8FB8),
        new Color(0x5BA7A0),
        new Color(0x7BA65B),
        new Color(0xA89A3F),
        new Color(0xB0713A),
        new Color(0x9A4A4A),
        new Color(0x6F4A8A),
        new Color(0x555555)
    };

    /** Base font for every chart. */
    public static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    private ChartStyle() {}

    /** The i-th colour of a family (wraps round). */
    public static Paint family(int i) {
        return FAMILY[Math.floorMod(i, FAMILY.length)];
    }

    /** Solid line of a width. */
    public static Stroke solid(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** Dashed line of a width. */
    public static Stroke dashed(float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {6f, 4f}, 0f);
    }

    /** Applies the common look to a chart with an XY plot. */
    public static void apply(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        if (chart.getTitle() != null) {
            chart.getTitle().setFont(FONT.deriveFont(Font.BOLD, 13f));
            chart.getTitle().setPaint(INK);
        }
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(FONT);
            chart.getLegend().setFrame(org.jfree.chart.block.BlockBorder.NONE);
        }
        if (chart.getPlot() instanceof XYPlot plot) {
            plot.setBackgroundPaint(PAPER);
            plot.setDomainGridlinePaint(GRID);
            plot.setRangeGridlinePaint(GRID);
            plot.setOutlinePaint(new Color(0x9AA7B4));
            plot.getDomainAxis().setLabelFont(FONT.deriveFont(12f));
            plot.getRangeAxis().setLabelFont(FONT.deriveFont(12f));
            plot.getDomainAxis().setTickLabelFont(FONT);
            plot.getRangeAxis().setTickLabelFont(FONT);
        }
    }
}
