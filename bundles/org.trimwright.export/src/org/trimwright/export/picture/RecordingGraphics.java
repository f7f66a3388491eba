package org.trimwright.export.picture;

import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GraphicsConfiguration;
import java.awt.Image;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.font.FontRenderContext;
import java.awt.font.GlyphVector;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.awt.image.BufferedImageOp;
import java.awt.image.ImageObserver;
import java.awt.image.RenderedImage;
import java.awt.image.renderable.RenderableImage;
import java.text.AttributedCharacterIterator;
import java.text.AttributedString;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/**
 * A {@code Graphics2D} that draws nothing and records every drawing and state call, so that the drawing can be
 * painted later into other graphics ({@link Picture#paint}). Mutable arguments (shapes, transforms, text iterators)
 * are copied when recorded. Queries are answered from the recorder's own state: transform and clip are tracked as a
 * target would track them, and font measurements come from an off-screen image with fractional metrics (the
 * measurement JFreeSVG uses), so a layout computed while recording is the layout painted everywhere.
 * <p>
 * A picture is {@linkplain Picture#plain() plain} when it uses only shapes, plain strings, colours (with alpha), basic
 * strokes, source-over alpha, untransformed fonts, transforms and clips: what a chart draws.
 * <p>
 * Not thread-safe (like any {@code Graphics2D}); record each picture on one thread.
 */
public final class RecordingGraphics extends Graphics2D {

    private static final ThreadLocal<Graphics2D> METRICS = ThreadLocal.withInitial(() -> {
        Graphics2D g = new BufferedImage(8, 8, BufferedImage.TYPE_INT_RGB).createGraphics();
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        return g;
    });

    /** Shared by a recorder and the graphics it creates. */
    private static final class Tape {
        final List<Picture.Op> ops = new ArrayList<>(512);
        int targets = 1;
        boolean plain = true;
        /** Drawing calls recorded so far (state calls not counted). */
        long draws;
        /** Lines drawn one after another in one state, gathered into one path (see mergeLines); null if none. */
        Path2D.Double lines;
        /** The graphics that drew {@link #lines}, the draw count after it, and its state then. */
        RecordingGraphics linesBy;
        long linesDraws;
        Object[] linesState;
    }

    private final Tape tape;
    private final int target;
    private final double width;
    private final double height;
    private final ClipState geometry;
    private Paint paint = Color.BLACK;
    private Color color = Color.BLACK;
    private Stroke stroke = new BasicStroke(1f);
    private Font font = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    private Composite composite = AlphaComposite.SrcOver;
    private Color background = Color.WHITE;
    private final RenderingHints hints;
    /**
     * Whether paint, stroke and font were set through this graphics: only then does its target hold the same value,
     * so a call setting it again can be left out.
     */
    private boolean paintSet;
    private boolean strokeSet;
    private boolean fontSet;
    private final java.util.Set<Object> hintsSet = new java.util.HashSet<>();
    private static final Class<?> STANDARD_KEY = RenderingHints.KEY_ANTIALIASING.getClass();

    private final boolean mergeLines;

    /**
     * How a recorded layout measured text (on this thread): painters that set text in another font use it to spread
     * the text to the measured width.
     */
    public static FontRenderContext layoutContext() {
        return METRICS.get().getFontRenderContext();
    }

    /** A recorder for a drawing area of {@code width} x {@code height} (kept in the picture; not a clip). */
    public RecordingGraphics(double width, double height) {
        this(width, height, false);
    }

    /**
     * A recorder that, when {@code mergeLines}, records straight lines drawn one after another with no other call
     * in between (so with the same paint, stroke, transform and clip: grid lines, tick marks) as one path of
     * separate segments: one element in SVG and one stroke in PDF instead of one per line. The pixels differ only
     * where such lines cross or overlap under antialiasing or translucent paint (drawn once instead of twice).
     */
    public RecordingGraphics(double width, double height, boolean mergeLines) {
        this.tape = new Tape();
        this.target = 0;
        this.width = width;
        this.height = height;
        this.geometry = new ClipState();
        this.hints = new RenderingHints(null);
        this.mergeLines = mergeLines;
    }

    private RecordingGraphics(RecordingGraphics parent, int target) {
        this.tape = parent.tape;
        this.target = target;
        this.width = parent.width;
        this.height = parent.height;
        this.geometry = parent.geometry.copy();
        this.paint = parent.paint;
        this.color = parent.color;
        this.stroke = parent.stroke;
        this.font = parent.font;
        this.composite = parent.composite;
        this.background = parent.background;
        this.hints = (RenderingHints) parent.hints.clone();
        this.mergeLines = parent.mergeLines;
        // the created target starts with the state of the parent's target
        this.paintSet = parent.paintSet;
        this.strokeSet = parent.strokeSet;
        this.fontSet = parent.fontSet;
        this.hintsSet.addAll(parent.hintsSet);
    }

    /** The drawing recorded so far (by this recorder and every graphics it created). */
    public Picture picture() {
        return new Picture(width, height, tape.ops, tape.targets, tape.plain);
    }

    /** Records a drawing call. */
    private void rec(Consumer<Graphics2D> call) {
        tape.ops.add(new Picture.Op(target, call));
        tape.draws++;
    }

    /** Records a drawing call that makes the picture not {@linkplain Picture#plain() plain}. */
    private void recOther(Consumer<Graphics2D> call) {
        tape.plain = false;
        rec(call);
    }

    /** Records a state call (paint, stroke, font, hints, transform, clip). */
    private void recState(Consumer<Graphics2D> call) {
        tape.ops.add(new Picture.Op(target, call));
    }

    /** Records a state call that makes the picture not {@linkplain Picture#plain() plain}. */
    private void recOtherState(Consumer<Graphics2D> call) {
        tape.plain = false;
        recState(call);
    }

    // ---- drawing

    @Override
    public void draw(Shape s) {
        if (mergeLines && s instanceof Line2D l) {
            drawLine(l);
            return;
        }
        Shape c = Shapes.copy(s);
        rec(g -> g.draw(c));
    }

    /**
     * A line joins the open path of lines when nothing was drawn since that path and everything a line's look
     * depends on (paint, stroke, composite, hints, transform, clip) is as it was then; state calls recorded in
     * between are kept (they leave the state as it was, so replaying them after the path changes nothing).
     */
    private void drawLine(Line2D l) {
        Object[] state = {paint, stroke, composite, hints, geometry.transform(), geometry.deviceClip()};
        if (tape.lines != null && tape.linesBy == this && tape.linesDraws == tape.draws
                && sameState(tape.linesState, state)) {
            tape.lines.moveTo(l.getX1(), l.getY1());
            tape.lines.lineTo(l.getX2(), l.getY2());
            return;
        }
        Path2D.Double path = new Path2D.Double(Path2D.WIND_NON_ZERO, 8);
        path.moveTo(l.getX1(), l.getY1());
        path.lineTo(l.getX2(), l.getY2());
        rec(g -> g.draw(path));
        tape.lines = path;
        tape.linesBy = this;
        tape.linesDraws = tape.draws;
        tape.linesState = new Object[] {paint, stroke, composite, hints.clone(), new AffineTransform(
                geometry.transform()), geometry.deviceClip()};
    }

    private static boolean sameState(Object[] then, Object[] now) {
        for (int i = 0; i < then.length - 1; i++) {
            if (!then[i].equals(now[i])) {
                return false;
            }
        }
        // the clip object changes whenever the clip is set (ClipState), so identity is enough
        return then[then.length - 1] == now[now.length - 1];
    }

    @Override
    public void fill(Shape s) {
        Shape c = Shapes.copy(s);
        rec(g -> g.fill(c));
    }

    @Override
    public void drawString(String str, int x, int y) {
        rec(g -> g.drawString(str, x, y));
    }

    @Override
    public void drawString(String str, float x, float y) {
        rec(g -> g.drawString(str, x, y));
    }

    @Override
    public void drawString(AttributedCharacterIterator iterator, int x, int y) {
        AttributedString copy = new AttributedString(iterator);
        recOther(g -> g.drawString(copy.getIterator(), x, y));
    }

    @Override
    public void drawString(AttributedCharacterIterator iterator, float x, float y) {
        AttributedString copy = new AttributedString(iterator);
        recOther(g -> g.drawString(copy.getIterator(), x, y));
    }

    @Override
    public void drawGlyphVector(GlyphVector gv, float x, float y) {
        recOther(g -> g.drawGlyphVector(gv, x, y));
    }

    @Override
    public void drawLine(int x1, int y1, int x2, int y2) {
        rec(g -> g.drawLine(x1, y1, x2, y2));
    }

    @Override
    public void drawRect(int x, int y, int w, int h) {
        rec(g -> g.drawRect(x, y, w, h));
    }

    @Override
    public void fillRect(int x, int y, int w, int h) {
        rec(g -> g.fillRect(x, y, w, h));
    }

    @Override
    public void clearRect(int x, int y, int w, int h) {
        rec(g -> g.clearRect(x, y, w, h));
    }

    @Override
    public void drawRoundRect(int x, int y, int w, int h, int aw, int ah) {
        recOther(g -> g.drawRoundRect(x, y, w, h, aw, ah));
    }

    @Override
    public void fillRoundRect(int x, int y, int w, int h, int aw, int ah) {
        recOther(g -> g.fillRoundRect(x, y, w, h, aw, ah));
    }

    @Override
    public void drawOval(int x, int y, int w, int h) {
        recOther(g -> g.drawOval(x, y, w, h));
    }

    @Override
    public void fillOval(int x, int y, int w, int h) {
        recOther(g -> g.fillOval(x, y, w, h));
    }

    @Override
    public void drawArc(int x, int y, int w, int h, int start, int arc) {
        recOther(g -> g.drawArc(x, y, w, h, start, arc));
    }

    @Override
    public void fillArc(int x, int y, int w, int h, int start, int arc) {
        recOther(g -> g.fillArc(x, y, w, h, start, arc));
    }

    @Override
    public void drawPolyline(int[] xs, int[] ys, int n) {
        int[] x = xs.clone();
        int[] y = ys.clone();
        recOther(g -> g.drawPolyline(x, y, n));
    }

    @Override
    public void drawPolygon(int[] xs, int[] ys, int n) {
        int[] x = xs.clone();
        int[] y = ys.clone();
        recOther(g -> g.drawPolygon(x, y, n));
    }

    @Override
    public void fillPolygon(int[] xs, int[] ys, int n) {
        int[] x = xs.clone();
        int[] y = ys.clone();
        recOther(g -> g.fillPolygon(x, y, n));
    }

    @Override
    public void copyArea(int x, int y, int w, int h, int dx, int dy) {
        recOther(g -> g.copyArea(x, y, w, h, dx, dy));
    }

    // ---- images (recorded by reference: images handed to a Graphics are not changed afterwards by JFreeChart)

    @Override
    public boolean drawImage(Image img, AffineTransform xform, ImageObserver obs) {
        AffineTransform t = xform == null ? null : new AffineTransform(xform);
        recOther(g -> g.drawImage(img, t, obs));
        return true;
    }

    @Override
    public void drawImage(BufferedImage img, BufferedImageOp op, int x, int y) {
        recOther(g -> g.drawImage(img, op, x, y));
    }

    @Override
    public void drawRenderedImage(RenderedImage img, AffineTransform xform) {
        AffineTransform t = new AffineTransform(xform);
        recOther(g -> g.drawRenderedImage(img, t));
    }

    @Override
    public void drawRenderableImage(RenderableImage img, AffineTransform xform) {
        AffineTransform t = new AffineTransform(xform);
        recOther(g -> g.drawRenderableImage(img, t));
    }

    @Override
    public boolean drawImage(Image img, int x, int y, ImageObserver obs) {
        recOther(g -> g.drawImage(img, x, y, obs));
        return true;
    }

    @Override
    public boolean drawImage(Image img, int x, int y, int w, int h, ImageObserver obs) {
        recOther(g -> g.drawImage(img, x, y, w, h, obs));
        return true;
    }

    @Override
    public boolean drawImage(Image img, int x, int y, Color bg, ImageObserver obs) {
        recOther(g -> g.drawImage(img, x, y, bg, obs));
        return true;
    }

    @Override
    public boolean drawImage(Image img, int x, int y, int w, int h, Color bg, ImageObserver obs) {
        recOther(g -> g.drawImage(img, x, y, w, h, bg, obs));
        return true;
    }

    @Override
    public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2,
            ImageObserver obs) {
        recOther(g -> g.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, obs));
        return true;
    }

    @Override
    public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2,
            Color bg, ImageObserver obs) {
        recOther(g -> g.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, bg, obs));
        return true;
    }

    // ---- state

    @Override
    public void setPaint(Paint p) {
        if (p == null || (paintSet && p.equals(paint))) {
            return;
        }
        paintSet = true;
        paint = p;
        if (p instanceof Color c) {
            color = c;
            recState(g -> g.setPaint(p));
        } else {
            recOtherState(g -> g.setPaint(p));
        }
    }

    @Override
    public Paint getPaint() {
        return paint;
    }

    @Override
    public void setColor(Color c) {
        if (c == null || (paintSet && c.equals(paint))) {
            return;
        }
        paintSet = true;
        paint = c;
        color = c;
        recState(g -> g.setColor(c));
    }

    @Override
    public Color getColor() {
        return color;
    }

    @Override
    public void setStroke(Stroke s) {
        if (s == null) {
            throw new IllegalArgumentException("null stroke");
        }
        if (strokeSet && s.equals(stroke)) {
            return;
        }
        strokeSet = true;
        stroke = s;
        if (s instanceof BasicStroke) {
            recState(g -> g.setStroke(s));
        } else {
            recOtherState(g -> g.setStroke(s));
        }
    }

    @Override
    public Stroke getStroke() {
        return stroke;
    }

    @Override
    public void setFont(Font f) {
        if (f == null || (fontSet && f.equals(font))) {
            return;
        }
        fontSet = true;
        font = f;
        if (f.isTransformed()) {
            recOtherState(g -> g.setFont(f));
        } else {
            recState(g -> g.setFont(f));
        }
    }

    @Override
    public Font getFont() {
        return font;
    }

    @Override
    public void setComposite(Composite c) {
        if (c == null) {
            throw new IllegalArgumentException("null composite");
        }
        composite = c;
        if (c instanceof AlphaComposite a && a.getRule() == AlphaComposite.SRC_OVER) {
            recState(g -> g.setComposite(c));
        } else {
            recOtherState(g -> g.setComposite(c));
        }
    }

    @Override
    public Composite getComposite() {
        return composite;
    }

    @Override
    public void setBackground(Color c) {
        background = c;
        recState(g -> g.setBackground(c));
    }

    @Override
    public Color getBackground() {
        return background;
    }

    @Override
    public void setPaintMode() {
        recOtherState(Graphics::setPaintMode);
    }

    @Override
    public void setXORMode(Color c) {
        recOtherState(g -> g.setXORMode(c));
    }

    @Override
    public void setRenderingHint(RenderingHints.Key key, Object value) {
        // a standard Java 2D hint set to the value it already has changes nothing; other keys (e.g. JFreeChart's
        // element markers) may act on every call, so they are always recorded
        if (value != null && key.getClass() == STANDARD_KEY && hintsSet.contains(key) && value.equals(hints.get(key))) {
            return;
        }
        if (key.getClass() == STANDARD_KEY) {
            hintsSet.add(key);
        }
        if (value == null) {
            hints.remove(key);
        } else {
            hints.put(key, value);
        }
        recState(g -> g.setRenderingHint(key, value));
    }

    @Override
    public Object getRenderingHint(RenderingHints.Key key) {
        return hints.get(key);
    }

    @Override
    public void setRenderingHints(Map<?, ?> map) {
        hints.clear();
        hints.putAll(map);
        hintsSet.clear();
        hintsSet.addAll(map.keySet());
        Map<?, ?> copy = Map.copyOf(map);
        recState(g -> g.setRenderingHints(copy));
    }

    @Override
    public void addRenderingHints(Map<?, ?> map) {
        hints.putAll(map);
        hintsSet.addAll(map.keySet());
        Map<?, ?> copy = Map.copyOf(map);
        recState(g -> g.addRenderingHints(copy));
    }

    @Override
    public RenderingHints getRenderingHints() {
        return (RenderingHints) hints.clone();
    }

    // ---- transform

    @Override
    public void translate(int x, int y) {
        geometry.transform().translate(x, y);
        recState(g -> g.translate(x, y));
    }

    @Override
    public void translate(double x, double y) {
        geometry.transform().translate(x, y);
        recState(g -> g.translate(x, y));
    }

    @Override
    public void rotate(double theta) {
        geometry.transform().rotate(theta);
        recState(g -> g.rotate(theta));
    }

    @Override
    public void rotate(double theta, double x, double y) {
        geometry.transform().rotate(theta, x, y);
        recState(g -> g.rotate(theta, x, y));
    }

    @Override
    public void scale(double sx, double sy) {
        geometry.transform().scale(sx, sy);
        recState(g -> g.scale(sx, sy));
    }

    @Override
    public void shear(double shx, double shy) {
        geometry.transform().shear(shx, shy);
        recState(g -> g.shear(shx, shy));
    }

    @Override
    public void transform(AffineTransform t) {
        AffineTransform c = new AffineTransform(t);
        geometry.transform().concatenate(c);
        recState(g -> g.transform(c));
    }

    @Override
    public void setTransform(AffineTransform t) {
        AffineTransform c = new AffineTransform(t);
        geometry.transform().setTransform(c);
        recState(g -> g.setTransform(c));
    }

    @Override
    public AffineTransform getTransform() {
        return new AffineTransform(geometry.transform());
    }

    // ---- clip

    @Override
    public void clip(Shape s) {
        Shape c = s == null ? null : Shapes.copy(s);
        geometry.clip(c);
        recState(g -> g.clip(c));
    }

    @Override
    public void clipRect(int x, int y, int w, int h) {
        geometry.clip(new Rectangle(x, y, w, h));
        recState(g -> g.clipRect(x, y, w, h));
    }

    @Override
    public void setClip(int x, int y, int w, int h) {
        geometry.setClip(new Rectangle(x, y, w, h));
        recState(g -> g.setClip(x, y, w, h));
    }

    @Override
    public void setClip(Shape s) {
        Shape c = s == null ? null : Shapes.copy(s);
        geometry.setClip(c);
        recState(g -> g.setClip(c));
    }

    @Override
    public Shape getClip() {
        return geometry.userClip();
    }

    @Override
    public Rectangle getClipBounds() {
        Shape c = getClip();
        return c == null ? null : c.getBounds();
    }

    @Override
    public boolean hit(Rectangle rect, Shape s, boolean onStroke) {
        Shape shape = onStroke ? stroke.createStrokedShape(s) : s;
        return geometry.transform().createTransformedShape(shape).intersects(rect);
    }

    // ---- measurement and lifecycle

    @Override
    public FontMetrics getFontMetrics(Font f) {
        return METRICS.get().getFontMetrics(f);
    }

    @Override
    public FontRenderContext getFontRenderContext() {
        return METRICS.get().getFontRenderContext();
    }

    @Override
    public GraphicsConfiguration getDeviceConfiguration() {
        return METRICS.get().getDeviceConfiguration();
    }

    @Override
    public Graphics create() {
        int child = tape.targets++;
        tape.plain = false;
        tape.draws++;
        tape.ops.add(new Picture.Op(target, new Picture.Create(child)));
        return new RecordingGraphics(this, child);
    }

    @Override
    public void dispose() {
        if (target != 0) {
            rec(Graphics::dispose);
        }
    }
}
