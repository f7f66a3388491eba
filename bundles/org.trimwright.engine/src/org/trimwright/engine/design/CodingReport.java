package org.trimwright.engine.design;

import java.util.List;
import java.util.Optional;

import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.glitch.GlitchReport;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.Netlist;
import org.trimwright.engine.rtl.BehaviouralVerilog;
import org.trimwright.engine.rtl.GateVerilog;
import org.trimwright.engine.rtl.TestbenchVerilog;
import org.trimwright.engine.units.SiUnit;

/**
 * Everything the coding engine says about one field. Immutable; the Verilog texts are produced on request
 * because a wide field's testbench is large (it lists 2^n expected vectors of K bits).
 *
 * @param name         field name as given (Verilog module names are derived from it, sanitised)
 * @param coding       the field's coding
 * @param unit         unit of {@code atZero}, {@code step} and every value in the step table
 * @param stepTable    code, register bits, outputs, switches, units in use and value of every code
 * @param netlist      the structural gate netlist of the decoder
 * @param cost         cost of the structural decoder
 * @param twoLevelCost cost of the minimum two-level (SOP, NAND-NAND) realisation with shared products, fields up
 *                     to {@link CodingAnalysis#TWO_LEVEL_BITS} bits; empty beyond
 * @param splitCosts   segmented fields: cost for every split M = 0..n (index M; M = 0 binary, M = n thermometer);
 *                     empty list for other schemes
 * @param glitch       glitch exposure of every adjacent step, the worst one, and advice
 */
public record CodingReport(String name, FieldCoding coding, SiUnit unit, StepTable stepTable, Netlist netlist,
        DecoderCost cost, Optional<DecoderCost> twoLevelCost, List<DecoderCost> splitCosts, GlitchReport glitch) {

    /** Largest testbench, in expected-vector bits (codes x outputs), that {@link #testbench()} writes. */
    public static final long TESTBENCH_LIMIT_BITS = 1L << 24;

    public CodingReport {
        splitCosts = List.copyOf(splitCosts);
    }

    /** Name of the behavioural module (sanitised field name). */
    public String moduleName() {
        return org.trimwright.engine.rtl.VerilogNames.sanitise(name);
    }

    /** Name of the gate-level module: the module name with {@code _gates}. */
    public String gateModuleName() {
        return moduleName() + "_gates";
    }

    /** Readable behavioural Verilog-2005 module. */
    public String verilog() {
        return BehaviouralVerilog.module(moduleName(), stepTable.map());
    }

    /** Structural Verilog-2005 module built from {@link #netlist()}. */
    public String gateVerilog() {
        return GateVerilog.module(gateModuleName(), netlist);
    }

    /**
     * Self-checking testbench for both modules.
     *
     * @throws IllegalStateException when codes x outputs exceeds {@link #TESTBENCH_LIMIT_BITS}
     */
    public String testbench() {
        long bits = (long) stepTable.size() * stepTable.map().layout().size();
        if (bits > TESTBENCH_LIMIT_BITS) {
            throw new IllegalStateException("testbench of " + bits + " expected bits exceeds the limit of "
                    + TESTBENCH_LIMIT_BITS);
        }
        return TestbenchVerilog.testbench(List.of(moduleName(), gateModuleName()), stepTable);
    }
}
