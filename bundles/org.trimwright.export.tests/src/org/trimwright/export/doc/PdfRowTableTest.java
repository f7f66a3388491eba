package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

import com.lowagie.text.Document;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfWriter;

class PdfRowTableTest {

    private static final List<String> HEADER = List.of("code", "register bits", "nominal value");

    private static List<List<String>> rows(int n) {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            rows.add(List.of(Integer.toString(i), Integer.toBinaryString(i), "value-" + i));
        }
        return rows;
    }

    /** Read back with PDFBox (an independent PDF reader): every row in order, the header on every page. */
    @Test
    void longTableKeepsEveryRowInOrderWithTheHeaderOnEveryPage() throws Exception {
        byte[] bytes = pdf((t, flow) -> flow.endTable(t.write(PdfRowTable.data(3), HEADER, rows(300)), 6));
        try (PDDocument pdf = Loader.loadPDF(bytes)) {
            assertTrue(pdf.getNumberOfPages() >= 5, "300 rows of ~15 pt need several pages");
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true); // reading order: a row is drawn cell by cell, each cell line by line
            String all = strip.getText(pdf);
            int at = all.indexOf("BEFORE");
            for (int i = 0; i < 300; i++) {
                int next = all.indexOf("value-" + i + "\n", at);
                assertTrue(next > at, "row " + i + " in order");
                at = next;
            }
            assertTrue(all.indexOf("AFTER", at) > at, "text after the table follows its last row");
            for (int p = 1; p <= pdf.getNumberOfPages(); p++) {
                strip.setStartPage(p);
                strip.setEndPage(p);
                String page = strip.getText(pdf);
                assertFalse(page.isBlank(), "no blank page: " + p);
                if (page.contains("value-")) {
                    assertTrue(page.contains("register bits"), "header on page " + p);
                }
            }
        }
    }

    /** A document with {@code body} between two paragraphs, BEFORE and AFTER, drawn at a page flow; the PDF. */
    static byte[] pdf(TableBody body) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 40, 40, 48, 48);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        doc.open();
        PageFlow flow = new PageFlow(doc);
        GlyphWidths glyphs = new GlyphWidths(new PdfFonts().base());
        PdfText text = new PdfText(writer.getDirectContent(), glyphs);
        PdfRowTable t = new PdfRowTable(flow, writer.getDirectContent(), glyphs, java.awt.Color.BLUE);
        PdfText.Style style = new PdfText.Style(12, java.awt.Color.BLACK, 0, 0, 0);
        text.paragraph(flow, List.of("BEFORE"), style, null);
        body.write(t, flow);
        text.paragraph(flow, List.of("AFTER"), style, null);
        doc.close();
        return out.toByteArray();
    }

    interface TableBody {
        void write(PdfRowTable t, PageFlow flow) throws Exception;
    }

    private static String words(String prefix, int n) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            b.append(i == 0 ? "" : " ").append(prefix).append(i);
        }
        return b.toString();
    }

    private static String squeeze(String s) {
        return s.replaceAll("\\s+", "");
    }

    /** Every glyph as PDFBox places it: x, width, top and baseline (from the top of the page), size. */
    private record Glyph(float x, float width, float top, float baseline, float size, String text) {
    }

    private static List<Glyph> glyphs(PDDocument pdf) throws Exception {
        List<Glyph> all = new ArrayList<>();
        PDFTextStripper strip = new PDFTextStripper() {
            @Override
            protected void writeString(String text, List<TextPosition> positions) {
                for (TextPosition p : positions) {
                    all.add(new Glyph(p.getXDirAdj(), p.getWidthDirAdj(), p.getYDirAdj() - p.getHeightDir(),
                            p.getYDirAdj(), p.getXScale(), p.getUnicode())); // size: the text matrix scale
                }
            }
        };
        strip.getText(pdf);
        return all;
    }

    /**
     * PDFBox's glyph positions: every glyph of {@code size} points inside the page margins and inside the column
     * (between consecutive {@code edges}) it starts in.
     */
    private static void assertInsideColumns(PDDocument pdf, float size, float... edges) throws Exception {
        int checked = 0;
        for (Glyph g : glyphs(pdf)) {
            if (g.text().isBlank() || Math.abs(g.size() - size) > 0.01f) {
                continue;
            }
            int c = 0;
            while (c + 2 < edges.length && g.x() >= edges[c + 1]) {
                c++;
            }
            assertTrue(g.x() >= edges[c] && g.x() + g.width() <= edges[c + 1] + 0.5f, g + " inside column " + c);
            assertTrue(g.baseline() <= PageSize.A4.getHeight() - 48, g + " above the bottom margin");
            assertTrue(g.top() >= 48 - 1, g + " below the top margin");
            checked++;
        }
        assertTrue(checked > 0, "glyphs of " + size + " pt found");
    }

    /** Column edges of {@code n} equal columns over the text width of the test page. */
    private static float[] equalColumns(int n) {
        float[] e = new float[n + 1];
        for (int i = 0; i <= n; i++) {
            e[i] = 40 + i * (PageSize.A4.getWidth() - 80) / n;
        }
        return e;
    }

    /** Wrapped cells read back with PDFBox: all their text in order, inside their columns. */
    @Test
    void wrappedCellTextIsAllThereInsideItsColumn() throws Exception {
        List<List<String>> rows = List.of(
                List.of("1", "short", words("note", 60)),
                List.of("2", "Antidisestablishmentarianism-and-more-" + "X".repeat(90), "two\nlines"),
                List.of("3", "P(non-monotonic) \u2264 1e-6", ""));
        List<String> kv = List.of("Method", "counted from the synthesised gate netlist (structural decoder: shared "
                + "predecoding / recursive thermometer / Gray XOR chain; De Morgan mapping to INV/NAND/NOR) "
                + words("more", 40));
        byte[] bytes = pdf((t, flow) -> {
            flow.endTable(t.write(PdfRowTable.data(3), HEADER, rows), 6);
            flow.endTable(t.write(PdfRowTable.keyValues(java.awt.Color.GRAY), null,
                    List.of(kv, List.of("Gates", "4 INV"))), 4);
        });
        try (PDDocument pdf = Loader.loadPDF(bytes)) {
            String all = squeeze(new PDFTextStripper().getText(pdf)); // content order: cell by cell
            for (List<String> r : rows) {
                for (String cell : r) {
                    assertTrue(all.contains(squeeze(cell)), "cell text present: " + cell);
                }
            }
            assertTrue(all.contains(squeeze(kv.get(1))), "long value present");
            PDFTextStripper sorted = new PDFTextStripper();
            sorted.setSortByPosition(true);
            String text = sorted.getText(pdf);
            assertTrue(text.indexOf("BEFORE") < text.indexOf("note0") && text.indexOf("note59") < text.indexOf("Method")
                    && text.indexOf("Method") < text.indexOf("Gates") && text.indexOf("Gates") < text.indexOf("AFTER"),
                    "blocks in reading order");
            assertTrue(text.lines().filter(l -> l.contains("note")).count() > 3, "the long note wraps");
            assertInsideColumns(pdf, PdfRowTable.SMALL, equalColumns(3));
            // label/value rows: widths 2:5 of the text width, values in the body size
            float label = 40 + (PageSize.A4.getWidth() - 80) * 2 / 7;
            assertInsideColumns(pdf, PdfRowTable.BODY, 40, label, PageSize.A4.getWidth() - 40);
        }
    }

    /** Many rows with long cells: PDFBox finds every row in order, each whole on one page, the header on each. */
    @Test
    void longCellsAndManyRowsSpanPagesWithTheHeaderRepeated() throws Exception {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < 150; i++) {
            String note = "start-" + i + " " + words("w", 5 + i % 50) + " end-" + i;
            rows.add(List.of(Integer.toString(i), "bits " + i, note));
        }
        byte[] bytes = pdf((t, flow) -> flow.endTable(t.write(PdfRowTable.data(3), HEADER, rows), 6));
        try (PDDocument pdf = Loader.loadPDF(bytes)) {
            assertTrue(pdf.getNumberOfPages() >= 8, "150 rows of 1 to 10 lines need many pages");
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true);
            String all = strip.getText(pdf);
            int at = all.indexOf("BEFORE");
            for (int i = 0; i < rows.size(); i++) {
                int next = all.indexOf("start-" + i + " ", at);
                assertTrue(next > at, "row " + i + " in order");
                at = next;
            }
            assertTrue(all.indexOf("AFTER", at) > at, "text after the table follows its last row");
            for (int p = 1; p <= pdf.getNumberOfPages(); p++) {
                strip.setStartPage(p);
                strip.setEndPage(p);
                String page = strip.getText(pdf);
                assertFalse(page.isBlank(), "no blank page: " + p);
                if (page.contains("start-")) {
                    assertTrue(page.contains("register bits"), "header on page " + p);
                }
                for (int i = 0; i < rows.size(); i++) {
                    assertEquals(page.contains("start-" + i + " "), page.contains("end-" + i + "\n"),
                            "row " + i + " whole on page " + p);
                }
            }
            assertInsideColumns(pdf, PdfRowTable.SMALL, equalColumns(3));
        }
    }

    /** A row taller than a page splits between lines: PDFBox reads every word once, in order, on several pages. */
    @Test
    @Timeout(120) // guards against an endless page loop; not a speed check
    void aRowTallerThanAPageSplitsWithoutLosingText() throws Exception {
        int n = 3000;
        String tall = words("w", n);
        String lines = words("line", 200).replace(' ', '\n');
        List<List<String>> rows = List.of(List.of("0", "short", "x"), List.of("1", lines, tall),
                List.of("2", "after", "y"));
        byte[] bytes = pdf((t, flow) -> flow.endTable(t.write(PdfRowTable.data(3), HEADER, rows), 6));
        try (PDDocument pdf = Loader.loadPDF(bytes)) {
            assertTrue(pdf.getNumberOfPages() >= 4, "3,000 words in a third of the width take several pages");
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true);
            List<Integer> w = new ArrayList<>();
            List<Integer> line = new ArrayList<>();
            Matcher m = Pattern.compile("\\b(w|line)(\\d+)\\b").matcher(strip.getText(pdf));
            while (m.find()) {
                (m.group(1).equals("w") ? w : line).add(Integer.parseInt(m.group(2)));
            }
            assertEquals(IntStream.range(0, n).boxed().toList(), w, "every word once, in order");
            assertEquals(IntStream.range(0, 200).boxed().toList(), line, "every explicit line once, in order");
            for (int p = 1; p <= pdf.getNumberOfPages(); p++) {
                strip.setStartPage(p);
                strip.setEndPage(p);
                String page = strip.getText(pdf);
                if (page.matches("(?s).*\\bw\\d+.*")) {
                    assertTrue(page.contains("register bits"), "header on page " + p);
                }
            }
            String all = new PDFTextStripper().getText(pdf);
            assertTrue(all.indexOf("after") > all.indexOf("w" + (n - 1)), "the next row follows the split one");
            assertInsideColumns(pdf, PdfRowTable.SMALL, equalColumns(3));
        }
    }
}
