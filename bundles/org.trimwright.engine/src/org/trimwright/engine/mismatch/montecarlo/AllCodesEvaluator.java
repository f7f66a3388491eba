package org.trimwright.engine.mismatch.montecarlo;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.ElementArray;

/**
 * The straightforward reference: walks every register code, decodes it the way the hardware does (Gray to binary;
 * two's complement as offset binary with the MSB drive inverted; sign-magnitude through a polarity switch; thermometer
 * output k on when the unary level is above k), sums the elements that are on, orders the values by signed value
 * and applies the DNL/INL definitions of {@link TrialMetrics} literally (least squares by the textbook formulas).
 * O(2^n) per trial; used to check {@link StructuralEvaluator} and for per-code envelopes.
 */
public final class AllCodesEvaluator {

    private final FieldCoding coding;
    private final int unary;
    private final int weightShift;
    private final int levels;
    private final int minSigned;

    public AllCodesEvaluator(ElementArray array) {
        this.coding = array.coding();
        this.unary = array.unaryCount();
        this.weightShift = array.binaryBits();
        int n = coding.bits();
        int lo = Integer.MAX_VALUE;
        int hi = Integer.MIN_VALUE;
        for (int c = 0; c < (1 << n); c++) {
            int s = coding.signedFormat().signedValue(c, n);
            lo = Math.min(lo, s);
            hi = Math.max(hi, s);
        }
        this.minSigned = lo;
        this.levels = hi - lo + 1;
    }

    /** Number of distinct levels of the transfer (2^n, or 2^n - 1 for sign-magnitude). */
    public int levels() {
        return levels;
    }

    /** Signed value of the first (lowest) level. */
    public int minSigned() {
        return minSigned;
    }

    /** Nominal value of level index k (signed value, nominal LSB, nominal zero). */
    public double nominal(int k) {
        return k + minSigned;
    }

    /** The transfer: values (units) ordered by signed value, index k = signed value - minSigned. */
    public double[] transfer(double[] unaryValues, double[] binaryValues) {
        int n = coding.bits();
        int half = 1 << (n - 1);
        double[] v = new double[levels];
        double[] onSum = new double[unary + 1];
        for (int k = 0; k < unary; k++) {
            onSum[k + 1] = onSum[k] + unaryValues[k];
        }
        // every level the walk below can ask for (u never exceeds the unary count)
        double[] mag = magnitudes(Math.min(1 << n, onSum.length << weightShift), onSum, binaryValues);
        for (int reg = 0; reg < (1 << n); reg++) {
            int code = coding.scheme() == CodingScheme.GRAY ? grayToBinary(reg) : reg;
            int s = coding.signedFormat().signedValue(code, n);
            double value;
            switch (coding.signedFormat()) {
                case SIGN_MAGNITUDE:
                    double m = mag[code & (half - 1)];
                    value = (code & half) != 0 ? -m : m;
                    break;
                case TWOS_COMPLEMENT:
                    value = mag[code ^ half] - half;
                    break;
                case OFFSET_BINARY:
                    value = mag[code] - half;
                    break;
                default:
                    value = mag[code];
                    break;
            }
            v[s - minSigned] = value;
        }
        return v;
    }

    /**
     * The magnitude of every level below {@code count}: level = u * 2^B + r switches on the thermometer outputs
     * k &lt; u (their sum is onSum[u], running sums of the unary elements) and the binary elements of the bits of r.
     * Each level's sum is the sum of the level without r's highest bit plus that bit's element, so the binary
     * elements are added from the lowest bit up, onto onSum[u]: the same additions, in the same order, as summing
     * the level on its own, with one addition per level instead of one per bit.
     */
    private double[] magnitudes(int count, double[] onSum, double[] binaryValues) {
        double[] mag = new double[count];
        int mask = (1 << weightShift) - 1;
        for (int level = 0; level < count; level++) {
            int r = level & mask;
            if (r == 0) {
                mag[level] = onSum[level >>> weightShift];
            } else {
                int high = Integer.highestOneBit(r);
                mag[level] = mag[level ^ high] + binaryValues[Integer.numberOfTrailingZeros(high)];
            }
        }
        return mag;
    }

    private static int grayToBinary(int g) {
        int b = g;
        for (int shift = 1; shift < 32; shift <<= 1) {
            b ^= b >>> shift;
        }
        return b;
    }

    /** Evaluates one trial by walking all codes. */
    public void evaluate(double[] unaryValues, double[] binaryValues, TrialMetrics out) {
        double[] v = transfer(unaryValues, binaryValues);
        double[] dnl = dnl(v);
        double[][] inl = inl(v);
        double g = (v[levels - 1] - v[0]) / (levels - 1);
        double maxDnl = 0;
        double maxDnlEp = 0;
        boolean nonMonotonic = false;
        for (int k = 1; k < levels; k++) {
            double step = v[k] - v[k - 1];
            nonMonotonic |= step < 0;
            maxDnl = Math.max(maxDnl, Math.abs(dnl[k]));
            maxDnlEp = Math.max(maxDnlEp, Math.abs(step / g - 1.0));
        }
        out.nonMonotonic = nonMonotonic;
        out.maxDnl = maxDnl;
        out.maxDnlEndpoint = g > 0 ? maxDnlEp : Double.POSITIVE_INFINITY;
        out.inlEndpoint = maxAbs(inl[0]);
        out.inlBestFit = maxAbs(inl[1]);
        out.inlAbsolute = maxAbs(inl[2]);
    }

    /** DNL per level in nominal LSB: dnl[k] = V[k] - V[k-1] - 1 (dnl[0] = 0). */
    public double[] dnl(double[] v) {
        double[] d = new double[v.length];
        for (int k = 1; k < v.length; k++) {
            d[k] = v[k] - v[k - 1] - 1.0;
        }
        return d;
    }

    /** INL per level: [0] endpoint, [1] best-fit (least squares), [2] absolute; each in its own LSB. */
    public double[][] inl(double[] v) {
        int k1 = v.length;
        double g = (v[k1 - 1] - v[0]) / (k1 - 1);
        double meanX = 0;
        double meanY = 0;
        for (int k = 0; k < k1; k++) {
            meanX += k;
            meanY += v[k];
        }
        meanX /= k1;
        meanY /= k1;
        double sxx = 0;
        double sxy = 0;
        for (int k = 0; k < k1; k++) {
            sxx += (k - meanX) * (k - meanX);
            sxy += (k - meanX) * (v[k] - meanY);
        }
        double slope = sxy / sxx;
        double intercept = meanY - slope * meanX;
        double[][] out = new double[3][];
        out[0] = inlEndpoint(v);
        out[1] = new double[k1];
        out[2] = new double[k1];
        for (int k = 0; k < k1; k++) {
            out[1][k] = slope > 0 ? (v[k] - intercept - slope * k) / slope : Double.POSITIVE_INFINITY;
            out[2][k] = v[k] - nominal(k);
        }
        return out;
    }

    /** Endpoint INL per level in its own LSB: the first of {@link #inl}'s definitions on its own. */
    public double[] inlEndpoint(double[] v) {
        int k1 = v.length;
        double g = (v[k1 - 1] - v[0]) / (k1 - 1);
        double[] out = new double[k1];
        for (int k = 0; k < k1; k++) {
            out[k] = g > 0 ? (v[k] - v[0] - g * k) / g : Double.POSITIVE_INFINITY;
        }
        return out;
    }

    private static double maxAbs(double[] a) {
        double m = 0;
        for (double x : a) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    /** True if the coding is a sign-magnitude one (used by callers that label per-code charts). */
    public boolean signMagnitude() {
        return coding.signedFormat() == SignedFormat.SIGN_MAGNITUDE;
    }
}
