package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.montecarlo.AllCodesEvaluator;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;
import org.trimwright.engine.mismatch.montecarlo.StructuralEvaluator;
import org.trimwright.engine.mismatch.montecarlo.TrialMetrics;
import org.trimwright.engine.mismatch.sequence.SequenceKind;

/** Invariants of the mismatch statistics (run through PropertyRunner from MismatchPropertiesTest). */
public class MismatchProperties {

    @Property(tries = 40)
    public void unaryFieldIsNeverNonMonotonicAtAnySigma(@ForAll @IntRange(min = 1, max = 8) int bits,
            @ForAll @DoubleRange(min = 0.0, max = 5.0) double sigma, @ForAll @IntRange(min = 0, max = 2) int kind,
            @ForAll long seed) {
        CodingScheme scheme = kind == 0 ? CodingScheme.THERMOMETER : kind == 1 ? CodingScheme.ONE_HOT
                : CodingScheme.SEGMENTED;
        FieldCoding coding = new FieldCoding(bits, scheme, scheme == CodingScheme.SEGMENTED ? bits : 0,
                SignedFormat.UNSIGNED, false, false);
        ElementModel model = new ElementModel(sigma, sigma / 2, SwitchScaling.PER_ELEMENT, new Gradient(0.3, -0.4),
                SequenceKind.MIRRORED_TREE);
        ElementArray array = ElementArray.of(coding, model);
        assertTrue(TransitionAnalysis.of(array).monotonicByConstruction());
        assertEquals(0.0, TransitionAnalysis.of(array).unionBound());
        MonteCarloResult mc = MonteCarloRun.run(array, new MonteCarloOptions(2000, seed, 1, 0));
        assertEquals(0, mc.nonMonotonicCount());
    }

    @Property(tries = 12)
    public void resultsForASeedAreIdenticalWithOneAndWithAllThreads(@ForAll @IntRange(min = 2, max = 8) int bits,
            @ForAll @IntRange(min = 0, max = 10) int unaryRequest, @ForAll long seed,
            @ForAll @IntRange(min = 1, max = 30_000) int trials) {
        int m = Math.min(unaryRequest, bits);
        FieldCoding coding = m == 0 ? FieldCoding.of(bits, CodingScheme.BINARY, 0)
                : FieldCoding.of(bits, CodingScheme.SEGMENTED, m);
        ElementArray array = ElementArray.of(coding, ElementModel.ofUnitSigma(0.05));
        MonteCarloResult one = MonteCarloRun.run(array, new MonteCarloOptions(trials, seed, 1, 0));
        MonteCarloResult all = MonteCarloRun.run(array, new MonteCarloOptions(trials, seed, 0, 0));
        MonteCarloResult three = MonteCarloRun.run(array, new MonteCarloOptions(trials, seed, 3, 0));
        for (int t = 0; t < trials; t++) {
            assertEquals(one.nonMonotonic(t), all.nonMonotonic(t));
            assertEquals(one.nonMonotonic(t), three.nonMonotonic(t));
            for (Metric metric : Metric.values()) {
                assertEquals(one.value(metric, t), all.value(metric, t), 0.0);
                assertEquals(one.value(metric, t), three.value(metric, t), 0.0);
            }
        }
    }

    @Property(tries = 60)
    public void structuralEvaluatorAgreesWithAllCodesWalkForAnyField(@ForAll @IntRange(min = 2, max = 9) int bits,
            @ForAll @IntRange(min = 0, max = 9) int unaryRequest, @ForAll @IntRange(min = 0, max = 3) int format,
            @ForAll @DoubleRange(min = 0.0, max = 0.6) double sigma, @ForAll long seed) {
        int m = Math.min(unaryRequest, bits);
        CodingScheme scheme = m == 0 ? CodingScheme.BINARY : CodingScheme.SEGMENTED;
        FieldCoding coding = new FieldCoding(bits, scheme, m, SignedFormat.values()[format], false, false);
        ElementArray array = ElementArray.of(coding, new ElementModel(sigma, 0.01, SwitchScaling.PER_ELEMENT,
                new Gradient(0.02, 0.01), SequenceKind.CENTRE_OUT));
        StructuralEvaluator fast = new StructuralEvaluator(array);
        AllCodesEvaluator slow = new AllCodesEvaluator(array);
        Draws d = new Draws(array, seed);
        TrialMetrics a = new TrialMetrics();
        TrialMetrics b = new TrialMetrics();
        for (int t = 0; t < 20; t++) {
            d.next();
            fast.evaluate(d.unary, d.binary, a);
            slow.evaluate(d.unary, d.binary, b);
            assertEquals(b.nonMonotonic, a.nonMonotonic);
            for (Metric metric : Metric.values()) {
                assertEquals(b.get(metric), a.get(metric), 1e-9 * Math.max(1, Math.abs(b.get(metric))));
            }
        }
    }
}
