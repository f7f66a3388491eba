package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.model.Field;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.model.spec.SpecLoadException;

/** Analyses one field, from a spec file or given inline. */
final class AnalyzeCommand implements Command {

    static final Set<String> VALUE_OPTIONS = Set.of("bits", "coding", "unary-bits", "signed", "at-zero", "step",
            "gates", "unit-sigma", "trials", "seed", "threads", "max-dnl", "max-inl", "inl-definition",
            "target-yield", "max-risk", "spread-min", "spread-max", "accuracy");
    static final Set<String> FLAGS = Set.of("json", "zero-state", "active-low", "verilog");

    @Override
    public String summary() {
        return "analyse one field: step table, decoder cost, glitches, mismatch statistics, sizing, Verilog";
    }

    @Override
    public String usage() {
        return "trimwright analyze (FILE BLOCK/REGISTER/FIELD | --bits N --coding SCHEME --at-zero VALUE --step VALUE)"
                + " [options]\n\n"
                + "field (inline only):\n"
                + "  --bits N                 field width, 1..16\n"
                + "  --coding SCHEME          binary | thermometer | one-hot | one-cold | gray | segmented\n"
                + "  --unary-bits M           unary MSBs of a segmented field (1..N)\n"
                + "  --signed FORMAT          offset-binary | twos-complement | sign-magnitude (default unsigned)\n"
                + "  --zero-state             select decoders: code 0 drives nothing\n"
                + "  --active-low             switch controls are inverted (PMOS-side switches)\n"
                + "  --at-zero VALUE          value at signed step 0, with SI unit (e.g. 1.2V, 0A)\n"
                + "  --step VALUE             value of one step (LSB), with SI unit (e.g. 4mV, 1.5uA)\n"
                + "mismatch (inline only; turns on the statistics):\n"
                + "  --unit-sigma PERCENT     relative sigma of one unit element, in % (e.g. 0.5)\n"
                + "  --max-dnl LSB --max-inl LSB --inl-definition endpoint|best-fit|absolute\n"
                + "  --target-yield Y --max-risk P   limits (defaults 0.5, 0.5, endpoint, 0.99, 1e-6)\n"
                + "  --spread-min VALUE --spread-max VALUE --accuracy VALUE   trim sizing question\n"
                + "run:\n"
                + "  --trials N               Monte Carlo trials (default " + AnalysisSettings.DEFAULT_TRIALS + ")\n"
                + "  --seed S                 random seed (default 1); results do not depend on the thread count\n"
                + "  --threads N              worker threads (default: all cores)\n"
                + "  --gates 2|3              largest gate fan-in of the decoder library (default 2)\n"
                + "output:\n"
                + "  --json                   one JSON object (schema: docs/analyze-json.md)\n"
                + "  --verilog                text report: also print the decoder modules and testbench";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, VALUE_OPTIONS, FLAGS);
        AnalysisSettings settings = new AnalysisSettings(a.trials(1, AnalysisSettings.DEFAULT_TRIALS),
                a.longValue("seed", AnalysisSettings.DEFAULT_SEED), a.integer("threads", 0, 1024, 0),
                a.integer("gates", 2, 3, 2));
        FieldReport report;
        if (!a.positional().isEmpty()) {
            if (a.positional().size() != 2) {
                throw new UsageException("expected FILE and BLOCK/REGISTER/FIELD, got " + a.positional());
            }
            for (String inline : InlineField.OPTIONS) {
                if (a.has(inline) || a.flag(inline)) {
                    throw new UsageException("--" + inline + " describes an inline field; it cannot be combined"
                            + " with a spec file");
                }
            }
            try {
                report = fromFile(a.positional().get(0), a.positional().get(1), settings);
            } catch (SpecLoadException e) {
                err.println("trimwright analyze: " + e.getMessage());
                return Main.UNREADABLE;
            }
        } else {
            InlineField f = InlineField.parse(a);
            try {
                report = FieldAnalyzer.analyze(f.name(), f.inputs(), f.mismatch(), f.sizing(), settings);
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
        }
        if (a.flag("json")) {
            out.println(AnalyzeJson.write(report));
        } else {
            AnalyzeText.print(report, a.flag("verilog"), out);
        }
        return 0;
    }

    private static FieldReport fromFile(String file, String path, AnalysisSettings settings)
            throws SpecLoadException {
        SpecSource src = SpecSource.load(file);
        Field f = ElementPaths.findField(src.spec(), path);
        if (f == null) {
            throw new UsageException(file + ": no field '" + path + "' (expected BLOCK/REGISTER/FIELD)");
        }
        try {
            return FieldAnalyzer.analyze(f, settings);
        } catch (IllegalArgumentException e) {
            throw new UsageException(file + ": " + e.getMessage());
        }
    }
}
