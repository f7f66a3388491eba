package org.trimwright.engine.glitch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;

class GlitchAnalysisTest {

    /** Reference by a different enumeration: every code that agrees with 'from' outside the toggled bits. */
    private static int referenceExcursion(CodeMap map, int from, int to) {
        int t = from ^ to;
        int lo = Math.min(map.signedSteps(from), map.signedSteps(to));
        int hi = Math.max(map.signedSteps(from), map.signedSteps(to));
        int worst = 0;
        for (int c = 0; c < map.coding().codeCount(); c++) {
            if (((c ^ from) & ~t) == 0) {
                int v = map.signedSteps(c);
                worst = Math.max(worst, Math.max(v - hi, lo - v));
            }
        }
        return worst;
    }

    /**
     * Unsigned binary: the worst step is midscale, 2^(n-1)-1 to 2^(n-1), where all n bits toggle; the all-ones
     * intermediate code lies 2^(n-1)-1 LSB above the upper end (derived from the definition).
     */
    @Test
    void binaryFieldGlitchesWorstAtMidscale() {
        for (int n = 1; n <= 12; n++) {
            GlitchReport r = GlitchAnalysis.analyse(new CodeMap(FieldCoding.of(n, CodingScheme.BINARY, 0)), 2e-3);
            assertEquals((1 << (n - 1)) - 1, r.worstExcursionLsb(), "n=" + n);
            assertEquals(((1 << (n - 1)) - 1) * 2e-3, r.worst().excursionUnit(), 1e-12);
            if (n > 1) {
                assertEquals((1 << (n - 1)) - 1, r.worst().fromCode());
                assertEquals(1 << (n - 1), r.worst().toCode());
                assertEquals(n, r.worst().toggleCount());
            }
        }
    }

    @Test
    void grayFieldSteppedOneCodeAtATimeNeverGlitches() {
        for (int n = 1; n <= 12; n++) {
            GlitchReport r = GlitchAnalysis.analyse(new CodeMap(FieldCoding.of(n, CodingScheme.GRAY, 0)), 1);
            assertEquals(0, r.worstExcursionLsb());
            assertTrue(r.advice().isEmpty());
            assertTrue(r.steps().stream().allMatch(s -> s.toggleCount() == 1));
        }
    }

    @Test
    void everySchemeMatchesTheReferenceEnumeration() {
        for (CodingScheme s : CodingScheme.values()) {
            for (SignedFormat f : SignedFormat.values()) {
                FieldCoding c = new FieldCoding(6, s, s == CodingScheme.SEGMENTED ? 3 : 0, f, false, false);
                CodeMap map = new CodeMap(c);
                for (GlitchStep st : GlitchAnalysis.analyse(map, 1).steps()) {
                    assertEquals(referenceExcursion(map, st.fromCode(), st.toCode()), st.excursionLsb(),
                            c + " " + st);
                    assertEquals(map.level(st.fromCode()) + 1, map.level(st.toCode()) + (map.signedSteps(
                            st.fromCode()) == map.signedSteps(st.toCode()) ? 1 : 0));
                }
            }
        }
    }

    @Test
    void signMagnitudeStepThroughZeroTogglesOnlyTheSign() {
        CodeMap map = new CodeMap(new FieldCoding(3, CodingScheme.BINARY, 0, SignedFormat.SIGN_MAGNITUDE, false,
                false));
        GlitchReport r = GlitchAnalysis.analyse(map, 1);
        // value order -3 -2 -1 -0 +0 +1 +2 +3: 7 steps; -0 (100) -> +0 (000) toggles bit 2 only
        assertEquals(7, r.steps().size());
        GlitchStep zero = r.steps().get(3);
        assertEquals(0b100, zero.fromCode());
        assertEquals(0b000, zero.toCode());
        assertEquals(0, zero.excursionLsb());
        // +1 (001) -> +2 (010): intermediate 011 = +3 lies 1 LSB above
        assertEquals(1, r.steps().get(5).excursionLsb());
        assertEquals(0b011, r.steps().get(5).worstCode());
    }

    @Test
    void adviceStatesGrayAndResamplingCosts() {
        CodeMap map = new CodeMap(FieldCoding.of(6, CodingScheme.THERMOMETER, 0));
        GlitchReport r = GlitchAnalysis.analyse(map, 1);
        assertEquals(31, r.worstExcursionLsb());
        GlitchAdvice gray = r.advice().get(0);
        assertEquals("gray-register", gray.remedy());
        assertEquals(5, gray.xorGates());
        assertEquals(20.0, gray.nand2Equivalent()); // 5 XOR2 x 4 NAND2 each
        GlitchAdvice resample = r.advice().get(1);
        assertEquals(63, resample.flops());
    }
}
