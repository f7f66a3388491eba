package org.trimwright.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Against the JDK's own {@code java.util.Formatter} (the reference), digit for digit. */
class SignificantTest {

    private static final double[] EDGES = {0.0, -0.0, 1, -1, 9.9995, 9.9994999, 99995, 9999.5, 9999.4, 1e-4, 9.9995e-5,
        0.00009999, 0.000099995, 1e4, 1e-5, 123456789, 5e-324, Double.MAX_VALUE, Double.MIN_NORMAL, 0.5, 0.05, 0.00015,
        1.0005, 1.00049999, 2.675, 1.235e-7, 1e100, -3.14159e-300, 0.1 + 0.2, 1e21, 1e22, 4.35e-178, 2.126e-140,
        Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};

    private static void check(double v) {
        for (int p = 1; p <= 6; p++) {
            assertEquals(String.format(Locale.ROOT, "%." + p + "g", v), Significant.general(v, p), "%." + p + "g of " + v);
        }
        for (int d = 0; d <= 5; d++) {
            assertEquals(String.format(Locale.ROOT, "%." + d + "e", v), Significant.scientific(v, d),
                    "%." + d + "e of " + v);
        }
    }

    @Test
    void edgeCasesAsFormatterWritesThem() {
        for (double v : EDGES) {
            check(v);
            check(-v);
        }
    }

    @Test
    void randomValuesOfEveryMagnitudeAsFormatterWritesThem() {
        Random rnd = new Random(11);
        for (int i = 0; i < 60_000; i++) {
            double v = Math.pow(10, rnd.nextInt(40) - 20) * rnd.nextDouble() * (rnd.nextBoolean() ? 1 : -1);
            check(v);
        }
        // values with few digits, where half-up ties decide (e.g. 1.2345)
        for (int i = 0; i < 40_000; i++) {
            double v = (rnd.nextInt(2_000_000) - 1_000_000) / Math.pow(10, rnd.nextInt(12));
            check(v);
        }
    }
}
