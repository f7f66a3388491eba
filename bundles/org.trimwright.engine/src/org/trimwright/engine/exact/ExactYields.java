package org.trimwright.engine.exact;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.stats.Normal;

/**
 * Exact monotonicity and DNL yields of binary-weighted, segmented and unary (thermometer) arrays with independent
 * Gaussian element errors, by the running-sum recursion of {@link RunningSumRecursion}. Entry points for the
 * analysis, the command line and benchmarks.
 * <p>
 * Definitions: a step is the value change from code c to c + 1 in the order of the array (unsigned code order).
 * Monotonicity counts steps where at least one element switches off; a step that only switches an element on
 * (the first binary step, every thermometer step) is non-negative by construction because an element cannot have
 * a negative value (the Gaussian model's P(W &lt; 0) = Q(nominal / sigma) is ignored there). DNL of a step is
 * step / LSB - 1 under the named LSB definition.
 */
public final class ExactYields {

    private static final double ROUNDING_PER_STAGE = 64 * Math.ulp(1.0);

    private ExactYields() {
    }

    /** Exact P(non-monotonic) of a field with unit relative sigma {@code unitSigma} (e.g. 0.01 for 1%). */
    public static ExactMonotonicity monotonicity(FieldCoding coding, double unitSigma) {
        if (coding.scheme().isSelect()) {
            return new ExactMonotonicity(0.0, 0.0, "by construction: a select decoder picks one tap of a series"
                    + " string, whose taps are ordered");
        }
        return monotonicity(ElementSigmas.forField(coding, unitSigma));
    }

    /** Exact P(non-monotonic) of the array described by {@code elements}. */
    public static ExactMonotonicity monotonicity(ElementSigmas elements) {
        if (elements.binaryCount() == 0) {
            return new ExactMonotonicity(0.0, 0.0, "by construction: every step of a unary array switches one"
                    + " element on");
        }
        if (elements.allZero()) {
            return new ExactMonotonicity(0.0, 0.0, "exact: all element sigmas are zero, every step is 1 LSB");
        }
        requireNoMixedZeros(elements);
        Evaluation e = evaluate(elements, -1.0, Double.POSITIVE_INFINITY, false);
        return new ExactMonotonicity(e.fine.fail(), e.error, "exact running-sum recursion (binary elements "
                + elements.binaryCount() + ", unary " + elements.unaryCount() + "), piecewise Chebyshev grid with"
                + " Gauss-Legendre quadrature; error = truncation bound (rigorous) + grid refinement and mass"
                + " balance (estimated)");
    }

    /** Exact DNL yield of a field under the nominal-LSB definition. */
    public static ExactDnlYield dnlYieldNominal(FieldCoding coding, double unitSigma, double limitLsb) {
        return dnlYieldNominal(ElementSigmas.forField(coding, unitSigma), limitLsb);
    }

    /**
     * Exact DNL yield P(every step s satisfies |s - 1| &lt; limitLsb), the LSB being the nominal unit. Unary
     * elements are independent, so a thermometer array gives the product of per-element probabilities.
     */
    public static ExactDnlYield dnlYieldNominal(ElementSigmas elements, double limitLsb) {
        checkLimit(limitLsb);
        if (elements.allZero()) {
            return new ExactDnlYield(limitLsb, 1.0, 0.0, "exact: all element sigmas are zero, DNL is 0",
                    "nominal");
        }
        requireNoMixedZeros(elements);
        if (elements.binaryCount() == 0) {
            double log = 0.0;
            for (double s : elements.unary()) {
                log += Math.log1p(-Normal.twoSidedTail(limitLsb / s));
            }
            return new ExactDnlYield(limitLsb, Math.exp(log), 4 * elements.unaryCount() * Math.ulp(1.0),
                    "exact product over independent unary elements of P(|u| < x)", "nominal");
        }
        Evaluation e = evaluate(elements, -limitLsb, limitLsb, true);
        return new ExactDnlYield(limitLsb, e.fine.pass(), e.error, "exact running-sum recursion with a band"
                + " indicator, piecewise Chebyshev grid with Gauss-Legendre quadrature; error = truncation bound"
                + " (rigorous) + grid refinement and mass balance (estimated)", "nominal");
    }

    /** DNL yield under the endpoint-LSB definition; see {@link #dnlYieldEndpoint(ElementSigmas, double)}. */
    public static ExactDnlYield dnlYieldEndpoint(FieldCoding coding, double unitSigma, double limitLsb) {
        return dnlYieldEndpoint(ElementSigmas.forField(coding, unitSigma), limitLsb);
    }

    /**
     * DNL yield with the endpoint LSB L = (V(2^n - 1) - V(0)) / (2^n - 1): P(every step s satisfies
     * |s / L - 1| &lt; limitLsb). L depends on every element; it is approximated as independent of each single
     * step and integrated over its exact Gaussian law by 3-point Gauss-Hermite quadrature (exact for the
     * quadratic term). The neglected step-to-L correlation is first order in cov(step, sum) / var(sum); its effect
     * is estimated and added to the error.
     */
    public static ExactDnlYield dnlYieldEndpoint(ElementSigmas elements, double limitLsb) {
        checkLimit(limitLsb);
        if (elements.allZero()) {
            return new ExactDnlYield(limitLsb, 1.0, 0.0, "exact: all element sigmas are zero, DNL is 0",
                    "endpoint");
        }
        requireNoMixedZeros(elements);
        double[] bin = elements.binary();
        double[] un = elements.unary();
        double variance = 0.0;
        for (double s : bin) {
            variance += s * s;
        }
        for (double s : un) {
            variance += s * s;
        }
        double codes = (double) ((1L << bin.length) * (un.length + 1L)) - 1.0;
        double lsbSigma = Math.sqrt(variance) / codes;
        double[] offsets = {-Math.sqrt(3.0), 0.0, Math.sqrt(3.0)};
        double[] weights = {1.0 / 6.0, 2.0 / 3.0, 1.0 / 6.0};
        double yield = 0.0;
        double error = 0.0;
        for (int i = 0; i < 3; i++) {
            double lambda = 1.0 + offsets[i] * lsbSigma;
            double alpha = lambda * (1.0 - limitLsb) - 1.0;
            double beta = lambda * (1.0 + limitLsb) - 1.0;
            double y;
            double err;
            if (bin.length == 0) {
                double log = 0.0;
                for (double s : un) {
                    log += Math.log1p(-(Normal.cdf(alpha / s) + Normal.upperTail(beta / s)));
                }
                y = Math.exp(log);
                err = 4 * un.length * Math.ulp(1.0);
            } else {
                Evaluation e = evaluate(elements, alpha, beta, true);
                y = e.fine.pass();
                err = e.error;
            }
            yield += weights[i] * y;
            error += weights[i] * err;
        }
        error += correlationEffect(bin, un, variance, limitLsb);
        return new ExactDnlYield(limitLsb, yield, error, "running-sum recursion with the endpoint LSB treated as"
                + " independent of each step, integrated over its Gaussian law (3-point Gauss-Hermite); error"
                + " includes an estimate of the neglected step-to-LSB correlation", "endpoint");
    }

    /**
     * Estimate of the yield change from the neglected correlation between each step and the endpoint LSB:
     * conditioning on the sum shifts a step by cov(step, sum) / var(sum) times the sum deviation (its mean absolute
     * value) and shrinks its variance by the squared correlation; each effect moves the step's acceptance
     * probability by about (shift or band change) times twice the step density at the band edge.
     */
    private static double correlationEffect(double[] bin, double[] un, double variance, double x) {
        double total = 0.0;
        double lower = 0.0;
        for (int t = 0; t < bin.length; t++) {
            double c = bin[t] * bin[t] - lower;
            double stepVariance = bin[t] * bin[t] + lower;
            total += stepEffect(c, stepVariance, variance, x);
            lower += bin[t] * bin[t];
        }
        for (double s : un) {
            total += stepEffect(s * s - lower, s * s + lower, variance, x);
        }
        return total;
    }

    private static double stepEffect(double covariance, double stepVariance, double variance, double x) {
        double sd = Math.sqrt(stepVariance);
        double edgeDensity = Normal.density(x / sd) / sd;
        // mean absolute deviation of the sum is sqrt(2 / pi) times its sigma
        double shift = 0.7978845608028654 * Math.abs(covariance) / Math.sqrt(variance);
        double rho2 = covariance * covariance / (stepVariance * variance);
        return 2.0 * edgeDensity * (shift + 0.5 * rho2 * x);
    }

    private static void checkLimit(double limitLsb) {
        if (!(limitLsb > 0.0) || Double.isInfinite(limitLsb)) {
            throw new IllegalArgumentException("DNL limit must be a positive number of LSB, got " + limitLsb);
        }
    }

    private static void requireNoMixedZeros(ElementSigmas elements) {
        if (elements.mixedZero()) {
            throw new IllegalArgumentException("the exact recursion needs all element sigmas > 0 or all = 0;"
                    + " use HalfSpaceUnionSampler for arrays with some ideal elements");
        }
    }

    /** Whether {@code scheme} has an exact method here (binary, Gray, segmented, thermometer). */
    public static boolean supports(CodingScheme scheme) {
        return !scheme.isSelect();
    }

    private record Evaluation(RunningSumRecursion.Outcome fine, double error) {
    }

    /**
     * Runs the recursion on the fine and the coarse grid. Error = rigorous truncation bound + |fine - coarse| (the
     * coarse grid's error, a conservative estimate for the fine one) + any mass-balance defect beyond truncation +
     * a rounding allowance.
     */
    private static Evaluation evaluate(ElementSigmas elements, double alpha, double beta, boolean restrictFirst) {
        RunningSumRecursion.Outcome fine = new RunningSumRecursion(elements, alpha, beta, restrictFirst,
                RunningSumRecursion.FINE).run();
        RunningSumRecursion.Outcome coarse = new RunningSumRecursion(elements, alpha, beta, restrictFirst,
                RunningSumRecursion.COARSE).run();
        double refinement = Math.max(Math.abs(fine.fail() - coarse.fail()), Math.abs(fine.pass() - coarse.pass()));
        double defect = 1.0 - fine.pass() - fine.fail();
        double balance = Math.max(0.0, Math.max(-defect, defect - fine.truncationBound()));
        double rounding = ROUNDING_PER_STAGE * (elements.binaryCount() + 1);
        return new Evaluation(fine, fine.truncationBound() + refinement + balance + rounding);
    }
}
