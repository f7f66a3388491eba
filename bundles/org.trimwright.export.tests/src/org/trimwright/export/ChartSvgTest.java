package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.trimwright.export.doc.ChartSvg;

/** The fixed-decimal number format of the SVG charts. */
class ChartSvgTest {

    @Test
    void fixedDecimalsMatchJdkBigDecimalRounding() {
        // reference: java.math.BigDecimal HALF_UP rounding of the exact binary value, trailing zeros stripped (random
        // doubles: a product within one ulp of a tie, where the double multiplication could differ, is ~1e-12 likely)
        SplittableRandom rnd = new SplittableRandom(3);
        for (int i = 0; i < 20_000; i++) {
            double v = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(-3, 7));
            for (int digits = 0; digits <= 4; digits++) {
                BigDecimal ref = new BigDecimal(v).setScale(digits, RoundingMode.HALF_UP)
                        .stripTrailingZeros();
                String expected = ref.signum() == 0 ? "0" : ref.toPlainString();
                assertEquals(expected, ChartSvg.fixed(v, digits), v + " to " + digits);
            }
        }
    }

    @Test
    void nonFiniteAndHugeValuesFallBackToJavaFormat() {
        assertEquals("NaN", ChartSvg.fixed(Double.NaN, 2));
        assertEquals("1.0E15", ChartSvg.fixed(1e15, 2));
        assertTrue(ChartSvg.fixed(-0.001, 2).equals("0"), "negative values rounding to zero print as 0");
    }
}
