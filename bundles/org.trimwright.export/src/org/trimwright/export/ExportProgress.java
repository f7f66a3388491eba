package org.trimwright.export;

/** Receives progress of a long export (the command line prints it on stderr; the workbench shows a monitor). */
public interface ExportProgress {

    /** No output. */
    ExportProgress NONE = (done, total, message) -> { };

    /**
     * @param done    work units done so far
     * @param total   work units in all
     * @param message what is being done
     */
    void report(int done, int total, String message);
}
