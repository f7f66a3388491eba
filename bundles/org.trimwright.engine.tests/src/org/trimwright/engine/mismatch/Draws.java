package org.trimwright.engine.mismatch;

import org.trimwright.engine.mismatch.montecarlo.GaussianSource;
import org.trimwright.engine.mismatch.montecarlo.TrialSampler;

/** Test helper: draws trials of an array into reusable buffers. */
final class Draws {
    final ElementArray array;
    final double[] unary;
    final double[] binary;
    private final TrialSampler sampler;
    private final GaussianSource gauss;

    Draws(ElementArray array, long seed) {
        this.array = array;
        this.unary = new double[array.unaryCount()];
        this.binary = new double[array.binaryBits()];
        this.sampler = new TrialSampler(array);
        this.gauss = new GaussianSource(seed);
    }

    void next() {
        sampler.draw(gauss, unary, binary);
    }

    /** Magnitude transfer V(L), L = 0..N, by direct summation. */
    double[] magnitudeTransfer() {
        int w = array.unaryWeight();
        double[] v = new double[array.topLevel() + 1];
        for (int level = 0; level < v.length; level++) {
            int u = level / w;
            int r = level % w;
            double s = 0;
            for (int i = 0; i < u; i++) {
                s += unary[i];
            }
            for (int j = 0; j < binary.length; j++) {
                if ((r >> j & 1) == 1) {
                    s += binary[j];
                }
            }
            v[level] = s;
        }
        return v;
    }
}
