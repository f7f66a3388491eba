package org.trimwright.ui.internal.editor;

import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/**
 * The bits of a register, most significant on the left, each cell coloured by the field that owns it; a bit that
 * two fields claim is red, a bit nobody owns is grey. The selected field is outlined; a click selects a field.
 */
public final class BitMapCanvas {

    /** Height the canvas asks for. */
    public static final int HEIGHT = 64;

    private static final RGB[] PALETTE = {
        new RGB(178, 223, 219), new RGB(255, 224, 178), new RGB(197, 202, 233), new RGB(220, 237, 200),
        new RGB(248, 187, 208), new RGB(215, 204, 200), new RGB(179, 229, 252), new RGB(255, 245, 157)};

    private final Canvas canvas;
    private Register register;
    private Field selected;

    BitMapCanvas(Composite parent, Consumer<Field> onClick) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
        canvas.addListener(SWT.Paint, this::paint);
        canvas.addListener(SWT.MouseDown, e -> {
            Field f = fieldAt(e.x, e.y);
            if (f != null && onClick != null) {
                onClick.accept(f);
            }
        });
        canvas.addListener(SWT.Resize, e -> canvas.redraw());
    }

    public Control control() {
        return canvas;
    }

    /** Shows {@code r} (null for nothing) with {@code field} outlined. */
    public void show(Register r, Field field) {
        register = r;
        selected = field;
        canvas.redraw();
    }

    /** The fields that own bit {@code bit} of the shown register (for tests and tool tips). */
    public java.util.List<Field> owners(int bit) {
        java.util.List<Field> out = new java.util.ArrayList<>();
        if (register != null) {
            for (Field f : register.getFields()) {
                if (bit >= f.getBitOffset() && bit < f.getBitOffset() + f.getWidth()) {
                    out.add(f);
                }
            }
        }
        return out;
    }

    private int width() {
        return register == null ? 0 : Math.max(1, Math.min(64, register.getWidth()));
    }

    private int cell() {
        int w = width();
        return w == 0 ? 0 : Math.max(8, Math.min(44, (canvas.getClientArea().width - 8) / w));
    }

    private Field fieldAt(int x, int y) {
        int w = width();
        int c = cell();
        if (w == 0 || x < 4 || x >= 4 + w * c || y < 14 || y > 14 + 28) {
            return null;
        }
        int bit = w - 1 - (x - 4) / c;
        java.util.List<Field> o = owners(bit);
        return o.isEmpty() ? null : o.get(0);
    }

    private void paint(Event e) {
        GC gc = e.gc;
        if (register == null) {
            return;
        }
        int w = width();
        int c = cell();
        int top = 14;
        int h = 28;
        Color grey = new Color(236, 239, 241);
        Color red = new Color(229, 57, 53);
        Color ink = e.display.getSystemColor(SWT.COLOR_BLACK);
        try {
            for (int bit = w - 1; bit >= 0; bit--) {
                int x = 4 + (w - 1 - bit) * c;
                java.util.List<Field> o = owners(bit);
                Color fill = o.isEmpty() ? grey : o.size() > 1 ? red
                        : new Color(PALETTE[register.getFields().indexOf(o.get(0)) % PALETTE.length]);
                gc.setBackground(fill);
                gc.fillRectangle(x, top, c, h);
                if (fill != grey && fill != red) {
                    fill.dispose();
                }
                gc.setForeground(e.display.getSystemColor(SWT.COLOR_DARK_GRAY));
                gc.drawRectangle(x, top, c, h);
                String label = Integer.toString(bit);
                Point ext = gc.textExtent(label);
                gc.setForeground(ink);
                gc.drawText(label, x + (c - ext.x) / 2, 0, true);
            }
            for (Field f : register.getFields()) {
                int lo = Math.max(0, f.getBitOffset());
                int hi = Math.min(w - 1, f.getBitOffset() + f.getWidth() - 1);
                if (hi < lo) {
                    continue;
                }
                int x0 = 4 + (w - 1 - hi) * c;
                int x1 = 4 + (w - lo) * c;
                String name = f.getName() == null ? "?" : f.getName();
                Point ext = gc.textExtent(name);
                gc.setForeground(ink);
                if (ext.x <= x1 - x0 - 2) {
                    gc.drawText(name, x0 + (x1 - x0 - ext.x) / 2, top + (h - ext.y) / 2, true);
                }
                if (f == selected) {
                    gc.setLineWidth(3);
                    gc.setForeground(new Color(0, 89, 79));
                    gc.drawRectangle(x0 + 1, top + 1, x1 - x0 - 2, h - 2);
                    gc.setLineWidth(1);
                }
            }
            gc.setForeground(e.display.getSystemColor(SWT.COLOR_DARK_GRAY));
            gc.drawText("bit owners of " + register.getName() + " (red: claimed twice, grey: free)", 4,
                    top + h + 4, true);
        } finally {
            grey.dispose();
            red.dispose();
        }
    }
}
