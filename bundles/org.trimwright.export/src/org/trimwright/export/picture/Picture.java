package org.trimwright.export.picture;

import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * A drawing recorded once as the sequence of {@code Graphics2D} calls that made it, to be painted again into any
 * number of {@code Graphics2D} targets (e.g. JFreeSVG for the HTML document and OpenPDF for the PDF). Painting a
 * picture repeats the calls without redoing the layout behind them (axis ticks, label widths, legend arrangement),
 * so a chart laid out once costs only its target's drawing work for each further medium.
 * <p>
 * Built by {@link RecordingGraphics}; immutable once recorded, and safe to paint from several threads at once (each
 * into its own target).
 */
public final class Picture {

    /** One recorded call: applied to the target graphics of its index ({@code create()} adds targets). */
    record Op(int target, Consumer<Graphics2D> call) {
    }

    private final double width;
    private final double height;
    private final List<Op> ops;
    private final int targets;
    private final boolean plain;

    Picture(double width, double height, List<Op> ops, int targets, boolean plain) {
        this.width = width;
        this.height = height;
        this.ops = List.copyOf(ops);
        this.targets = targets;
        this.plain = plain;
    }

    /**
     * True when the picture uses only shapes (drawn and filled), plain strings, colours (with alpha), basic strokes,
     * source-over alpha, untransformed fonts, transforms and clips, and no created graphics; a lean target that
     * supports just these can paint it.
     */
    public boolean plain() {
        return plain;
    }

    /** Width of the area the picture was recorded in. */
    public double width() {
        return width;
    }

    /** Height of the area the picture was recorded in. */
    public double height() {
        return height;
    }

    /** Number of recorded calls (a size measure). */
    public int size() {
        return ops.size();
    }

    /**
     * Repeats the recorded calls on {@code g}, in order. Graphics created during recording ({@code create()}) are
     * created from {@code g} at the same point and disposed where the recording disposed them; {@code g} itself is
     * not disposed.
     */
    public void paint(Graphics2D g) {
        List<Graphics2D> live = new ArrayList<>(targets);
        live.add(g);
        for (Op op : ops) {
            if (op.call() instanceof Create c) {
                while (live.size() <= c.child()) {
                    live.add(null);
                }
                live.set(c.child(), (Graphics2D) live.get(op.target()).create());
            } else {
                op.call().accept(live.get(op.target()));
            }
        }
    }

    /** The recorded {@code create()}: makes target {@code child} from the op's target. */
    record Create(int child) implements Consumer<Graphics2D> {
        @Override
        public void accept(Graphics2D g) {
            throw new IllegalStateException("handled by Picture.paint");
        }
    }
}
