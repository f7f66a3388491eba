package org.trimwright.engine.exact;

import java.util.function.DoubleUnaryOperator;

/**
 * A piecewise Chebyshev interpolant: on each panel [b_i, b_(i+1)] the function is represented by its interpolating
 * polynomial of degree p - 1 at the p Chebyshev points of the first kind, stored as Chebyshev coefficients and
 * evaluated by Clenshaw's recurrence. Outside [b_0, b_K] the function is zero (the densities represented here
 * vanish beyond their truncated support).
 */
final class ChebyshevPanels {

    private final double[] breaks;
    private final double[][] coefficients;

    private ChebyshevPanels(double[] breaks, double[][] coefficients) {
        this.breaks = breaks;
        this.coefficients = coefficients;
    }

    /** Interpolates {@code f} with {@code p} Chebyshev points on each panel between consecutive breaks. */
    static ChebyshevPanels interpolate(double[] breaks, int p, DoubleUnaryOperator f) {
        int panels = breaks.length - 1;
        double[][] coefficients = new double[panels][];
        double[] values = new double[p];
        for (int i = 0; i < panels; i++) {
            double a = breaks[i];
            double b = breaks[i + 1];
            for (int k = 0; k < p; k++) {
                values[k] = f.applyAsDouble(0.5 * (a + b) + 0.5 * (b - a) * Math.cos(Math.PI * (k + 0.5) / p));
            }
            coefficients[i] = fromNodeValues(values);
        }
        return new ChebyshevPanels(breaks.clone(), coefficients);
    }

    /** Chebyshev coefficients from values at the first-kind nodes (discrete cosine transform). */
    static double[] fromNodeValues(double[] values) {
        int p = values.length;
        double[] c = new double[p];
        for (int j = 0; j < p; j++) {
            double sum = 0.0;
            for (int k = 0; k < p; k++) {
                sum += values[k] * Math.cos(Math.PI * j * (k + 0.5) / p);
            }
            c[j] = 2.0 * sum / p;
        }
        c[0] *= 0.5;
        return c;
    }

    double lower() {
        return breaks[0];
    }

    double upper() {
        return breaks[breaks.length - 1];
    }

    int panelCount() {
        return coefficients.length;
    }

    double panelLower(int i) {
        return breaks[i];
    }

    double panelUpper(int i) {
        return breaks[i + 1];
    }

    /** The interpolant at x; zero outside the panels. */
    double value(double x) {
        if (!(x >= breaks[0] && x <= breaks[breaks.length - 1])) {
            return 0.0;
        }
        int lo = 0;
        int hi = breaks.length - 2;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (breaks[mid] <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return valueInPanel(lo, x);
    }

    /** The interpolant of panel i at x (x is expected inside the panel). */
    double valueInPanel(int i, double x) {
        double a = breaks[i];
        double b = breaks[i + 1];
        double t = (2.0 * x - a - b) / (b - a);
        double[] c = coefficients[i];
        double b1 = 0.0;
        double b2 = 0.0;
        double t2 = 2.0 * t;
        for (int j = c.length - 1; j >= 1; j--) {
            double b0 = c[j] + t2 * b1 - b2;
            b2 = b1;
            b1 = b0;
        }
        return c[0] + t * b1 - b2;
    }
}
