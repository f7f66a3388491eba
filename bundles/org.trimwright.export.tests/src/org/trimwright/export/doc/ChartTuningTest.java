package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.charts.FieldCharts;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.spec.DemoSpec;

/** Document charts: same axes and data, log decades as text labels, line series as one path. */
class ChartTuningTest {

    private static FieldReport binaryTenBitReport() {
        ChipSpec spec = DemoSpec.load();
        Field f = spec.getBlocks().stream().filter(b -> b.getName().equals("OSC")).findFirst().orElseThrow()
                .getRegisters().get(0).getFields().stream().filter(x -> x.getName().equals("FREQ_COARSE"))
                .findFirst().orElseThrow();
        return FieldAnalyzer.analyze(f, AnalysisSettings.DEFAULTS.withTrials(500));
    }

    @Test
    void logAxisKeepsItsRangeAndLabelsEveryDecadeAsText() {
        FieldReport r = binaryTenBitReport();
        JFreeChart plain = FieldCharts.segmentation(r);
        ValueAxis before = ((XYPlot) plain.getPlot()).getRangeAxis();
        JFreeChart tuned = ChartTuning.forDocument(FieldCharts.segmentation(r));
        ValueAxis after = ((XYPlot) tuned.getPlot()).getRangeAxis();
        assertTrue(after instanceof ChartTuning.PlainLogAxis);
        assertEquals(before.getRange(), after.getRange());
        assertEquals(before.getLabel(), after.getLabel());
        assertEquals(((XYPlot) plain.getPlot()).getDataset(), ((XYPlot) tuned.getPlot()).getDataset());
        String svg = ChartSvg.svg(tuned, "t_");
        Matcher m = Pattern.compile(">1e-(\\d+)</text>").matcher(svg);
        int labels = 0;
        while (m.find()) {
            labels++;
        }
        assertTrue(labels >= 3, "decade labels drawn as text: " + labels);
        assertTrue(svg.length() < ChartSvg.svg(plain, "p_").length(), "smaller than the outline-glyph labels");
    }

    @Test
    void decadeLabelsNameTheirPowerOfTen() {
        ChartTuning.PlainLogAxis a = new ChartTuning.PlainLogAxis("x");
        assertEquals("1e-6", a.label(1e-6));
        assertEquals("1", a.label(1));
        assertEquals("10", a.label(10));
        assertEquals("1e3", a.label(1000));
        assertFalse(a.label(3e-6).startsWith("1e"));
    }

    @Test
    void transferStepsAsOnePathLookTheSameAndShrinkTheSvg() {
        FieldReport r = binaryTenBitReport();
        JFreeChart plain = FieldCharts.transfer(r);
        JFreeChart tuned = ChartTuning.forDocument(FieldCharts.transfer(r));
        assertTrue(((XYPlot) tuned.getPlot()).getRenderer(0) instanceof PathStepRenderer);
        BufferedImage a = raster(plain);
        BufferedImage b = raster(tuned);
        long differ = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                if (a.getRGB(x, y) != b.getRGB(x, y)) {
                    differ++;
                }
            }
        }
        // the same corners drawn without antialiasing: every pixel the same (a few allowed for line joins)
        assertTrue(differ <= a.getWidth() * a.getHeight() / 1000, differ + " pixels differ");
        String svg = ChartSvg.svg(tuned, "t_");
        String before = ChartSvg.svg(plain, "p_");
        assertTrue(svg.length() * 4 < before.length(), svg.length() + " vs " + before.length());
        assertTrue(count(svg, "<line") < 200, "1024 steps are no longer separate lines");
    }

    private static BufferedImage raster(JFreeChart c) {
        BufferedImage img = new BufferedImage(ChartSvg.WIDTH, ChartSvg.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        c.setAntiAlias(false);
        c.setTextAntiAlias(false);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
        c.draw(g, new Rectangle2D.Double(0, 0, ChartSvg.WIDTH, ChartSvg.HEIGHT));
        g.dispose();
        return img;
    }

    private static int count(String s, String what) {
        int n = 0;
        for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
            n++;
        }
        return n;
    }
}
