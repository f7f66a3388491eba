package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Area scaling of mismatch: Pelgrom, Duinmaijer, Welbers, IEEE JSSC 24(5), 1989, sigma = A / sqrt(W L). */
class PelgromScalingTest {

    @Test
    void unitSigmaFallsAsOneOverSquareRootOfArea() {
        PelgromCoefficient a = new PelgromCoefficient(1.0, CoefficientBasis.SINGLE_DEVICE);
        // Pelgrom 1989: sigma = A / sqrt(WL); A = 1 %um, WL = 4 um^2 gives 0.5 %
        assertEquals(0.005, a.unitSigma(4.0), 1e-15);
        for (double area : new double[] {0.1, 1, 2.5, 10, 100}) {
            assertEquals(a.unitSigma(area) / 2, a.unitSigma(4 * area), 1e-15, "four times the area halves sigma");
        }
    }

    @Test
    void pairCoefficientGivesOneDeviceSigmaDividedBySquareRootOfTwo() {
        // the difference of two independent devices has twice one device's variance
        PelgromCoefficient pair = new PelgromCoefficient(2.0, CoefficientBasis.PAIR);
        PelgromCoefficient single = new PelgromCoefficient(2.0, CoefficientBasis.SINGLE_DEVICE);
        assertEquals(single.unitSigma(3.0) / Math.sqrt(2), pair.unitSigma(3.0), 1e-15);
    }

    @Test
    void minimumAreaInvertsTheScaling() {
        PelgromCoefficient a = new PelgromCoefficient(1.4, CoefficientBasis.PAIR);
        for (double area : new double[] {0.3, 1, 7.5, 40}) {
            assertEquals(area, a.minimumArea(a.unitSigma(area)), 1e-12 * area);
        }
        assertThrows(IllegalArgumentException.class, () -> a.unitSigma(0));
    }

    @Test
    void elementOfKUnitsHasSqrtKTimesUnitSigma() {
        ElementModel m = ElementModel.ofUnitSigma(0.01);
        for (int k : new int[] {1, 2, 16, 1024}) {
            assertEquals(Math.sqrt(k) * 0.01, Math.sqrt(m.elementVariance(k)), 1e-15);
        }
    }
}
