package org.trimwright.export.doc;

import java.awt.Color;
import java.io.OutputStream;
import java.util.List;
import java.util.zip.Deflater;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;

/**
 * Writes the document as PDF with OpenPDF: title page, contents, then the same sections as the HTML file. After the
 * title page everything is drawn as page content at a position of our own ({@link PageFlow}); the document only
 * starts pages. Headings are named destinations, contents entries link to them. Charts are drawn through OpenPDF's
 * Graphics2D into form XObjects ({@link PdfChart}), so they stay vector graphics with text as text. Every field
 * chapter starts on a new page; a heading stays on the page of the first line of what follows it.
 */
public final class PdfDocument {

    private static final Color INK = new Color(0x1F, 0x4E, 0x79);
    private static final Color COPPER = new Color(0xC0, 0x6A, 0x2B);
    private static final PdfText.Style CONTENTS = new PdfText.Style(17f, INK, 0, 0, 0);
    private static final PdfText.Style ENTRY = new PdfText.Style(PdfParts.BODY, Color.BLACK, 0, 0, 0);
    private static final PdfText.Style SUB_ENTRY = new PdfText.Style(8f, Color.BLACK, 14, 0, 0);
    private static final PdfText.Style H1 = new PdfText.Style(17f, INK, 0, 0, 4);
    private static final PdfText.Style H2 = new PdfText.Style(14f, INK, 0, 0, 4);
    private static final PdfText.Style H3 = new PdfText.Style(10.5f, COPPER, 0, 10, 4);

    private final Document doc;
    private final PdfWriter writer;
    private final PdfFonts fonts = new PdfFonts();
    private final PageFlow flow;
    /** Set when the document is open (page content exists from then on). */
    private PdfText text;
    private PdfParts parts;

    private PdfDocument(OutputStream out) throws DocumentException {
        doc = new Document(PageSize.A4, 40, 40, 48, 48);
        writer = PdfWriter.getInstance(doc, out);
        writer.setFullCompression();
        // zlib's fastest level: compressing thousands of pages and charts at the default level cost a fifth of the
        // PDF writer's time, for a file about a tenth smaller
        writer.setCompressionLevel(Deflater.BEST_SPEED);
        flow = new PageFlow(doc);
    }

    private void open() {
        doc.open();
        PdfContentByte cb = writer.getDirectContent();
        GlyphWidths glyphs = new GlyphWidths(fonts.base());
        text = new PdfText(cb, glyphs);
        parts = new PdfParts(flow, text, new PdfRowTable(flow, cb, glyphs, INK), new PdfChart(writer, fonts));
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
        open();
        titlePage(plan);
        doc.newPage();
        text.paragraph(flow, text.lines(flow, "Contents", CONTENTS), CONTENTS, null);
        for (DocumentPlan.Entry e : plan.contents()) {
            PdfText.Style style = e.level() == 1 ? ENTRY : SUB_ENTRY;
            text.paragraph(flow, text.lines(flow, e.title(), style), style, e.id());
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
        Font body = new Font(fonts.base(), PdfParts.BODY);
        doc.add(new Paragraph(t.description(), body));
        PdfPTable kv = new PdfPTable(new float[] {1, 4});
        kv.setWidthPercentage(70);
        kv.setHorizontalAlignment(Element.ALIGN_LEFT);
        kv.setSpacingBefore(30);
        String[][] rows = {{"Chip", t.chip()}, {"Revision", t.revision()}, {"Date", t.date()},
            {"Author", t.author()}, {"Fields", Integer.toString(plan.digest().fields().size())}};
        Font caption = new Font(fonts.base(), 8f, Font.NORMAL, PdfParts.MUTED);
        for (String[] r : rows) {
            kv.addCell(cell(r[0], caption));
            kv.addCell(cell(r[1], body));
        }
        doc.add(kv);
    }

    private static PdfPCell cell(String text, Font f) {
        PdfPCell c = new PdfPCell(new Phrase(text, f));
        c.setBorder(PdfPCell.BOTTOM);
        c.setBorderColor(new Color(0xDD, 0xE2, 0xE7));
        c.setPadding(2.5f);
        return c;
    }

    private boolean afterChapterHead;

    private void section(Section s) throws DocumentException {
        if (s.level() == 1 || (s.level() == 2 && !afterChapterHead)) {
            flow.newPage();
        }
        afterChapterHead = s.level() == 1 && s.parts().size() <= 1;
        PdfText.Style style = s.level() == 1 ? H1 : s.level() == 2 ? H2 : H3;
        List<String> title = text.lines(flow, s.title(), style);
        List<Part> content = s.parts();
        PdfParts.Block first = content.isEmpty() ? null : parts.block(content.get(0));
        if (first != null && !flow.blank() && !together(title, style, first, flow.trial())) {
            // the heading would be alone at the foot of the page: start the page with it, if that keeps them together
            PageFlow fresh = flow.trial();
            fresh.newPage();
            if (together(title, style, first, fresh)) {
                flow.newPage();
            }
        }
        text.heading(flow, title, style, s.id());
        for (int i = 0; i < content.size(); i++) {
            (i == 0 ? first : parts.block(content.get(i))).place();
        }
    }

    /** Whether on {@code trial} the heading's last line and the first line of {@code first} fall on one page. */
    private boolean together(List<String> title, PdfText.Style style, PdfParts.Block first, PageFlow trial) {
        return text.heading(trial, title, style, null) == first.start(trial);
    }
}
