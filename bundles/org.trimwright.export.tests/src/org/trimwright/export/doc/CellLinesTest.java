package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.lowagie.text.pdf.BaseFont;

/**
 * Line breaking of table cells. Widths are checked with PDFBox's own TrueType reader ({@code PDType0Font} loaded from
 * the same Liberation Sans file), independent of OpenPDF's metrics that the breaking uses.
 */
class CellLinesTest {

    private static final float SIZE = 8f;
    /** The two readers' advance widths differ by less than 1/1000 em a character (OpenPDF keeps whole units). */
    private static float tolerance(String s) {
        return s.length() * 0.001f * SIZE + 1e-3f;
    }

    private static final BaseFont BASE = new PdfFonts().base();
    private static final GlyphWidths FONT = new GlyphWidths(BASE);
    private static PDDocument pdf;
    private static PDType0Font reference;

    @BeforeAll
    static void loadReferenceFont() throws IOException {
        pdf = new PDDocument();
        try (InputStream in = BaseFont.class.getResourceAsStream("/font-fallback/LiberationSans-Regular.ttf")) {
            reference = PDType0Font.load(pdf, in, false);
        }
    }

    @AfterAll
    static void close() throws IOException {
        pdf.close();
    }

    /** Width in points by PDFBox (external reference). */
    private static float pdfBoxWidth(String s) throws IOException {
        return reference.getStringWidth(s) / 1000f * SIZE;
    }

    private static String words(Random rnd, int n) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            if (i > 0) {
                b.append(' ');
            }
            int len = 1 + rnd.nextInt(6);
            for (int k = 0; k < len; k++) {
                b.append((char) ('a' + rnd.nextInt(26)));
            }
            b.append(i);
        }
        return b.toString();
    }

    @Test
    void rememberedWidthsAreOpenPdfsOwnAndAgreeWithPdfBox() throws IOException {
        Random rnd = new Random(3);
        String alphabet = "abcXYZ 0123456789.,;:()[]/-+=<>|\u00B1\u00B5\u03C3\u03A9\u2264\u2212\u2026\u2190\u00B7";
        for (int k = 0; k < 200; k++) {
            StringBuilder b = new StringBuilder();
            for (int i = rnd.nextInt(60); i > 0; i--) {
                b.append(alphabet.charAt(rnd.nextInt(alphabet.length())));
            }
            String s = b.toString();
            // OpenPDF's whole-string measure is the reference for the cache
            assertEquals(BASE.getWidthPoint(s, SIZE), FONT.points(s, 0, s.length(), SIZE), 1e-4f, s);
            assertEquals(pdfBoxWidth(s), FONT.points(s, 0, s.length(), SIZE), tolerance(s), "PDFBox: " + s);
            int from = s.isEmpty() ? 0 : rnd.nextInt(s.length());
            assertEquals(BASE.getWidthPoint(s.substring(from), SIZE), FONT.points(s, from, s.length(), SIZE), 1e-4f);
        }
    }

    @Test
    void linesFitTheColumnAndTakeAsManyWordsAsFit() throws IOException {
        Random rnd = new Random(7);
        for (float width : new float[] {52.2f, 166, 365}) {
            String text = words(rnd, 200);
            List<String> lines = CellLines.wrap(FONT, SIZE, text, width);
            assertEquals(text, String.join(" ", lines), "every word once, in order, breaks at the spaces");
            for (int i = 0; i < lines.size(); i++) {
                String line = lines.get(i);
                // PDFBox measures each line: it fits the column
                assertTrue(pdfBoxWidth(line) <= width + tolerance(line), line + " fits " + width);
                if (i + 1 < lines.size()) {
                    String next = lines.get(i + 1).split(" ")[0];
                    // PDFBox measures the line with the next word: it would not have fitted (greedy breaking)
                    assertTrue(pdfBoxWidth(line + " " + next) > width - tolerance(line + " " + next),
                            "'" + next + "' could join " + line);
                }
            }
        }
    }

    @Test
    void aWordWiderThanTheColumnBreaksBetweenCharacters() throws IOException {
        String word = "ABCDEFGHIJKLMNOPQRSTUVWXYZ".repeat(6);
        float width = 50;
        List<String> lines = CellLines.wrap(FONT, SIZE, word, width);
        assertEquals(word, String.join("", lines), "no character lost or added");
        assertTrue(lines.size() > 4, "the long word spans several lines");
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            assertTrue(pdfBoxWidth(line) <= width + tolerance(line), line);
            if (i + 1 < lines.size()) {
                // PDFBox: one more character would not have fitted
                String more = line + lines.get(i + 1).charAt(0);
                assertTrue(pdfBoxWidth(more) > width - tolerance(more), line);
            }
        }
        List<String> mixed = CellLines.wrap(FONT, SIZE, "x " + word + " y", width);
        assertEquals("x", mixed.get(0), "the long word starts on its own line");
        assertEquals("x" + word + "y", String.join("", mixed).replace(" ", ""));
    }

    @Test
    void aColumnNarrowerThanOneCharacterStillTakesOneCharacterALine() {
        List<String> lines = CellLines.wrap(FONT, SIZE, "MW\u03C3", 1);
        assertEquals(List.of("M", "W", "\u03C3"), lines);
    }

    @Test
    void explicitLineBreaksAndHyphensBetweenLetters() throws IOException {
        assertEquals(List.of("a", "", "b c"), CellLines.wrap(FONT, SIZE, "a\n\nb c", 500));
        // "P(non-" and "monotonic)" each fit a narrow column, "P(non-monotonic)" does not (PDFBox widths), so the
        // line breaks after the hyphen and keeps it; a minus sign before a digit is no break
        float width = Math.max(pdfBoxWidth("P(non-"), pdfBoxWidth("monotonic)")) + 1;
        assertTrue(pdfBoxWidth("P(non-monotonic)") > width);
        assertEquals(List.of("P(non-", "monotonic)"), CellLines.wrap(FONT, SIZE, "P(non-monotonic)", width));
        List<String> minus = CellLines.wrap(FONT, SIZE, "-18.8uA -10.16uA", pdfBoxWidth("-18.8uA -1") + 0.5f);
        assertEquals(List.of("-18.8uA", "-10.16uA"), minus);
    }

    @Test
    void textThatFitsIsOneLineUnchanged() throws IOException {
        String s = "  4 INV,  3 NOR2 ";
        assertTrue(pdfBoxWidth(s) < 100);
        assertEquals(List.of(s), CellLines.wrap(FONT, SIZE, s, 100));
        assertEquals(List.of(""), CellLines.wrap(FONT, SIZE, "", 100));
        List<String> many = new ArrayList<>(CellLines.wrap(FONT, SIZE, "one two\nthree", 100));
        assertEquals(List.of("one two", "three"), many);
    }
}
