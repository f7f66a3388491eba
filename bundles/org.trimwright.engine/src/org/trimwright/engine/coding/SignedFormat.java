package org.trimwright.engine.coding;

/**
 * How a register code maps to a signed step count s around the centre; value = atZero + s * step.
 * <ul>
 * <li>{@link #UNSIGNED}: s = code.</li>
 * <li>{@link #OFFSET_BINARY}: s = code - 2^(n-1).</li>
 * <li>{@link #TWOS_COMPLEMENT}: s = code read as an n-bit two's complement integer.</li>
 * <li>{@link #SIGN_MAGNITUDE}: MSB is the sign, the n-1 lower bits the magnitude (two codes give zero).</li>
 * </ul>
 */
public enum SignedFormat {
    UNSIGNED("unsigned"),
    OFFSET_BINARY("offset-binary"),
    TWOS_COMPLEMENT("twos-complement"),
    SIGN_MAGNITUDE("sign-magnitude");

    private final String key;

    SignedFormat(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** The signed step count of {@code code} for an n-bit field. */
    public int signedValue(int code, int bits) {
        int half = 1 << (bits - 1);
        switch (this) {
            case UNSIGNED:
                return code;
            case OFFSET_BINARY:
                return code - half;
            case TWOS_COMPLEMENT:
                return code >= half ? code - (1 << bits) : code;
            case SIGN_MAGNITUDE:
                int magnitude = code & (half - 1);
                return (code & half) != 0 ? -magnitude : magnitude;
            default:
                throw new IllegalStateException(name());
        }
    }

    public static SignedFormat fromKey(String key) {
        for (SignedFormat f : values()) {
            if (f.key.equals(key)) {
                return f;
            }
        }
        throw new IllegalArgumentException("unknown signed format '" + key
                + "' (expected unsigned, offset-binary, twos-complement or sign-magnitude)");
    }
}
