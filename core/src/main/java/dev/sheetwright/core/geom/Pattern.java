package dev.sheetwright.core.geom;

import java.util.ArrayList;
import java.util.List;

/**
 * An exact flat pattern ready to cut: the outer contour (counter-clockwise), holes (clockwise), mark lines, a
 * label anchor, and which piece of which fitting it is.
 *
 * @param fitting the fitting id from the job file
 * @param piece name of the piece within the fitting (e.g. {@code blank}, {@code gore-2})
 * @param count copies of this piece in one fitting
 */
public record Pattern(String fitting, String piece, int count, Contour outer, List<Contour> holes, List<Mark> marks,
        Point2 labelAnchor) {

    public Pattern {
        if (fitting == null || fitting.isBlank()) {
            throw new IllegalArgumentException("pattern fitting id must not be blank");
        }
        if (piece == null || piece.isBlank()) {
            throw new IllegalArgumentException("pattern piece name must not be blank");
        }
        if (count < 1) {
            throw new IllegalArgumentException("pattern count must be at least 1, got " + count);
        }
        if (outer == null || labelAnchor == null) {
            throw new IllegalArgumentException("pattern outer contour and label anchor must not be null");
        }
        outer = outer.oriented(true);
        List<Contour> cw = new ArrayList<>();
        for (Contour h : holes) {
            cw.add(h.oriented(false));
        }
        holes = List.copyOf(cw);
        marks = List.copyOf(marks);
    }

    /** Net area of the blank: outer area less the holes. */
    public double area() {
        double a = outer.area();
        for (Contour h : holes) {
            a -= h.area();
        }
        return a;
    }

    /** Total length of every contour that is cut (outer plus holes). */
    public double cutLength() {
        double len = outer.perimeter();
        for (Contour h : holes) {
            len += h.perimeter();
        }
        return len;
    }

    public Box2 bounds() {
        return outer.bounds();
    }

    /** Number of closed contours, i.e. pierces when each contour is entered once. */
    public int contourCount() {
        return 1 + holes.size();
    }

    public Pattern transformed(Transform2 t) {
        List<Contour> movedHoles = new ArrayList<>();
        for (Contour h : holes) {
            movedHoles.add(h.transformed(t));
        }
        List<Mark> movedMarks = new ArrayList<>();
        for (Mark m : marks) {
            movedMarks.add(m.transformed(t));
        }
        return new Pattern(fitting, piece, count, outer.transformed(t), movedHoles, movedMarks,
                t.apply(labelAnchor));
    }

    /** The same pattern moved so its bounding box starts at the origin. */
    public Pattern atOrigin() {
        Box2 b = bounds();
        return transformed(Transform2.translation(-b.minX(), -b.minY()));
    }

    /** A file-name friendly key: {@code fitting_piece}. */
    public String key() {
        return fitting + "_" + piece;
    }
}
