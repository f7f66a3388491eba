package org.trimwright.engine.mismatch;

/**
 * First-order (small-mismatch) sigma of DNL and INL at every magnitude level 0..N, in LSB.
 * <p>
 * Each INL definition is linear in the element errors to first order: INL(L) = sum_e d_e (on_e(L) - a_e - c_e L),
 * where on_e(L) is 1 if element e is on at level L and a_e + c_e L is the line the definition fits to that indicator:
 * endpoint a = 0, c = 1/N; absolute a = c = 0; best fit the least-squares line of on_e over all levels (through the
 * origin for sign-magnitude). Hence var INL(L) = sum_e var_e (on_e(L) - a_e - c_e L)^2. For the unary elements (all of
 * one variance) the sum is evaluated with prefix sums in O(1) per level, for binary elements directly: O(N B) in all.
 * For a unary array the endpoint variance is s^2 k(P-k)/P, the Brownian-bridge form (Heydenreich, van der Hofstad,
 * Radulov, arXiv math/0606584).
 */
public final class PerCodeSigma {

    private final double[] dnl;
    private final double[][] inl;

    private PerCodeSigma(double[] dnl, double[][] inl) {
        this.dnl = dnl;
        this.inl = inl;
    }

    /** Sigma arrays of the magnitude levels of {@code array}. */
    public static PerCodeSigma of(ElementArray array) {
        int top = array.topLevel();
        int w = array.unaryWeight();
        int bits = array.binaryBits();
        int p = array.unaryCount();
        double[] varB = new double[bits];
        double sumVarB = 0;
        for (int j = 0; j < bits; j++) {
            varB[j] = array.binarySigma(j) * array.binarySigma(j);
            sumVarB += varB[j];
        }
        double varU = array.unarySigma() * array.unarySigma();
        double[] dnl = new double[top + 1];
        for (int level = 1; level <= top; level++) {
            int r = level & (w - 1);
            double v;
            if (r == 0) {
                v = varU + sumVarB;
            } else {
                int k = Integer.numberOfTrailingZeros(r);
                v = 0;
                for (int j = 0; j <= k; j++) {
                    v += varB[j];
                }
            }
            dnl[level] = Math.sqrt(v);
        }
        double[][] inl = new double[InlDefinition.values().length][];
        for (InlDefinition d : InlDefinition.values()) {
            inl[d.ordinal()] = inlSigma(array, d, varU, varB, top, w, bits, p);
        }
        return new PerCodeSigma(dnl, inl);
    }

    private static double[] inlSigma(ElementArray array, InlDefinition def, double varU, double[] varB, int top,
            int w, int bits, int p) {
        double n = top + 1.0;
        double centre = top / 2.0;
        double dcc = n * (n * n - 1) / 12;
        double sll = top * (top + 1.0) * (2.0 * top + 1) / 6;
        boolean origin = array.signMagnitude();
        double[] aU = new double[p];
        double[] cU = new double[p];
        for (int i = 0; i < p; i++) {
            double t = (i + 1.0) * w;
            double count = top - t + 1;
            double s1 = (t + top) * count / 2;
            double[] ac = fit(def, origin, count, s1, n, centre, dcc, sll, top);
            aU[i] = ac[0];
            cU[i] = ac[1];
        }
        double[] aB = new double[bits];
        double[] cB = new double[bits];
        for (int j = 0; j < bits; j++) {
            double count = 0;
            double s1 = 0;
            for (int level = 0; level <= top; level++) {
                if ((level >>> j & 1) != 0) {
                    count++;
                    s1 += level;
                }
            }
            double[] ac = fit(def, origin, count, s1, n, centre, dcc, sll, top);
            aB[j] = ac[0];
            cB[j] = ac[1];
        }
        double a2 = 0;
        double ab = 0;
        double b2 = 0;
        for (int i = 0; i < p; i++) {
            a2 += aU[i] * aU[i];
            ab += aU[i] * cU[i];
            b2 += cU[i] * cU[i];
        }
        double[] prefixA = new double[p + 1];
        double[] prefixC = new double[p + 1];
        for (int i = 0; i < p; i++) {
            prefixA[i + 1] = prefixA[i] + aU[i];
            prefixC[i + 1] = prefixC[i] + cU[i];
        }
        double[] sigma = new double[top + 1];
        for (int level = 0; level <= top; level++) {
            int u = level / w;
            int r = level & (w - 1);
            double x = level;
            double unary = p == 0 ? 0
                    : a2 + 2 * x * ab + x * x * b2 + u - 2 * (prefixA[u] + x * prefixC[u]);
            double v = varU * Math.max(0.0, unary);
            for (int j = 0; j < bits; j++) {
                double on = (r >>> j & 1) != 0 ? 1.0 : 0.0;
                double e = on - aB[j] - cB[j] * x;
                v += varB[j] * e * e;
            }
            sigma[level] = Math.sqrt(v);
        }
        return sigma;
    }

    private static double[] fit(InlDefinition def, boolean origin, double count, double s1, double n, double centre,
            double dcc, double sll, int top) {
        switch (def) {
            case ENDPOINT:
                return new double[] {0.0, 1.0 / top};
            case ABSOLUTE:
                return new double[] {0.0, 0.0};
            case BEST_FIT:
                if (origin) {
                    return new double[] {0.0, s1 / sll};
                }
                double c = (s1 - centre * count) / dcc;
                return new double[] {count / n - c * centre, c};
            default:
                throw new IllegalStateException(def.name());
        }
    }

    /** DNL sigma of the step into magnitude level L (index 0 unused, 0). */
    public double[] dnl() {
        return dnl.clone();
    }

    /** INL sigma at every magnitude level under {@code def}. */
    public double[] inl(InlDefinition def) {
        return inl[def.ordinal()].clone();
    }

    /** Largest INL sigma over the levels under {@code def}. */
    public double worstInl(InlDefinition def) {
        double m = 0;
        for (double s : inl[def.ordinal()]) {
            m = Math.max(m, s);
        }
        return m;
    }

    /** The level with the largest INL sigma under {@code def} (the first of equals). */
    public int worstInlLevel(InlDefinition def) {
        double[] a = inl[def.ordinal()];
        int best = 0;
        for (int k = 1; k < a.length; k++) {
            if (a[k] > a[best]) {
                best = k;
            }
        }
        return best;
    }
}
