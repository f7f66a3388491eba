package org.trimwright.export.picture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.Random;
import java.util.function.Consumer;

import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.charts.FieldCharts;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.spec.DemoSpec;

/**
 * A recorded picture painted into Java 2D's own raster renderer (the JDK's {@code Graphics2D} on a
 * {@code BufferedImage}, the reference) gives the same pixels as drawing directly.
 */
class PictureTest {

    private static final int W = 760;
    private static final int H = 380;

    private static BufferedImage raster(Consumer<Graphics2D> draw) {
        BufferedImage img = new BufferedImage(W, H, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        draw.accept(g);
        g.dispose();
        return img;
    }

    private static long differing(BufferedImage a, BufferedImage b) {
        long n = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 0; x < W; x++) {
                if (a.getRGB(x, y) != b.getRGB(x, y)) {
                    n++;
                }
            }
        }
        return n;
    }

    /** Pixels where some colour channel differs by more than {@code by} (antialiased edges differ by less). */
    private static long differingBy(BufferedImage a, BufferedImage b, int by) {
        long n = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 0; x < W; x++) {
                int p = a.getRGB(x, y);
                int q = b.getRGB(x, y);
                for (int shift = 0; shift < 24; shift += 8) {
                    if (Math.abs(((p >> shift) & 0xFF) - ((q >> shift) & 0xFF)) > by) {
                        n++;
                        break;
                    }
                }
            }
        }
        return n;
    }

    private static Picture record(Consumer<Graphics2D> draw) {
        RecordingGraphics r = new RecordingGraphics(W, H);
        draw.accept(r);
        r.dispose();
        return r.picture();
    }

    private static FieldReport demoReport(String name) {
        ChipSpec spec = DemoSpec.load();
        Field f = spec.getBlocks().stream().flatMap(b -> b.getRegisters().stream())
                .flatMap(r -> r.getFields().stream()).filter(x -> x.getName().equals(name)).findFirst().orElseThrow();
        return FieldAnalyzer.analyze(f, AnalysisSettings.DEFAULTS.withTrials(300));
    }

    @Test
    void everyChartOfAFieldPaintsPixelForPixelAsDrawnDirectly() {
        FieldReport r = demoReport("FREQ_COARSE");
        for (JFreeChart c : new JFreeChart[] {FieldCharts.transfer(r), FieldCharts.dnlInl(r),
            FieldCharts.errorDistribution(r), FieldCharts.segmentation(r)}) {
            Rectangle2D area = new Rectangle2D.Double(0, 0, W, H);
            BufferedImage direct = raster(g -> c.draw(g, area));
            Picture p = record(g -> c.draw(g, area));
            BufferedImage replayed = raster(p::paint);
            assertEquals(0, differing(direct, replayed), c.getTitle().getText());
            assertTrue(p.size() > 100, "a chart is hundreds of calls: " + p.size());
        }
    }

    /**
     * Runs of lines in one style (grid lines) recorded as one path each, as the document records its charts: fewer
     * calls, and the pixels of the JDK's rendering differ only where lines of one run cross or touch (covered once
     * instead of twice), by less than a quarter of the colour range.
     */
    @Test
    void mergedLineRunsLookTheSameWithFewerCalls() {
        FieldReport r = demoReport("FREQ_COARSE");
        for (JFreeChart c : new JFreeChart[] {FieldCharts.transfer(r), FieldCharts.dnlInl(r),
            FieldCharts.errorDistribution(r), FieldCharts.segmentation(r)}) {
            Rectangle2D area = new Rectangle2D.Double(0, 0, W, H);
            // as the document records it (tuned for print, runs of lines merged); the chart is tuned in place
            Picture merged = new org.trimwright.export.doc.ChartFigure(() -> c).drawn().picture();
            BufferedImage direct = raster(g -> c.draw(g, area));
            Picture each = record(g -> c.draw(g, area));
            long differ = differingBy(direct, raster(merged::paint), 64);
            assertTrue(differ < W * H / 1000, c.getTitle().getText() + ": " + differ + " pixels differ");
            assertTrue(merged.size() < each.size(), merged.size() + " calls against " + each.size());
            String svgEach = org.trimwright.export.doc.ChartSvg.svg(each, "e_");
            String svgMerged = org.trimwright.export.doc.ChartSvg.svg(merged, "m_");
            assertTrue(svgEach.split("<line", -1).length > 10, "grid lines drawn one by one");
            assertEquals(1, svgMerged.split("<line", -1).length, "no separate line elements left");
        }
    }

    @Test
    void shapesChangedAfterDrawingArePaintedAsTheyWereWhenDrawn() {
        Consumer<Graphics2D> draw = g -> {
            Line2D line = new Line2D.Double();
            Rectangle2D rect = new Rectangle2D.Double();
            g.setPaint(Color.BLUE);
            g.setStroke(new BasicStroke(2f));
            for (int i = 0; i < 20; i++) {
                line.setLine(10 + 30 * i, 10, 30 + 30 * i, 200);
                g.draw(line);
                rect.setRect(10 + 30 * i, 250, 20, 20 + i);
                g.fill(rect);
            }
        };
        assertEquals(0, differing(raster(draw), raster(record(draw)::paint)));
    }

    @Test
    void createdGraphicsKeepTheirOwnStateAndMakeThePictureNotPlain() {
        Consumer<Graphics2D> draw = g -> {
            g.setPaint(Color.RED);
            Graphics2D child = (Graphics2D) g.create();
            child.translate(100, 50);
            child.rotate(0.3);
            child.setPaint(Color.GREEN);
            child.fill(new Rectangle2D.Double(0, 0, 80, 40));
            child.dispose();
            g.fill(new Ellipse2D.Double(300, 100, 60, 60));
        };
        Picture p = record(draw);
        assertFalse(p.plain());
        assertEquals(0, differing(raster(draw), raster(p::paint)));
    }

    @Test
    void plainOnlyForWhatALeanPainterSupports() {
        assertTrue(record(g -> {
            g.setPaint(new Color(10, 20, 30, 70));
            g.setStroke(new BasicStroke(1.5f));
            g.rotate(0.5, 20, 20);
            g.clip(new Rectangle2D.Double(0, 0, 100, 100));
            g.drawString("text", 10f, 20f);
            g.draw(new Line2D.Double(0, 0, 5, 5));
        }).plain());
        assertFalse(record(g -> g.setPaint(new GradientPaint(0, 0, Color.RED, 10, 10, Color.BLUE))).plain());
        assertFalse(record(g -> g.drawOval(1, 2, 3, 4)).plain());
    }

    /** The clip and transform bookkeeping agrees with the JDK's Graphics2D on random sequences. */
    @Test
    void clipAndTransformAsJava2DReportsThem() {
        Random rnd = new Random(7);
        for (int round = 0; round < 200; round++) {
            Graphics2D ref = new BufferedImage(10, 10, BufferedImage.TYPE_INT_RGB).createGraphics();
            RecordingGraphics rec = new RecordingGraphics(W, H);
            for (int step = 0; step < 8; step++) {
                int op = rnd.nextInt(6);
                double a = rnd.nextDouble() * 200 - 50;
                double b = rnd.nextDouble() * 200 - 50;
                Shape s = new Rectangle2D.Double(a, b, rnd.nextDouble() * 300, rnd.nextDouble() * 300);
                for (Graphics2D g : new Graphics2D[] {ref, rec}) {
                    switch (op) {
                        case 0 -> g.translate(a, b);
                        case 1 -> g.scale(1 + a / 400, 1 + b / 400);
                        case 2 -> g.clip(s);
                        case 3 -> g.setClip(s);
                        case 4 -> g.setClip(null);
                        default -> g.rotate(a / 100);
                    }
                }
                Shape x = ref.getClip();
                Shape y = rec.getClip();
                if (x == null) {
                    assertNull(y, "round " + round + " step " + step);
                } else {
                    Rectangle2D bx = x.getBounds2D();
                    Rectangle2D by = y.getBounds2D();
                    double tol = 1e-6 * (1 + Math.abs(bx.getMaxX()) + Math.abs(bx.getMaxY()));
                    boolean emptyBoth = bx.isEmpty() && by.isEmpty();
                    assertTrue(emptyBoth || (Math.abs(bx.getMinX() - by.getMinX()) < tol
                            && Math.abs(bx.getMinY() - by.getMinY()) < tol
                            && Math.abs(bx.getMaxX() - by.getMaxX()) < tol
                            && Math.abs(bx.getMaxY() - by.getMaxY()) < tol),
                            "round " + round + " step " + step + ": " + bx + " vs " + by);
                }
                assertEquals(ref.getTransform(), rec.getTransform());
            }
        }
    }
}
