package org.trimwright.analysis.validation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Supplier;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.glitch.GlitchAdvice;
import org.trimwright.engine.glitch.GlitchStep;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.model.Access;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.Limits;
import org.trimwright.model.ProductionSearch;
import org.trimwright.model.Stepping;

/** Whether the coding fits how the field is used: select decoders, stepped fields, production search. */
final class CodingFitRules {

    /** P(non-monotonic) allowed for a binary search when the field states no limits (the model's default). */
    static final double DEFAULT_SEARCH_RISK = 1e-6;

    private CodingFitRules() {
    }

    /** True when software can write the field (so any code is reachable). */
    static boolean writable(Field f) {
        return f.getAccess() == Access.READ_WRITE || f.getAccess() == Access.WRITE_ONLY;
    }

    /**
     * {@code coding.illegal-select-code-reachable}. Definition: the register of an n-bit one-hot or one-cold field
     * holds a binary index; the decoder turns it into 2^n tap selects, or 2^n - 1 with a zero state, where code
     * (array level) 0 selects no tap. Every code therefore selects exactly one tap except the zero-state code. That
     * code is <b>illegal</b> when the field needs a defined analog value: a trim field (its node would float), or a
     * field whose target has safe limits (a supply or regulator select whose feedback would open). For other mode
     * selects the no-tap code is a designed "off" state and legal. An illegal code is <b>reachable</b> when it is
     * the reset code or software can write the field (read-write or write-only).
     */
    static final class SelectCodes implements FieldRule {

        @Override
        public String constraint() {
            return "selectCodesLegal";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            if (field.getCoding() == null || (field.getCoding().getScheme() != CodingScheme.ONE_HOT
                    && field.getCoding().getScheme() != CodingScheme.ONE_COLD)) {
                return List.of();
            }
            boolean safe = field.getTarget() != null && (field.getTarget().isSetSafeMin()
                    || field.getTarget().isSetSafeMax());
            if (field.getRole() != FieldRole.TRIM && !safe) {
                return List.of();
            }
            StepTable st = r.coding().stepTable();
            List<Integer> illegal = new ArrayList<>();
            for (int c = 0; c < st.size(); c++) {
                if (st.row(c).tap() < 0 && (writable(field) || c == field.getResetCode())) {
                    illegal.add(c);
                }
            }
            if (illegal.isEmpty()) {
                return List.of();
            }
            String why = field.getRole() == FieldRole.TRIM ? "a trim field must always connect a tap"
                    : "its target has safe limits, so the selected node must never be left open";
            String reach = field.getResetCode() == illegal.get(0) ? "it is the reset code" : "software can write it ("
                    + field.getAccess().getLiteral() + ")";
            String message = field.getCoding().getScheme().getLiteral() + " select with a zero state: code "
                    + illegal + " selects no tap, but " + why + "; the code is reachable: " + reach;
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("illegalCodes", (double) illegal.size());
            return List.of(new Finding("coding.illegal-select-code-reachable", Severity.ERROR, r.inputs().path(),
                    message, "drop the zero state (2^n taps, every code selects one) or make the write logic refuse"
                            + " code " + illegal.get(0), fig));
        }
    }

    /**
     * {@code coding.glitch-exceeds-limit}: a multi-bit field stepped one code at a time whose worst intermediate code
     * (the engine's glitch exposure: any skew between toggling bits) lies further outside the step than maxGlitchLsb.
     */
    static final class GlitchLimit implements FieldRule {

        @Override
        public String constraint() {
            return "glitchWithinLimit";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            Limits l = field.getLimits();
            if (field.getStepping() != Stepping.ONE_CODE_AT_ATIME || field.getWidth() < 2 || l == null
                    || !l.isSetMaxGlitchLsb()) {
                return List.of();
            }
            GlitchStep w = r.coding().glitch().worst();
            if (w.excursionLsb() <= l.getMaxGlitchLsb()) {
                return List.of();
            }
            String message = String.format(Locale.ROOT, "stepped one code at a time, but the step from code %d to"
                    + " %d toggles %d bits and can pass through code %d, %d LSB (%s) outside the step; the limit is"
                    + " %s LSB", w.fromCode(), w.toCode(), w.toggleCount(), w.worstCode(), w.excursionLsb(),
                    Numbers.value(r, w.excursionUnit()), Numbers.lsb(l.getMaxGlitchLsb()));
            List<String> advice = new ArrayList<>();
            for (GlitchAdvice a : r.coding().glitch().advice()) {
                if (a.remedy().equals("gray-register")) {
                    advice.add("Gray register: " + a.xorGates() + " XOR2 = " + Numbers.lsb(a.nand2Equivalent())
                            + " NAND2 eq.");
                } else {
                    advice.add("resample the decoder outputs: " + a.flops() + " flip-flops");
                }
            }
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("worstGlitchLsb", (double) w.excursionLsb());
            fig.put("maxGlitchLsb", l.getMaxGlitchLsb());
            return List.of(new Finding("coding.glitch-exceeds-limit", Severity.ERROR, r.inputs().path(), message,
                    advice.isEmpty() ? null : String.join("; or ", advice), fig));
        }
    }

    /**
     * {@code search.binary-not-monotonic}: production trim by binary search (the model's default search for a trim
     * field, so it applies unless the field states linear search) needs a monotonic
     * transfer; warns when the field is not monotonic by construction and its P(non-monotonic) exceeds the field's
     * maxNonMonotonicRisk (1e-6 when the field states no limits).
     */
    static final class BinarySearch implements FieldRule {

        @Override
        public String constraint() {
            return "searchNeedsMonotonic";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            if (field.getRole() != FieldRole.TRIM || field.getProductionSearch() != ProductionSearch.BINARY_SEARCH
                    || r.mismatch().isEmpty()) {
                return List.of();
            }
            double allowed = field.getLimits() == null ? DEFAULT_SEARCH_RISK
                    : field.getLimits().getMaxNonMonotonicRisk();
            if (clearedByUnionBound(r, allowed)) {
                return List.of();
            }
            r = full.get();
            MismatchReport m = r.mismatch().get();
            MonotonicRisk risk = MonotonicRisk.of(r, m);
            if (risk.guaranteed() || risk.probability() <= allowed) {
                return List.of();
            }
            long linear = m.sizing() != null ? m.sizing().linearMeasurements() : r.coding().stepTable().size() - 1L;
            String message = "production trim by binary search (" + field.getWidth() + " measurements) needs a"
                    + " monotonic transfer, but this field is not monotonic by construction: P(non-monotonic) = "
                    + Numbers.probability(risk.probability()) + " (" + risk.method() + ") above "
                    + Numbers.probability(allowed) + "; a negative step can lead the search to a wrong code";
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("pNonMonotonic", risk.probability());
            fig.put("maxNonMonotonicRisk", allowed);
            fig.put("linearMeasurements", (double) linear);
            String seg = MonotonicRisk.segmentationAdvice(m);
            String advice = "linear search (up to " + linear + " measurements) is safe on any transfer"
                    + (seg == null ? "" : "; or " + seg);
            return List.of(new Finding("search.binary-not-monotonic", Severity.WARNING, r.inputs().path(), message,
                    advice, fig));
        }
    }

    /**
     * True when the report shows the field monotonic by construction or its union bound (an upper bound of the
     * exact P(non-monotonic)) within {@code allowed}: then no exact figure can exceed it.
     */
    static boolean clearedByUnionBound(FieldReport r, double allowed) {
        MismatchReport.Monotonicity m = r.mismatch().get().monotonic();
        return m.guaranteed() || m.unionBound() <= allowed;
    }

    /** The codes of a step table as a short list. */
    static String codes(List<StepRow> rows) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < rows.size() && i < 8; i++) {
            sb.append(i == 0 ? "" : ", ").append(rows.get(i).code());
        }
        if (rows.size() > 8) {
            sb.append(", ... (").append(rows.size()).append(" codes)");
        }
        return sb.toString();
    }
}
