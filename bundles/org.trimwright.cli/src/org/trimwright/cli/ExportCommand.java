package org.trimwright.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.export.ExportFormat;
import org.trimwright.export.ExportOptions;
import org.trimwright.export.SpecExport;
import org.trimwright.model.spec.SpecLoadException;

/** Exports the spec document, RTL, firmware header, test tables and IP-XACT map. */
final class ExportCommand implements Command {

    /** Exit code when an output file cannot be written. */
    static final int WRITE_FAILED = 5;

    @Override
    public String summary() {
        return "write the spec document (HTML, PDF), RTL, C header, CSV test tables and IP-XACT";
    }

    @Override
    public String usage() {
        return "trimwright export [FILE] --out DIR [--formats html,pdf,rtl,header,csv,ipxact] [--trials N] [--seed S]"
                + "\n\nWrites every format by default (the bundled demo when no FILE). Progress lines go to stderr;"
                + "\nthe list of files written goes to stdout. Files: CHIP-spec.html, CHIP-spec.pdf, rtl/BLOCK.v,"
                + "\nrtl/BLOCK_tb.v, CHIP_regs.h, csv/BLOCK_REGISTER_FIELD.csv, CHIP.ipxact.xml (see docs/export.md)."
                + "\nThe document lists the validation problems (the findings of trimwright check) per field."
                + "\nExit codes: 0 done, 2 bad usage, 3 unreadable spec, 5 output not writable.";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, Set.of("out", "formats", "trials", "seed"), Set.of());
        if (a.positional().size() > 1) {
            throw new UsageException("expected at most one FILE, got " + a.positional());
        }
        Path dir = Path.of(a.required("out"));
        Set<ExportFormat> formats;
        try {
            formats = a.has("formats") ? ExportFormat.parse(a.value("formats"))
                    : ExportOptions.defaults().formats();
        } catch (IllegalArgumentException e) {
            throw new UsageException("--formats: " + e.getMessage());
        }
        AnalysisSettings settings = AnalysisSettings.DEFAULTS;
        settings = settings.withTrials(a.trials(1, settings.trials()))
                .withSeed(a.longValue("seed", settings.seed()));
        SpecSource src;
        try {
            src = SpecSource.load(a.positional().isEmpty() ? null : a.positional().get(0));
        } catch (SpecLoadException e) {
            err.println("trimwright export: " + e.getMessage());
            return Main.UNREADABLE;
        }
        err.println("trimwright export: " + src.name() + " -> " + dir);
        long t0 = System.nanoTime();
        try {
            SpecExport.Result r = SpecExport.export(src.spec(), dir,
                    ExportOptions.defaults().withFormats(formats).withSettings(settings),
                    (done, total, message) -> err.println(String.format(Locale.ROOT, "export [%3d%%] %s",
                            total == 0 ? 100 : (int) (100L * done / total), message)));
            for (Path p : r.files()) {
                out.println(p);
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            err.println("trimwright export: cannot write to " + dir + ": " + e.getMessage());
            return WRITE_FAILED;
        }
        err.println(String.format(Locale.ROOT, "trimwright export: done in %.2f s", (System.nanoTime() - t0) / 1e9));
        return 0;
    }
}
