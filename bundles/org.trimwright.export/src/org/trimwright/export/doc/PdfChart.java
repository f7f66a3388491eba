package org.trimwright.export.doc;

import java.awt.Graphics2D;
import java.io.IOException;

import org.trimwright.export.picture.Picture;

import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

/**
 * Charts in the PDF: each recorded picture is painted into a form XObject (vector graphics, text as text), placed
 * at the position of a {@link PageFlow} scaled to fit {@link #WIDTH} x {@link #HEIGHT} and centred across the text
 * width, half a leading below the text above it (where OpenPDF placed an {@code Image} of it, scaled to fit and
 * aligned in the middle); on the next page when it does not fit above the bottom margin.
 */
final class PdfChart {

    /** Room for a chart in the PDF, points. */
    static final float WIDTH = 515;
    static final float HEIGHT = 258;

    private final PdfWriter writer;
    private final PdfFonts fonts;
    private final PdfChartCanvas.Shared resources;

    PdfChart(PdfWriter writer, PdfFonts fonts) {
        this.writer = writer;
        this.fonts = fonts;
        this.resources = new PdfChartCanvas.Shared(fonts.base());
    }

    /** Scale of {@code picture} in the PDF, in percent: the largest that fits (the arithmetic of scaleToFit). */
    private static float percent(Picture picture) {
        float w = (float) picture.width();
        float h = (float) picture.height();
        return Math.min(WIDTH * 100 / w, HEIGHT * 100 / h);
    }

    /**
     * Scale of {@code picture} in the PDF. OpenPDF writes a factor of 1 or more with two decimals only, so such a
     * factor is rounded down here (else a small chart could be drawn up to 1 % wider than the text).
     */
    static float scale(Picture picture) {
        float s = percent(picture) / 100f;
        return s < 1 ? s : (float) Math.floor(s * 100) / 100;
    }

    /** Height of {@code picture} in the PDF. */
    static float height(Picture picture) {
        return (float) picture.height() * scale(picture);
    }

    /** On a {@link PageFlow#trial()}: moves it as placing the picture would. */
    static void start(PageFlow trial, Picture picture) {
        trial.picture(height(picture));
    }

    /** Paints {@code picture} and places it at the flow's position. */
    void place(PageFlow flow, Picture picture) throws DocumentException {
        PdfContentByte cb = writer.getDirectContent();
        float w = (float) picture.width();
        float h = (float) picture.height();
        PdfTemplate tp = cb.createTemplate(w, h);
        Graphics2D g = picture.plain() ? new PdfChartCanvas(tp, h, resources) : tp.createGraphics(w, h, fonts);
        picture.paint(g);
        g.dispose();
        float scale = scale(picture);
        float lower = flow.picture(h * scale);
        float x = flow.left() + (flow.right() - flow.left() - w * scale) / 2;
        cb.addTemplate(tp, scale, 0, 0, scale, x, lower);
        try {
            // write the chart's form XObject now and drop its content: otherwise every chart of the document stays
            // in memory until close (memory would grow with the number of fields)
            writer.releaseTemplate(tp);
        } catch (IOException e) {
            throw new DocumentException(e);
        }
    }
}
