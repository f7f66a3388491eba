package org.trimwright.analysis.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.trimwright.model.Access;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;

class SafeLimitsRuleTest {

    private final TestSpecs s = new TestSpecs();

    private Field supply() {
        // 3-bit select 0.9 V + k x 50 mV: code 6 = 1.2 V (on the limit), code 7 = 1.25 V (beyond) by hand
        Field f = s.trim("VOUT", 3, CodingScheme.ONE_HOT);
        f.getTarget().setValueAtZero(0.9);
        f.getTarget().setStep(0.05);
        f.getTarget().setSafeMin(0.9);
        f.getTarget().setSafeMax(1.2);
        f.setResetCode(3);
        return f;
    }

    @Test
    void writableCodesBeyondTheSafeMaximumAreACautionNamingTheLimit() {
        supply();
        List<Finding> d = s.check("caution.codes-outside-safe-limits");
        assertEquals(1, d.size());
        assertEquals(Severity.WARNING, d.get(0).severity());
        assertTrue(d.get(0).message().contains("code 7 giving up to 1.25V"), d.get(0).message());
        assertTrue(d.get(0).message().contains("safe maximum of 1.2 V"));
        assertTrue(d.get(0).message().contains("foundry's rules"));
        assertEquals(List.of(), s.check("caution.reset-outside-safe-limits"));
    }

    @Test
    void resetCodeOutsideTheLimitsIsItsOwnCaution() {
        Field f = supply();
        f.setAccess(Access.READ_ONLY);
        f.setResetCode(7);
        assertEquals(1, s.check("caution.reset-outside-safe-limits").size());
        assertEquals(List.of(), s.check("caution.codes-outside-safe-limits"), "read-only: only the reset code");
    }

    @Test
    void codesInsideTheLimitsPass() {
        supply().getTarget().setSafeMax(1.25);
        assertEquals(List.of(), s.check("caution.codes-outside-safe-limits"));
    }
}
