package org.trimwright.charts;

import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;

/**
 * Segmentation advice as cost against risk: one point per split M (M unary MSBs, n - M binary LSBs) with
 * x = decoder plus switch cost in NAND2 equivalents and y = P(non-monotonic) by the union bound over distinct
 * steps (exact Gaussian per step), on a log scale. Splits that are monotonic by construction (risk 0) cannot sit on
 * a log axis; they are named in the subtitle. Risks below {@link #FLOOR} (including those that underflow to 0) are
 * drawn at the floor and say so in their label. Series 0 holds every split not monotonic by construction, series 1
 * the cheapest split meeting the limits (when it is drawn).
 */
public final class SegmentationChart {

    /** Smallest risk drawn; smaller union bounds are clipped to it and say so in their label. */
    public static final double FLOOR = 1e-15;

    private SegmentationChart() {
    }

    /** Builds the chart. */
    public static JFreeChart of(FieldReport r) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(new NumberAxis("Decoder + switch cost [NAND2 eq.]"));
        LogAxis risk = new LogAxis("P(non-monotonic), union bound");
        risk.setSmallestValue(FLOOR);
        plot.setRangeAxis(risk);
        SegmentationAdvice advice = r.mismatch().map(MismatchReport::segmentation).orElse(null);
        String subtitle;
        XYSeriesCollection data = new XYSeriesCollection();
        if (advice == null) {
            subtitle = "no segmentation advice: the field has no unit element";
            data.addSeries(new XYSeries("split M", false, true));
        } else {
            data = dataset(advice);
            subtitle = subtitle(advice, r.mismatch().get());
            double top = FLOOR;
            for (SegmentationRow row : advice.rows()) {
                if (!row.monotonicGuaranteed()) {
                    top = Math.max(top, row.pNonMonotonicBound());
                    XYTextAnnotation a = new XYTextAnnotation("M=" + row.unaryBits()
                            + (row.pNonMonotonicBound() < FLOOR ? " (<" + FLOOR + ")" : ""), row.cost(),
                            Math.max(row.pNonMonotonicBound(), FLOOR));
                    a.setFont(ChartLook.TICK);
                    a.setPaint(ChartLook.SLATE);
                    a.setTextAnchor(TextAnchor.BOTTOM_LEFT);
                    plot.addAnnotation(a);
                }
            }
            double maxRisk = r.mismatch().get().limits().maxNonMonotonic();
            risk.setRange(FLOOR / 10, Math.min(10, Math.max(top, maxRisk) * 100));
            if (maxRisk > 0) {
                ValueMarker limit = new ValueMarker(maxRisk, ChartLook.PLUM, ChartLook.dashed());
                limit.setLabel("limit " + maxRisk);
                limit.setLabelFont(ChartLook.TICK);
                limit.setLabelPaint(ChartLook.PLUM);
                limit.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
                plot.addRangeMarker(limit);
            }
        }
        plot.setDataset(data);
        XYLineAndShapeRenderer points = new XYLineAndShapeRenderer(true, true);
        points.setSeriesPaint(0, ChartLook.INK);
        points.setSeriesStroke(0, ChartLook.line(1.0f));
        points.setSeriesPaint(1, ChartLook.MOSS);
        points.setSeriesLinesVisible(1, false);
        points.setSeriesShape(1, new java.awt.geom.Ellipse2D.Double(-6, -6, 12, 12));
        plot.setRenderer(points);
        JFreeChart chart = new JFreeChart("Segmentation of " + r.coding().name(), ChartLook.TITLE, plot, true);
        return ChartLook.apply(chart, subtitle);
    }

    /** Series 0: every split with non-zero risk in M order; series 1: the cheapest meeting split if drawable. */
    static XYSeriesCollection dataset(SegmentationAdvice advice) {
        XYSeries all = new XYSeries("split M (cost, risk)", false, true);
        XYSeries best = new XYSeries("cheapest split meeting the limits", false, true);
        for (SegmentationRow row : advice.rows()) {
            if (!row.monotonicGuaranteed()) {
                double y = Math.max(row.pNonMonotonicBound(), FLOOR);
                all.add(row.cost(), y, false);
                if (row.unaryBits() == advice.cheapestMeeting()) {
                    best.add(row.cost(), y, false);
                }
            }
        }
        XYSeriesCollection c = new XYSeriesCollection();
        c.addSeries(all);
        c.addSeries(best);
        return c;
    }

    private static String subtitle(SegmentationAdvice advice, MismatchReport m) {
        List<String> safe = new ArrayList<>();
        // risk 0 without a guarantee is an underflow of the union bound, drawn at the floor
        for (SegmentationRow row : advice.rows()) {
            if (row.monotonicGuaranteed()) {
                safe.add("M=" + row.unaryBits());
            }
        }
        String s = "cost = decoder NAND2 eq. + switches; risk: exact Gaussian P(step < 0) per distinct step, "
                + "union bound";
        if (!safe.isEmpty()) {
            s += "; monotonic by construction (not drawn): " + String.join(", ", safe);
        }
        s += advice.cheapestMeeting() >= 0 ? "; cheapest meeting the limits: M=" + advice.cheapestMeeting()
                : "; no split meets the limits";
        return s;
    }
}
