package org.trimwright.engine.mismatch;

/**
 * A systematic error over the 1-D array of unary slots. Slot p of P slots sits at the normalised coordinate
 * x = (2p + 1) / P - 1 in (-1, 1) (array centre at 0, edges at +-1). An element in that slot has the relative
 * error {@code linear * x + quadratic * x^2}: {@code linear} is the relative error at the right edge, and
 * {@code quadratic} the relative error at either edge with respect to the centre. Binary-weighted elements are taken
 * as laid out common-centroid at x = 0 and get no systematic error (a stated simplification).
 *
 * @param linear    relative error at x = +1 of the linear part (fraction)
 * @param quadratic relative error at x = +-1 of the quadratic part (fraction)
 */
public record Gradient(double linear, double quadratic) {

    /** No systematic error. */
    public static final Gradient NONE = new Gradient(0.0, 0.0);

    public Gradient {
        if (!Double.isFinite(linear) || !Double.isFinite(quadratic)) {
            throw new IllegalArgumentException("gradient coefficients must be finite");
        }
    }

    /** True if both coefficients are zero. */
    public boolean isNone() {
        return linear == 0.0 && quadratic == 0.0;
    }

    /** Normalised coordinate of slot p of {@code slots}: (2p + 1) / slots - 1. */
    public static double coordinate(int p, int slots) {
        return (2.0 * p + 1.0) / slots - 1.0;
    }

    /** The relative error at coordinate x. */
    public double relativeError(double x) {
        return linear * x + quadratic * x * x;
    }
}
