package org.trimwright.engine.mismatch.sequence;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.trimwright.engine.mismatch.Gradient;

/**
 * Builds unary switching sequences and measures the INL a gradient leaves with them.
 * <p>
 * Objective of the optimised search: with prefix sums S_k of the systematic relative errors e_i of the first k
 * elements, the endpoint INL of the unary levels is S_k - k S_P / P (in element units). For a linear-only and a
 * quadratic-only gradient of unit size we take the maxima L and Q of |that|; the combined INL is at most
 * |g1| L + |g2| Q (triangle inequality), which is what the search minimises (weights 1, 1 when no gradient is given).
 * Above 4095 slots the optimised sequence is the mirrored tree.
 */
public final class SwitchingSequences {

    /** Above this many slots the search returns the mirrored tree (the greedy build costs P^2). */
    private static final int GREEDY_LIMIT = 4095;
    /** Above this many slots the pairwise-swap pass is skipped. */
    private static final int SWAP_LIMIT = 1023;
    /** Work limit of the swap search (inner-loop steps), which keeps it well under a second. */
    private static final long SWAP_BUDGET = 50_000_000L;

    private SwitchingSequences() {
    }

    /** The sequence of {@code kind} over {@code slots} slots; {@code gradient} steers only the optimised search. */
    public static int[] build(SequenceKind kind, int slots, Gradient gradient) {
        if (slots < 0) {
            throw new IllegalArgumentException("slots must be >= 0");
        }
        switch (kind) {
            case SEQUENTIAL:
                return sequential(slots);
            case CENTRE_OUT:
                return centreOut(slots);
            case MIRRORED_TREE:
                return mirroredTree(slots);
            case OPTIMISED:
                return optimised(slots, gradient);
            default:
                throw new IllegalStateException(kind.name());
        }
    }

    static int[] sequential(int slots) {
        int[] s = new int[slots];
        for (int i = 0; i < slots; i++) {
            s[i] = i;
        }
        return s;
    }

    static int[] centreOut(int slots) {
        int[] s = new int[slots];
        if (slots == 0) {
            return s;
        }
        int c = (slots - 1) / 2;
        int k = 0;
        s[k++] = c;
        for (int d = 1; k < slots; d++) {
            if (c - d >= 0 && k < slots) {
                s[k++] = c - d;
            }
            if (c + d < slots && k < slots) {
                s[k++] = c + d;
            }
        }
        return s;
    }

    static int[] mirroredTree(int slots) {
        int[] s = new int[slots];
        if (slots == 0) {
            return s;
        }
        int k = 0;
        int pairs = slots / 2;
        boolean odd = (slots & 1) == 1;
        int lo = odd ? (slots - 1) / 2 : slots / 2 - 1;
        if (odd) {
            s[k++] = lo;
        }
        int width = 1;
        while ((1 << width) < pairs) {
            width++;
        }
        int flip = 0;
        for (int r = 0; r < (1 << width); r++) {
            int d = Integer.reverse(r) >>> (32 - width);
            if (pairs == 1) {
                d = r;
            }
            if (d >= pairs) {
                continue;
            }
            int left = odd ? lo - (d + 1) : lo - d;
            int right = odd ? lo + (d + 1) : lo + 1 + d;
            if ((flip++ & 1) == 0) {
                s[k++] = left;
                s[k++] = right;
            } else {
                s[k++] = right;
                s[k++] = left;
            }
        }
        return s;
    }

    /** Searched sequences by slots and weights (the search is a pure function of them); bounded in size. */
    private static final Map<String, int[]> OPTIMISED = new ConcurrentHashMap<>();
    private static final int OPTIMISED_CACHE_LIMIT = 256;

    static int[] optimised(int slots, Gradient gradient) {
        if (slots <= 2) {
            return sequential(slots);
        }
        double w1 = Math.abs(gradient.linear());
        double w2 = Math.abs(gradient.quadratic());
        if (w1 == 0 && w2 == 0) {
            w1 = 1.0;
            w2 = 1.0;
        }
        String key = slots + "|" + Double.doubleToLongBits(w1) + "|" + Double.doubleToLongBits(w2);
        int[] known = OPTIMISED.get(key);
        if (known == null) {
            known = searchOptimised(slots, w1, w2);
            if (OPTIMISED.size() >= OPTIMISED_CACHE_LIMIT) {
                OPTIMISED.clear();
            }
            OPTIMISED.put(key, known);
        }
        return known.clone();
    }

    private static int[] searchOptimised(int slots, double w1, double w2) {
        double[] lin = new double[slots];
        double[] quad = new double[slots];
        double linMean = 0;
        double quadMean = 0;
        for (int p = 0; p < slots; p++) {
            double x = Gradient.coordinate(p, slots);
            lin[p] = x;
            quad[p] = x * x;
            linMean += x;
            quadMean += x * x;
        }
        linMean /= slots;
        quadMean /= slots;
        int[] tree = mirroredTree(slots);
        if (slots > GREEDY_LIMIT) {
            return tree;
        }
        int[] greedy = greedy(slots, lin, quad, linMean, quadMean, w1, w2);
        int[] best = objective(greedy, lin, quad, w1, w2) <= objective(tree, lin, quad, w1, w2) ? greedy : tree;
        if (slots <= SWAP_LIMIT) {
            localSwaps(best, lin, quad, w1, w2);
        }
        return best;
    }

    private static int[] greedy(int slots, double[] lin, double[] quad, double linMean, double quadMean,
            double w1, double w2) {
        boolean[] used = new boolean[slots];
        int[] s = new int[slots];
        double sl = 0;
        double sq = 0;
        for (int k = 0; k < slots; k++) {
            int bestSlot = -1;
            double bestCost = Double.POSITIVE_INFINITY;
            for (int p = 0; p < slots; p++) {
                if (used[p]) {
                    continue;
                }
                double cost = w1 * Math.abs(sl + lin[p] - (k + 1) * linMean)
                        + w2 * Math.abs(sq + quad[p] - (k + 1) * quadMean);
                if (cost < bestCost - 1e-15) {
                    bestCost = cost;
                    bestSlot = p;
                }
            }
            used[bestSlot] = true;
            s[k] = bestSlot;
            sl += lin[bestSlot];
            sq += quad[bestSlot];
        }
        return s;
    }

    /**
     * First-improvement pairwise swaps. Swapping sequence positions i &lt; j changes the prefix sums only at positions
     * i..j-1, by e[s_j] - e[s_i]; with prefix and suffix maxima of |INL| the new objective costs O(j - i), and a swap
     * whose untouched parts already reach the current objective is skipped at once.
     */
    private static void localSwaps(int[] s, double[] lin, double[] quad, double w1, double w2) {
        int n = s.length;
        double[] devL = new double[n];
        double[] devQ = new double[n];
        double[] preL = new double[n];
        double[] preQ = new double[n];
        double[] sufL = new double[n];
        double[] sufQ = new double[n];
        double current = deviations(s, lin, quad, devL, devQ, preL, preQ, sufL, sufQ, w1, w2);
        long budget = SWAP_BUDGET;
        boolean improved = true;
        for (int pass = 0; improved && pass < 20 && budget > 0; pass++) {
            improved = false;
            for (int i = 0; i < n && budget > 0; i++) {
                for (int j = i + 1; j < n; j++) {
                    double outL = Math.max(i > 0 ? preL[i - 1] : 0.0, sufL[j]);
                    double outQ = Math.max(i > 0 ? preQ[i - 1] : 0.0, sufQ[j]);
                    if (w1 * outL + w2 * outQ >= current - 1e-12) {
                        continue;
                    }
                    double dl = lin[s[j]] - lin[s[i]];
                    double dq = quad[s[j]] - quad[s[i]];
                    double inL = 0;
                    double inQ = 0;
                    for (int k = i; k < j; k++) {
                        inL = Math.max(inL, Math.abs(devL[k] + dl));
                        inQ = Math.max(inQ, Math.abs(devQ[k] + dq));
                    }
                    budget -= j - i;
                    double o = w1 * Math.max(outL, inL) + w2 * Math.max(outQ, inQ);
                    if (o < current - 1e-12) {
                        swap(s, i, j);
                        current = deviations(s, lin, quad, devL, devQ, preL, preQ, sufL, sufQ, w1, w2);
                        improved = true;
                    }
                }
            }
        }
    }

    private static double deviations(int[] s, double[] lin, double[] quad, double[] devL, double[] devQ,
            double[] preL, double[] preQ, double[] sufL, double[] sufQ, double w1, double w2) {
        int n = s.length;
        double totalL = 0;
        double totalQ = 0;
        for (int p : s) {
            totalL += lin[p];
            totalQ += quad[p];
        }
        double runL = 0;
        double runQ = 0;
        for (int k = 0; k < n; k++) {
            runL += lin[s[k]];
            runQ += quad[s[k]];
            devL[k] = runL - (k + 1) * totalL / n;
            devQ[k] = runQ - (k + 1) * totalQ / n;
            preL[k] = Math.max(k > 0 ? preL[k - 1] : 0.0, Math.abs(devL[k]));
            preQ[k] = Math.max(k > 0 ? preQ[k - 1] : 0.0, Math.abs(devQ[k]));
        }
        for (int k = n - 1; k >= 0; k--) {
            sufL[k] = Math.max(k < n - 1 ? sufL[k + 1] : 0.0, Math.abs(devL[k]));
            sufQ[k] = Math.max(k < n - 1 ? sufQ[k + 1] : 0.0, Math.abs(devQ[k]));
        }
        return w1 * preL[n - 1] + w2 * preQ[n - 1];
    }

    private static void swap(int[] s, int i, int j) {
        int t = s[i];
        s[i] = s[j];
        s[j] = t;
    }

    /** w1 max|INL| of the unit linear gradient plus w2 max|INL| of the unit quadratic gradient (endpoint, units). */
    static double objective(int[] s, double[] lin, double[] quad, double w1, double w2) {
        return w1 * maxAbsEndpointInl(s, lin) + w2 * maxAbsEndpointInl(s, quad);
    }

    /** max over k of |S_k - k S_P / P| for per-slot errors {@code err} taken in sequence order. */
    public static double maxAbsEndpointInl(int[] sequence, double[] err) {
        int n = sequence.length;
        double total = 0;
        for (int p : sequence) {
            total += err[p];
        }
        double run = 0;
        double worst = 0;
        for (int k = 0; k < n; k++) {
            run += err[sequence[k]];
            worst = Math.max(worst, Math.abs(run - (k + 1) * total / n));
        }
        return worst;
    }
}
