package org.trimwright.export.picture;

import java.awt.Polygon;
import java.awt.Shape;
import java.awt.geom.Area;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.RectangularShape;

/** Copies of shapes that keep their kind (a line stays a line, a rectangle a rectangle), for recording. */
final class Shapes {

    private Shapes() {
    }

    /** An independent copy of {@code s}: later changes to {@code s} do not reach it. */
    static Shape copy(Shape s) {
        if (s instanceof Line2D l) {
            return new Line2D.Double(l.getX1(), l.getY1(), l.getX2(), l.getY2());
        }
        if (s instanceof Rectangle2D r) {
            return new Rectangle2D.Double(r.getX(), r.getY(), r.getWidth(), r.getHeight());
        }
        if (s instanceof RectangularShape r) {
            return (Shape) r.clone();
        }
        if (s instanceof Path2D p) {
            return (Shape) p.clone();
        }
        if (s instanceof Area a) {
            return (Shape) a.clone();
        }
        if (s instanceof Polygon p) {
            return new Polygon(p.xpoints.clone(), p.ypoints.clone(), p.npoints);
        }
        return new Path2D.Double(s);
    }
}
