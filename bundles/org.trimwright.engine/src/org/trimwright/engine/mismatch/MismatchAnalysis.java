package org.trimwright.engine.mismatch;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;

import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.montecarlo.AllCodesEvaluator;
import org.trimwright.engine.mismatch.montecarlo.GaussianSource;
import org.trimwright.engine.mismatch.montecarlo.Histogram;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;
import org.trimwright.engine.mismatch.montecarlo.TrialSampler;
import org.trimwright.engine.mismatch.sequence.GradientStudy;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvisor;
import org.trimwright.engine.mismatch.sizing.SizingRequest;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.engine.mismatch.sizing.TrimSizing;

/**
 * Entry point of the mismatch statistics: exact per-transition figures, first-order per-code sigmas, and a
 * reproducible all-core Monte Carlo (one normal per element, O(elements) per trial) for the distributions of max|DNL|
 * and max|INL| under the three definitions.
 */
public final class MismatchAnalysis {

    /** Envelope work limit (trials times levels); wide fields get fewer envelope trials (stated in the report). */
    public static final long ENVELOPE_WORK = 5_000_000L;
    /** Bins of the max|DNL| / max|INL| histograms. */
    public static final int HISTOGRAM_BINS = 50;

    private MismatchAnalysis() {
    }

    /** Statistics of one field (no segmentation advice, no sizing). */
    public static MismatchReport run(FieldCoding coding, ElementModel model, Limits limits,
            MonteCarloOptions options) {
        ElementArray array = ElementArray.of(coding, model);
        TransitionAnalysis transitions = TransitionAnalysis.of(array);
        MonteCarloResult mc = MonteCarloRun.run(array, options);
        AllCodesEvaluator codes = new AllCodesEvaluator(array);
        PerCodeSigma sigma = PerCodeSigma.of(array);

        MismatchReport.FieldSummary field = new MismatchReport.FieldSummary(coding.bits(), coding.scheme().key(),
                coding.signedFormat().key(), array.unaryBits(), array.binaryBits(), array.unaryCount(),
                codes.levels(), codes.minSigned());

        boolean guaranteed = transitions.monotonicByConstruction();
        MismatchReport.Monotonicity monotonic = new MismatchReport.Monotonicity(guaranteed,
                guaranteed
                        ? "monotonic by construction: every step adds one non-negative element"
                        : "exact Gaussian P(step < 0) per distinct step, union bound over distinct steps; "
                                + "Monte Carlo with 95 % Wilson score interval",
                transitions.unionBound(), transitions.unionBoundCountingOccurrences(), transitions.largestSingle(),
                MismatchReport.MonteCarloEstimate.of(mc.nonMonotonicCount(), mc.trials()));

        Transition worst = transitions.worstSigma();
        double dnlYield = mc.yield(Metric.DNL, limits.maxDnlLsb());
        long dnlPass = Math.round(dnlYield * mc.trials());
        MismatchReport.DnlSummary dnl = new MismatchReport.DnlSummary(
                "DNL = step - 1 in nominal LSB; sigma exact per transition, yield = P(max|DNL| < limit) by Monte Carlo",
                worst.sigma(), worst.label(), limits.maxDnlLsb(), dnlYield,
                WilsonInterval.of(dnlPass, mc.trials(), 0.95),
                mc.mean(Metric.DNL), mc.mean(Metric.DNL_ENDPOINT), mc.quantile(Metric.DNL, limits.targetYield()));

        MismatchReport.InlSummary inl = new MismatchReport.InlSummary(
                inlFigures(InlDefinition.ENDPOINT, Metric.INL_ENDPOINT, sigma, array, codes, mc, limits),
                inlFigures(InlDefinition.BEST_FIT, Metric.INL_BEST_FIT, sigma, array, codes, mc, limits),
                inlFigures(InlDefinition.ABSOLUTE, Metric.INL_ABSOLUTE, sigma, array, codes, mc, limits));

        List<Histogram> histograms = new ArrayList<>();
        for (Metric m : new Metric[] {Metric.DNL, Metric.INL_ENDPOINT, Metric.INL_BEST_FIT, Metric.INL_ABSOLUTE}) {
            histograms.add(mc.histogram(m, HISTOGRAM_BINS));
        }
        MismatchReport.PerCodeData perCode = perCode(array, codes, sigma, options);
        int threads = Math.min(options.effectiveThreads(),
                (int) ((options.trials() + MonteCarloOptions.BLOCK - 1) / MonteCarloOptions.BLOCK));
        MismatchReport.RunFacts run = new MismatchReport.RunFacts(mc.trials(), options.seed(), threads, mc.seconds(),
                mc.trials() / Math.max(mc.seconds(), 1e-9),
                "structural: one normal per element, max|DNL| and max|INL| (3 definitions) in O(elements) per trial");
        GradientStudy gradients = GradientStudy.of(coding, model);
        return new MismatchReport(field, model, limits, monotonic, dnl, inl, transitions.transitions(), perCode,
                histograms, run, gradients, null, null);
    }

    /**
     * Statistics plus segmentation advice (all splits of the field's width with its signed format) and, if
     * {@code sizing} is not null, trim sizing with the field's DNL and monotonicity figures.
     *
     * @param nand2EqForSplit decoder NAND2 equivalents of the split with M unary bits (from the coding engine)
     */
    public static MismatchReport run(FieldCoding coding, ElementModel model, Limits limits, MonteCarloOptions options,
            IntToDoubleFunction nand2EqForSplit, SizingRequest sizing) {
        MismatchReport report = run(coding, model, limits, options);
        SegmentationAdvice advice = nand2EqForSplit == null ? null
                : SegmentationAdvisor.advise(coding.bits(), coding.signedFormat(), model, limits, options,
                        nand2EqForSplit, SegmentationAdvisor.DEFAULT_SWITCH_NAND2_EQ);
        SizingResult sized = sizing == null ? null : TrimSizing.size(sizing.withField(report));
        return report.with(advice, sized);
    }

    private static MismatchReport.InlFigures inlFigures(InlDefinition def, Metric metric, PerCodeSigma sigma,
            ElementArray array, AllCodesEvaluator codes, MonteCarloResult mc, Limits limits) {
        double[] magnitudeSigma = sigma.inl(def);
        double[] s = toSigned(magnitudeSigma, array, codes, false);
        double worst = 0;
        int worstLevel = 0;
        for (int k = 0; k < s.length; k++) {
            if (s[k] > worst) {
                worst = s[k];
                worstLevel = k;
            }
        }
        return new MismatchReport.InlFigures(def.key(), worst, worstLevel, mc.mean(metric), mc.yield(metric, 0.5),
                limits.maxInlLsb(), mc.yield(metric, limits.maxInlLsb()), mc.quantile(metric, limits.targetYield()));
    }

    /** Maps a per-magnitude-level array to the transfer's levels (mirrored for sign-magnitude). */
    static double[] toSigned(double[] magnitude, ElementArray array, AllCodesEvaluator codes, boolean step) {
        if (!array.signMagnitude()) {
            return magnitude.clone();
        }
        int top = array.topLevel();
        double[] out = new double[codes.levels()];
        for (int k = 0; k < out.length; k++) {
            int s = k + codes.minSigned();
            int m;
            if (step) {
                m = k == 0 ? 0 : (s >= 1 ? s : 1 - s);
            } else {
                m = Math.abs(s);
            }
            out[k] = magnitude[Math.min(m, top)];
        }
        return out;
    }

    private static MismatchReport.PerCodeData perCode(ElementArray array, AllCodesEvaluator codes, PerCodeSigma sigma,
            MonteCarloOptions options) {
        double[] u = new double[array.unaryCount()];
        double[] b = new double[array.binaryBits()];
        array.meanValues(u, b);
        double[] nominal = codes.transfer(u, b);
        double[] systematic = codes.inlEndpoint(nominal);
        int levels = codes.levels();
        int env = (int) Math.min(options.envelopeTrials(), Math.max(10, ENVELOPE_WORK / levels));
        env = (int) Math.min(env, options.trials());
        double[] dnlMin = new double[levels];
        double[] dnlMax = new double[levels];
        double[] inlMin = new double[levels];
        double[] inlMax = new double[levels];
        if (env > 0) {
            java.util.Arrays.fill(dnlMin, Double.POSITIVE_INFINITY);
            java.util.Arrays.fill(dnlMax, Double.NEGATIVE_INFINITY);
            java.util.Arrays.fill(inlMin, Double.POSITIVE_INFINITY);
            java.util.Arrays.fill(inlMax, Double.NEGATIVE_INFINITY);
            GaussianSource g = MonteCarloRun.blockSource(options.seed(), 0);
            TrialSampler sampler = new TrialSampler(array);
            for (int t = 0; t < env; t++) {
                sampler.draw(g, u, b);
                double[] v = codes.transfer(u, b);
                double[] d = codes.dnl(v);
                double[] i = codes.inlEndpoint(v);
                for (int k = 0; k < levels; k++) {
                    dnlMin[k] = Math.min(dnlMin[k], d[k]);
                    dnlMax[k] = Math.max(dnlMax[k], d[k]);
                    inlMin[k] = Math.min(inlMin[k], i[k]);
                    inlMax[k] = Math.max(inlMax[k], i[k]);
                }
            }
        }
        return new MismatchReport.PerCodeData(nominal, toSigned(sigma.dnl(), array, codes, true),
                toSigned(sigma.inl(InlDefinition.ENDPOINT), array, codes, false),
                toSigned(sigma.inl(InlDefinition.BEST_FIT), array, codes, false),
                toSigned(sigma.inl(InlDefinition.ABSOLUTE), array, codes, false), systematic, env, dnlMin, dnlMax,
                inlMin, inlMax);
    }
}
