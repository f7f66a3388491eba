package org.trimwright.export.doc;

import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYDataset;

/**
 * A step renderer that draws each series as one path (the same corners as {@link XYStepRenderer}: horizontal at the
 * previous value up to the step point, vertical to the new value, horizontal to the new x) instead of up to three
 * separate lines per item: a 1024-code transfer curve becomes one SVG path / one PDF stroke instead of ~2000 styled
 * lines. Vertical plots only; other orientations and passes are drawn by {@link XYStepRenderer}.
 */
final class PathStepRenderer extends XYStepRenderer {

    private static final long serialVersionUID = 1L;

    private transient Path2D.Double path;
    private transient boolean penDown;

    /** A copy of {@code r}'s look (series paints and strokes, shapes, step point) for {@code series} series. */
    static PathStepRenderer copyOf(XYStepRenderer r, int series) {
        PathStepRenderer p = new PathStepRenderer();
        p.setStepPoint(r.getStepPoint());
        p.setDefaultShapesVisible(r.getDefaultShapesVisible());
        p.setDefaultLinesVisible(r.getDefaultLinesVisible());
        p.setDefaultPaint(r.getDefaultPaint(), false);
        p.setDefaultStroke(r.getDefaultStroke(), false);
        for (int i = 0; i < series; i++) {
            if (r.getSeriesPaint(i) != null) {
                p.setSeriesPaint(i, r.getSeriesPaint(i), false);
            }
            if (r.getSeriesStroke(i) != null) {
                p.setSeriesStroke(i, r.getSeriesStroke(i), false);
            }
            if (r.getSeriesShapesVisible(i) != null) {
                p.setSeriesShapesVisible(i, r.getSeriesShapesVisible(i));
            }
        }
        return p;
    }

    @Override
    public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info,
            XYPlot plot, ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
            CrosshairState crosshairState, int pass) {
        if (pass != 0 || plot.getOrientation() != PlotOrientation.VERTICAL || info != null) {
            super.drawItem(g2, state, dataArea, info, plot, domainAxis, rangeAxis, dataset, series, item,
                    crosshairState, pass);
            return;
        }
        if (item == 0) {
            path = new Path2D.Double();
            penDown = false;
        }
        if (getItemVisible(series, item) && getItemLineVisible(series, item)) {
            RectangleEdge xEdge = plot.getDomainAxisEdge();
            RectangleEdge yEdge = plot.getRangeAxisEdge();
            double x1 = domainAxis.valueToJava2D(dataset.getXValue(series, item), dataArea, xEdge);
            double y1 = rangeAxis.valueToJava2D(dataset.getYValue(series, item), dataArea, yEdge);
            if (Double.isNaN(x1) || Double.isNaN(y1)) {
                penDown = false;
            } else if (!penDown) {
                path.moveTo(x1, y1);
                penDown = true;
            } else {
                double x0 = path.getCurrentPoint().getX();
                double y0 = path.getCurrentPoint().getY();
                double xs = x0 + getStepPoint() * (x1 - x0);
                path.lineTo(xs, y0);
                path.lineTo(xs, y1);
                if (xs != x1) {
                    path.lineTo(x1, y1);
                }
            }
        } else {
            penDown = false;
        }
        if (item == dataset.getItemCount(series) - 1) {
            g2.setPaint(getItemPaint(series, item));
            g2.setStroke(getItemStroke(series, item));
            g2.draw(path);
            path = null;
        }
    }
}
