package org.trimwright.engine.rtl;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class VerilogNamesTest {

    // Identifier rules and keywords from IEEE Std 1364-2005, clause 3.7 and Annex B.
    @ParameterizedTest
    @CsvSource({
        "bias_trim, bias_trim",
        "module, module_",
        "wire, wire_",
        "3v3_trim, f_3v3_trim",
        "LDO/VREF.trim, LDO_VREF_trim",
        "'a b-c', a_b_c",
        "\u00B5trim, _trim",
        "'', f_",
    })
    void sanitisesToLegalIdentifier(String in, String out) {
        assertEquals(out, VerilogNames.sanitise(in));
    }
}
