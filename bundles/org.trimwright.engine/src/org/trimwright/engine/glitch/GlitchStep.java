package org.trimwright.engine.glitch;

/**
 * Glitch exposure of one adjacent step in value order (level k to k+1).
 * <p>Definition: the register bits that toggle are T = from XOR to. With any skew between them the decoder may
 * see every intermediate code from XOR S, S a subset of T. The excursion is how far the decoded value of the
 * worst intermediate code lies outside [min(v_from, v_to), max(v_from, v_to)], in steps (LSB); 0 when every
 * intermediate value stays inside.
 *
 * @param fromCode      register code before the step
 * @param toCode        register code after the step
 * @param toggledBits   mask of the register bits that toggle
 * @param worstCode     the intermediate code with the largest excursion (= fromCode when none leaves the range)
 * @param excursionLsb  the excursion in LSB (&gt;= 0)
 * @param excursionUnit the excursion in the target unit (excursionLsb * |step|)
 */
public record GlitchStep(int fromCode, int toCode, int toggledBits, int worstCode, int excursionLsb,
        double excursionUnit) {

    /** Number of register bits that toggle. */
    public int toggleCount() {
        return Integer.bitCount(toggledBits);
    }
}
