package org.trimwright.analysis.validation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Field;

/**
 * Cautions {@code caution.reset-outside-safe-limits} and {@code caution.codes-outside-safe-limits}: the nominal value
 * (engine step table) of the reset code, or of any code software can write, lies outside the target's safe limits
 * (inclusive). Always a warning: the limits come from the foundry's rules and the designer's licensed practice,
 * which Trimwright does not judge.
 */
final class SafeLimitsRule implements FieldRule {

    static final String DEFER = "confirm the limit and the consequences against your foundry's rules and licensed"
            + " design practice";

    @Override
    public String constraint() {
        return "codesInsideSafeLimits";
    }

    @Override
    public List<Finding> check(Field field, FieldReport r, Supplier<FieldReport> full) {
        AnalogTarget t = field.getTarget();
        if (t == null || (!t.isSetSafeMin() && !t.isSetSafeMax())) {
            return List.of();
        }
        StepTable st = r.coding().stepTable();
        List<Finding> out = new ArrayList<>();
        long reset = field.getResetCode();
        if (reset >= 0 && reset < st.size() && outside(t, st.value((int) reset))) {
            double v = st.value((int) reset);
            out.add(new Finding("caution.reset-outside-safe-limits", Severity.WARNING, r.inputs().path(),
                    "reset code " + reset + " gives " + Numbers.value(r, v) + ", " + which(t, v) + "; " + DEFER,
                    null, figures(t, v)));
        }
        if (!CodingFitRules.writable(field)) {
            return out;
        }
        List<StepRow> bad = new ArrayList<>();
        double worst = Double.NaN;
        for (StepRow row : st.rows()) {
            if (outside(t, row.value())) {
                bad.add(row);
                if (Double.isNaN(worst) || distance(t, row.value()) > distance(t, worst)) {
                    worst = row.value();
                }
            }
        }
        if (!bad.isEmpty()) {
            out.add(new Finding("caution.codes-outside-safe-limits", Severity.WARNING, r.inputs().path(),
                    "software can write code " + CodingFitRules.codes(bad) + " giving up to " + Numbers.value(r, worst)
                            + ", " + which(t, worst) + "; " + DEFER,
                    "limit the writable codes in the register logic or firmware, or narrow the field's range",
                    figures(t, worst)));
        }
        return out;
    }

    /** Relative tolerance of the comparison, so that 0.9 V + 6 x 50 mV counts as 1.2 V (rounding of doubles). */
    static final double TOLERANCE = 1e-9;

    private static boolean outside(AnalogTarget t, double v) {
        return (t.isSetSafeMax() && v > t.getSafeMax() + TOLERANCE * Math.abs(t.getSafeMax()))
                || (t.isSetSafeMin() && v < t.getSafeMin() - TOLERANCE * Math.abs(t.getSafeMin()));
    }

    private static double distance(AnalogTarget t, double v) {
        return Math.max(t.isSetSafeMax() ? v - t.getSafeMax() : 0, t.isSetSafeMin() ? t.getSafeMin() - v : 0);
    }

    private static String which(AnalogTarget t, double v) {
        return t.isSetSafeMax() && v > t.getSafeMax() ? "beyond the safe maximum of " + t.getSafeMax() + " "
                + t.getUnit() : "below the safe minimum of " + t.getSafeMin() + " " + t.getUnit();
    }

    private static Map<String, Double> figures(AnalogTarget t, double v) {
        Map<String, Double> fig = new LinkedHashMap<>();
        fig.put("value", v);
        if (t.isSetSafeMin()) {
            fig.put("safeMin", t.getSafeMin());
        }
        if (t.isSetSafeMax()) {
            fig.put("safeMax", t.getSafeMax());
        }
        return fig;
    }
}
