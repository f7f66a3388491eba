package org.trimwright.benchmarks;

import org.trimwright.engine.mismatch.montecarlo.TrialMetrics;

/**
 * A lean all-codes evaluation for the benchmark comparison, unsigned binary or segmented fields only: builds the
 * whole transfer in O(2^n) (V(u W + r) = S_u + R(r), with the prefix sums S_u of the unary elements and the binary
 * sums R(r) = R(r with its lowest set bit cleared) + b_lowest), then walks all levels twice (steps, sums for the
 * least-squares line; then the INL deviations). Same definitions as {@link TrialMetrics}. It exists so that the
 * structural evaluator's speed-up is also stated against an all-codes walk without the engine reference's
 * O(elements) per code summation.
 */
final class LeanAllCodesEvaluator {

    private final int unary;
    private final int binaryBits;
    private final int weight;
    private final int levels;
    private final double[] binarySums;
    private final double[] v;

    LeanAllCodesEvaluator(int unaryCount, int binaryBits) {
        this.unary = unaryCount;
        this.binaryBits = binaryBits;
        this.weight = 1 << binaryBits;
        this.levels = (unaryCount + 1) * weight;
        this.binarySums = new double[weight];
        this.v = new double[levels];
    }

    void evaluate(double[] unaryValues, double[] binaryValues, TrialMetrics out) {
        for (int r = 1; r < weight; r++) {
            binarySums[r] = binarySums[r & (r - 1)] + binaryValues[Integer.numberOfTrailingZeros(r)];
        }
        double s = 0;
        int k = 0;
        for (int u = 0; u <= unary; u++) {
            if (u > 0) {
                s += unaryValues[u - 1];
            }
            for (int r = 0; r < weight; r++) {
                v[k++] = s + binarySums[r];
            }
        }
        int top = levels - 1;
        double minStep = Double.POSITIVE_INFINITY;
        double maxStep = Double.NEGATIVE_INFINITY;
        double sumV = v[0];
        double sumKV = 0;
        for (int i = 1; i < levels; i++) {
            double step = v[i] - v[i - 1];
            minStep = Math.min(minStep, step);
            maxStep = Math.max(maxStep, step);
            sumV += v[i];
            sumKV += i * v[i];
        }
        double g = (v[top] - v[0]) / top;
        double meanK = top / 2.0;
        double slope = (sumKV - meanK * sumV) / (levels * ((double) levels * levels - 1) / 12.0);
        double intercept = sumV / levels - slope * meanK;
        double ep = 0;
        double bf = 0;
        double abs = 0;
        for (int i = 0; i < levels; i++) {
            ep = Math.max(ep, Math.abs(v[i] - v[0] - g * i));
            bf = Math.max(bf, Math.abs(v[i] - intercept - slope * i));
            abs = Math.max(abs, Math.abs(v[i] - i));
        }
        out.nonMonotonic = minStep < 0;
        out.maxDnl = Math.max(maxStep - 1.0, 1.0 - minStep);
        out.maxDnlEndpoint = g > 0 ? Math.max(maxStep / g - 1.0, 1.0 - minStep / g) : Double.POSITIVE_INFINITY;
        out.inlEndpoint = g > 0 ? ep / g : Double.POSITIVE_INFINITY;
        out.inlBestFit = slope > 0 ? bf / slope : Double.POSITIVE_INFINITY;
        out.inlAbsolute = abs;
    }
}
