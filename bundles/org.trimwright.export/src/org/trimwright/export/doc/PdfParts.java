package org.trimwright.export.doc;

import java.awt.Color;
import java.util.Arrays;
import java.util.List;

import org.trimwright.export.picture.Picture;

import com.lowagie.text.DocumentException;

/**
 * The parts of a section as blocks on the pages of a {@link PageFlow}: paragraphs, caution boxes, label/value rows,
 * captioned tables and charts with their captions. A block can also be tried on a {@link PageFlow#trial()} up to its
 * first line, to see on which page it would start.
 */
final class PdfParts {

    /** One part, laid out. */
    interface Block {

        /** Moves {@code trial} as the block would up to its first line; returns the page that line is on. */
        int start(PageFlow trial);

        /** Draws the block at the flow's position and moves the flow below it. */
        void place() throws DocumentException;
    }

    static final Color MUTED = new Color(0x6B, 0x76, 0x80);
    private static final Color PLUM = new Color(0x8E, 0x3B, 0x6F);
    private static final Color TINT = new Color(0xF8, 0xEE, 0xF4);
    static final float BODY = 9.5f;
    static final PdfText.Style PARAGRAPH = new PdfText.Style(BODY, Color.BLACK, 0, 0, 4);
    static final PdfText.Style CAPTION = new PdfText.Style(8f, MUTED, 0, 0, 0);
    private static final PdfRowTable.Style KEY_VALUES = PdfRowTable.keyValues(MUTED);

    private final PageFlow flow;
    private final PdfText text;
    private final PdfRowTable tables;
    private final PdfChart charts;

    PdfParts(PageFlow flow, PdfText text, PdfRowTable tables, PdfChart charts) {
        this.flow = flow;
        this.text = text;
        this.tables = tables;
        this.charts = charts;
    }

    /** The block of {@code p}. */
    Block block(Part p) {
        if (p instanceof Part.Para para) {
            return paragraph(para.text(), PARAGRAPH);
        } else if (p instanceof Part.Caution c) {
            return caution(c.text());
        } else if (p instanceof Part.KeyValues kv) {
            return table(null, KEY_VALUES, null, kv.rows().stream().map(Arrays::asList).toList(), 4);
        } else if (p instanceof Part.Table t) {
            return table(t.caption(), PdfRowTable.data(t.header().size()), t.header(), t.rows(), 6);
        } else if (p instanceof Part.Chart c) {
            return chart(c.figure().drawn().picture(), c.figure().caption(c.caption()));
        }
        throw new IllegalArgumentException("unknown part " + p);
    }

    private Block paragraph(String s, PdfText.Style style) {
        List<String> lines = text.lines(flow, s, style);
        return new Block() {
            @Override
            public int start(PageFlow trial) {
                return text.firstLine(trial, style);
            }

            @Override
            public void place() {
                text.paragraph(flow, lines, style, null);
            }
        };
    }

    private Block caution(String s) {
        List<String> lines = text.cautionLines(flow, s, BODY);
        return new Block() {
            @Override
            public int start(PageFlow trial) {
                trial.blockTop(PdfText.BOX_SPACING, PdfText.boxHeight(lines, BODY));
                return trial.page();
            }

            @Override
            public void place() {
                text.caution(flow, lines, BODY, PLUM, TINT);
            }
        };
    }

    private Block table(String caption, PdfRowTable.Style style, List<String> header, List<? extends List<String>> rows,
            float spacingAfter) {
        List<String> cap = caption == null ? null : text.lines(flow, caption, CAPTION);
        return new Block() {
            @Override
            public int start(PageFlow trial) {
                if (cap != null) {
                    text.paragraph(trial, cap, CAPTION, null);
                }
                tables.start(trial, style, header, rows);
                return trial.page();
            }

            @Override
            public void place() {
                if (cap != null) {
                    text.paragraph(flow, cap, CAPTION, null);
                }
                flow.endTable(tables.write(style, header, rows), spacingAfter);
            }
        };
    }

    private Block chart(Picture picture, String caption) {
        return new Block() {
            @Override
            public int start(PageFlow trial) {
                PdfChart.start(trial, picture);
                return trial.page();
            }

            @Override
            public void place() throws DocumentException {
                charts.place(flow, picture);
                text.paragraph(flow, text.lines(flow, caption, CAPTION), CAPTION, null);
            }
        };
    }
}
