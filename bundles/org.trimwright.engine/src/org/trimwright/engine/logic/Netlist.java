package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * A gate-level decoder: register inputs {@code code[0..n-1]}, gates over named nets, and for every decoder
 * output the net that drives it. Input nets are named {@code code[i]}, internal nets {@code n<k>}. Both the cost
 * count and the structural Verilog come from this object. Immutable once built by {@link TechMapper}.
 */
public final class Netlist {

    private final int inputCount;
    private final List<Gate> gates;
    private final List<String> outputNets;

    Netlist(int inputCount, List<Gate> gates, List<String> outputNets) {
        this.inputCount = inputCount;
        this.gates = Collections.unmodifiableList(new ArrayList<>(gates));
        this.outputNets = Collections.unmodifiableList(new ArrayList<>(outputNets));
    }

    /** Net name of register input {@code i}. */
    public static String inputNet(int i) {
        return "code[" + i + "]";
    }

    public int inputCount() {
        return inputCount;
    }

    /** Gates in topological order (every gate's inputs are driven by earlier gates or are register inputs). */
    public List<Gate> gates() {
        return gates;
    }

    /** The net driving each decoder output, in port order. */
    public List<String> outputNets() {
        return outputNets;
    }

    /** Gate count per type (every type present, zero when unused). */
    public Map<GateType, Integer> gateCounts() {
        Map<GateType, Integer> counts = new EnumMap<>(GateType.class);
        for (GateType t : GateType.values()) {
            counts.put(t, 0);
        }
        for (Gate g : gates) {
            counts.merge(g.type(), 1, Integer::sum);
        }
        return counts;
    }

    /** Transistors of all gates (INV 2, NAND2/NOR2 4, NAND3/NOR3 6). */
    public int transistors() {
        int t = 0;
        for (Gate g : gates) {
            t += g.type().transistors();
        }
        return t;
    }

    /** Simulates the netlist for register code {@code code}; returns the output values in port order. */
    public boolean[] simulate(int code) {
        Map<String, Boolean> value = new java.util.HashMap<>();
        for (int i = 0; i < inputCount; i++) {
            value.put(inputNet(i), ((code >> i) & 1) != 0);
        }
        for (Gate g : gates) {
            boolean and = true;
            boolean or = false;
            for (String in : g.inputs()) {
                boolean v = value.get(in);
                and &= v;
                or |= v;
            }
            boolean out;
            switch (g.type()) {
                case INV:
                    out = !and;
                    break;
                case NAND2:
                case NAND3:
                    out = !and;
                    break;
                default:
                    out = !or;
                    break;
            }
            value.put(g.output(), out);
        }
        boolean[] outs = new boolean[outputNets.size()];
        for (int i = 0; i < outs.length; i++) {
            outs[i] = value.get(outputNets.get(i));
        }
        return outs;
    }
}
