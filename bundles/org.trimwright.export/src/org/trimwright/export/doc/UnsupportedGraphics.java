package org.trimwright.export.doc;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GraphicsConfiguration;
import java.awt.Image;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.font.GlyphVector;
import java.awt.geom.AffineTransform;
import java.awt.image.BufferedImage;
import java.awt.image.BufferedImageOp;
import java.awt.image.ImageObserver;
import java.awt.image.RenderedImage;
import java.awt.image.renderable.RenderableImage;
import java.text.AttributedCharacterIterator;

/**
 * A {@code Graphics2D} base whose every drawing, image, measuring and lifecycle call is refused with
 * {@link UnsupportedOperationException}; a lean painter overrides the calls it supports. State calls a lean painter
 * must provide ({@code setPaint}, {@code setStroke}, transforms, clips, hints) stay abstract.
 */
abstract class UnsupportedGraphics extends Graphics2D {

    private static UnsupportedOperationException refused(String what) {
        return new UnsupportedOperationException(what + " is not supported by this painter");
    }

    @Override
    public void draw(Shape s) {
        throw refused("draw");
    }

    @Override
    public void fill(Shape s) {
        throw refused("fill");
    }

    @Override
    public boolean drawImage(Image img, AffineTransform xform, ImageObserver obs) {
        throw refused("images");
    }

    @Override
    public void drawImage(BufferedImage img, BufferedImageOp op, int x, int y) {
        throw refused("images");
    }

    @Override
    public void drawRenderedImage(RenderedImage img, AffineTransform xform) {
        throw refused("images");
    }

    @Override
    public void drawRenderableImage(RenderableImage img, AffineTransform xform) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int x, int y, ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int x, int y, int width, int height, ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int x, int y, Color bgcolor, ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int x, int y, int width, int height, Color bgcolor, ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2,
            ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2,
            Color bgcolor, ImageObserver observer) {
        throw refused("images");
    }

    @Override
    public void drawString(String str, int x, int y) {
        throw refused("text");
    }

    @Override
    public void drawString(String str, float x, float y) {
        throw refused("text");
    }

    @Override
    public void drawString(AttributedCharacterIterator iterator, int x, int y) {
        throw refused("attributed text");
    }

    @Override
    public void drawString(AttributedCharacterIterator iterator, float x, float y) {
        throw refused("attributed text");
    }

    @Override
    public void drawGlyphVector(GlyphVector g, float x, float y) {
        throw refused("glyph vectors");
    }

    @Override
    public boolean hit(Rectangle rect, Shape s, boolean onStroke) {
        throw refused("hit testing");
    }

    @Override
    public GraphicsConfiguration getDeviceConfiguration() {
        throw refused("device configuration");
    }

    @Override
    public FontRenderContext getFontRenderContext() {
        throw refused("font measurement");
    }

    @Override
    public FontMetrics getFontMetrics(Font f) {
        throw refused("font measurement");
    }

    @Override
    public Graphics create() {
        throw refused("create");
    }

    @Override
    public void setPaintMode() {
        // the only mode there is
    }

    @Override
    public void setXORMode(Color c1) {
        throw refused("XOR mode");
    }

    @Override
    public Rectangle getClipBounds() {
        Shape c = getClip();
        return c == null ? null : c.getBounds();
    }

    @Override
    public void copyArea(int x, int y, int width, int height, int dx, int dy) {
        throw refused("copyArea");
    }

    @Override
    public void drawLine(int x1, int y1, int x2, int y2) {
        throw refused("drawLine");
    }

    @Override
    public void fillRect(int x, int y, int width, int height) {
        throw refused("fillRect");
    }

    @Override
    public void clearRect(int x, int y, int width, int height) {
        throw refused("clearRect");
    }

    @Override
    public void drawRoundRect(int x, int y, int width, int height, int arcWidth, int arcHeight) {
        throw refused("round rectangles");
    }

    @Override
    public void fillRoundRect(int x, int y, int width, int height, int arcWidth, int arcHeight) {
        throw refused("round rectangles");
    }

    @Override
    public void drawOval(int x, int y, int width, int height) {
        throw refused("ovals");
    }

    @Override
    public void fillOval(int x, int y, int width, int height) {
        throw refused("ovals");
    }

    @Override
    public void drawArc(int x, int y, int width, int height, int startAngle, int arcAngle) {
        throw refused("arcs");
    }

    @Override
    public void fillArc(int x, int y, int width, int height, int startAngle, int arcAngle) {
        throw refused("arcs");
    }

    @Override
    public void drawPolyline(int[] xPoints, int[] yPoints, int nPoints) {
        throw refused("polylines");
    }

    @Override
    public void drawPolygon(int[] xPoints, int[] yPoints, int nPoints) {
        throw refused("polygons");
    }

    @Override
    public void fillPolygon(int[] xPoints, int[] yPoints, int nPoints) {
        throw refused("polygons");
    }

    @Override
    public void dispose() {
        // nothing held
    }
}
