package org.trimwright.engine.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class StepTableTest {

    private static StepTable table(FieldCoding c, double atZero, double step) {
        return new StepTable(new CodeMap(c), atZero, step);
    }

    /**
     * Output counts against closed forms (derived from the definitions, w = array bits = n, or n-1 for
     * sign-magnitude): binary/Gray w; thermometer 2^w-1; one-hot/one-cold 2^w (2^w-1 with a zero state);
     * segmented 2^M-1 + (w-M); sign-magnitude adds one polarity output.
     */
    @ParameterizedTest
    @CsvSource({
        "binary, 0, unsigned, false, 5, 5",
        "gray, 0, unsigned, false, 7, 7",
        "thermometer, 0, unsigned, false, 4, 15",
        "one-hot, 0, unsigned, false, 3, 8",
        "one-hot, 0, unsigned, true, 3, 7",
        "one-cold, 0, unsigned, true, 6, 63",
        "segmented, 3, unsigned, false, 6, 10",
        "segmented, 2, unsigned, false, 8, 9",
        "thermometer, 0, sign-magnitude, false, 4, 8",
        "binary, 0, sign-magnitude, false, 4, 4",
        "thermometer, 0, twos-complement, false, 4, 15",
    })
    void outputCountMatchesClosedForm(String scheme, int m, String signed, boolean zero, int bits, int outputs) {
        FieldCoding c = new FieldCoding(bits, CodingScheme.fromKey(scheme), m, SignedFormat.fromKey(signed), zero,
                false);
        assertEquals(outputs, OutputLayout.of(c).size());
    }

    @Test
    void segmentedSixBitRowShowsBinaryLsbsAndUnaryMsbs() {
        StepTable t = table(FieldCoding.of(6, CodingScheme.SEGMENTED, 3), 0, 1e-6);
        StepRow r = t.row(37); // 100 101: top 3 bits = 4 -> u0..u3 on; low bits 101 -> b0, b2
        assertEquals(37e-6, r.value(), 1e-18);
        assertEquals("100101", r.registerBits());
        assertEquals("0001111101", r.outputBits(10));
        assertEquals(List.of("b0", "b2", "u0", "u1", "u2", "u3"), r.closedSwitches());
        assertEquals(37, r.unitsInUse());
        assertEquals(63, t.map().unitElements());
    }

    @Test
    void twosComplementFieldIsCentredAndInvertsTheMsbForTheArray() {
        StepTable t = table(new FieldCoding(4, CodingScheme.BINARY, 0, SignedFormat.TWOS_COMPLEMENT, false, false),
                1.2, 0.004);
        assertEquals(1.168, t.row(8).value(), 1e-12);
        assertEquals(0, t.row(8).level());
        assertEquals("0000", t.row(8).outputBits(4));
        assertEquals(1.228, t.row(7).value(), 1e-12);
        assertEquals("1111", t.row(7).outputBits(4));
        assertEquals(1.2, t.row(0).value(), 1e-12);
        assertEquals("1000", t.row(0).outputBits(4));
    }

    @Test
    void offsetBinaryFieldStartsAtMinusHalfScale() {
        StepTable t = table(new FieldCoding(4, CodingScheme.THERMOMETER, 0, SignedFormat.OFFSET_BINARY, false,
                false), 0, 1);
        assertEquals(-8, t.row(0).value());
        assertEquals(7, t.row(15).value());
        assertEquals("000000000000111", t.row(3).outputBits(15));
    }

    @Test
    void signMagnitudeFieldDrivesMagnitudeAndPolarity() {
        StepTable t = table(new FieldCoding(4, CodingScheme.THERMOMETER, 0, SignedFormat.SIGN_MAGNITUDE, false,
                false), 0, 1);
        StepRow r = t.row(0b1011);
        assertEquals(-3, r.signedSteps());
        assertEquals("10000111", r.outputBits(8));
        assertEquals(List.of("t0", "t1", "t2", "pol"), r.closedSwitches());
        assertEquals(0, t.row(0b1000).value());
        assertEquals(0, t.row(0).value());
        assertEquals(7, t.map().unitElements());
    }

    @Test
    void oneHotZeroStateDrivesNothingAtCodeZero() {
        StepTable t = table(new FieldCoding(3, CodingScheme.ONE_HOT, 0, SignedFormat.UNSIGNED, true, false), 0, 1);
        assertEquals("0000000", t.row(0).outputBits(7));
        assertEquals(-1, t.row(0).tap());
        assertEquals("0010000", t.row(5).outputBits(7));
        assertEquals(5, t.row(5).tap());
    }

    @Test
    void oneColdHoldsExactlyTheSelectedOutputLow() {
        StepTable t = table(FieldCoding.of(3, CodingScheme.ONE_COLD, 0), 0, 1);
        assertEquals("11111011", t.row(2).outputBits(8));
        assertEquals(List.of("s2"), t.row(2).closedSwitches());
    }

    @Test
    void activeLowInvertsEveryControl() {
        StepTable t = table(new FieldCoding(3, CodingScheme.THERMOMETER, 0, SignedFormat.UNSIGNED, false, true), 0,
                1);
        assertEquals("1111100", t.row(2).outputBits(7));
        assertEquals(List.of("t0", "t1"), t.row(2).closedSwitches());
    }

    @Test
    void grayFieldDecodesToBinaryOutputs() {
        StepTable t = table(FieldCoding.of(3, CodingScheme.GRAY, 0), 0, 1);
        assertEquals("100", t.row(0b110).outputBits(3)); // gray(4) = 110
        assertEquals(4, t.row(0b110).value());
    }
}
