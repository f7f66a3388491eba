package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.charts.FieldCharts;
import org.trimwright.export.picture.Picture;
import org.trimwright.model.Field;
import org.trimwright.model.spec.DemoSpec;

import com.lowagie.text.Document;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfWriter;

/**
 * The lean chart painter against OpenPDF's general {@code PdfGraphics2D}: both pages rendered by PDFBox (an
 * independent PDF renderer) look the same and carry the same text.
 */
class PdfChartCanvasTest {

    private static final float W = ChartSvg.WIDTH;
    private static final float H = ChartSvg.HEIGHT;

    private static FieldReport report(String name) {
        Field f = DemoSpec.load().getBlocks().stream().flatMap(b -> b.getRegisters().stream())
                .flatMap(r -> r.getFields().stream()).filter(x -> x.getName().equals(name)).findFirst().orElseThrow();
        return FieldAnalyzer.analyze(f, AnalysisSettings.DEFAULTS.withTrials(300));
    }

    /** One page per painter: page 1 through PdfGraphics2D, page 2 through the lean painter. */
    private static byte[] twoPages(Picture p) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(new Rectangle(W, H), 0, 0, 0, 0);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        doc.open();
        PdfFonts fonts = new PdfFonts();
        PdfContentByte cb = writer.getDirectContent();
        Graphics2D general = cb.createGraphics(W, H, fonts);
        p.paint(general);
        general.dispose();
        doc.newPage();
        PdfChartCanvas lean = new PdfChartCanvas(cb, H, new PdfChartCanvas.Shared(fonts.base()));
        p.paint(lean);
        lean.dispose();
        doc.close();
        return out.toByteArray();
    }

    @Test
    void everyDemoChartLooksAndReadsTheSameAsThroughPdfGraphics2D() throws Exception {
        for (String name : new String[] {"FREQ_COARSE", "VREF", "VOUT_SEL"}) {
            FieldReport r = report(name);
            for (JFreeChart c : new JFreeChart[] {FieldCharts.transfer(r), FieldCharts.dnlInl(r),
                FieldCharts.errorDistribution(r), FieldCharts.segmentation(r)}) {
                Picture p = new ChartFigure(() -> c).drawn().picture();
                assertTrue(p.plain(), "document charts are plain pictures");
                try (PDDocument pdf = Loader.loadPDF(twoPages(p))) {
                    PDFRenderer render = new PDFRenderer(pdf);
                    BufferedImage a = render.renderImageWithDPI(0, 144);
                    BufferedImage b = render.renderImageWithDPI(1, 144);
                    long far = 0;
                    for (int y = 0; y < a.getHeight(); y++) {
                        for (int x = 0; x < a.getWidth(); x++) {
                            if (distance(a.getRGB(x, y), b.getRGB(x, y)) > 96) {
                                far++;
                            }
                        }
                    }
                    // edges may antialias a little differently; anything drawn differently shows as many pixels
                    long pixels = (long) a.getWidth() * a.getHeight();
                    assertTrue(far < pixels / 500, name + " / " + c.getTitle().getText() + ": " + far + " of "
                            + pixels + " pixels differ");
                    PDFTextStripper strip = new PDFTextStripper();
                    strip.setSortByPosition(true);
                    strip.setStartPage(1);
                    strip.setEndPage(1);
                    String ta = strip.getText(pdf);
                    strip.setStartPage(2);
                    strip.setEndPage(2);
                    assertEquals(ta, strip.getText(pdf), name);
                }
            }
        }
    }

    @Test
    void refusesWhatItDoesNotSupport() {
        PdfChartCanvas lean = new PdfChartCanvas(null, H, new PdfChartCanvas.Shared(new PdfFonts().base()));
        assertThrows(UnsupportedOperationException.class, () -> lean.setPaint(new java.awt.GradientPaint(0, 0,
                java.awt.Color.RED, 1, 1, java.awt.Color.BLUE)));
        assertThrows(UnsupportedOperationException.class, () -> lean.drawOval(0, 0, 4, 4));
        assertThrows(UnsupportedOperationException.class, lean::create);
        lean.setClip(new Rectangle2D.Double(0, 0, 10, 10));
        assertEquals(new Rectangle2D.Double(0, 0, 10, 10), lean.getClip().getBounds2D());
    }

    private static int distance(int p, int q) {
        int d = 0;
        for (int shift = 0; shift < 24; shift += 8) {
            d = Math.max(d, Math.abs(((p >> shift) & 0xFF) - ((q >> shift) & 0xFF)));
        }
        return d;
    }
}
