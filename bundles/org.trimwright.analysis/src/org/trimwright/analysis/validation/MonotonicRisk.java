package org.trimwright.analysis.validation;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;

/**
 * P(non-monotonic) of a field as the reports state it: the exact figure ({@code FieldReport.exactMonotonic}) where the
 * engine has it, else the union bound over distinct steps (an upper bound). Zero when monotonic by construction.
 *
 * @param probability P(some step &lt; 0)
 * @param method      which figure, in words
 * @param guaranteed  monotonic by construction
 */
public record MonotonicRisk(double probability, String method, boolean guaranteed) {

    /** The risk of a field with mismatch statistics. */
    public static MonotonicRisk of(FieldReport r, MismatchReport m) {
        if (m.monotonic().guaranteed()) {
            return new MonotonicRisk(0, "monotonic by construction", true);
        }
        if (r.exactMonotonic().isPresent()) {
            return new MonotonicRisk(r.exactMonotonic().get().probabilityNonMonotonic(),
                    r.exactMonotonic().get().method(), false);
        }
        return new MonotonicRisk(m.monotonic().unionBound(),
                "union bound over distinct steps, exact Gaussian per step (an upper bound)", false);
    }

    /** The engine's segmentation advice in one sentence, or null when the report has none. */
    public static String segmentationAdvice(MismatchReport m) {
        SegmentationAdvice a = m.segmentation();
        if (a == null) {
            return null;
        }
        if (a.cheapestMeeting() < 0) {
            return "no segmentation split of the " + a.bits() + " bits meets the limits at this unit sigma"
                    + " (engine's segmentation rows): larger unit elements are needed";
        }
        for (SegmentationRow row : a.rows()) {
            if (row.unaryBits() == a.cheapestMeeting()) {
                String split = row.binaryBits() == 0 ? "thermometer (M=" + row.unaryBits() + ")"
                        : "segmented with M=" + row.unaryBits();
                return split + " meets the limits at " + Math.round(row.decoderNand2Eq()) + " NAND2 eq. ("
                        + row.unaryElements() + " unary elements, " + row.switches() + " switches; P(non-monotonic) <= "
                        + Numbers.probability(row.monotonicGuaranteed() ? 0 : Math.min(row.pNonMonotonicBound(),
                                row.pNonMonotonicMcHigh()))
                        + ", pass yield " + Numbers.percent(row.passYield()) + " at " + row.trials() + " trials)";
            }
        }
        return null;
    }
}
