package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.Random;

import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.NumberTickUnitSource;
import org.jfree.chart.axis.TickUnit;
import org.junit.jupiter.api.Test;

/** Tick labels against JFreeChart's own tick units, which format with the JDK's DecimalFormat (the reference). */
class FastTickUnitsTest {

    @Test
    void sameUnitsAndSameLabelsAsJFreeChartsSource() {
        for (boolean integers : new boolean[] {false, true}) {
            NumberTickUnitSource reference = new NumberTickUnitSource(integers);
            FastTickUnits fast = new FastTickUnits(new NumberTickUnitSource(integers));
            Random rnd = new Random(3);
            for (int i = 0; i < 4000; i++) {
                double size = Math.pow(10, rnd.nextDouble() * 14 - 6);
                NumberTickUnit r = (NumberTickUnit) reference.getCeilingTickUnit(size);
                NumberTickUnit f = (NumberTickUnit) fast.getCeilingTickUnit(size);
                assertEquals(r.getSize(), f.getSize(), "size for " + size);
                assertEquals(r.getMinorTickCount(), f.getMinorTickCount());
                TickUnit rl = reference.getLargerTickUnit(r);
                TickUnit fl = fast.getLargerTickUnit(f);
                assertEquals(rl.getSize(), fl.getSize(), "larger unit after " + r.getSize());
                for (int k = -40; k <= 40; k++) {
                    // tick values as an axis computes them: a multiple of the size, with floating-point noise
                    double v = (k + 0.1 * Math.floor(rnd.nextDouble() * 3)) * r.getSize() + r.getSize() * 1e-12
                            * rnd.nextGaussian();
                    String expected = r.valueToString(v);
                    if (expected.matches("-0[.,]?0*")) {
                        // DecimalFormat keeps the minus of a value that rounds to zero; ours prints plain zero
                        expected = expected.substring(1);
                    }
                    assertEquals(expected, f.valueToString(v), "value " + v + " at size " + r.getSize());
                }
            }
        }
    }

    @Test
    void scientificUnitsAreLeftAsTheyAre() {
        NumberTickUnit big = new NumberTickUnit(5e8, new java.text.DecimalFormat("0.0E0"));
        assertSame(big, FastTickUnits.fast(big));
    }
}
