package org.trimwright.engine.mismatch;

/**
 * Area scaling of random mismatch (Pelgrom, Duinmaijer, Welbers, IEEE JSSC 24(5), 1989): the relative sigma of a
 * device parameter falls as 1 / sqrt(W L).
 *
 * @param percentMicron the coefficient A in % times micrometre (sigma in % for a 1 um^2 device or pair)
 * @param basis         whether A describes a pair difference or one device
 */
public record PelgromCoefficient(double percentMicron, CoefficientBasis basis) {

    public PelgromCoefficient {
        if (!(percentMicron > 0) || Double.isInfinite(percentMicron)) {
            throw new IllegalArgumentException("Pelgrom coefficient must be > 0 %um, got " + percentMicron);
        }
        if (basis == null) {
            throw new IllegalArgumentException("coefficient basis (pair or single device) is required");
        }
    }

    /** The coefficient of one device in %um: A for a single-device coefficient, A / sqrt(2) for a pair. */
    public double singleDevicePercentMicron() {
        return basis == CoefficientBasis.PAIR ? percentMicron / Math.sqrt(2.0) : percentMicron;
    }

    /** Relative sigma of one unit device of area W*L (um^2), as a fraction (0.01 = 1 %): A1 / sqrt(WL) / 100. */
    public double unitSigma(double areaSquareMicron) {
        if (!(areaSquareMicron > 0)) {
            throw new IllegalArgumentException("area must be > 0 um^2, got " + areaSquareMicron);
        }
        return singleDevicePercentMicron() / Math.sqrt(areaSquareMicron) / 100.0;
    }

    /** The smallest unit area (um^2) whose relative sigma is at most {@code unitSigma} (fraction): (A1 / s)^2. */
    public double minimumArea(double unitSigma) {
        if (!(unitSigma > 0)) {
            throw new IllegalArgumentException("unit sigma must be > 0, got " + unitSigma);
        }
        double a = singleDevicePercentMicron() / (100.0 * unitSigma);
        return a * a;
    }
}
