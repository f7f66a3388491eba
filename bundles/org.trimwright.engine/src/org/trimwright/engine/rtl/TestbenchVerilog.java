package org.trimwright.engine.rtl;

import java.util.List;

import org.trimwright.engine.coding.StepTable;

/**
 * Emits a self-checking Verilog-2005 testbench that applies every code 0..2^n-1 and compares the outputs of the
 * decoder modules with the expected vectors of the step table. It prints {@code PASS <module>: <codes> codes}
 * or one {@code FAIL} line per mismatch and a closing {@code FAIL} line, then calls {@code $finish}.
 */
public final class TestbenchVerilog {

    private TestbenchVerilog() {
    }

    /**
     * @param modules names of the modules under test (each with ports {@code code} and {@code ctrl}), sanitised
     * @param table   the step table giving the expected outputs
     */
    public static String testbench(List<String> modules, StepTable table) {
        int n = table.map().coding().bits();
        int k = table.map().layout().size();
        String top = VerilogNames.sanitise(modules.get(0) + "_tb");
        StringBuilder v = new StringBuilder();
        v.append("`timescale 1ns/1ps\n");
        v.append("// Self-checking testbench: walks all ").append(table.size())
                .append(" codes and compares ctrl with the step table.\n");
        v.append("module ").append(top).append(";\n");
        v.append("    reg  [").append(n - 1).append(":0] code;\n");
        v.append("    reg  [").append(k - 1).append(":0] expected;\n");
        v.append("    integer errors;\n");
        for (int m = 0; m < modules.size(); m++) {
            String mod = VerilogNames.sanitise(modules.get(m));
            v.append("    wire [").append(k - 1).append(":0] ctrl").append(m).append(";\n");
            v.append("    ").append(mod).append(" dut").append(m).append(" (.code(code), .ctrl(ctrl").append(m)
                    .append("));\n");
        }
        v.append("    task check;\n        input [").append(n - 1).append(":0] c;\n        input [").append(k - 1)
                .append(":0] e;\n        begin\n            code = c;\n            expected = e;\n"
                        + "            #1;\n");
        for (int m = 0; m < modules.size(); m++) {
            String mod = VerilogNames.sanitise(modules.get(m));
            v.append("            if (ctrl").append(m).append(" !== expected) begin\n")
                    .append("                $display(\"FAIL ").append(mod)
                    .append(" code=%0d ctrl=%b expected=%b\", c, ctrl").append(m).append(", expected);\n")
                    .append("                errors = errors + 1;\n            end\n");
        }
        v.append("        end\n    endtask\n");
        v.append("    initial begin\n        errors = 0;\n");
        for (int c = 0; c < table.size(); c++) {
            v.append("        check(").append(n).append("'d").append(c).append(", ").append(k).append("'b")
                    .append(table.row(c).outputBits(k)).append(");\n");
        }
        v.append("        if (errors == 0)\n            $display(\"PASS ").append(top).append(": ")
                .append(table.size()).append(" codes\");\n        else\n            $display(\"FAIL ").append(top)
                .append(": %0d mismatches\", errors);\n        $finish;\n    end\nendmodule\n");
        return v.toString();
    }
}
