package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

import org.trimwright.engine.coding.CodeMap;

/**
 * The per-output Boolean functions of a decoder: for every output its truth table over the n register inputs
 * (ON-set = the codes for which the output is electrically 1), and on request its exact minimum sum of products.
 */
public final class OutputFunctions {

    /** Widest field whose outputs are minimised two-level by {@link #minimised()}. */
    public static final int TWO_LEVEL_LIMIT = 8;

    private final CodeMap map;

    public OutputFunctions(CodeMap map) {
        this.map = map;
    }

    /** Truth table (ON-set) of output {@code index}: bit c set when the output is 1 for register code c. */
    public BitSet truthTable(int index) {
        BitSet on = new BitSet(map.coding().codeCount());
        for (int c = 0; c < map.coding().codeCount(); c++) {
            if (map.output(c, index)) {
                on.set(c);
            }
        }
        return on;
    }

    /** True when {@link #minimised()} is available for this width. */
    public boolean minimisable() {
        return map.coding().bits() <= TWO_LEVEL_LIMIT;
    }

    /**
     * Exact minimum sum of products of every output (Quine-McCluskey, see {@link QuineMcCluskey}).
     *
     * @throws IllegalStateException when the field is wider than {@link #TWO_LEVEL_LIMIT}
     */
    public List<Sop> minimised() {
        if (!minimisable()) {
            throw new IllegalStateException("two-level minimisation is done up to " + TWO_LEVEL_LIMIT + " bits");
        }
        List<Sop> out = new ArrayList<>();
        for (int i = 0; i < map.layout().size(); i++) {
            out.add(QuineMcCluskey.minimise(map.coding().bits(), truthTable(i)));
        }
        return out;
    }

    /** The sums of products as an expression DAG (shared products are shared nodes), for mapping to gates. */
    public static List<Expr> asExpressions(ExprFactory f, List<Sop> sops) {
        List<Expr> out = new ArrayList<>();
        for (Sop s : sops) {
            List<Expr> products = new ArrayList<>();
            for (Cube c : s.cubes()) {
                List<Expr> lits = new ArrayList<>();
                for (int i = s.inputs() - 1; i >= 0; i--) {
                    if (((c.mask() >> i) & 1) == 0) {
                        lits.add(((c.value() >> i) & 1) != 0 ? f.var(i) : f.not(f.var(i)));
                    }
                }
                if (lits.isEmpty()) {
                    throw new IllegalArgumentException("constant-1 output cannot be mapped to gates");
                }
                products.add(f.and(lits));
            }
            if (products.isEmpty()) {
                throw new IllegalArgumentException("constant-0 output cannot be mapped to gates");
            }
            out.add(f.or(products));
        }
        return out;
    }
}
