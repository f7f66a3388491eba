package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.SpecValidation;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.DemoSpec;

/** Fields analysed in parallel give the same document as one thread; digest and validation share one cache. */
class ParallelDigestTest {

    @TempDir
    Path dir;

    private String html(ChipSpec spec, int threads, String sub) throws IOException {
        AnalysisSettings s = new AnalysisSettings(2000, 7, threads, 2);
        SpecExport.export(spec, dir.resolve(sub), ExportOptions.defaults().withSettings(s)
                .withDate(LocalDate.of(2030, 1, 2)).withFormats(Set.of(ExportFormat.HTML)), ExportProgress.NONE);
        return Files.readString(dir.resolve(sub).resolve(spec.getName() + "-spec.html"), StandardCharsets.UTF_8);
    }

    @Test
    void parallelDigestWritesTheSameDocumentAsASequentialOne() throws IOException {
        String one = html(DemoSpec.load(), 1, "one");
        String four = html(DemoSpec.load(), 4, "four");
        assertEquals(one, four, "every figure of the document is per field and seeded: thread count must not matter");
    }

    @Test
    void parallelDigestOfALargeSpecGivesTheSameFiguresAsSequential() throws IOException {
        ChipSpec spec = LargeSpecs.generate(40, null);
        String one = html(spec, 1, "l1");
        String three = html(LargeSpecs.generate(40, null), 3, "l3");
        assertEquals(one, three);
    }

    @Test
    void validationReadsTheDigestsReportsWithoutRecomputing() {
        ChipSpec spec = DemoSpec.load();
        ReportCache cache = new ReportCache(AnalysisSettings.DEFAULTS.withTrials(500));
        SpecDigest d = SpecDigest.of(spec, ExportOptions.defaults().withSettings(cache.settings()), cache,
                ExportProgress.NONE, 1);
        for (ExportedField f : d.fields()) {
            if (f.report() != null) {
                // the very object the digest holds: validation (run inside SpecDigest.of) did not replace it
                assertEquals(System.identityHashCode(f.report()), System.identityHashCode(cache.peek(f.field())),
                        f.path());
            }
        }
        int held = cache.size();
        SpecValidation.validate(spec, cache);
        assertEquals(held, cache.size(), "a second validation adds no report");
    }
}
