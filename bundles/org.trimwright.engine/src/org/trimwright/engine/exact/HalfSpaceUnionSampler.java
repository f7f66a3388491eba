package org.trimwright.engine.exact;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.trimwright.engine.stats.Normal;

/**
 * Rare-event Monte Carlo for arrays where no exact recursion applies (systematic gradients, unequal means): the
 * probability that some step of a binary or segmented array fails, by importance sampling of a union of Gaussian
 * half-spaces.
 * <p>
 * Method: ALOE ("at least one event") importance sampling of A. B. Owen, Y. Maximov and M. Chertkov, "Importance
 * sampling for the union of rare events with applications to power systems analysis", Electronic Journal of
 * Statistics 13 (2019) 231-254. Every step is linear in the independent Gaussian element errors, so each failure
 * condition (step below or above a threshold) is a half-space H_h of known probability P_h. Samples are drawn from
 * the mixture of the conditional laws N(0, I | H_h) with weights P_h / P_sum, P_sum = sum P_h (the union bound), and
 * the estimate is P_sum times the mean of 1 / S, S the number of half-spaces the sample violates. The estimator is
 * unbiased and 1/S lies in [1/(number of half-spaces), 1], so its relative variance never exceeds P_sum / P - 1
 * per sample: events of 1e-7 and below are resolved with a few thousand samples.
 * <p>
 * Steps counted: binary step t (bit t on, bits below off) = W_t - (W_0 + ... + W_(t-1)); unary boundary j = U_j -
 * (sum of the binary elements) (U_j alone when there is no binary part). For monotonicity the steps that only
 * switch an element on are excluded (non-negative by construction), as in {@link ExactYields}.
 */
public final class HalfSpaceUnionSampler {

    private static final double Z95 = 1.959963984540054;

    private final int b;
    private final int n;
    private final double[] sigma;
    private final double[] mean;
    private final List<HalfSpace> halfSpaces = new ArrayList<>();

    /** One failure condition: sign * step &lt; sign * threshold. */
    private record HalfSpace(int step, int sign, double threshold, double shift, double norm, double probability) {
    }

    private HalfSpaceUnionSampler(ArrayElements elements) {
        this.b = elements.binaryCount();
        this.n = elements.unaryCount();
        this.sigma = new double[b + n];
        this.mean = new double[b + n];
        System.arraycopy(elements.binarySigmas(), 0, sigma, 0, b);
        System.arraycopy(elements.unarySigmas(), 0, sigma, b, n);
        System.arraycopy(elements.binaryMeans(), 0, mean, 0, b);
        System.arraycopy(elements.unaryMeans(), 0, mean, b, n);
    }

    /** P(some step with an element switching off is negative), by ALOE importance sampling. */
    public static RareEventEstimate nonMonotonic(ArrayElements elements, int samples, long seed) {
        HalfSpaceUnionSampler sampler = new HalfSpaceUnionSampler(elements);
        for (int c = 0; c < sampler.b + sampler.n; c++) {
            boolean switchesOff = c < sampler.b ? c > 0 : sampler.b > 0;
            if (switchesOff) {
                sampler.add(c, +1, 0.0);
            }
        }
        return sampler.sample(samples, seed, "non-monotonic");
    }

    /** P(some step has |step - 1| &gt;= limitLsb), DNL with the nominal LSB, by ALOE importance sampling. */
    public static RareEventEstimate dnlFailure(ArrayElements elements, double limitLsb, int samples, long seed) {
        if (!(limitLsb > 0.0)) {
            throw new IllegalArgumentException("DNL limit must be positive, got " + limitLsb);
        }
        HalfSpaceUnionSampler sampler = new HalfSpaceUnionSampler(elements);
        for (int c = 0; c < sampler.b + sampler.n; c++) {
            sampler.add(c, +1, 1.0 - limitLsb);
            sampler.add(c, -1, 1.0 + limitLsb);
        }
        return sampler.sample(samples, seed, "|DNL| >= " + limitLsb + " LSB (nominal LSB)");
    }

    /** Step c's mean and the norm of its sigma-weighted coefficients. */
    private void add(int c, int sign, double threshold) {
        double stepMean = 0.0;
        double variance = 0.0;
        for (int i = 0; i < b + n; i++) {
            double a = coefficient(c, i);
            stepMean += a * mean[i];
            variance += a * a * sigma[i] * sigma[i];
        }
        double norm = Math.sqrt(variance);
        double margin = sign * (stepMean - threshold);
        double probability;
        if (norm == 0.0) {
            probability = margin < 0.0 ? 1.0 : 0.0;
        } else {
            probability = Normal.upperTail(margin / norm);
        }
        halfSpaces.add(new HalfSpace(c, sign, threshold, margin, norm, probability));
    }

    /** Coefficient of element i (binary 0..B-1, then unary) in step c. */
    private double coefficient(int c, int i) {
        if (c < b) {
            return i == c ? 1.0 : (i < c ? -1.0 : 0.0);
        }
        return i == c ? 1.0 : (i < b ? -1.0 : 0.0);
    }

    private RareEventEstimate sample(int samples, long seed, String event) {
        if (samples < 2) {
            throw new IllegalArgumentException("need at least 2 samples, got " + samples);
        }
        String method = "ALOE importance sampling over " + halfSpaces.size() + " half-spaces (Owen, Maximov,"
                + " Chertkov 2019), event " + event + ", " + samples + " samples, seed " + seed;
        double unionBound = 0.0;
        for (HalfSpace h : halfSpaces) {
            if (h.norm == 0.0 && h.probability == 1.0) {
                return new RareEventEstimate(1.0, 1.0, 1.0, 0, 1.0, "certain: a step fails without any mismatch");
            }
            unionBound += h.probability;
        }
        if (unionBound == 0.0) {
            return new RareEventEstimate(0.0, 0.0, 0.0, 0, 0.0, "no failure half-space has positive probability");
        }
        double[] cumulative = new double[halfSpaces.size()];
        double running = 0.0;
        for (int h = 0; h < cumulative.length; h++) {
            running += halfSpaces.get(h).probability;
            cumulative[h] = running / unionBound;
        }
        SplittableRandom random = new SplittableRandom(seed);
        double[] z = new double[b + n];
        double[] steps = new double[b + n];
        double sum = 0.0;
        double sumSquares = 0.0;
        for (int s = 0; s < samples; s++) {
            int pick = Arrays.binarySearch(cumulative, random.nextDouble());
            pick = Math.min(pick < 0 ? -pick - 1 : pick, cumulative.length - 1);
            while (halfSpaces.get(pick).probability == 0.0 && pick < cumulative.length - 1) {
                pick++;
            }
            HalfSpace h = halfSpaces.get(pick);
            for (int i = 0; i < z.length; i++) {
                z[i] = random.nextGaussian();
            }
            conditionOn(h, z, random);
            computeSteps(z, steps);
            int violated = 0;
            for (HalfSpace other : halfSpaces) {
                if (other.sign * (steps[other.step] - other.threshold) < 0.0) {
                    violated++;
                }
            }
            double inverse = 1.0 / Math.max(violated, 1);
            sum += inverse;
            sumSquares += inverse * inverse;
        }
        double m = sum / samples;
        double variance = Math.max(0.0, (sumSquares - samples * m * m) / (samples - 1));
        double half = Z95 * Math.sqrt(variance / samples);
        return new RareEventEstimate(unionBound * m, Math.max(0.0, unionBound * (m - half)),
                unionBound * (m + half), samples, unionBound, method);
    }

    /**
     * Replaces the component of z along the half-space normal u by a draw from N(0, 1) truncated to the
     * violating side (inverse-cdf sampling in the tail).
     */
    private void conditionOn(HalfSpace h, double[] z, SplittableRandom random) {
        double projection = 0.0;
        for (int i = 0; i < z.length; i++) {
            double u = h.sign * coefficient(h.step, i) * sigma[i] / h.norm;
            projection += u * z[i];
        }
        double uniform = 1.0 - random.nextDouble();
        // the violating side is u.z < -margin/norm, probability Q(margin/norm) = h.probability
        double t = -Normal.inverseUpperTail(uniform * h.probability);
        double delta = t - projection;
        for (int i = 0; i < z.length; i++) {
            z[i] += delta * h.sign * coefficient(h.step, i) * sigma[i] / h.norm;
        }
    }

    private void computeSteps(double[] z, double[] steps) {
        double sum = 0.0;
        for (int t = 0; t < b; t++) {
            double w = mean[t] + sigma[t] * z[t];
            steps[t] = w - sum;
            sum += w;
        }
        for (int j = 0; j < n; j++) {
            double u = mean[b + j] + sigma[b + j] * z[b + j];
            steps[b + j] = u - sum;
        }
    }
}
