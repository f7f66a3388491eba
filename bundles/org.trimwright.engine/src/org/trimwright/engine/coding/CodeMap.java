package org.trimwright.engine.coding;

import java.util.BitSet;

/**
 * The decoder semantics of one field: what every register code 0..2^n-1 means.
 * <p>Definitions (n = register bits, h = 2^(n-1)):
 * <ul>
 * <li><b>word</b>: the binary word the decoder works on: the code itself, or for Gray the inverse Gray code of
 * the register contents (the register holds gray(word)).</li>
 * <li><b>signed step count</b> s = {@link SignedFormat#signedValue}(word, n); nominal value = atZero + s*step.</li>
 * <li><b>level</b>: the position of the code in value order, s - min(s) (0 is the lowest value).</li>
 * <li><b>array level</b> L: the number the element array decodes: the word (unsigned, offset binary), the word
 * with its MSB inverted (two's complement: the decoder flips the MSB first, so L = s + h), or the n-1 magnitude
 * bits (sign-magnitude; the sign bit drives the extra {@code pol} output).</li>
 * <li><b>switches closed</b>: binary b_i when bit i of L is 1; thermometer t_k when L &gt; k; select s_k when
 * L = k (none at L = 0 with a zero state); segmented b_i for the low B bits of L and u_k when L &gt;&gt; B &gt; k;
 * {@code pol} when the sign bit is 1.</li>
 * <li><b>outputs</b> (electrical levels of the switch controls): switches closed, inverted for one-cold select
 * outputs and inverted again (all outputs) for active-low drive.</li>
 * <li><b>unit elements in use</b> = L (every scheme here decodes L onto 2^w - 1 unit elements; for a select
 * decoder L is the tap, with L unit elements below it).</li>
 * </ul>
 */
public final class CodeMap {

    private final FieldCoding coding;
    private final OutputLayout layout;
    private final int[] signed;
    private final int minSigned;

    /** Computes the map of {@code coding}. */
    public CodeMap(FieldCoding coding) {
        this.coding = coding;
        this.layout = OutputLayout.of(coding);
        int n = coding.codeCount();
        this.signed = new int[n];
        int min = Integer.MAX_VALUE;
        for (int c = 0; c < n; c++) {
            signed[c] = coding.signedFormat().signedValue(word(c), coding.bits());
            min = Math.min(min, signed[c]);
        }
        this.minSigned = min;
    }

    public FieldCoding coding() {
        return coding;
    }

    public OutputLayout layout() {
        return layout;
    }

    /** The binary word the decoder works on for register code {@code code}. */
    public int word(int code) {
        return coding.scheme() == CodingScheme.GRAY ? GrayCode.fromGray(code) : code;
    }

    /** Signed step count s of register code {@code code}. */
    public int signedSteps(int code) {
        return signed[code];
    }

    /** Position of {@code code} in value order (0 = lowest value). */
    public int level(int code) {
        return signed[code] - minSigned;
    }

    /** The array level L the element array decodes. */
    public int arrayLevel(int code) {
        int w = word(code);
        int half = 1 << (coding.bits() - 1);
        switch (coding.signedFormat()) {
            case TWOS_COMPLEMENT:
                return w ^ half;
            case SIGN_MAGNITUDE:
                return w & (half - 1);
            default:
                return w;
        }
    }

    /** True when the sign-magnitude polarity output is set (negative values). */
    public boolean negative(int code) {
        return coding.signedFormat() == SignedFormat.SIGN_MAGNITUDE && (word(code) >> (coding.bits() - 1)) != 0;
    }

    /** The selected tap of a select decoder, -1 for none (zero state at L = 0) or for other schemes. */
    public int tap(int code) {
        if (!coding.scheme().isSelect()) {
            return -1;
        }
        int l = arrayLevel(code);
        return coding.zeroState() && l == 0 ? -1 : l;
    }

    /** Unit elements in use (= L). */
    public int unitsInUse(int code) {
        return arrayLevel(code);
    }

    /** Unit elements of the array, 2^w - 1. */
    public int unitElements() {
        return (1 << layout.arrayBits()) - 1;
    }

    /** The set of closed switches for {@code code}, indexed like {@link OutputLayout#names()}. */
    public BitSet closedSwitches(int code) {
        BitSet s = new BitSet(layout.size());
        int l = arrayLevel(code);
        int b = layout.binaryCount();
        for (int i = 0; i < b; i++) {
            if (((l >> i) & 1) != 0) {
                s.set(i);
            }
        }
        int top = l >> b;
        for (int k = 0; k < layout.unaryCount() && k < top; k++) {
            s.set(b + k);
        }
        if (layout.selectCount() > 0) {
            int index = coding.zeroState() ? l - 1 : l;
            if (index >= 0) {
                s.set(index);
            }
        }
        if (negative(code)) {
            s.set(layout.size() - 1);
        }
        return s;
    }

    /** True when output {@code index} is electrically inverted relative to its switch-closed state. */
    public boolean inverted(int index) {
        boolean selectOutput = index < layout.selectCount();
        return coding.activeLow() ^ (selectOutput && coding.scheme() == CodingScheme.ONE_COLD);
    }

    /** Electrical output levels of the decoder for {@code code} (after one-cold and active-low inversion). */
    public BitSet outputs(int code) {
        BitSet s = closedSwitches(code);
        for (int i = 0; i < layout.size(); i++) {
            if (inverted(i)) {
                s.flip(i);
            }
        }
        return s;
    }

    /** Output {@code index} for {@code code}, without building the whole vector. */
    public boolean output(int code, int index) {
        int l = arrayLevel(code);
        int b = layout.binaryCount();
        boolean closed;
        if (index < layout.selectCount()) {
            closed = l == (coding.zeroState() ? index + 1 : index);
        } else if (index < b) {
            closed = ((l >> index) & 1) != 0;
        } else if (index < b + layout.unaryCount()) {
            closed = (l >> b) > index - b;
        } else {
            closed = negative(code);
        }
        return closed ^ inverted(index);
    }
}
