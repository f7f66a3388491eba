package org.trimwright.export.text;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/** Makes sanitised names unique within one output (a second "A_B" becomes "A_B_2"); case-insensitive. */
public final class UniqueNames {

    private final Set<String> used = new HashSet<>();

    /** {@code name}, or the name with the smallest suffix _2, _3, ... not used yet. */
    public String unique(String name) {
        String n = name;
        int i = 2;
        while (!used.add(n.toLowerCase(Locale.ROOT))) {
            n = name + "_" + i++;
        }
        return n;
    }
}
