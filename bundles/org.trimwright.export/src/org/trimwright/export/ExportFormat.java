package org.trimwright.export;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/** The formats of an export, with the key used on the command line ({@code --formats html,pdf,...}). */
public enum ExportFormat {
    /** Self-contained HTML document with SVG charts. */
    HTML("html"),
    /** PDF document of the same content with vector charts. */
    PDF("pdf"),
    /** One Verilog-2005 file per block (field decoders) plus its testbench. */
    RTL("rtl"),
    /** C header for firmware. */
    HEADER("header"),
    /** CSV test table per field. */
    CSV("csv"),
    /** IP-XACT (IEEE 1685-2014) component XML. */
    IPXACT("ipxact");

    private final String key;

    ExportFormat(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** Parses a comma-separated list of keys; throws IllegalArgumentException naming an unknown key. */
    public static Set<ExportFormat> parse(String list) {
        Set<ExportFormat> out = EnumSet.noneOf(ExportFormat.class);
        for (String part : list.split(",")) {
            String k = part.trim().toLowerCase(Locale.ROOT);
            if (k.isEmpty()) {
                continue;
            }
            ExportFormat found = null;
            for (ExportFormat f : values()) {
                if (f.key.equals(k)) {
                    found = f;
                }
            }
            if (found == null) {
                throw new IllegalArgumentException("unknown format '" + part.trim() + "' (known: html, pdf, rtl, "
                        + "header, csv, ipxact)");
            }
            out.add(found);
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("no format given");
        }
        return out;
    }
}
