package org.trimwright.export.text;

/**
 * CSV cells (RFC 4180: fields with comma, quote or line break are quoted, quotes doubled) with formula
 * neutralisation: a cell starting with {@code = + - @}, tab or CR would be evaluated by a spreadsheet, so it gets a
 * leading apostrophe (common practice, no source). Numbers written by the exporter itself use
 * {@link #number(double)} and are left as numbers.
 */
public final class CsvCells {

    private CsvCells() {
    }

    /** A cell holding user text. */
    public static String text(String value) {
        String v = value == null ? "" : value;
        if (!v.isEmpty() && "=+-@\t\r".indexOf(v.charAt(0)) >= 0) {
            v = "'" + v;
        }
        return quote(v);
    }

    /** A cell holding a number written by the exporter (may start with '-'; never a formula). */
    public static String number(double value) {
        return quote(Double.toString(value));
    }

    /** A cell holding an integer written by the exporter. */
    public static String number(long value) {
        return Long.toString(value);
    }

    /** RFC 4180 quoting. */
    static String quote(String v) {
        if (v.indexOf(',') >= 0 || v.indexOf('"') >= 0 || v.indexOf('\n') >= 0 || v.indexOf('\r') >= 0) {
            return '"' + v.replace("\"", "\"\"") + '"';
        }
        return v;
    }

    /** Parses one RFC 4180 record (used by round-trip checks). */
    public static java.util.List<String> parse(String line) {
        java.util.List<String> out = new java.util.ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cur.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    cur.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        out.add(cur.toString());
        return out;
    }
}
