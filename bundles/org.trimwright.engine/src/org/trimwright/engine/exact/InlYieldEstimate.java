package org.trimwright.engine.exact;

/**
 * A non-Monte-Carlo estimate of the INL yield P(max over codes |INL| &lt; limitLsb).
 *
 * @param limitLsb          the INL limit in LSB
 * @param yield             the estimate with the finite-size correction applied
 * @param limitingYield     the plain Brownian-bridge (Kolmogorov) limit without correction
 * @param method            how the estimate is obtained, in words (an approximation, not an exact figure)
 * @param definition        the INL definition ({@code endpoint})
 */
public record InlYieldEstimate(double limitLsb, double yield, double limitingYield, String method,
        String definition) {
}
