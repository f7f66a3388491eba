package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDNameTreeNode;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.interactive.action.PDActionGoTo;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationLink;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDNamedDestination;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDPageDestination;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDPageXYZDestination;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.PDFTextStripperByArea;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.export.ExportOptions;
import org.trimwright.export.ExportProgress;
import org.trimwright.export.SpecDigest;
import org.trimwright.model.spec.DemoSpec;

/**
 * The PDF of the demo spec and of long text, read back with PDFBox (an independent PDF reader): named destinations
 * and contents links, heading order, chapter pages, margins, text that runs over pages.
 */
class PdfDocumentTest {

    private static DocumentPlan plan;
    private static List<Section> sections;
    private static byte[] demo;

    @BeforeAll
    static void writeDemo() throws Exception {
        ExportOptions options = ExportOptions.defaults().withSettings(AnalysisSettings.DEFAULTS.withTrials(300))
                .withDate(LocalDate.of(2030, 1, 2));
        plan = new DocumentPlan(SpecDigest.of(DemoSpec.load(), options, ExportProgress.NONE, 1), options.date());
        sections = new ArrayList<>();
        plan.sections().forEach(sections::add);
        demo = write(sections);
    }

    private static byte[] write(List<Section> content) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfDocument.write(plan, content, out, () -> { });
        return out.toByteArray();
    }

    /** The named destinations of the catalog's name tree (PDFBox), by name. */
    private static Map<String, PDPageXYZDestination> destinations(PDDocument pdf) throws IOException {
        Map<String, PDPageXYZDestination> all = new HashMap<>();
        collect(pdf.getDocumentCatalog().getNames().getDests(), all);
        return all;
    }

    private static void collect(PDNameTreeNode<PDPageDestination> node, Map<String, PDPageXYZDestination> all)
            throws IOException {
        if (node.getNames() != null) {
            node.getNames().forEach((k, v) -> all.put(k, (PDPageXYZDestination) v));
        }
        if (node.getKids() != null) {
            for (PDNameTreeNode<PDPageDestination> kid : node.getKids()) {
                collect(kid, all);
            }
        }
    }

    private static String place(PDDocument pdf, PDPageXYZDestination d) {
        return pdf.getPages().indexOf(d.getPage()) + " " + d.getLeft() + " " + d.getTop();
    }

    /** Text of page {@code index} (from 0) inside {@code r} (PDF coordinates), by PDFBox's area stripper. */
    private static String textIn(PDDocument pdf, int index, PDRectangle r) throws IOException {
        PDFTextStripperByArea area = new PDFTextStripperByArea();
        float h = pdf.getPage(index).getMediaBox().getHeight();
        // a little taller than the link box: PDFBox counts a glyph in when its box lies inside the region
        area.addRegion("r", new java.awt.geom.Rectangle2D.Float(r.getLowerLeftX() - 0.5f, h - r.getUpperRightY() - 3,
                r.getWidth() + 1, r.getHeight() + 6));
        area.extractRegions(pdf.getPage(index));
        return area.getTextForRegion("r").strip();
    }

    @Test
    void everyHeadingIsANamedDestinationAndEveryContentsEntryLinksToOne() throws IOException {
        try (PDDocument pdf = Loader.loadPDF(demo)) {
            Map<String, PDPageXYZDestination> dests = destinations(pdf);
            Set<String> seen = new HashSet<>();
            for (Section s : sections) {
                PDPageXYZDestination d = dests.get(s.id());
                assertNotNull(d, "destination " + s.id()); // PDFBox: the catalog's name tree of destinations
                assertTrue(seen.add(s.id()), "one heading per anchor: " + s.id());
                int page = pdf.getPages().indexOf(d.getPage());
                PDFTextStripper strip = new PDFTextStripper();
                strip.setStartPage(page + 1);
                strip.setEndPage(page + 1);
                // PDFBox: the page the destination points at, and its text
                assertTrue(strip.getText(pdf).contains(s.title()), s.title() + " on the page of " + s.id());
                assertEquals(PdfPages.LEFT, d.getLeft(), 0.01, "destination at the text's left edge");
            }
            // PDFBox: the link annotations of every page; OpenPDF's links go to the destination object the name
            // stands for: find the name by its place
            Map<String, String> byPlace = new HashMap<>();
            dests.forEach((name, d) -> byPlace.put(place(pdf, d), name));
            Set<String> linked = new HashSet<>();
            Set<String> entries = new HashSet<>();
            plan.contents().forEach(e -> entries.add(e.id()));
            for (int i = 0; i < pdf.getNumberOfPages(); i++) {
                PDPage page = pdf.getPage(i);
                for (PDAnnotation a : page.getAnnotations()) {
                    if (a instanceof PDAnnotationLink link && link.getAction() instanceof PDActionGoTo go) {
                        String id = go.getDestination() instanceof PDNamedDestination named
                                ? named.getNamedDestination()
                                : byPlace.get(place(pdf, (PDPageXYZDestination) go.getDestination()));
                        assertTrue(id != null && dests.containsKey(id), "link to an existing destination: " + id);
                        String title = plan.contents().stream().filter(e -> e.id().equals(id)).findFirst()
                                .orElseThrow(() -> new AssertionError("link " + id + " is no contents entry")).title();
                        // PDFBox's area stripper: the text under the link's rectangle
                        assertEquals(title, textIn(pdf, i, link.getRectangle()), "link over its entry's text");
                        linked.add(id);
                    }
                }
            }
            assertEquals(entries, linked, "every contents entry is a link");
        }
    }

    @Test
    void headingsReadInOrderWithWhatFollowsAndChaptersStartOnANewPage() throws IOException {
        try (PDDocument pdf = Loader.loadPDF(demo)) {
            // each page's text in reading order; the headings after the contents, in order, each on its own line
            List<List<String>> pages = new ArrayList<>();
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true);
            for (int p = 1; p <= pdf.getNumberOfPages(); p++) {
                strip.setStartPage(p);
                strip.setEndPage(p);
                pages.add(strip.getText(pdf).lines().toList());
            }
            // from the first section's page (the contents list the same titles)
            int page = pdf.getPages().indexOf(destinations(pdf).get(sections.get(0).id()).getPage());
            int line = 0;
            boolean afterChapterHead = false;
            for (Section s : sections) {
                int previous = page;
                while (page < pages.size() && pages.get(page).subList(line, pages.get(page).size())
                        .indexOf(s.title()) < 0) {
                    page++;
                    line = 0;
                }
                assertTrue(page < pages.size(), "heading in reading order: " + s.title());
                line += pages.get(page).subList(line, pages.get(page).size()).indexOf(s.title()) + 1;
                assertTrue(line < pages.get(page).size(), s.title() + " not alone at the foot of its page");
                if (s.level() == 1 || (s.level() == 2 && !afterChapterHead)) {
                    assertTrue(page > previous || s == sections.get(0), s.title() + " on a new page");
                    assertEquals(1, line, s.title() + " first on its page"); // PDFBox, page text in reading order
                }
                afterChapterHead = s.level() == 1 && s.parts().size() <= 1;
            }
        }
    }

    /** Pages filled to many depths, each followed by a heading: the heading is never the last line of a page. */
    @Test
    void aHeadingStaysWithTheFirstLineAfterIt() throws Exception {
        List<Section> content = new ArrayList<>();
        for (int k = 34; k <= 41; k++) {
            for (int m = 0; m <= 4; m++) {
                Section.Builder filler = new Section.Builder("s-fill-" + k + "-" + m, "Filler " + k + " " + m, 2);
                for (int i = 0; i < k; i++) {
                    filler.para("one line " + i);
                }
                if (m > 0) {
                    filler.para(("lines of text " + m + " ").repeat(10 * m).strip());
                }
                content.add(filler.build());
                content.add(new Section.Builder("s-kept-" + k + "-" + m, "Kept heading " + k + " " + m, 3)
                        .para("Following text " + k + " " + m).build());
            }
        }
        try (PDDocument pdf = Loader.loadPDF(write(content))) {
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true);
            int kept = 0;
            for (int p = 1; p <= pdf.getNumberOfPages(); p++) {
                strip.setStartPage(p);
                strip.setEndPage(p);
                List<String> lines = strip.getText(pdf).lines().toList(); // PDFBox, reading order
                for (int i = 0; i < lines.size(); i++) {
                    if (lines.get(i).startsWith("Kept heading ")) {
                        String which = lines.get(i).substring("Kept heading ".length());
                        assertTrue(i + 1 < lines.size() && lines.get(i + 1).equals("Following text " + which),
                                lines.get(i) + " followed by its text on page " + p);
                        kept++;
                    }
                }
            }
            assertEquals(40, kept, "every heading found");
        }
    }

    @Test
    void textAndChartsStayInsideTheMarginsAndChartsAreCentred() throws IOException {
        try (PDDocument pdf = Loader.loadPDF(demo)) {
            PdfPages.Content c = PdfPages.read(pdf); // PDFBox: glyph positions and form XObject boxes
            PdfPages.assertInsideMargins(c);
            long charts = sections.stream().flatMap(s -> s.parts().stream()).filter(p -> p instanceof Part.Chart)
                    .count();
            assertEquals(charts, c.forms().size(), "one form per chart");
            for (PdfPages.Form f : c.forms()) {
                assertEquals((PdfPages.LEFT + PdfPages.RIGHT) / 2, f.box().getCenterX(), 0.01, "centred");
                assertTrue(Math.abs(f.box().getWidth() - PdfChart.WIDTH) < 0.01
                        || Math.abs(f.box().getHeight() - PdfChart.HEIGHT) < 0.01, "scaled to fit: " + f);
            }
        }
    }

    private static String words(String prefix, int n) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < n; i++) {
            b.append(i == 0 ? "" : " ").append(prefix).append(i);
        }
        return b.toString();
    }

    @Test
    void longParagraphsAndCautionsBreakAcrossPagesWithoutLosingWords() throws Exception {
        int n = 4000;
        List<Section> content = List.of(new Section.Builder("s-long", "Long text", 2).para(words("p", n))
                .add(new Part.Caution(words("c", n))).para("END").build());
        try (PDDocument pdf = Loader.loadPDF(write(content))) {
            // title page, contents page(s), then a paragraph and a box of 4,000 words each: several pages
            assertTrue(pdf.getNumberOfPages() >= 6, "long text takes several pages: " + pdf.getNumberOfPages());
            PDFTextStripper strip = new PDFTextStripper();
            strip.setSortByPosition(true);
            String text = strip.getText(pdf);
            List<Integer> p = new ArrayList<>();
            List<Integer> c = new ArrayList<>();
            Matcher m = Pattern.compile("\\b([pc])(\\d+)\\b").matcher(text);
            while (m.find()) {
                (m.group(1).equals("p") ? p : c).add(Integer.parseInt(m.group(2)));
            }
            // PDFBox's text in reading order
            assertEquals(IntStream.range(0, n).boxed().toList(), p, "every word of the paragraph once, in order");
            assertEquals(IntStream.range(0, n).boxed().toList(), c, "every word of the caution once, in order");
            assertTrue(text.indexOf("Caution. c0") > text.indexOf("p" + (n - 1)), "the box follows the paragraph");
            assertTrue(text.indexOf("END") > text.indexOf("c" + (n - 1)), "and the next paragraph the box");
            PdfPages.Content glyphs = PdfPages.read(pdf);
            PdfPages.assertInsideMargins(glyphs);
            // from the section's page on, a lower-case c is only in the caution's words
            int from = pdf.getPages().indexOf(destinations(pdf).get("s-long").getPage()) + 1;
            Set<Integer> pages = new HashSet<>();
            for (PdfPages.Glyph g : glyphs.glyphs()) {
                if (g.page() >= from && g.text().equals("c")) {
                    pages.add(g.page());
                    // inside the box's padding
                    assertTrue(g.x() >= PdfPages.LEFT + PdfText.BOX_PADDING - 0.01f, g + " inside the box");
                }
            }
            assertTrue(pages.size() >= 2, "the caution runs over pages: " + pages);
            assertFalse(text.contains("Caution. Caution."), "the prefix once");
        }
    }
}
