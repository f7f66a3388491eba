package org.trimwright.ui.internal.export;

import java.nio.file.Path;
import java.util.List;

/**
 * How an export from the workbench ended.
 *
 * @param state   finished, cancelled or failed
 * @param folder  the output folder
 * @param files   files written (all of them when finished; empty otherwise: a cancelled or failed export does not
 *                know which of its files were complete)
 * @param error   what went wrong (failed only), else null
 * @param seconds wall time of the job
 */
public record ExportOutcome(State state, Path folder, List<Path> files, String error, double seconds) {

    /** How the export ended. */
    public enum State {
        FINISHED, CANCELLED, FAILED
    }

    public ExportOutcome {
        files = List.copyOf(files);
    }
}
