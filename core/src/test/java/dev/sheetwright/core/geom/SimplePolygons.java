package dev.sheetwright.core.geom;

import java.util.List;

/** Test helper: checks that a flattened contour does not cross itself (plain O(n^2) segment test). */
public final class SimplePolygons {

    private SimplePolygons() {
    }

    public static boolean isSimple(List<Point2> ring) {
        int n = ring.size();
        for (int i = 0; i < n; i++) {
            Point2 a = ring.get(i);
            Point2 b = ring.get((i + 1) % n);
            for (int j = i + 1; j < n; j++) {
                if (j == i || (j + 1) % n == i || j == (i + 1) % n) {
                    continue; // neighbours share a vertex
                }
                Point2 c = ring.get(j);
                Point2 d = ring.get((j + 1) % n);
                if (properlyCross(a, b, c, d)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Relative size below which a cross product counts as zero (points on one line, e.g. two radial edges). */
    private static final double EPS = 1e-12;

    private static boolean properlyCross(Point2 a, Point2 b, Point2 c, Point2 d) {
        double scale = Math.max(b.minus(a).length(), d.minus(c).length());
        double zero = EPS * scale * scale;
        double d1 = side(b.minus(a).cross(c.minus(a)), zero);
        double d2 = side(b.minus(a).cross(d.minus(a)), zero);
        double d3 = side(d.minus(c).cross(a.minus(c)), zero);
        double d4 = side(d.minus(c).cross(b.minus(c)), zero);
        return d1 * d2 < 0 && d3 * d4 < 0;
    }

    private static double side(double cross, double zero) {
        return Math.abs(cross) <= zero ? 0 : Math.signum(cross);
    }
}
