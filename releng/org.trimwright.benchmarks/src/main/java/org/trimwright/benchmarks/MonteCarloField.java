package org.trimwright.benchmarks;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;

/**
 * The field of the Monte Carlo target (issue 4): 12 bits, segmented, 6 unary MSBs (63 unary elements) over 6 binary
 * LSBs, unsigned, 1 % unit relative sigma, no switch share, no gradient, sequential switching.
 */
final class MonteCarloField {

    static final int BITS = 12;
    static final int UNARY_BITS = 6;
    static final double UNIT_SIGMA = 0.01;
    static final long SEED = 20261201L;

    private MonteCarloField() {
    }

    static ElementArray array() {
        return ElementArray.of(FieldCoding.of(BITS, CodingScheme.SEGMENTED, UNARY_BITS),
                ElementModel.ofUnitSigma(UNIT_SIGMA));
    }
}
