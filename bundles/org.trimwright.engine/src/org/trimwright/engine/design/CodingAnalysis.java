package org.trimwright.engine.design;

import java.util.List;
import java.util.Optional;

import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.glitch.GlitchAnalysis;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.DecoderSynthesis;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.logic.Netlist;
import org.trimwright.engine.logic.OutputFunctions;
import org.trimwright.engine.memo.BoundedMemo;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.engine.units.SiValue;

/**
 * Entry point of the coding engine: step table, decoder netlist and cost, glitch exposure and Verilog of one
 * field. Stateless and thread-safe.
 */
public final class CodingAnalysis {

    /**
     * Widest field whose report includes the two-level (minimum SOP) cost; wider fields can still be minimised
     * up to {@link OutputFunctions#TWO_LEVEL_LIMIT} bits through {@link OutputFunctions#minimised()}. The limit
     * keeps one analysis of a field in milliseconds (an 8-bit select decoder takes about half a second).
     */
    public static final int TWO_LEVEL_BITS = 6;

    private CodingAnalysis() {
    }

    /**
     * Analyses one field.
     *
     * @param name   field name (used for Verilog module names after sanitising)
     * @param coding the field's coding
     * @param atZero value at signed step count 0, in {@code unit}
     * @param step   value of one step (LSB), in {@code unit}; may be negative for a falling trim
     * @param unit   unit of the values
     * @param lib    gate library for the decoder
     */
    public static CodingReport analyze(String name, FieldCoding coding, double atZero, double step, SiUnit unit,
            GateLibrary lib) {
        if (coding == null || unit == null || lib == null) {
            throw new IllegalArgumentException("coding, unit and gate library are required");
        }
        return analyze(name, coding, atZero, step, unit, lib, decoder(coding, lib));
    }

    /**
     * As {@link #analyze(String, FieldCoding, double, double, SiUnit, GateLibrary)}, taking the decoder netlist and
     * costs from a bounded memo keyed by the coding and the gate library (the only inputs they depend on), so fields
     * with equal codings (up to {@value #SHARED_DECODER_BITS} bits) share one synthesis. The report is identical to a
     * fresh one.
     */
    public static CodingReport analyzeShared(String name, FieldCoding coding, double atZero, double step,
            SiUnit unit, GateLibrary lib) {
        if (coding == null || unit == null || lib == null) {
            throw new IllegalArgumentException("coding, unit and gate library are required");
        }
        Decoder d = coding.bits() <= SHARED_DECODER_BITS
                ? DECODERS.get(new DecoderKey(coding, lib), k -> decoder(k.coding(), k.lib()))
                : decoder(coding, lib);
        return analyze(name, coding, atZero, step, unit, lib, d);
    }

    private record DecoderKey(FieldCoding coding, GateLibrary lib) {
    }

    /** The decoder figures of a coding: they depend on the coding and the gate library only. */
    private record Decoder(Netlist netlist, DecoderCost cost, Optional<DecoderCost> twoLevel,
            List<DecoderCost> splits) {
    }

    /** Widest coding whose decoder {@link #analyzeShared} keeps (a wider netlist is large and rarely shared). */
    static final int SHARED_DECODER_BITS = 10;

    /** Distinct (coding, library) pairs held by {@link #analyzeShared}; bounded. */
    private static final BoundedMemo<DecoderKey, Decoder> DECODERS = new BoundedMemo<>(256);

    private static Decoder decoder(FieldCoding coding, GateLibrary lib) {
        CodeMap map = new CodeMap(coding);
        Netlist netlist = DecoderSynthesis.netlist(map, lib);
        DecoderCost cost = DecoderCost.of(netlist, map.unitElements(), DecoderSynthesis.STRUCTURAL_METHOD);
        Optional<DecoderCost> twoLevel = Optional.empty();
        if (coding.bits() <= TWO_LEVEL_BITS) {
            twoLevel = Optional.of(DecoderCost.of(DecoderSynthesis.twoLevelNetlist(map, lib), map.unitElements(),
                    "counted from the netlist of the exact minimum sums of products (Quine-McCluskey), mapped"
                            + " NAND-NAND with shared products and fan-in decomposition"));
        }
        List<DecoderCost> splits = coding.scheme() == CodingScheme.SEGMENTED
                ? DecoderSynthesis.costPerSplit(coding, lib) : List.of();
        return new Decoder(netlist, cost, twoLevel, splits);
    }

    private static CodingReport analyze(String name, FieldCoding coding, double atZero, double step, SiUnit unit,
            GateLibrary lib, Decoder d) {
        CodeMap map = new CodeMap(coding);
        StepTable table = new StepTable(map, atZero, step);
        return new CodingReport(name, coding, unit, table, d.netlist(), d.cost(), d.twoLevel(), d.splits(),
                GlitchAnalysis.analyse(map, step));
    }

    /**
     * Analyses one field with values given as SI values (e.g. {@code SiValue.parse("1.2V")}). The units of
     * {@code atZero} and {@code step} must agree; a unitless zero takes the step's unit.
     */
    public static CodingReport analyze(String name, FieldCoding coding, SiValue atZero, SiValue step,
            GateLibrary lib) {
        SiUnit unit = step.unit();
        if (atZero.unit() != unit && !(atZero.unit() == SiUnit.NONE && atZero.value() == 0)) {
            throw new IllegalArgumentException("at-zero value " + atZero + " and step " + step
                    + " have different units");
        }
        return analyze(name, coding, atZero.value(), step.value(), unit, lib);
    }
}
