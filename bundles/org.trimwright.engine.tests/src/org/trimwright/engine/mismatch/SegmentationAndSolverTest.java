package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvisor;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.engine.mismatch.sizing.SigmaSolution;
import org.trimwright.engine.mismatch.sizing.UnitSigmaSolver;

/** Segmentation advice and the inverse question (largest unit sigma). */
class SegmentationAndSolverTest {

    @Test
    void segmentationListsEverySplitAndPicksTheCheapestThatMeetsTheLimits() {
        Limits limits = new Limits(0.5, 1.0, InlDefinition.ENDPOINT, 0.99, 1e-4);
        SegmentationAdvice advice = SegmentationAdvisor.advise(8, SignedFormat.UNSIGNED, ElementModel.ofUnitSigma(0.02),
                limits, new MonteCarloOptions(20_000, 3, 0, 0), m -> 4.0 * ((1 << m) - 1), 1.0);
        assertEquals(9, advice.rows().size());
        SegmentationRow binary = advice.rows().get(0);
        SegmentationRow thermo = advice.rows().get(8);
        assertEquals(0, binary.unaryElements());
        assertEquals(8, binary.switches());
        assertTrue(thermo.monotonicGuaranteed());
        assertEquals(255, thermo.switches());
        for (int m = 1; m <= 8; m++) {
            assertTrue(advice.rows().get(m).sigmaDnlWorst() <= advice.rows().get(m - 1).sigmaDnlWorst() + 1e-15);
        }
        int chosen = advice.cheapestMeeting();
        assertTrue(chosen >= 0);
        for (SegmentationRow r : advice.rows()) {
            if (r.meetsLimits()) {
                assertTrue(r.cost() >= advice.rows().get(chosen).cost());
            }
        }
        assertTrue(advice.rows().get(chosen).meetsLimits());
        assertTrue(!binary.meetsLimits(), "8-bit binary at 2 % has a mid-scale DNL sigma of 0.32 LSB");
    }

    @Test
    void largestUnitSigmaMeetsTheTargetAndAFivePercentLargerOneDoesNot() {
        FieldCoding coding = FieldCoding.of(8, CodingScheme.SEGMENTED, 4);
        Limits limits = new Limits(0.5, 0.5, InlDefinition.ENDPOINT, 0.95, 1e-3);
        MonteCarloOptions mc = new MonteCarloOptions(20_000, 11, 0, 0);
        PelgromCoefficient pelgrom = new PelgromCoefficient(1.0, CoefficientBasis.PAIR);
        SigmaSolution s = UnitSigmaSolver.largestUnitSigma(coding, ElementModel.ofUnitSigma(0.01), limits, mc, pelgrom,
                30);
        assertTrue(s.achievedYield() >= 0.95);
        double above = UnitSigmaSolver.jointYield(coding, ElementModel.ofUnitSigma(s.unitSigma() * 1.05), limits, mc);
        assertTrue(above < 0.95, "yield at 1.05 sigma: " + above);
        assertEquals(pelgrom.minimumArea(s.unitSigma()), s.minimumAreaUm2(), 1e-12);
    }
}
