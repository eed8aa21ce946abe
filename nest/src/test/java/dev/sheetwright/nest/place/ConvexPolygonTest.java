package dev.sheetwright.nest.place;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class ConvexPolygonTest {
    private static ConvexPolygon randomConvex(SplittableRandom rnd, boolean grid) {
        int n = 3 + rnd.nextInt(12);
        double[] xs = new double[n];
        double[] ys = new double[n];
        double cx = rnd.nextDouble(-50, 50);
        double cy = rnd.nextDouble(-50, 50);
        for (int i = 0; i < n; i++) {
            if (grid) {
                // integer points: parallel and collinear edges are common
                xs[i] = Math.rint(cx + rnd.nextInt(-6, 7));
                ys[i] = Math.rint(cy + rnd.nextInt(-6, 7));
            } else {
                double a = rnd.nextDouble(0, 2 * Math.PI);
                double r = rnd.nextDouble(1, 20);
                xs[i] = cx + r * Math.cos(a);
                ys[i] = cy + r * Math.sin(a);
            }
        }
        return ConvexPolygon.of(xs, ys);
    }

    @Test
    void minusSum_sameAsHullOfAllDifferences() {
        SplittableRandom rnd = new SplittableRandom(11);
        int compared = 0;
        for (int t = 0; t < 4000; t++) {
            boolean grid = t % 2 == 0;
            ConvexPolygon a = randomConvex(rnd, grid);
            ConvexPolygon b = randomConvex(rnd, grid);
            if (a == null || b == null) {
                continue;
            }
            ConvexPolygon fast = a.minusSum(b);
            ConvexPolygon ref = a.minusSumByHull(b);
            assertNotNull(fast);
            assertArrayEquals(ref.xs, fast.xs, "case " + t);
            assertArrayEquals(ref.ys, fast.ys, "case " + t);
            compared++;
        }
        org.junit.jupiter.api.Assertions.assertTrue(compared > 3000);
    }
}
