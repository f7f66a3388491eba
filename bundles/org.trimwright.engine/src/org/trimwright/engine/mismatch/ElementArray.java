package org.trimwright.engine.mismatch;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.sequence.SequenceKind;
import org.trimwright.engine.mismatch.sequence.SwitchingSequences;

/**
 * The analog element array behind a field, in one structural form shared by every scheme: {@code unaryCount}
 * unary elements of W = 2^B units each (the thermometer part, in switching order) over B binary-weighted elements of
 * 2^j units. Magnitude level L = u W + r (u unary elements on, r the binary code) has the value
 * V(L) = sum_{i&lt;u} U_i + sum_j bit_j(r) b_j, for L = 0..N, N = 2^(M+B) - 1.
 * <ul>
 * <li>binary and Gray: M = 0, B = n (Gray decodes to binary first; ordering by level is the same);</li>
 * <li>thermometer: M = n, B = 0; one-hot / one-cold taps: a string of 2^n - 1 unit segments, tap value = partial
 * sum, i.e. the same array with the fixed sequential order (monotonic by construction);</li>
 * <li>segmented: M unary bits over B = n - M binary bits;</li>
 * <li>offset binary and two's complement: the same unsigned array ordered by signed value (two's complement is the
 * offset-binary array with the MSB drive inverted; the centring offset is nominal);</li>
 * <li>sign-magnitude: the (n-1)-bit magnitude array used for both signs through an ideal polarity switch:
 * V(-m) = -V(m); both zero codes give 0 (treated as one level).</li>
 * </ul>
 * Active-low drive inverts the switch controls only and changes no statistics.
 */
public final class ElementArray {

    private final FieldCoding coding;
    private final int unaryBits;
    private final int binaryBits;
    private final int unaryCount;
    private final boolean signMagnitude;
    private final boolean select;
    private final int[] sequence;
    private final double[] unaryMean;
    private final double unarySigma;
    private final double[] binaryMean;
    private final double[] binarySigma;

    private ElementArray(FieldCoding coding, int unaryBits, int binaryBits, ElementModel model, int[] givenSequence) {
        this.coding = coding;
        this.unaryBits = unaryBits;
        this.binaryBits = binaryBits;
        this.unaryCount = (1 << unaryBits) - 1;
        this.signMagnitude = coding.signedFormat() == SignedFormat.SIGN_MAGNITUDE;
        this.select = coding.scheme().isSelect();
        double w = 1 << binaryBits;
        if (givenSequence != null && !select) {
            boolean[] seen = new boolean[unaryCount];
            if (givenSequence.length != unaryCount) {
                throw new IllegalArgumentException("sequence must have " + unaryCount + " slots");
            }
            for (int slot : givenSequence) {
                if (slot < 0 || slot >= unaryCount || seen[slot]) {
                    throw new IllegalArgumentException("sequence must be a permutation of 0.." + (unaryCount - 1));
                }
                seen[slot] = true;
            }
            this.sequence = givenSequence.clone();
        } else {
            this.sequence = SwitchingSequences.build(select ? SequenceKind.SEQUENTIAL : model.sequence(), unaryCount,
                    model.gradient());
        }
        this.unaryMean = new double[unaryCount];
        for (int i = 0; i < unaryCount; i++) {
            double x = Gradient.coordinate(sequence[i], unaryCount);
            unaryMean[i] = w * (1.0 + model.gradient().relativeError(x));
        }
        this.unarySigma = Math.sqrt(model.elementVariance(w));
        this.binaryMean = new double[binaryBits];
        this.binarySigma = new double[binaryBits];
        for (int j = 0; j < binaryBits; j++) {
            binaryMean[j] = 1 << j;
            binarySigma[j] = Math.sqrt(model.elementVariance(1 << j));
        }
    }

    /** The array of {@code coding} with the mismatch of {@code model}. */
    public static ElementArray of(FieldCoding coding, ElementModel model) {
        return of(coding, model, null);
    }

    /**
     * The array with a given unary switching sequence ({@code sequence[i]} = slot of the i-th switched element;
     * null: the model's sequence). Select strings keep their physical order.
     */
    public static ElementArray of(FieldCoding coding, ElementModel model, int[] sequence) {
        int n = coding.signedFormat() == SignedFormat.SIGN_MAGNITUDE ? coding.bits() - 1 : coding.bits();
        int m;
        CodingScheme scheme = coding.scheme();
        switch (scheme) {
            case BINARY:
            case GRAY:
                m = 0;
                break;
            case THERMOMETER:
            case ONE_HOT:
            case ONE_COLD:
                m = n;
                break;
            case SEGMENTED:
                m = Math.min(coding.unaryBits(), n);
                break;
            default:
                throw new IllegalStateException(scheme.name());
        }
        return new ElementArray(coding, m, n - m, model, sequence);
    }

    public FieldCoding coding() {
        return coding;
    }

    /** M, unary bits of the magnitude array. */
    public int unaryBits() {
        return unaryBits;
    }

    /** B, binary bits of the magnitude array. */
    public int binaryBits() {
        return binaryBits;
    }

    /** 2^M - 1 unary elements. */
    public int unaryCount() {
        return unaryCount;
    }

    /** W = 2^B, units per unary element. */
    public int unaryWeight() {
        return 1 << binaryBits;
    }

    /** N, the top magnitude level: 2^(M+B) - 1. */
    public int topLevel() {
        return (1 << (unaryBits + binaryBits)) - 1;
    }

    /** True for sign-magnitude (mirrored magnitude array). */
    public boolean signMagnitude() {
        return signMagnitude;
    }

    /** True for one-hot / one-cold taps on a string. */
    public boolean select() {
        return select;
    }

    /** Monotonic by construction: every step adds one non-negative element (unary, thermometer and select taps). */
    public boolean monotonicByConstruction() {
        return binaryBits == 0;
    }

    /** Slot of the i-th switched unary element. */
    public int[] sequence() {
        return sequence.clone();
    }

    /** Mean value (units) of unary element i (switching order), gradient included. */
    public double unaryMean(int i) {
        return unaryMean[i];
    }

    /** Absolute sigma (units) of every unary element. */
    public double unarySigma() {
        return unarySigma;
    }

    /** Mean value (units) of binary element j: 2^j. */
    public double binaryMean(int j) {
        return binaryMean[j];
    }

    /** Absolute sigma (units) of binary element j. */
    public double binarySigma(int j) {
        return binarySigma[j];
    }

    /** Number of random elements drawn per trial: unary elements plus binary bits. */
    public int elementCount() {
        return unaryCount + binaryBits;
    }

    /** Fills {@code unary} and {@code binary} with the mean (systematic) element values. */
    public void meanValues(double[] unary, double[] binary) {
        System.arraycopy(unaryMean, 0, unary, 0, unaryCount);
        System.arraycopy(binaryMean, 0, binary, 0, binaryBits);
    }
}
