package org.trimwright.engine.mismatch.montecarlo;

import org.trimwright.engine.mismatch.ElementArray;

/**
 * Computes the {@link TrialMetrics} of one trial in O(elements), without walking the 2^n codes.
 * <p>
 * Method. Magnitude level L = u W + r (u = 0..P unary elements on, P = 2^M - 1, r = 0..W-1 the binary code,
 * W = 2^B) has V(L) = S_u + R(r), S_u the prefix sum of the unary elements, R(r) = sum_j bit_j(r) b_j. Every (u, r)
 * pair is a level, so for a line a + c L the deviation D(L) = V(L) - a - c L splits:
 * max_L D = max_u (S_u - c u W) + sum_j max(0, b_j - c 2^j) - a (the bits of r are chosen freely), and the same
 * with min. Steps between adjacent levels are b_k - sum_{j&lt;k} b_j (carry into bit k) and U_i - sum_j b_j (unary
 * element i). The least-squares line needs sum_L V(L) and sum_L (L - N/2) V(L), which are fixed linear combinations
 * of the element values (coefficients precomputed exactly). Sign-magnitude mirrors the magnitude transfer, so every
 * figure equals the magnitude's except the best-fit line, which by symmetry passes through the origin:
 * slope sum_L L V(L) / sum_L L^2 over the magnitude levels.
 */
public final class StructuralEvaluator {

    private final int unary;
    private final int bits;
    private final double weight;
    private final double top;
    private final boolean originFit;
    private final double[] c0Unary;
    private final double[] c1Unary;
    private final double[] c0Binary;
    private final double[] c1Binary;
    private final double[] binaryWeight;
    private final double points;
    private final double centre;
    private final double slopeDenominator;

    public StructuralEvaluator(ElementArray array) {
        unary = array.unaryCount();
        bits = array.binaryBits();
        weight = array.unaryWeight();
        top = array.topLevel();
        originFit = array.signMagnitude();
        points = top + 1;
        centre = top / 2.0;
        double w = weight;
        double p = unary;
        c0Unary = new double[unary];
        c1Unary = new double[unary];
        for (int i = 0; i < unary; i++) {
            c0Unary[i] = w * (p - i);
            double c1 = w * w * (p * (p + 1) / 2 - (double) i * (i + 1) / 2) + w * (w - 1) / 2 * (p - i);
            c1Unary[i] = originFit ? c1 : c1 - centre * c0Unary[i];
        }
        c0Binary = new double[bits];
        c1Binary = new double[bits];
        binaryWeight = new double[bits];
        for (int j = 0; j < bits; j++) {
            double bj = 1 << j;
            binaryWeight[j] = bj;
            c0Binary[j] = (p + 1) * w / 2;
            double c1 = w * (p * (p + 1) / 2) * (w / 2) + (p + 1) * ((w / 2) * bj + (w / 4) * (w - 1 - bj));
            c1Binary[j] = originFit ? c1 : c1 - centre * c0Binary[j];
        }
        slopeDenominator = originFit
                ? top * (top + 1) * (2 * top + 1) / 6
                : points * (points * points - 1) / 12;
    }

    /** Evaluates one trial: {@code unaryValues} in switching order, {@code binaryValues} by bit. */
    public void evaluate(double[] unaryValues, double[] binaryValues, TrialMetrics out) {
        double sumB = 0;
        double minStep = bits > 0 ? binaryValues[0] : Double.POSITIVE_INFINITY;
        double maxStep = bits > 0 ? binaryValues[0] : Double.NEGATIVE_INFINITY;
        double s0 = 0;
        double s1 = 0;
        for (int j = 0; j < bits; j++) {
            double b = binaryValues[j];
            double step = b - sumB;
            minStep = lower(minStep, step);
            maxStep = upper(maxStep, step);
            sumB += b;
            s0 += c0Binary[j] * b;
            s1 += c1Binary[j] * b;
        }
        double sumU = 0;
        if (unary > 0) {
            double uMin = unaryValues[0];
            double uMax = unaryValues[0];
            for (int i = 0; i < unary; i++) {
                double x = unaryValues[i];
                uMin = lower(uMin, x);
                uMax = upper(uMax, x);
                sumU += x;
                s0 += c0Unary[i] * x;
                s1 += c1Unary[i] * x;
            }
            minStep = Math.min(minStep, uMin - sumB);
            maxStep = Math.max(maxStep, uMax - sumB);
        }
        double gEp = (sumU + sumB) / top;
        double beta = s1 / slopeDenominator;
        double alpha = originFit ? 0.0 : s0 / points - beta * centre;

        // binary part: max_r and min_r of sum_j bit_j(r) d_j are sum max(0, d_j) = (sum d + sum |d|) / 2 and
        // sum min(0, d_j) = (sum d - sum |d|) / 2
        double sumEp = 0;
        double absEp = 0;
        double sumBf = 0;
        double absBf = 0;
        double sumAbs = 0;
        double absAbs = 0;
        for (int j = 0; j < bits; j++) {
            double b = binaryValues[j];
            double bw = binaryWeight[j];
            double dEp = b - gEp * bw;
            double dBf = b - beta * bw;
            double dAbs = b - bw;
            sumEp += dEp;
            absEp += Math.abs(dEp);
            sumBf += dBf;
            absBf += Math.abs(dBf);
            sumAbs += dAbs;
            absAbs += Math.abs(dAbs);
        }
        double uMaxEp = 0;
        double uMinEp = 0;
        double uMaxBf = 0;
        double uMinBf = 0;
        double uMaxAbs = 0;
        double uMinAbs = 0;
        double stepEp = gEp * weight;
        double stepBf = beta * weight;
        double prefix = 0;
        for (int i = 0; i < unary; i++) {
            prefix += unaryValues[i];
            double u = i + 1;
            double dEp = prefix - stepEp * u;
            double dBf = prefix - stepBf * u;
            double dAbs = prefix - weight * u;
            uMaxEp = upper(uMaxEp, dEp);
            uMinEp = lower(uMinEp, dEp);
            uMaxBf = upper(uMaxBf, dBf);
            uMinBf = lower(uMinBf, dBf);
            uMaxAbs = upper(uMaxAbs, dAbs);
            uMinAbs = lower(uMinAbs, dAbs);
        }
        double epWorst = Math.max(Math.abs(uMaxEp + 0.5 * (sumEp + absEp)), Math.abs(uMinEp + 0.5 * (sumEp - absEp)));
        double bfWorst = Math.max(Math.abs(uMaxBf + 0.5 * (sumBf + absBf) - alpha),
                Math.abs(uMinBf + 0.5 * (sumBf - absBf) - alpha));
        out.inlEndpoint = gEp > 0 ? epWorst / gEp : Double.POSITIVE_INFINITY;
        out.inlBestFit = beta > 0 ? bfWorst / beta : Double.POSITIVE_INFINITY;
        out.inlAbsolute = Math.max(Math.abs(uMaxAbs + 0.5 * (sumAbs + absAbs)),
                Math.abs(uMinAbs + 0.5 * (sumAbs - absAbs)));
        out.maxDnl = Math.max(maxStep - 1.0, 1.0 - minStep);
        out.maxDnlEndpoint = gEp > 0 ? Math.max(maxStep / gEp - 1.0, 1.0 - minStep / gEp) : Double.POSITIVE_INFINITY;
        out.nonMonotonic = minStep < 0;
    }

    /**
     * Branch-free maximum (a + b + |a - b|) / 2, exact to a few ulps for finite values. The running extremes of random
     * walks change at unpredictable trials; a compare-and-branch there mispredicts often and cost about a third of
     * the trial time (measured).
     */
    private static double upper(double a, double b) {
        return 0.5 * (a + b + Math.abs(a - b));
    }

    /** Branch-free minimum (a + b - |a - b|) / 2. */
    private static double lower(double a, double b) {
        return 0.5 * (a + b - Math.abs(a - b));
    }
}
