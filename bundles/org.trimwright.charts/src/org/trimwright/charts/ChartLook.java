package org.trimwright.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Trimwright's own chart look: a quiet white field, hairline grid, and a five-colour palette chosen for contrast
 * on paper and screen (ink blue, copper, moss, plum, slate). Titles are plain; the subtitle always carries the
 * definition or method behind the plotted figures.
 */
public final class ChartLook {

    /** Ink blue: the primary series. */
    public static final Color INK = new Color(0x1F, 0x4E, 0x79);
    /** Copper: the second series. */
    public static final Color COPPER = new Color(0xC0, 0x6A, 0x2B);
    /** Moss: envelopes and passing items. */
    public static final Color MOSS = new Color(0x5B, 0x8C, 0x3A);
    /** Plum: limits and markers. */
    public static final Color PLUM = new Color(0x8E, 0x3B, 0x6F);
    /** Slate: axes and text. */
    public static final Color SLATE = new Color(0x3C, 0x46, 0x50);
    /** Grid lines. */
    public static final Color GRID = new Color(0xDD, 0xE2, 0xE7);

    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    static final Font SUBTITLE = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    static final Font TICK = new Font(Font.SANS_SERIF, Font.PLAIN, 10);

    private ChartLook() {
    }

    /** {@code c} with alpha {@code a} (0..255). */
    static Color withAlpha(Color c, int a) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), a);
    }

    /** A line stroke of {@code width} points. */
    static BasicStroke line(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** A dashed stroke for limits. */
    static BasicStroke dashed() {
        return new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 3f}, 0f);
    }

    /** Applies the look to a chart with one XY plot and adds {@code subtitle} (definition or method). */
    static JFreeChart apply(JFreeChart chart, String subtitle) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setPadding(new RectangleInsets(6, 6, 6, 10));
        if (chart.getTitle() != null) {
            chart.getTitle().setFont(TITLE);
            chart.getTitle().setPaint(SLATE);
            chart.getTitle().setPosition(RectangleEdge.TOP);
        }
        TextTitle sub = new TextTitle(subtitle, SUBTITLE);
        sub.setPaint(SLATE);
        sub.setMargin(2, 0, 6, 0);
        chart.addSubtitle(sub);
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setItemFont(TICK);
            legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
            legend.setPosition(RectangleEdge.BOTTOM);
        }
        if (chart.getPlot() instanceof XYPlot p) {
            style(p);
        }
        return chart;
    }

    /** Styles one XY plot: background, grid, axes. */
    static void style(XYPlot p) {
        p.setBackgroundPaint(Color.WHITE);
        p.setOutlinePaint(GRID);
        p.setDomainGridlinePaint(GRID);
        p.setRangeGridlinePaint(GRID);
        p.setDomainGridlineStroke(line(0.6f));
        p.setRangeGridlineStroke(line(0.6f));
        p.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        for (int i = 0; i < p.getDomainAxisCount(); i++) {
            axis(p.getDomainAxis(i));
        }
        for (int i = 0; i < p.getRangeAxisCount(); i++) {
            axis(p.getRangeAxis(i));
        }
    }

    static void axis(ValueAxis a) {
        if (a == null) {
            return;
        }
        a.setLabelFont(LABEL);
        a.setLabelPaint(SLATE);
        a.setTickLabelFont(TICK);
        a.setTickLabelPaint(SLATE);
        a.setAxisLinePaint(SLATE);
        a.setTickMarkPaint(SLATE);
    }

    /** An axis label with its unit in brackets, or the bare label for a unitless quantity. */
    static String withUnit(String label, String unit) {
        return unit == null || unit.isEmpty() ? label : label + " [" + unit + "]";
    }
}
