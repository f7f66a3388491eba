package org.trimwright.engine.mismatch;

import java.util.List;

import org.trimwright.engine.mismatch.montecarlo.Histogram;
import org.trimwright.engine.mismatch.sequence.GradientStudy;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SizingResult;

/**
 * Mismatch statistics of one field, immutable. Its components map to the JSON keys {@code monotonic}, {@code dnl},
 * {@code inl} ({@code endpoint}, {@code bestFit}, {@code absolute}), {@code segmentation} and {@code sizing};
 * the rest feeds charts. All DNL/INL figures are in LSB; each record names its definition and method.
 *
 * @param field        what was analysed
 * @param model        the element model used
 * @param limits       the limits applied
 * @param monotonic    monotonicity figures
 * @param dnl          DNL figures
 * @param inl          INL figures under the three definitions
 * @param transitions  the distinct transition types with exact Gaussian statistics
 * @param perCode      per-code arrays for charts
 * @param histograms   histograms of max|DNL| and max|INL| (three definitions) over the trials
 * @param run          Monte Carlo run facts
 * @param gradients    switching-sequence comparison under the gradient (null if not requested)
 * @param segmentation segmentation advice (null if not requested)
 * @param sizing       trim sizing (null if not requested)
 */
public record MismatchReport(FieldSummary field, ElementModel model, Limits limits, Monotonicity monotonic,
        DnlSummary dnl, InlSummary inl, List<Transition> transitions, PerCodeData perCode, List<Histogram> histograms,
        RunFacts run, GradientStudy gradients, SegmentationAdvice segmentation, SizingResult sizing) {

    public MismatchReport {
        transitions = List.copyOf(transitions);
        histograms = List.copyOf(histograms);
    }

    /** A copy with segmentation advice and sizing filled in. */
    public MismatchReport with(SegmentationAdvice newSegmentation, SizingResult newSizing) {
        return new MismatchReport(field, model, limits, monotonic, dnl, inl, transitions, perCode, histograms, run,
                gradients, newSegmentation, newSizing);
    }

    /**
     * The field as the statistics see it.
     *
     * @param bits           register bits
     * @param scheme         coding scheme key
     * @param signedFormat   signed format key
     * @param unaryBits      M of the (magnitude) element array
     * @param binaryBits     B of the (magnitude) element array
     * @param unaryElements  2^M - 1
     * @param levels         distinct levels of the transfer
     * @param firstSigned    signed value of the first level
     */
    public record FieldSummary(int bits, String scheme, String signedFormat, int unaryBits, int binaryBits,
            int unaryElements, int levels, int firstSigned) {
    }

    /**
     * Monotonicity.
     *
     * @param guaranteed                true when monotonic by construction (unary, thermometer, select taps)
     * @param method                    how the figures were obtained
     * @param unionBound                union bound over distinct random steps (exact Gaussian per step)
     * @param unionBoundAllOccurrences  the looser bound counting every occurrence
     * @param largestSingle             largest single-step probability (a lower bound)
     * @param monteCarlo                Monte Carlo estimate with a 95 % Wilson score interval
     */
    public record Monotonicity(boolean guaranteed, String method, double unionBound, double unionBoundAllOccurrences,
            double largestSingle, MonteCarloEstimate monteCarlo) {
    }

    /**
     * A Monte Carlo proportion.
     *
     * @param estimate  k / n
     * @param ci95Low   lower end of the 95 % Wilson score interval
     * @param ci95High  upper end
     * @param trials    n
     * @param count     k
     * @param interval  the interval's name
     */
    public record MonteCarloEstimate(double estimate, double ci95Low, double ci95High, long trials, long count,
            String interval) {

        /** Builds the estimate for k of n with the Wilson score interval. */
        public static MonteCarloEstimate of(long count, long trials) {
            double[] ci = WilsonInterval.of(count, trials, 0.95);
            return new MonteCarloEstimate((double) count / trials, ci[0], ci[1], trials, count, "Wilson score");
        }
    }

    /**
     * DNL: step - 1 in nominal LSB.
     *
     * @param definition        the definition in words
     * @param sigmaWorst        largest exact DNL sigma over the transitions
     * @param worstTransition   label of that transition
     * @param limit             the max|DNL| limit
     * @param yield             Monte Carlo fraction with max|DNL| below the limit
     * @param yieldCi95         Wilson 95 % interval of that yield {low, high}
     * @param meanMaxAbs        Monte Carlo mean of max|DNL|
     * @param meanMaxAbsEndpointLsb Monte Carlo mean of max|DNL| measured in endpoint LSB
     * @param quantileAtTargetYield the max|DNL| that the target yield fraction of trials stays within
     */
    public record DnlSummary(String definition, double sigmaWorst, String worstTransition, double limit,
            double yield, double[] yieldCi95, double meanMaxAbs, double meanMaxAbsEndpointLsb,
            double quantileAtTargetYield) {

        public DnlSummary {
            yieldCi95 = yieldCi95.clone();
        }

        @Override
        public double[] yieldCi95() {
            return yieldCi95.clone();
        }
    }

    /**
     * INL under the three definitions.
     *
     * @param endpoint endpoint line
     * @param bestFit  least-squares line
     * @param absolute nominal LSB and zero
     */
    public record InlSummary(InlFigures endpoint, InlFigures bestFit, InlFigures absolute) {

        /** The figures of {@code def}. */
        public InlFigures get(InlDefinition def) {
            switch (def) {
                case ENDPOINT:
                    return endpoint;
                case BEST_FIT:
                    return bestFit;
                default:
                    return absolute;
            }
        }
    }

    /**
     * INL figures of one definition.
     *
     * @param definition    key of the definition
     * @param sigmaWorst    largest first-order INL sigma over the levels (analytic)
     * @param worstLevel    index of that level in the transfer (0 = lowest signed value)
     * @param meanMaxAbs    Monte Carlo mean of max|INL|
     * @param yieldHalfLsb  Monte Carlo fraction with max|INL| &lt; 0.5 LSB
     * @param limit         the max|INL| limit of the field
     * @param yield         Monte Carlo fraction with max|INL| below the limit
     * @param quantileAtTargetYield the max|INL| that the target yield fraction of trials stays within
     */
    public record InlFigures(String definition, double sigmaWorst, int worstLevel, double meanMaxAbs,
            double yieldHalfLsb, double limit, double yield, double quantileAtTargetYield) {
    }

    /**
     * Per-code arrays over the transfer's levels (index k = signed value - firstSigned).
     *
     * @param nominal          mean transfer (units, gradient included)
     * @param dnlSigma         exact DNL sigma of the step into level k (k = 0 unused)
     * @param inlSigmaEndpoint first-order INL sigma, endpoint
     * @param inlSigmaBestFit  first-order INL sigma, best fit
     * @param inlSigmaAbsolute INL sigma, absolute (exact)
     * @param systematicInlEndpoint INL of the mean transfer (gradient), endpoint
     * @param envelopeTrials   trials in the envelopes (the first trials of the run)
     * @param dnlMin           smallest DNL per level over the envelope trials
     * @param dnlMax           largest DNL per level
     * @param inlEndpointMin   smallest endpoint INL per level
     * @param inlEndpointMax   largest endpoint INL per level
     */
    public record PerCodeData(double[] nominal, double[] dnlSigma, double[] inlSigmaEndpoint,
            double[] inlSigmaBestFit, double[] inlSigmaAbsolute, double[] systematicInlEndpoint, int envelopeTrials,
            double[] dnlMin, double[] dnlMax, double[] inlEndpointMin, double[] inlEndpointMax) {

        public PerCodeData {
            nominal = nominal.clone();
            dnlSigma = dnlSigma.clone();
            inlSigmaEndpoint = inlSigmaEndpoint.clone();
            inlSigmaBestFit = inlSigmaBestFit.clone();
            inlSigmaAbsolute = inlSigmaAbsolute.clone();
            systematicInlEndpoint = systematicInlEndpoint.clone();
            dnlMin = dnlMin.clone();
            dnlMax = dnlMax.clone();
            inlEndpointMin = inlEndpointMin.clone();
            inlEndpointMax = inlEndpointMax.clone();
        }

        @Override
        public double[] nominal() {
            return nominal.clone();
        }

        @Override
        public double[] dnlSigma() {
            return dnlSigma.clone();
        }

        @Override
        public double[] inlSigmaEndpoint() {
            return inlSigmaEndpoint.clone();
        }

        @Override
        public double[] inlSigmaBestFit() {
            return inlSigmaBestFit.clone();
        }

        @Override
        public double[] inlSigmaAbsolute() {
            return inlSigmaAbsolute.clone();
        }

        @Override
        public double[] systematicInlEndpoint() {
            return systematicInlEndpoint.clone();
        }

        @Override
        public double[] dnlMin() {
            return dnlMin.clone();
        }

        @Override
        public double[] dnlMax() {
            return dnlMax.clone();
        }

        @Override
        public double[] inlEndpointMin() {
            return inlEndpointMin.clone();
        }

        @Override
        public double[] inlEndpointMax() {
            return inlEndpointMax.clone();
        }
    }

    /**
     * Facts of the Monte Carlo run.
     *
     * @param trials         trials
     * @param seed           seed
     * @param threads        threads used
     * @param seconds        sampling wall time
     * @param trialsPerSecond trials / seconds
     * @param method         what one trial computes
     */
    public record RunFacts(long trials, long seed, int threads, double seconds, double trialsPerSecond,
            String method) {
    }
}
