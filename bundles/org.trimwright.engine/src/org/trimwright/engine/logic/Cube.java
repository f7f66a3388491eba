package org.trimwright.engine.logic;

/**
 * A product term over n inputs: inputs whose bit is set in {@code mask} are absent (don't care); the others must
 * equal the corresponding bit of {@code value}.
 *
 * @param value required input values (bits outside the mask)
 * @param mask  don't-care inputs
 */
public record Cube(int value, int mask) {

    public Cube {
        value &= ~mask;
    }

    /** True when minterm {@code m} lies in the cube. */
    public boolean covers(int m) {
        return (m & ~mask) == value;
    }

    /** Number of literals of the product over {@code n} inputs. */
    public int literals(int n) {
        return n - Integer.bitCount(mask & ((1 << n) - 1));
    }

    /** The product as text, e.g. {@code code[2] & ~code[0]} ({@code 1} for the empty product). */
    public String toString(int n) {
        StringBuilder sb = new StringBuilder();
        for (int i = n - 1; i >= 0; i--) {
            if (((mask >> i) & 1) == 0) {
                sb.append(sb.length() > 0 ? " & " : "").append(((value >> i) & 1) == 0 ? "~" : "")
                        .append("code[").append(i).append(']');
            }
        }
        return sb.length() == 0 ? "1" : sb.toString();
    }
}
