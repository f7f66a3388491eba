package org.trimwright.export.doc;

import java.awt.Graphics2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYDifferenceRenderer;
import org.jfree.data.xy.XYDataset;

/**
 * A difference (band) renderer whose two outlines are each drawn as one path through the same points, instead of
 * one line per item and series as {@link XYDifferenceRenderer} draws them; the filled band (pass 0) is unchanged.
 * Vertical plots without shapes only; otherwise {@link XYDifferenceRenderer} draws.
 */
final class PathBandRenderer extends XYDifferenceRenderer {

    private static final long serialVersionUID = 1L;

    private transient Path2D.Double[] outline;

    PathBandRenderer(XYDifferenceRenderer r, int series) {
        super(r.getPositivePaint(), r.getNegativePaint(), r.getShapesVisible());
        setRoundXCoordinates(r.getRoundXCoordinates());
        setLegendLine(r.getLegendLine());
        for (int i = 0; i < series; i++) {
            if (r.getSeriesPaint(i) != null) {
                setSeriesPaint(i, r.getSeriesPaint(i), false);
            }
            if (r.getSeriesStroke(i) != null) {
                setSeriesStroke(i, r.getSeriesStroke(i), false);
            }
        }
    }

    @Override
    protected void drawItemPass1(Graphics2D g2, Rectangle2D dataArea, PlotRenderingInfo info, XYPlot plot,
            ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
            CrosshairState crosshairState) {
        if (getShapesVisible() || info != null || plot.getOrientation() != PlotOrientation.VERTICAL) {
            super.drawItemPass1(g2, dataArea, info, plot, domainAxis, rangeAxis, dataset, series, item,
                    crosshairState);
            return;
        }
        if (series != 0) {
            return;
        }
        if (item == 0) {
            outline = new Path2D.Double[] {new Path2D.Double(), new Path2D.Double()};
        }
        for (int s = 0; s < 2; s++) {
            double x = domainAxis.valueToJava2D(dataset.getXValue(s, item), dataArea, plot.getDomainAxisEdge());
            double y = rangeAxis.valueToJava2D(dataset.getYValue(s, item), dataArea, plot.getRangeAxisEdge());
            if (item == 0) {
                outline[s].moveTo(x, y);
            } else {
                outline[s].lineTo(x, y);
            }
        }
        if (item == dataset.getItemCount(0) - 1) {
            for (int s = 0; s < 2; s++) {
                g2.setPaint(getItemPaint(s, item));
                g2.setStroke(getItemStroke(s, item));
                g2.draw(outline[s]);
            }
            outline = null;
        }
    }
}
