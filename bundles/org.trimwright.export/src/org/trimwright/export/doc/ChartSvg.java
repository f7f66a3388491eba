package org.trimwright.export.doc;

import java.awt.geom.Rectangle2D;

import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.trimwright.export.picture.Picture;

/**
 * Draws a chart as an SVG element (vector, text as text) with JFreeSVG. Coordinates are written with 2 decimals
 * (0.01 px on a 760 px wide chart) and transforms with 4, instead of the shortest round-trip decimal of every double:
 * smaller files and cheaper formatting, no visible change.
 */
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
        SVGGraphics2D g = graphics(WIDTH, HEIGHT, prefix);
        chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        String s = g.getSVGElement();
        g.dispose();
        return s;
    }

    /** A recorded chart as one {@code <svg>} element (see {@link #svg(JFreeChart, String)}). */
    public static String svg(Picture picture, String prefix) {
        SVGGraphics2D g = graphics(picture.width(), picture.height(), prefix);
        picture.paint(g);
        String s = g.getSVGElement();
        g.dispose();
        return s;
    }

    private static SVGGraphics2D graphics(double width, double height, String prefix) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(prefix);
        g.setGeomDoubleConverter(v -> fixed(v, 2));
        g.setTransformDoubleConverter(v -> fixed(v, 4));
        return g;
    }

    private static final long[] SCALE = {1, 10, 100, 1000, 10000};

    /**
     * {@code v} rounded to {@code digits} (0..4) decimals, without trailing zeros ("12", "-0.5", "3.25"); values too
     * large for this (|v| >= 1e13) and non-finite values as {@link Double#toString}.
     */
    public static String fixed(double v, int digits) {
        if (!Double.isFinite(v) || Math.abs(v) >= 1e13) {
            return Double.toString(v);
        }
        long scale = SCALE[digits];
        long r = Math.round(Math.abs(v) * scale);
        long whole = r / scale;
        long frac = r % scale;
        StringBuilder sb = new StringBuilder(16);
        if (v < 0 && r != 0) {
            sb.append('-');
        }
        sb.append(whole);
        if (frac != 0) {
            int d = digits;
            while (frac % 10 == 0) {
                frac /= 10;
                d--;
            }
            sb.append('.');
            String f = Long.toString(frac);
            for (int i = f.length(); i < d; i++) {
                sb.append('0');
            }
            sb.append(f);
        }
        return sb.toString();
    }
}
