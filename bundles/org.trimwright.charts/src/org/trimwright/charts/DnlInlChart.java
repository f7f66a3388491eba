package org.trimwright.charts;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;

/**
 * Per-code standard deviations: DNL sigma of the step into each level (exact, from the element sigmas) and INL
 * sigma under the INL definition of the field's limits (endpoint and best fit: first order; absolute: exact).
 * Both in nominal LSB; x is the signed step count of the level.
 */
public final class DnlInlChart {

    /** Series index of DNL sigma in the dataset. */
    public static final int DNL = 0;
    /** Series index of INL sigma in the dataset. */
    public static final int INL = 1;

    private DnlInlChart() {
    }

    /** Builds the chart; a field without mismatch statistics gets an empty plot saying so. */
    public static JFreeChart of(FieldReport r) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(new NumberAxis("Signed step s of the level"));
        plot.setRangeAxis(new NumberAxis("Standard deviation [LSB]"));
        XYSeriesCollection data = new XYSeriesCollection();
        String subtitle;
        if (r.mismatch().isPresent()) {
            MismatchReport m = r.mismatch().get();
            InlDefinition def = m.limits().inlDefinition();
            data = dataset(m, def);
            subtitle = "DNL = step \u2212 1 LSB, sigma exact per transition; INL definition: " + describe(def)
                    + (def == InlDefinition.ABSOLUTE ? " (exact)" : " (first order)");
        } else {
            subtitle = "no unit element given: no mismatch statistics for this field";
        }
        plot.setDataset(data);
        XYLineAndShapeRenderer lines = new XYLineAndShapeRenderer(true, false);
        lines.setSeriesPaint(DNL, ChartLook.INK);
        lines.setSeriesPaint(INL, ChartLook.COPPER);
        lines.setSeriesStroke(DNL, ChartLook.line(1.5f));
        lines.setSeriesStroke(INL, ChartLook.line(1.5f));
        plot.setRenderer(lines);
        JFreeChart chart = new JFreeChart("DNL and INL sigma of " + r.coding().name(), ChartLook.TITLE, plot, true);
        return ChartLook.apply(chart, subtitle);
    }

    /** The two series: DNL sigma for levels 1.. and INL sigma for all levels under {@code def}. */
    static XYSeriesCollection dataset(MismatchReport m, InlDefinition def) {
        MismatchReport.PerCodeData pc = m.perCode();
        int first = m.field().firstSigned();
        double[] dnl = pc.dnlSigma();
        double[] inl = switch (def) {
            case ENDPOINT -> pc.inlSigmaEndpoint();
            case BEST_FIT -> pc.inlSigmaBestFit();
            case ABSOLUTE -> pc.inlSigmaAbsolute();
        };
        XYSeries d = new XYSeries("\u03C3 DNL", false, true);
        for (int k = 1; k < dnl.length; k++) {
            d.add(first + k, dnl[k], false);
        }
        XYSeries i = new XYSeries("\u03C3 INL (" + def.key() + ")", false, true);
        for (int k = 0; k < inl.length; k++) {
            i.add(first + k, inl[k], false);
        }
        XYSeriesCollection c = new XYSeriesCollection();
        c.addSeries(d);
        c.addSeries(i);
        return c;
    }

    /** The definition in words. */
    public static String describe(InlDefinition def) {
        return switch (def) {
            case ENDPOINT -> "endpoint (line through first and last level)";
            case BEST_FIT -> "best fit (least-squares line)";
            case ABSOLUTE -> "absolute (nominal LSB and zero)";
        };
    }
}
