package dev.sheetwright.core.cutpath;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class CutOrderTest {

    @Test
    void tour_visitsEveryPointOnce() {
        Random r = new Random(3);
        List<Point2> pts = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            pts.add(new Point2(r.nextDouble() * 120, r.nextDouble() * 48));
        }
        List<Integer> order = CutOrder.tour(Point2.ORIGIN, pts, -1);
        assertEquals(40, order.size());
        assertEquals(40, new HashSet<>(order).size());
    }

    @Test
    void tour_isNeverLongerThanNearestNextAndOftenShorter() {
        Random r = new Random(11);
        int shorter = 0;
        for (int trial = 0; trial < 20; trial++) {
            List<Point2> pts = new ArrayList<>();
            for (int i = 0; i < 25; i++) {
                pts.add(new Point2(r.nextDouble() * 120, r.nextDouble() * 48));
            }
            List<Integer> greedy = greedy(pts);
            List<Integer> order = CutOrder.tour(Point2.ORIGIN, pts, -1);
            double improved = CutOrder.length(Point2.ORIGIN, pts, order);
            double plain = CutOrder.length(Point2.ORIGIN, pts, greedy);
            assertTrue(improved <= plain + 1e-9);
            shorter += improved < plain - 1e-9 ? 1 : 0;
        }
        assertTrue(shorter > 0, "2-opt shortened none of 20 random tours");
    }

    @Test
    void tour_withAFirstPoint_startsThere() {
        List<Point2> pts = List.of(new Point2(1, 0), new Point2(50, 0), new Point2(100, 0));
        assertEquals(List.of(2, 1, 0), CutOrder.tour(Point2.ORIGIN, pts, 2));
    }

    @Test
    void stripStart_narrowRow_startsFarthestFromTheClampedEnd() {
        List<Box2> row = List.of(new Box2(1, 1, 5, 3), new Box2(6, 1, 10, 3), new Box2(11, 1, 15, 3));
        assertEquals(2, CutOrder.stripStart(row));
        List<Box2> block = List.of(new Box2(1, 1, 5, 5), new Box2(1, 6, 5, 10));
        assertEquals(-1, CutOrder.stripStart(block));
    }

    /** Plain nearest-next from the origin, written here independently. */
    private static List<Integer> greedy(List<Point2> pts) {
        List<Integer> out = new ArrayList<>();
        boolean[] used = new boolean[pts.size()];
        Point2 at = Point2.ORIGIN;
        for (int k = 0; k < pts.size(); k++) {
            int best = -1;
            for (int i = 0; i < pts.size(); i++) {
                if (!used[i] && (best < 0 || at.distance(pts.get(i)) < at.distance(pts.get(best)))) {
                    best = i;
                }
            }
            used[best] = true;
            out.add(best);
            at = pts.get(best);
        }
        return out;
    }
}
