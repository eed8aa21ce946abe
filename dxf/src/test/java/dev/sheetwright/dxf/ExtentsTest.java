package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Exact bounding boxes and lengths of polylines with bulge arcs. Bulge definition (tan of a quarter of the sweep,
 * positive counter-clockwise): README-dxfcheck.md, "Pitfalls" (common practice of the DXF format). Expected values
 * are computed here from circle geometry, not by the code under test.
 */
class ExtentsTest {

    private static final double EPS = 1e-9;

    private static void assertBounds(double minX, double minY, double maxX, double maxY, Bounds b) {
        assertEquals(minX, b.minX(), EPS, "minX");
        assertEquals(minY, b.minY(), EPS, "minY");
        assertEquals(maxX, b.maxX(), EPS, "maxX");
        assertEquals(maxY, b.maxY(), EPS, "maxY");
    }

    private static Polyline open(double x1, double y1, double bulge, double x2, double y2) {
        return new Polyline("CUT", List.of(Vertex.of(x1, y1, bulge), Vertex.of(x2, y2)), false);
    }

    private static double bulgeOfSweep(double degrees) {
        return Math.tan(Math.toRadians(degrees) / 4);
    }

    @Test
    void bounds_halfCircleBulges_reachOneRadiusBesideTheChord() {
        // counter-clockwise from (0,0) to (2,0) passes below the chord, clockwise above
        assertBounds(0, -1, 2, 0, open(0, 0, 1, 2, 0).bounds());
        assertBounds(0, 0, 2, 1, open(0, 0, -1, 2, 0).bounds());
    }

    @Test
    void bounds_arcCrossingPositiveXAxis_includesQuadrantPoint() {
        // centre (5,5), radius 10, from -30 deg to +30 deg counter-clockwise: crosses the +x direction at (15, 5)
        double r = 10;
        double c = Math.cos(Math.toRadians(30));
        Polyline arc = open(5 + r * c, 5 - r / 2, bulgeOfSweep(60), 5 + r * c, 5 + r / 2);
        assertBounds(5 + r * c, 0, 15, 10, arc.bounds());
        // the same points clockwise go the long way round: 300 degrees, crossing +y, -x and -y
        Polyline longWay = open(5 + r * c, 5 - r / 2, -bulgeOfSweep(300), 5 + r * c, 5 + r / 2);
        assertBounds(-5, -5, 5 + r * c, 15, longWay.bounds());
    }

    @Test
    void bounds_majorArc_crossesThreeQuadrantPoints() {
        // unit circle from (1,0) counter-clockwise 270 deg to (0,-1): through (0,1) and (-1,0)
        assertBounds(-1, -1, 1, 1, open(1, 0, bulgeOfSweep(270), 0, -1).bounds());
    }

    @Test
    void bounds_arcWithinOneQuadrant_onlyEndPoints() {
        double a = Math.toRadians(10);
        double b = Math.toRadians(80);
        Polyline arc = open(Math.cos(a), Math.sin(a), bulgeOfSweep(70), Math.cos(b), Math.sin(b));
        assertBounds(Math.cos(b), Math.sin(a), Math.cos(a), Math.sin(b), arc.bounds());
    }

    @Test
    void bounds_coneBlank_outerArcTopAndInnerArcEnds() {
        // annular sector centre (260,-20), R100/R200, 30..150 deg: the outer arc crosses +y at (260, 180);
        // lowest points are the inner arc's ends at y = -20 + 100 sin 30 = 30
        Polyline sector = Fixtures.sector("CUT", 260, -20, 100, 200, 30, 150);
        double dx = 200 * Math.cos(Math.toRadians(30));
        assertBounds(260 - dx, 30, 260 + dx, 180, sector.bounds());
        assertEquals("86.794919", Ordinates.length(sector.bounds().minX()),
                "the value dxfcheck reports for its own sample, 86.7949 (README-dxfcheck.md)");
    }

    @Test
    void bounds_circleOfTwoHalfCircles_isItsSquare() {
        assertBounds(575, 55, 625, 105, Fixtures.circle("CUT", 600, 80, 25).bounds());
    }

    @Test
    void extents_drawing_unionOfShapesIncludingTextInsertionPoints() {
        Drawing d = Drawing.of("mm", List.of(Fixtures.CUT, Fixtures.MARK, Fixtures.LABEL), List.of(
                Fixtures.circle("CUT", 0, 0, 1), new Line("MARK", -3, 0, 0, 0), new Text("LABEL", 0, 5, 1, "A")));
        assertBounds(-3, -1, 1, 5, d.extents());
    }

    @Test
    void length_coneBlank_twoArcsAndTwoRadialEdges() {
        // stretch-out along an arc = pattern radius x sector angle in radians [S:LONG p.128] via trade-reference §1.1
        double theta = Math.toRadians(120);
        Polyline sector = Fixtures.sector("CUT", 260, -20, 100, 200, 30, 150);
        assertEquals(200 * theta + 100 * theta + 2 * (200 - 100), sector.length(), EPS);
    }

    @Test
    void length_circleAndHalfCircles_trueArcLength() {
        // circumference 2 pi r (computed)
        assertEquals(2 * Math.PI * 25, Fixtures.circle("CUT", 600, 80, 25).length(), EPS);
        assertEquals(Math.PI, open(0, 0, -1, 2, 0).length(), EPS);
        assertEquals(Math.PI * 3 / 2, open(1, 0, bulgeOfSweep(270), 0, -1).length(), EPS);
    }

    @Test
    void length_rectangle_perimeter() {
        assertEquals(600, Fixtures.rectangle("CUT", 500, 30, 700, 130).length(), EPS);
    }
}
