package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

/**
 * Synthesises a field's decoder: the {@link DecoderStructure} mapped to gates by the {@link TechMapper}, checked
 * against the code map by simulating every code (up to {@link #SELF_CHECK_LIMIT} bits), and counted into a
 * {@link DecoderCost}. All widths 1..16 are synthesised (the structures grow linearly with the number of
 * outputs), so every count is exact for the structure; none is estimated.
 */
public final class DecoderSynthesis {

    /** Method text of counts taken from the structural netlist. */
    public static final String STRUCTURAL_METHOD = "counted from the synthesised gate netlist (structural decoder:"
            + " shared predecoding / recursive thermometer / Gray XOR chain; De Morgan mapping to INV/NAND/NOR)";

    private DecoderSynthesis() {
    }

    /** The structural gate netlist of {@code map}'s decoder in library {@code lib}. */
    public static Netlist netlist(CodeMap map, GateLibrary lib) {
        ExprFactory f = new ExprFactory();
        List<Expr> outputs = new DecoderStructure(f, lib.maxFanIn()).outputs(map);
        Netlist n = new TechMapper(lib, f).map(map.coding().bits(), outputs);
        verify(map, n);
        return n;
    }

    /**
     * The two-level netlist (minimum SOPs mapped NAND-NAND with shared products, products wider than the gate
     * fan-in decomposed); fields up to {@link OutputFunctions#TWO_LEVEL_LIMIT} bits.
     */
    public static Netlist twoLevelNetlist(CodeMap map, GateLibrary lib) {
        ExprFactory f = new ExprFactory();
        List<Expr> outputs = OutputFunctions.asExpressions(f, new OutputFunctions(map).minimised());
        Netlist n = new TechMapper(lib, f).map(map.coding().bits(), outputs);
        verify(map, n);
        return n;
    }

    /** Cost of the structural decoder. */
    public static DecoderCost cost(CodeMap map, GateLibrary lib) {
        return DecoderCost.of(netlist(map, lib), map.unitElements(), STRUCTURAL_METHOD);
    }

    /**
     * Cost of every segmentation split M = 0..n of a field of {@code coding}'s width and signed format
     * (M = 0 is the binary array, M = n the full thermometer); index M of the result.
     */
    public static List<DecoderCost> costPerSplit(FieldCoding coding, GateLibrary lib) {
        List<DecoderCost> out = new ArrayList<>();
        for (int m = 0; m <= coding.bits(); m++) {
            FieldCoding c = m == 0
                    ? new FieldCoding(coding.bits(), CodingScheme.BINARY, 0, coding.signedFormat(), false,
                            coding.activeLow())
                    : new FieldCoding(coding.bits(), CodingScheme.SEGMENTED, m, coding.signedFormat(), false,
                            coding.activeLow());
            out.add(cost(new CodeMap(c), lib));
        }
        return out;
    }

    /** Widest field whose netlist is simulated against the code map on every synthesis. */
    public static final int SELF_CHECK_LIMIT = 10;

    /**
     * Simulates the netlist for every code and compares with the code map (fields up to
     * {@link #SELF_CHECK_LIMIT} bits); a mismatch is a program error.
     */
    private static void verify(CodeMap map, Netlist n) {
        if (map.coding().bits() > SELF_CHECK_LIMIT) {
            return;
        }
        for (int c = 0; c < map.coding().codeCount(); c++) {
            boolean[] out = n.simulate(c);
            for (int i = 0; i < out.length; i++) {
                if (out[i] != map.output(c, i)) {
                    throw new IllegalStateException("netlist output " + map.layout().names().get(i)
                            + " wrong for code " + c + " in " + map.coding());
                }
            }
        }
    }
}
