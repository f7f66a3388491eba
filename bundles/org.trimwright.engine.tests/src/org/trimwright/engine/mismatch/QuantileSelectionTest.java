package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/** Quantiles of the per-trial maxima by selection equal the sorted order statistic. */
class QuantileSelectionTest {

    @Test
    void quantileIsTheOrderStatisticOfRankCeilQn() {
        ElementArray array = ElementArray.of(FieldCoding.of(6, CodingScheme.SEGMENTED, 2),
                ElementModel.ofUnitSigma(0.05));
        int trials = 9_999;
        MonteCarloResult mc = MonteCarloRun.run(array, new MonteCarloOptions(trials, 4, 0, 0));
        double[] sorted = new double[trials];
        for (int t = 0; t < trials; t++) {
            sorted[t] = mc.value(Metric.INL_ENDPOINT, t);
        }
        Arrays.sort(sorted);
        for (double q : new double[] {0.0, 0.01, 0.5, 0.9, 0.99, 0.999, 1.0}) {
            int k = (int) Math.min(trials - 1, Math.max(0, Math.ceil(q * trials) - 1));
            assertEquals(sorted[k], mc.quantile(Metric.INL_ENDPOINT, q), 0.0, "q = " + q);
        }
        // Apache Commons Math 3.6.1 Percentile (default estimation) agrees at the median within one order step
        double median = new Percentile().evaluate(sorted, 50.0);
        assertEquals(median, mc.quantile(Metric.INL_ENDPOINT, 0.5), sorted[5000] - sorted[4998] + 1e-12);
    }
}
