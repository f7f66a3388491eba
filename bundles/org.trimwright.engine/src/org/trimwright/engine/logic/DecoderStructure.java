package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.OutputLayout;
import org.trimwright.engine.coding.SignedFormat;

/**
 * The multi-level structure of a field's decoder as an {@link Expr} DAG, one expression per output (port order of
 * {@link OutputLayout}). Structures:
 * <ul>
 * <li><b>word bits</b>: the register bits, or for Gray the XOR chain w_(n-1) = g_(n-1), w_i = w_(i+1) XOR g_i
 * (n-1 XOR2).</li>
 * <li><b>array bits</b>: two's complement inverts the word MSB (a NOT, absorbed by the input's inverted rail);
 * sign-magnitude takes the n-1 low word bits and the word MSB is the {@code pol} output.</li>
 * <li><b>binary</b>: outputs are the array bits (no decoder gates).</li>
 * <li><b>thermometer</b>, recursive: with a the top bit and t' the thermometer of the w-1 lower bits,
 * t_k = a OR t'_k for k &lt; 2^(w-1)-1, t_(2^(w-1)-1) = a, t_k = a AND t'_(k-2^(w-1)) above; 2^w - 2 two-input
 * gates per level, 2^(w+1) - 2w - 2 in all.</li>
 * <li><b>one-hot / one-cold</b>, shared predecoding: the w bits are split into 2 (or, with 3-input gates, 3)
 * groups, each group decoded recursively into one-hot lines, and every output is the AND of one line per group.
 * The split minimises transistors by dynamic programming over
 * T(w) = min(4*2^w + T(a) + T(w-a), 6*2^w + T(a) + T(b) + T(w-a-b)), T(1) = 0 (a 1-bit group is a literal).</li>
 * <li><b>segmented</b>: thermometer of the top M array bits plus B = w - M binary pass-through outputs.</li>
 * </ul>
 * One-cold and active-low outputs are complemented expressions; the mapper absorbs the inversion.
 */
public final class DecoderStructure {

    private final ExprFactory f;
    private final int maxFanIn;

    /**
     * @param factory  expression factory
     * @param maxFanIn 2 or 3: whether the select predecoding may use three-way splits
     */
    public DecoderStructure(ExprFactory factory, int maxFanIn) {
        this.f = factory;
        this.maxFanIn = maxFanIn;
    }

    /** Output expressions of the decoder described by {@code map}, in port order. */
    public List<Expr> outputs(CodeMap map) {
        int n = map.coding().bits();
        OutputLayout layout = map.layout();
        List<Expr> word = wordBits(n, map.coding().scheme() == CodingScheme.GRAY);
        List<Expr> array = new ArrayList<>(word);
        SignedFormat format = map.coding().signedFormat();
        if (format == SignedFormat.TWOS_COMPLEMENT) {
            array.set(n - 1, f.not(word.get(n - 1)));
        } else if (format == SignedFormat.SIGN_MAGNITUDE) {
            array.remove(n - 1);
        }
        List<Expr> closed = new ArrayList<>();
        int b = layout.binaryCount();
        closed.addAll(array.subList(0, b));
        if (layout.unaryCount() > 0) {
            closed.addAll(thermometer(array.subList(b, array.size())));
        }
        if (layout.selectCount() > 0) {
            List<Expr> lines = oneHot(array);
            closed.addAll(map.coding().zeroState() ? lines.subList(1, lines.size()) : lines);
        }
        if (layout.hasPolarity()) {
            closed.add(word.get(n - 1));
        }
        List<Expr> out = new ArrayList<>();
        for (int i = 0; i < closed.size(); i++) {
            out.add(map.inverted(i) ? f.not(closed.get(i)) : closed.get(i));
        }
        return out;
    }

    private List<Expr> wordBits(int n, boolean gray) {
        Expr[] w = new Expr[n];
        w[n - 1] = f.var(n - 1);
        for (int i = n - 2; i >= 0; i--) {
            w[i] = gray ? f.xor(w[i + 1], f.var(i)) : f.var(i);
        }
        return List.of(w);
    }

    /** Thermometer outputs t_0 .. t_(2^m-2) of bits (LSB first): t_k = (bits as a number) &gt; k. */
    public List<Expr> thermometer(List<Expr> bits) {
        int m = bits.size();
        if (m == 1) {
            return List.of(bits.get(0));
        }
        Expr a = bits.get(m - 1);
        List<Expr> sub = thermometer(bits.subList(0, m - 1));
        int half = 1 << (m - 1);
        List<Expr> out = new ArrayList<>();
        for (int k = 0; k < half - 1; k++) {
            out.add(f.or(a, sub.get(k)));
        }
        out.add(a);
        for (int k = 0; k < half - 1; k++) {
            out.add(f.and(a, sub.get(k)));
        }
        return out;
    }

    /** One-hot lines s_0 .. s_(2^m-1) of bits (LSB first): s_j = (bits as a number) == j. */
    public List<Expr> oneHot(List<Expr> bits) {
        int m = bits.size();
        if (m == 1) {
            return List.of(f.not(bits.get(0)), bits.get(0));
        }
        int[] parts = PredecodeSplit.best(m, maxFanIn).parts();
        List<List<Expr>> lines = new ArrayList<>();
        int start = 0;
        for (int p : parts) {
            lines.add(oneHot(bits.subList(start, start + p)));
            start += p;
        }
        List<Expr> out = new ArrayList<>();
        for (int j = 0; j < (1 << m); j++) {
            List<Expr> terms = new ArrayList<>();
            int shift = 0;
            for (int p = 0; p < parts.length; p++) {
                terms.add(lines.get(p).get((j >> shift) & ((1 << parts[p]) - 1)));
                shift += parts[p];
            }
            out.add(f.and(terms));
        }
        return out;
    }
}
