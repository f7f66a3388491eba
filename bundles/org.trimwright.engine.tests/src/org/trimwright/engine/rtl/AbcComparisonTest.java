package org.trimwright.engine.rtl;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.units.SiUnit;

/**
 * Compares our decoder cost with yosys + abc on the same function: the behavioural module synthesised with
 * {@code synth -top M; abc -g cmos2; stat -tech cmos} (abc maps to NOT/NAND2/NOR2, the same gate set as ours;
 * stat -tech cmos counts transistors with the same per-gate figures). Ours is counted without local input
 * buffers, since abc reads the inputs directly too. Table in docs/decoder-cost-vs-abc.md.
 */
class AbcComparisonTest {

    static final String SCRIPT = "read_verilog dec.v; synth -top %s; abc -g cmos2; tee -o stat.txt stat -tech cmos";
    private static final Pattern TRANSISTORS = Pattern.compile("Estimated number of transistors:\\s*(\\d+)");

    @ParameterizedTest
    @CsvSource({"one-hot, 3", "one-hot, 4", "one-hot, 5", "one-hot, 6", "one-hot, 7", "one-hot, 8",
        "thermometer, 3", "thermometer, 4", "thermometer, 5", "thermometer, 6", "thermometer, 7", "thermometer, 8"})
    void ourDecoderIsNoLargerThanAbc(String scheme, int bits, @TempDir Path dir) throws Exception {
        ExternalTools.require("yosys");
        FieldCoding coding = FieldCoding.of(bits, CodingScheme.fromKey(scheme), 0);
        CodingReport r = CodingAnalysis.analyze("dec", coding, 0, 1, SiUnit.VOLT, new GateLibrary(2, false));
        Files.writeString(dir.resolve("dec.v"), r.verilog());
        ExternalTools.Result res = ExternalTools.run(dir, List.of("yosys", "-q", "-p",
                String.format(SCRIPT, r.moduleName())));
        assertTrue(res.exit() == 0, res.output());
        Matcher m = TRANSISTORS.matcher(Files.readString(dir.resolve("stat.txt")));
        assertTrue(m.find(), "no transistor count in yosys stat output");
        int abc = Integer.parseInt(m.group(1));
        int ours = r.cost().transistors();
        System.out.printf("| %s | %d | %d | %.1f | %d | %.1f |%n", scheme, bits, ours, ours / 4.0, abc, abc / 4.0);
        assertTrue(ours <= abc, scheme + " " + bits + " bits: ours " + ours + " transistors, abc " + abc);
    }
}
