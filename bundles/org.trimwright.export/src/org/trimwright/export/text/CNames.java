package org.trimwright.export.text;

import java.util.Locale;
import java.util.Set;

/**
 * Turns any text into a C identifier (ISO/IEC 9899:2011, 6.4.2: letters, digits and underscore, not starting with a
 * digit) that is not a keyword (6.4.1, C11 list) and does not use the names reserved by 7.1.3 (a leading underscore
 * followed by an upper-case letter or another underscore). Macro names are upper case.
 */
public final class CNames {

    /** ISO/IEC 9899:2011 6.4.1 keywords. */
    static final Set<String> KEYWORDS = Set.of("auto", "break", "case", "char", "const", "continue", "default", "do",
            "double", "else", "enum", "extern", "float", "for", "goto", "if", "inline", "int", "long", "register",
            "restrict", "return", "short", "signed", "sizeof", "static", "struct", "switch", "typedef", "union",
            "unsigned", "void", "volatile", "while", "_Alignas", "_Alignof", "_Atomic", "_Bool", "_Complex",
            "_Generic", "_Imaginary", "_Noreturn", "_Static_assert", "_Thread_local");

    private CNames() {
    }

    /** A legal C identifier made from {@code text}. */
    public static String identifier(String text) {
        StringBuilder sb = new StringBuilder();
        String t = text == null ? "" : text;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            sb.append(c < 128 && (Character.isLetterOrDigit(c) || c == '_') ? c : '_');
        }
        String s = sb.toString();
        while (s.startsWith("_")) {
            s = s.substring(1);
        }
        if (s.isEmpty() || Character.isDigit(s.charAt(0))) {
            s = "f_" + s;
        }
        if (KEYWORDS.contains(s) || KEYWORDS.contains(s.toLowerCase(Locale.ROOT))) {
            s = s + "_";
        }
        return s;
    }

    /** An upper-case macro name made from {@code text} (never a keyword: keywords are lower case). */
    public static String macro(String text) {
        return identifier(text).toUpperCase(Locale.ROOT);
    }

    /** Text safe inside a C block comment: no comment terminator, no line breaks, ASCII only. */
    public static String comment(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            sb.append(c >= 0x20 && c < 0x7F ? c : ' ');
        }
        return sb.toString().replace("*/", "* /").replace("/*", "/ *").replace("??", "? ?");
    }
}
