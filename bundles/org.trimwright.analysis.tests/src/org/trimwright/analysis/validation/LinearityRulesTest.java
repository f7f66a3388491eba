package org.trimwright.analysis.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvice;
import org.trimwright.engine.mismatch.sizing.SegmentationRow;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.InlDefinition;

class LinearityRulesTest {

    private final TestSpecs s = new TestSpecs();

    @Test
    void riskyBinaryFieldThatMustBeMonotonicIsAnErrorWithTheExactFigure() {
        // 8-bit binary, 3 % units: mid-scale step sigma sqrt(255) x 0.03 = 0.48 LSB, so P(that step < 0) alone is
        // Phi(-1/0.48) ~ 2 % (hand calculation with a normal table), far above 1e-6
        Field f = TestSpecs.mismatch(s.trim("V", 8, CodingScheme.BINARY), 3.0);
        List<Finding> d = s.check("linearity.non-monotonic-risk");
        assertEquals(1, d.size());
        double p = d.get(0).figures().get("pNonMonotonic");
        assertTrue(p > 0.01 && p < 0.5, "P(non-monotonic) " + p);
        assertTrue(d.get(0).message().contains("exact running-sum recursion"), d.get(0).message());
        // the advice is the engine's cheapest split, not text of our own
        FieldReport full = FieldAnalyzer.analyze(f, TestSpecs.SETTINGS);
        SegmentationAdvice a = full.mismatch().get().segmentation();
        assertTrue(a.cheapestMeeting() >= 0);
        SegmentationRow row = a.rows().stream().filter(r -> r.unaryBits() == a.cheapestMeeting()).findFirst()
                .orElseThrow();
        assertTrue(d.get(0).advice().contains("M=" + a.cheapestMeeting() + " meets the limits at "
                + Math.round(row.decoderNand2Eq()) + " NAND2 eq."), d.get(0).advice());
    }

    @Test
    void thermometerFieldIsMonotonicByConstructionAndPasses() {
        TestSpecs.mismatch(s.trim("V", 4, CodingScheme.THERMOMETER), 3.0);
        assertEquals(List.of(), s.check("linearity.non-monotonic-risk"));
    }

    @Test
    void binaryFieldWithSmallMismatchPassesTheRiskLimit() {
        // 6-bit binary at 0.2 %: mid-scale step sigma sqrt(63) x 0.002 = 0.016 LSB: P ~ Phi(-63), below 1e-6
        TestSpecs.mismatch(s.trim("V", 6, CodingScheme.BINARY), 0.2);
        assertEquals(List.of(), s.check("linearity.non-monotonic-risk"));
    }

    @Test
    void dnlYieldBelowTargetIsAnErrorAndSmallMismatchPasses() {
        Field f = TestSpecs.mismatch(s.trim("V", 8, CodingScheme.BINARY), 3.0);
        List<Finding> d = s.check("linearity.dnl-yield");
        assertEquals(1, d.size());
        // the mid-scale step alone has DNL sigma sqrt(255) x 0.03 = 0.479 LSB: P(|DNL| < 0.5) = 2 Phi(1.044) - 1
        // = 0.703 (hand calculation with a normal table), an upper bound of the yield over all steps
        assertTrue(d.get(0).figures().get("yield") < 0.71, d.get(0).message());
        assertTrue(d.get(0).message().contains("DNL = step - 1 in nominal LSB"));
        f.getElement().setUnitSigmaPercent(0.1);
        assertEquals(List.of(), s.check("linearity.dnl-yield"));
    }

    @Test
    void inlYieldBelowTargetNamesTheDefinitionAndAWideLimitPasses() {
        // 6-bit thermometer at 3 %: best-fit INL sigma near the ends is a few tenths of an LSB, so max|INL| < 0.1 LSB
        // almost never holds
        Field f = TestSpecs.mismatch(s.trim("V", 6, CodingScheme.THERMOMETER), 3.0);
        f.getLimits().setInlDefinition(InlDefinition.BEST_FIT);
        f.getLimits().setMaxInlLsb(0.1);
        List<Finding> d = s.check("linearity.inl-yield");
        assertEquals(1, d.size());
        assertEquals(Severity.ERROR, d.get(0).severity());
        assertTrue(d.get(0).message().contains("INL best-fit"), d.get(0).message());
        f.getLimits().setMaxInlLsb(3.0);
        assertEquals(List.of(), s.check("linearity.inl-yield"));
    }
}
