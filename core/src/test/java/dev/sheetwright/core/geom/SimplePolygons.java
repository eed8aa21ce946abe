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

    private static boolean properlyCross(Point2 a, Point2 b, Point2 c, Point2 d) {
        double d1 = b.minus(a).cross(c.minus(a));
        double d2 = b.minus(a).cross(d.minus(a));
        double d3 = d.minus(c).cross(a.minus(c));
        double d4 = d.minus(c).cross(b.minus(c));
        return d1 * d2 < 0 && d3 * d4 < 0;
    }
}
