package org.trimwright.engine.coding;

/**
 * How a field's code is decoded into switch controls.
 * <ul>
 * <li>{@link #BINARY}: binary-weighted elements, the register bits drive the switches (no decoder).</li>
 * <li>{@link #THERMOMETER}: unary/thermometer, output k is on when level &gt; k (2^n-1 outputs).</li>
 * <li>{@link #ONE_HOT}: select decoder, exactly one output high (taps of a string or a selector).</li>
 * <li>{@link #ONE_COLD}: select decoder, exactly one output low.</li>
 * <li>{@link #GRAY}: the register holds b XOR (b &gt;&gt; 1); a Gray-to-binary decoder drives a binary array.</li>
 * <li>{@link #SEGMENTED}: M unary (thermometer) MSBs over B = n - M binary LSBs.</li>
 * </ul>
 */
public enum CodingScheme {
    BINARY("binary"),
    THERMOMETER("thermometer"),
    ONE_HOT("one-hot"),
    ONE_COLD("one-cold"),
    GRAY("gray"),
    SEGMENTED("segmented");

    private final String key;

    CodingScheme(String key) {
        this.key = key;
    }

    /** The name used on the command line and in JSON (e.g. {@code one-hot}). */
    public String key() {
        return key;
    }

    /** True for one-hot and one-cold select decoders. */
    public boolean isSelect() {
        return this == ONE_HOT || this == ONE_COLD;
    }

    /** Parses a command-line / JSON key; throws IllegalArgumentException naming the allowed keys. */
    public static CodingScheme fromKey(String key) {
        for (CodingScheme s : values()) {
            if (s.key.equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown coding '" + key
                + "' (expected binary, thermometer, one-hot, one-cold, gray or segmented)");
    }
}
