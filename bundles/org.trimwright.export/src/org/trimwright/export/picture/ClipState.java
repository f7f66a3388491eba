package org.trimwright.export.picture;

import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Area;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/**
 * The transform and clip of a recorder, tracked as a {@code Graphics2D} does: the clip is kept in device space (it
 * does not move when the transform changes later) and reported in the current user space. Rectangles under
 * transforms without rotation stay rectangles (the common case in charts: plot areas, titles, legend cells), so
 * most clip calls need no area arithmetic.
 */
public final class ClipState {

    private static final int NOT_AXIS_ALIGNED = AffineTransform.TYPE_GENERAL_ROTATION
            | AffineTransform.TYPE_QUADRANT_ROTATION | AffineTransform.TYPE_GENERAL_TRANSFORM;

    private final AffineTransform transform;
    /** Clip in device space; null for none. */
    private Shape clip;

    /** Identity transform, no clip. */
    public ClipState() {
        this(new AffineTransform(), null);
    }

    /** The current transform (live: changing it changes this state's user space). */
    public AffineTransform transform() {
        return transform;
    }

    /** The clip in device space (the same object until the clip changes), or null. */
    public Shape deviceClip() {
        return clip;
    }

    private ClipState(AffineTransform transform, Shape clip) {
        this.transform = transform;
        this.clip = clip;
    }

    /** An independent copy. */
    public ClipState copy() {
        return new ClipState(new AffineTransform(transform), clip);
    }

    /** Replaces the clip by {@code s} (user space; null removes it). */
    public void setClip(Shape s) {
        clip = s == null ? null : toDevice(s, transform);
    }

    /** Intersects the clip with {@code s} (user space; null removes the clip, as Java 2D does). */
    public void clip(Shape s) {
        if (s == null) {
            clip = null;
            return;
        }
        Shape d = toDevice(s, transform);
        if (clip == null) {
            clip = d;
        } else if (clip instanceof Rectangle2D a && d instanceof Rectangle2D b) {
            Rectangle2D r = new Rectangle2D.Double();
            Rectangle2D.intersect(a, b, r);
            if (r.getWidth() <= 0 || r.getHeight() <= 0) {
                // nothing left: an empty clip (a point, so no later transform gives it an extent)
                r.setRect(r.getX(), r.getY(), 0, 0);
            }
            clip = r;
        } else {
            Area area = new Area(clip);
            area.intersect(new Area(d));
            clip = area.isRectangular() ? area.getBounds2D() : new Path2D.Double(area);
        }
    }

    /** The clip in the current user space (a new object), or null. */
    public Shape userClip() {
        if (clip == null) {
            return null;
        }
        try {
            return toDevice(clip, transform.createInverse());
        } catch (NoninvertibleTransformException e) {
            return null;
        }
    }

    private static Shape toDevice(Shape s, AffineTransform t) {
        if (s instanceof Rectangle2D r && (t.getType() & NOT_AXIS_ALIGNED) == 0) {
            double x1 = r.getMinX() * t.getScaleX() + t.getTranslateX();
            double x2 = r.getMaxX() * t.getScaleX() + t.getTranslateX();
            double y1 = r.getMinY() * t.getScaleY() + t.getTranslateY();
            double y2 = r.getMaxY() * t.getScaleY() + t.getTranslateY();
            return new Rectangle2D.Double(Math.min(x1, x2), Math.min(y1, y2), Math.abs(x2 - x1), Math.abs(y2 - y1));
        }
        return t.createTransformedShape(s);
    }
}
