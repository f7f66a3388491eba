package org.trimwright.analysis.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.SignedFormat;

class RangeRulesTest {

    private final TestSpecs s = new TestSpecs();

    private Field offsetField() {
        // 6-bit offset binary, 0.5 mV step: codes reach -32 x 0.5 = -16 mV .. +31 x 0.5 = +15.5 mV (hand calculation)
        Field f = TestSpecs.mismatch(s.trim("CAL", 6, CodingScheme.GRAY), 0.2);
        f.getTarget().setSignedFormat(SignedFormat.OFFSET_BINARY);
        f.getTarget().setStep(0.0005);
        f.getElement().setNominalValue(0.0005);
        f.getTarget().setAccuracy(0.0004);
        return f;
    }

    @Test
    void spreadWiderThanTheCodeRangeIsAnErrorWithBothShortfalls() {
        Field f = offsetField();
        f.getTarget().setSpreadMin(-0.02);
        f.getTarget().setSpreadMax(0.02);
        List<Finding> d = s.check("range.spread-not-covered");
        assertEquals(1, d.size());
        Finding x = d.get(0);
        assertEquals(Severity.ERROR, x.severity());
        assertEquals("B/R/CAL", x.path());
        assertEquals(-0.016, x.figures().get("codeMin"), 1e-12);
        assertEquals(0.0155, x.figures().get("codeMax"), 1e-12);
        // shortfall = 4 mV + margin at the low end, 4.5 mV + margin at the high end (hand calculation)
        double margin = x.figures().get("margin");
        assertTrue(margin > 0 && margin < 1e-4, "3-sigma margin of a 0.2 % array is tens of uV: " + margin);
        assertEquals(0.004 + margin, x.figures().get("shortLow"), 1e-12);
        assertEquals(0.0045 + margin, x.figures().get("shortHigh"), 1e-12);
        assertTrue(x.message().contains("common practice, no source"), x.message());
        assertTrue(x.advice().startsWith("trim sizing (engine)"), x.advice());
    }

    @Test
    void spreadInsideTheCodeRangeWithMarginPasses() {
        Field f = offsetField();
        f.getTarget().setSpreadMin(-0.015);
        f.getTarget().setSpreadMax(0.015);
        assertEquals(List.of(), s.check("range.spread-not-covered"));
    }

    @Test
    void stepAboveTwiceTheAccuracyIsTooCoarse() {
        Field f = s.trim("V", 4, CodingScheme.BINARY);
        f.getTarget().setAccuracy(0.0004);
        List<Finding> d = s.check("range.step-too-coarse");
        assertEquals(1, d.size());
        assertEquals(0.0008, d.get(0).figures().get("maxStepIdeal"), 1e-15);
        f.getTarget().setAccuracy(0.0005);
        assertEquals(List.of(), s.check("range.step-too-coarse"), "step = 2 x accuracy just meets it");
    }

    @Test
    void dnlWidenedResidualAboveTheAccuracyIsAnError() {
        // 8-bit binary at 3 %: mid-scale DNL sigma sqrt(255) x 0.03 = 0.48 LSB, so max|DNL| at 99 % is well above
        // 0.2 LSB and step (1 + max|DNL|) / 2 exceeds 0.6 step
        Field f = TestSpecs.mismatch(s.trim("V", 8, CodingScheme.BINARY), 3.0);
        f.getTarget().setAccuracy(0.0006);
        List<Finding> d = s.check("range.residual-exceeds-accuracy");
        assertEquals(1, d.size());
        double q = d.get(0).figures().get("maxDnlLsbAtTargetYield");
        assertEquals(0.001 * (1 + q) / 2, d.get(0).figures().get("residualWorst"), 1e-15);
        assertTrue(d.get(0).figures().get("residualWorst") > 0.0006);
    }

    @Test
    void residualWithSmallMismatchPasses() {
        Field f = TestSpecs.mismatch(s.trim("V", 8, CodingScheme.BINARY), 0.05);
        f.getTarget().setAccuracy(0.0006);
        assertEquals(List.of(), s.check("range.residual-exceeds-accuracy"));
    }
}
