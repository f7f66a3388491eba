package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.sequence.GradientStudy;
import org.trimwright.engine.mismatch.sequence.SequenceKind;
import org.trimwright.engine.mismatch.sequence.SequenceRow;
import org.trimwright.engine.mismatch.sequence.SwitchingSequences;

/** Switching sequences against linear and quadratic gradients. */
class GradientSequenceTest {

    @Test
    void everySequenceIsAPermutationOfTheSlots() {
        for (int p : new int[] {0, 1, 2, 3, 7, 15, 63, 255}) {
            for (SequenceKind k : SequenceKind.values()) {
                int[] s = SwitchingSequences.build(k, p, new Gradient(0.01, 0.02));
                int[] sorted = s.clone();
                Arrays.sort(sorted);
                int[] expected = new int[p];
                Arrays.setAll(expected, i -> i);
                assertArrayEquals(expected, sorted, k + " over " + p);
            }
        }
    }

    /**
     * Sequential order under a linear gradient g x, x_p = (2p+1)/P - 1: the prefix sums are g (k^2/P - k) and the
     * endpoint INL peaks at mid-array with |g| (P^2 - 1) / (4P) elements (our derivation from the slot coordinates).
     */
    @Test
    void sequentialLinearGradientInlIsQuarterOfTheArray() {
        int bits = 6;
        double g = 0.02;
        GradientStudy study = GradientStudy.of(FieldCoding.of(bits, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(0.0).withLayout(new Gradient(g, 0.0), SequenceKind.SEQUENTIAL));
        int p = (1 << bits) - 1;
        SequenceRow seq = study.rows().get(0);
        assertEquals("sequential", seq.sequence());
        assertEquals(g * (p * (double) p - 1) / (4.0 * p), seq.linearEndpoint(), 1e-12);
    }

    @Test
    void mirroredTreeCancelsLinearGradientToOneElement() {
        int bits = 7;
        double g = 0.05;
        GradientStudy study = GradientStudy.of(FieldCoding.of(bits, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(0.0).withLayout(new Gradient(g, 0.0), SequenceKind.SEQUENTIAL));
        SequenceRow tree = study.rows().stream().filter(r -> r.sequence().equals("mirrored-tree")).findFirst()
                .orElseThrow();
        assertTrue(tree.linearEndpoint() <= g + 1e-12, "at most one edge element's error: " + tree.linearEndpoint());
    }

    @Test
    void optimisedSequenceImprovesOnSequentialAndTree() {
        for (int bits : new int[] {4, 6, 8}) {
            GradientStudy study = GradientStudy.of(FieldCoding.of(bits, CodingScheme.SEGMENTED, bits - 1),
                    ElementModel.ofUnitSigma(0.01).withLayout(new Gradient(0.01, 0.02), SequenceKind.SEQUENTIAL));
            SequenceRow seq = study.rows().get(0);
            SequenceRow opt = study.rows().stream().filter(r -> r.sequence().equals("optimised")).findFirst()
                    .orElseThrow();
            SequenceRow tree = study.rows().stream().filter(r -> r.sequence().equals("mirrored-tree")).findFirst()
                    .orElseThrow();
            assertTrue(opt.improvement() > 2.0, bits + " bits: improvement " + opt.improvement());
            // the search minimises |g1| L + |g2| Q, which bounds the combined INL
            double optBound = opt.linearEndpoint() + opt.quadraticEndpoint();
            double treeBound = tree.linearEndpoint() + tree.quadraticEndpoint();
            assertTrue(optBound <= treeBound + 1e-12, bits + " bits");
            assertTrue(seq.endpoint() > opt.endpoint());
        }
    }

    @Test
    void selectStringHasOnlyItsPhysicalOrder() {
        GradientStudy study = GradientStudy.of(FieldCoding.of(5, CodingScheme.ONE_HOT, 0),
                ElementModel.ofUnitSigma(0.01));
        assertEquals(1, study.rows().size());
        assertTrue(study.reference(), "no gradient in the model: the reference gradient is used");
    }
}
