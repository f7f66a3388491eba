package org.trimwright.engine.rtl;

import org.trimwright.engine.logic.Gate;
import org.trimwright.engine.logic.Netlist;

/**
 * Emits a structural Verilog-2005 module from a {@link Netlist}: one gate primitive ({@code not}, {@code nand},
 * {@code nor}) per gate, same ports as the behavioural module ({@code code}, {@code ctrl}).
 */
public final class GateVerilog {

    private GateVerilog() {
    }

    /** The module text; {@code name} is sanitised. */
    public static String module(String name, Netlist netlist) {
        String mod = VerilogNames.sanitise(name);
        int n = netlist.inputCount();
        int k = netlist.outputNets().size();
        StringBuilder v = new StringBuilder();
        v.append("// Gate-level decoder: ").append(netlist.gates().size()).append(" gates, ")
                .append(netlist.transistors()).append(" transistors.\n");
        v.append("module ").append(mod).append(" (\n    input  wire [").append(n - 1).append(":0] code,\n")
                .append("    output wire [").append(k - 1).append(":0] ctrl\n);\n");
        for (int i = 0; i < netlist.gates().size(); i += 16) {
            v.append("    wire ");
            for (int j = i; j < Math.min(i + 16, netlist.gates().size()); j++) {
                v.append(j > i ? ", " : "").append(netlist.gates().get(j).output());
            }
            v.append(";\n");
        }
        int g = 0;
        for (Gate gate : netlist.gates()) {
            v.append("    ").append(gate.type().primitive()).append(" g").append(g++).append(" (")
                    .append(gate.output());
            for (String in : gate.inputs()) {
                v.append(", ").append(in);
            }
            v.append(");\n");
        }
        for (int i = 0; i < k; i++) {
            v.append("    assign ctrl[").append(i).append("] = ").append(netlist.outputNets().get(i)).append(";\n");
        }
        v.append("endmodule\n");
        return v.toString();
    }
}
