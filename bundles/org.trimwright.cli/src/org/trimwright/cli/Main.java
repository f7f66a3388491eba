package org.trimwright.cli;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Entry point of the {@code trimwright} command: dispatches to one command per verb. */
public final class Main {

    /** Exit code for bad usage (unknown command or option, bad value). */
    public static final int USAGE = 2;
    /** Exit code when a spec file cannot be read. */
    public static final int UNREADABLE = 3;

    private Main() {
    }

    static Map<String, Command> commands() {
        Map<String, Command> m = new LinkedHashMap<>();
        m.put("summary", new SummaryCommand());
        m.put("analyze", new AnalyzeCommand());
        m.put("check", new CheckCommand());
        m.put("diff", new DiffCommand());
        m.put("export", new ExportCommand());
        return m;
    }

    public static void main(String[] args) {
        int code = run(args, System.out, System.err);
        System.out.flush();
        System.exit(code);
    }

    /** Runs one command line; returns the exit code. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        Map<String, Command> commands = commands();
        if (args.length == 0 || args[0].equals("help") || args[0].equals("--help") || args[0].equals("-h")) {
            out.print(usage(commands));
            return 0;
        }
        Command c = commands.get(args[0]);
        if (c == null) {
            err.println("trimwright: unknown command '" + args[0] + "'");
            err.print(usage(commands));
            return USAGE;
        }
        List<String> rest = Arrays.asList(args).subList(1, args.length);
        if (rest.contains("--help") || rest.contains("-h")) {
            out.println(c.usage());
            return 0;
        }
        try {
            return c.run(rest, out, err);
        } catch (UsageException e) {
            err.println("trimwright " + args[0] + ": " + e.getMessage());
            err.println("usage: " + c.usage().lines().findFirst().orElse(""));
            return USAGE;
        }
    }

    static String usage(Map<String, Command> commands) {
        StringBuilder sb = new StringBuilder("Trimwright: trim and configuration fields of mixed-signal register maps\n\n"
                + "usage: trimwright COMMAND [ARGS]   (no command: open the workbench)\n\ncommands:\n");
        commands.forEach((name, c) -> sb.append(String.format("  %-9s %s%n", name, c.summary())));
        sb.append("\n'trimwright COMMAND --help' describes a command. Exit codes: 0 done, 2 bad usage,"
                + " 3 unreadable file; check and diff add their own.\n");
        return sb.toString();
    }
}
