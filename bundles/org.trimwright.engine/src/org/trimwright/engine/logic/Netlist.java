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
        Compiled c = compiled();
        boolean[] value = new boolean[c.netCount];
        for (int i = 0; i < inputCount; i++) {
            value[i] = ((code >> i) & 1) != 0;
        }
        for (int g = 0; g < c.inputs.length; g++) {
            boolean and = true;
            boolean or = false;
            for (int in : c.inputs[g]) {
                and &= value[in];
                or |= value[in];
            }
            value[inputCount + g] = c.nor[g] ? !or : !and;
        }
        boolean[] outs = new boolean[c.outputs.length];
        for (int i = 0; i < outs.length; i++) {
            outs[i] = value[c.outputs[i]];
        }
        return outs;
    }

    /** Index form for simulation: nets 0..n-1 are the inputs, net n+g is the output of gate g. */
    private record Compiled(int netCount, int[][] inputs, boolean[] nor, int[] outputs) {
    }

    private Compiled compiledForm;

    private synchronized Compiled compiled() {
        if (compiledForm == null) {
            Map<String, Integer> index = new java.util.HashMap<>();
            for (int i = 0; i < inputCount; i++) {
                index.put(inputNet(i), i);
            }
            int[][] ins = new int[gates.size()][];
            boolean[] nor = new boolean[gates.size()];
            for (int g = 0; g < gates.size(); g++) {
                Gate gate = gates.get(g);
                ins[g] = gate.inputs().stream().mapToInt(index::get).toArray();
                nor[g] = gate.type() == GateType.NOR2 || gate.type() == GateType.NOR3;
                index.put(gate.output(), inputCount + g);
            }
            int[] outs = outputNets.stream().mapToInt(index::get).toArray();
            compiledForm = new Compiled(inputCount + gates.size(), ins, nor, outs);
        }
        return compiledForm;
    }
}
