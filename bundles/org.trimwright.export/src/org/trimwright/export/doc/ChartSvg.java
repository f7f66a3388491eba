package org.trimwright.export.doc;

import java.awt.geom.Rectangle2D;

import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Draws a chart as an SVG element (vector, text as text) with JFreeSVG. */
public final class ChartSvg {

    /** Width of charts in the HTML document, px. */
    public static final int WIDTH = 760;
    /** Height of charts in the HTML document, px. */
    public static final int HEIGHT = 380;

    private ChartSvg() {
    }

    /**
     * The chart as one {@code <svg>} element.
     *
     * @param prefix prefix of the SVG's internal ids, unique within the document
     */
    public static String svg(JFreeChart chart, String prefix) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setDefsKeyPrefix(prefix);
        chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        String s = g.getSVGElement();
        g.dispose();
        return s;
    }
}
