package org.trimwright.engine.mismatch.sequence;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Gradient;
import org.trimwright.engine.mismatch.montecarlo.StructuralEvaluator;
import org.trimwright.engine.mismatch.montecarlo.TrialMetrics;

/**
 * Compares the unary switching sequences under a linear and quadratic gradient: the field's systematic transfer
 * (mean elements) is evaluated exactly over all levels for each sequence. A field without unary elements, or a select
 * string (whose order is its physical order), has only the sequential row.
 *
 * @param gradientLinear    the linear coefficient used (relative error at the array edge)
 * @param gradientQuadratic the quadratic coefficient used
 * @param reference         true if the model had no gradient and a reference gradient was used instead
 * @param rows              one row per sequence
 * @param best              key of the sequence with the smallest combined endpoint INL
 */
public record GradientStudy(double gradientLinear, double gradientQuadratic, boolean reference,
        List<SequenceRow> rows, String best) {

    /** Reference gradient used when the model has none: 1 % linear and 1 % quadratic at the array edge. */
    public static final Gradient REFERENCE = new Gradient(0.01, 0.01);

    public GradientStudy {
        rows = List.copyOf(rows);
    }

    /** Runs the comparison for {@code coding} with the gradient of {@code model} (or {@link #REFERENCE}). */
    public static GradientStudy of(FieldCoding coding, ElementModel model) {
        boolean reference = model.gradient().isNone();
        Gradient g = reference ? REFERENCE : model.gradient();
        List<SequenceRow> rows = new ArrayList<>();
        ElementArray probe = ElementArray.of(coding, model);
        SequenceKind[] kinds = probe.unaryCount() > 1 && !probe.select()
                ? SequenceKind.values() : new SequenceKind[] {SequenceKind.SEQUENTIAL};
        double sequentialEndpoint = Double.NaN;
        String best = null;
        double bestValue = Double.POSITIVE_INFINITY;
        for (SequenceKind kind : kinds) {
            int[] slots = SwitchingSequences.build(kind, probe.unaryCount(), g);
            TrialMetrics both = systematic(coding, model, g, slots);
            TrialMetrics lin = systematic(coding, model, new Gradient(g.linear(), 0.0), slots);
            TrialMetrics quad = systematic(coding, model, new Gradient(0.0, g.quadratic()), slots);
            if (kind == SequenceKind.SEQUENTIAL) {
                sequentialEndpoint = both.inlEndpoint;
            }
            double improvement = both.inlEndpoint > 0 ? sequentialEndpoint / both.inlEndpoint
                    : (sequentialEndpoint > 0 ? Double.POSITIVE_INFINITY : 1.0);
            rows.add(new SequenceRow(kind.key(), lin.inlEndpoint, quad.inlEndpoint, both.inlEndpoint, both.inlBestFit,
                    both.inlAbsolute, improvement, slots));
            if (both.inlEndpoint < bestValue - 1e-12) {
                bestValue = both.inlEndpoint;
                best = kind.key();
            }
        }
        return new GradientStudy(g.linear(), g.quadratic(), reference, rows, best);
    }

    private static TrialMetrics systematic(FieldCoding coding, ElementModel model, Gradient g, int[] slots) {
        ElementArray array = ElementArray.of(coding, model.withLayout(g, SequenceKind.SEQUENTIAL), slots);
        double[] u = new double[array.unaryCount()];
        double[] b = new double[array.binaryBits()];
        array.meanValues(u, b);
        TrialMetrics m = new TrialMetrics();
        new StructuralEvaluator(array).evaluate(u, b, m);
        return m;
    }
}
