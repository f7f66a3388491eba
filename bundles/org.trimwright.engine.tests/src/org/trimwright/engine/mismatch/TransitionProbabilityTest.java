package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.WilsonScoreInterval;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/** Exact per-transition probabilities of a negative step against Monte Carlo and Apache Commons Math. */
class TransitionProbabilityTest {

    @Test
    void perTransitionProbabilityIsTheNormalLowerTailAtZero() {
        ElementArray array = ElementArray.of(FieldCoding.of(6, CodingScheme.SEGMENTED, 2),
                ElementModel.ofUnitSigma(0.12));
        for (Transition t : TransitionAnalysis.of(array).transitions()) {
            // Apache Commons Math 3.6.1: P(step < 0) for step ~ N(mean, sigma^2)
            double p = new NormalDistribution(t.mean(), t.sigma()).cumulativeProbability(0.0);
            assertEquals(p, t.pNegative(), 1e-12 * Math.max(p, 1e-300) + 1e-16, t.label());
        }
    }

    @Test
    void monteCarloNegativeStepFrequencyPerTransitionIsWithinItsConfidenceInterval() {
        ElementArray array = ElementArray.of(FieldCoding.of(5, CodingScheme.SEGMENTED, 2),
                ElementModel.ofUnitSigma(0.15));
        List<Transition> types = TransitionAnalysis.of(array).transitions();
        int trials = 100_000;
        long[] negative = new long[types.size()];
        Draws d = new Draws(array, 77);
        for (int t = 0; t < trials; t++) {
            d.next();
            double[] v = d.magnitudeTransfer();
            for (int k = 0; k < types.size(); k++) {
                int from = types.get(k).fromLevel();
                if (v[from + 1] - v[from] < 0) {
                    negative[k]++;
                }
            }
        }
        for (int k = 0; k < types.size(); k++) {
            Transition t = types.get(k);
            // Wilson score interval of Apache Commons Math 3.6.1 at 99.9 % (several intervals tested at once)
            ConfidenceInterval ci = new WilsonScoreInterval().createInterval(trials, (int) negative[k], 0.999);
            assertTrue(t.pNegative() >= ci.getLowerBound() && t.pNegative() <= ci.getUpperBound(),
                    t.label() + ": exact " + t.pNegative() + ", Monte Carlo " + (double) negative[k] / trials);
        }
    }

    @Test
    void monteCarloNonMonotonicProbabilityLiesBetweenLargestStepAndUnionBound() {
        ElementArray array = ElementArray.of(FieldCoding.of(8, CodingScheme.BINARY, 0),
                ElementModel.ofUnitSigma(0.03));
        TransitionAnalysis ta = TransitionAnalysis.of(array);
        int trials = 400_000;
        MonteCarloResult mc = MonteCarloRun.run(array, new MonteCarloOptions(trials, 8, 0, 0));
        double[] ci = WilsonInterval.of(mc.nonMonotonicCount(), trials, 0.999);
        assertTrue(ci[1] >= ta.largestSingle(), "below the largest single-step probability");
        assertTrue(ci[0] <= ta.unionBound(), "above the union bound");
        assertTrue(ta.unionBound() <= ta.unionBoundCountingOccurrences());
        assertTrue(ta.largestSingle() > 0.01, "the test must exercise a real probability");
    }

    @Test
    void wilsonIntervalMatchesApacheCommonsMath() {
        for (int[] kn : new int[][] {{0, 10}, {3, 10}, {50, 1000}, {999, 1000}, {1000, 1000}, {17, 123456}}) {
            double[] ours = WilsonInterval.of(kn[0], kn[1], 0.95);
            // Apache Commons Math 3.6.1 WilsonScoreInterval
            ConfidenceInterval ref = new WilsonScoreInterval().createInterval(kn[1], kn[0], 0.95);
            assertEquals(ref.getLowerBound(), ours[0], 1e-12);
            assertEquals(ref.getUpperBound(), ours[1], 1e-12);
        }
    }
}
