package org.trimwright.engine.rtl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.units.SiUnit;

/**
 * Simulates the emitted behavioural and gate-level modules with Icarus Verilog (iverilog -g2005, vvp) against
 * the self-checking testbench built from the step table.
 */
class VerilogSimulationTest {

    static Stream<FieldCoding> cases() {
        return RtlCases.all().stream();
    }

    @ParameterizedTest
    @MethodSource("cases")
    void emittedModulesMatchTheStepTableInIcarusVerilog(FieldCoding coding, @TempDir Path dir) throws Exception {
        ExternalTools.require("iverilog");
        ExternalTools.require("vvp");
        GateLibrary lib = coding.bits() % 2 == 0 ? GateLibrary.TWO_INPUT : GateLibrary.THREE_INPUT;
        CodingReport r = CodingAnalysis.analyze(RtlCases.name(coding), coding, 0, 1, SiUnit.VOLT, lib);
        Files.writeString(dir.resolve("dec.v"), r.verilog());
        Files.writeString(dir.resolve("gates.v"), r.gateVerilog());
        Files.writeString(dir.resolve("tb.v"), r.testbench());
        ExternalTools.Result compile = ExternalTools.run(dir, List.of("iverilog", "-g2005", "-o", "sim", "tb.v",
                "dec.v", "gates.v"));
        assertEquals(0, compile.exit(), compile.output());
        ExternalTools.Result sim = ExternalTools.run(dir, List.of("vvp", "-n", "sim"));
        assertEquals(0, sim.exit(), sim.output());
        assertFalse(sim.output().contains("FAIL"), sim.output());
        assertTrue(sim.output().contains("PASS " + r.moduleName() + "_tb: " + coding.codeCount() + " codes"),
                sim.output());
    }
}
