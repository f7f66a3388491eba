package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

import com.lowagie.text.Document;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
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
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, 40, 40, 48, 48);
        PdfWriter writer = PdfWriter.getInstance(doc, out);
        doc.open();
        PdfRowTable t = new PdfRowTable(doc, writer, new PdfFonts().base(), java.awt.Color.BLUE);
        doc.add(new Paragraph("BEFORE"));
        PdfRowTable.Style style = PdfRowTable.data(3);
        assertTrue(t.fits(style, HEADER, rows(300)));
        t.write(style, HEADER, rows(300), 6);
        doc.add(new Paragraph("AFTER"));
        doc.close();
        try (PDDocument pdf = Loader.loadPDF(out.toByteArray())) {
            assertTrue(pdf.getNumberOfPages() >= 5, "300 rows of ~15 pt need several pages");
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true); // reading order: document text and direct content are separate streams
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

    @Test
    void cellsWiderThanTheirColumnAreLeftToTheGeneralTable() throws Exception {
        Document doc = new Document(PageSize.A4, 40, 40, 48, 48);
        PdfWriter writer = PdfWriter.getInstance(doc, new ByteArrayOutputStream());
        doc.open();
        PdfRowTable t = new PdfRowTable(doc, writer, new PdfFonts().base(), java.awt.Color.BLUE);
        PdfRowTable.Style style = PdfRowTable.data(3);
        assertFalse(t.fits(style, HEADER, List.of(List.of("1", "2", "x".repeat(200)))));
        assertFalse(t.fits(style, HEADER, List.of(List.of("1", "2\n3", "4"))));
        assertFalse(t.fits(style, HEADER, List.of(List.of("1", "2"))), "a short row");
        assertTrue(t.fits(style, HEADER, List.of(List.of("1", "2", "3"))));
        PdfRowTable.Style kv = PdfRowTable.keyValues(java.awt.Color.GRAY);
        assertTrue(t.fits(kv, null, List.of(List.of("Gates", "4 INV, 3 NOR2"))));
        assertFalse(t.fits(kv, null, List.of(List.of("Method", "counted ".repeat(30)))));
        doc.add(new Paragraph("x"));
        doc.close();
    }
}
