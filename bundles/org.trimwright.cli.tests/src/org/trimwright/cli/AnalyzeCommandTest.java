package org.trimwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** The analyze command's contract: options, exit codes and JSON keys (docs/analyze-json.md). Gson parses. */
class AnalyzeCommandTest {

    @TempDir
    Path dir;

    private static JsonObject json(String... args) {
        CliRunner.Result r = CliRunner.run(args);
        assertEquals(0, r.code(), r.err());
        return JsonParser.parseString(r.out()).getAsJsonObject();
    }

    @Test
    void segmentedSixBitFieldHasTheDocumentedKeysAndValues() {
        JsonObject o = json("analyze", "--bits", "6", "--coding", "segmented", "--unary-bits", "3", "--at-zero", "0A",
                "--step", "1uA", "--json");
        JsonArray codes = o.getAsJsonArray("codes");
        assertEquals(64, codes.size());
        for (int code = 0; code < 64; code++) {
            JsonObject row = codes.get(code).getAsJsonObject();
            assertEquals(code, row.get("code").getAsInt());
            assertEquals(code * 1e-6, row.get("value").getAsDouble(), 1e-15);
            // 3 binary LSB outputs + 7 thermometer outputs (output k on when the 3 MSBs > k): the definition
            // of segmentation in the issue text; outputs are written highest index first.
            String outputs = row.get("outputs").getAsString();
            assertEquals(10, outputs.length());
            int msb = code >> 3;
            for (int k = 0; k < 7; k++) {
                char expected = msb > k ? '1' : '0';
                assertEquals(expected, outputs.charAt(outputs.length() - 1 - (3 + k)), "code " + code + " u" + k);
            }
            for (int b = 0; b < 3; b++) {
                char expected = ((code >> b) & 1) == 1 ? '1' : '0';
                assertEquals(expected, outputs.charAt(outputs.length() - 1 - b), "code " + code + " b" + b);
            }
        }
        JsonObject cost = o.getAsJsonObject("cost");
        assertEquals(10, cost.get("switches").getAsInt());
        assertEquals(63, cost.get("unitElements").getAsInt());
        assertEquals(10, cost.get("decoderOutputs").getAsInt());
        assertTrue(cost.getAsJsonObject("gates").has("NAND2"));
        assertEquals(cost.get("transistors").getAsDouble() / 4, cost.get("nand2Equivalent").getAsDouble(), 1e-9);
        assertEquals(7, o.getAsJsonArray("costPerSplit").size());
        JsonObject glitch = o.getAsJsonObject("glitch");
        assertEquals(2, glitch.getAsJsonArray("worstTransition").size());
        assertTrue(glitch.get("worstExcursionLsb").getAsInt() > 0, "binary LSBs of a segmented field can glitch");
        assertTrue(o.get("verilog").getAsString().contains("module "));
        assertFalse(o.has("monotonic"), "no unit sigma: no statistics");
    }

    @ParameterizedTest
    @ValueSource(strings = {"binary", "thermometer", "one-hot", "one-cold", "gray", "segmented"})
    void everySchemeGetsTheStatisticsKeysWithAUnitSigma(String scheme) {
        java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of("analyze", "--bits", "5",
                "--coding", scheme, "--at-zero", "1.2V", "--step", "4mV", "--unit-sigma", "1", "--trials", "3000",
                "--json"));
        if (scheme.equals("segmented")) {
            args.addAll(java.util.List.of("--unary-bits", "2"));
        }
        JsonObject o = json(args.toArray(new String[0]));
        JsonObject mono = o.getAsJsonObject("monotonic");
        for (String k : new String[] {"guaranteed", "unionBound", "monteCarlo", "exact"}) {
            assertTrue(mono.has(k), k);
        }
        JsonObject mc = mono.getAsJsonObject("monteCarlo");
        for (String k : new String[] {"estimate", "ci95Low", "ci95High", "trials"}) {
            assertTrue(mc.has(k), k);
        }
        assertEquals(3000, mc.get("trials").getAsLong());
        JsonObject dnl = o.getAsJsonObject("dnl");
        for (String k : new String[] {"sigmaWorst", "worstTransition", "yield", "exactYield"}) {
            assertTrue(dnl.has(k), k);
        }
        for (String def : new String[] {"endpoint", "bestFit", "absolute"}) {
            JsonObject f = o.getAsJsonObject("inl").getAsJsonObject(def);
            for (String k : new String[] {"sigmaWorst", "meanMaxAbs", "yieldHalfLsb"}) {
                assertTrue(f.has(k), def + "." + k);
            }
        }
        assertTrue(o.has("segmentation") && o.has("sizing"));
        boolean byConstruction = !scheme.equals("binary") && !scheme.equals("gray") && !scheme.equals("segmented");
        assertEquals(byConstruction, mono.get("guaranteed").getAsBoolean(), scheme);
    }

    @Test
    void exactRiskNeverExceedsTheUnionBound() {
        JsonObject o = json("analyze", "--bits", "8", "--coding", "binary", "--at-zero", "0A", "--step", "1uA",
                "--unit-sigma", "5", "--trials", "20000", "--json");
        JsonObject mono = o.getAsJsonObject("monotonic");
        double exact = mono.getAsJsonObject("exact").get("probabilityNonMonotonic").getAsDouble();
        double err = mono.getAsJsonObject("exact").get("numericalError").getAsDouble();
        assertTrue(exact - err <= mono.get("unionBound").getAsDouble());
        assertTrue(exact + err >= mono.get("largestSingle").getAsDouble());
        JsonObject mc = mono.getAsJsonObject("monteCarlo");
        // the sampled figure's 99.9 % band must hold the exact one (95 % CI widened: common practice, no source)
        double halfWidth = (mc.get("ci95High").getAsDouble() - mc.get("ci95Low").getAsDouble()) / 2;
        assertEquals(exact, mc.get("estimate").getAsDouble(), 1.7 * halfWidth + 1e-12);
    }

    @Test
    void sameSeedGivesTheSameFiguresWithOneOrTwoThreads() {
        String[] base = {"analyze", "--bits", "10", "--coding", "segmented", "--unary-bits", "4", "--at-zero", "0A",
            "--step", "1uA", "--unit-sigma", "2", "--trials", "9000", "--seed", "7", "--json", "--threads"};
        JsonObject one = json(concat(base, "1"));
        JsonObject two = json(concat(base, "2"));
        assertEquals(one.get("dnl").toString(), two.get("dnl").toString());
        assertEquals(one.get("inl").toString(), two.get("inl").toString());
        assertEquals(one.getAsJsonObject("monotonic").get("monteCarlo").toString(),
                two.getAsJsonObject("monotonic").get("monteCarlo").toString());
    }

    private static String[] concat(String[] a, String b) {
        String[] r = java.util.Arrays.copyOf(a, a.length + 1);
        r[a.length] = b;
        return r;
    }

    @Test
    void specFieldIsAnalysedFromItsPath() throws Exception {
        Path demo = CliRunner.demo(dir);
        JsonObject o = json("analyze", demo.toString(), "OSC/OSC_TRIM/FREQ_FINE", "--trials", "2000", "--json");
        assertEquals("OSC/OSC_TRIM/FREQ_FINE", o.getAsJsonObject("field").get("path").getAsString());
        assertEquals("offset-binary", o.getAsJsonObject("field").get("signed").getAsString());
        assertTrue(o.has("sizing") && !o.get("sizing").isJsonNull());
    }

    @ParameterizedTest
    @ValueSource(strings = {"--bits 17 --coding binary --at-zero 0A --step 1uA",
        "--bits 4 --coding binery --at-zero 0A --step 1uA",
        "--bits 4 --coding segmented --at-zero 0A --step 1uA",
        "--bits 4 --coding binary --at-zero 0A --step 1uQ",
        "--bits 4 --coding binary --at-zero 1V --step 1uA",
        "--bits 4 --coding binary --at-zero 0A --step 1uA --frobnicate",
        "--bits 4 --coding binary --zero-state --at-zero 0A --step 1uA"})
    void badOptionsExitWithTwoAndNameTheProblem(String line) {
        String[] words = ("analyze " + line).split(" ");
        CliRunner.Result r = CliRunner.run(words);
        assertEquals(Main.USAGE, r.code(), r.out());
        assertTrue(r.err().startsWith("trimwright analyze: "), r.err());
    }

    @Test
    void unknownFieldPathAndUnreadableFileAreClear() throws Exception {
        Path demo = CliRunner.demo(dir);
        CliRunner.Result r = CliRunner.run("analyze", demo.toString(), "OSC/NOPE/X");
        assertEquals(Main.USAGE, r.code());
        assertTrue(r.err().contains("OSC/NOPE/X"), r.err());
        r = CliRunner.run("analyze", dir.resolve("missing.trimspec").toString(), "A/B/C");
        assertEquals(Main.UNREADABLE, r.code());
        assertTrue(r.err().contains("missing.trimspec"), r.err());
    }

    @Test
    void summaryPrintsEveryDemoField() {
        CliRunner.Result r = CliRunner.run("summary");
        assertEquals(0, r.code(), r.err());
        for (String f : new String[] {"VREF", "CURV", "VOUT_SEL", "ILIM", "FREQ_COARSE", "FREQ_FINE", "DIV_SEL",
            "IBIAS", "RBIAS", "CAL_OFFSET", "SAMPLE_TIME", "REF_SEL", "CAP_TRIM"}) {
            assertTrue(r.out().contains(f), f);
        }
    }
}
