package org.trimwright.engine.mismatch.sizing;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.TransitionAnalysis;
import org.trimwright.engine.mismatch.WilsonInterval;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * Evaluates every split M = 0..n of an n-bit field (M = 0 binary, M = n thermometer) with the same element model and
 * seed, and picks the cheapest split that meets the limits.
 */
public final class SegmentationAdvisor {

    /** NAND2 equivalents charged per switch with its local driver (our assumption, adjustable). */
    public static final double DEFAULT_SWITCH_NAND2_EQ = 1.0;
    /** Element draws per row at most (keeps the advice near a second); rows with many elements get fewer trials. */
    public static final long DRAW_BUDGET = 4_000_000L;
    /** Fewest trials per row. */
    public static final long MIN_TRIALS = 500L;

    private SegmentationAdvisor() {
    }

    /**
     * Advice for an n-bit field.
     *
     * @param nand2EqForSplit decoder NAND2 equivalents of the split with M unary bits
     * @param switchNand2Eq   NAND2 equivalents charged per switch
     */
    public static SegmentationAdvice advise(int bits, SignedFormat format, ElementModel model, Limits limits,
            MonteCarloOptions options, IntToDoubleFunction nand2EqForSplit, double switchNand2Eq) {
        List<SegmentationRow> rows = new ArrayList<>();
        int cheapest = -1;
        double cheapestCost = Double.POSITIVE_INFINITY;
        Metric inlMetric = metricOf(limits);
        for (int m = 0; m <= bits; m++) {
            FieldCoding coding = coding(bits, m, format);
            ElementArray array = ElementArray.of(coding, model);
            TransitionAnalysis ta = TransitionAnalysis.of(array);
            long trials = Math.min(options.trials(), Math.max(MIN_TRIALS, DRAW_BUDGET / array.elementCount()));
            MonteCarloResult mc = MonteCarloRun.run(array, options.withTrials(trials));
            long nonMono = mc.nonMonotonicCount();
            double[] ci = WilsonInterval.of(nonMono, trials, 0.95);
            int switches = array.unaryCount() + array.binaryBits();
            double nand2 = nand2EqForSplit.applyAsDouble(m);
            double cost = nand2 + switches * switchNand2Eq;
            double pass = (double) mc.passCount(limits.maxDnlLsb(), inlMetric, limits.maxInlLsb()) / trials;
            boolean monoOk = ta.monotonicByConstruction()
                    || Math.min(ta.unionBound(), ci[1]) <= limits.maxNonMonotonic();
            boolean meets = monoOk && pass >= limits.targetYield();
            rows.add(new SegmentationRow(m, bits - m, array.unaryCount(), switches, nand2, cost,
                    ta.worstSigma().sigma(), ta.monotonicByConstruction(), ta.unionBound(),
                    (double) nonMono / trials, ci[1], mc.yield(Metric.DNL, limits.maxDnlLsb()),
                    mc.yield(Metric.INL_ENDPOINT, limits.maxInlLsb()),
                    mc.yield(Metric.INL_BEST_FIT, limits.maxInlLsb()),
                    mc.yield(Metric.INL_ABSOLUTE, limits.maxInlLsb()), pass, trials, meets));
            if (meets && cost < cheapestCost) {
                cheapestCost = cost;
                cheapest = m;
            }
        }
        return new SegmentationAdvice(bits, rows, cheapest,
                "per split: exact DNL sigma and union bound; Monte Carlo (same seed for every split) for yields; "
                        + "meets = P(non-monotonic) within limit by union bound or Monte Carlo 95 % upper end, "
                        + "and joint yield >= target");
    }

    static Metric metricOf(Limits limits) {
        switch (limits.inlDefinition()) {
            case ENDPOINT:
                return Metric.INL_ENDPOINT;
            case BEST_FIT:
                return Metric.INL_BEST_FIT;
            default:
                return Metric.INL_ABSOLUTE;
        }
    }

    /** The coding of the split with m unary bits (binary for 0, thermometer for n). */
    public static FieldCoding coding(int bits, int m, SignedFormat format) {
        CodingScheme scheme = m == 0 ? CodingScheme.BINARY
                : m == bits ? CodingScheme.THERMOMETER : CodingScheme.SEGMENTED;
        int unary = scheme == CodingScheme.SEGMENTED ? m : 0;
        return new FieldCoding(bits, scheme, unary, format, false, false);
    }
}
