package org.trimwright.engine.logic;

import java.util.Arrays;

/**
 * The cheapest split of an m-bit one-hot decoder into predecoded groups, by dynamic programming over
 * T(m) = min over splits of (gate transistors * 2^m + sum T(part)), T(1) = 0, where the final gate is a
 * 2-input (4 transistors) or, when allowed, 3-input (6 transistors) NAND/NOR. Inverters for the literals are not
 * part of T (every input needs both rails in any full decoder). Ties prefer the more balanced split.
 *
 * @param parts       group widths, low bits first (empty for m = 1)
 * @param transistors T(m)
 */
public record PredecodeSplit(int[] parts, long transistors) {

    public PredecodeSplit {
        parts = parts.clone();
    }

    @Override
    public int[] parts() {
        return parts.clone();
    }

    /** The best split of an m-bit decoder with gates of at most {@code maxFanIn} inputs. */
    public static PredecodeSplit best(int m, int maxFanIn) {
        long[] cost = new long[m + 1];
        int[][] split = new int[m + 1][];
        split[1] = new int[0];
        for (int w = 2; w <= m; w++) {
            long best = Long.MAX_VALUE;
            for (int a = w / 2; a >= 1; a--) {
                long c = 4L * (1L << w) + cost[a] + cost[w - a];
                if (c < best) {
                    best = c;
                    split[w] = new int[] {a, w - a};
                }
            }
            if (maxFanIn >= 3) {
                for (int a = 1; a <= w - 2; a++) {
                    for (int b = a; b <= w - a - 1; b++) {
                        int c3 = w - a - b;
                        if (c3 < b) {
                            continue;
                        }
                        long c = 6L * (1L << w) + cost[a] + cost[b] + cost[c3];
                        if (c < best) {
                            best = c;
                            split[w] = new int[] {a, b, c3};
                        }
                    }
                }
            }
            cost[w] = best;
        }
        return new PredecodeSplit(split[m], cost[m]);
    }

    @Override
    public String toString() {
        return Arrays.toString(parts) + " T=" + transistors;
    }
}
