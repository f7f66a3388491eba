package org.trimwright.engine.mismatch;

/**
 * The three INL definitions (published yield formulas differ exactly here):
 * <ul>
 * <li>{@link #ENDPOINT}: deviation from the line through the first and last level, in that line's LSB;</li>
 * <li>{@link #BEST_FIT}: deviation from the least-squares line over all levels, in its LSB (for sign-magnitude the
 * fit passes through the origin by symmetry);</li>
 * <li>{@link #ABSOLUTE}: deviation from the nominal transfer (nominal LSB, nominal zero).</li>
 * </ul>
 */
public enum InlDefinition {
    ENDPOINT("endpoint"),
    BEST_FIT("bestFit"),
    ABSOLUTE("absolute");

    private final String key;

    InlDefinition(String key) {
        this.key = key;
    }

    /** JSON key. */
    public String key() {
        return key;
    }
}
