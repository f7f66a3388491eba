package org.trimwright.engine.rtl;

import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.OutputLayout;
import org.trimwright.engine.coding.SignedFormat;

/**
 * Emits a readable behavioural Verilog-2005 decoder: {@code module NAME (input wire [n-1:0] code,
 * output reg [K-1:0] ctrl)}, with the bit map of {@code ctrl} in a comment (see {@link OutputLayout}).
 */
public final class BehaviouralVerilog {

    private BehaviouralVerilog() {
    }

    /** The module text; {@code name} is sanitised. */
    public static String module(String name, CodeMap map) {
        FieldCoding c = map.coding();
        OutputLayout layout = map.layout();
        int n = c.bits();
        int w = layout.arrayBits();
        int k = layout.size();
        int b = layout.binaryCount();
        String mod = VerilogNames.sanitise(name);
        StringBuilder v = new StringBuilder();
        v.append("// Decoder of a ").append(n).append("-bit ").append(c.scheme().key()).append(" field");
        if (c.scheme() == CodingScheme.SEGMENTED) {
            v.append(" (").append(c.unaryBits()).append(" unary MSBs)");
        }
        v.append(", ").append(c.signedFormat().key()).append(c.zeroState() ? ", zero state" : "")
                .append(c.activeLow() ? ", active-low drive" : ", active-high drive").append(".\n");
        v.append("// ctrl bit map (index: name): ").append(bitMap(layout)).append('\n');
        v.append("module ").append(mod).append(" (\n    input  wire [").append(n - 1).append(":0] code,\n")
                .append("    output reg  [").append(k - 1).append(":0] ctrl\n);\n");
        v.append("    reg [").append(n - 1).append(":0] word;  // the binary word the decoder works on\n");
        v.append("    reg [").append(w - 1).append(":0] lvl;   // array level L\n");
        v.append("    integer i;\n");
        v.append("    always @* begin\n");
        if (c.scheme() == CodingScheme.GRAY) {
            v.append("        // inverse Gray code: word[i] = XOR of code[n-1:i]\n");
            v.append("        word[").append(n - 1).append("] = code[").append(n - 1).append("];\n");
            v.append("        for (i = ").append(n - 2).append("; i >= 0; i = i - 1)\n");
            v.append("            word[i] = word[i + 1] ^ code[i];\n");
        } else {
            v.append("        word = code;\n");
        }
        if (c.signedFormat() == SignedFormat.TWOS_COMPLEMENT) {
            v.append("        lvl = {~word[").append(n - 1).append("], word[").append(n - 2).append(":0]};"
                    + "  // two's complement: MSB inverted\n");
        } else if (c.signedFormat() == SignedFormat.SIGN_MAGNITUDE) {
            v.append("        lvl = word[").append(n - 2).append(":0];  // sign-magnitude: magnitude bits\n");
        } else {
            v.append("        lvl = word;\n");
        }
        String invSel = map.inverted(0) && layout.selectCount() > 0 ? "!" : "";
        String inv = c.activeLow() ? "!" : "";
        String invBit = c.activeLow() ? "~" : "";
        for (int i = 0; i < b; i++) {
            v.append("        ctrl[").append(i).append("] = ").append(invBit).append("lvl[").append(i).append("];\n");
        }
        if (layout.unaryCount() > 0) {
            v.append("        for (i = 0; i < ").append(layout.unaryCount()).append("; i = i + 1)\n");
            v.append("            ctrl[").append(b).append(" + i] = ").append(inv).append("(lvl[").append(w - 1)
                    .append(':').append(b).append("] > i);\n");
        }
        if (layout.selectCount() > 0) {
            int first = c.zeroState() ? 1 : 0;
            v.append("        for (i = 0; i < ").append(layout.selectCount()).append("; i = i + 1)\n");
            v.append("            ctrl[i] = ").append(invSel).append("(lvl == i + ").append(first).append(");\n");
        }
        if (layout.hasPolarity()) {
            v.append("        ctrl[").append(k - 1).append("] = ").append(invBit).append("word[").append(n - 1)
                    .append("];  // polarity: 1 = negative\n");
        }
        v.append("    end\nendmodule\n");
        return v.toString();
    }

    static String bitMap(OutputLayout layout) {
        int k = layout.size();
        if (k <= 16) {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < k; i++) {
                sb.append(i > 0 ? ", " : "").append(i).append(": ").append(layout.names().get(i));
            }
            return sb.toString();
        }
        return "0: " + layout.names().get(0) + " .. " + (k - 1) + ": " + layout.names().get(k - 1)
                + " in the order b*, t*/u*, s*, pol";
    }
}
