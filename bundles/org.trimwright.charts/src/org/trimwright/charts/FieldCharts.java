package org.trimwright.charts;

import org.jfree.chart.JFreeChart;
import org.trimwright.analysis.FieldReport;

/**
 * The charts of one field, built from its {@link FieldReport} only (nothing is recomputed). Each chart carries the
 * definition or method of its figures in its subtitle. The same charts feed the workbench (drawn in SWT) and the
 * exported document (drawn as SVG and PDF vector graphics).
 */
public final class FieldCharts {

    private FieldCharts() {
    }

    /** Nominal value per code in value order, with the Monte Carlo envelope when statistics exist. */
    public static JFreeChart transfer(FieldReport r) {
        return TransferChart.of(r);
    }

    /** Per-code DNL sigma and INL sigma (INL definition of the field's limits, named in the subtitle). */
    public static JFreeChart dnlInl(FieldReport r) {
        return DnlInlChart.of(r);
    }

    /** Histograms of max|DNL| and max|INL| over the Monte Carlo trials with the field's limits marked. */
    public static JFreeChart errorDistribution(FieldReport r) {
        return ErrorDistributionChart.of(r);
    }

    /** Cost in NAND2 equivalents against P(non-monotonic) for each segmentation split M. */
    public static JFreeChart segmentation(FieldReport r) {
        return SegmentationChart.of(r);
    }
}
