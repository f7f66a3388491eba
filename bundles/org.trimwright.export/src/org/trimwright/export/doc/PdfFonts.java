package org.trimwright.export.doc;

import java.io.IOException;
import java.io.InputStream;

import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontMapper;

/**
 * The one embedded font of the PDF: Liberation Sans as shipped inside OpenPDF (SIL Open Font License), with
 * Identity-H encoding so Greek letters, minus and the like print; embedded as a subset. Charts map every AWT font to
 * it, so chart text stays text (vector, searchable).
 */
final class PdfFonts implements FontMapper {

    private static final String RESOURCE = "/font-fallback/LiberationSans-Regular.ttf";

    private final BaseFont base;

    PdfFonts() {
        try (InputStream in = BaseFont.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("font " + RESOURCE + " not found in OpenPDF");
            }
            byte[] ttf = in.readAllBytes();
            base = BaseFont.createFont("LiberationSans-Regular.ttf", BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false,
                    ttf, null);
        } catch (IOException | DocumentException e) {
            throw new IllegalStateException("cannot load the PDF font: " + e.getMessage(), e);
        }
    }

    BaseFont base() {
        return base;
    }

    @Override
    public BaseFont awtToPdf(java.awt.Font font) {
        return base;
    }

    @Override
    public java.awt.Font pdfToAwt(BaseFont font, int size) {
        return new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.PLAIN, size);
    }
}
