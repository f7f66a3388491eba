package org.trimwright.engine.exact;

/**
 * Element means and sigmas (units, 1 unit = nominal LSB) of a binary-weighted or segmented array whose elements
 * also carry systematic errors (for example linear or quadratic gradients over the array). Element k of the binary
 * part has mean binaryMeans[k] (nominally 2^k); unary element j, in switching order, has mean unaryMeans[j]
 * (nominally 2^B). Random errors are independent Gaussians with the given sigmas.
 *
 * @param binaryMeans  means of the B binary elements, LSB first
 * @param binarySigmas their sigmas
 * @param unaryMeans   means of the unary elements in the order they switch on
 * @param unarySigmas  their sigmas
 */
public record ArrayElements(double[] binaryMeans, double[] binarySigmas, double[] unaryMeans, double[] unarySigmas) {

    public ArrayElements {
        if (binaryMeans.length != binarySigmas.length || unaryMeans.length != unarySigmas.length) {
            throw new IllegalArgumentException("each element needs one mean and one sigma");
        }
        binaryMeans = binaryMeans.clone();
        binarySigmas = binarySigmas.clone();
        unaryMeans = unaryMeans.clone();
        unarySigmas = unarySigmas.clone();
    }

    /**
     * Nominal means (2^k and 2^B) plus the given systematic offsets (units; {@code null} for none), with the random
     * sigmas of {@code sigmas}.
     */
    public static ArrayElements of(ElementSigmas sigmas, double[] binaryOffsets, double[] unaryOffsets) {
        int b = sigmas.binaryCount();
        int n = sigmas.unaryCount();
        double[] bm = new double[b];
        double[] um = new double[n];
        for (int k = 0; k < b; k++) {
            bm[k] = (double) (1L << k) + (binaryOffsets == null ? 0.0 : binaryOffsets[k]);
        }
        for (int j = 0; j < n; j++) {
            um[j] = (double) (1L << b) + (unaryOffsets == null ? 0.0 : unaryOffsets[j]);
        }
        return new ArrayElements(bm, sigmas.binary(), um, sigmas.unary());
    }

    public int binaryCount() {
        return binaryMeans.length;
    }

    public int unaryCount() {
        return unaryMeans.length;
    }

    @Override
    public double[] binaryMeans() {
        return binaryMeans.clone();
    }

    @Override
    public double[] binarySigmas() {
        return binarySigmas.clone();
    }

    @Override
    public double[] unaryMeans() {
        return unaryMeans.clone();
    }

    @Override
    public double[] unarySigmas() {
        return unarySigmas.clone();
    }
}
