package org.trimwright.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.IntervalXYDataset;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.montecarlo.Histogram;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.DemoSpec;

/** The chart datasets hold the report's own numbers (the report is the reference; nothing is recomputed). */
class FieldChartsTest {

    private static final List<FieldReport> REPORTS = new ArrayList<>();

    @BeforeAll
    static void analyseDemo() {
        ChipSpec spec = DemoSpec.load();
        AnalysisSettings settings = AnalysisSettings.DEFAULTS.withTrials(2000);
        for (Block b : spec.getBlocks()) {
            for (Register reg : b.getRegisters()) {
                for (Field f : reg.getFields()) {
                    REPORTS.add(FieldAnalyzer.analyze(f, settings));
                }
            }
        }
        assertTrue(REPORTS.stream().anyMatch(r -> r.mismatch().isPresent()), "demo has fields with statistics");
    }

    @Test
    void transferHoldsEveryCodeValueInValueOrder() {
        for (FieldReport r : REPORTS) {
            XYDataset d = FieldCharts.transfer(r).getXYPlot().getDataset(TransferChart.NOMINAL);
            assertEquals(r.coding().stepTable().size(), d.getItemCount(0), r.coding().name());
            double lastS = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < d.getItemCount(0); i++) {
                assertTrue(d.getXValue(0, i) >= lastS, "value order");
                lastS = d.getXValue(0, i);
            }
            for (StepRow row : r.coding().stepTable().rows()) {
                assertTrue(contains(d, 0, row.signedSteps(), row.value()), r.coding().name() + " code " + row.code());
            }
        }
    }

    @Test
    void transferEnvelopeBracketsTheIdealLevelByTheEndpointInlExtremes() {
        for (FieldReport r : REPORTS) {
            if (r.mismatch().isEmpty()) {
                continue;
            }
            MismatchReport m = r.mismatch().get();
            XYDataset env = FieldCharts.transfer(r).getXYPlot().getDataset(TransferChart.ENVELOPE);
            assertNotNull(env, r.coding().name());
            double[] lo = m.perCode().inlEndpointMin();
            double[] hi = m.perCode().inlEndpointMax();
            assertEquals(lo.length, env.getItemCount(0));
            double step = r.inputs().step();
            for (int k = 0; k < lo.length; k++) {
                double ideal = r.inputs().atZero() + (m.field().firstSigned() + k) * step;
                double a = ideal + lo[k] * step;
                double b = ideal + hi[k] * step;
                assertEquals(Math.max(a, b), env.getYValue(0, k), 1e-12 * Math.abs(ideal) + 1e-15);
                assertEquals(Math.min(a, b), env.getYValue(1, k), 1e-12 * Math.abs(ideal) + 1e-15);
            }
        }
    }

    @Test
    void dnlInlSigmaSeriesAreThePerCodeArraysUnderTheLimitsDefinition() {
        for (FieldReport r : REPORTS) {
            if (r.mismatch().isEmpty()) {
                continue;
            }
            MismatchReport m = r.mismatch().get();
            JFreeChart chart = FieldCharts.dnlInl(r);
            XYDataset d = chart.getXYPlot().getDataset();
            double[] dnl = m.perCode().dnlSigma();
            assertEquals(dnl.length - 1, d.getItemCount(DnlInlChart.DNL));
            for (int k = 1; k < dnl.length; k++) {
                assertEquals(dnl[k], d.getYValue(DnlInlChart.DNL, k - 1), 0.0);
                assertEquals(m.field().firstSigned() + k, d.getXValue(DnlInlChart.DNL, k - 1), 0.0);
            }
            InlDefinition def = m.limits().inlDefinition();
            double[] inl = def == InlDefinition.ENDPOINT ? m.perCode().inlSigmaEndpoint()
                    : def == InlDefinition.BEST_FIT ? m.perCode().inlSigmaBestFit() : m.perCode().inlSigmaAbsolute();
            for (int k = 0; k < inl.length; k++) {
                assertEquals(inl[k], d.getYValue(DnlInlChart.INL, k), 0.0);
            }
            assertTrue(subtitles(chart).contains(DnlInlChart.describe(def)), "definition named in subtitle");
        }
    }

    @Test
    void errorHistogramsHoldTheTrialCountsAndTheLimitsAreMarked() {
        for (FieldReport r : REPORTS) {
            if (r.mismatch().isEmpty()) {
                continue;
            }
            MismatchReport m = r.mismatch().get();
            JFreeChart chart = FieldCharts.errorDistribution(r);
            CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
            List<?> subs = plot.getSubplots();
            assertEquals(2, subs.size());
            Histogram dnl = ErrorDistributionChart.find(m.histograms(), Metric.DNL);
            Histogram inl = ErrorDistributionChart.find(m.histograms(),
                    ErrorDistributionChart.metric(m.limits().inlDefinition()));
            checkHistogram((XYPlot) subs.get(0), dnl, m.limits().maxDnlLsb(), m.run().trials());
            checkHistogram((XYPlot) subs.get(1), inl, m.limits().maxInlLsb(), m.run().trials());
        }
    }

    private static void checkHistogram(XYPlot p, Histogram h, double limit, long trials) {
        IntervalXYDataset d = (IntervalXYDataset) p.getDataset();
        long[] counts = h.counts();
        assertEquals(counts.length, d.getItemCount(0));
        long sum = h.overflow();
        for (int i = 0; i < counts.length; i++) {
            assertEquals(counts[i], d.getYValue(0, i), 0.0);
            assertEquals(h.start() + i * h.width(), d.getStartXValue(0, i), 1e-12);
            sum += counts[i];
        }
        assertEquals(trials, sum, "every trial counted once");
        assertEquals(1, p.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size());
        double marked = ((org.jfree.chart.plot.ValueMarker) p.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND)
                .iterator().next()).getValue();
        assertEquals(limit, marked, 0.0);
    }

    @Test
    void segmentationPointsAreCostAndUnionBoundOfEverySplitNotMonotonicByConstruction() {
        int checked = 0;
        for (FieldReport r : REPORTS) {
            if (r.mismatch().isEmpty() || r.mismatch().get().segmentation() == null) {
                continue;
            }
            XYDataset d = FieldCharts.segmentation(r).getXYPlot().getDataset();
            int i = 0;
            for (SegmentationRow row : r.mismatch().get().segmentation().rows()) {
                if (!row.monotonicGuaranteed()) {
                    assertEquals(row.cost(), d.getXValue(0, i), 0.0);
                    assertEquals(Math.max(row.pNonMonotonicBound(), SegmentationChart.FLOOR), d.getYValue(0, i), 0.0);
                    i++;
                    checked++;
                }
            }
            assertEquals(i, d.getItemCount(0));
        }
        assertTrue(checked > 0, "the demo has splits with a non-zero risk");
    }

    @Test
    void everyChartDrawsHeadlessWithoutError() {
        BufferedImage img = new BufferedImage(600, 400, BufferedImage.TYPE_INT_RGB);
        for (FieldReport r : REPORTS) {
            for (JFreeChart c : List.of(FieldCharts.transfer(r), FieldCharts.dnlInl(r),
                    FieldCharts.errorDistribution(r), FieldCharts.segmentation(r))) {
                Graphics2D g = img.createGraphics();
                c.draw(g, new java.awt.Rectangle(0, 0, 600, 400));
                g.dispose();
                assertFalse(subtitles(c).isEmpty(), "a subtitle names the method");
            }
        }
    }

    private static boolean contains(XYDataset d, int series, double x, double y) {
        for (int i = 0; i < d.getItemCount(series); i++) {
            if (d.getXValue(series, i) == x && d.getYValue(series, i) == y) {
                return true;
            }
        }
        return false;
    }

    private static String subtitles(JFreeChart c) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < c.getSubtitleCount(); i++) {
            if (c.getSubtitle(i) instanceof TextTitle t) {
                sb.append(t.getText()).append('\n');
            }
        }
        return sb.toString();
    }
}
