package org.trimwright.engine.mismatch;

import org.trimwright.engine.mismatch.sequence.SequenceKind;

/**
 * Mismatch of the unit elements of a field.
 * <p>
 * Definitions (all values in units of the nominal unit element = nominal LSB):
 * <ul>
 * <li>A unit element has relative sigma {@code unitSigma} (s_u, a fraction). An element of k units is the sum of k
 * independent units: mean k, variance k s_u^2 (absolute sigma sqrt(k) s_u).</li>
 * <li>Its switch adds an independent share with relative sigma {@code switchSigma} (s_sw), added in quadrature per
 * switched element, scaled as {@link SwitchScaling} says.</li>
 * <li>A {@link Gradient} adds a systematic error to unary elements by their slot; {@code sequence} orders the unary
 * elements (which slot switches on first).</li>
 * <li>An element value is max(0, Gaussian draw): a physical element is never negative (matters only when an
 * element's sigma approaches a quarter of its value).</li>
 * </ul>
 *
 * @param unitSigma     s_u, relative sigma of one unit element (fraction, 0.01 = 1 %)
 * @param switchSigma   s_sw, relative sigma of the switch share (fraction, 0 for none)
 * @param switchScaling how the switch share scales with element size
 * @param gradient      systematic gradient over the unary slots
 * @param sequence      switching sequence of the unary elements
 */
public record ElementModel(double unitSigma, double switchSigma, SwitchScaling switchScaling, Gradient gradient,
        SequenceKind sequence) {

    public ElementModel {
        if (!(unitSigma >= 0) || Double.isInfinite(unitSigma)) {
            throw new IllegalArgumentException("unit sigma must be >= 0, got " + unitSigma);
        }
        if (!(switchSigma >= 0) || Double.isInfinite(switchSigma)) {
            throw new IllegalArgumentException("switch sigma must be >= 0, got " + switchSigma);
        }
        if (switchScaling == null || gradient == null || sequence == null) {
            throw new IllegalArgumentException("switch scaling, gradient and sequence are required");
        }
    }

    /** Random unit mismatch only: no switch share, no gradient, sequential switching. */
    public static ElementModel ofUnitSigma(double unitSigma) {
        return new ElementModel(unitSigma, 0.0, SwitchScaling.PER_ELEMENT, Gradient.NONE, SequenceKind.SEQUENTIAL);
    }

    /** Unit sigma from a Pelgrom coefficient and the unit area W*L (um^2). */
    public static ElementModel fromPelgrom(PelgromCoefficient coefficient, double unitAreaSquareMicron) {
        return ofUnitSigma(coefficient.unitSigma(unitAreaSquareMicron));
    }

    /** A copy with another unit sigma. */
    public ElementModel withUnitSigma(double sigma) {
        return new ElementModel(sigma, switchSigma, switchScaling, gradient, sequence);
    }

    /** A copy with another gradient and sequence. */
    public ElementModel withLayout(Gradient newGradient, SequenceKind newSequence) {
        return new ElementModel(unitSigma, switchSigma, switchScaling, newGradient, newSequence);
    }

    /** Variance (units^2) of an element of k units: k s_u^2 plus the switch share. */
    public double elementVariance(double units) {
        double sw = switchScaling == SwitchScaling.PER_ELEMENT
                ? units * units * switchSigma * switchSigma
                : units * switchSigma * switchSigma;
        return units * unitSigma * unitSigma + sw;
    }
}
