package org.trimwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.ElementPaths;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

class DiffCommandTest {

    @TempDir
    Path dir;

    @Test
    void equalSpecsExitWithZero() throws IOException {
        Path a = CliRunner.demo(dir);
        Path b = CliRunner.save(DemoSpec.load(), dir.resolve("copy.trimspec"));
        CliRunner.Result r = CliRunner.run("diff", a.toString(), b.toString());
        assertEquals(0, r.code(), r.out());
        assertTrue(r.out().contains("fields equal"), r.out());
    }

    @Test
    void editedCopyExitsWithOneAndNamesTheChangedCodes() throws IOException {
        Path a = CliRunner.demo(dir);
        ChipSpec s = DemoSpec.load();
        ElementPaths.findField(s, "ADC/ADC_CAL/CAL_OFFSET").getTarget().setStep(0.0006);
        ElementPaths.findField(s, "OSC/OSC_TRIM/FREQ_COARSE").getElement().setUnitSigmaPercent(1.0);
        Path b = CliRunner.save(s, dir.resolve("edited.trimspec"));
        CliRunner.Result r = CliRunner.run("diff", a.toString(), b.toString());
        assertEquals(DiffCommand.DIFFERENT, r.code());
        // Gray register code 48 = gray(32) holds s = 0 (0 V), unchanged by the step (hand calculation)
        assertTrue(r.out().contains("value changed at codes 0..47, 49..63"), r.out());
        assertTrue(r.out().contains("P(non-monotonic) down"), r.out());

        JsonObject o = JsonParser.parseString(CliRunner.run("diff", a.toString(), b.toString(), "--json").out())
                .getAsJsonObject();
        assertEquals(false, o.get("equal").getAsBoolean());
        assertEquals(2, o.getAsJsonArray("fields").size());
        JsonObject f = o.getAsJsonArray("fields").get(0).getAsJsonObject();
        assertEquals("changed", f.get("kind").getAsString());
        assertTrue(f.getAsJsonObject("consequence").has("changedCodes"));
        assertTrue(f.getAsJsonObject("consequence").getAsJsonObject("risk").has("direction"));
    }

    @Test
    void unreadableFileExitsWithThree() throws IOException {
        Path a = CliRunner.demo(dir);
        CliRunner.Result r = CliRunner.run("diff", a.toString(), dir.resolve("missing.trimspec").toString());
        assertEquals(3, r.code());
        assertTrue(r.err().contains("missing.trimspec"), r.err());
    }
}
