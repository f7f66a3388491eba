package org.trimwright.engine.logic;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/**
 * The cost of a field's decoder and array.
 *
 * @param gates           gate count per type (every type present)
 * @param transistors     static CMOS transistors: INV 2, NAND2/NOR2 4, NAND3/NOR3 6
 * @param nand2Equivalent transistors / 4 (a NAND2 has 4 transistors; common practice, no source)
 * @param switches        analog switches, one per decoder output
 * @param unitElements    unit elements of the array, 2^w - 1
 * @param decoderOutputs  number of decoder outputs
 * @param method          how the counts were obtained (every count is taken from a synthesised netlist: the
 *                        structures grow linearly with the outputs, so all widths 1..16 are synthesised and no
 *                        count is an estimate)
 */
public record DecoderCost(Map<GateType, Integer> gates, int transistors, double nand2Equivalent, int switches,
        int unitElements, int decoderOutputs, String method) {

    public DecoderCost {
        gates = Collections.unmodifiableMap(new EnumMap<>(gates));
    }

    /** Total number of gates. */
    public int gateCount() {
        return gates.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** Counts a synthesised netlist. */
    public static DecoderCost of(Netlist netlist, int unitElements, String method) {
        int t = netlist.transistors();
        int outputs = netlist.outputNets().size();
        return new DecoderCost(netlist.gateCounts(), t, t / 4.0, outputs, unitElements, outputs, method);
    }
}
