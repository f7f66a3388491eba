package org.trimwright.engine.mismatch.sizing;

import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.PelgromCoefficient;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * The largest unit sigma meeting a target yield, by bisection on the Monte Carlo joint yield (monotonic, max|DNL| and
 * max|INL| of the limits' definition within limits) with common random numbers: every evaluation uses the same seed,
 * hence the same standard normals, only scaled by the candidate sigma, so the yield is a deterministic step function
 * of sigma and the bisection does not chase noise. Bisection is on log(sigma) between 1e-6 and 0.5.
 */
public final class UnitSigmaSolver {

    private static final double LOW = 1e-6;
    private static final double HIGH = 0.5;

    private UnitSigmaSolver() {
    }

    /** Solves for {@code coding} with the other mismatch terms of {@code model}; {@code pelgrom} may be null. */
    public static SigmaSolution largestUnitSigma(FieldCoding coding, ElementModel model, Limits limits,
            MonteCarloOptions options, PelgromCoefficient pelgrom, int iterations) {
        double lo = Math.log(LOW);
        double hi = Math.log(HIGH);
        double loYield = jointYield(coding, model.withUnitSigma(LOW), limits, options);
        if (loYield < limits.targetYield()) {
            return new SigmaSolution(0.0, loYield, limits.targetYield(), Double.NaN, 0, options.trials(),
                    "target not met even at unit sigma " + LOW + " (other terms dominate)");
        }
        double hiYield = jointYield(coding, model.withUnitSigma(HIGH), limits, options);
        if (hiYield >= limits.targetYield()) {
            lo = hi;
            loYield = hiYield;
        } else {
            for (int i = 0; i < iterations; i++) {
                double mid = 0.5 * (lo + hi);
                double y = jointYield(coding, model.withUnitSigma(Math.exp(mid)), limits, options);
                if (y >= limits.targetYield()) {
                    lo = mid;
                    loYield = y;
                } else {
                    hi = mid;
                }
            }
        }
        double sigma = Math.exp(lo);
        double area = pelgrom == null ? Double.NaN : pelgrom.minimumArea(sigma);
        return new SigmaSolution(sigma, loYield, limits.targetYield(), area, iterations, options.trials(),
                "bisection on log(sigma) of the Monte Carlo joint yield with common random numbers (fixed seed)");
    }

    /** Monte Carlo joint yield of {@code coding} under {@code model}. */
    public static double jointYield(FieldCoding coding, ElementModel model, Limits limits, MonteCarloOptions options) {
        MonteCarloResult mc = MonteCarloRun.run(ElementArray.of(coding, model), options);
        return (double) mc.passCount(limits.maxDnlLsb(), SegmentationAdvisor.metricOf(limits), limits.maxInlLsb())
                / mc.trials();
    }
}
