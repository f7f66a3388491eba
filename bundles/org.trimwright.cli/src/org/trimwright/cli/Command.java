package org.trimwright.cli;

import java.io.PrintStream;
import java.util.List;

/** One verb of the command line. */
interface Command {

    /** One line for the command list. */
    String summary();

    /** Usage text; the first line is the synopsis. */
    String usage();

    /** Runs with the arguments after the verb; returns the exit code; throws UsageException for bad usage. */
    int run(List<String> args, PrintStream out, PrintStream err);
}
