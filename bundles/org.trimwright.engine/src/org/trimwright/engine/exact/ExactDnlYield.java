package org.trimwright.engine.exact;

/**
 * The exact (or stated-approximate) DNL yield P(max over steps |DNL| &lt; limitLsb) for independent Gaussian element
 * errors. Serialised as JSON {@code dnl.exactYield}.
 *
 * @param limitLsb       the DNL limit x in LSB
 * @param yield          P(every step deviates from the LSB by less than x LSB)
 * @param numericalError bound on |computed - stated quantity|: rigorous truncation bound plus estimated
 *                       discretisation error, plus (endpoint definition) the estimated approximation error
 * @param method         how the figure was obtained, in words
 * @param definition     the LSB definition: {@code nominal} (1 LSB = the nominal unit) or {@code endpoint}
 *                       (1 LSB = (full-scale value - zero-code value) / (2^n - 1), random)
 */
public record ExactDnlYield(double limitLsb, double yield, double numericalError, String method, String definition) {
}
