package org.trimwright.export.doc;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.trimwright.analysis.FieldReport;
import org.trimwright.charts.DnlInlChart;
import org.trimwright.charts.FieldCharts;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.glitch.GlitchAdvice;
import org.trimwright.engine.glitch.GlitchStep;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.GateType;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.export.ExportedField;
import org.trimwright.export.Problem;
import org.trimwright.export.SpecDigest;
import org.trimwright.export.text.Markup;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Field;

/** The document sections of one field: its chapter and its appendix table. */
public final class FieldSections {

    /** Step tables with more codes than this are summarised in the chapter (full table in the appendix). */
    public static final int SHORT_TABLE = 32;
    /** Rows shown at each end of a summarised table. */
    public static final int SUMMARY_ROWS = 8;
    /** Largest table printed in full in the appendix; wider fields refer to their CSV test table. */
    public static final int APPENDIX_LIMIT = 4096;

    private FieldSections() {
    }

    /** Anchor of a field's chapter. */
    public static String id(ExportedField f) {
        return Markup.anchor("field-" + f.path());
    }

    /** Anchor of a field's appendix table. */
    public static String appendixId(ExportedField f) {
        // not "steps-": that is the anchor of the step table section in the field's chapter
        return Markup.anchor("appendix-steps-" + f.path());
    }

    /** True when the field's step table is summarised and printed in full in the appendix. */
    public static boolean inAppendix(ExportedField f) {
        return f.report() != null && f.report().coding().stepTable().size() > SHORT_TABLE;
    }

    /** The field's chapter as a list of sections (heading section first). */
    public static List<Section> chapter(ExportedField f, SpecDigest digest) {
        Field fd = f.field();
        List<Section> out = new ArrayList<>();
        Section.Builder head = new Section.Builder(id(f), "Field " + f.path(), 2);
        List<String[]> kv = new ArrayList<>();
        kv.add(new String[] {"Purpose", nz(fd.getDescription())});
        kv.add(new String[] {"Register", f.register().getName() + " at " + Numbers.hex(f.address()) + ", bits "
                + Numbers.bits(fd.getBitOffset(), fd.getWidth())});
        kv.add(new String[] {"Role / access", fd.getRole().getLiteral() + " / " + fd.getAccess().getLiteral()});
        kv.add(new String[] {"Reset code", Long.toString(fd.getResetCode())});
        head.add(new Part.KeyValues(kv));
        if (f.report() == null) {
            head.add(new Part.Caution("This field could not be analysed: " + f.error()));
        }
        out.add(head.build());
        FieldReport r = f.report();
        if (r != null) {
            out.add(target(f, r));
            out.add(coding(f, r));
            out.add(steps(f, r));
            out.add(monotonicity(f, r));
            out.add(dnlInl(f, r));
            out.add(decoder(f, r));
            out.add(glitch(f, r));
            out.add(sizing(f, r));
        }
        out.add(problems(f, digest));
        out.add(cautions(f, r));
        return out;
    }

    private static Section.Builder sub(ExportedField f, String key, String title) {
        return new Section.Builder(Markup.anchor(key + "-" + f.path()), title, 3);
    }

    private static Section target(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "target", "Target");
        AnalogTarget t = f.field().getTarget();
        SiUnit u = r.inputs().unit();
        List<String[]> kv = new ArrayList<>();
        if (t == null) {
            s.para("No analog target given: values are signed step counts.");
        } else {
            kv.add(new String[] {"Quantity", t.getQuantity().getLiteral() + (u.symbol().isEmpty() ? ""
                    : " [" + u.symbol() + "]")});
            kv.add(new String[] {"Value at code step 0", Numbers.si(t.getValueAtZero(), u)});
            kv.add(new String[] {"Step (1 LSB)", Numbers.si(t.getStep(), u)});
            kv.add(new String[] {"Signed format", t.getSignedFormat().getLiteral()});
            if (t.isSetTargetValue()) {
                kv.add(new String[] {"Target value", Numbers.si(t.getTargetValue(), u)});
            }
            if (t.isSetSpreadMin() && t.isSetSpreadMax()) {
                kv.add(new String[] {"Untrimmed spread", Numbers.si(t.getSpreadMin(), u) + " to "
                        + Numbers.si(t.getSpreadMax(), u)});
            }
            if (t.isSetAccuracy()) {
                kv.add(new String[] {"Required accuracy after trim", "\u00B1" + Numbers.si(t.getAccuracy(), u)});
            }
            if (t.isSetSafeMin() || t.isSetSafeMax()) {
                kv.add(new String[] {"Safe limits", (t.isSetSafeMin() ? Numbers.si(t.getSafeMin(), u) : "-")
                        + " to " + (t.isSetSafeMax() ? Numbers.si(t.getSafeMax(), u) : "-")});
            }
            StepTable st = r.coding().stepTable();
            kv.add(new String[] {"Nominal range", Numbers.si(min(st), u) + " to " + Numbers.si(max(st), u)
                    + " over " + st.size() + " codes"});
            s.add(new Part.KeyValues(kv));
        }
        return s.build();
    }

    private static Section coding(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "coding", "Coding and why");
        var c = r.inputs().coding();
        StringBuilder how = new StringBuilder("Coding: ").append(c.scheme().key());
        if (c.unaryBits() > 0) {
            how.append(" with ").append(c.unaryBits()).append(" unary MSBs and ").append(c.binaryBits())
                    .append(" binary LSBs");
        }
        how.append(", signed format ").append(c.signedFormat().key()).append(", switches ")
                .append(c.activeLow() ? "active-low" : "active-high").append(c.zeroState() ? ", with zero state" : "")
                .append('.');
        s.para(how.toString());
        SegmentationAdvice advice = r.mismatch().map(MismatchReport::segmentation).orElse(null);
        if (advice == null) {
            s.para("No segmentation advice: the field has no unit element model, so mismatch risk is not computed.");
            return s.build();
        }
        s.para("Segmentation advice (" + advice.method() + "): "
                + (advice.cheapestMeeting() >= 0
                        ? "the cheapest split meeting the limits has M = " + advice.cheapestMeeting() + " unary bits"
                                + verdict(c.scheme().key(), c.unaryBits(), f.field().getWidth(),
                                        advice.cheapestMeeting())
                        : "no split of this width meets the limits; relax the limits or improve matching."));
        List<List<String>> rows = new ArrayList<>();
        for (SegmentationRow row : advice.rows()) {
            rows.add(List.of(Integer.toString(row.unaryBits()), Integer.toString(row.binaryBits()),
                    Integer.toString(row.switches()), Numbers.g(row.decoderNand2Eq()), Numbers.g(row.cost()),
                    Numbers.g(row.sigmaDnlWorst()), row.monotonicGuaranteed() ? "0 (by construction)"
                            : Numbers.p(row.pNonMonotonicBound()),
                    Numbers.p(row.passYield()), row.meetsLimits() ? "yes" : "no"));
        }
        s.add(new Part.Table("Splits M (unary) + B (binary); cost = decoder NAND2 eq. + switches; P(non-monotonic):"
                + " union bound of exact per-step probabilities; pass yield: Monte Carlo",
                List.of("M", "B", "switches", "decoder NAND2 eq.", "cost", "worst \u03C3DNL [LSB]",
                        "P(non-monotonic) \u2264", "pass yield", "meets limits"), rows));
        s.add(new Part.Chart("Cost against risk for each split", new ChartFigure(() -> FieldCharts.segmentation(r))));
        return s.build();
    }

    private static String verdict(String scheme, int unary, int width, int best) {
        int m = switch (scheme) {
            case "binary", "gray" -> 0;
            case "thermometer" -> width;
            case "segmented" -> unary;
            default -> -1;
        };
        if (m < 0) {
            return " (this field is a select decoder; the advice compares array codings of the same width).";
        }
        return m == best ? "; the chosen coding is that split." : "; the chosen coding has M = " + m + ".";
    }

    private static Section steps(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "steps", "Step table");
        StepTable st = r.coding().stepTable();
        SiUnit u = r.inputs().unit();
        List<List<String>> rows = new ArrayList<>();
        boolean summary = st.size() > SHORT_TABLE;
        for (int code = 0; code < st.size(); code++) {
            if (summary && code == SUMMARY_ROWS) {
                rows.add(List.of("\u2026", "\u2026", "\u2026", "\u2026", (st.size() - 2 * SUMMARY_ROWS)
                        + " codes omitted", ""));
                code = st.size() - SUMMARY_ROWS;
            }
            rows.add(stepRow(st.row(code), u));
        }
        String caption = summary
                ? "Summary: first and last " + SUMMARY_ROWS + " of " + st.size() + " codes; "
                        + (st.size() <= APPENDIX_LIMIT ? "full table in the appendix"
                                : "full table in the CSV test table (too long to print)")
                : "All " + st.size() + " codes";
        s.add(new Part.Table(caption, STEP_HEADER, rows));
        s.add(new Part.Chart("Transfer", new ChartFigure(() -> FieldCharts.transfer(r))));
        return s.build();
    }

    /** Header of step tables. */
    public static final List<String> STEP_HEADER = List.of("code", "register bits", "signed step s",
            "units in use / tap", "nominal value", "closed switches");

    /** One step table row as document cells. */
    public static List<String> stepRow(StepRow row, SiUnit u) {
        String sw = row.closedSwitches().size() > 6 ? row.closedSwitches().size() + " switches"
                : String.join(" ", row.closedSwitches());
        return List.of(Integer.toString(row.code()), row.registerBits(), Integer.toString(row.signedSteps()),
                row.tap() >= 0 ? "tap " + row.tap() : Integer.toString(row.unitsInUse()), Numbers.si(row.value(), u),
                sw);
    }

    private static Section monotonicity(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "monotonic", "Monotonicity");
        if (r.mismatch().isEmpty()) {
            s.para("Not analysed: the field has no unit element model (mismatch statistics need one).");
            return s.build();
        }
        MismatchReport.Monotonicity m = r.mismatch().get().monotonic();
        if (m.guaranteed()) {
            s.para("Guaranteed by construction: " + m.method() + ".");
            return s.build();
        }
        List<String[]> kv = new ArrayList<>();
        if (r.exactMonotonic().isPresent()) {
            ExactMonotonicity e = r.exactMonotonic().get();
            kv.add(new String[] {"P(non-monotonic), exact", Numbers.p(e.probabilityNonMonotonic()) + " \u00B1 "
                    + Numbers.p(e.numericalError()) + " (" + e.method() + ")"});
        }
        kv.add(new String[] {"P(non-monotonic), bounded", "\u2264 " + Numbers.p(m.unionBound())
                + " (union bound over distinct steps, exact Gaussian per step); largest single step "
                + Numbers.p(m.largestSingle())});
        MismatchReport.MonteCarloEstimate mc = m.monteCarlo();
        kv.add(new String[] {"P(non-monotonic), sampled", Numbers.p(mc.estimate()) + ", 95 % " + mc.interval()
                + " interval [" + Numbers.p(mc.ci95Low()) + ", " + Numbers.p(mc.ci95High()) + "], " + mc.trials()
                + " Monte Carlo trials"});
        double limit = f.field().getLimits() == null ? Double.NaN : f.field().getLimits().getMaxNonMonotonicRisk();
        if (f.field().getLimits() != null) {
            kv.add(new String[] {"Limit", Numbers.p(limit)});
        }
        s.add(new Part.KeyValues(kv));
        return s.build();
    }

    private static Section dnlInl(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "dnlinl", "DNL and INL yields");
        if (r.mismatch().isEmpty()) {
            s.para("Not analysed: the field has no unit element model.");
            return s.build();
        }
        MismatchReport m = r.mismatch().get();
        MismatchReport.DnlSummary d = m.dnl();
        double[] ci = d.yieldCi95();
        List<String[]> kv = new ArrayList<>();
        kv.add(new String[] {"DNL definition", d.definition()});
        kv.add(new String[] {"Worst DNL sigma", Numbers.lsb(d.sigmaWorst()) + " (" + d.worstTransition() + ")"});
        kv.add(new String[] {"DNL yield, sampled", "P(max|DNL| < " + Numbers.g(d.limit()) + " LSB) = "
                + Numbers.p(d.yield()) + ", 95 % interval [" + Numbers.p(ci[0]) + ", " + Numbers.p(ci[1]) + "]"});
        if (r.exactDnl().isPresent()) {
            ExactDnlYield e = r.exactDnl().get();
            kv.add(new String[] {"DNL yield, exact", Numbers.p(e.yield()) + " \u00B1 " + Numbers.p(e.numericalError())
                    + " (" + e.definition() + " LSB; " + e.method() + ")"});
        }
        s.add(new Part.KeyValues(kv));
        InlDefinition def = m.limits().inlDefinition();
        List<List<String>> rows = new ArrayList<>();
        for (InlDefinition each : InlDefinition.values()) {
            MismatchReport.InlFigures fig = m.inl().get(each);
            rows.add(List.of(DnlInlChart.describe(each) + (each == def ? " \u2190 limit applies" : ""),
                    Numbers.g(fig.sigmaWorst()), Numbers.g(fig.meanMaxAbs()), Numbers.p(fig.yieldHalfLsb()),
                    Numbers.p(fig.yield())));
        }
        s.add(new Part.Table("INL under each definition (Monte Carlo, " + m.run().trials() + " trials, seed "
                + m.run().seed() + "; limit " + Numbers.g(m.limits().maxInlLsb()) + " LSB, target yield "
                + Numbers.p(m.limits().targetYield()) + ")",
                List.of("INL definition", "worst \u03C3 [LSB]", "mean max|INL| [LSB]", "P(max|INL| < 0.5 LSB)",
                        "P(max|INL| < limit)"), rows));
        s.add(new Part.Chart("Per-code DNL and INL sigma", new ChartFigure(() -> FieldCharts.dnlInl(r))));
        s.add(new Part.Chart("Distribution of max|DNL| and max|INL|", new ChartFigure(() -> FieldCharts.errorDistribution(r))));
        return s.build();
    }

    private static Section decoder(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "decoder", "Decoder cost");
        DecoderCost c = r.coding().cost();
        List<String[]> kv = new ArrayList<>();
        StringBuilder gates = new StringBuilder();
        for (Map.Entry<GateType, Integer> e : c.gates().entrySet()) {
            if (e.getValue() > 0) {
                gates.append(gates.length() == 0 ? "" : ", ").append(e.getValue()).append(' ').append(e.getKey());
            }
        }
        kv.add(new String[] {"Gates", gates.length() == 0 ? "none (bits drive the switches directly)"
                : gates.toString()});
        kv.add(new String[] {"Transistors", Integer.toString(c.transistors())});
        kv.add(new String[] {"NAND2 equivalents", Numbers.g(c.nand2Equivalent())});
        kv.add(new String[] {"Decoder outputs / switches", c.decoderOutputs() + " / " + c.switches()});
        kv.add(new String[] {"Unit elements", Integer.toString(c.unitElements())});
        kv.add(new String[] {"Method", c.method()});
        r.coding().twoLevelCost().ifPresent(t -> kv.add(new String[] {"Two-level (SOP) realisation",
                Numbers.g(t.nand2Equivalent()) + " NAND2 eq., " + t.transistors() + " transistors"}));
        s.add(new Part.KeyValues(kv));
        return s.build();
    }

    private static Section glitch(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "glitch", "Glitch exposure");
        GlitchStep w = r.coding().glitch().worst();
        SiUnit u = r.inputs().unit();
        if (w == null || w.excursionLsb() == 0) {
            s.para("No adjacent step can pass through an out-of-range intermediate code, whatever the bit skew.");
        } else {
            s.para("Worst adjacent step: code " + w.fromCode() + " to " + w.toCode() + " toggles "
                    + w.toggleCount() + " bits; with skew the output can pass through code " + w.worstCode()
                    + ", an excursion of " + w.excursionLsb() + " LSB (" + Numbers.si(w.excursionUnit(), u) + ").");
        }
        var lim = f.field().getLimits();
        if (lim != null && lim.isSetMaxGlitchLsb() && w != null) {
            s.para("Limit " + Numbers.g(lim.getMaxGlitchLsb()) + " LSB: "
                    + (w.excursionLsb() <= lim.getMaxGlitchLsb() ? "met." : "exceeded."));
        }
        for (GlitchAdvice a : r.coding().glitch().advice()) {
            s.para("Remedy (" + a.remedy() + "): " + a.text() + " Cost: " + Numbers.g(a.nand2Equivalent())
                    + " NAND2 eq." + (a.flops() > 0 ? ", " + a.flops() + " flip-flops" : "") + ".");
        }
        return s.build();
    }

    private static Section sizing(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "sizing", "Trim sizing and production search");
        SizingResult z = r.mismatch().map(MismatchReport::sizing).orElse(null);
        String declared = f.field().getProductionSearch() == null ? "not declared"
                : f.field().getProductionSearch().getLiteral();
        if (z == null) {
            s.para("No sizing: the target gives no untrimmed spread and accuracy (or the field has no unit element)."
                    + " Declared production search: " + declared + ".");
            return s.build();
        }
        List<String[]> kv = new ArrayList<>();
        kv.add(new String[] {"Range to span", Numbers.si(z.range(), z.unit())});
        kv.add(new String[] {"Largest step meeting the accuracy", Numbers.si(z.maxStep(), z.unit())
                + " (2 \u00B7 accuracy / (1 + max|DNL|))"});
        kv.add(new String[] {"Bits needed / bits of the field", z.bitsNeeded() + " / " + z.bits()});
        kv.add(new String[] {"Step at these bits", Numbers.si(z.step(), z.unit())});
        kv.add(new String[] {"Residual error after trim", "worst " + Numbers.si(z.residualWorst(), z.unit())
                + ", rms " + Numbers.si(z.residualRms(), z.unit()) + (z.meetsAccuracy() ? " (meets the accuracy)"
                        : " (does NOT meet the accuracy)")});
        kv.add(new String[] {"Production search allowed", z.search() + ", " + z.measurements()
                + " measurements (linear: " + z.linearMeasurements() + ")"});
        kv.add(new String[] {"Binary-search risk", Numbers.p(z.binarySearchRisk())
                + " (probability of a negative step that can mislead a binary search)"});
        kv.add(new String[] {"Declared production search", declared});
        kv.add(new String[] {"Reasoning", z.note()});
        s.add(new Part.KeyValues(kv));
        return s.build();
    }

    private static Section problems(ExportedField f, SpecDigest digest) {
        Section.Builder s = sub(f, "problems", "Validation problems");
        List<Problem> ps = new ArrayList<>(digest.problemsOf(f.path()));
        if (ps.isEmpty()) {
            s.para("No problems found by the checks that ran (" + sourcesText(digest) + ").");
        } else {
            List<List<String>> rows = new ArrayList<>();
            for (Problem p : ps) {
                rows.add(List.of(p.severity(), p.path(), p.foundBy(), p.message(), p.advice() == null ? ""
                        : p.advice()));
            }
            s.add(new Part.Table(ps.size() + " problem(s) of " + f.path(), List.of("severity", "element",
                    "found by [rule]", "message", "advice"), rows));
        }
        return s.build();
    }

    private static String sourcesText(SpecDigest digest) {
        return String.join(", ", digest.checks());
    }

    private static Section cautions(ExportedField f, FieldReport r) {
        Section.Builder s = sub(f, "cautions", "Cautions");
        AnalogTarget t = f.field().getTarget();
        boolean any = false;
        if (t != null && r != null && (t.isSetSafeMin() || t.isSetSafeMax())) {
            StepTable st = r.coding().stepTable();
            List<String> bad = new ArrayList<>();
            int runStart = -1;
            for (int code = 0; code <= st.size(); code++) {
                boolean out = code < st.size() && outside(st.value(code), t);
                if (out && runStart < 0) {
                    runStart = code;
                } else if (!out && runStart >= 0) {
                    bad.add(runStart == code - 1 ? Integer.toString(runStart) : runStart + "-" + (code - 1));
                    runStart = -1;
                }
            }
            if (!bad.isEmpty()) {
                any = true;
                s.add(new Part.Caution("Codes " + String.join(", ", bad) + " set a nominal value outside the safe "
                        + "limits and can hurt the chip: keep them out of firmware and test programs."));
            }
            if (f.field().getResetCode() < st.size() && outside(st.value((int) f.field().getResetCode()), t)) {
                any = true;
                s.add(new Part.Caution("The reset code " + f.field().getResetCode()
                        + " lies outside the safe limits."));
            }
        }
        if (any || (t != null && (t.isSetSafeMin() || t.isSetSafeMax()))) {
            s.para("The safe limits come from the foundry's rules and your licensed design practice; they are the"
                    + " authority, not this document.");
        } else {
            s.para("No safe limits entered for this field, so no code is flagged. Where a code can stress the chip,"
                    + " enter the limits given by the foundry's rules and your licensed design practice.");
        }
        return s.build();
    }

    private static boolean outside(double v, AnalogTarget t) {
        double eps = 1e-9 * Math.max(Math.abs(v), Math.abs(t.getStep()));
        return (t.isSetSafeMin() && v < t.getSafeMin() - eps) || (t.isSetSafeMax() && v > t.getSafeMax() + eps);
    }

    /** The appendix section with the full step table (null when the chapter shows it all). */
    public static Section appendix(ExportedField f) {
        if (!inAppendix(f)) {
            return null;
        }
        StepTable st = f.report().coding().stepTable();
        Section.Builder s = new Section.Builder(appendixId(f), "Step table of " + f.path(), 2);
        if (st.size() > APPENDIX_LIMIT) {
            s.para(st.size() + " codes: too long to print; the CSV test table of this field lists every code.");
            return s.build();
        }
        List<List<String>> rows = new ArrayList<>(st.size());
        SiUnit u = f.report().inputs().unit();
        for (StepRow row : st.rows()) {
            rows.add(stepRow(row, u));
        }
        s.add(new Part.Table("All " + st.size() + " codes", STEP_HEADER, rows));
        return s.build();
    }

    private static double min(StepTable st) {
        double m = Double.POSITIVE_INFINITY;
        for (int c = 0; c < st.size(); c++) {
            m = Math.min(m, st.value(c));
        }
        return m;
    }

    private static double max(StepTable st) {
        double m = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < st.size(); c++) {
            m = Math.max(m, st.value(c));
        }
        return m;
    }

    private static String nz(String s) {
        return s == null || s.isBlank() ? "(no description)" : s;
    }
}
