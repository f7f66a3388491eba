package org.trimwright.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.units.SiUnit;

/**
 * Coding engine (issue 3): one complete {@link CodingAnalysis#analyze} of a field, i.e. the step table, the decoder
 * netlist and its cost (for a segmented field also the cost of every split M), and the glitch exposure of every
 * adjacent step. Verilog text is produced lazily by the report and is not part of this figure.
 * <p>
 * Fields: unsigned, active high, no zero state, two-input gate library with input buffers; a segmented field of
 * n bits uses M = n / 2 unary bits. Figure: average time per analysed field (ms/op, one op = one field).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CodingBenchmark {

    @Param({"8", "10"})
    public int bits;

    @Param({"binary", "thermometer", "one-hot", "one-cold", "gray", "segmented"})
    public String coding;

    private FieldCoding field;

    @Setup
    public void setUp() {
        CodingScheme scheme = CodingScheme.fromKey(coding);
        field = FieldCoding.of(bits, scheme, scheme == CodingScheme.SEGMENTED ? bits / 2 : 0);
    }

    /** Step table + decoder logic and cost + glitch exposure of one field. */
    @Benchmark
    public CodingReport analyze() {
        return CodingAnalysis.analyze("trim", field, 0.0, 1e-6, SiUnit.AMPERE, GateLibrary.TWO_INPUT);
    }
}
