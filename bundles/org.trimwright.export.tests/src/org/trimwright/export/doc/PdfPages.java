package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.apache.pdfbox.util.Matrix;

import com.lowagie.text.PageSize;

/**
 * What PDFBox (an independent PDF reader) finds on the pages: every glyph with its position, and every form XObject
 * (chart) with its box on the page. Coordinates from the top left of the page, as PDFBox's text positions give them.
 */
final class PdfPages {

    /** A4 with the document's margins: 40 left and right, 48 top and bottom. */
    static final float LEFT = 40;
    static final float RIGHT = PageSize.A4.getWidth() - 40;
    static final float TOP = 48;
    static final float BOTTOM = PageSize.A4.getHeight() - 48;

    private PdfPages() {
    }

    /**
     * A glyph: page (from 1), x, width, baseline and top (from the top of the page), size, text, and whether it is
     * drawn inside a form XObject (then clipped to the form's box).
     */
    record Glyph(int page, float x, float width, float baseline, float top, float size, String text,
            boolean inForm) {
    }

    /** A form XObject drawn on a page (only the outermost, not forms inside forms), box from the top left. */
    record Form(int page, Rectangle2D box) {
    }

    /** Glyphs and forms of the whole document. */
    record Content(List<Glyph> glyphs, List<Form> forms) {
    }

    static Content read(PDDocument pdf) throws IOException {
        List<Glyph> glyphs = new ArrayList<>();
        List<Form> forms = new ArrayList<>();
        PDFTextStripper strip = new PDFTextStripper() {
            private int depth;

            @Override
            protected void processTextPosition(TextPosition p) {
                glyphs.add(new Glyph(getCurrentPageNo(), p.getXDirAdj(), p.getWidthDirAdj(), p.getYDirAdj(),
                        p.getYDirAdj() - p.getHeightDir(), p.getFontSizeInPt(), p.getUnicode(), depth > 0));
            }

            @Override
            public void showForm(PDFormXObject form) throws IOException {
                if (depth == 0) {
                    Matrix m = form.getMatrix().multiply(getGraphicsState().getCurrentTransformationMatrix());
                    Rectangle2D box = form.getBBox().transform(m).getBounds2D();
                    float h = getCurrentPage().getMediaBox().getHeight();
                    forms.add(new Form(getCurrentPageNo(), new Rectangle2D.Double(box.getX(), h - box.getMaxY(),
                            box.getWidth(), box.getHeight())));
                }
                depth++;
                try {
                    super.showForm(form);
                } finally {
                    depth--;
                }
            }
        };
        strip.getText(pdf);
        return new Content(glyphs, forms);
    }

    /**
     * Every glyph that is not blank inside the margins (its baseline above the bottom one), every form too (text in
     * a form is clipped to the form's box: chart labels may run past it).
     */
    static void assertInsideMargins(Content c) {
        int checked = 0;
        for (Glyph g : c.glyphs()) {
            if (g.text().isBlank() || g.inForm()) {
                continue;
            }
            assertTrue(g.x() >= LEFT - 0.01f && g.x() + g.width() <= RIGHT + 0.5f, g + " inside the side margins");
            assertTrue(g.baseline() <= BOTTOM + 0.01f, g + " above the bottom margin");
            assertTrue(g.top() >= TOP - 1, g + " below the top margin");
            checked++;
        }
        assertTrue(checked > 0, "glyphs found");
        for (Form f : c.forms()) {
            Rectangle2D b = f.box();
            assertTrue(b.getMinX() >= LEFT - 0.01 && b.getMaxX() <= RIGHT + 0.01 && b.getMinY() >= TOP - 0.01
                    && b.getMaxY() <= BOTTOM + 0.01, f + " inside the margins");
        }
    }
}
