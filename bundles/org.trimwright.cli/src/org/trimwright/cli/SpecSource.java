package org.trimwright.cli;

import java.nio.file.Path;

import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.SpecFiles;
import org.trimwright.model.spec.SpecLoadException;

/** A spec named on the command line, or the bundled demo when none is named. */
record SpecSource(ChipSpec spec, String name) {

    static SpecSource load(String file) throws SpecLoadException {
        if (file == null) {
            return new SpecSource(DemoSpec.load(), "bundled demo " + DemoSpec.FILE_NAME);
        }
        Path p = Path.of(file);
        return new SpecSource(SpecFiles.load(p), p.toString());
    }
}
