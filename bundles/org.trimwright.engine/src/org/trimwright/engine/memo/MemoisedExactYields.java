package org.trimwright.engine.memo;

import java.util.Arrays;

import org.trimwright.engine.exact.ElementSigmas;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.exact.ExactYields;

/**
 * {@link ExactYields#monotonicity(ElementSigmas)} and {@link ExactYields#dnlYieldNominal(ElementSigmas, double)}
 * memoised by their exact inputs: the element sigmas (compared bit for bit) and the DNL limit. The recursions are
 * deterministic functions of these inputs, so a memoised answer is identical to a fresh one; fields of a spec that
 * share width, scheme, signed format and element sigma share one computation. Bounded to {@value #CAPACITY} keys
 * per figure.
 */
public final class MemoisedExactYields {

    /** Keys held per figure before the memo is cleared. */
    public static final int CAPACITY = 4096;

    private static final BoundedMemo<SigmaKey, ExactMonotonicity> MONOTONICITY = new BoundedMemo<>(CAPACITY);
    private static final BoundedMemo<DnlKey, ExactDnlYield> DNL = new BoundedMemo<>(CAPACITY);

    private MemoisedExactYields() {
    }

    /** As {@link ExactYields#monotonicity(ElementSigmas)}. */
    public static ExactMonotonicity monotonicity(ElementSigmas sigmas) {
        return MONOTONICITY.get(new SigmaKey(sigmas), k -> ExactYields.monotonicity(k.sigmas()));
    }

    /** As {@link ExactYields#dnlYieldNominal(ElementSigmas, double)}. */
    public static ExactDnlYield dnlYieldNominal(ElementSigmas sigmas, double limitLsb) {
        return DNL.get(new DnlKey(new SigmaKey(sigmas), Double.doubleToLongBits(limitLsb)),
                k -> ExactYields.dnlYieldNominal(k.sigmas().sigmas(), limitLsb));
    }

    /** Drops every memoised answer (for benchmarks that time the recursions). */
    public static void clear() {
        MONOTONICITY.clear();
        DNL.clear();
    }

    /** Element sigmas with value equality on the arrays (ElementSigmas, a record of arrays, compares identity). */
    static final class SigmaKey {
        private final ElementSigmas sigmas;
        private final int hash;

        SigmaKey(ElementSigmas sigmas) {
            this.sigmas = sigmas;
            this.hash = 31 * Arrays.hashCode(sigmas.binary()) + Arrays.hashCode(sigmas.unary());
        }

        ElementSigmas sigmas() {
            return sigmas;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof SigmaKey k && k.hash == hash && Arrays.equals(k.sigmas.binary(), sigmas.binary())
                    && Arrays.equals(k.sigmas.unary(), sigmas.unary());
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }

    private record DnlKey(SigmaKey sigmas, long limitBits) {
    }
}
