package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.Finding;
import org.trimwright.analysis.validation.Severity;
import org.trimwright.analysis.validation.SpecValidation;
import org.trimwright.engine.json.JsonWriter;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.spec.SpecLoadException;

/** Validates a whole spec for a regression flow: every finding, and an exit code a script can test. */
final class CheckCommand implements Command {

    /** Exit code: warnings found and {@code --strict} given. */
    static final int WARNINGS = 1;
    /** Exit code: errors found. */
    static final int ERRORS = 2;
    /**
     * Monte Carlo trials per field when {@code --trials} is not given: enough to estimate yields around 99 % to
     * about +-0.5 % and to run a 2,000-field spec in seconds; probabilities of non-monotonic steps do not depend on
     * it (exact figures or union bounds).
     */
    static final long DEFAULT_TRIALS = 2_000;

    static final Set<String> VALUE_OPTIONS = Set.of("trials", "seed");
    static final Set<String> FLAGS = Set.of("json", "strict");

    @Override
    public String summary() {
        return "validate a spec: structure, range, linearity, coding fit, safe limits";
    }

    @Override
    public String usage() {
        return "trimwright check FILE [--json] [--strict] [--trials N] [--seed S]\n\n"
                + "  --json        one JSON object (keys: docs/check-and-diff.md)\n"
                + "  --strict      warnings also fail (exit code 1)\n"
                + "  --trials N    Monte Carlo trials per field (default " + DEFAULT_TRIALS + ")\n"
                + "  --seed S      random seed (default " + AnalysisSettings.DEFAULT_SEED + ")\n\n"
                + "Exit codes: 0 clean (or warnings only without --strict), 1 warnings only with --strict,\n"
                + "2 errors (or bad usage), 3 unreadable file.";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, VALUE_OPTIONS, FLAGS);
        if (a.positional().size() != 1) {
            throw new UsageException("expected one spec FILE, got " + a.positional());
        }
        long trials = a.trials(100, DEFAULT_TRIALS);
        long seed = a.longValue("seed", AnalysisSettings.DEFAULT_SEED);
        String file = a.positional().get(0);
        SpecSource src;
        try {
            src = SpecSource.load(file);
        } catch (SpecLoadException e) {
            err.println("trimwright check: " + e.getMessage());
            return Main.UNREADABLE;
        }
        ChipSpec spec = src.spec();
        AnalysisSettings settings = AnalysisSettings.DEFAULTS.withTrials(trials).withSeed(seed);
        List<Finding> findings = SpecValidation.validate(spec, new ReportCache(settings));
        long errors = findings.stream().filter(f -> f.severity() == Severity.ERROR).count();
        long warnings = findings.size() - errors;
        int code = errors > 0 ? ERRORS : warnings > 0 && a.flag("strict") ? WARNINGS : 0;
        int fields = countFields(spec);
        if (a.flag("json")) {
            out.println(json(src, fields, settings, findings, errors, warnings, code));
        } else {
            out.print(text(src, fields, settings, findings, errors, warnings));
        }
        return code;
    }

    private static int countFields(ChipSpec spec) {
        int n = 0;
        for (var it = spec.eAllContents(); it.hasNext();) {
            if (it.next() instanceof Field) {
                n++;
                it.prune();
            }
        }
        return n;
    }

    static String text(SpecSource src, int fields, AnalysisSettings s, List<Finding> findings, long errors,
            long warnings) {
        StringBuilder sb = new StringBuilder();
        sb.append(src.spec().getName()).append(" (").append(src.name()).append("): ").append(errors)
                .append(errors == 1 ? " error, " : " errors, ").append(warnings)
                .append(warnings == 1 ? " warning" : " warnings").append(" in ").append(fields)
                .append(" fields (Monte Carlo ").append(s.trials()).append(" trials per field, seed ")
                .append(s.seed()).append(")\n");
        for (Finding f : findings) {
            sb.append('\n').append(String.format("%-7s %s  [%s]%n", f.severity().key(), f.path(), f.ruleId()));
            sb.append("        ").append(f.message()).append('\n');
            if (f.advice() != null) {
                sb.append("        advice: ").append(f.advice()).append('\n');
            }
        }
        return sb.toString();
    }

    static String json(SpecSource src, int fields, AnalysisSettings s, List<Finding> findings, long errors,
            long warnings, int exitCode) {
        JsonWriter w = new JsonWriter().beginObject();
        w.field("file", src.name()).field("spec", src.spec().getName()).field("fields", fields);
        w.field("trials", s.trials()).field("seed", s.seed());
        w.field("errors", errors).field("warnings", warnings).field("exitCode", exitCode);
        w.key("findings").beginArray();
        for (Finding f : findings) {
            w.beginObject().field("severity", f.severity().key()).field("rule", f.ruleId()).field("path", f.path())
                    .field("message", f.message());
            w.key("advice");
            if (f.advice() == null) {
                w.nullValue();
            } else {
                w.value(f.advice());
            }
            w.key("figures").beginObject();
            for (Map.Entry<String, Double> e : f.figures().entrySet()) {
                w.field(e.getKey(), e.getValue());
            }
            w.endObject().endObject();
        }
        return w.endArray().endObject().toJson();
    }
}
