package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.mismatch.sizing.SizingRequest;
import org.trimwright.engine.mismatch.sizing.SizingResult;
import org.trimwright.engine.mismatch.sizing.TrimSizing;

/** Trim sizing arithmetic. */
class TrimSizingTest {

    /**
     * Offset of sigma 10 mV trimmed over +-3 sigma to +-0.5 mV: 60 mV range, step at most 1 mV, 2^n - 1 &gt;= 60 gives
     * n = 6 (step 60/63 mV), worst residual half a step (common practice, no source: the trim range must cover the
     * spread and the best code is within half a step).
     */
    @Test
    void idealFieldNeedsBitsForRangeOverTwiceTheAccuracy() {
        SizingResult r = TrimSizing.size(SizingRequest.ofSigma(0.0, 10e-3, 3.0, 0.5e-3, "V"));
        assertEquals(0.06, r.range(), 1e-15);
        assertEquals(1e-3, r.maxStep(), 1e-15);
        assertEquals(6, r.bitsNeeded());
        assertEquals(0.06 / 63, r.step(), 1e-15);
        assertEquals(0.06 / 63 / 2, r.residualWorst(), 1e-15);
        assertEquals(0.06 / 63 / Math.sqrt(12), r.residualRms(), 1e-15);
        assertEquals("binary", r.search());
        assertEquals(6, r.measurements());
        assertEquals(63, r.linearMeasurements());
        assertTrue(r.meetsAccuracy());
    }

    @Test
    void dnlWidensTheResidualAndCanCostABit() {
        SizingRequest base = SizingRequest.ofMinMax(-30e-3, 30e-3, 0.5e-3, "V");
        SizingRequest wide = new SizingRequest(-30e-3, 30e-3, 0.5e-3, "V", 0.6, 0.2, false, 0.01, 0);
        SizingResult a = TrimSizing.size(base);
        SizingResult b = TrimSizing.size(wide);
        assertEquals(6, a.bitsNeeded());
        assertEquals(7, b.bitsNeeded());
        assertEquals(b.step() * 1.6 / 2, b.residualWorst(), 1e-15);
        assertEquals("linear", b.search());
        assertEquals(127, b.measurements());
        assertEquals(0.01, b.binarySearchRisk(), 0.0);
    }

    /** The rms residual formula step/sqrt(12) sqrt(1 + 3 s_d^2) against a direct simulation of random gaps. */
    @Test
    void rmsResidualWithRandomGapsMatchesSimulation() {
        double sd = 0.3;
        double step = 1.0;
        SplittableRandom rnd = new SplittableRandom(4);
        int gaps = 200_000;
        double[] edge = new double[gaps + 1];
        for (int i = 1; i <= gaps; i++) {
            double g;
            do {
                g = step * (1 + sd * gaussian(rnd));
            } while (g <= 0);
            edge[i] = edge[i - 1] + g;
        }
        double sum2 = 0;
        int samples = 400_000;
        for (int s = 0; s < samples; s++) {
            double x = rnd.nextDouble() * edge[gaps];
            int lo = java.util.Arrays.binarySearch(edge, x);
            lo = lo >= 0 ? lo : -lo - 2;
            double e = Math.min(x - edge[lo], edge[lo + 1] - x);
            sum2 += e * e;
        }
        double simulated = Math.sqrt(sum2 / samples);
        SizingResult r = TrimSizing.size(new SizingRequest(0, gaps * step, 1e9, "LSB", 0, sd, true, 0, 0));
        double predicted = step / Math.sqrt(12) * Math.sqrt(1 + 3 * sd * sd);
        assertEquals(predicted, simulated, 0.01 * predicted);
        assertTrue(r.residualRms() > 0);
    }

    private static double gaussian(SplittableRandom rnd) {
        double u;
        double v;
        double s;
        do {
            u = 2 * rnd.nextDouble() - 1;
            v = 2 * rnd.nextDouble() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s == 0);
        return u * Math.sqrt(-2 * Math.log(s) / s);
    }
}
