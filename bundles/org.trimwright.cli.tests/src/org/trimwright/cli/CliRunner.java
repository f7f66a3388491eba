package org.trimwright.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.SpecFiles;

/** Runs {@link Main#run} with captured output. */
final class CliRunner {

    /** The result of one command line. */
    record Result(int code, String out, String err) {
    }

    private CliRunner() {
    }

    static Result run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** The bundled demo copied to {@code dir}. */
    static Path demo(Path dir) throws IOException {
        Path p = dir.resolve(DemoSpec.FILE_NAME);
        try (InputStream in = DemoSpec.open()) {
            Files.copy(in, p);
        }
        return p;
    }

    static Path save(ChipSpec spec, Path file) throws IOException {
        SpecFiles.save(spec, file);
        return file;
    }
}
