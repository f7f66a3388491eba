package org.trimwright.engine.mismatch;

/**
 * One distinct type of step between adjacent levels, with its exact Gaussian statistics. In nominal LSB:
 * a carry into binary bit k steps by b_k - sum_{j&lt;k} b_j (variance var(b_k) + sum_{j&lt;k} var(b_j)); the switching
 * of unary element i steps by U_i - sum_j b_j (variance var(U_i) + sum_j var(b_j)).
 * P(step &lt; 0) = Q(mean / sigma) with Q the upper normal tail (the clamping of elements at zero is ignored here; it
 * matters only when an element's sigma approaches a quarter of its value).
 *
 * @param kind        "carry" (into a binary bit) or "unary" (an element of the thermometer part)
 * @param index       bit k, or the switching position i of the first unary element of this group
 * @param label       human-readable name, e.g. "carry into bit 5 (level 31 to 32)"
 * @param fromLevel   first magnitude level at which the step occurs (step from fromLevel to fromLevel + 1)
 * @param events      distinct random steps of this type (1 for a carry: every occurrence is the same random
 *                    variable; the number of elements for a unary group)
 * @param occurrences transitions of the field's transfer that are of this type
 * @param mean        mean step (nominal LSB; 1 without gradient)
 * @param sigma       sigma of the step = DNL sigma (nominal LSB)
 * @param pNegative   P(step &lt; 0) for one event; 0 where monotonic by construction
 */
public record Transition(String kind, int index, String label, int fromLevel, long events, long occurrences,
        double mean, double sigma, double pNegative) {
}
