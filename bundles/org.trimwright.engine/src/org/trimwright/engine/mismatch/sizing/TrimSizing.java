package org.trimwright.engine.mismatch.sizing;

/**
 * From untrimmed spread and required accuracy to step, range, width, residual error and production search.
 * <p>
 * Method: the trim spans the spread R with 2^n levels, step = R / (2^n - 1). After trimming, the best code leaves at
 * most half the gap to the next level; the widest gap is step (1 + max|DNL|), so the worst residual is
 * step (1 + max|DNL|) / 2 (step / 2 with ideal elements). With gaps g = step (1 + d), d of sigma s_d, and the untrimmed
 * value uniform over the range, a gap is hit with probability proportional to g and the error is uniform in it:
 * E[e^2] = E[g^3] / (12 E[g]) = step^2 (1 + 3 s_d^2) / 12 to second order (our derivation). A binary search (one
 * measurement per bit, successive approximation) needs a monotonic transfer; a linear search over the codes (up to
 * 2^n - 1 comparisons) does not.
 */
public final class TrimSizing {

    /** Risk of a negative step below which a binary search is still offered (common practice, no source). */
    public static final double ACCEPTABLE_SEARCH_RISK = 1e-6;

    private TrimSizing() {
    }

    /** Sizes the trim. */
    public static SizingResult size(SizingRequest r) {
        double range = r.spreadHigh() - r.spreadLow();
        double widen = 1.0 + r.dnlWorstLsb();
        double maxStep = 2.0 * r.accuracy() / widen;
        int needed = 1;
        while (needed < 31 && range / ((1L << needed) - 1) > maxStep) {
            needed++;
        }
        int bits = r.fieldBits() > 0 ? r.fieldBits() : needed;
        long levels = 1L << bits;
        double step = range / (levels - 1);
        double worst = step * widen / 2.0;
        double rms = step / Math.sqrt(12.0) * Math.sqrt(1.0 + 3.0 * r.dnlSigmaLsb() * r.dnlSigmaLsb());
        double risk = r.monotonicGuaranteed() ? 0.0 : r.pNonMonotonic();
        boolean binary = r.monotonicGuaranteed() || risk <= ACCEPTABLE_SEARCH_RISK;
        String note;
        if (r.monotonicGuaranteed()) {
            note = "monotonic by construction: binary search, one measurement per bit";
        } else if (binary) {
            note = "binary search acceptable: P(negative step) " + sci(risk) + " <= " + sci(ACCEPTABLE_SEARCH_RISK)
                    + " (not guaranteed monotonic)";
        } else {
            note = "not guaranteed monotonic, P(negative step) up to " + sci(risk)
                    + ": linear search over the codes; a binary search may settle on a wrong code with about that"
                    + " probability";
        }
        return new SizingResult(r.unit(), range, maxStep, needed, bits, step, worst, rms, worst <= r.accuracy(),
                binary ? "binary" : "linear", binary ? bits : levels - 1, levels - 1, risk, note);
    }

    private static String sci(double p) {
        return org.trimwright.engine.units.Significant.general(p, 3);
    }
}
