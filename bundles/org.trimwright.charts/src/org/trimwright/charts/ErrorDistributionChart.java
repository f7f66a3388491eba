package org.trimwright.charts;

import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.DefaultIntervalXYDataset;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.montecarlo.Histogram;
import org.trimwright.engine.mismatch.montecarlo.Metric;

/**
 * Distributions over the Monte Carlo trials of max|DNL| (nominal LSB) and max|INL| (the INL definition of the
 * field's limits), as histograms with the field's limits marked. Subplot 0 is DNL, subplot 1 is INL; each holds one
 * interval series (x = bin centre, interval = bin edges, y = trials in the bin).
 */
public final class ErrorDistributionChart {

    private ErrorDistributionChart() {
    }

    /** Builds the chart; a field without mismatch statistics gets empty subplots and a subtitle saying so. */
    public static JFreeChart of(FieldReport r) {
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(new NumberAxis("Largest |error| over all codes [LSB]"));
        plot.setGap(12);
        String subtitle;
        if (r.mismatch().isPresent()) {
            MismatchReport m = r.mismatch().get();
            InlDefinition def = m.limits().inlDefinition();
            plot.add(sub(find(m.histograms(), Metric.DNL), "max|DNL|", m.limits().maxDnlLsb(), ChartLook.INK), 1);
            plot.add(sub(find(m.histograms(), metric(def)), "max|INL| (" + def.key() + ")", m.limits().maxInlLsb(),
                    ChartLook.COPPER), 1);
            subtitle = m.run().trials() + " Monte Carlo trials, seed " + m.run().seed() + "; DNL in nominal LSB; INL "
                    + DnlInlChart.describe(def) + "; dashed: the field's limits";
        } else {
            plot.add(sub(null, "max|DNL|", Double.NaN, ChartLook.INK), 1);
            plot.add(sub(null, "max|INL|", Double.NaN, ChartLook.COPPER), 1);
            subtitle = "no unit element given: no mismatch statistics for this field";
        }
        if (r.mismatch().isPresent()) {
            double reach = Math.max(r.mismatch().get().limits().maxDnlLsb(), r.mismatch().get().limits().maxInlLsb());
            NumberAxis x = (NumberAxis) plot.getDomainAxis();
            x.setAutoRangeIncludesZero(true);
            double upper = Math.max(x.getUpperBound(), reach * 1.15);
            x.setRange(0, upper);
        }
        ChartLook.style(plot);
        for (Object o : plot.getSubplots()) {
            ChartLook.style((XYPlot) o);
        }
        JFreeChart chart = new JFreeChart("Error distribution of " + r.coding().name(), ChartLook.TITLE, plot, true);
        return ChartLook.apply(chart, subtitle);
    }

    /** The Monte Carlo metric of an INL definition. */
    public static Metric metric(InlDefinition def) {
        return switch (def) {
            case ENDPOINT -> Metric.INL_ENDPOINT;
            case BEST_FIT -> Metric.INL_BEST_FIT;
            case ABSOLUTE -> Metric.INL_ABSOLUTE;
        };
    }

    static Histogram find(List<Histogram> histograms, Metric metric) {
        for (Histogram h : histograms) {
            if (h.metric().equals(metric.key())) {
                return h;
            }
        }
        return null;
    }

    /** The interval dataset of a histogram (one series named {@code name}). */
    public static DefaultIntervalXYDataset dataset(Histogram h, String name) {
        DefaultIntervalXYDataset d = new DefaultIntervalXYDataset();
        if (h == null) {
            return d;
        }
        long[] counts = h.counts();
        double[][] s = new double[6][counts.length];
        for (int i = 0; i < counts.length; i++) {
            double lo = h.start() + i * h.width();
            s[0][i] = lo + h.width() / 2;
            s[1][i] = lo;
            s[2][i] = lo + h.width();
            s[3][i] = counts[i];
            s[4][i] = counts[i];
            s[5][i] = counts[i];
        }
        d.addSeries(name, s);
        return d;
    }

    private static XYPlot sub(Histogram h, String name, double limit, java.awt.Color colour) {
        XYBarRenderer bars = new XYBarRenderer(0.08);
        bars.setBarPainter(new StandardXYBarPainter());
        bars.setShadowVisible(false);
        bars.setSeriesPaint(0, colour);
        bars.setDrawBarOutline(false);
        NumberAxis trials = new NumberAxis("Trials per bin");
        XYPlot p = new XYPlot(dataset(h, name), null, trials, bars);
        if (Double.isFinite(limit)) {
            ValueMarker mark = new ValueMarker(limit, ChartLook.PLUM, ChartLook.dashed());
            mark.setLabel("limit " + limit + " LSB");
            mark.setLabelFont(ChartLook.TICK);
            mark.setLabelPaint(ChartLook.PLUM);
            mark.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            mark.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            p.addDomainMarker(mark);
        }
        return p;
    }
}
