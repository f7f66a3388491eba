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
 */
public final class SwitchingSequences {

    /** Above this many slots the pairwise-swap pass is skipped (its cost grows as P^3). */
    private static final int SWAP_LIMIT = 512;

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
        int[] greedy = greedy(slots, lin, quad, linMean, quadMean, w1, w2);
        int[] tree = mirroredTree(slots);
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

    private static void localSwaps(int[] s, double[] lin, double[] quad, double w1, double w2) {
        double current = objective(s, lin, quad, w1, w2);
        boolean improved = true;
        for (int pass = 0; improved && pass < 20; pass++) {
            improved = false;
            for (int i = 0; i < s.length; i++) {
                for (int j = i + 1; j < s.length; j++) {
                    swap(s, i, j);
                    double o = objective(s, lin, quad, w1, w2);
                    if (o < current - 1e-12) {
                        current = o;
                        improved = true;
                    } else {
                        swap(s, i, j);
                    }
                }
            }
        }
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
