package org.trimwright.export.doc;

import com.lowagie.text.pdf.BaseFont;

/**
 * Advance widths of a font, remembered per character: the same figures as {@link BaseFont#getWidthPoint(String,
 * float)} (the sum of {@link BaseFont#getWidth(int)} over the characters, no kerning), without its map lookup of a
 * boxed key per character, and for part of a string without copying it. Tables measure every cell. Not thread-safe
 * (one per document).
 */
final class GlyphWidths {

    private final BaseFont font;
    /** Width in 1/1000 em plus one, per UTF-16 character; 0 while not looked up. */
    private final int[] widths = new int[Character.MAX_VALUE + 1];

    GlyphWidths(BaseFont font) {
        this.font = font;
    }

    BaseFont font() {
        return font;
    }

    /** Width in points of {@code s} from {@code from} (inclusive) to {@code to} (exclusive) at {@code size}. */
    float points(String s, int from, int to, float size) {
        int total = 0;
        for (int i = from; i < to; i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < to && Character.isLowSurrogate(s.charAt(i + 1))) {
                total += font.getWidth(s.codePointAt(i));
                i++;
            } else {
                int w = widths[c];
                if (w == 0) {
                    w = font.getWidth(c) + 1;
                    widths[c] = w;
                }
                total += w - 1;
            }
        }
        return total * 0.001f * size;
    }

    /**
     * Width in points of {@code s} from {@code from} to {@code to} as OpenPDF's line breaking adds it up: the float
     * width of each character ({@code BaseFont.getWidthPoint(int, float)}) summed in float. Differs from
     * {@link #points} by rounding only, which decides a line that fills its width exactly.
     */
    float summed(String s, int from, int to, float size) {
        float total = 0;
        for (int i = from; i < to; i++) {
            char c = s.charAt(i);
            int units;
            if (Character.isHighSurrogate(c) && i + 1 < to && Character.isLowSurrogate(s.charAt(i + 1))) {
                units = font.getWidth(s.codePointAt(i));
                i++;
            } else {
                points(s, i, i + 1, size);
                units = widths[c] - 1;
            }
            total += units * 0.001f * size;
        }
        return total;
    }
}
