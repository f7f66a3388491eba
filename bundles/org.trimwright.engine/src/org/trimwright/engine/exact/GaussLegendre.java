package org.trimwright.engine.exact;

/**
 * Gauss-Legendre quadrature rules on [-1, 1]: the m nodes are the roots of the Legendre polynomial P_m, found by
 * Newton's method from Tricomi's initial guesses, and the weights are 2 / ((1 - x^2) P_m'(x)^2). A rule with m nodes
 * integrates polynomials of degree up to 2m - 1 exactly.
 */
final class GaussLegendre {

    private final double[] nodes;
    private final double[] weights;

    GaussLegendre(int m) {
        if (m < 1) {
            throw new IllegalArgumentException("need at least one node, got " + m);
        }
        nodes = new double[m];
        weights = new double[m];
        for (int i = 0; i < (m + 1) / 2; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (m + 0.5));
            double derivative = 0.0;
            for (int iteration = 0; iteration < 100; iteration++) {
                double p0 = 1.0;
                double p1 = x;
                for (int k = 2; k <= m; k++) {
                    double p2 = ((2.0 * k - 1.0) * x * p1 - (k - 1.0) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                derivative = m * (x * p1 - p0) / (x * x - 1.0);
                double dx = p1 / derivative;
                x -= dx;
                if (Math.abs(dx) < 1e-16) {
                    break;
                }
            }
            double w = 2.0 / ((1.0 - x * x) * derivative * derivative);
            nodes[i] = -x;
            nodes[m - 1 - i] = x;
            weights[i] = w;
            weights[m - 1 - i] = w;
        }
    }

    int size() {
        return nodes.length;
    }

    /** Node i mapped to [a, b]. */
    double node(int i, double a, double b) {
        return 0.5 * (a + b) + 0.5 * (b - a) * nodes[i];
    }

    /** Weight i for the interval [a, b]. */
    double weight(int i, double a, double b) {
        return 0.5 * (b - a) * weights[i];
    }
}
