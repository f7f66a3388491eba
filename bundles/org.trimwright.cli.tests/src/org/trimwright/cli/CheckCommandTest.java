package org.trimwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.ElementPaths;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

class CheckCommandTest {

    @TempDir
    Path dir;

    /** The demo with only the given blocks kept. */
    private Path demoWith(String... blocks) throws IOException {
        ChipSpec spec = DemoSpec.load();
        Set<String> keep = Set.of(blocks);
        spec.getBlocks().removeIf((Block b) -> !keep.contains(b.getName()));
        return CliRunner.save(spec, dir.resolve("part.trimspec"));
    }

    @Test
    void demoHasErrorsAndExitsWithTwo() throws IOException {
        CliRunner.Result r = CliRunner.run("check", CliRunner.demo(dir).toString());
        assertEquals(CheckCommand.ERRORS, r.code(), r.err());
        assertTrue(r.out().contains("4 errors, 2 warnings in 15 fields"), r.out());
        assertTrue(r.out().contains("OSC/OSC_TRIM/FREQ_COARSE  [linearity.non-monotonic-risk]"), r.out());
    }

    @Test
    void jsonListsEveryFindingWithTheDocumentedKeys() throws IOException {
        CliRunner.Result r = CliRunner.run("check", CliRunner.demo(dir).toString(), "--json");
        assertEquals(2, r.code());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals(4, o.get("errors").getAsInt());
        assertEquals(2, o.get("warnings").getAsInt());
        assertEquals(2, o.get("exitCode").getAsInt());
        assertEquals(2000, o.get("trials").getAsLong());
        JsonArray fs = o.getAsJsonArray("findings");
        assertEquals(6, fs.size());
        Set<String> paths = new HashSet<>();
        for (JsonElement e : fs) {
            JsonObject f = e.getAsJsonObject();
            for (String key : new String[] {"severity", "rule", "path", "message", "advice", "figures"}) {
                assertTrue(f.has(key), key + " in " + f);
            }
            paths.add(f.get("path").getAsString());
        }
        assertEquals(Set.of("OSC/OSC_TRIM/FREQ_COARSE", "ADC/ADC_CAL/CAL_OFFSET", "LDO/LDO_CFG/VOUT_SEL"), paths);
    }

    @Test
    void cleanSpecExitsWithZero() throws IOException {
        CliRunner.Result r = CliRunner.run("check", demoWith("REF", "BIAS").toString(), "--strict");
        assertEquals(0, r.code(), r.out());
        assertTrue(r.out().contains("0 errors, 0 warnings"), r.out());
    }

    @Test
    void warningsOnlyExitZeroUnlessStrict() throws IOException {
        Path p = demoWith("LDO");
        assertEquals(0, CliRunner.run("check", p.toString()).code());
        assertEquals(CheckCommand.WARNINGS, CliRunner.run("check", p.toString(), "--strict").code());
    }

    @Test
    void structuralErrorExitsWithTwo() throws IOException {
        ChipSpec spec = DemoSpec.load();
        spec.getBlocks().removeIf(b -> !b.getName().equals("REF"));
        ElementPaths.findField(spec, "REF/REF_TRIM1/REF_EN").setBitOffset(3);
        Path p = CliRunner.save(spec, dir.resolve("overlap.trimspec"));
        CliRunner.Result r = CliRunner.run("check", p.toString());
        assertEquals(2, r.code());
        assertTrue(r.out().contains("REF/REF_TRIM1/REF_EN  [structure.overlapping-bits]"), r.out());
    }

    @Test
    void truncatedFileExitsWithThreeNamingFileAndLine() throws IOException {
        Path p = dir.resolve("broken.trimspec");
        String text = new String(DemoSpec.open().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        Files.writeString(p, text.substring(0, text.length() / 2));
        CliRunner.Result r = CliRunner.run("check", p.toString());
        assertEquals(Main.UNREADABLE, r.code());
        assertTrue(r.err().matches("(?s).*broken\\.trimspec:\\d+:\\d+: .*"), "file:line:column: " + r.err());
    }

    @Test
    void missingFileExitsWithThree() {
        CliRunner.Result r = CliRunner.run("check", dir.resolve("nope.trimspec").toString());
        assertEquals(3, r.code());
        assertTrue(r.err().contains("nope.trimspec"), r.err());
    }

    @Test
    void sameSeedGivesTheSameReportAndTrialsAreApplied() throws IOException {
        Path p = CliRunner.demo(dir);
        CliRunner.Result a = CliRunner.run("check", p.toString(), "--json", "--trials", "1000", "--seed", "7");
        CliRunner.Result b = CliRunner.run("check", p.toString(), "--json", "--trials", "1000", "--seed", "7");
        assertEquals(a.out(), b.out());
        assertEquals(1000, JsonParser.parseString(a.out()).getAsJsonObject().get("trials").getAsLong());
        assertEquals(2, CliRunner.run("check", p.toString(), "--trials", "5").code(), "too few trials: usage");
    }
}
