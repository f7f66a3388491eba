package org.trimwright.engine.rtl;

import java.util.Set;

/**
 * Turns any text into a legal Verilog-2005 simple identifier (IEEE 1364-2005, 3.7): letters, digits, underscore
 * and $; not starting with a digit or $; not a reserved keyword (Annex B). Other characters become {@code _},
 * a leading digit gets the prefix {@code f_}, and a keyword gets a trailing {@code _}.
 */
public final class VerilogNames {

    /** Reserved keywords of IEEE 1364-2005 Annex B. */
    static final Set<String> KEYWORDS = Set.of("always", "and", "assign", "automatic", "begin", "buf", "bufif0",
            "bufif1", "case", "casex", "casez", "cell", "cmos", "config", "deassign", "default", "defparam",
            "design", "disable", "edge", "else", "end", "endcase", "endconfig", "endfunction", "endgenerate",
            "endmodule", "endprimitive", "endspecify", "endtable", "endtask", "event", "for", "force", "forever",
            "fork", "function", "generate", "genvar", "highz0", "highz1", "if", "ifnone", "incdir", "include",
            "initial", "inout", "input", "instance", "integer", "join", "large", "liblist", "library", "localparam",
            "macromodule", "medium", "module", "nand", "negedge", "nmos", "nor", "noshowcancelled", "not",
            "notif0", "notif1", "or", "output", "parameter", "pmos", "posedge", "primitive", "pull0", "pull1",
            "pulldown", "pullup", "pulsestyle_onevent", "pulsestyle_ondetect", "rcmos", "real", "realtime", "reg",
            "release", "repeat", "rnmos", "rpmos", "rtran", "rtranif0", "rtranif1", "scalared", "showcancelled",
            "signed", "small", "specify", "specparam", "strong0", "strong1", "supply0", "supply1", "table", "task",
            "time", "tran", "tranif0", "tranif1", "tri", "tri0", "tri1", "triand", "trior", "trireg", "unsigned",
            "use", "uwire", "vectored", "wait", "wand", "weak0", "weak1", "while", "wire", "wor", "xnor", "xor");

    private VerilogNames() {
    }

    /** A legal identifier made from {@code text}. */
    public static String sanitise(String text) {
        StringBuilder sb = new StringBuilder();
        String t = text == null ? "" : text;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            boolean ok = c < 128 && (Character.isLetterOrDigit(c) || c == '_' || c == '$');
            sb.append(ok ? c : '_');
        }
        String s = sb.toString();
        if (s.isEmpty() || Character.isDigit(s.charAt(0)) || s.charAt(0) == '$') {
            s = "f_" + s;
        }
        if (KEYWORDS.contains(s)) {
            s = s + "_";
        }
        return s;
    }
}
