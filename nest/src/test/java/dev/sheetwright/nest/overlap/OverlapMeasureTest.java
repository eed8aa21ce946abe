package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

import dev.sheetwright.nest.testing.Shapes;

class OverlapMeasureTest {
    static final double EPS = 1e-9;
    private final OverlapMeasure measure = new OverlapMeasure(1e-6, 0);

    private static PlacedShape at(SearchShape s, double x, double y, double angle) {
        PlacedShape p = new PlacedShape();
        p.set(s, x, y, angle);
        return p;
    }

    @Test
    void twoEqualSquaresSideBySideOverlapAtLeastByThePenetrationDepthAndLessWhenFartherApart() {
        SearchShape sq = SearchShape.of(Shapes.rect(0, 0, 10, 10), 0, 1e-9);
        double last = Double.POSITIVE_INFINITY;
        for (double dx : new double[] {1, 3.5, 7, 9.9}) {
            double o = measure.overlap(at(sq, 0, 0, 0), at(sq, dx, 0, 0));
            // the inscribed circles measure 10 - shift between the centre poles, plus the corner poles' share
            assertTrue(o >= 10 - dx - 1e-6, "shift " + dx + ": " + o + " below the penetration depth " + (10 - dx));
            assertTrue(o < last, "the measure falls as the squares move apart");
            last = o;
        }
        assertEquals(0, measure.overlap(at(sq, 0, 0, 0), at(sq, 10, 0, 0)), EPS, "touching is no overlap");
        assertEquals(0, measure.overlap(at(sq, 0, 0, 0), at(sq, 10.5, 3, 0)), EPS);
    }

    @Test
    void aCornerThePolesMissStillCountsByItsDepth() {
        SearchShape sq = SearchShape.of(Shapes.rect(0, 0, 10, 10), 0, 1e-9);
        // b's bottom-left corner 0.3 inside a's top-right corner, turned 45 degrees so only the corner enters
        PlacedShape a = at(sq, 0, 0, 0);
        double h = 5 * Math.sqrt(2);
        PlacedShape b = at(sq, 5 + 0.3 / Math.sqrt(2) + h / Math.sqrt(2) * 0 + 0, 0, 45);
        b.set(sq, 5 - 0.3 + h, 5 - 0.3 + 0, 45);
        assertTrue(OverlapMeasure.cornerDepth(b, a) > 0, "b's corner is inside a");
        assertTrue(measure.overlap(a, b) >= OverlapMeasure.cornerDepth(b, a) - EPS);
    }

    @Test
    void aCornerPushedDeeperRaisesTheMeasureWithoutAJump() {
        // a slat 12 x 1 turned 45 degrees pushes its corner into the side of a 10 x 10 square: its corner reaches
        // deeper than its poles (radius 1/2) long before the poles' sum counts
        SearchShape sq = SearchShape.of(Shapes.rect(0, 0, 10, 10), 0, 1e-9);
        SearchShape slat = SearchShape.of(Shapes.rect(0, 0, 12, 1), 0, 1e-9);
        PlacedShape a = at(sq, 0, 0, 0);
        PlacedShape b = at(slat, 0, 0, 45);
        double tip = Double.NEGATIVE_INFINITY; // how far the turned slat reaches left of its reference point
        for (int k = 0; k < b.n(); k++) {
            tip = Math.max(tip, -b.wx[k]);
        }
        double step = 0.005;
        double last = 0;
        boolean cornersCounted = false;
        boolean polesCounted = false;
        for (double depth = step; depth < 3; depth += step) {
            // the slat's left-most corner at x = 5 - depth: depth inside a's right side
            b.set(slat, 5 - depth + tip, 0.3, 45);
            double poles = OverlapMeasure.poleDepth(a, b);
            boolean shallow = poles < slat.poleR[0];
            cornersCounted |= shallow && OverlapMeasure.cornerDepth(b, a) > slat.poleR[0];
            polesCounted |= !shallow;
            double o = measure.overlap(a, b);
            assertTrue(o - last <= 0.1, "depth " + depth + ": the measure jumped from " + last + " to " + o);
            assertTrue(o >= last - 0.1, "depth " + depth + ": the measure fell from " + last + " to " + o);
            last = o;
        }
        assertTrue(cornersCounted && polesCounted,
                "the slide crosses from a corner deeper than the slat's poles to the poles counting");
    }

    @Test
    void twoDiscsOverlapByRadiusSumLessDistance() {
        double r1 = 5;
        double r2 = 3;
        // 40-gons (no simplification below 48 vertices), so the inscribed radius is r cos(pi / 40)
        SearchShape a = SearchShape.of(disc(r1, 40), 0, 1e-9);
        SearchShape b = SearchShape.of(disc(r2, 40), 0, 1e-9);
        double in = Math.cos(Math.PI / 40);
        assertEquals(1, a.poleCount(), "a disc has one inscribed circle");
        assertEquals(1, b.poleCount());
        for (double d : new double[] {0.5, 2, 4, 7.5}) {
            PlacedShape pa = at(a, 0, 0, 0);
            PlacedShape pb = at(b, d * 0.6, d * 0.8, 37);
            // the discs' true centres (the local frame starts at the inscribed circle found to a tolerance)
            double ax = -a.refX;
            double ay = -a.refY;
            double c = Math.cos(Math.toRadians(37));
            double sn = Math.sin(Math.toRadians(37));
            double bx = d * 0.6 + c * -b.refX - sn * -b.refY;
            double by = d * 0.8 + sn * -b.refX + c * -b.refY;
            double depth = (r1 + r2) * in - Math.hypot(bx - ax, by - ay);
            // within the inscribed-circle tolerance (1e-3 of each disc's size)
            assertEquals(depth, measure.overlap(pa, pb), 0.002 * (r1 + r2), "distance " + d);
        }
    }

    @Test
    void collisionAgreesWithJtsOnRandomPairs() {
        Polygon ell = Shapes.wkt("POLYGON ((0 0, 8 0, 8 2, 2 2, 2 6, 0 6, 0 0))");
        Polygon tri = Shapes.wkt("POLYGON ((0 0, 5 0, 1 4, 0 0))");
        SearchShape a = SearchShape.of(ell, 0, 1e-9);
        SearchShape b = SearchShape.of(tri, 0, 1e-9);
        SplittableRandom rnd = new SplittableRandom(5);
        int hits = 0;
        for (int k = 0; k < 3000; k++) {
            double ax = rnd.nextDouble() * 10;
            double ay = rnd.nextDouble() * 10;
            double aa = rnd.nextDouble() * 360;
            double bx = rnd.nextDouble() * 10;
            double by = rnd.nextDouble() * 10;
            double ba = rnd.nextInt(4) * 90.0;
            PlacedShape pa = at(a, ax, ay, aa);
            PlacedShape pb = at(b, bx, by, ba);
            Polygon ja = world(a, ax, ay, aa);
            Polygon jb = world(b, bx, by, ba);
            double area = ja.intersection(jb).getArea();
            boolean ours = measure.overlap(pa, pb) > 0;
            if (area > 1e-6) {
                assertTrue(ours, "pair " + k + " overlaps by area " + area + " but was not seen");
                hits++;
            } else if (area == 0 && !ja.intersects(jb)) {
                assertEquals(false, ours, "pair " + k + " is apart but was seen as colliding");
            }
        }
        assertTrue(hits > 100, "the random pairs must include collisions, got " + hits);
    }

    @Test
    void cornerDepthIsTheDeepestCornerInsideTheOtherShapeAsJtsMeasuresIt() {
        Polygon ell = Shapes.wkt("POLYGON ((0 0, 8 0, 8 2, 2 2, 2 6, 0 6, 0 0))");
        Polygon notched = Shapes.wkt("POLYGON ((0 0, 7 0, 7 4, 4.5 4, 4.5 1.5, 2.5 1.5, 2.5 4, 0 4, 0 0))");
        SearchShape a = SearchShape.of(ell, 0, 1e-9);
        SearchShape b = SearchShape.of(notched, 0, 1e-9);
        SplittableRandom rnd = new SplittableRandom(9);
        int deep = 0;
        for (int k = 0; k < 2000; k++) {
            double aa = rnd.nextDouble() * 360;
            double ba = rnd.nextDouble() * 360;
            PlacedShape pa = at(a, rnd.nextDouble() * 8, rnd.nextDouble() * 8, aa);
            PlacedShape pb = at(b, rnd.nextDouble() * 8, rnd.nextDouble() * 8, ba);
            Polygon jb = world(b, pb.x, pb.y, ba);
            double expected = 0;
            for (int i = 0; i < pa.n(); i++) {
                org.locationtech.jts.geom.Point v = Shapes.GF.createPoint(new org.locationtech.jts.geom.Coordinate(pa.wx[i], pa.wy[i]));
                if (jb.contains(v)) {
                    expected = Math.max(expected, jb.getExteriorRing().distance(v));
                }
            }
            assertEquals(expected, OverlapMeasure.cornerDepth(pa, pb), 1e-9, "pair " + k);
            deep += expected > 0.5 ? 1 : 0;
        }
        assertTrue(deep > 50, "the random pairs must include corners deep inside, got " + deep);
    }

    private static Polygon world(SearchShape s, double x, double y, double angle) {
        AffineTransformation t = new AffineTransformation().rotate(Math.toRadians(angle)).translate(x, y);
        return (Polygon) t.transform(s.localPolygon());
    }

    static Polygon disc(double r, int n) {
        org.locationtech.jts.geom.Coordinate[] cs = new org.locationtech.jts.geom.Coordinate[n + 1];
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            cs[i] = new org.locationtech.jts.geom.Coordinate(r * Math.cos(t), r * Math.sin(t));
        }
        cs[n] = cs[0].copy();
        return Shapes.GF.createPolygon(cs);
    }
}
