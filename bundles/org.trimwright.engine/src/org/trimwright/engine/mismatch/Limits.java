package org.trimwright.engine.mismatch;

/**
 * Acceptance limits of a field.
 *
 * @param maxDnlLsb        largest allowed max|DNL| (nominal LSB)
 * @param maxInlLsb        largest allowed max|INL| (LSB, under {@code inlDefinition})
 * @param inlDefinition    the INL definition the limit applies to (for segmentation advice and inverse questions)
 * @param targetYield      required fraction of parts meeting the limits (e.g. 0.99)
 * @param maxNonMonotonic  largest allowed probability of a negative step (e.g. 1e-3)
 */
public record Limits(double maxDnlLsb, double maxInlLsb, InlDefinition inlDefinition, double targetYield,
        double maxNonMonotonic) {

    public Limits {
        if (!(maxDnlLsb > 0) || !(maxInlLsb > 0)) {
            throw new IllegalArgumentException("DNL and INL limits must be > 0 LSB");
        }
        if (inlDefinition == null) {
            throw new IllegalArgumentException("INL definition is required");
        }
        if (!(targetYield > 0 && targetYield < 1)) {
            throw new IllegalArgumentException("target yield must be in (0, 1), got " + targetYield);
        }
        if (!(maxNonMonotonic >= 0 && maxNonMonotonic <= 1)) {
            throw new IllegalArgumentException("max P(non-monotonic) must be in [0, 1]");
        }
    }

    /** Limits with the endpoint INL definition, 99 % target yield and P(non-monotonic) at most 1e-3. */
    public static Limits of(double maxDnlLsb, double maxInlLsb) {
        return new Limits(maxDnlLsb, maxInlLsb, InlDefinition.ENDPOINT, 0.99, 1e-3);
    }
}
