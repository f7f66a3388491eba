package org.trimwright.export;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs outside tools (Icarus Verilog, gcc); with CI=true a missing tool fails the test instead of skipping it. */
final class Tools {

    private Tools() {
    }

    static void require(String tool) {
        boolean present;
        try {
            present = new ProcessBuilder(tool, tool.equals("iverilog") ? "-V" : "--version").redirectErrorStream(true)
                    .start().waitFor(20, TimeUnit.SECONDS);
        } catch (IOException | InterruptedException e) {
            present = false;
        }
        if (!present && "true".equals(System.getenv("CI"))) {
            fail(tool + " is missing and CI=true");
        }
        assumeTrue(present, tool + " not installed");
    }

    /** Runs a command in {@code dir}; returns its output; fails on a non-zero exit. */
    static String run(Path dir, List<String> cmd) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("timeout: " + cmd);
        }
        if (p.exitValue() != 0) {
            fail(cmd + " exited " + p.exitValue() + ":\n" + out);
        }
        return out;
    }
}
