package org.trimwright.engine.exact;

/**
 * The exact probability that a field's transfer steps backwards somewhere (some step with at least one element
 * switching off is negative), for independent Gaussian element errors. Serialised as JSON {@code monotonic.exact}.
 *
 * @param probabilityNonMonotonic P(some step &lt; 0)
 * @param numericalError          bound on |computed - exact|: rigorous truncation bound plus an estimated
 *                                discretisation error (grid refinement and mass balance); 0 when exact by
 *                                construction
 * @param method                  how the figure was obtained, in words
 */
public record ExactMonotonicity(double probabilityNonMonotonic, double numericalError, String method) {
}
