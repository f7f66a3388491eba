package org.trimwright.export.doc;

import java.awt.Color;
import java.awt.Graphics2D;
import java.io.OutputStream;
import java.util.List;
import java.util.zip.Deflater;

import org.trimwright.export.picture.Picture;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

/**
 * Writes the document as PDF with OpenPDF: title page, contents, then the same sections as the HTML file. Charts are
 * drawn through OpenPDF's Graphics2D into form XObjects, so they stay vector graphics with text as text. Every field
 * chapter starts on a new page.
 */
public final class PdfDocument {

    /** Chart size in the PDF, points. */
    static final float CHART_W = 515;
    static final float CHART_H = 258;

    private static final Color INK = new Color(0x1F, 0x4E, 0x79);
    private static final Color COPPER = new Color(0xC0, 0x6A, 0x2B);
    private static final Color MUTED = new Color(0x6B, 0x76, 0x80);
    private static final Color PLUM = new Color(0x8E, 0x3B, 0x6F);

    private final Document doc;
    private final PdfWriter writer;
    private final PdfFonts fonts = new PdfFonts();
    private final Font body;
    private final Font small;
    private final Font caption;
    private final Font h1;
    private final Font h2;
    private final Font h3;
    private final PdfRowTable rowTable;
    private final PdfChartCanvas.Shared chartResources;

    private PdfDocument(OutputStream out) throws DocumentException {
        doc = new Document(PageSize.A4, 40, 40, 48, 48);
        writer = PdfWriter.getInstance(doc, out);
        writer.setFullCompression();
        // zlib's fastest level: compressing thousands of pages and charts at the default level cost a fifth of the
        // PDF writer's time, for a file about a tenth smaller
        writer.setCompressionLevel(Deflater.BEST_SPEED);
        writer.setStrictImageSequence(true);
        body = new Font(fonts.base(), 9.5f);
        small = new Font(fonts.base(), 8f);
        caption = new Font(fonts.base(), 8f, Font.NORMAL, MUTED);
        h1 = new Font(fonts.base(), 17f, Font.NORMAL, INK);
        h2 = new Font(fonts.base(), 14f, Font.NORMAL, INK);
        h3 = new Font(fonts.base(), 10.5f, Font.NORMAL, COPPER);
        rowTable = new PdfRowTable(doc, writer, fonts.base(), INK);
        chartResources = new PdfChartCanvas.Shared(fonts.base());
    }

    /** Writes the whole document; {@code onSection} is told after each section (for progress). */
    public static void write(DocumentPlan plan, OutputStream out, Runnable onSection) throws DocumentException {
        write(plan, plan.sections(), out, onSection);
    }

    /**
     * Writes the whole document with the sections {@code sections} (the plan's, e.g. shared with the HTML writer
     * through {@link SharedSections}); {@code onSection} is told after each section.
     */
    public static void write(DocumentPlan plan, Iterable<Section> sections, OutputStream out, Runnable onSection)
            throws DocumentException {
        new PdfDocument(out).document(plan, sections, onSection);
    }

    private void document(DocumentPlan plan, Iterable<Section> sections, Runnable onSection)
            throws DocumentException {
        DocumentPlan.Title t = plan.title();
        doc.addTitle(t.chip() + " " + t.revision() + " control specification");
        doc.addAuthor(t.author());
        doc.addCreator("Trimwright");
        doc.open();
        titlePage(plan);
        doc.newPage();
        doc.add(new Paragraph("Contents", h1));
        for (DocumentPlan.Entry e : plan.contents()) {
            Paragraph p = new Paragraph(new Chunk(e.title(), e.level() == 1 ? body : small).setLocalGoto(e.id()));
            p.setIndentationLeft(e.level() == 1 ? 0 : 14);
            doc.add(p);
        }
        for (Section s : sections) {
            section(s);
            onSection.run();
        }
        doc.close();
    }

    private void titlePage(DocumentPlan plan) throws DocumentException {
        DocumentPlan.Title t = plan.title();
        Paragraph kind = new Paragraph("TRIM AND CONTROL SPECIFICATION", new Font(fonts.base(), 10f, Font.NORMAL,
                COPPER));
        kind.setSpacingBefore(160);
        doc.add(kind);
        Paragraph chip = new Paragraph(t.chip(), new Font(fonts.base(), 30f, Font.NORMAL, INK));
        chip.setSpacingAfter(10);
        doc.add(chip);
        doc.add(new Paragraph(t.description(), body));
        PdfPTable kv = new PdfPTable(new float[] {1, 4});
        kv.setWidthPercentage(70);
        kv.setHorizontalAlignment(Element.ALIGN_LEFT);
        kv.setSpacingBefore(30);
        String[][] rows = {{"Chip", t.chip()}, {"Revision", t.revision()}, {"Date", t.date()},
            {"Author", t.author()}, {"Fields", Integer.toString(plan.digest().fields().size())}};
        for (String[] r : rows) {
            kv.addCell(cell(r[0], caption, false));
            kv.addCell(cell(r[1], body, false));
        }
        doc.add(kv);
    }

    private boolean afterChapterHead;

    private void section(Section s) throws DocumentException {
        if (s.level() == 1 || (s.level() == 2 && !afterChapterHead)) {
            doc.newPage();
        }
        afterChapterHead = s.level() == 1 && s.parts().size() <= 1;
        Font f = s.level() == 1 ? h1 : s.level() == 2 ? h2 : h3;
        Paragraph head = new Paragraph(new Chunk(s.title(), f).setLocalDestination(s.id()));
        head.setSpacingBefore(s.level() == 3 ? 10 : 0);
        head.setSpacingAfter(4);
        // a one-line heading cannot split anyway; OpenPDF keeps a paragraph together by wrapping it in a table,
        // which costs as much as the table cells, so only headings that wrap ask for it
        head.setKeepTogether(fonts.base().getWidthPoint(s.title(), f.getSize()) > doc.right() - doc.left());
        doc.add(head);
        for (Part p : s.parts()) {
            part(p);
        }
    }

    private void part(Part p) throws DocumentException {
        if (p instanceof Part.Para para) {
            Paragraph x = new Paragraph(para.text(), body);
            x.setSpacingAfter(4);
            doc.add(x);
        } else if (p instanceof Part.Caution c) {
            PdfPTable box = new PdfPTable(1);
            box.setWidthPercentage(100);
            PdfPCell cell = new PdfPCell(new Phrase("Caution. " + c.text(), body));
            cell.setBorder(PdfPCell.LEFT);
            cell.setBorderWidthLeft(3);
            cell.setBorderColorLeft(PLUM);
            cell.setBackgroundColor(new Color(0xF8, 0xEE, 0xF4));
            cell.setPadding(5);
            box.addCell(cell);
            box.setSpacingBefore(4);
            box.setSpacingAfter(4);
            doc.add(box);
        } else if (p instanceof Part.KeyValues kv) {
            rowTable.write(KEY_VALUES, null, rows(kv), 4);
        } else if (p instanceof Part.Table tab) {
            table(tab);
        } else if (p instanceof Part.Chart c) {
            chart(c.figure().drawn().picture(), c.figure().caption(c.caption()));
        }
    }

    private static final PdfRowTable.Style KEY_VALUES = PdfRowTable.keyValues(MUTED);

    private static List<List<String>> rows(Part.KeyValues kv) {
        return kv.rows().stream().map(java.util.Arrays::asList).toList();
    }

    private void table(Part.Table tab) throws DocumentException {
        Paragraph cap = new Paragraph(tab.caption(), caption);
        doc.add(cap);
        rowTable.write(PdfRowTable.data(tab.header().size()), tab.header(), tab.rows(), 6);
    }

    private PdfPCell cell(String text, Font f, boolean shaded) {
        PdfPCell c = new PdfPCell(new Phrase(text, f));
        c.setBorder(PdfPCell.BOTTOM);
        c.setBorderColor(new Color(0xDD, 0xE2, 0xE7));
        c.setPadding(2.5f);
        if (shaded) {
            c.setBackgroundColor(new Color(0xFA, 0xFB, 0xFA));
        }
        return c;
    }

    private void chart(Picture picture, String title) throws DocumentException {
        PdfContentByte cb = writer.getDirectContent();
        float w = (float) picture.width();
        float h = (float) picture.height();
        PdfTemplate tp = cb.createTemplate(w, h);
        Graphics2D g = picture.plain() ? new PdfChartCanvas(tp, h, chartResources)
                : tp.createGraphics(w, h, fonts);
        picture.paint(g);
        g.dispose();
        Image img = Image.getInstance(tp);
        img.scaleToFit(CHART_W, CHART_H);
        img.setAlignment(Image.MIDDLE);
        doc.add(img);
        try {
            // write the chart's form XObject now and drop its content: otherwise every chart of the document stays
            // in memory until close (memory would grow with the number of fields)
            writer.releaseTemplate(tp);
        } catch (java.io.IOException e) {
            throw new DocumentException(e);
        }
        doc.add(new Paragraph(title, caption));
    }
}
