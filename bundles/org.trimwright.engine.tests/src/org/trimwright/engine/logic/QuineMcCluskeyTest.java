package org.trimwright.engine.logic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

class QuineMcCluskeyTest {

    /** Runs this class's jqwik properties (tycho-surefire does not discover them; see PropertyRunner). */
    @org.junit.jupiter.api.Test
    void jqwikPropertiesHold() {
        org.trimwright.engine.testing.PropertyRunner.assertAllHold(QuineMcCluskeyTest.class);
    }


    /**
     * Independent reference: the fewest products covering a 4-input function, by breadth-first search over the
     * covered-minterm sets reachable with implicants (every cube inside the ON-set, not only primes).
     */
    private static int bruteForceMinimumProducts(int truthTable) {
        List<Integer> implicants = new ArrayList<>();
        for (int mask = 0; mask < 16; mask++) {
            for (int value = 0; value < 16; value++) {
                if ((value & mask) != 0) {
                    continue;
                }
                int cover = 0;
                for (int m = 0; m < 16; m++) {
                    if ((m & ~mask) == value) {
                        cover |= 1 << m;
                    }
                }
                if ((cover & ~truthTable) == 0) {
                    implicants.add(cover);
                }
            }
        }
        int[] dist = new int[1 << 16];
        Arrays.fill(dist, -1);
        dist[0] = 0;
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(0);
        while (!queue.isEmpty()) {
            int s = queue.poll();
            if (s == truthTable) {
                return dist[s];
            }
            for (int imp : implicants) {
                int t = s | imp;
                if (dist[t] < 0) {
                    dist[t] = dist[s] + 1;
                    queue.add(t);
                }
            }
        }
        throw new AssertionError("unreachable");
    }

    private static BitSet onSet(int truthTable, int n) {
        BitSet on = new BitSet();
        for (int m = 0; m < (1 << n); m++) {
            if (((truthTable >> m) & 1) != 0) {
                on.set(m);
            }
        }
        return on;
    }

    @Property(tries = 200)
    void minimumSopOfFourInputsHasFewestProducts(@ForAll @IntRange(min = 0, max = 65535) int truthTable) {
        Sop sop = QuineMcCluskey.minimise(4, onSet(truthTable, 4));
        for (int m = 0; m < 16; m++) {
            assertEquals(((truthTable >> m) & 1) != 0, sop.eval(m), "minterm " + m);
        }
        assertTrue(sop.exact());
        assertEquals(bruteForceMinimumProducts(truthTable), sop.cubes().size());
    }

    @Test
    void thermometerOutputNeedsOneProductPerOneBitOfItsThreshold() {
        // x > 5 over 3 inputs (101): ON-set {6, 7} = code[2] & code[1]; one product, two literals
        Sop sop = QuineMcCluskey.minimise(3, onSet(0b11000000, 3));
        assertEquals(1, sop.cubes().size());
        assertEquals(2, sop.literals());
        assertEquals("code[2] & code[1]", sop.toString());
        // x > 2 over 3 inputs: ON-set {3..7} = code[2] | (code[1] & code[0])
        Sop sop2 = QuineMcCluskey.minimise(3, onSet(0b11111000, 3));
        assertEquals(2, sop2.cubes().size());
        assertEquals(3, sop2.literals());
    }

    @Test
    void parityNeedsAllMinterms() {
        // 4-input XOR: no two ON minterms are adjacent, so the minimum SOP has 8 products of 4 literals
        int parity = 0;
        for (int m = 0; m < 16; m++) {
            if (Integer.bitCount(m) % 2 == 1) {
                parity |= 1 << m;
            }
        }
        Sop sop = QuineMcCluskey.minimise(4, onSet(parity, 4));
        assertEquals(8, sop.cubes().size());
        assertEquals(32, sop.literals());
    }
}
