package org.trimwright.engine.mismatch.sizing;

import org.trimwright.engine.mismatch.MismatchReport;

/**
 * What a trim must correct and how well. Values in any one physical unit (named by {@code unit}).
 *
 * @param spreadLow             lowest untrimmed value to correct (e.g. -k sigma, or the measured minimum)
 * @param spreadHigh            highest untrimmed value to correct
 * @param accuracy              required post-trim accuracy, +- this much
 * @param unit                  unit name (V, A, %, ...)
 * @param dnlWorstLsb           max|DNL| assumed for the residual (LSB), e.g. the field's max|DNL| at target yield
 * @param dnlSigmaLsb           DNL sigma for the rms residual (LSB)
 * @param monotonicGuaranteed   the field is monotonic by construction
 * @param pNonMonotonic         probability of a negative step (upper bound or estimate) when not guaranteed
 * @param fieldBits             the field's width if fixed (0: choose the width)
 */
public record SizingRequest(double spreadLow, double spreadHigh, double accuracy, String unit, double dnlWorstLsb,
        double dnlSigmaLsb, boolean monotonicGuaranteed, double pNonMonotonic, int fieldBits) {

    public SizingRequest {
        if (!(spreadHigh > spreadLow)) {
            throw new IllegalArgumentException("spread high must exceed spread low");
        }
        if (!(accuracy > 0)) {
            throw new IllegalArgumentException("accuracy must be > 0");
        }
        if (!(dnlWorstLsb >= 0) || !(dnlSigmaLsb >= 0) || !(pNonMonotonic >= 0 && pNonMonotonic <= 1)) {
            throw new IllegalArgumentException("DNL figures must be >= 0 and P(non-monotonic) in [0, 1]");
        }
        if (fieldBits < 0 || fieldBits > 16) {
            throw new IllegalArgumentException("field bits must be 0 (choose) or 1..16");
        }
    }

    /** Spread centre +- k sigma, ideal elements (no DNL), monotonic, width to be chosen. */
    public static SizingRequest ofSigma(double centre, double sigma, double k, double accuracy, String unit) {
        return new SizingRequest(centre - k * sigma, centre + k * sigma, accuracy, unit, 0, 0, true, 0, 0);
    }

    /** Measured min/max, ideal elements, monotonic, width to be chosen. */
    public static SizingRequest ofMinMax(double min, double max, double accuracy, String unit) {
        return new SizingRequest(min, max, accuracy, unit, 0, 0, true, 0, 0);
    }

    /**
     * A copy with the DNL and monotonicity figures of an analysed field and its width: max|DNL| at the target yield
     * (Monte Carlo quantile), the worst exact DNL sigma, and P(non-monotonic) = the smaller of the union bound and the
     * upper end of the Monte Carlo 95 % interval.
     */
    public SizingRequest withField(MismatchReport report) {
        MismatchReport.Monotonicity m = report.monotonic();
        double p = m.guaranteed() ? 0.0 : Math.min(m.unionBound(), m.monteCarlo().ci95High());
        return new SizingRequest(spreadLow, spreadHigh, accuracy, unit, report.dnl().quantileAtTargetYield(),
                report.dnl().sigmaWorst(), m.guaranteed(), p, report.field().bits());
    }
}
