package dev.sheetwright.core.cutpath;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.List;
import org.junit.jupiter.api.Test;

class KerfOffsetTest {

    private static final double EPS = 1e-9;
    private static final Tolerance TOL = Tolerance.INCH;

    private static Contour square(double side) {
        return Contour.polygon(List.of(new Point2(0, 0), new Point2(side, 0), new Point2(side, side),
                new Point2(0, side)), TOL);
    }

    @Test
    void left_clockwiseSquare_growsByTheOffsetWithRoundCorners() {
        // an outline cut clockwise has scrap on its left: the path lies outside, four sides plus four quarter arcs
        Contour cw = square(10).oriented(false);
        double d = 0.03;

        Contour path = KerfOffset.left(cw, d, TOL);

        long arcs = path.edges().stream().filter(e -> e instanceof Arc).count();
        assertEquals(4, arcs);
        // area of a rounded square: s^2 + 4 s d + pi d^2 (computed)
        assertEquals(100 + 4 * 10 * d + Math.PI * d * d, path.area(), 1e-9);
        assertEquals(40 + 2 * Math.PI * d, path.perimeter(), 1e-9);
        for (Edge e : path.edges()) {
            if (e instanceof Arc a) {
                assertEquals(d, a.radius(), EPS);
                assertTrue(a.sweep() < 0, "outside corners turn the way the cut turns");
            }
        }
    }

    @Test
    void left_counterClockwiseSquareHole_shrinksWithSharpCorners() {
        // a hole cut counter-clockwise has its scrap (the slug) on the left: the path lies inside, corners trimmed
        Contour ccw = square(10).oriented(true);
        double d = 0.03;

        Contour path = KerfOffset.left(ccw, d, TOL);

        assertTrue(path.edges().stream().allMatch(e -> e instanceof Line));
        assertEquals((10 - 2 * d) * (10 - 2 * d), path.area(), 1e-9);
        assertTrue(path.isCounterClockwise());
    }

    @Test
    void left_circleArcs_stayArcsAboutTheSameCentre() {
        Point2 c = new Point2(5, 5);
        Contour hole = Contour.of(List.of(new Arc(c, 2, 0, Math.PI), new Arc(c, 2, Math.PI, Math.PI)), TOL);
        Contour outline = hole.reversed();

        Contour in = KerfOffset.left(hole, 0.03, TOL);
        Contour out = KerfOffset.left(outline, 0.03, TOL);

        for (Edge e : in.edges()) {
            assertEquals(1.97, ((Arc) e).radius(), EPS);
            assertEquals(c, ((Arc) e).centre());
        }
        for (Edge e : out.edges()) {
            assertEquals(2.03, ((Arc) e).radius(), EPS);
        }
    }

    @Test
    void left_lShapeOutline_trimsTheInsideCornerAndRoundsTheOutsideOnes() {
        // L: 0,0 -> 4,0 -> 4,1 -> 1,1 -> 1,3 -> 0,3 (ccw); cut clockwise: one inside corner at (1,1)
        Contour l = Contour.polygon(List.of(new Point2(0, 0), new Point2(4, 0), new Point2(4, 1), new Point2(1, 1),
                new Point2(1, 3), new Point2(0, 3)), TOL).oriented(false);
        double d = 0.05;

        Contour path = KerfOffset.left(l, d, TOL);

        assertEquals(5, path.edges().stream().filter(e -> e instanceof Arc).count());
        boolean trimmedCorner = path.edges().stream().anyMatch(e -> e.end().distance(new Point2(1 + d, 1 + d)) < EPS);
        assertTrue(trimmedCorner, path::toString);
        // every vertex of the path is exactly d from the nominal outline
        PartOutlineProbe probe = new PartOutlineProbe(l);
        for (Edge e : path.edges()) {
            assertEquals(d, probe.distance(e.start()), 1e-9, e::toString);
        }
    }

    @Test
    void left_arcTighterThanTheOffset_isRefused() {
        Point2 c = new Point2(0, 0);
        Contour tiny = Contour.of(List.of(new Arc(c, 0.02, 0, Math.PI), new Arc(c, 0.02, Math.PI, Math.PI)), TOL);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> KerfOffset.left(tiny, 0.03, TOL));
        assertTrue(e.getMessage().contains("too tight"), e::getMessage);
    }

    /** Distance to a straight-sided contour, computed here from its corners. */
    private record PartOutlineProbe(Contour c) {
        double distance(Point2 p) {
            double best = Double.POSITIVE_INFINITY;
            for (Edge e : c.edges()) {
                Point2 a = e.start();
                Point2 ab = e.end().minus(a);
                double t = Math.max(0, Math.min(1, p.minus(a).dot(ab) / ab.dot(ab)));
                best = Math.min(best, p.distance(a.plus(ab.times(t))));
            }
            return best;
        }
    }
}
