package org.trimwright.export.doc;

import java.util.ArrayList;
import java.util.List;

import com.lowagie.text.pdf.BaseFont;

/**
 * Breaks text into lines no wider than its column (a table cell, a paragraph, a box), measured with the font's
 * advance widths (those of {@link BaseFont#getWidthPoint}, through {@link GlyphWidths}): a new line at every
 * {@code '\n'}, otherwise as many words as fit; breaks at spaces (dropped at the break) and after a hyphen between two
 * letters (kept at the end of the line), as OpenPDF broke its paragraphs and table cells; a word wider than the
 * column on its own is broken between characters. Every character except the spaces at a break is on exactly one
 * line, in order.
 */
final class CellLines {

    /** Larger than the rounding error of a line's width in float (a few ulps of ~500 per character). */
    private static final float ROUNDING = 0.01f;

    private CellLines() {
    }

    /** The lines of {@code text} in {@code size}-point type for a column {@code width} points wide. */
    static List<String> wrap(GlyphWidths font, float size, String text, float width) {
        if (text.indexOf('\n') < 0 && fits(font, size, text, 0, text.length(), font.points(text, 0,
                text.length(), size), width)) {
            return List.of(text);
        }
        List<String> lines = new ArrayList<>();
        int from = 0;
        while (true) {
            int nl = text.indexOf('\n', from);
            paragraph(font, size, text.substring(from, nl < 0 ? text.length() : nl), width, lines);
            if (nl < 0) {
                return lines;
            }
            from = nl + 1;
        }
    }

    private static void paragraph(GlyphWidths font, float size, String p, float width, List<String> lines) {
        if (p.isEmpty()) {
            lines.add(p);
            return;
        }
        int start = 0;
        do {
            int end = fit(font, size, p, start, width);
            lines.add(p.substring(start, end));
            start = end;
            while (start < p.length() && p.charAt(start) == ' ') {
                start++;
            }
        } while (start < p.length());
    }

    /** End (exclusive) of the longest line from {@code start} that fits; past at least one character. */
    private static int fit(GlyphWidths font, float size, String p, int start, float width) {
        int best = -1;
        float used = 0;
        int at = start;
        while (at < p.length()) {
            int end = wordEnd(p, at);
            used += font.points(p, at, end, size);
            if (!fits(font, size, p, start, end, used, width)) {
                break;
            }
            best = end;
            at = end;
        }
        return best > start ? best : characters(font, size, p, start, width);
    }

    /**
     * Whether {@code p} from {@code from} to {@code to}, {@code used} points wide, fits {@code width}; a line within
     * rounding of the width is decided by OpenPDF's own sum of the character widths.
     */
    private static boolean fits(GlyphWidths font, float size, String p, int from, int to, float used, float width) {
        return used <= width - ROUNDING || (used <= width + ROUNDING && font.summed(p, from, to, size) <= width);
    }

    /** End of the word at {@code at} (with the spaces before it): at a space, or just after a hyphen in a word. */
    private static int wordEnd(String p, int at) {
        int i = at;
        while (i < p.length() && p.charAt(i) == ' ') {
            i++;
        }
        int word = i;
        for (; i < p.length() && p.charAt(i) != ' '; i++) {
            if (p.charAt(i) == '-' && i > word && i + 1 < p.length() && Character.isLetter(p.charAt(i - 1))
                    && Character.isLetter(p.charAt(i + 1))) {
                return i + 1;
            }
        }
        return i;
    }

    /** A word too wide for the column: as many characters as fit, at least one (a whole code point). */
    private static int characters(GlyphWidths font, float size, String p, int start, float width) {
        int end = start + Character.charCount(p.codePointAt(start));
        float used = font.points(p, start, end, size);
        while (end < p.length()) {
            int next = end + Character.charCount(p.codePointAt(end));
            used += font.points(p, end, next, size);
            if (used > width) {
                break;
            }
            end = next;
        }
        return end;
    }
}
