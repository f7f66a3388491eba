package org.trimwright.cli;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;

/** Parsed arguments: positional words, options with a value ({@code --bits 6}) and flags ({@code --json}). */
final class Args {

    private final List<String> positional = new ArrayList<>();
    private final Map<String, String> values = new HashMap<>();
    private final Set<String> flags = new HashSet<>();

    /**
     * Parses {@code args}; {@code valueOptions} take one value (also as {@code --name=value}), {@code flagOptions}
     * none. Anything else starting with {@code --} is an error naming it.
     */
    static Args parse(List<String> args, Set<String> valueOptions, Set<String> flagOptions) {
        Args a = new Args();
        for (int i = 0; i < args.size(); i++) {
            String s = args.get(i);
            if (!s.startsWith("--") || s.length() == 2) {
                a.positional.add(s);
                continue;
            }
            String name = s.substring(2);
            String inline = null;
            int eq = name.indexOf('=');
            if (eq >= 0) {
                inline = name.substring(eq + 1);
                name = name.substring(0, eq);
            }
            if (flagOptions.contains(name) && inline == null) {
                a.flags.add(name);
            } else if (valueOptions.contains(name)) {
                String v = inline;
                if (v == null) {
                    if (i + 1 >= args.size()) {
                        throw new UsageException("option --" + name + " needs a value");
                    }
                    v = args.get(++i);
                }
                if (a.values.put(name, v) != null) {
                    throw new UsageException("option --" + name + " is given twice");
                }
            } else {
                throw new UsageException("unknown option '" + s + "'");
            }
        }
        return a;
    }

    List<String> positional() {
        return positional;
    }

    boolean flag(String name) {
        return flags.contains(name);
    }

    boolean has(String name) {
        return values.containsKey(name);
    }

    String value(String name) {
        return values.get(name);
    }

    String required(String name) {
        String v = values.get(name);
        if (v == null) {
            throw new UsageException("option --" + name + " is required");
        }
        return v;
    }

    int integer(String name, int min, int max, int fallback) {
        return (int) longValue(name, min, max, fallback);
    }

    long longValue(String name, long fallback) {
        return longValue(name, Long.MIN_VALUE, Long.MAX_VALUE, fallback);
    }

    /** A whole-number option within min..max; {@code fallback} when absent. */
    long longValue(String name, long min, long max, long fallback) {
        String v = values.get(name);
        if (v == null) {
            return fallback;
        }
        long n;
        try {
            n = Long.parseLong(v.strip());
        } catch (NumberFormatException e) {
            throw new UsageException("--" + name + " expects a whole number, got '" + v + "'");
        }
        if (n < min || n > max) {
            throw new UsageException("--" + name + " " + v + " is outside " + min + ".." + max);
        }
        return n;
    }

    /** The Monte Carlo trials option: min..{@link MonteCarloOptions#MAX_TRIALS}. */
    long trials(long min, long fallback) {
        return longValue("trials", min, MonteCarloOptions.MAX_TRIALS, fallback);
    }

    double number(String name, double min, double max, double fallback) {
        String v = values.get(name);
        if (v == null) {
            return fallback;
        }
        try {
            double d = Double.parseDouble(v.strip().replace("%", ""));
            if (!(d >= min && d <= max)) {
                throw new UsageException("--" + name + " " + v + " is outside " + min + ".." + max);
            }
            return d;
        } catch (NumberFormatException e) {
            throw new UsageException("--" + name + " expects a number, got '" + v + "'");
        }
    }
}
