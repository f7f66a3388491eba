package org.trimwright.engine.coding;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The decoder outputs of a field, in port order (index 0 is {@code ctrl[0]} in the emitted Verilog).
 * <ul>
 * <li>binary / Gray: {@code b0 .. b(w-1)}, one per binary-weighted element (b_i weight 2^i);</li>
 * <li>thermometer: {@code t0 .. t(2^w-2)}, output k on when the array level &gt; k;</li>
 * <li>one-hot / one-cold: {@code s0 .. s(2^w-1)} (tap k selected when level = k); with a zero state
 * {@code s1 .. s(2^w-1)} and level 0 selects nothing;</li>
 * <li>segmented: binary LSB outputs {@code b0 .. b(B-1)} first, then unary MSB outputs
 * {@code u0 .. u(2^M-2)} (u_k on when the top M bits of the level, read as a number, exceed k);</li>
 * <li>sign-magnitude (any scheme): the scheme decodes the w = n-1 magnitude bits and one extra last output
 * {@code pol} carries the sign bit (it drives the polarity switch: 1 = negative).</li>
 * </ul>
 * w is the array width: n, or n-1 for sign-magnitude.
 *
 * @param names       output names in port order
 * @param arrayBits   w, the bits of level the array decodes
 * @param binaryCount B, the number of leading binary outputs (w for binary and Gray)
 * @param unaryCount  the number of thermometer outputs (2^w-1 thermometer, 2^M-1 segmented)
 * @param selectCount the number of select outputs (one-hot and one-cold)
 * @param hasPolarity true when the last output is the sign-magnitude polarity output
 */
public record OutputLayout(List<String> names, int arrayBits, int binaryCount, int unaryCount, int selectCount,
        boolean hasPolarity) {

    public OutputLayout {
        names = List.copyOf(names);
    }

    /** The layout of {@code coding}'s decoder outputs. */
    public static OutputLayout of(FieldCoding coding) {
        boolean pol = coding.signedFormat() == SignedFormat.SIGN_MAGNITUDE;
        int w = pol ? coding.bits() - 1 : coding.bits();
        List<String> names = new ArrayList<>();
        int binary = 0;
        int unary = 0;
        int select = 0;
        switch (coding.scheme()) {
            case BINARY:
            case GRAY:
                binary = w;
                break;
            case THERMOMETER:
                unary = (1 << w) - 1;
                break;
            case ONE_HOT:
            case ONE_COLD:
                select = coding.zeroState() ? (1 << w) - 1 : 1 << w;
                break;
            case SEGMENTED:
                int m = Math.min(coding.unaryBits(), w);
                binary = w - m;
                unary = (1 << m) - 1;
                break;
            default:
                throw new IllegalStateException(coding.scheme().name());
        }
        for (int i = 0; i < binary; i++) {
            names.add("b" + i);
        }
        for (int k = 0; k < unary; k++) {
            names.add((coding.scheme() == CodingScheme.THERMOMETER ? "t" : "u") + k);
        }
        int first = coding.zeroState() ? 1 : 0;
        for (int k = 0; k < select; k++) {
            names.add("s" + (k + first));
        }
        if (pol) {
            names.add("pol");
        }
        return new OutputLayout(Collections.unmodifiableList(names), w, binary, unary, select, pol);
    }

    /** Number of decoder outputs (= switch controls). */
    public int size() {
        return names.size();
    }
}
