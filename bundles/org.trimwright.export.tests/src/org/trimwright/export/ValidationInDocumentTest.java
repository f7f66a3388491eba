package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.Finding;
import org.trimwright.analysis.validation.SpecValidation;
import org.trimwright.export.doc.FieldSections;
import org.trimwright.export.text.Markup;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.spec.DemoSpec;

/** The analysis validation in the exported document: every finding of the demo, with its path, once. */
class ValidationInDocumentTest {

    private static final AnalysisSettings SETTINGS = AnalysisSettings.DEFAULTS.withTrials(2000);
    /** The demo's deliberate problems (see the demo's descriptions and docs/check-and-diff.md). */
    private static final List<String> DELIBERATE = List.of("OSC/OSC_TRIM/FREQ_COARSE", "ADC/ADC_CAL/CAL_OFFSET",
            "LDO/LDO_CFG/VOUT_SEL");

    @TempDir
    static Path dir;
    static SpecExport.Result result;
    static List<Finding> expected;
    static String html;
    static String pdfText;

    @BeforeAll
    static void export() throws IOException {
        result = SpecExport.export(DemoSpec.load(), dir, ExportOptions.defaults().withSettings(SETTINGS)
                .withDate(LocalDate.of(2030, 1, 2)).withFormats(Set.of(ExportFormat.HTML, ExportFormat.PDF)),
                ExportProgress.NONE);
        // an independent run of the validation on a fresh copy of the demo with its own cache
        expected = SpecValidation.validate(DemoSpec.load(), new ReportCache(SETTINGS));
        html = Files.readString(dir.resolve("TMK3-spec.html"), StandardCharsets.UTF_8);
        try (PDDocument pdf = Loader.loadPDF(dir.resolve("TMK3-spec.pdf").toFile())) {
            pdfText = new PDFTextStripper().getText(pdf).replaceAll("\\s", "");
        }
    }

    @Test
    void theDemosDeliberateProblemsAreFoundAtTheirPaths() {
        Set<String> paths = new HashSet<>();
        expected.forEach(f -> paths.add(f.path()));
        assertEquals(Set.copyOf(DELIBERATE), paths, expected.toString());
    }

    @Test
    void digestHoldsEveryFindingOnceWithRuleIdAndAdvice() {
        List<Problem> all = new ArrayList<>();
        result.digest().problems().values().forEach(all::addAll);
        assertEquals(expected.size(), all.size(), "no finding lost or duplicated: " + all);
        for (Finding f : expected) {
            assertTrue(result.digest().problemsOf(f.path()).contains(ValidationProblems.of(f)), f.toString());
        }
        assertTrue(result.digest().checks().stream().anyMatch(c -> c.startsWith("validation")));
        assertTrue(result.digest().checks().stream().noneMatch(c -> c.startsWith("structural")),
                "the validation covers the structure; no second structural pass");
    }

    @Test
    void htmlFieldChapterListsEachFindingWithPathRuleMessageAndAdvice() {
        for (Finding f : expected) {
            ExportedField ef = field(f.path());
            String chapter = chapterOf(ef);
            assertTrue(chapter.contains("<td>" + Markup.escape(f.path()) + "</td>"), f.path());
            assertTrue(chapter.contains("[" + f.ruleId() + "]"), f.ruleId());
            assertTrue(chapter.contains("<td>" + Markup.escape(f.message()) + "</td>"), f.message());
            if (f.advice() != null) {
                assertTrue(chapter.contains("<td>" + Markup.escape(f.advice()) + "</td>"), f.advice());
            }
            assertTrue(chapter.contains("<td>" + f.severity().key() + "</td>"));
        }
        for (String p : DELIBERATE) {
            assertTrue(chapterOf(field(p)).contains("problem(s) of " + p), p);
        }
    }

    @Test
    void pdfListsEachFindingWithPathAndRule() {
        for (Finding f : expected) {
            assertTrue(pdfText.contains(f.path() + "validation[" + f.ruleId() + "]"), f.path() + " " + f.ruleId());
            assertTrue(pdfText.contains(f.message().replaceAll("\\s", "")), f.message());
        }
    }

    @Test
    void structuralProblemsStayInTheDocumentExactlyOnce() throws IOException {
        ChipSpec spec = DemoSpec.load();
        Field a = spec.getBlocks().get(0).getRegisters().get(0).getFields().get(0);
        a.setWidth(64);
        SpecExport.Result r = SpecExport.export(spec, dir.resolve("broken"), ExportOptions.defaults()
                .withSettings(SETTINGS).withFormats(Set.of(ExportFormat.HTML)), ExportProgress.NONE);
        List<Problem> structural = new ArrayList<>();
        r.digest().problems().values().forEach(l -> l.stream()
                .filter(p -> p.ruleId() != null && p.ruleId().startsWith("structure.")).forEach(structural::add));
        assertTrue(!structural.isEmpty(), "a 64-bit field in its register is a structural problem");
        assertEquals(new HashSet<>(structural).size(), structural.size(), "each structural problem once");
        SpecExport.Result plain = SpecExport.export(DemoSpec.load(), dir.resolve("plain"), ExportOptions.defaults()
                .withProblemSources(List.of()).withSettings(SETTINGS).withFormats(Set.of(ExportFormat.HTML)),
                ExportProgress.NONE);
        assertEquals(List.of(new StructuralProblems().name()), plain.digest().checks(),
                "without other sources the structural checks still run");
    }

    private static ExportedField field(String path) {
        return result.digest().fields().stream().filter(f -> f.path().equals(path)).findFirst().orElseThrow();
    }

    /** The HTML of one field's chapter (from its heading to the next field's chapter). */
    private static String chapterOf(ExportedField f) {
        int start = html.indexOf("id=\"" + FieldSections.id(f) + "\"");
        assertTrue(start >= 0, f.path());
        int end = html.indexOf("<h3>Field ", html.indexOf("<h3>Field ", start) + 1);
        return html.substring(start, end < 0 ? html.length() : end);
    }
}
