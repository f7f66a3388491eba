package org.trimwright.export.doc;

import java.awt.Color;
import java.util.List;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;

/**
 * Writes a table whose every cell fits on one line directly as page content, with the look of the
 * {@code PdfPTable} it replaces: columns over the text width, one text line per cell, a rule under each row, and for
 * data tables a shaded header row repeated on every page and shaded alternate rows; for label/value rows a muted
 * label column. OpenPDF's {@code PdfPTable} lays out every cell through its own column layout, twice (height, then
 * drawing); for the step tables and key figures of a large spec that was a fifth of the export. Tables with a cell
 * that does not fit on one line are left to {@code PdfPTable} ({@link #fits} is false).
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

    private final Document doc;
    private final PdfWriter writer;
    private final BaseFont font;
    private final Color headInk;

    PdfRowTable(Document doc, PdfWriter writer, BaseFont font, Color headInk) {
        this.doc = doc;
        this.writer = writer;
        this.font = font;
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

    /** Whether every cell of the table (and the header, if any) fits on one line of its column. */
    boolean fits(Style style, List<String> header, List<? extends List<String>> rows) {
        if (header != null && !fitsRow(style, header)) {
            return false;
        }
        for (List<String> r : rows) {
            if (!fitsRow(style, r)) {
                return false;
            }
        }
        return true;
    }

    private boolean fitsRow(Style style, List<String> cells) {
        if (cells.size() != style.widths().length) {
            return false;
        }
        float[] x = columns(style);
        for (int i = 0; i < cells.size(); i++) {
            String s = cells.get(i);
            if (s == null || s.indexOf('\n') >= 0
                    || font.getWidthPoint(s, style.sizes()[i]) > x[i + 1] - x[i] - 2 * PADDING) {
                return false;
            }
        }
        return true;
    }

    private float[] columns(Style style) {
        float total = 0;
        for (float w : style.widths()) {
            total += w;
        }
        float[] x = new float[style.widths().length + 1];
        x[0] = doc.left();
        float width = doc.right() - doc.left();
        for (int i = 0; i < style.widths().length; i++) {
            x[i + 1] = x[i] + width * style.widths()[i] / total;
        }
        return x;
    }

    /**
     * Writes the table below the current position, then moves the document's position below it.
     *
     * @param header header row repeated on each page, or null
     */
    void write(Style style, List<String> header, List<? extends List<String>> rows, float spacingAfter)
            throws DocumentException {
        PdfContentByte cb = writer.getDirectContent();
        float[] x = columns(style);
        float maxSize = 0;
        for (float s : style.sizes()) {
            maxSize = Math.max(maxSize, s);
        }
        float ascent = font.getFontDescriptor(BaseFont.ASCENT, maxSize);
        float height = 2 * PADDING + ascent - font.getFontDescriptor(BaseFont.DESCENT, maxSize) + 1.5f;
        Style head = header == null ? null : new Style(style.widths(), style.sizes(), fill(style, headInk), false);
        // the position is the last line's baseline: leave room for its descent
        float y = writer.getVerticalPosition(true) - 3f;
        if (y - 2 * height < doc.bottom()) {
            y = newPage();
        }
        if (head != null) {
            y = row(cb, head, x, header, y, height, ascent, HEAD_FILL);
        }
        boolean even = false;
        for (List<String> r : rows) {
            if (y - height < doc.bottom()) {
                y = newPage();
                if (head != null) {
                    y = row(cb, head, x, header, y, height, ascent, HEAD_FILL);
                }
            }
            y = row(cb, style, x, r, y, height, ascent, style.banded() && even ? SHADE : null);
            even = !even;
        }
        // move the document's own position to below the table with an empty, borderless block as tall as the space
        // used (or a new page when the table ends at the foot of one)
        if (y - spacingAfter - 2 < doc.bottom()) {
            doc.newPage();
            return;
        }
        float advance = writer.getVerticalPosition(true) - y + spacingAfter;
        if (advance > 0) {
            PdfPTable spacer = new PdfPTable(1);
            spacer.setWidthPercentage(100);
            PdfPCell cell = new PdfPCell();
            cell.setBorder(PdfPCell.NO_BORDER);
            cell.setPadding(0);
            cell.setFixedHeight(advance);
            spacer.addCell(cell);
            doc.add(spacer);
        }
    }

    private static Color[] fill(Style style, Color ink) {
        Color[] c = new Color[style.inks().length];
        java.util.Arrays.fill(c, ink);
        return c;
    }

    private float newPage() {
        // the page holds direct content, so the document starts a new one
        doc.newPage();
        return doc.top();
    }

    private float row(PdfContentByte cb, Style style, float[] x, List<String> cells, float top, float height,
            float ascent, Color fill) {
        float left = x[0];
        float width = x[x.length - 1] - left;
        float bottom = top - height;
        if (fill != null) {
            cb.setColorFill(fill);
            cb.rectangle(left, bottom, width, height);
            cb.fill();
        }
        cb.setColorStroke(RULE);
        cb.setLineWidth(0.5f);
        cb.moveTo(left, bottom);
        cb.lineTo(left + width, bottom);
        cb.stroke();
        cb.beginText();
        float baseline = top - PADDING - ascent;
        for (int i = 0; i < cells.size(); i++) {
            cb.setFontAndSize(font, style.sizes()[i]);
            cb.setColorFill(style.inks()[i]);
            cb.setTextMatrix(x[i] + PADDING, baseline);
            cb.showText(cells.get(i));
        }
        cb.endText();
        return bottom;
    }
}
