package org.trimwright.engine.exact;

import java.util.Arrays;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;

/**
 * Absolute standard deviations, in units (1 unit = 1 nominal LSB), of the independent Gaussian element errors of a
 * binary-weighted or segmented array.
 * <p>
 * Binary element k (k = 0 .. B-1) has nominal value 2^k units and error sigma {@code binary[k]}; each of the
 * unary elements has nominal value 2^B units and error sigma {@code unary[j]}. With a unit relative sigma s_u an
 * element of k units has sigma sqrt(k) s_u (independent units); a source-side switch adds its own independent share
 * in quadrature. Elements are independent; systematic gradients are outside this model (see
 * {@link HalfSpaceUnionSampler}).
 *
 * @param binary sigmas of the B binary elements, LSB first (may be empty)
 * @param unary  sigmas of the unary elements (2^M - 1 of them for a segmented field; may be empty)
 */
public record ElementSigmas(double[] binary, double[] unary) {

    public ElementSigmas {
        binary = binary.clone();
        unary = unary.clone();
        for (double s : binary) {
            check(s);
        }
        for (double s : unary) {
            check(s);
        }
        if (binary.length > 30) {
            throw new IllegalArgumentException("at most 30 binary elements, got " + binary.length);
        }
    }

    private static void check(double s) {
        if (!(s >= 0.0) || Double.isInfinite(s)) {
            throw new IllegalArgumentException("element sigma must be finite and >= 0, got " + s);
        }
    }

    /**
     * Sigmas of a field with unit relative sigma {@code unitSigma} (fraction of one unit, e.g. 0.01 for 1%):
     * binary element k gets sqrt(2^k) unitSigma, a unary element sqrt(2^B) unitSigma. Binary and Gray fields have
     * B = bits and no unary elements; segmented fields B = bits - M binary and 2^M - 1 unary elements; thermometer
     * fields 2^bits - 1 unary elements of one unit.
     */
    public static ElementSigmas forField(FieldCoding coding, double unitSigma) {
        return forField(coding, unitSigma, 0.0);
    }

    /**
     * As {@link #forField(FieldCoding, double)}, with every element's switch adding an independent absolute sigma
     * {@code switchSigma} (units) in quadrature (source-side switches).
     */
    public static ElementSigmas forField(FieldCoding coding, double unitSigma, double switchSigma) {
        int b;
        int unaryCount;
        CodingScheme scheme = coding.scheme();
        if (scheme == CodingScheme.BINARY || scheme == CodingScheme.GRAY) {
            b = coding.bits();
            unaryCount = 0;
        } else if (scheme == CodingScheme.SEGMENTED) {
            b = coding.bits() - coding.unaryBits();
            unaryCount = (1 << coding.unaryBits()) - 1;
        } else if (scheme == CodingScheme.THERMOMETER) {
            b = 0;
            unaryCount = (1 << coding.bits()) - 1;
        } else {
            throw new IllegalArgumentException("select decoders (" + scheme.key()
                    + ") pick one tap; they have no summed elements");
        }
        double[] binary = new double[b];
        for (int k = 0; k < b; k++) {
            binary[k] = Math.sqrt((double) (1L << k) * unitSigma * unitSigma + switchSigma * switchSigma);
        }
        double[] unary = new double[unaryCount];
        Arrays.fill(unary, Math.sqrt((double) (1L << b) * unitSigma * unitSigma + switchSigma * switchSigma));
        return new ElementSigmas(binary, unary);
    }

    /** B, the number of binary elements. */
    public int binaryCount() {
        return binary.length;
    }

    /** The number of unary elements. */
    public int unaryCount() {
        return unary.length;
    }

    /** True when every element sigma is exactly zero (a deterministic array). */
    public boolean allZero() {
        for (double s : binary) {
            if (s != 0.0) {
                return false;
            }
        }
        for (double s : unary) {
            if (s != 0.0) {
                return false;
            }
        }
        return true;
    }

    /** True when some but not all sigmas are zero. */
    boolean mixedZero() {
        boolean any = false;
        for (double s : binary) {
            any |= s == 0.0;
        }
        for (double s : unary) {
            any |= s == 0.0;
        }
        return any && !allZero();
    }

    @Override
    public double[] binary() {
        return binary.clone();
    }

    @Override
    public double[] unary() {
        return unary.clone();
    }

    double binarySigma(int k) {
        return binary[k];
    }

    double unarySigma(int j) {
        return unary[j];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ElementSigmas other && Arrays.equals(binary, other.binary)
                && Arrays.equals(unary, other.unary);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(binary) + Arrays.hashCode(unary);
    }

    @Override
    public String toString() {
        return "ElementSigmas[binary=" + Arrays.toString(binary) + ", unary=" + unary.length + " x "
                + (unary.length > 0 ? unary[0] : 0.0) + "]";
    }
}
