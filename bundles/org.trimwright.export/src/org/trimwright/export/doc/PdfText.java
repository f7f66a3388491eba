package org.trimwright.export.doc;

import java.awt.Color;
import java.util.List;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfDestination;

/**
 * Paragraphs, headings, contents entries and caution boxes drawn as page content at the position of a
 * {@link PageFlow}, with the look of the OpenPDF {@code Paragraph} and one-cell {@code PdfPTable} they replace: text
 * wrapped by {@link CellLines} (OpenPDF's line breaking), lines one and a half font sizes apart, left aligned; a
 * heading is a named destination (at its first line), a contents entry a link over each of its lines. On a
 * {@link PageFlow#trial()} nothing is drawn. Not thread-safe (one per document).
 */
final class PdfText {

    /** Text look: font size and colour, left indent, space above and below. */
    record Style(float size, Color ink, float indent, float spacingBefore, float spacingAfter) {

        /** Distance between lines: one and a half font sizes (OpenPDF's default leading). */
        float leading() {
            return 1.5f * size;
        }
    }

    /** Caution boxes: padding, width of the bar on the left, space above and below, the words they start with. */
    static final float BOX_PADDING = 5;
    static final float BOX_BAR = 3;
    static final float BOX_SPACING = 4;
    static final String CAUTION = "Caution. ";

    private final PdfContentByte cb;
    private final BaseFont font;
    private final GlyphWidths glyphs;

    PdfText(PdfContentByte cb, GlyphWidths glyphs) {
        this.cb = cb;
        this.font = glyphs.font();
        this.glyphs = glyphs;
    }

    /** {@code text} broken into lines of {@code style} no wider than {@code width} (none for empty text). */
    List<String> lines(String text, float size, float width) {
        return text.isEmpty() ? List.of() : CellLines.wrap(glyphs, size, text, width);
    }

    /** Lines of a paragraph of {@code style} over the text width of {@code flow}. */
    List<String> lines(PageFlow flow, String text, Style style) {
        return lines(text, style.size(), flow.right() - flow.left() - style.indent());
    }

    /** Moves {@code trial} as a paragraph of {@code style} would up to its first line; returns that line's page. */
    int firstLine(PageFlow trial, Style style) {
        trial.beginParagraph(style.leading(), style.spacingBefore());
        trial.line();
        return trial.page();
    }

    /** A paragraph; each line a link to {@code goTo} when it is not null. */
    void paragraph(PageFlow flow, List<String> lines, Style style, String goTo) {
        flow.beginParagraph(style.leading(), style.spacingBefore());
        float x = flow.left() + style.indent();
        boolean open = false;
        for (String line : lines) {
            float base = flow.line();
            if (flow.isTrial()) {
                continue;
            }
            if (!open) {
                begin(style);
                open = true;
            }
            cb.setTextMatrix(x, base);
            cb.showText(line);
            if (goTo != null) {
                cb.localGoto(goTo, x, base, x + glyphs.points(line, 0, line.length(), style.size()),
                        base + style.size());
            }
            if (flow.pageEndsHere()) {
                end();
                open = false;
            }
        }
        if (open) {
            end();
        }
        flow.endParagraph(style.spacingAfter());
    }

    /**
     * A heading, the named destination {@code id} at its first line. A heading of one line is a paragraph; one that
     * wraps is kept together on one page, without space below (as OpenPDF kept a paragraph together, in a table).
     * Returns the page of its last line.
     */
    int heading(PageFlow flow, List<String> lines, Style style, String id) {
        flow.beginParagraph(style.leading(), style.spacingBefore());
        int page;
        if (lines.size() <= 1) {
            for (String line : lines) {
                float base = flow.line();
                draw(flow, style, List.of(line), base, style.leading(), id);
            }
            page = flow.page();
            flow.endParagraph(style.spacingAfter());
        } else {
            float height = lines.size() * style.leading();
            float top = flow.blockTop(0, height);
            draw(flow, style, lines, top - style.leading(), style.leading(), id);
            page = flow.page();
            flow.endBlock(top - height);
            flow.endParagraph(0);
        }
        return page;
    }

    /** Draws {@code lines} from baseline {@code base} down, {@code step} apart; a destination at the first. */
    private void draw(PageFlow flow, Style style, List<String> lines, float base, float step, String id) {
        if (flow.isTrial() || lines.isEmpty()) {
            return;
        }
        float x = flow.left() + style.indent();
        begin(style);
        for (int i = 0; i < lines.size(); i++) {
            cb.setTextMatrix(x, base - i * step);
            cb.showText(lines.get(i));
        }
        end();
        if (id != null) {
            cb.localDestination(id, new PdfDestination(PdfDestination.XYZ, x, base + style.size(), 0));
        }
    }

    /** Height of a caution box of {@code lines} (at least one) of text {@code size}. */
    static float boxHeight(List<String> lines, float size) {
        return 2 * BOX_PADDING + Math.max(1, lines.size()) * size;
    }

    /** Lines of a caution box of body text {@code size}: "Caution. " and the text, inside the padding. */
    List<String> cautionLines(PageFlow flow, String text, float size) {
        return lines(CAUTION + text, size, flow.right() - flow.left() - 2 * BOX_PADDING);
    }

    /**
     * A caution box: a tinted box across the text width with a bar on its left, the wrapped text inside its
     * padding. It moves to the next page when it does not fit; one taller than a page fills pages to their foot.
     */
    void caution(PageFlow flow, List<String> lines, float size, Color bar, Color fill) {
        float top = flow.blockTop(BOX_SPACING, boxHeight(lines, size));
        int from = 0;
        while (true) {
            int rest = lines.size() - from;
            float height = 2 * BOX_PADDING + Math.max(1, rest) * size;
            if (top - height >= flow.bottom()) {
                box(flow, lines.subList(from, lines.size()), size, top, height, bar, fill);
                flow.endBlock(top - height - BOX_SPACING);
                return;
            }
            // taller than the room to the foot of a page: as many lines as fit, the box down to the foot
            int fit = Math.max(1, (int) Math.floor((top - flow.bottom() - 2 * BOX_PADDING) / size));
            box(flow, lines.subList(from, from + Math.min(fit, rest)), size, top, top - flow.bottom(), bar, fill);
            from += Math.min(fit, rest);
            flow.drawn();
            flow.newPage();
            top = flow.top();
        }
    }

    private void box(PageFlow flow, List<String> lines, float size, float top, float height, Color bar,
            Color fill) {
        if (flow.isTrial()) {
            return;
        }
        float left = flow.left();
        cb.saveState();
        cb.setColorFill(fill);
        cb.rectangle(left, top - height, flow.right() - left, height);
        cb.fill();
        cb.setColorStroke(bar);
        cb.setLineWidth(BOX_BAR);
        cb.moveTo(left + BOX_BAR / 2, top);
        cb.lineTo(left + BOX_BAR / 2, top - height);
        cb.stroke();
        cb.restoreState();
        Style body = new Style(size, Color.BLACK, BOX_PADDING, 0, 0);
        draw(flow, body, lines, top - BOX_PADDING - size, size, null);
    }

    private void begin(Style style) {
        cb.saveState();
        cb.beginText();
        cb.setFontAndSize(font, style.size());
        cb.setColorFill(style.ink());
    }

    private void end() {
        cb.endText();
        cb.restoreState();
    }
}
