package org.trimwright.engine.mismatch;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.trimwright.engine.stats.Normal;

/**
 * Exact per-transition statistics and the union bound on P(non-monotonic).
 * <p>
 * A carry into bit k occurs 2^M 2^(B-1-k) times in the magnitude transfer but is always the same random variable
 * b_k - sum_{j&lt;k} b_j (the unary elements and higher bits cancel), so it is one event. The union bound over distinct
 * events is sum_types events * P(step &lt; 0); it bounds P(any negative step) from above. The looser bound that
 * counts every occurrence is also given. Sign-magnitude repeats every magnitude step on the negative side (the same
 * random variables), doubling occurrences only.
 */
public final class TransitionAnalysis {

    private final List<Transition> transitions;
    private final boolean byConstruction;

    private TransitionAnalysis(List<Transition> transitions, boolean byConstruction) {
        this.transitions = Collections.unmodifiableList(transitions);
        this.byConstruction = byConstruction;
    }

    /** The distinct transition types of {@code array}. */
    public static TransitionAnalysis of(ElementArray array) {
        List<Transition> list = new ArrayList<>();
        int m = array.unaryBits();
        int b = array.binaryBits();
        int mirror = array.signMagnitude() ? 2 : 1;
        boolean construction = array.monotonicByConstruction();
        double lowerVar = 0;
        for (int k = 0; k < b; k++) {
            double var = array.binarySigma(k) * array.binarySigma(k) + lowerVar;
            double sigma = Math.sqrt(var);
            long occ = (1L << m) * (1L << (b - 1 - k)) * mirror;
            int from = (1 << k) - 1;
            list.add(new Transition("carry", k, "carry into bit " + k + " (level " + from + " to " + (from + 1) + ")",
                    from, 1, occ, 1.0, sigma, pNegative(1.0, sigma)));
            lowerVar += array.binarySigma(k) * array.binarySigma(k);
        }
        int p = array.unaryCount();
        int w = array.unaryWeight();
        double uVar = array.unarySigma() * array.unarySigma() + lowerVar;
        double uSigma = Math.sqrt(uVar);
        double lowerMean = w - 1;
        int i = 0;
        while (i < p) {
            int j = i + 1;
            while (j < p && array.unaryMean(j) == array.unaryMean(i)) {
                j++;
            }
            double mean = array.unaryMean(i) - lowerMean;
            int from = (i + 1) * w - 1;
            String label = j - i == 1
                    ? "unary element " + i + " (level " + from + " to " + (from + 1) + ")"
                    : "unary elements " + i + ".." + (j - 1) + " (first at level " + from + " to " + (from + 1) + ")";
            list.add(new Transition("unary", i, label, from, j - i, (long) (j - i) * mirror, mean, uSigma,
                    construction ? 0.0 : pNegative(mean, uSigma)));
            i = j;
        }
        return new TransitionAnalysis(list, construction);
    }

    private static double pNegative(double mean, double sigma) {
        return sigma > 0 ? Normal.upperTail(mean / sigma) : (mean < 0 ? 1.0 : 0.0);
    }

    public List<Transition> transitions() {
        return transitions;
    }

    /** True when every step adds a non-negative element (no negative step possible). */
    public boolean monotonicByConstruction() {
        return byConstruction;
    }

    /** Union bound over distinct random steps, capped at 1 (0 when monotonic by construction). */
    public double unionBound() {
        double s = 0;
        for (Transition t : transitions) {
            s += t.events() * t.pNegative();
        }
        return Math.min(1.0, s);
    }

    /** The looser union bound counting every occurrence of every transition, capped at 1. */
    public double unionBoundCountingOccurrences() {
        double s = 0;
        for (Transition t : transitions) {
            s += t.occurrences() * t.pNegative();
        }
        return Math.min(1.0, s);
    }

    /** The largest single-event probability: a lower bound on P(non-monotonic). */
    public double largestSingle() {
        double s = 0;
        for (Transition t : transitions) {
            s = Math.max(s, t.pNegative());
        }
        return s;
    }

    /** The transition with the largest DNL sigma (the first of equals). */
    public Transition worstSigma() {
        Transition worst = transitions.get(0);
        for (Transition t : transitions) {
            if (t.sigma() > worst.sigma()) {
                worst = t;
            }
        }
        return worst;
    }
}
