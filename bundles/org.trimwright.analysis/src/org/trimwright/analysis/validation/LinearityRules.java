package org.trimwright.analysis.validation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.WilsonInterval;
import org.trimwright.model.Field;
import org.trimwright.model.Limits;

/** Monotonicity and linearity of a field against its limits. */
final class LinearityRules {

    private LinearityRules() {
    }

    /**
     * {@code linearity.non-monotonic-risk}: the field must be monotonic, its coding is not monotonic by construction,
     * and P(non-monotonic) exceeds the field's maxNonMonotonicRisk.
     */
    static final class MonotonicRiskRule implements FieldRule {

        @Override
        public String constraint() {
            return "monotonicRisk";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            Limits l = field.getLimits();
            if (l == null || !l.isMustBeMonotonic() || r.mismatch().isEmpty()) {
                return List.of();
            }
            if (CodingFitRules.clearedByUnionBound(r, l.getMaxNonMonotonicRisk())) {
                return List.of();
            }
            r = full.get();
            MismatchReport m = r.mismatch().get();
            MonotonicRisk risk = MonotonicRisk.of(r, m);
            if (risk.guaranteed() || risk.probability() <= l.getMaxNonMonotonicRisk()) {
                return List.of();
            }
            String message = "must be monotonic, but " + m.field().scheme() + " coding is not monotonic by"
                    + " construction and P(non-monotonic) = " + Numbers.probability(risk.probability()) + " ("
                    + risk.method() + ") exceeds the allowed risk of " + Numbers.probability(l.getMaxNonMonotonicRisk())
                    + "; worst step " + m.dnl().worstTransition() + " has DNL sigma " + Numbers.lsb(m.dnl().sigmaWorst())
                    + " LSB";
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("pNonMonotonic", risk.probability());
            fig.put("maxNonMonotonicRisk", l.getMaxNonMonotonicRisk());
            fig.put("sigmaDnlWorstLsb", m.dnl().sigmaWorst());
            return List.of(new Finding("linearity.non-monotonic-risk", Severity.ERROR, r.inputs().path(), message,
                    MonotonicRisk.segmentationAdvice(m), fig));
        }
    }

    /**
     * {@code linearity.dnl-yield} and {@code linearity.inl-yield}: P(max|DNL| &lt; limit) or P(max|INL| &lt; limit)
     * under the field's INL definition is below the target yield. The DNL yield is the exact figure where the engine
     * has it for the same limit, else Monte Carlo; a Monte Carlo yield whose 95 % Wilson interval still reaches the
     * target is a warning (not confirmed at this number of trials), one wholly below it an error.
     */
    static final class YieldRule implements FieldRule {

        @Override
        public String constraint() {
            return "linearityYield";
        }

        @Override
        public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
            Limits l = field.getLimits();
            if (l == null || r.mismatch().isEmpty()) {
                return List.of();
            }
            MismatchReport q = r.mismatch().get();
            if ((!l.isSetMaxDnlLsb() || q.dnl().yield() >= q.limits().targetYield()) && (!l.isSetMaxInlLsb()
                    || q.inl().get(q.limits().inlDefinition()).yield() >= q.limits().targetYield())) {
                return List.of();
            }
            r = full.get();
            MismatchReport m = r.mismatch().get();
            double target = m.limits().targetYield();
            long n = m.run().trials();
            List<Finding> out = new ArrayList<>();
            if (l.isSetMaxDnlLsb()) {
                ExactDnlYield exact = r.exactDnl().orElse(null);
                if (exact != null && exact.limitLsb() == m.dnl().limit()) {
                    if (exact.yield() < target) {
                        out.add(yieldFinding(r, "linearity.dnl-yield", Severity.ERROR, "max|DNL|", m.dnl().limit(),
                                "DNL = step - 1 in nominal LSB", exact.yield(), exact.method(), target,
                                MonotonicRisk.segmentationAdvice(m)));
                    }
                } else {
                    add(out, r, "linearity.dnl-yield", "max|DNL|", m.dnl().limit(), "DNL = step - 1 in nominal LSB",
                            m.dnl().yield(), n, target, MonotonicRisk.segmentationAdvice(m));
                }
            }
            if (l.isSetMaxInlLsb()) {
                InlDefinition def = m.limits().inlDefinition();
                MismatchReport.InlFigures f = m.inl().get(def);
                add(out, r, "linearity.inl-yield", "max|INL|", f.limit(), definition(def), f.yield(), n, target,
                        MonotonicRisk.segmentationAdvice(m));
            }
            return out;
        }

        private static void add(List<Finding> out, FieldReport r, String id, String what, double limit,
                String definition, double yield, long trials, double target, String advice) {
            if (yield >= target) {
                return;
            }
            double[] ci = WilsonInterval.of(Math.round(yield * trials), trials, 0.95);
            Severity s = ci[1] < target ? Severity.ERROR : Severity.WARNING;
            String method = "Monte Carlo, " + trials + " trials, 95 % Wilson interval " + Numbers.percent(ci[0])
                    + " .. " + Numbers.percent(ci[1]) + (s == Severity.WARNING ? "; not confirmed at this number of"
                            + " trials: rerun with more" : "");
            out.add(yieldFinding(r, id, s, what, limit, definition, yield, method, target, advice));
        }

        private static Finding yieldFinding(FieldReport r, String id, Severity s, String what, double limit,
                String definition, double yield, String method, double target, String advice) {
            String message = "yield of " + what + " < " + Numbers.lsb(limit) + " LSB is " + Numbers.percent(yield)
                    + " (" + method + "), below the target yield of " + Numbers.percent(target) + "; definition: "
                    + definition;
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("yield", yield);
            fig.put("targetYield", target);
            fig.put("limitLsb", limit);
            return new Finding(id, s, r.inputs().path(), message, advice, fig);
        }

        static String definition(InlDefinition def) {
            switch (def) {
                case BEST_FIT:
                    return "INL best-fit (deviation from the least-squares line, in that line's LSB)";
                case ABSOLUTE:
                    return "INL absolute (deviation from the nominal value, nominal LSB)";
                default:
                    return "INL endpoint (deviation from the line through the end levels, in that line's LSB)";
            }
        }
    }
}
