package org.trimwright.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class SiValueTest {

    // Prefix factors from the SI Brochure, 9th edition (BIPM 2019), Table 7: f 1e-15, p 1e-12, n 1e-9,
    // micro 1e-6, m 1e-3, k 1e3, M 1e6, G 1e9.
    @ParameterizedTest
    @CsvSource({
        "1.2V, 1.2, VOLT",
        "4mV, 0.004, VOLT",
        "1.5uA, 1.5e-6, AMPERE",
        "1.5\u00B5A, 1.5e-6, AMPERE",
        "0A, 0, AMPERE",
        "10kOhm, 1e4, OHM",
        "10k\u03A9, 1e4, OHM",
        "2.5MHz, 2.5e6, HERTZ",
        "3ns, 3e-9, SECOND",
        "1pF, 1e-12, FARAD",
        "2fF, 2e-15, FARAD",
        "1GHz, 1e9, HERTZ",
        "0.5%, 0.5, PERCENT",
        "0.25, 0.25, NONE",
        "-4 mV, -0.004, VOLT",
        "1e-3A, 0.001, AMPERE",
    })
    void parsesNumberPrefixAndUnit(String text, double value, SiUnit unit) {
        SiValue v = SiValue.parse(text);
        assertEquals(value, v.value(), Math.abs(value) * 1e-12);
        assertEquals(unit, v.unit());
    }

    @ParameterizedTest
    @CsvSource({"1.2V", "4mV", "1.5uA", "0A", "10kOhm", "2.5MHz", "3ns", "1pF", "0.5%", "250mV", "-8uA"})
    void formatsBackToTheSameText(String text) {
        assertEquals(text, SiValue.parse(text).format());
    }

    @Test
    void formatChoosesEngineeringPrefix() {
        assertEquals("999.5mV", SiValue.format(0.9995, SiUnit.VOLT));
        assertEquals("1V", SiValue.format(0.99999, SiUnit.VOLT));
        assertEquals("12.35kOhm", SiValue.format(12345, SiUnit.OHM));
    }

    @ParameterizedTest
    @CsvSource({"abc", "1.2X", "V", "1..2V", "mV", "1.2 kk V"})
    void badTextGivesMessageNamingIt(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SiValue.parse(text));
        assertTrue(e.getMessage().contains(text), e.getMessage());
    }
}
