package org.trimwright.export;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.model.ChipSpec;

/**
 * Scale measurement (a main, not a timed test): exports a generated spec of N fields (default 2000) in every
 * format and prints wall time and peak heap. Run with the test fragment and its host on the class path:
 * {@code java -Xmx256m -cp ... org.trimwright.export.ExportBenchmark 2000 200}; the command-level variant is
 * {@code releng/export-benchmark.sh}. Figures: docs/export.md.
 */
public final class ExportBenchmark {

    private ExportBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
        long trials = args.length > 1 ? Long.parseLong(args[1]) : 200;
        ChipSpec spec = LargeSpecs.generate(n, null);
        Path dir = Files.createTempDirectory("tw-bench");
        long t0 = System.nanoTime();
        SpecExport.Result r = SpecExport.export(spec, dir, ExportOptions.defaults()
                .withSettings(AnalysisSettings.DEFAULTS.withTrials(trials)), ExportProgress.NONE);
        double s = (System.nanoTime() - t0) / 1e9;
        Runtime rt = Runtime.getRuntime();
        long peak = 0;
        for (var pool : java.lang.management.ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == java.lang.management.MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(Locale.ROOT, "%d fields, %d trials/field: %d files in %.2f s; peak heap %.0f MB "
                + "(max %.0f MB)%n", n, trials, r.files().size(), s, peak / 1e6, rt.maxMemory() / 1e6);
    }
}
