package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.List;

/**
 * A placed part's contours as polygons whose vertices lie on the true contours within the chord tolerance: enough to
 * say on which side of the metal a point is and how far it is from an edge, for placing leads and ordering cuts.
 */
public final class PartOutline {

    private final List<Point2> outer;
    private final List<List<Point2>> holes;
    private final Box2 bounds;

    public PartOutline(Pattern part, double chord) {
        this.outer = part.outer().flatten(chord);
        List<List<Point2>> hs = new ArrayList<>();
        for (Contour h : part.holes()) {
            hs.add(h.flatten(chord));
        }
        this.holes = List.copyOf(hs);
        this.bounds = part.bounds();
    }

    Box2 bounds() {
        return bounds;
    }

    List<Point2> outer() {
        return outer;
    }

    List<Point2> hole(int i) {
        return holes.get(i);
    }

    int holeCount() {
        return holes.size();
    }

    /** True when the point is in this part's metal (inside the outline and in none of its holes). */
    public boolean inMetal(Point2 p) {
        if (!inside(outer, p)) {
            return false;
        }
        for (List<Point2> h : holes) {
            if (inside(h, p)) {
                return false;
            }
        }
        return true;
    }

    /** Least distance from the point to any of this part's contours. */
    public double distance(Point2 p) {
        double d = distance(outer, p);
        for (List<Point2> h : holes) {
            d = Math.min(d, distance(h, p));
        }
        return d;
    }

    /** True when the segment crosses or touches one of this part's contours. */
    boolean crosses(Point2 a, Point2 b) {
        if (crosses(outer, a, b)) {
            return true;
        }
        for (List<Point2> h : holes) {
            if (crosses(h, a, b)) {
                return true;
            }
        }
        return false;
    }

    /** Even-odd inclusion of a point in a closed polygon. */
    static boolean inside(List<Point2> poly, Point2 p) {
        boolean in = false;
        int n = poly.size();
        for (int i = 0, j = n - 1; i < n; j = i++) {
            Point2 a = poly.get(i);
            Point2 b = poly.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }

    static double distance(List<Point2> poly, Point2 p) {
        double best = Double.POSITIVE_INFINITY;
        int n = poly.size();
        for (int i = 0; i < n; i++) {
            best = Math.min(best, segmentDistance(p, poly.get(i), poly.get((i + 1) % n)));
        }
        return best;
    }

    static double segmentDistance(Point2 p, Point2 a, Point2 b) {
        Point2 ab = b.minus(a);
        double len2 = ab.dot(ab);
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.distance(a.plus(ab.times(t)));
    }

    private static boolean crosses(List<Point2> poly, Point2 a, Point2 b) {
        int n = poly.size();
        for (int i = 0; i < n; i++) {
            if (segmentsMeet(a, b, poly.get(i), poly.get((i + 1) % n))) {
                return true;
            }
        }
        return false;
    }

    private static boolean segmentsMeet(Point2 p, Point2 p2, Point2 q, Point2 q2) {
        double d1 = side(q, q2, p);
        double d2 = side(q, q2, p2);
        double d3 = side(p, p2, q);
        double d4 = side(p, p2, q2);
        return d1 * d2 <= 0 && d3 * d4 <= 0 && !(d1 == 0 && d2 == 0 && d3 == 0 && d4 == 0 && !overlap(p, p2, q, q2));
    }

    private static boolean overlap(Point2 p, Point2 p2, Point2 q, Point2 q2) {
        return Math.max(Math.min(p.x(), p2.x()), Math.min(q.x(), q2.x()))
                <= Math.min(Math.max(p.x(), p2.x()), Math.max(q.x(), q2.x()))
                && Math.max(Math.min(p.y(), p2.y()), Math.min(q.y(), q2.y()))
                <= Math.min(Math.max(p.y(), p2.y()), Math.max(q.y(), q2.y()));
    }

    private static double side(Point2 a, Point2 b, Point2 c) {
        return b.minus(a).cross(c.minus(a));
    }
}
