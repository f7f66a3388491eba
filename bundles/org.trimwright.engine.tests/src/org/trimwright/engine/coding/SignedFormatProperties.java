package org.trimwright.engine.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

public class SignedFormatProperties {

    /**
     * Two's complement is offset binary with the MSB inverted (a standard identity of binary number codes,
     * value from memory; it follows from the definitions -2^(n-1)*b[n-1] + rest and code - 2^(n-1)).
     */
    @Property
    public void twosComplementIsOffsetBinaryWithMsbInverted(@ForAll @IntRange(min = 2, max = 16) int bits,
            @ForAll @IntRange(min = 0, max = 65535) int anyCode) {
        int code = anyCode & ((1 << bits) - 1);
        int half = 1 << (bits - 1);
        assertEquals(SignedFormat.OFFSET_BINARY.signedValue(code ^ half, bits),
                SignedFormat.TWOS_COMPLEMENT.signedValue(code, bits));
    }

    @Property
    public void signMagnitudeIsSymmetric(@ForAll @IntRange(min = 2, max = 16) int bits,
            @ForAll @IntRange(min = 0, max = 65535) int anyCode) {
        int code = anyCode & ((1 << bits) - 1);
        int half = 1 << (bits - 1);
        assertEquals(-SignedFormat.SIGN_MAGNITUDE.signedValue(code, bits),
                SignedFormat.SIGN_MAGNITUDE.signedValue(code ^ half, bits));
    }
}
