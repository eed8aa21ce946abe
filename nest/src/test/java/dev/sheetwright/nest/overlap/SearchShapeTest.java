package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

import dev.sheetwright.nest.testing.Shapes;

class SearchShapeTest {
    /** The search shape back in the outline's coordinates. */
    private static Geometry placed(SearchShape s) {
        return AffineTransformation.translationInstance(s.refX, s.refY).transform(s.localPolygon());
    }

    @Test
    void aGrownShapeCoversEveryPointWithinTheGrowthOfTheOutlineAtItsCorners() {
        // a plate and a gusset (an acute corner); the true offset is a round buffer, approximated finely here
        for (Polygon outline : new Polygon[] {Shapes.rect(0, 0, 4, 3), Shapes.wkt("POLYGON ((0 0, 5 0, 0 4, 0 0))")}) {
            double grow = 0.135;
            SearchShape s = SearchShape.of(outline, grow, 1e-6);
            Geometry roundOffset = outline.buffer(grow * (1 - 1e-9), 64);
            Geometry missed = roundOffset.difference(placed(s));
            assertTrue(missed.getArea() < 1e-12, "the search shape misses " + missed.getArea() + " of the offset of "
                    + outline);
        }
    }

    @Test
    void aPlacedShapeTellsInsideFromOutsideAsJtsDoesAtAnyPose() {
        // an annular sector (the blank of a reducer, with a concave side), an L and a notched plate
        StringBuilder sector = new StringBuilder("POLYGON ((");
        for (int k = 0; k <= 20; k++) {
            double t = Math.toRadians(60 + 60.0 * k / 20);
            sector.append(30 * Math.cos(t)).append(' ').append(30 * Math.sin(t)).append(", ");
        }
        for (int k = 20; k >= 0; k--) {
            double t = Math.toRadians(60 + 60.0 * k / 20);
            sector.append(18 * Math.cos(t)).append(' ').append(18 * Math.sin(t)).append(", ");
        }
        sector.append(30 * Math.cos(Math.toRadians(60))).append(' ').append(30 * Math.sin(Math.toRadians(60))).append("))");
        Polygon[] outlines = {Shapes.wkt(sector.toString()), Shapes.wkt("POLYGON ((0 0, 6 0, 6 2, 2 2, 2 5, 0 5, 0 0))"),
            Shapes.wkt("POLYGON ((0 0, 8 0, 8 4, 5 4, 5 2, 3 2, 3 4, 0 4, 0 0))")};
        SplittableRandom rnd = new SplittableRandom(11);
        PlacedShape at = new PlacedShape();
        int inside = 0;
        for (Polygon outline : outlines) {
            SearchShape s = SearchShape.of(outline, 0.1, 1e-6);
            for (int pose = 0; pose < 20; pose++) {
                double angle = pose < 4 ? 90 * pose : rnd.nextDouble(360);
                at.set(s, rnd.nextDouble(-50, 50), rnd.nextDouble(-50, 50), angle);
                Polygon world = world(at);
                double w = at.maxX - at.minX;
                double h = at.maxY - at.minY;
                for (int k = 0; k < 400; k++) {
                    double x = at.minX - 0.1 * w + rnd.nextDouble() * 1.2 * w;
                    double y = at.minY - 0.1 * h + rnd.nextDouble() * 1.2 * h;
                    boolean jts = world.contains(Shapes.GF.createPoint(new Coordinate(x, y)));
                    if (world.getExteriorRing().distance(Shapes.GF.createPoint(new Coordinate(x, y))) < 1e-9) {
                        continue; // on the boundary either answer is allowed
                    }
                    assertEquals(jts, at.contains(x, y), "point " + x + " " + y + " at angle " + angle);
                    inside += jts ? 1 : 0;
                }
            }
        }
        assertTrue(inside > 1000, "too few points fell inside to tell: " + inside);
    }

    /** The placed outline in world coordinates, as JTS sees it. */
    private static Polygon world(PlacedShape at) {
        Coordinate[] cs = new Coordinate[at.n() + 1];
        for (int i = 0; i < at.n(); i++) {
            cs[i] = new Coordinate(at.wx[i], at.wy[i]);
        }
        cs[at.n()] = cs[0].copy();
        return Shapes.GF.createPolygon(cs);
    }
}
