package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.montecarlo.AllCodesEvaluator;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.StructuralEvaluator;
import org.trimwright.engine.mismatch.montecarlo.TrialMetrics;
import org.trimwright.engine.mismatch.sequence.SequenceKind;

/**
 * The O(elements) evaluator must give exactly what the literal all-codes walk gives on the same draws (the all-codes
 * walk decodes every register code and applies the DNL/INL definitions by the textbook formulas).
 */
class StructuralEvaluatorTest {

    static Stream<Arguments> fields() {
        return Stream.of(
                Arguments.of(new FieldCoding(7, CodingScheme.BINARY, 0, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(1, CodingScheme.BINARY, 0, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(7, CodingScheme.SEGMENTED, 1, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(7, CodingScheme.SEGMENTED, 3, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(7, CodingScheme.SEGMENTED, 5, SignedFormat.UNSIGNED, false, true)),
                Arguments.of(new FieldCoding(7, CodingScheme.SEGMENTED, 7, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(6, CodingScheme.THERMOMETER, 0, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(5, CodingScheme.ONE_HOT, 0, SignedFormat.UNSIGNED, true, false)),
                Arguments.of(new FieldCoding(5, CodingScheme.ONE_COLD, 0, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(6, CodingScheme.GRAY, 0, SignedFormat.UNSIGNED, false, false)),
                Arguments.of(new FieldCoding(6, CodingScheme.BINARY, 0, SignedFormat.OFFSET_BINARY, false, false)),
                Arguments.of(new FieldCoding(6, CodingScheme.SEGMENTED, 2, SignedFormat.TWOS_COMPLEMENT, false, false)),
                Arguments.of(new FieldCoding(7, CodingScheme.SEGMENTED, 3, SignedFormat.SIGN_MAGNITUDE, false, false)),
                Arguments.of(new FieldCoding(6, CodingScheme.BINARY, 0, SignedFormat.SIGN_MAGNITUDE, false, false)),
                Arguments.of(new FieldCoding(5, CodingScheme.THERMOMETER, 0, SignedFormat.SIGN_MAGNITUDE, false,
                        false)),
                Arguments.of(new FieldCoding(2, CodingScheme.GRAY, 0, SignedFormat.SIGN_MAGNITUDE, false, false)));
    }

    @ParameterizedTest
    @MethodSource("fields")
    void structuralEvaluatorEqualsAllCodesWalkOnSameDraws(FieldCoding coding) {
        ElementModel[] models = {
            ElementModel.ofUnitSigma(0.02),
            new ElementModel(0.2, 0.05, SwitchScaling.PER_ELEMENT, new Gradient(0.03, -0.02), SequenceKind.CENTRE_OUT),
            new ElementModel(0.5, 0.0, SwitchScaling.SCALED_WITH_ELEMENT, new Gradient(-0.01, 0.04),
                    SequenceKind.OPTIMISED),
        };
        for (ElementModel model : models) {
            ElementArray array = ElementArray.of(coding, model);
            StructuralEvaluator fast = new StructuralEvaluator(array);
            AllCodesEvaluator slow = new AllCodesEvaluator(array);
            Draws d = new Draws(array, 12345);
            TrialMetrics a = new TrialMetrics();
            TrialMetrics b = new TrialMetrics();
            for (int t = 0; t < 300; t++) {
                d.next();
                fast.evaluate(d.unary, d.binary, a);
                slow.evaluate(d.unary, d.binary, b);
                assertEquals(b.nonMonotonic, a.nonMonotonic, "monotonicity, trial " + t);
                for (Metric m : Metric.values()) {
                    double expected = b.get(m);
                    double tol = 1e-9 * Math.max(1.0, Math.abs(expected));
                    assertEquals(expected, a.get(m), tol, m + " trial " + t + " " + coding);
                }
            }
        }
    }
}
