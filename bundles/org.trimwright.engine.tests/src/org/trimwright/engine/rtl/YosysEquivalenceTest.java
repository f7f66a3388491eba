package org.trimwright.engine.rtl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.units.SiUnit;

/**
 * Proves with yosys (miter -equiv + sat -verify -prove trigger 0, a SAT proof over all inputs) that the emitted
 * gate netlist computes the same function as the behavioural module.
 */
class YosysEquivalenceTest {

    static final String SCRIPT = "read_verilog dec.v gates.v; proc; miter -equiv -flatten -make_outputs %s %s miter;"
            + " hierarchy -top miter; sat -verify -prove trigger 0 miter";

    static Stream<FieldCoding> cases() {
        return RtlCases.all().stream();
    }

    private static ExternalTools.Result prove(Path dir, String behavioural, String gates, String a, String b)
            throws Exception {
        Files.writeString(dir.resolve("dec.v"), behavioural);
        Files.writeString(dir.resolve("gates.v"), gates);
        return ExternalTools.run(dir, List.of("yosys", "-q", "-p", String.format(SCRIPT, a, b)));
    }

    @ParameterizedTest
    @MethodSource("cases")
    void gateNetlistIsEquivalentToBehaviouralModule(FieldCoding coding, @TempDir Path dir) throws Exception {
        ExternalTools.require("yosys");
        GateLibrary lib = coding.bits() % 2 == 1 ? GateLibrary.TWO_INPUT : GateLibrary.THREE_INPUT;
        CodingReport r = CodingAnalysis.analyze(RtlCases.name(coding), coding, 0, 1, SiUnit.VOLT, lib);
        ExternalTools.Result res = prove(dir, r.verilog(), r.gateVerilog(), r.moduleName(), r.gateModuleName());
        assertEquals(0, res.exit(), res.output());
    }

    @Test
    void proofRejectsANetlistWithOneWrongGate(@TempDir Path dir) throws Exception {
        ExternalTools.require("yosys");
        FieldCoding coding = FieldCoding.of(4, CodingScheme.ONE_HOT, 0);
        CodingReport r = CodingAnalysis.analyze("wrong", coding, 0, 1, SiUnit.VOLT, GateLibrary.TWO_INPUT);
        String gates = r.gateVerilog();
        int at = gates.lastIndexOf("    nor ");
        assertTrue(at > 0);
        String broken = gates.substring(0, at) + "    nand" + gates.substring(at + "    nor".length());
        ExternalTools.Result res = prove(dir, r.verilog(), broken, r.moduleName(), r.gateModuleName());
        assertTrue(res.exit() != 0, "a wrong gate must fail the proof: " + res.output());
    }
}
