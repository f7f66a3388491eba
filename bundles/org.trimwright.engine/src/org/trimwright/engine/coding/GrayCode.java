package org.trimwright.engine.coding;

/**
 * The binary-reflected Gray code: {@code gray(b) = b XOR (b >> 1)}; its inverse is the prefix XOR of the bits
 * from the MSB down, {@code b_i = g_(n-1) XOR ... XOR g_i}.
 */
public final class GrayCode {

    private GrayCode() {
    }

    /** The Gray code word of the binary number {@code b} (b &gt;= 0). */
    public static int toGray(int b) {
        if (b < 0) {
            throw new IllegalArgumentException("Gray code of a negative number: " + b);
        }
        return b ^ (b >>> 1);
    }

    /** The binary number whose Gray code is {@code g} (g &gt;= 0). */
    public static int fromGray(int g) {
        if (g < 0) {
            throw new IllegalArgumentException("inverse Gray code of a negative number: " + g);
        }
        int b = g;
        for (int shift = 1; shift < Integer.SIZE; shift <<= 1) {
            b ^= b >>> shift;
        }
        return b;
    }
}
