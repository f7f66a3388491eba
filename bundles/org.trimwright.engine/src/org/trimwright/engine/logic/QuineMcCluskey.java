package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Exact two-level minimisation of a completely specified function of up to {@link #MAX_INPUTS} inputs.
 * <p>Method: Quine-McCluskey prime implicant generation (merge cubes that differ in one cared-for input, level by
 * level), then a minimum cover of the ON-set by primes: essential primes first, then branch and bound on the
 * uncovered minterm with the fewest covering primes; cost = (number of products, number of literals)
 * lexicographically. The search stops after {@link #NODE_LIMIT} nodes and then reports {@code exact = false}.
 */
public final class QuineMcCluskey {

    /** Widest function minimised. */
    public static final int MAX_INPUTS = 10;
    /** Branch-and-bound nodes before the search gives up proving minimality. */
    public static final int NODE_LIMIT = 200_000;

    private QuineMcCluskey() {
    }

    /** Minimises the function whose ON-set is {@code onSet} (minterms over {@code n} inputs). */
    public static Sop minimise(int n, BitSet onSet) {
        if (n < 1 || n > MAX_INPUTS) {
            throw new IllegalArgumentException("two-level minimisation takes 1.." + MAX_INPUTS + " inputs, got " + n);
        }
        List<Cube> primes = primes(n, onSet);
        int[] minterms = onSet.stream().toArray();
        return new CoverSearch(n, primes, minterms).solve();
    }

    /** All prime implicants of the ON-set. */
    public static List<Cube> primes(int n, BitSet onSet) {
        Set<Cube> current = new HashSet<>();
        onSet.stream().forEach(m -> current.add(new Cube(m, 0)));
        List<Cube> primes = new ArrayList<>();
        while (!current.isEmpty()) {
            Set<Cube> next = new HashSet<>();
            Set<Cube> merged = new HashSet<>();
            for (Cube c : current) {
                for (int i = 0; i < n; i++) {
                    int bit = 1 << i;
                    if ((c.mask() & bit) != 0 || (c.value() & bit) != 0) {
                        continue;
                    }
                    Cube partner = new Cube(c.value() | bit, c.mask());
                    if (current.contains(partner)) {
                        next.add(new Cube(c.value(), c.mask() | bit));
                        merged.add(c);
                        merged.add(partner);
                    }
                }
            }
            for (Cube c : current) {
                if (!merged.contains(c)) {
                    primes.add(c);
                }
            }
            current.clear();
            current.addAll(next);
        }
        primes.sort((a, b) -> a.mask() != b.mask() ? Integer.compare(b.mask(), a.mask())
                : Integer.compare(a.value(), b.value()));
        return primes;
    }

    /** Branch-and-bound minimum cover. */
    private static final class CoverSearch {
        private final int n;
        private final List<Cube> primes;
        private final int[] minterms;
        private final int[][] coveredBy;
        private long bestCost = Long.MAX_VALUE;
        private List<Integer> best;
        private int nodes;
        private boolean aborted;

        CoverSearch(int n, List<Cube> primes, int[] minterms) {
            this.n = n;
            this.primes = primes;
            this.minterms = minterms;
            this.coveredBy = new int[minterms.length][];
            for (int i = 0; i < minterms.length; i++) {
                List<Integer> list = new ArrayList<>();
                for (int p = 0; p < primes.size(); p++) {
                    if (primes.get(p).covers(minterms[i])) {
                        list.add(p);
                    }
                }
                coveredBy[i] = list.stream().mapToInt(Integer::intValue).toArray();
            }
        }

        private long cost(Cube c) {
            return 1000L + c.literals(n);
        }

        Sop solve() {
            int[] count = new int[minterms.length];
            search(new ArrayList<>(), count, 0);
            List<Cube> cubes = new ArrayList<>();
            for (int p : best) {
                cubes.add(primes.get(p));
            }
            return new Sop(n, cubes, !aborted);
        }

        private void search(List<Integer> chosen, int[] count, long cost) {
            if (cost >= bestCost) {
                return;
            }
            if (++nodes > NODE_LIMIT && best != null) {
                aborted = true;
                return;
            }
            int pick = -1;
            int fewest = Integer.MAX_VALUE;
            for (int i = 0; i < minterms.length; i++) {
                if (count[i] == 0 && coveredBy[i].length < fewest) {
                    fewest = coveredBy[i].length;
                    pick = i;
                }
            }
            if (pick < 0) {
                bestCost = cost;
                best = new ArrayList<>(chosen);
                return;
            }
            if (cost + 1000L > bestCost) {
                return;
            }
            for (int p : coveredBy[pick]) {
                Cube c = primes.get(p);
                chosen.add(p);
                for (int i = 0; i < minterms.length; i++) {
                    if (c.covers(minterms[i])) {
                        count[i]++;
                    }
                }
                search(chosen, count, cost + cost(c));
                for (int i = 0; i < minterms.length; i++) {
                    if (c.covers(minterms[i])) {
                        count[i]--;
                    }
                }
                chosen.remove(chosen.size() - 1);
                if (aborted) {
                    return;
                }
            }
        }
    }
}
