package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Short tours over points for the order parts are cut in: nearest-next from a start, then improved by 2-opt
 * (reversing a stretch of the tour while that shortens it). Open tours: the way back home is not counted. Also the
 * narrow-strip rule (common practice): when a sheet's parts lie in a strip along x, the tour starts at the part
 * farthest from the clamped end (x = 0, where the sheet or coil is held) and works back towards it, so the metal by
 * the clamp holds the skeleton until the last part is cut free.
 */
public final class CutOrder {

    /** A strip is narrow when its parts span at most this share of their length across it (common practice). */
    static final double NARROW_STRIP = 0.25;
    private static final int MAX_PASSES = 100;

    private CutOrder() {
    }

    /**
     * The order to visit {@code points}: indices into the list, starting at the one nearest {@code from}, or at
     * {@code first} when it is not negative.
     */
    public static List<Integer> tour(Point2 from, List<Point2> points, int first) {
        int n = points.size();
        List<Integer> order = new ArrayList<>(n);
        boolean[] used = new boolean[n];
        Point2 at = from;
        if (first >= 0) {
            order.add(first);
            used[first] = true;
            at = points.get(first);
        }
        while (order.size() < n) {
            int best = -1;
            for (int i = 0; i < n; i++) {
                if (!used[i] && (best < 0 || at.distance(points.get(i)) < at.distance(points.get(best)))) {
                    best = i;
                }
            }
            used[best] = true;
            order.add(best);
            at = points.get(best);
        }
        twoOpt(from, points, order, first >= 0 ? 1 : 0);
        return order;
    }

    /** Length of the open tour from {@code from} through the points in {@code order}. */
    public static double length(Point2 from, List<Point2> points, List<Integer> order) {
        double sum = 0;
        Point2 at = from;
        for (int i : order) {
            sum += at.distance(points.get(i));
            at = points.get(i);
        }
        return sum;
    }

    private static void twoOpt(Point2 from, List<Point2> pts, List<Integer> order, int fixed) {
        int n = order.size();
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            boolean better = false;
            for (int i = Math.max(fixed, 0); i < n - 1; i++) {
                Point2 before = i == 0 ? from : pts.get(order.get(i - 1));
                for (int j = i + 1; j < n; j++) {
                    Point2 a = pts.get(order.get(i));
                    Point2 b = pts.get(order.get(j));
                    double old = before.distance(a) + (j + 1 < n ? b.distance(pts.get(order.get(j + 1))) : 0);
                    double now = before.distance(b) + (j + 1 < n ? a.distance(pts.get(order.get(j + 1))) : 0);
                    if (now < old) {
                        Collections.reverse(order.subList(i, j + 1));
                        better = true;
                    }
                }
            }
            if (!better) {
                return;
            }
        }
    }

    /**
     * The part to start with under the narrow-strip rule, or -1 when the parts do not lie in a narrow strip along x.
     */
    public static int stripStart(List<Box2> parts) {
        if (parts.size() < 2) {
            return -1;
        }
        Box2 all = parts.get(0);
        for (Box2 b : parts) {
            all = all.union(b);
        }
        if (all.height() > NARROW_STRIP * all.width()) {
            return -1;
        }
        int far = 0;
        for (int i = 1; i < parts.size(); i++) {
            if (parts.get(i).centre().x() > parts.get(far).centre().x()) {
                far = i;
            }
        }
        return far;
    }
}
