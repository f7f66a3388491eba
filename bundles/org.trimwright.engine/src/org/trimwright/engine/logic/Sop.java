package org.trimwright.engine.logic;

import java.util.List;

/**
 * A sum of products over n inputs (an empty list is constant 0).
 *
 * @param inputs number of inputs
 * @param cubes  the products
 * @param exact  true when the cover was proven minimal (fewest products, then fewest literals, among sums of
 *               prime implicants); false when the exact-cover search hit its node limit and the best cover
 *               found so far is returned
 */
public record Sop(int inputs, List<Cube> cubes, boolean exact) {

    public Sop {
        cubes = List.copyOf(cubes);
    }

    /** Total literals over all products. */
    public int literals() {
        int l = 0;
        for (Cube c : cubes) {
            l += c.literals(inputs);
        }
        return l;
    }

    /** Value of the sum for minterm {@code m}. */
    public boolean eval(int m) {
        for (Cube c : cubes) {
            if (c.covers(m)) {
                return true;
            }
        }
        return false;
    }

    @Override
    public String toString() {
        if (cubes.isEmpty()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (Cube c : cubes) {
            sb.append(sb.length() > 0 ? " | " : "").append(cubes.size() > 1 && c.literals(inputs) > 1 ? "(" : "")
                    .append(c.toString(inputs)).append(cubes.size() > 1 && c.literals(inputs) > 1 ? ")" : "");
        }
        return sb.toString();
    }
}
