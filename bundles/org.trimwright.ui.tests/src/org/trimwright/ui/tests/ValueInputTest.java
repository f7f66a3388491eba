package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.ui.internal.editor.ValueInput;
import org.trimwright.ui.internal.editor.ValueInput.Kind;

/** Number boxes read SI prefixes and units and explain what they refuse. */
class ValueInputTest {

    // Prefix values m = 1e-3, u (micro) = 1e-6, k = 1e3: SI Brochure (BIPM, 9th edition), table of SI prefixes.
    @Test
    void unitBoxesReadSiPrefixes() {
        assertEquals(0.004, ValueInput.parse("Step", "4mV", Kind.UNIT, SiUnit.VOLT), 1e-18);
        assertEquals(1.5e-6, ValueInput.parse("Step", "1.5uA", Kind.UNIT, SiUnit.AMPERE), 1e-21);
        assertEquals(10_000.0, ValueInput.parse("Step", "10k", Kind.UNIT, SiUnit.OHM), 1e-9);
        assertEquals(0.25, ValueInput.parse("Step", "0.25", Kind.UNIT, SiUnit.VOLT), 0.0);
    }

    @Test
    void unitBoxRefusesAnotherUnitNamingBoth() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ValueInput.parse("Step", "4mA", Kind.UNIT, SiUnit.VOLT));
        assertTrue(e.getMessage().startsWith("Step: '4mA' is in A"), e.getMessage());
        assertTrue(e.getMessage().contains("in V"), e.getMessage());
    }

    @Test
    void fractionBoxesTakePercentages() {
        assertEquals(0.99, ValueInput.parse("Target yield", "99%", Kind.FRACTION, SiUnit.NONE), 1e-15);
        assertEquals(0.999, ValueInput.parse("Target yield", "0.999", Kind.FRACTION, SiUnit.NONE), 0.0);
    }

    @Test
    void integerBoxesReadHexAndRefuseText() {
        assertEquals(12, ValueInput.parse("Offset", "0x0C", Kind.INTEGER, SiUnit.NONE), 0.0);
        assertThrows(IllegalArgumentException.class, () -> ValueInput.parse("Offset", "twelve", Kind.INTEGER,
                SiUnit.NONE));
    }

    @Test
    void formattedValuesReadBackUnchanged() {
        for (double v : new double[] {0.002, 5e-8, 250.0, 12e6, 0.0015}) {
            String text = ValueInput.format(v, Kind.UNIT, SiUnit.VOLT);
            assertEquals(v, ValueInput.parse("x", text, Kind.UNIT, SiUnit.VOLT), Math.abs(v) * 1e-3, text);
        }
    }
}
