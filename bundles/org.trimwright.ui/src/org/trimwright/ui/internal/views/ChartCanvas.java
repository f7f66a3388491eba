package org.trimwright.ui.internal.views;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.jfree.chart.JFreeChart;

/**
 * Draws a JFreeChart in SWT: the chart is rendered with Java2D into an image of the canvas size, converted to
 * SWT image data and painted (rendered again only when the chart or the size changes). Java2D rendering gives
 * the same anti-aliased lines as the exported documents.
 */
public final class ChartCanvas {

    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    private final Canvas canvas;
    private JFreeChart chart;
    private Image image;
    private ImageData imageData;

    public ChartCanvas(Composite parent) {
        canvas = new Canvas(parent, SWT.NO_BACKGROUND | SWT.DOUBLE_BUFFERED);
        canvas.addListener(SWT.Paint, e -> {
            Rectangle area = canvas.getClientArea();
            if (chart == null || area.width < 10 || area.height < 10) {
                e.gc.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
                e.gc.fillRectangle(area);
                return;
            }
            if (image == null || image.getBounds().width != area.width || image.getBounds().height != area.height) {
                render(area.width, area.height);
            }
            e.gc.drawImage(image, 0, 0);
        });
        canvas.addListener(SWT.Dispose, e -> disposeImage());
    }

    public Canvas control() {
        return canvas;
    }

    public JFreeChart chart() {
        return chart;
    }

    /** Shows {@code c} (null clears). */
    public void setChart(JFreeChart c) {
        chart = c;
        disposeImage();
        canvas.redraw();
    }

    /** The image data last painted (for screenshots), or null. */
    public ImageData imageData() {
        return imageData;
    }

    private void render(int w, int h) {
        disposeImage();
        BufferedImage bi = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = bi.createGraphics();
        g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        chart.draw(g2, new Rectangle2D.Double(0, 0, w, h));
        g2.dispose();
        imageData = toImageData(bi);
        image = new Image(canvas.getDisplay(), imageData);
    }

    /** Converts an RGB BufferedImage to SWT image data. */
    static ImageData toImageData(BufferedImage bi) {
        int w = bi.getWidth();
        int h = bi.getHeight();
        ImageData data = new ImageData(w, h, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        int[] row = new int[w];
        for (int y = 0; y < h; y++) {
            bi.getRGB(0, y, w, 1, row, 0, w);
            for (int x = 0; x < w; x++) {
                row[x] &= 0xFFFFFF;
            }
            data.setPixels(0, y, w, row, 0);
        }
        return data;
    }

    private void disposeImage() {
        if (image != null) {
            image.dispose();
            image = null;
        }
    }
}
