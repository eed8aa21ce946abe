package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
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
}
