package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.export.ipxact.IpXactComponent;
import org.trimwright.export.text.CNames;
import org.trimwright.export.text.CsvCells;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.DemoSpec;
import org.w3c.dom.Document;

/** Hostile names and descriptions come out inert in every format. */
class InjectionTest {

    static final String SCRIPT = "</script><script>alert(1)</script>";
    static final String CDATA = "]]> \"quoted\" 'single' & <b>bold</b> */ /* ??=";
    static final String FORMULA = "=cmd|' /C calc'!A0";

    @TempDir
    Path dir;

    private ChipSpec hostile() {
        ChipSpec spec = DemoSpec.load();
        spec.setName("chip</title><script>x</script>");
        spec.setAuthor(SCRIPT);
        Block b = spec.getBlocks().get(0);
        b.setName("module");
        b.setDescription(CDATA);
        Register r = b.getRegisters().get(0);
        r.setName("int");
        Field f = r.getFields().get(0);
        f.setName("always");
        spec.getBlocks().get(1).setName(FORMULA);
        f.setDescription(SCRIPT + CDATA);
        return spec;
    }

    @Test
    void hostileTextIsInertInEveryFormat() throws Exception {
        SpecExport.Result r = SpecExport.export(hostile(), dir, ExportOptions.defaults()
                .withSettings(AnalysisSettings.DEFAULTS.withTrials(500)).withDate(LocalDate.of(2030, 1, 1)),
                ExportProgress.NONE);
        String chip = CNames.identifier("chip</title><script>x</script>");
        String html = Files.readString(dir.resolve(chip + "-spec.html"), StandardCharsets.UTF_8);
        assertFalse(html.contains("<script"), "no script element from user text");
        assertFalse(html.toLowerCase().contains("</title><"), "title not broken out of");
        assertTrue(html.contains("&lt;/script&gt;"), "payload shown as text");

        // the XML parses and gives the user's text back verbatim (W3C XML 1.0 parser of the JDK)
        String xml = Files.readString(dir.resolve(chip + ".ipxact.xml"), StandardCharsets.UTF_8);
        Document d = DemoExportTest.parse(xml);
        assertEquals(CDATA, descriptionOfFirstBlock(d));

        // CSV: the formula-like field path is neutralised with a leading apostrophe (common practice, no source)
        Path csv;
        try (Stream<Path> s = Files.list(dir.resolve("csv"))) {
            csv = s.filter(p -> p.getFileName().toString().startsWith("cmd_")).findFirst().orElseThrow();
        }
        List<String> cells = CsvCells.parse(Files.readAllLines(csv).get(1));
        assertTrue(cells.get(0).startsWith("'" + FORMULA + "/"), cells.get(0));

        // Verilog with keyword names compiles and passes in Icarus Verilog; C header compiles with gcc
        Tools.require("iverilog");
        Tools.run(dir, List.of("iverilog", "-g2005", "-o", "m.vvp", "rtl/module.v", "rtl/module_tb.v"));
        assertTrue(Tools.run(dir, List.of("vvp", "-n", "m.vvp")).contains("PASS"));
        Tools.require("gcc");
        Files.writeString(dir.resolve("h.c"), "#include \"" + chip + "_regs.h\"\nint main(void) { return 0; }\n");
        Tools.run(dir, List.of("gcc", "-std=c11", "-Wall", "-Werror", "-pedantic", "-o", "h", "h.c"));
        assertFalse(r.files().isEmpty());
    }

    private static String descriptionOfFirstBlock(Document d) {
        var block = (org.w3c.dom.Element) d.getElementsByTagNameNS(IpXactComponent.NS, "addressBlock").item(0);
        for (var n = block.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof org.w3c.dom.Element e && e.getLocalName().equals("description")) {
                return e.getTextContent();
            }
        }
        return null;
    }

    @Test
    void sanitisedNamesAreLegalIdentifiers() {
        // ISO C 6.4.1 keyword and IEEE 1364-2005 Annex B keyword become legal identifiers
        assertEquals("int_", CNames.identifier("int"));
        assertEquals("f_3x", CNames.identifier("3x"));
        assertEquals("script_alert_1_", CNames.identifier("</script>alert(1)"));
        assertEquals("'=1+2", CsvCells.parse(CsvCells.text("=1+2")).get(0));
        assertEquals("'@SUM(A1)", CsvCells.parse(CsvCells.text("@SUM(A1)")).get(0));
        assertEquals("a,b\"c", CsvCells.parse(CsvCells.text("a,b\"c")).get(0));
    }
}
