package org.trimwright.engine.mismatch.montecarlo;

import org.trimwright.engine.mismatch.ElementArray;

/**
 * Draws one trial: one normal per element (not per unit), binary elements first (j = 0..B-1), then unary elements in
 * switching order. Element value = max(0, mean + sigma z).
 */
public final class TrialSampler {

    private final double[] unaryMean;
    private final double unarySigma;
    private final double[] binaryMean;
    private final double[] binarySigma;

    public TrialSampler(ElementArray array) {
        unaryMean = new double[array.unaryCount()];
        binaryMean = new double[array.binaryBits()];
        array.meanValues(unaryMean, binaryMean);
        unarySigma = array.unarySigma();
        binarySigma = new double[array.binaryBits()];
        for (int j = 0; j < binarySigma.length; j++) {
            binarySigma[j] = array.binarySigma(j);
        }
    }

    /** Fills {@code unary} (length 2^M - 1) and {@code binary} (length B). */
    public void draw(GaussianSource gauss, double[] unary, double[] binary) {
        for (int j = 0; j < binaryMean.length; j++) {
            double x = binaryMean[j] + binarySigma[j] * gauss.next();
            binary[j] = x > 0.0 ? x : 0.0;
        }
        double s = unarySigma;
        for (int i = 0; i < unaryMean.length; i++) {
            double x = unaryMean[i] + s * gauss.next();
            unary[i] = x > 0.0 ? x : 0.0;
        }
    }
}
