package org.trimwright.engine.exact;

/**
 * A sampled probability of a rare failure event with its 95% confidence interval (normal approximation of the
 * estimator's mean).
 *
 * @param estimate   the unbiased estimate
 * @param ci95Low    lower end of the 95% confidence interval (not below 0)
 * @param ci95High   upper end
 * @param samples    number of importance samples
 * @param unionBound the sum of the per-half-space probabilities (an upper bound on the event probability)
 * @param method     the sampling method, in words
 */
public record RareEventEstimate(double estimate, double ci95Low, double ci95High, long samples, double unionBound,
        String method) {
}
