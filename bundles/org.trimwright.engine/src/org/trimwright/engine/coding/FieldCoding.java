package org.trimwright.engine.coding;

/**
 * The digital side of one trim field: width, coding scheme and drive. Immutable and validated.
 *
 * @param bits         register width of the field, 1..16
 * @param scheme       the decoder scheme
 * @param unaryBits    M, the unary MSB count of a segmented field (0 for other schemes), 1..bits
 * @param signedFormat how the code maps to a signed step count
 * @param zeroState    select decoders only: code 0 drives nothing (2^n - 1 outputs)
 * @param activeLow    switch controls are inverted (PMOS-side switches)
 */
public record FieldCoding(int bits, CodingScheme scheme, int unaryBits, SignedFormat signedFormat,
        boolean zeroState, boolean activeLow) {

    public static final int MAX_BITS = 16;

    public FieldCoding {
        if (bits < 1 || bits > MAX_BITS) {
            throw new IllegalArgumentException("bits must be 1.." + MAX_BITS + ", got " + bits);
        }
        if (scheme == null || signedFormat == null) {
            throw new IllegalArgumentException("scheme and signed format are required");
        }
        if (scheme == CodingScheme.SEGMENTED) {
            if (unaryBits < 1 || unaryBits > bits) {
                throw new IllegalArgumentException("unary bits of a segmented field must be 1.." + bits
                        + ", got " + unaryBits);
            }
        } else if (unaryBits != 0) {
            throw new IllegalArgumentException("unary bits apply to segmented fields only, got " + unaryBits
                    + " for " + scheme.key());
        }
        if (zeroState && !scheme.isSelect()) {
            throw new IllegalArgumentException("zero state applies to one-hot and one-cold fields only");
        }
        if (signedFormat != SignedFormat.UNSIGNED && bits < 2) {
            throw new IllegalArgumentException("a signed field needs at least 2 bits");
        }
    }

    /** Convenience for an unsigned, active-high field without a zero state. */
    public static FieldCoding of(int bits, CodingScheme scheme, int unaryBits) {
        return new FieldCoding(bits, scheme, unaryBits, SignedFormat.UNSIGNED, false, false);
    }

    /** Number of register codes, 2^bits. */
    public int codeCount() {
        return 1 << bits;
    }

    /** B, the binary LSB count of a segmented field; bits for binary and Gray; 0 otherwise. */
    public int binaryBits() {
        switch (scheme) {
            case SEGMENTED:
                return bits - unaryBits;
            case BINARY:
            case GRAY:
                return bits;
            default:
                return 0;
        }
    }
}
