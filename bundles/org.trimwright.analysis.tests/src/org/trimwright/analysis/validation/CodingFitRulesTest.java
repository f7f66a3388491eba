package org.trimwright.analysis.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.trimwright.model.Access;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.ProductionSearch;
import org.trimwright.model.Stepping;

class CodingFitRulesTest {

    private final TestSpecs s = new TestSpecs();

    @Test
    void writableTrimSelectWithZeroStateHasAReachableIllegalCode() {
        Field f = s.trim("SEL", 2, CodingScheme.ONE_HOT);
        f.getCoding().setZeroState(true);
        f.setResetCode(1);
        List<Finding> d = s.check("coding.illegal-select-code-reachable");
        assertEquals(1, d.size());
        assertTrue(d.get(0).message().contains("code [0] selects no tap"), d.get(0).message());
    }

    @Test
    void selectWithoutZeroStateOrAsAModeSelectPasses() {
        Field f = s.trim("SEL", 2, CodingScheme.ONE_COLD);
        assertEquals(List.of(), s.check("coding.illegal-select-code-reachable"));
        f.getCoding().setZeroState(true);
        f.setRole(FieldRole.MODE_SELECT);
        assertEquals(List.of(), s.check("coding.illegal-select-code-reachable"), "a designed off state");
    }

    @Test
    void readOnlySelectReachesOnlyItsResetCode() {
        Field f = s.trim("SEL", 2, CodingScheme.ONE_HOT);
        f.getCoding().setZeroState(true);
        f.setRole(FieldRole.MODE_SELECT);
        f.getTarget().setSafeMax(0.003);
        f.setAccess(Access.READ_ONLY);
        f.setResetCode(2);
        assertEquals(List.of(), s.check("coding.illegal-select-code-reachable"));
        f.setResetCode(0);
        assertEquals(1, s.check("coding.illegal-select-code-reachable").size());
    }

    @Test
    void binaryFieldSteppedOneCodeAtATimeGlitchesBeyondItsLimit() {
        // 4-bit binary, 7 -> 8 toggles all bits; the intermediate code 15 lies 7 LSB above 8 (hand calculation)
        Field f = TestSpecs.mismatch(s.trim("V", 4, CodingScheme.BINARY), 0.1);
        f.setStepping(Stepping.ONE_CODE_AT_ATIME);
        f.getLimits().setMaxGlitchLsb(1);
        List<Finding> d = s.check("coding.glitch-exceeds-limit");
        assertEquals(1, d.size());
        assertEquals(7.0, d.get(0).figures().get("worstGlitchLsb"));
        assertTrue(d.get(0).advice().contains("Gray register: 3 XOR2"), d.get(0).advice());
        assertTrue(d.get(0).advice().contains("flip-flops"), d.get(0).advice());
    }

    @Test
    void grayFieldSteppedOneCodeAtATimePasses() {
        Field f = TestSpecs.mismatch(s.trim("V", 4, CodingScheme.GRAY), 0.1);
        f.setStepping(Stepping.ONE_CODE_AT_ATIME);
        f.getLimits().setMaxGlitchLsb(0);
        assertEquals(List.of(), s.check("coding.glitch-exceeds-limit"));
    }

    @Test
    void binarySearchOnARiskyBinaryTrimIsAWarningAndLinearSearchPasses() {
        Field f = TestSpecs.mismatch(s.trim("V", 8, CodingScheme.BINARY), 3.0);
        List<Finding> d = s.check("search.binary-not-monotonic");
        assertEquals(1, d.size());
        assertEquals(Severity.WARNING, d.get(0).severity());
        assertEquals(255.0, d.get(0).figures().get("linearMeasurements"), "2^8 - 1 measurements");
        f.setProductionSearch(ProductionSearch.LINEAR_SEARCH);
        assertEquals(List.of(), s.check("search.binary-not-monotonic"));
    }
}
