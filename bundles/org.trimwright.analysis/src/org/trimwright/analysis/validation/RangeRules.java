package org.trimwright.analysis.validation;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Field;

/**
 * Range and resolution of a trim against its untrimmed spread and post-trim accuracy.
 * <p>Definitions: the field's <b>code range</b> is [min, max] of the nominal values of all codes (the engine's step
 * table). The untrimmed spread [spreadMin, spreadMax] is stated in the same scale: the values the trim must be able
 * to set so that every untrimmed part can be brought to its target. The <b>residual</b> after trim is half the
 * widest gap between adjacent levels.
 */
final class RangeRules {

    /** Margin beyond the spread, in sigmas of the end codes' absolute INL (common practice, no source). */
    static final double MARGIN_SIGMAS = 3.0;

    private RangeRules() {
    }

    /** {@code range.spread-not-covered}. */
    static final class SpreadCoverage implements FieldRule {

        @Override
        public String constraint() {
            return "rangeCoversSpread";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            AnalogTarget t = field.getTarget();
            if (t == null || !t.isSetSpreadMin() || !t.isSetSpreadMax()) {
                return List.of();
            }
            StepTable st = r.coding().stepTable();
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int c = 0; c < st.size(); c++) {
                lo = Math.min(lo, st.value(c));
                hi = Math.max(hi, st.value(c));
            }
            double margin = margin(r);
            double needLo = t.getSpreadMin() - margin;
            double needHi = t.getSpreadMax() + margin;
            double shortLo = Math.max(0, lo - needLo);
            double shortHi = Math.max(0, needHi - hi);
            if (shortLo == 0 && shortHi == 0) {
                return List.of();
            }
            String marginText = margin > 0
                    ? " plus a margin of " + Numbers.value(r, margin) + " on each side (" + (int) MARGIN_SIGMAS
                            + " sigma of the end codes' absolute INL from unit mismatch; common practice, no source)"
                    : " (no unit element stated, so no mismatch margin)";
            String message = "code range " + Numbers.value(r, lo) + " .. " + Numbers.value(r, hi)
                    + " does not cover the untrimmed spread " + Numbers.value(r, t.getSpreadMin()) + " .. "
                    + Numbers.value(r, t.getSpreadMax()) + marginText + ": short by " + Numbers.value(r, shortLo)
                    + " at the low end and " + Numbers.value(r, shortHi) + " at the high end";
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("codeMin", lo);
            fig.put("codeMax", hi);
            fig.put("spreadMin", t.getSpreadMin());
            fig.put("spreadMax", t.getSpreadMax());
            fig.put("margin", margin);
            fig.put("shortLow", shortLo);
            fig.put("shortHigh", shortHi);
            return List.of(new Finding("range.spread-not-covered", Severity.ERROR, r.inputs().path(), message,
                    sizingAdvice(r), fig));
        }

        /** MARGIN_SIGMAS x the larger absolute-INL sigma of the lowest and highest level, in the target unit. */
        private static double margin(FieldReport r) {
            Optional<MismatchReport> m = r.mismatch();
            if (m.isEmpty()) {
                return 0;
            }
            double[] s = m.get().perCode().inlSigmaAbsolute();
            if (s.length == 0) {
                return 0;
            }
            return MARGIN_SIGMAS * Math.max(s[0], s[s.length - 1]) * Math.abs(r.inputs().step());
        }
    }

    /** {@code range.step-too-coarse}: a nominal step above twice the accuracy misses it even with ideal elements. */
    static final class StepResolution implements FieldRule {

        @Override
        public String constraint() {
            return "stepMeetsAccuracy";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            AnalogTarget t = field.getTarget();
            if (t == null || !t.isSetAccuracy()) {
                return List.of();
            }
            double step = Math.abs(r.inputs().step());
            if (step <= 2 * t.getAccuracy()) {
                return List.of();
            }
            String message = "step " + Numbers.value(r, step) + " is too coarse for the post-trim accuracy of +-"
                    + Numbers.value(r, t.getAccuracy()) + ": the nearest code can lie half a step ("
                    + Numbers.value(r, step / 2) + ") from the target even with ideal elements; the step must be at"
                    + " most 2 x accuracy = " + Numbers.value(r, 2 * t.getAccuracy());
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("step", step);
            fig.put("accuracy", t.getAccuracy());
            fig.put("maxStepIdeal", 2 * t.getAccuracy());
            return List.of(new Finding("range.step-too-coarse", Severity.ERROR, r.inputs().path(), message,
                    sizingAdvice(r), fig));
        }
    }

    /**
     * {@code range.residual-exceeds-accuracy}: half the widest gap, step (1 + max|DNL|) / 2 with max|DNL| at the target
     * yield (the engine's Monte Carlo quantile, the same figure its trim sizing uses), exceeds the accuracy. Reported
     * only when the nominal step itself is fine (else {@code range.step-too-coarse} says it).
     */
    static final class ResidualAfterTrim implements FieldRule {

        @Override
        public String constraint() {
            return "residualMeetsAccuracy";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            AnalogTarget t = field.getTarget();
            if (t == null || !t.isSetAccuracy() || r.mismatch().isEmpty()) {
                return List.of();
            }
            double step = Math.abs(r.inputs().step());
            if (step > 2 * t.getAccuracy()) {
                return List.of();
            }
            MismatchReport m = r.mismatch().get();
            double dnl = m.dnl().quantileAtTargetYield();
            double residual = step * (1 + dnl) / 2;
            if (residual <= t.getAccuracy()) {
                return List.of();
            }
            String message = "residual error after trim up to " + Numbers.value(r, residual)
                    + " exceeds the accuracy of +-" + Numbers.value(r, t.getAccuracy()) + ": half the widest gap,"
                    + " step x (1 + max|DNL|) / 2, with max|DNL| = " + Numbers.lsb(dnl) + " LSB at the "
                    + Numbers.percent(m.limits().targetYield()) + " target yield (Monte Carlo quantile, "
                    + m.run().trials() + " trials)";
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("residualWorst", residual);
            fig.put("accuracy", t.getAccuracy());
            fig.put("maxDnlLsbAtTargetYield", dnl);
            fig.put("step", step);
            return List.of(new Finding("range.residual-exceeds-accuracy", Severity.ERROR, r.inputs().path(),
                    message, sizingAdvice(r), fig));
        }
    }

    /** The engine's trim sizing in one sentence, or null when the field has no sizing. */
    static String sizingAdvice(FieldReport r) {
        if (r.mismatch().isEmpty() || r.mismatch().get().sizing() == null) {
            return null;
        }
        SizingResult s = r.mismatch().get().sizing();
        return "trim sizing (engine): the spread's span of " + Numbers.value(r, s.range()) + " at a step of at most "
                + Numbers.value(r, s.maxStep()) + " (2 x accuracy / (1 + max|DNL|)) needs " + s.bitsNeeded()
                + " bits; with this field's " + s.bits() + " bits the step would be " + Numbers.value(r, s.step())
                + ", residual up to " + Numbers.value(r, s.residualWorst())
                + (s.meetsAccuracy() ? " (meets the accuracy)" : " (misses the accuracy)");
    }
}
