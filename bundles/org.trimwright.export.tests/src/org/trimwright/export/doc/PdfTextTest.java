package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.trimwright.export.picture.Picture;
import org.trimwright.export.picture.RecordingGraphics;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

/**
 * Text, caution boxes and charts set on a {@link PageFlow} land where OpenPDF's own {@code Document} layout (the
 * reference: paragraphs, a one-cell {@code PdfPTable}, a scaled {@code Image} of the chart) put them: the same pages
 * and, by PDFBox's reading of both files, every glyph and chart at the same place.
 */
class PdfTextTest {

    private static final BaseFont FONT = new PdfFonts().base();
    private static final Color PLUM = new Color(0x8E, 0x3B, 0x6F);
    private static final Color TINT = new Color(0xF8, 0xEE, 0xF4);

    /** One element of a test document. */
    private sealed interface El permits Para, Head, Box, Chart {
    }

    private record Para(String text, float size, float indent, float before, float after) implements El {
    }

    /** A heading that wraps (kept together); OpenPDF: a paragraph of one chunk with keep-together. */
    private record Head(String text, float size) implements El {
    }

    private record Box(String text) implements El {
    }

    private record Chart(Picture picture) implements El {
    }

    private static String words(Random rnd, int n) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            b.append(i == 0 ? "" : " ");
            int len = 1 + rnd.nextInt(9);
            for (int k = 0; k < len; k++) {
                b.append((char) ('a' + rnd.nextInt(26)));
            }
            if (rnd.nextInt(8) == 0) {
                b.append(rnd.nextBoolean() ? "-part" : ",").append(rnd.nextInt(100));
            }
        }
        return b.toString();
    }

    private static Picture picture(double w, double h) {
        RecordingGraphics g = new RecordingGraphics(w, h);
        g.setColor(Color.BLUE);
        g.fill(new Rectangle2D.Double(10, 10, w - 20, h - 20));
        g.dispose();
        return g.picture();
    }

    private static List<El> elements(long seed, int n) {
        Random rnd = new Random(seed);
        float[] sizes = {8f, 9.5f, 10.5f, 14f, 17f};
        List<El> els = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int kind = rnd.nextInt(10);
            if (kind < 6) {
                int len = rnd.nextInt(5) == 0 ? 40 + rnd.nextInt(300) : 1 + rnd.nextInt(30);
                els.add(new Para(words(rnd, len), sizes[rnd.nextInt(sizes.length)], rnd.nextInt(4) == 0 ? 14 : 0,
                        rnd.nextBoolean() ? 10 : 0, rnd.nextBoolean() ? 4 : 0));
            } else if (kind < 8) {
                els.add(new Box(words(rnd, rnd.nextInt(12) == 0 ? 1500 : 5 + rnd.nextInt(120))));
            } else if (kind < 9) {
                els.add(new Head(words(rnd, 20 + rnd.nextInt(20)), rnd.nextBoolean() ? 14f : 17f));
            } else {
                // larger than the room: scaled down (a factor below 1, which OpenPDF writes with five decimals)
                els.add(new Chart(picture(520 + rnd.nextInt(400), 260 + rnd.nextInt(300))));
            }
        }
        return els;
    }

    /** The reference: OpenPDF's Document layout. */
    private static byte[] openPdf(List<El> els) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 40, 40, 48, 48);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        writer.setStrictImageSequence(true);
        doc.open();
        for (El e : els) {
            if (e instanceof Para p) {
                Paragraph x = new Paragraph(p.text(), new Font(FONT, p.size()));
                x.setIndentationLeft(p.indent());
                x.setSpacingBefore(p.before());
                x.setSpacingAfter(p.after());
                doc.add(x);
            } else if (e instanceof Head h) {
                Paragraph x = new Paragraph(new Chunk(h.text(), new Font(FONT, h.size())));
                x.setSpacingAfter(4);
                x.setKeepTogether(true);
                doc.add(x);
            } else if (e instanceof Box b) {
                PdfPTable box = new PdfPTable(1);
                box.setWidthPercentage(100);
                PdfPCell cell = new PdfPCell(new Phrase(PdfText.CAUTION + b.text(), new Font(FONT, 9.5f)));
                cell.setBorder(PdfPCell.LEFT);
                cell.setBorderWidthLeft(3);
                cell.setBorderColorLeft(PLUM);
                cell.setBackgroundColor(TINT);
                cell.setPadding(5);
                box.addCell(cell);
                box.setSpacingBefore(4);
                box.setSpacingAfter(4);
                doc.add(box);
            } else if (e instanceof Chart c) {
                PdfContentByte cb = writer.getDirectContent();
                float w = (float) c.picture().width();
                float h = (float) c.picture().height();
                PdfTemplate tp = cb.createTemplate(w, h);
                Graphics2D g = new PdfChartCanvas(tp, h, new PdfChartCanvas.Shared(FONT));
                c.picture().paint(g);
                g.dispose();
                Image img = Image.getInstance(tp);
                img.scaleToFit(PdfChart.WIDTH, PdfChart.HEIGHT);
                img.setAlignment(Image.MIDDLE);
                doc.add(img);
            }
        }
        doc.close();
        return out.toByteArray();
    }

    /** The same elements on a page flow. */
    private static byte[] flow(List<El> els) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 40, 40, 48, 48);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        doc.open();
        PageFlow flow = new PageFlow(doc);
        PdfText text = new PdfText(writer.getDirectContent(), new GlyphWidths(FONT));
        PdfChart charts = new PdfChart(writer, new PdfFonts());
        for (El e : els) {
            if (e instanceof Para p) {
                PdfText.Style s = new PdfText.Style(p.size(), Color.BLACK, p.indent(), p.before(), p.after());
                text.paragraph(flow, text.lines(flow, p.text(), s), s, null);
            } else if (e instanceof Head h) {
                PdfText.Style s = new PdfText.Style(h.size(), Color.BLACK, 0, 0, 4);
                text.heading(flow, text.lines(flow, h.text(), s), s, null);
            } else if (e instanceof Box b) {
                text.caution(flow, text.cautionLines(flow, b.text(), 9.5f), 9.5f, PLUM, TINT);
            } else if (e instanceof Chart c) {
                charts.place(flow, c.picture());
            }
        }
        doc.close();
        return out.toByteArray();
    }

    @Test
    void paragraphsHeadingsBoxesAndChartsLandWhereOpenPdfsDocumentPutThem() throws Exception {
        int compared = 0;
        for (long seed = 1; seed <= 10; seed++) {
            List<El> els = elements(seed, 120);
            // the reference: OpenPDF's Document layout of the same elements; both files read back by PDFBox
            try (PDDocument ref = Loader.loadPDF(openPdf(els)); PDDocument got = Loader.loadPDF(flow(els))) {
                PdfPages.Content a = PdfPages.read(ref);
                PdfPages.Content b = PdfPages.read(got);
                // OpenPDF let a chart reach up to half a leading into the bottom margin; the flow starts a new page
                // instead, after which the layouts part: compare the pages before the first such chart
                int last = a.forms().stream().filter(f -> f.box().getMaxY() > PdfPages.BOTTOM + 0.01)
                        .mapToInt(f -> f.page() - 1).min().orElse(ref.getNumberOfPages());
                if (last == ref.getNumberOfPages()) {
                    assertEquals(ref.getNumberOfPages(), got.getNumberOfPages(), "seed " + seed + ": pages");
                }
                List<PdfPages.Glyph> ga = upTo(a.glyphs(), last);
                List<PdfPages.Glyph> gb = upTo(b.glyphs(), last);
                assertEquals(ga.size(), gb.size(), "seed " + seed + ": glyphs on pages 1 to " + last);
                for (int i = 0; i < ga.size(); i++) {
                    PdfPages.Glyph x = ga.get(i);
                    PdfPages.Glyph y = gb.get(i);
                    assertTrue(x.page() == y.page() && x.text().equals(y.text())
                            && Math.abs(x.x() - y.x()) < 0.02 && Math.abs(x.baseline() - y.baseline()) < 0.02,
                            "seed " + seed + ": " + x + " vs " + y);
                }
                List<PdfPages.Form> fa = a.forms().stream().filter(f -> f.page() <= last).toList();
                List<PdfPages.Form> fb = b.forms().stream().filter(f -> f.page() <= last).toList();
                assertEquals(fa.size(), fb.size(), "seed " + seed + ": charts");
                for (int i = 0; i < fa.size(); i++) {
                    Rectangle2D x = fa.get(i).box();
                    Rectangle2D y = fb.get(i).box();
                    assertTrue(fa.get(i).page() == fb.get(i).page() && Math.abs(x.getX() - y.getX()) < 0.02
                            && Math.abs(x.getY() - y.getY()) < 0.02 && Math.abs(x.getWidth() - y.getWidth()) < 0.02
                            && Math.abs(x.getHeight() - y.getHeight()) < 0.02, "seed " + seed + ": " + x + " vs " + y);
                }
                PdfPages.assertInsideMargins(b);
                compared += ga.size();
            }
        }
        assertTrue(compared > 100_000, "compared " + compared + " glyphs");
    }

    /** A chart smaller than the room is scaled up, by a factor OpenPDF writes with two decimals. */
    @Test
    void aSmallChartIsScaledUpAndStaysInsideTheMargins() throws Exception {
        List<El> els = List.of(new Para("before", 9.5f, 0, 0, 4), new Chart(picture(507, 244)),
                new Chart(picture(300, 151)));
        try (PDDocument pdf = Loader.loadPDF(flow(els))) {
            PdfPages.Content c = PdfPages.read(pdf); // PDFBox: the forms' boxes on the page
            PdfPages.assertInsideMargins(c);
            assertEquals(2, c.forms().size());
            for (PdfPages.Form f : c.forms()) {
                assertTrue(f.box().getWidth() > PdfChart.WIDTH - 6 || f.box().getHeight() > PdfChart.HEIGHT - 3,
                        "scaled up to nearly fill the room: " + f);
            }
        }
    }

    private static List<PdfPages.Glyph> upTo(List<PdfPages.Glyph> glyphs, int page) {
        // content order differs (OpenPDF writes text and boxes in separate layers): compare in reading order
        return glyphs.stream().filter(g -> g.page() <= page && !g.text().isBlank())
                .sorted(java.util.Comparator.comparingInt(PdfPages.Glyph::page)
                        .thenComparingDouble(g -> Math.round(g.baseline() * 10))
                        .thenComparingDouble(PdfPages.Glyph::x))
                .toList();
    }
}
