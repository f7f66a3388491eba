package org.trimwright.export.text;

/**
 * Escaping of user text for HTML and XML (W3C XML 1.0, section 2.4 character data and 2.3 attribute values):
 * {@code & < > " '} become entity or character references, and characters that XML 1.0 forbids (C0 controls except
 * tab, LF, CR; U+FFFE, U+FFFF; lone surrogates) become U+FFFD, so any text comes out as inert character data.
 */
public final class Markup {

    private Markup() {
    }

    /** Text safe as element content and as a quoted attribute value in HTML and XML. */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> {
                    if (Character.isHighSurrogate(c) && i + 1 < text.length()
                            && Character.isLowSurrogate(text.charAt(i + 1))) {
                        sb.append(c).append(text.charAt(++i));
                    } else if (allowed(c)) {
                        sb.append(c);
                    } else {
                        sb.append('\uFFFD');
                    }
                }
            }
        }
        return sb.toString();
    }

    private static boolean allowed(char c) {
        if (c == '\t' || c == '\n' || c == '\r') {
            return true;
        }
        if (c < 0x20 || c == 0xFFFE || c == 0xFFFF || Character.isSurrogate(c)) {
            return false;
        }
        return true;
    }

    /** An HTML id / XML NCName-safe anchor from any text: letters, digits, '-' and '_' only, never empty. */
    public static String anchor(String text) {
        StringBuilder sb = new StringBuilder("s-");
        String t = text == null ? "" : text;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            sb.append(c < 128 && (Character.isLetterOrDigit(c) || c == '-' || c == '_') ? c : '_');
        }
        return sb.toString();
    }
}
