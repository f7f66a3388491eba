package org.trimwright.engine.exact;

import java.util.SplittableRandom;

/**
 * An independent, deliberately plain sampler for the tests: draws every element, builds the value of every code of
 * the array (2^B codes per unary segment) and walks all steps. It shares no code with the engine.
 */
final class BruteForceArray {

    /** Counts of the events seen over the trials. */
    record Counts(long trials, long nonMonotonic, long dnlNominalPass, long dnlEndpointPass) {

        double nonMonotonicRate() {
            return nonMonotonic / (double) trials;
        }

        double nominalYield() {
            return dnlNominalPass / (double) trials;
        }

        double endpointYield() {
            return dnlEndpointPass / (double) trials;
        }
    }

    private BruteForceArray() {
    }

    /**
     * Runs {@code trials} arrays. Binary element k has mean binaryMeans[k] and sigma binarySigmas[k]; unary element j
     * mean unaryMeans[j]. A negative step counts as non-monotonic unless the step only switches one element on
     * (code 0 to 1 of a binary or segmented array, or any step of an array without binary part).
     */
    static Counts run(double[] binaryMeans, double[] binarySigmas, double[] unaryMeans, double[] unarySigmas,
            double dnlLimit, int trials, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int b = binaryMeans.length;
        int n = unaryMeans.length;
        int codes = (1 << b) * (n + 1);
        double[] w = new double[b];
        double[] u = new double[n];
        double[] value = new double[codes];
        long nonMonotonic = 0;
        long nominal = 0;
        long endpoint = 0;
        for (int trial = 0; trial < trials; trial++) {
            for (int k = 0; k < b; k++) {
                w[k] = binaryMeans[k] + binarySigmas[k] * random.nextGaussian();
            }
            for (int j = 0; j < n; j++) {
                u[j] = unaryMeans[j] + unarySigmas[j] * random.nextGaussian();
            }
            for (int code = 0; code < codes; code++) {
                int segment = code >> b;
                int low = code & ((1 << b) - 1);
                double v = 0.0;
                for (int j = 0; j < segment; j++) {
                    v += u[j];
                }
                for (int k = 0; k < b; k++) {
                    if ((low >> k & 1) == 1) {
                        v += w[k];
                    }
                }
                value[code] = v;
            }
            double lsb = (value[codes - 1] - value[0]) / (codes - 1);
            boolean negative = false;
            boolean nominalOk = true;
            boolean endpointOk = true;
            for (int code = 1; code < codes; code++) {
                double step = value[code] - value[code - 1];
                boolean onlySwitchesOn = b == 0 || code == 1;
                if (step < 0 && !onlySwitchesOn) {
                    negative = true;
                }
                if (Math.abs(step - 1.0) >= dnlLimit) {
                    nominalOk = false;
                }
                if (Math.abs(step / lsb - 1.0) >= dnlLimit) {
                    endpointOk = false;
                }
            }
            nonMonotonic += negative ? 1 : 0;
            nominal += nominalOk ? 1 : 0;
            endpoint += endpointOk ? 1 : 0;
        }
        return new Counts(trials, nonMonotonic, nominal, endpoint);
    }

    static Counts run(ElementSigmas sigmas, double dnlLimit, int trials, long seed) {
        ArrayElements a = ArrayElements.of(sigmas, null, null);
        return run(a.binaryMeans(), a.binarySigmas(), a.unaryMeans(), a.unarySigmas(), dnlLimit, trials, seed);
    }

    /** Half-width of a normal-approximation confidence interval for a proportion. */
    static double halfWidth(double p, long trials, double z) {
        return z * Math.sqrt(Math.max(p * (1 - p), 1.0 / trials) / trials);
    }
}
