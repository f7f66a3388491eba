package org.trimwright.engine.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.testing.PropertyRunner;

class SignedFormatTest {

    @Test
    void twosComplementReadsTheMsbAsNegativeWeight() {
        // Two's complement definition: value = -b[n-1]*2^(n-1) + sum b[i]*2^i (IEEE Std 1800 / common usage)
        assertEquals(-128, SignedFormat.TWOS_COMPLEMENT.signedValue(0x80, 8));
        assertEquals(-1, SignedFormat.TWOS_COMPLEMENT.signedValue(0xFF, 8));
        assertEquals(127, SignedFormat.TWOS_COMPLEMENT.signedValue(0x7F, 8));
    }

    @Test
    void signMagnitudeHasTwoZeros() {
        assertEquals(0, SignedFormat.SIGN_MAGNITUDE.signedValue(0b1000, 4));
        assertEquals(0, SignedFormat.SIGN_MAGNITUDE.signedValue(0b0000, 4));
        assertEquals(-7, SignedFormat.SIGN_MAGNITUDE.signedValue(0b1111, 4));
    }

    @Test
    void offsetBinaryPutsZeroAtHalfScale() {
        assertEquals(0, SignedFormat.OFFSET_BINARY.signedValue(8, 4));
        assertEquals(-8, SignedFormat.OFFSET_BINARY.signedValue(0, 4));
    }

    @Test
    void signedFormatPropertiesHold() {
        PropertyRunner.assertAllHold(SignedFormatProperties.class);
    }
}
