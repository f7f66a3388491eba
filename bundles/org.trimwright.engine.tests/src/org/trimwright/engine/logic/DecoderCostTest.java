package org.trimwright.engine.logic;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;

class DecoderCostTest {

    private static final GateLibrary BARE = new GateLibrary(2, false);

    private static DecoderCost cost(FieldCoding c, GateLibrary lib) {
        return DecoderSynthesis.cost(new CodeMap(c), lib);
    }

    private static int twoInputGates(DecoderCost c) {
        return c.gates().get(GateType.NAND2) + c.gates().get(GateType.NOR2);
    }

    /** Recursive thermometer: 2^w - 2 two-input gates per level, sum over levels 2..w = 2^(w+1) - 2w - 2. */
    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10})
    void thermometerDecoderHasClosedFormGateCount(int w) {
        DecoderCost c = cost(FieldCoding.of(w, CodingScheme.THERMOMETER, 0), BARE);
        assertEquals((1 << (w + 1)) - 2 * w - 2, twoInputGates(c));
        assertEquals((1 << w) - 1, c.decoderOutputs());
        assertEquals((1 << w) - 1, c.switches());
        assertEquals((1 << w) - 1, c.unitElements());
    }

    /**
     * Predecoded one-hot decoder with 2-input gates: G(w) = 2^w + G(a) + G(w-a), G(1) = 0 (a 1-bit group is a
     * literal). The optimal split values, worked by hand: G(2)=4, G(3)=8+4=12, G(4)=16+4+4=24,
     * G(5)=32+12+4=48, G(6)=64+12+12=88, G(7)=128+24+12=164, G(8)=256+24+24=304. Any decoder of n &gt;= 2 inputs
     * needs at least 2^n gates, one per output, because every output is a different function that is not an
     * input literal (lower bound, common practice, no source).
     */
    @Test
    void oneHotDecoderWithSharedPredecodingHasRecursiveGateCount() {
        int[] expected = {0, 0, 4, 12, 24, 48, 88, 164, 304};
        for (int w = 1; w <= 8; w++) {
            DecoderCost c = cost(FieldCoding.of(w, CodingScheme.ONE_HOT, 0), BARE);
            assertEquals(expected[w], twoInputGates(c), "w=" + w);
            assertTrue(w < 2 || twoInputGates(c) >= 1 << w);
            // shared inverters: one per input, every rail is used
            assertEquals(w, c.gates().get(GateType.INV), "w=" + w);
        }
    }

    @Test
    void predecodeSplitIsBalancedForTwoInputGates() {
        assertArrayEquals(new int[] {4, 4}, PredecodeSplit.best(8, 2).parts());
        assertArrayEquals(new int[] {3, 4}, PredecodeSplit.best(7, 2).parts());
        assertEquals(304 * 4, PredecodeSplit.best(8, 2).transistors());
    }

    @Test
    void threeInputLibraryNeverCostsMoreTransistors() {
        for (int w = 2; w <= 8; w++) {
            FieldCoding c = FieldCoding.of(w, CodingScheme.ONE_HOT, 0);
            assertTrue(cost(c, new GateLibrary(3, false)).transistors() <= cost(c, BARE).transistors(), "w=" + w);
        }
    }

    @Test
    void localInputBuffersAddTwoInvertersPerInput() {
        FieldCoding c = FieldCoding.of(5, CodingScheme.ONE_HOT, 0);
        assertEquals(cost(c, BARE).gates().get(GateType.INV) + 5, cost(c, GateLibrary.TWO_INPUT).gates()
                .get(GateType.INV));
    }

    @Test
    void grayDecoderIsAnXorChainOfFourNandsEach() {
        for (int n = 1; n <= 10; n++) {
            DecoderCost c = cost(FieldCoding.of(n, CodingScheme.GRAY, 0), BARE);
            assertEquals(4 * (n - 1), c.gates().get(GateType.NAND2), "n=" + n);
            assertEquals(n, c.decoderOutputs());
        }
    }

    @Test
    void binaryFieldNeedsNoDecoderGates() {
        assertEquals(0, cost(FieldCoding.of(8, CodingScheme.BINARY, 0), BARE).gateCount());
        // active-low: one inverter per output
        DecoderCost low = cost(new FieldCoding(8, CodingScheme.BINARY, 0, SignedFormat.UNSIGNED, false, true), BARE);
        assertEquals(8, low.gates().get(GateType.INV));
        assertEquals(8, low.gateCount());
    }

    @Test
    void splitSweepEndsAreTheBinaryAndThermometerDecoders() {
        FieldCoding seg = FieldCoding.of(6, CodingScheme.SEGMENTED, 3);
        List<DecoderCost> sweep = DecoderSynthesis.costPerSplit(seg, BARE);
        assertEquals(7, sweep.size());
        assertEquals(cost(FieldCoding.of(6, CodingScheme.BINARY, 0), BARE).transistors(), sweep.get(0).transistors());
        assertEquals(cost(FieldCoding.of(6, CodingScheme.THERMOMETER, 0), BARE).transistors(),
                sweep.get(6).transistors());
        for (int m = 0; m <= 6; m++) {
            // outputs: 2^M - 1 unary + (6 - M) binary
            assertEquals((1 << m) - 1 + 6 - m, sweep.get(m).decoderOutputs(), "M=" + m);
            assertEquals(63, sweep.get(m).unitElements());
        }
        // the thermometer part of M = 3 is the 3-bit recursive decoder: 2^4 - 6 - 2 = 8 gates
        assertEquals(8, twoInputGates(sweep.get(3)));
    }

    @Test
    void netlistSimulationMatchesCodeMapForEverySchemeAndFormat() {
        for (CodingScheme s : CodingScheme.values()) {
            for (SignedFormat f : SignedFormat.values()) {
                for (int n = 2; n <= 6; n++) {
                    for (int lib = 2; lib <= 3; lib++) {
                        FieldCoding c = new FieldCoding(n, s, s == CodingScheme.SEGMENTED ? 2 : 0, f,
                                s.isSelect(), n % 2 == 0);
                        CodeMap map = new CodeMap(c);
                        Netlist net = DecoderSynthesis.netlist(map, new GateLibrary(lib, n % 3 == 0));
                        for (int code = 0; code < c.codeCount(); code++) {
                            boolean[] out = net.simulate(code);
                            for (int i = 0; i < out.length; i++) {
                                assertEquals(map.output(code, i), out[i], c + " code " + code + " output " + i);
                            }
                        }
                    }
                }
            }
        }
    }

    @Test
    void twoLevelRealisationIsNoCheaperThanStructuralOneHot() {
        CodeMap map = new CodeMap(FieldCoding.of(6, CodingScheme.ONE_HOT, 0));
        assertTrue(DecoderSynthesis.netlist(map, BARE).transistors()
                <= DecoderSynthesis.twoLevelNetlist(map, BARE).transistors());
    }
}
