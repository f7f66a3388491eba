package org.trimwright.export.doc;

import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.Paint;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.AffineTransform;
import java.awt.geom.PathIterator;
import java.awt.geom.Rectangle2D;
import java.util.HashMap;
import java.util.Map;

import org.trimwright.export.picture.ClipState;
import org.trimwright.export.picture.RecordingGraphics;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfGState;

/**
 * Paints a {@linkplain org.trimwright.export.picture.Picture#plain() plain} chart picture into a PDF content stream
 * (a form XObject) with OpenPDF's content operators: paths for shapes and clips, text as text in the document's font,
 * RGB colours, alpha through shared graphics states. It supports exactly what a plain picture contains; everything
 * else is refused ({@link UnsupportedOperationException}), and {@link PdfDocument} paints other pictures through
 * OpenPDF's general {@code PdfGraphics2D}.
 * <p>
 * Why: {@code PdfGraphics2D} keeps a second, full Java 2D state per chart and re-derives fonts, clips and strokes on
 * every call, which made it the most expensive step of the PDF; painting a recorded picture needs none of that. The
 * output follows {@code PdfGraphics2D}'s conventions: y flipped to PDF space, the clip applied in a saved graphics
 * state, text spread by character spacing to the width the chart layout measured, bold type simulated by stroking
 * the glyph outlines with a line of size / 30 (the weight formula {@code PdfGraphics2D} uses).
 */
final class PdfChartCanvas extends UnsupportedGraphics {

    private final PdfContentByte cb;
    private final BaseFont font;
    private final Shared shared;
    /** User space to PDF space: the current transform after the y flip. */
    private final AffineTransform flip;
    /** Transform and clip (the clip in AWT device space, before the flip). */
    private final ClipState clip = new ClipState();
    private final AffineTransform transform = clip.transform();

    private Color paint = Color.BLACK;
    private Stroke stroke = new BasicStroke(1f);
    private Font awtFont = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    private float compositeAlpha = 1f;
    private Color background = Color.WHITE;
    private final RenderingHints hints = new RenderingHints(null);

    // what the content stream currently holds (reset when the clip state is restored)
    private Shape emittedClip;
    private boolean clipStateOpen;
    private Color emittedFill;
    private Color emittedStroke;
    private Stroke emittedLine;
    private int emittedAlpha = 255;

    /**
     * What the charts of one document share: the font, one graphics state per alpha (each written once) and the
     * widths of strings as the chart layout measured them. Use on the document's thread only.
     */
    static final class Shared {
        private static final int MAX_WIDTHS = 8192;

        final BaseFont font;
        final Map<Integer, PdfGState> alphas = new HashMap<>();
        private final Map<Font, Map<String, Float>> widths = new HashMap<>();
        private int cached;

        Shared(BaseFont font) {
            this.font = font;
        }

        /** Advance width of {@code s} in {@code f} as laid out (tick labels repeat, so widths are cached). */
        float layoutWidth(Font f, String s) {
            Map<String, Float> byText = widths.computeIfAbsent(f, k -> new HashMap<>());
            Float w = byText.get(s);
            if (w == null) {
                if (cached >= MAX_WIDTHS) {
                    widths.clear();
                    cached = 0;
                    byText = widths.computeIfAbsent(f, k -> new HashMap<>());
                }
                w = (float) f.getStringBounds(s, RecordingGraphics.layoutContext()).getWidth();
                byText.put(s, w);
                cached++;
            }
            return w;
        }
    }

    /**
     * @param cb     the content to paint into, {@code height} high (its y axis points up)
     * @param shared the document's font, graphics states and measurements
     */
    PdfChartCanvas(PdfContentByte cb, float height, Shared shared) {
        this.cb = cb;
        this.font = shared.font;
        this.shared = shared;
        this.flip = new AffineTransform(1, 0, 0, -1, 0, height);
    }

    // ---- painting

    @Override
    public void draw(Shape s) {
        prepare();
        strokeState();
        if (path(s) >= 0) {
            cb.stroke();
        }
    }

    @Override
    public void fill(Shape s) {
        prepare();
        fillState();
        int winding = path(s);
        if (winding == PathIterator.WIND_EVEN_ODD) {
            cb.eoFill();
        } else if (winding >= 0) {
            cb.fill();
        }
    }

    @Override
    public void drawLine(int x1, int y1, int x2, int y2) {
        draw(new java.awt.geom.Line2D.Float(x1, y1, x2, y2));
    }

    @Override
    public void drawRect(int x, int y, int w, int h) {
        draw(new Rectangle2D.Float(x, y, w, h));
    }

    @Override
    public void fillRect(int x, int y, int w, int h) {
        fill(new Rectangle2D.Float(x, y, w, h));
    }

    @Override
    public void clearRect(int x, int y, int w, int h) {
        Color p = paint;
        float a = compositeAlpha;
        paint = background;
        compositeAlpha = 1f;
        fillRect(x, y, w, h);
        paint = p;
        compositeAlpha = a;
    }

    @Override
    public void drawString(String str, int x, int y) {
        drawString(str, (float) x, (float) y);
    }

    @Override
    public void drawString(String str, float x, float y) {
        if (str == null || str.isEmpty()) {
            return;
        }
        prepare();
        fillState();
        AffineTransform m = new AffineTransform(flip);
        m.concatenate(transform);
        m.translate(x, y);
        m.scale(1, -1);
        float size = awtFont.getSize2D();
        boolean bold = awtFont.isBold();
        cb.beginText();
        cb.setFontAndSize(font, size);
        if (bold) {
            strokeColour();
            cb.setTextRenderingMode(PdfContentByte.TEXT_RENDER_MODE_FILL_STROKE);
            cb.setLineWidth(size / 30f);
            emittedLine = null;
        }
        cb.setTextMatrix((float) m.getScaleX(), (float) m.getShearY(), (float) m.getShearX(), (float) m.getScaleY(),
                (float) m.getTranslateX(), (float) m.getTranslateY());
        // the layout placed the text for its measured width; spread the PDF font's glyphs to that width
        float spacing = 0;
        if (str.length() > 1) {
            spacing = (shared.layoutWidth(awtFont, str) - font.getWidthPoint(str, size)) / (str.length() - 1);
            cb.setCharacterSpacing(spacing);
        }
        cb.showText(str);
        if (spacing != 0) {
            cb.setCharacterSpacing(0);
        }
        if (bold) {
            cb.setTextRenderingMode(PdfContentByte.TEXT_RENDER_MODE_FILL);
        }
        cb.endText();
    }

    /** Ends the painting: closes the clip's graphics state. */
    @Override
    public void dispose() {
        if (clipStateOpen) {
            cb.restoreState();
            clipStateOpen = false;
        }
    }

    // ---- state

    @Override
    public void setPaint(Paint p) {
        if (p instanceof Color c) {
            paint = c;
        } else if (p != null) {
            throw new UnsupportedOperationException("paint " + p.getClass().getName());
        }
    }

    @Override
    public Paint getPaint() {
        return paint;
    }

    @Override
    public void setColor(Color c) {
        if (c != null) {
            paint = c;
        }
    }

    @Override
    public Color getColor() {
        return paint;
    }

    @Override
    public void setStroke(Stroke s) {
        if (!(s instanceof BasicStroke)) {
            throw new UnsupportedOperationException("stroke " + (s == null ? "null" : s.getClass().getName()));
        }
        stroke = s;
    }

    @Override
    public Stroke getStroke() {
        return stroke;
    }

    @Override
    public void setFont(Font f) {
        if (f != null) {
            awtFont = f;
        }
    }

    @Override
    public Font getFont() {
        return awtFont;
    }

    @Override
    public void setComposite(Composite c) {
        if (!(c instanceof AlphaComposite a) || a.getRule() != AlphaComposite.SRC_OVER) {
            throw new UnsupportedOperationException("composite " + c);
        }
        compositeAlpha = a.getAlpha();
    }

    @Override
    public Composite getComposite() {
        return AlphaComposite.getInstance(AlphaComposite.SRC_OVER, compositeAlpha);
    }

    @Override
    public void setBackground(Color c) {
        background = c;
    }

    @Override
    public Color getBackground() {
        return background;
    }

    @Override
    public void setRenderingHint(RenderingHints.Key key, Object value) {
        if (value == null) {
            hints.remove(key);
        } else {
            hints.put(key, value);
        }
    }

    @Override
    public Object getRenderingHint(RenderingHints.Key key) {
        return hints.get(key);
    }

    @Override
    public void setRenderingHints(Map<?, ?> map) {
        hints.clear();
        hints.putAll(map);
    }

    @Override
    public void addRenderingHints(Map<?, ?> map) {
        hints.putAll(map);
    }

    @Override
    public RenderingHints getRenderingHints() {
        return (RenderingHints) hints.clone();
    }

    @Override
    public void translate(int x, int y) {
        transform.translate(x, y);
    }

    @Override
    public void translate(double x, double y) {
        transform.translate(x, y);
    }

    @Override
    public void rotate(double theta) {
        transform.rotate(theta);
    }

    @Override
    public void rotate(double theta, double x, double y) {
        transform.rotate(theta, x, y);
    }

    @Override
    public void scale(double sx, double sy) {
        transform.scale(sx, sy);
    }

    @Override
    public void shear(double shx, double shy) {
        transform.shear(shx, shy);
    }

    @Override
    public void transform(AffineTransform t) {
        transform.concatenate(t);
    }

    @Override
    public void setTransform(AffineTransform t) {
        transform.setTransform(t);
    }

    @Override
    public AffineTransform getTransform() {
        return new AffineTransform(transform);
    }

    @Override
    public void clip(Shape s) {
        clip.clip(s);
    }

    @Override
    public void clipRect(int x, int y, int w, int h) {
        clip(new Rectangle2D.Float(x, y, w, h));
    }

    @Override
    public void setClip(int x, int y, int w, int h) {
        setClip(new Rectangle2D.Float(x, y, w, h));
    }

    @Override
    public void setClip(Shape s) {
        clip.setClip(s);
    }

    @Override
    public Shape getClip() {
        return clip.userClip();
    }

    // ---- emission

    /** Brings the content's clip up to date (a new saved state holding just the clip). */
    private void prepare() {
        Shape c = clip.deviceClip();
        if ((c == emittedClip || (c instanceof Rectangle2D && c.equals(emittedClip)))
                && (c != null || !clipStateOpen)) {
            return;
        }
        if (clipStateOpen) {
            cb.restoreState();
            clipStateOpen = false;
            emittedFill = null;
            emittedStroke = null;
            emittedLine = null;
            emittedAlpha = 255;
        }
        if (c != null) {
            cb.saveState();
            clipStateOpen = true;
            int winding = emitPath(c, flip);
            if (winding == PathIterator.WIND_EVEN_ODD) {
                cb.eoClip();
            } else if (winding >= 0) {
                cb.clip();
            } else {
                // an empty clip: nothing shows
                cb.rectangle(0, 0, 0, 0);
                cb.clip();
            }
            cb.newPath();
        }
        emittedClip = c;
    }

    private void fillState() {
        alpha();
        if (!paint.equals(emittedFill)) {
            cb.setRGBColorFill(paint.getRed(), paint.getGreen(), paint.getBlue());
            emittedFill = paint;
        }
    }

    private void strokeColour() {
        if (!paint.equals(emittedStroke)) {
            cb.setRGBColorStroke(paint.getRed(), paint.getGreen(), paint.getBlue());
            emittedStroke = paint;
        }
    }

    private void strokeState() {
        alpha();
        strokeColour();
        if (stroke.equals(emittedLine)) {
            return;
        }
        BasicStroke b = (BasicStroke) stroke;
        float scale = (float) Math.sqrt(Math.abs(transform.getDeterminant()));
        cb.setLineWidth(b.getLineWidth() * scale);
        cb.setLineCap(b.getEndCap());
        cb.setLineJoin(b.getLineJoin());
        cb.setMiterLimit(Math.max(1f, b.getMiterLimit()));
        float[] dash = b.getDashArray();
        if (dash == null) {
            cb.setLineDash(0f);
        } else {
            float[] d = new float[dash.length];
            for (int i = 0; i < d.length; i++) {
                d[i] = dash[i] * scale;
            }
            cb.setLineDash(d, b.getDashPhase() * scale);
        }
        emittedLine = stroke;
    }

    /** Alpha of the paint times the composite's, through a shared graphics state. */
    private void alpha() {
        int a = Math.round(paint.getAlpha() * compositeAlpha);
        if (a == emittedAlpha) {
            return;
        }
        PdfGState gs = shared.alphas.computeIfAbsent(a, k -> {
            PdfGState g = new PdfGState();
            g.setFillOpacity(k / 255f);
            g.setStrokeOpacity(k / 255f);
            return g;
        });
        cb.setGState(gs);
        emittedAlpha = a;
    }

    private int path(Shape s) {
        AffineTransform m = new AffineTransform(flip);
        m.concatenate(transform);
        return emitPath(s, m);
    }

    /** Emits {@code s} under {@code m} as a path; returns its winding rule, or -1 when it has no segments. */
    private int emitPath(Shape s, AffineTransform m) {
        PathIterator it = s.getPathIterator(m);
        float[] c = new float[6];
        float x = 0;
        float y = 0;
        boolean any = false;
        while (!it.isDone()) {
            switch (it.currentSegment(c)) {
                case PathIterator.SEG_MOVETO -> {
                    cb.moveTo(c[0], c[1]);
                    x = c[0];
                    y = c[1];
                }
                case PathIterator.SEG_LINETO -> {
                    cb.lineTo(c[0], c[1]);
                    x = c[0];
                    y = c[1];
                }
                case PathIterator.SEG_QUADTO -> {
                    // the cubic with the same curve: control points 2/3 of the way to the quadratic's
                    cb.curveTo(x + 2f / 3 * (c[0] - x), y + 2f / 3 * (c[1] - y), c[2] + 2f / 3 * (c[0] - c[2]),
                            c[3] + 2f / 3 * (c[1] - c[3]), c[2], c[3]);
                    x = c[2];
                    y = c[3];
                }
                case PathIterator.SEG_CUBICTO -> {
                    cb.curveTo(c[0], c[1], c[2], c[3], c[4], c[5]);
                    x = c[4];
                    y = c[5];
                }
                default -> cb.closePath();
            }
            any = true;
            it.next();
        }
        return any ? it.getWindingRule() : -1;
    }
}
