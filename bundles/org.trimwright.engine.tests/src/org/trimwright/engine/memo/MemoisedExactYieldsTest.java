package org.trimwright.engine.memo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.exact.ElementSigmas;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.exact.ExactYields;

class MemoisedExactYieldsTest {

    private static ElementSigmas sigmas(int bits, double unitSigma) {
        return ElementSigmas.forField(FieldCoding.of(bits, CodingScheme.SEGMENTED, 2), unitSigma, 0.001);
    }

    @Test
    void memoisedFiguresEqualAFreshRecursionForEqualButDistinctArrays() {
        MemoisedExactYields.clear();
        ExactMonotonicity first = MemoisedExactYields.monotonicity(sigmas(7, 0.02));
        ExactMonotonicity again = MemoisedExactYields.monotonicity(sigmas(7, 0.02));
        assertSame(first, again, "the second array (equal values, other object) is a hit");
        assertEquals(ExactYields.monotonicity(sigmas(7, 0.02)), again);
        ExactDnlYield d = MemoisedExactYields.dnlYieldNominal(sigmas(7, 0.02), 0.5);
        assertSame(d, MemoisedExactYields.dnlYieldNominal(sigmas(7, 0.02), 0.5));
        assertEquals(ExactYields.dnlYieldNominal(sigmas(7, 0.02), 0.5), d);
    }

    @Test
    void otherSigmasOrLimitsAreOtherKeys() {
        ExactMonotonicity a = MemoisedExactYields.monotonicity(sigmas(6, 0.02));
        ExactMonotonicity b = MemoisedExactYields.monotonicity(sigmas(6, 0.04));
        assertTrue(b.probabilityNonMonotonic() > a.probabilityNonMonotonic(), a + " " + b);
        ExactDnlYield tight = MemoisedExactYields.dnlYieldNominal(sigmas(6, 0.04), 0.25);
        ExactDnlYield loose = MemoisedExactYields.dnlYieldNominal(sigmas(6, 0.04), 0.5);
        assertNotEquals(tight.yield(), loose.yield());
        assertEquals(ExactYields.dnlYieldNominal(sigmas(6, 0.04), 0.25), tight);
    }

    @Test
    void boundedMemoNeverHoldsMoreThanItsCapacityAndStillAnswers() {
        BoundedMemo<Integer, Integer> memo = new BoundedMemo<>(8);
        AtomicInteger calls = new AtomicInteger();
        for (int i = 0; i < 100; i++) {
            int k = i;
            assertEquals(k * k, memo.get(k, x -> {
                calls.incrementAndGet();
                return x * x;
            }));
            assertTrue(memo.size() <= 8, "size " + memo.size());
        }
        int before = calls.get();
        assertEquals(99 * 99, memo.get(99, x -> {
            calls.incrementAndGet();
            return x * x;
        }));
        assertEquals(before, calls.get(), "the latest key is held");
    }
}
