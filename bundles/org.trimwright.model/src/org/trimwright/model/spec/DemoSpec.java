package org.trimwright.model.spec;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

import org.trimwright.model.ChipSpec;

/** The bundled demo spec: TMK3, a fictional sensor hub invented for Trimwright's examples. */
public final class DemoSpec {

    /** Resource path of the demo inside the model bundle. */
    public static final String RESOURCE = "/demo/tmk3-sensor-hub.trimspec";
    /** File name shown in messages and used when the demo is copied into a workspace. */
    public static final String FILE_NAME = "tmk3-sensor-hub.trimspec";

    private DemoSpec() {
    }

    /** Opens the raw demo file. */
    public static InputStream open() {
        InputStream in = DemoSpec.class.getResourceAsStream(RESOURCE);
        if (in == null) {
            throw new IllegalStateException("bundled demo " + RESOURCE + " is missing from the model bundle");
        }
        return in;
    }

    /** Loads the demo spec. */
    public static ChipSpec load() {
        try (InputStream in = open()) {
            return SpecFiles.load(in, FILE_NAME);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
