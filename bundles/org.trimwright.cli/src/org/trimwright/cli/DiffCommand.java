package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.diff.Change;
import org.trimwright.analysis.diff.Consequence;
import org.trimwright.analysis.diff.FieldDiff;
import org.trimwright.analysis.diff.SpecDiff;
import org.trimwright.engine.json.JsonWriter;
import org.trimwright.model.spec.SpecLoadException;

/** Compares the fields of two spec versions and says what each change does. */
final class DiffCommand implements Command {

    /** Exit code: the specs differ. */
    static final int DIFFERENT = 1;

    static final Set<String> VALUE_OPTIONS = Set.of("trials", "seed");
    static final Set<String> FLAGS = Set.of("json");

    @Override
    public String summary() {
        return "compare two specs: fields added, removed, moved, changed, and the consequence";
    }

    @Override
    public String usage() {
        return "trimwright diff OLD NEW [--json] [--trials N] [--seed S]\n\n"
                + "  --json        one JSON object (keys: docs/check-and-diff.md)\n"
                + "  --trials N    Monte Carlo trials per changed field (default " + CheckCommand.DEFAULT_TRIALS
                + "; both versions use the same seed)\n"
                + "  --seed S      random seed (default " + AnalysisSettings.DEFAULT_SEED + ")\n\n"
                + "Exit codes: 0 equal, 1 different, 2 bad usage, 3 unreadable file.";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) {
        Args a = Args.parse(args, VALUE_OPTIONS, FLAGS);
        if (a.positional().size() != 2) {
            throw new UsageException("expected OLD and NEW spec files, got " + a.positional());
        }
        long trials = a.trials(100, CheckCommand.DEFAULT_TRIALS);
        AnalysisSettings settings = AnalysisSettings.DEFAULTS.withTrials(trials)
                .withSeed(a.longValue("seed", AnalysisSettings.DEFAULT_SEED));
        SpecSource oldSpec;
        SpecSource newSpec;
        try {
            oldSpec = SpecSource.load(a.positional().get(0));
            newSpec = SpecSource.load(a.positional().get(1));
        } catch (SpecLoadException e) {
            err.println("trimwright diff: " + e.getMessage());
            return Main.UNREADABLE;
        }
        List<FieldDiff> diffs = SpecDiff.compare(oldSpec.spec(), newSpec.spec(), new ReportCache(settings),
                new ReportCache(settings));
        int code = diffs.isEmpty() ? 0 : DIFFERENT;
        out.print(a.flag("json") ? json(oldSpec, newSpec, diffs, code) + "\n" : text(oldSpec, newSpec, diffs));
        return code;
    }

    static String text(SpecSource o, SpecSource n, List<FieldDiff> diffs) {
        StringBuilder sb = new StringBuilder();
        sb.append(o.name()).append(" -> ").append(n.name()).append(": ");
        if (diffs.isEmpty()) {
            return sb.append("fields equal\n").toString();
        }
        sb.append(diffs.size()).append(diffs.size() == 1 ? " field differs\n" : " fields differ\n");
        for (FieldDiff d : diffs) {
            sb.append('\n').append(String.format("%-8s %s", d.kind(), d.path()));
            if (d.oldPath() != null && !d.oldPath().equals(d.path())) {
                sb.append("  (was ").append(d.oldPath()).append(')');
            }
            sb.append('\n');
            for (Change c : d.changes()) {
                sb.append(String.format("         %-8s %s: %s -> %s%n", c.category(), c.attribute(), c.oldValue(),
                        c.newValue()));
            }
            Consequence q = d.consequence();
            if (q != null) {
                sb.append("         => step table: ");
                if (q.changedCodes().isEmpty() && q.oldCodes() == q.newCodes()) {
                    sb.append("unchanged");
                } else {
                    sb.append(q.changedCodes().isEmpty() ? "no common code changed"
                            : "value changed at codes " + q.changedCodesText());
                    if (q.oldCodes() != q.newCodes()) {
                        sb.append("; codes ").append(q.oldCodes()).append(" -> ").append(q.newCodes());
                    }
                }
                sb.append('\n');
                if (!Double.isNaN(q.pNonMonotonicOld()) || !Double.isNaN(q.pNonMonotonicNew())) {
                    sb.append(String.format(Locale.ROOT, "         => P(non-monotonic) %s: %s -> %s (%s)%n",
                            q.riskDirection(), p(q.pNonMonotonicOld()), p(q.pNonMonotonicNew()), q.riskMethod()));
                    sb.append(String.format(Locale.ROOT, "         => DNL yield %s: %s -> %s; INL yield (%s) %s: %s -> %s%n",
                            Consequence.direction(q.dnlYieldOld(), q.dnlYieldNew()), pct(q.dnlYieldOld()),
                            pct(q.dnlYieldNew()), q.inlDefinition(),
                            Consequence.direction(q.inlYieldOld(), q.inlYieldNew()), pct(q.inlYieldOld()),
                            pct(q.inlYieldNew())));
                }
            }
        }
        return sb.toString();
    }

    private static String p(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.3g", v);
    }

    private static String pct(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.2f %%", 100 * v);
    }

    static String json(SpecSource o, SpecSource n, List<FieldDiff> diffs, int exitCode) {
        JsonWriter w = new JsonWriter().beginObject();
        w.field("old", o.name()).field("new", n.name()).field("equal", diffs.isEmpty()).field("exitCode", exitCode);
        w.key("fields").beginArray();
        for (FieldDiff d : diffs) {
            w.beginObject().field("kind", d.kind()).field("path", d.path());
            w.key("oldPath");
            if (d.oldPath() == null) {
                w.nullValue();
            } else {
                w.value(d.oldPath());
            }
            w.key("changes").beginArray();
            for (Change c : d.changes()) {
                w.beginObject().field("category", c.category()).field("attribute", c.attribute())
                        .field("old", c.oldValue()).field("new", c.newValue()).endObject();
            }
            w.endArray();
            w.key("consequence");
            Consequence q = d.consequence();
            if (q == null) {
                w.nullValue();
            } else {
                w.beginObject().field("oldCodes", q.oldCodes()).field("newCodes", q.newCodes());
                w.key("changedCodes").beginArray();
                for (int c : q.changedCodes()) {
                    w.value(c);
                }
                w.endArray();
                w.key("risk").beginObject().field("old", q.pNonMonotonicOld()).field("new", q.pNonMonotonicNew())
                        .field("direction", q.riskDirection());
                w.key("method");
                if (q.riskMethod() == null) {
                    w.nullValue();
                } else {
                    w.value(q.riskMethod());
                }
                w.endObject();
                w.key("dnlYield").beginObject().field("old", q.dnlYieldOld()).field("new", q.dnlYieldNew())
                        .field("direction", Consequence.direction(q.dnlYieldOld(), q.dnlYieldNew())).endObject();
                w.key("inlYield").beginObject().field("old", q.inlYieldOld()).field("new", q.inlYieldNew())
                        .field("direction", Consequence.direction(q.inlYieldOld(), q.inlYieldNew()));
                w.key("definition");
                if (q.inlDefinition() == null) {
                    w.nullValue();
                } else {
                    w.value(q.inlDefinition());
                }
                w.endObject().endObject();
            }
            w.endObject();
        }
        return w.endArray().endObject().toJson();
    }
}
