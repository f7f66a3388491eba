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
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.exact.ExactYields;

/**
 * Exact rare-event methods (issue 8) on a 16-bit field: {@link ExactYields#monotonicity(FieldCoding, double)}
 * (P(non-monotonic)) and {@link ExactYields#dnlYieldNominal(FieldCoding, double, double)} (P(max|DNL| &lt; limit),
 * nominal LSB). Split {@code unaryBits} = M: 0 is the plain binary field, otherwise a segmented field with M unary
 * MSBs over 16 - M binary LSBs. Unit relative sigma {@code unitSigma} (fraction), DNL limit 0.5 LSB.
 * <p>
 * Figure: average time per call (ms/op). Each trial's setup prints the probability and the numerical error the
 * method reports, so the time can be read against the accuracy target (absolute error &lt; 1e-10).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ExactBenchmark {

    /** DNL limit of the yield, LSB. */
    public static final double DNL_LIMIT = 0.5;

    @Param({"0", "2", "4", "6", "8", "10", "12"})
    public int unaryBits;

    @Param({"0.001"})
    public double unitSigma;

    private FieldCoding field;

    @Setup
    public void setUp() {
        field = unaryBits == 0
                ? FieldCoding.of(16, CodingScheme.BINARY, 0)
                : FieldCoding.of(16, CodingScheme.SEGMENTED, unaryBits);
        ExactMonotonicity mono = ExactYields.monotonicity(field, unitSigma);
        ExactDnlYield dnl = ExactYields.dnlYieldNominal(field, unitSigma, DNL_LIMIT);
        System.out.printf("%n# accuracy 16 bits M=%d unitSigma=%s: P(non-monotonic)=%.6e numericalError=%.3e"
                + " (target < 1e-10: %s); DNL yield(|DNL|<%.1f LSB)=%.12f numericalError=%.3e (target < 1e-10: %s)%n",
                unaryBits, unitSigma, mono.probabilityNonMonotonic(), mono.numericalError(),
                mono.numericalError() < 1e-10 ? "met" : "MISSED", DNL_LIMIT, dnl.yield(), dnl.numericalError(),
                dnl.numericalError() < 1e-10 ? "met" : "MISSED");
    }

    @Benchmark
    public ExactMonotonicity monotonicity() {
        return ExactYields.monotonicity(field, unitSigma);
    }

    @Benchmark
    public ExactDnlYield dnlYieldNominal() {
        return ExactYields.dnlYieldNominal(field, unitSigma, DNL_LIMIT);
    }
}
