package org.trimwright.charts;


import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYDifferenceRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.mismatch.MismatchReport;

/**
 * Transfer curve: the nominal value of every code in value order (x = signed step count s, y = atZero + s * step,
 * from the step table) and, when the field has mismatch statistics, the Monte Carlo envelope: for level k the ideal
 * value plus the smallest and largest endpoint INL seen over the envelope trials, times the step.
 */
public final class TransferChart {

    /** Dataset index of the nominal steps. */
    public static final int NOMINAL = 0;
    /** Dataset index of the envelope (series 0: lowest, series 1: highest); absent without statistics. */
    public static final int ENVELOPE = 1;

    private TransferChart() {
    }

    /** Builds the chart. */
    public static JFreeChart of(FieldReport r) {
        String unit = r.inputs().unit().symbol();
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(new NumberAxis("Signed step s (codes in value order)"));
        NumberAxis range = new NumberAxis(ChartLook.withUnit("Nominal value", unit));
        range.setAutoRangeIncludesZero(false);
        plot.setRangeAxis(range);

        plot.setDataset(NOMINAL, nominal(r.coding().stepTable()));
        XYStepRenderer steps = new XYStepRenderer();
        steps.setSeriesPaint(0, ChartLook.INK);
        steps.setSeriesStroke(0, ChartLook.line(1.6f));
        steps.setDefaultShapesVisible(false);
        plot.setRenderer(NOMINAL, steps);

        String method = "nominal: atZero + s \u00B7 step from the step table";
        if (r.mismatch().isPresent() && r.mismatch().get().perCode().envelopeTrials() > 0) {
            MismatchReport m = r.mismatch().get();
            plot.setDataset(ENVELOPE, envelope(r, m));
            XYDifferenceRenderer band = new XYDifferenceRenderer(ChartLook.withAlpha(ChartLook.MOSS, 70),
                    ChartLook.withAlpha(ChartLook.MOSS, 70), false);
            band.setSeriesPaint(0, ChartLook.MOSS);
            band.setSeriesPaint(1, ChartLook.MOSS);
            band.setSeriesStroke(0, ChartLook.line(0.8f));
            band.setSeriesStroke(1, ChartLook.line(0.8f));
            plot.setRenderer(ENVELOPE, band);
            method += "; envelope: ideal level + min/max endpoint INL over " + m.perCode().envelopeTrials()
                    + " Monte Carlo trials";
        }
        JFreeChart chart = new JFreeChart("Transfer of " + r.coding().name(), ChartLook.TITLE, plot, true);
        return ChartLook.apply(chart, method);
    }

    /** Nominal values per code sorted by signed step count (ties by code). */
    static XYSeriesCollection nominal(StepTable table) {
        // sort (signed steps, code) pairs packed in one long each: no row objects for what is two numbers per code
        long[] order = new long[table.size()];
        for (int code = 0; code < order.length; code++) {
            order[code] = ((long) table.map().signedSteps(code) << 32) | code;
        }
        java.util.Arrays.sort(order);
        XYSeries s = new XYSeries("nominal step value", false, true);
        for (long o : order) {
            int code = (int) o;
            s.add(table.map().signedSteps(code), table.value(code), false);
        }
        return new XYSeriesCollection(s);
    }

    static XYSeriesCollection envelope(FieldReport r, MismatchReport m) {
        MismatchReport.PerCodeData pc = m.perCode();
        double[] lo = pc.inlEndpointMin();
        double[] hi = pc.inlEndpointMax();
        int first = m.field().firstSigned();
        double atZero = r.inputs().atZero();
        double step = r.inputs().step();
        XYSeries low = new XYSeries("Monte Carlo lowest", false, true);
        XYSeries high = new XYSeries("Monte Carlo highest", false, true);
        for (int k = 0; k < Math.min(lo.length, hi.length); k++) {
            double ideal = atZero + (first + k) * step;
            double a = ideal + lo[k] * step;
            double b = ideal + hi[k] * step;
            low.add(first + k, Math.min(a, b), false);
            high.add(first + k, Math.max(a, b), false);
        }
        XYSeriesCollection c = new XYSeriesCollection();
        c.addSeries(high);
        c.addSeries(low);
        return c;
    }
}
