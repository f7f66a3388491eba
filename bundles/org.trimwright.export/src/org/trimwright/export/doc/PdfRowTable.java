package org.trimwright.export.doc;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;

/**
 * Writes a table directly as page content, with the look of the {@code PdfPTable} it replaces: columns over the text
 * width, a rule under each row, and for data tables a shaded header row repeated on every page and shaded alternate
 * rows; for label/value rows a muted label column. Cell text wraps onto as many lines as it needs
 * ({@link CellLines}); a row is as tall as its tallest cell and moves to the next page when it does not fit, or, when
 * it is taller than a page, splits between lines ({@link RowLines}). The table starts at the position of a
 * {@link PageFlow} and new pages come from it; the caller moves the flow below the table. OpenPDF's {@code PdfPTable}
 * lays out every cell through its own column layout, twice (height, then drawing); for the tables and key figures of
 * a large spec that was a fifth of the export.
 */
final class PdfRowTable {

    static final float PADDING = 2.5f;
    static final float SMALL = 8f;
    static final float BODY = 9.5f;
    private static final Color RULE = new Color(0xDD, 0xE2, 0xE7);
    private static final Color HEAD_FILL = new Color(0xEE, 0xF2, 0xF5);
    private static final Color SHADE = new Color(0xFA, 0xFB, 0xFA);

    /** Widths, fonts and colours of one kind of table. */
    record Style(float[] widths, float[] sizes, Color[] inks, boolean banded) {
    }

    private final PageFlow flow;
    private final PdfContentByte cb;
    private final BaseFont font;
    private final GlyphWidths glyphs;
    private final Color headInk;

    PdfRowTable(PageFlow flow, PdfContentByte cb, GlyphWidths glyphs, Color headInk) {
        this.flow = flow;
        this.cb = cb;
        this.font = glyphs.font();
        this.glyphs = glyphs;
        this.headInk = headInk;
    }

    /** A data table of {@code columns} equal columns in the small font. */
    static Style data(int columns) {
        float[] w = new float[columns];
        float[] s = new float[columns];
        Color[] c = new Color[columns];
        java.util.Arrays.fill(w, 1f);
        java.util.Arrays.fill(s, SMALL);
        java.util.Arrays.fill(c, Color.BLACK);
        return new Style(w, s, c, true);
    }

    /** Label/value rows: widths 2:5, the label small and muted, the value in the body font. */
    static Style keyValues(Color labelInk) {
        return new Style(new float[] {2, 5}, new float[] {SMALL, BODY}, new Color[] {labelInk, Color.BLACK}, false);
    }

    private float[] columns(Style style) {
        float total = 0;
        for (float w : style.widths()) {
            total += w;
        }
        float[] x = new float[style.widths().length + 1];
        x[0] = flow.left();
        float width = flow.right() - flow.left();
        for (int i = 0; i < style.widths().length; i++) {
            x[i + 1] = x[i] + width * style.widths()[i] / total;
        }
        return x;
    }

    /**
     * Writes the table below the position of the flow, from the next page when its header and first row (without a
     * header: two rows) do not fit there; returns the position below its last row.
     *
     * @param header header row repeated on each page, or null
     */
    float write(Style style, List<String> header, List<? extends List<String>> rows) {
        Run run = new Run(style, header);
        run.y = start(flow, run, style, rows);
        run.header();
        boolean even = false;
        for (List<String> r : rows) {
            run.row(style, run.lines(style, r), style.banded() && even ? SHADE : null);
            even = !even;
        }
        return run.y;
    }

    /** Where the table's first row would start on {@code f} (a {@link PageFlow#trial()}), moving it as it would. */
    float start(PageFlow f, Style style, List<String> header, List<? extends List<String>> rows) {
        return start(f, new Run(style, header), style, rows);
    }

    private float start(PageFlow f, Run run, Style style, List<? extends List<String>> rows) {
        // the position is the last line's baseline: leave room for its descent
        float y = f.y() - 3f;
        float need = run.headHeight;
        for (int i = 0; i < Math.min(rows.size(), run.head == null ? 2 : 1); i++) {
            need += run.lines(style, rows.get(i)).height();
        }
        if (y - need < f.bottom() && need <= f.pageHeight()) {
            f.newPage();
            y = f.top();
        }
        return y;
    }

    private static Color[] fill(Style style, Color ink) {
        Color[] c = new Color[style.inks().length];
        java.util.Arrays.fill(c, ink);
        return c;
    }

    /** One table being written: its columns, its header, and the position on the page. */
    private final class Run {

        final float[] x;
        final float ascent;
        final float base;
        final Style headStyle;
        final RowLines head;
        final float headHeight;
        /** Top of the next row. */
        float y;
        /** Top of the rows on a page the table continues on (below the repeated header): all the room a row gets. */
        float pageTop;

        Run(Style style, List<String> header) {
            x = columns(style);
            float maxSize = 0;
            for (float s : style.sizes()) {
                maxSize = Math.max(maxSize, s);
            }
            ascent = font.getFontDescriptor(BaseFont.ASCENT, maxSize);
            base = 2 * PADDING + ascent - font.getFontDescriptor(BaseFont.DESCENT, maxSize) + 1.5f;
            headStyle = header == null ? null : new Style(style.widths(), style.sizes(), fill(style, headInk), false);
            head = header == null ? null : lines(headStyle, header);
            headHeight = head == null ? 0 : head.height();
            pageTop = flow.top() - headHeight;
        }

        /** The row's cells broken into lines of their columns (missing cells are empty). */
        RowLines lines(Style style, List<String> cells) {
            int n = style.widths().length;
            if (cells.size() > n) {
                throw new IllegalArgumentException("a row of " + cells.size() + " cells in a table of " + n);
            }
            List<List<String>> c = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                String s = i < cells.size() && cells.get(i) != null ? cells.get(i) : "";
                c.add(CellLines.wrap(glyphs, style.sizes()[i], s, x[i + 1] - x[i] - 2 * PADDING));
            }
            return new RowLines(c, style.sizes(), base);
        }

        void header() {
            if (head != null) {
                draw(headStyle, head, HEAD_FILL);
            }
        }

        void newPage() {
            flow.newPage();
            y = flow.top();
            header();
            pageTop = y;
        }

        /**
         * Draws a row: on a new page if it does not fit here but does on a page of its own, else split between
         * lines over as many pages as it needs (every part draws at least one line, so this ends).
         */
        void row(Style style, RowLines r, Color fill) {
            if (r.height() > y - flow.bottom() && y < pageTop && r.height() <= flow.pageHeight() - headHeight) {
                newPage();
            }
            while (r.height() > y - flow.bottom()) {
                float space = y - flow.bottom();
                if (space < base && y < pageTop) {
                    newPage();
                    continue;
                }
                RowLines rest = r.tail(space);
                draw(style, r.head(space), fill);
                if (rest.isEmpty()) {
                    return;
                }
                r = rest;
                newPage();
            }
            draw(style, r, fill);
        }

        /** Draws the row's fill, its rule and its lines below {@link #y}, cell by cell; moves {@link #y} below it. */
        void draw(Style style, RowLines r, Color fill) {
            float left = x[0];
            float width = x[x.length - 1] - left;
            float bottom = y - r.height();
            flow.drawn();
            // the graphics state is left as found (charts drawn later start from the defaults)
            cb.saveState();
            if (fill != null) {
                cb.setColorFill(fill);
                cb.rectangle(left, bottom, width, y - bottom);
                cb.fill();
            }
            cb.setColorStroke(RULE);
            cb.setLineWidth(0.5f);
            cb.moveTo(left, bottom);
            cb.lineTo(left + width, bottom);
            cb.stroke();
            cb.beginText();
            float baseline = y - PADDING - ascent;
            // font size and fill colour hold for the rest of the row's text: set them only when a cell changes them
            float size = 0;
            Color ink = null;
            for (int i = 0; i < r.cells().size(); i++) {
                List<String> lines = r.cells().get(i);
                if (style.sizes()[i] != size) {
                    size = style.sizes()[i];
                    cb.setFontAndSize(font, size);
                }
                if (!style.inks()[i].equals(ink)) {
                    ink = style.inks()[i];
                    cb.setColorFill(ink);
                }
                for (int j = 0; j < lines.size(); j++) {
                    if (!lines.get(j).isEmpty()) {
                        cb.setTextMatrix(x[i] + PADDING, baseline - j * size);
                        cb.showText(lines.get(j));
                    }
                }
            }
            cb.endText();
            cb.restoreState();
            y = bottom;
        }
    }
}
