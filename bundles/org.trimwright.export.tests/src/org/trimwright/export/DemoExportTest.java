package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.export.doc.Numbers;
import org.trimwright.export.ipxact.IpXactComponent;
import org.trimwright.export.text.CNames;
import org.trimwright.export.text.CsvCells;
import org.trimwright.model.spec.DemoSpec;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/** Golden-structure checks of a full export of the bundled demo (structure and numbers, never byte snapshots). */
class DemoExportTest {

    @TempDir
    static Path dir;
    static SpecExport.Result result;

    @BeforeAll
    static void export() throws IOException {
        result = SpecExport.export(DemoSpec.load(), dir, ExportOptions.defaults()
                .withSettings(AnalysisSettings.DEFAULTS.withTrials(2000)).withDate(LocalDate.of(2030, 1, 2)),
                ExportProgress.NONE);
    }

    private static String read(String name) throws IOException {
        return Files.readString(dir.resolve(name), StandardCharsets.UTF_8);
    }

    @Test
    void htmlHasTitlePageMapAndEveryFieldWithItsNumbers() throws IOException {
        String html = read("TMK3-spec.html");
        assertTrue(html.contains("2030-01-02"), "date on the title page");
        assertTrue(html.contains("Analog architecture team (fictional)"), "author");
        assertTrue(html.contains(">B0<"), "revision");
        assertTrue(html.contains("Register map"));
        assertFalse(html.contains("<script"), "no scripts");
        for (ExportedField f : result.digest().fields()) {
            assertTrue(html.contains("Field " + f.path()), f.path());
            if (f.report() == null) {
                continue;
            }
            StepRow first = f.report().coding().stepTable().row(0);
            assertTrue(html.contains("<td>" + Numbers.si(first.value(), f.report().inputs().unit()) + "</td>"),
                    f.path() + " code 0 value");
            f.report().mismatch().ifPresent(m -> {
                assertTrue(html.contains(Numbers.lsb(m.dnl().sigmaWorst())), f.path() + " DNL sigma");
                assertTrue(html.contains(Numbers.p(m.monotonic().monteCarlo().estimate())), f.path());
            });
            assertTrue(html.contains(Numbers.g(f.report().coding().cost().nand2Equivalent())), "decoder cost");
        }
        assertTrue(html.contains("<svg"), "inline SVG charts");
        assertTrue(html.contains("definition: endpoint"), "INL definition named");
        assertTrue(html.contains("Caution."), "the demo's LDO select has codes outside its safe limits");
    }

    /** Every id of the HTML is unique (HTML Living Standard: an id is unique in its tree), links reach one each. */
    @Test
    void htmlIdsAreUniqueAndEveryContentsLinkHasItsTarget() throws IOException {
        String html = read("TMK3-spec.html");
        java.util.Set<String> ids = new java.util.HashSet<>();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(" id=\"([^\"]+)\"").matcher(html);
        while (m.find()) {
            assertTrue(ids.add(m.group(1)), "duplicate id " + m.group(1));
        }
        java.util.regex.Matcher a = java.util.regex.Pattern.compile("href=\"#([^\"]+)\"").matcher(html);
        int links = 0;
        while (a.find()) {
            links++;
            assertTrue(ids.contains(a.group(1)), "link to a missing id " + a.group(1));
        }
        assertTrue(links > 20, "contents links: " + links);
    }

    @Test
    void pdfOpensWithTitleFieldPagesAndText() throws IOException {
        try (PDDocument pdf = Loader.loadPDF(dir.resolve("TMK3-spec.pdf").toFile())) {
            int fields = result.digest().fields().size();
            assertTrue(pdf.getNumberOfPages() >= fields + 2, "title, contents and a page per field at least");
            PDFTextStripper strip = new PDFTextStripper();
            strip.setStartPage(1);
            strip.setEndPage(1);
            String title = strip.getText(pdf);
            assertTrue(title.contains("TMK3") && title.contains("2030-01-02"), title);
            strip.setEndPage(pdf.getNumberOfPages());
            String all = strip.getText(pdf);
            for (ExportedField f : result.digest().fields()) {
                assertTrue(all.contains("Field " + f.path()), f.path());
            }
            // chart text is drawn as text (vector), glyph by glyph: compare without spacing
            assertTrue(all.replaceAll("\\s", "").contains("TransferofVREF"), "chart text is text in the PDF");
            assertEquals("TMK3 B0 control specification", pdf.getDocumentInformation().getTitle());
        }
    }

    @Test
    void verilogCompilesAndEveryBlockTestbenchPassesInIcarus() throws Exception {
        Tools.require("iverilog");
        // Icarus Verilog (outside simulator) compiles the Verilog-2005 and runs the self-checking testbenches
        for (var b : result.digest().spec().getBlocks()) {
            String n = CNames.identifier(b.getName());
            Tools.run(dir, List.of("iverilog", "-g2005", "-Wall", "-o", n + ".vvp", "rtl/" + n + ".v",
                    "rtl/" + n + "_tb.v"));
            String out = Tools.run(dir, List.of("vvp", "-n", n + ".vvp"));
            assertTrue(out.contains("PASS " + n + "_tb"), out);
            assertFalse(out.contains("FAIL"), out);
        }
    }

    @Test
    void cHeaderCompilesAndMasksAndShiftsMatchTheSpec() throws Exception {
        Tools.require("gcc");
        StringBuilder c = new StringBuilder("#include <stdio.h>\n#include \"TMK3_regs.h\"\nint main(void) {\n"
                + "    int bad = 0;\n");
        for (ExportedField f : result.digest().fields()) {
            String n = CNames.macro(f.block().getName() + "_" + f.register().getName()) + "_"
                    + CNames.macro(f.field().getName());
            c.append(String.format(Locale.ROOT, "    if (%s_MASK != 0x%Xu || %s_SHIFT != %du || %s_ADDR != 0x%Xu) "
                    + "{ puts(\"%s\"); bad++; }\n", n, f.mask(), n, f.field().getBitOffset(),
                    CNames.macro(f.block().getName() + "_" + f.register().getName()), f.address(), n));
            c.append(String.format(Locale.ROOT, "    if (%s_GET(%s_SET(0u, %du)) != %du) { puts(\"set %s\"); bad++; }\n",
                    n, n, (1 << f.field().getWidth()) - 1, (1 << f.field().getWidth()) - 1, n));
        }
        c.append("    return bad;\n}\n");
        Files.writeString(dir.resolve("check.c"), c.toString());
        // gcc (outside compiler) with -Werror: the header is valid C11
        Tools.run(dir, List.of("gcc", "-std=c11", "-Wall", "-Wextra", "-Werror", "-pedantic", "-o", "check",
                "check.c"));
        Tools.run(dir, List.of("./check"));
    }

    @Test
    void csvRoundTripsEveryCodeAndValue() throws IOException {
        for (ExportedField f : result.digest().fields()) {
            Path p = dir.resolve("csv").resolve(CNames.identifier(f.block().getName() + "_" + f.register().getName()
                    + "_" + f.field().getName()) + ".csv");
            List<String> lines = Files.readAllLines(p);
            assertEquals(String.join(",", org.trimwright.export.csv.TestTables.HEADER), lines.get(0));
            var st = f.report().coding().stepTable();
            assertEquals(st.size() + 1, lines.size());
            for (int code = 0; code < st.size(); code++) {
                List<String> cells = CsvCells.parse(lines.get(code + 1));
                assertEquals(f.path(), cells.get(0));
                assertEquals(code, Integer.parseInt(cells.get(2)));
                assertEquals(f.registerValue(code), Long.decode(cells.get(3)));
                assertEquals(st.value(code), Double.parseDouble(cells.get(6)), 0.0, "exact round trip");
            }
        }
    }

    @Test
    void ipXactIsWellFormedWithTheStandardsStructure() throws Exception {
        DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
        dbf.setNamespaceAware(true);
        Document d = dbf.newDocumentBuilder().parse(dir.resolve("TMK3.ipxact.xml").toFile());
        String ns = IpXactComponent.NS;
        Element root = d.getDocumentElement();
        assertEquals("component", root.getLocalName());
        assertEquals(ns, root.getNamespaceURI());
        NodeList fields = d.getElementsByTagNameNS(ns, "field");
        assertEquals(result.digest().fields().size(), fields.getLength());
        List<String> order = List.of("name", "bitOffset", "resets", "bitWidth", "access");
        for (int i = 0; i < fields.getLength(); i++) {
            Element f = (Element) fields.item(i);
            assertEquals("register", ((Element) f.getParentNode()).getLocalName());
            assertEquals("addressBlock", ((Element) f.getParentNode().getParentNode()).getLocalName());
            List<String> seen = new ArrayList<>();
            for (var n = f.getFirstChild(); n != null; n = n.getNextSibling()) {
                if (n instanceof Element e && order.contains(e.getLocalName())) {
                    seen.add(e.getLocalName());
                }
            }
            // element order of IEEE 1685-2014 fieldType: nameGroup, bitOffset, resets, bitWidth, access
            assertEquals(order, seen);
            ExportedField ef = result.digest().fields().get(i);
            assertEquals(ef.field().getBitOffset(), Integer.parseInt(text(f, "bitOffset")));
            assertEquals(ef.field().getWidth(), Integer.parseInt(text(f, "bitWidth")));
            assertTrue(IpXactComponent.ACCESS_TYPES.contains(text(f, "access")));
            assertEquals("'h" + Long.toHexString(ef.field().getResetCode()), text(f, "value"));
        }
        assertEquals(1, d.getElementsByTagNameNS(ns, "memoryMap").getLength());
        assertEquals(result.digest().spec().getBlocks().size(), d.getElementsByTagNameNS(ns, "addressBlock")
                .getLength());
    }

    static String text(Element parent, String local) {
        return parent.getElementsByTagNameNS(IpXactComponent.NS, local).item(0).getTextContent();
    }

    static Document parse(String xml) throws Exception {
        DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
        dbf.setNamespaceAware(true);
        return dbf.newDocumentBuilder().parse(new InputSource(new StringReader(xml)));
    }
}
