package org.trimwright.cli;

import java.io.PrintStream;
import java.util.Map;

import org.trimwright.analysis.FieldInputs;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.glitch.GlitchAdvice;
import org.trimwright.engine.glitch.GlitchStep;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.GateType;
import org.trimwright.engine.units.SiValue;

/** The readable text report of {@code analyze}. */
final class AnalyzeText {

    /** Step tables longer than this are shown as head and tail. */
    static final int FULL_TABLE_LIMIT = 64;

    private AnalyzeText() {
    }

    static void print(FieldReport report, boolean verilog, PrintStream out) {
        FieldInputs in = report.inputs();
        CodingReport r = report.coding();
        FieldCoding c = in.coding();
        out.printf("Field %s  (%s)%n", r.name(), in.path());
        out.printf("  %d bits, %s%s, %s, %s drive%s%n", c.bits(), c.scheme().key(),
                c.unaryBits() > 0 ? " (" + c.unaryBits() + " unary + " + c.binaryBits() + " binary)" : "",
                c.signedFormat().key(), c.activeLow() ? "active-low" : "active-high",
                c.zeroState() ? ", zero state" : "");
        out.printf("  value = %s + s * %s%n%n", SiValue.format(in.atZero(), in.unit()),
                SiValue.format(in.step(), in.unit()));
        table(r, in, out);
        out.println();
        out.println("Decoder cost (" + r.cost().method() + ")");
        cost(r.cost(), out);
        if (!r.splitCosts().isEmpty()) {
            out.println("  per split M (unary MSBs): M  NAND2eq  switches  unit elements");
            for (int m = 0; m < r.splitCosts().size(); m++) {
                DecoderCost s = r.splitCosts().get(m);
                out.printf("                           %2d %8.1f %9d %14d%n", m, s.nand2Equivalent(), s.switches(),
                        s.unitElements());
            }
        }
        out.println();
        glitch(r, in, out);
        MismatchText.print(report, out);
        if (verilog) {
            out.println();
            out.println(r.verilog());
            out.println(r.gateVerilog());
            out.println(r.testbench());
        }
    }

    private static void table(CodingReport r, FieldInputs in, PrintStream out) {
        int k = r.stepTable().map().layout().size();
        out.println("Step table (outputs: " + String.join(" ", reversed(r.stepTable().map().layout().names()))
                + ")");
        out.printf("  %6s %-17s %6s %-20s %6s %s%n", "code", "register", "s", "outputs", "units", "value");
        int n = r.stepTable().size();
        for (int code = 0; code < n; code++) {
            if (n > FULL_TABLE_LIMIT && code == 16) {
                out.printf("  ... %d codes not shown (full table: --json) ...%n", n - 32);
                code = n - 16;
            }
            StepRow row = r.stepTable().row(code);
            String outputs = row.outputBits(k);
            if (outputs.length() > 20) {
                outputs = outputs.substring(0, 17) + "...";
            }
            out.printf("  %6d %-17s %6d %-20s %6d %s%n", row.code(), row.registerBits(), row.signedSteps(), outputs,
                    row.unitsInUse(), SiValue.format(row.value(), in.unit()));
        }
    }

    private static java.util.List<String> reversed(java.util.List<String> names) {
        java.util.List<String> l = new java.util.ArrayList<>(names);
        java.util.Collections.reverse(l);
        if (l.size() > 8) {
            return java.util.List.of(l.get(0), "...", l.get(l.size() - 1));
        }
        return l;
    }

    private static void cost(DecoderCost c, PrintStream out) {
        StringBuilder gates = new StringBuilder();
        for (Map.Entry<GateType, Integer> e : c.gates().entrySet()) {
            if (e.getValue() > 0) {
                gates.append(e.getKey().name()).append(' ').append(e.getValue()).append("  ");
            }
        }
        out.printf("  gates: %s%n", gates.length() == 0 ? "none" : gates.toString().strip());
        out.printf("  transistors %d, NAND2 equivalents %.1f (transistors/4), switches %d, unit elements %d,"
                + " decoder outputs %d%n", c.transistors(), c.nand2Equivalent(), c.switches(), c.unitElements(),
                c.decoderOutputs());
    }

    private static void glitch(CodingReport r, FieldInputs in, PrintStream out) {
        GlitchStep w = r.glitch().worst();
        out.println("Glitch exposure (any skew between the register bits of one step)");
        out.printf("  %d of %d adjacent steps can glitch; worst %d LSB (%s) on %d -> %d via code %d%n",
                r.glitch().glitchingSteps(), r.glitch().steps().size(), w.excursionLsb(),
                SiValue.format(w.excursionUnit(), in.unit()), w.fromCode(), w.toCode(), w.worstCode());
        for (GlitchAdvice a : r.glitch().advice()) {
            out.println("  advice: " + a.text());
        }
    }
}
