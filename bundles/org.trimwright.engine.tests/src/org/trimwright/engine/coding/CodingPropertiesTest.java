package org.trimwright.engine.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

class CodingPropertiesTest {

    /** Runs this class's jqwik properties (tycho-surefire does not discover them; see PropertyRunner). */
    @org.junit.jupiter.api.Test
    void jqwikPropertiesHold() {
        org.trimwright.engine.testing.PropertyRunner.assertAllHold(CodingPropertiesTest.class);
    }


    /** Code of the given level (the inverse of CodeMap.level). */
    private static int codeAtLevel(CodeMap map, int level) {
        for (int c = 0; c < map.coding().codeCount(); c++) {
            if (map.level(c) == level) {
                return c;
            }
        }
        throw new AssertionError("no code at level " + level);
    }

    @Property
    void unaryFieldIsMonotonicForEveryCode(@ForAll @IntRange(min = 1, max = 9) int bits,
            @ForAll @IntRange(min = 0, max = 511) int level, @ForAll boolean offset) {
        FieldCoding c = new FieldCoding(Math.max(bits, offset ? 2 : 1), CodingScheme.THERMOMETER, 0,
                offset ? SignedFormat.OFFSET_BINARY : SignedFormat.UNSIGNED, false, false);
        CodeMap map = new CodeMap(c);
        int k = level % (c.codeCount() - 1);
        int lo = codeAtLevel(map, k);
        int hi = codeAtLevel(map, k + 1);
        BitSet a = map.closedSwitches(lo);
        BitSet b = map.closedSwitches(hi);
        BitSet added = (BitSet) b.clone();
        added.andNot(a);
        a.andNot(map.closedSwitches(hi));
        assertTrue(a.isEmpty(), "a unary step must not open a switch");
        assertEquals(1, added.cardinality(), "a unary step closes exactly one more switch");
        assertEquals(map.unitsInUse(lo) + 1, map.unitsInUse(hi));
        assertEquals(map.signedSteps(lo) + 1, map.signedSteps(hi));
    }

    @Property
    void selectTapFieldIsMonotonicForEveryCode(@ForAll @IntRange(min = 1, max = 9) int bits,
            @ForAll @IntRange(min = 0, max = 511) int level, @ForAll boolean cold, @ForAll boolean zero) {
        FieldCoding c = new FieldCoding(bits, cold ? CodingScheme.ONE_COLD : CodingScheme.ONE_HOT, 0,
                SignedFormat.UNSIGNED, zero, false);
        CodeMap map = new CodeMap(c);
        int k = level % (c.codeCount() - 1);
        int lo = codeAtLevel(map, k);
        int hi = codeAtLevel(map, k + 1);
        assertEquals(k + 1, map.tap(hi));
        assertTrue(map.unitsInUse(hi) > map.unitsInUse(lo));
        assertTrue(map.signedSteps(hi) > map.signedSteps(lo));
    }

    @Property
    void grayNeighboursDifferInOneBitIncludingWrapAround(@ForAll @IntRange(min = 1, max = 16) int bits,
            @ForAll @IntRange(min = 0, max = 65535) int k) {
        int n = 1 << bits;
        int a = k % n;
        int b = (a + 1) % n;
        assertEquals(1, Integer.bitCount(GrayCode.toGray(a) ^ GrayCode.toGray(b)));
        assertEquals(a, GrayCode.fromGray(GrayCode.toGray(a)));
    }

    @Property
    void oneHotHasExactlyOneActiveOutput(@ForAll @IntRange(min = 1, max = 10) int bits,
            @ForAll @IntRange(min = 0, max = 1023) int code, @ForAll boolean cold, @ForAll boolean activeLow) {
        FieldCoding c = new FieldCoding(bits, cold ? CodingScheme.ONE_COLD : CodingScheme.ONE_HOT, 0,
                SignedFormat.UNSIGNED, false, activeLow);
        CodeMap map = new CodeMap(c);
        int cc = code % c.codeCount();
        BitSet out = map.outputs(cc);
        int k = map.layout().size();
        // one-hot: exactly one output high; one-cold: exactly one low; active-low swaps the two
        boolean oneHigh = cold == activeLow;
        assertEquals(1, oneHigh ? out.cardinality() : k - out.cardinality());
        assertEquals(1, map.closedSwitches(cc).cardinality());
    }

    @Property
    void segmentedFieldUsesAsManyUnitsAsItsLevel(@ForAll @IntRange(min = 1, max = 10) int bits,
            @ForAll @IntRange(min = 1, max = 10) int unary, @ForAll @IntRange(min = 0, max = 1023) int code) {
        FieldCoding c = FieldCoding.of(bits, CodingScheme.SEGMENTED, Math.min(unary, bits));
        CodeMap map = new CodeMap(c);
        int cc = code % c.codeCount();
        BitSet closed = map.closedSwitches(cc);
        int b = map.layout().binaryCount();
        int units = 0;
        for (int i = closed.nextSetBit(0); i >= 0; i = closed.nextSetBit(i + 1)) {
            units += i < b ? 1 << i : 1 << b; // binary element i has 2^i units, a unary element 2^B
        }
        assertEquals(cc, units);
    }
}
