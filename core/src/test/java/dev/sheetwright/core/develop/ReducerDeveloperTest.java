package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;
import org.junit.jupiter.api.Test;

class ReducerDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals

    private static DevelopContext meanContext() {
        return new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH);
    }

    private static Development net(double large, double small, double height) {
        return ReducerDeveloper.develop(new ReducerSpec("R1", 1, large, small, height, 1, Allowances.NET),
                meanContext());
    }

    @Test
    void cone_textbookExample_sectorAngle270() {
        // [S:ATK ch. XII] via trade-reference §1.2(a): base diameter 3 in, slant height 2 in -> 270 deg (computed)
        double r = 1.5;
        double height = Math.sqrt(2 * 2 - r * r);
        ReducerDeveloper.Frustum cone = new ReducerDeveloper.Frustum(r, 0, height);
        assertEquals(2.0, cone.largeRadius(), 1e-12);
        assertEquals(270.0, Math.toDegrees(cone.angle()), 1e-9);
        assertEquals(9.4248, cone.largeRadius() * cone.angle(), EPS4); // arc = 3 pi
    }

    @Test
    void frustum_textbookSampleProblem_slantAndPattern() {
        // [S:LONG p.128] sample problem via trade-reference §1.2(b): bases 6 and 3 in, altitude 3 in
        Development d = net(6, 3, 3);
        Layout l = d.pieces().get(0).layout();
        assertEquals(3.3541, l.get("slantHeight"), EPS4); // hypotenuse of 1 1/2 and 3 (book)
        assertEquals(6.0000, l.get("apexHeight"), EPS4); // computed
        assertEquals(6.7082, l.get("largeRadius"), EPS4);
        assertEquals(3.3541, l.get("smallRadius"), EPS4);
        assertEquals(160.997, l.get("patternAngle"), 5e-4);
        // lateral area 47.42 in^2 [S:LONG p.91, p.128]; the net pattern area must equal it
        assertEquals(47.42, d.pieces().get(0).pattern().area(), 0.005);
    }

    @Test
    void reducer12to8_computedReferenceValues() {
        // trade-reference §1.2(c) (computed, mean diameters), check values C2
        Development d = net(12, 8, 10);
        Layout l = d.pieces().get(0).layout();
        Pattern p = d.pieces().get(0).pattern();
        assertEquals(10.1980, l.get("slantHeight"), EPS4);
        assertEquals(30.0000, l.get("apexHeight"), EPS4);
        assertEquals(30.5941, l.get("largeRadius"), EPS4);
        assertEquals(20.3961, l.get("smallRadius"), EPS4);
        assertEquals(70.6018, l.get("patternAngle"), EPS4);
        assertEquals(37.6991, l.get("largeStretchOut"), EPS4);
        assertEquals(25.1327, l.get("smallStretchOut"), EPS4);
        assertEquals(83.2279, p.cutLength(), EPS4);
        Box2 box = p.bounds();
        assertEquals(35.3589, box.width(), EPS4);
        assertEquals(13.9483, box.height(), EPS4);
        assertEquals(11.31, l.get("slope"), 0.005); // §1.1: 11.31 deg for this reducer
        // the two arcs of the net pattern are the two end circumferences
        double arcs = p.outer().edges().stream().filter(e -> e instanceof Arc).mapToDouble(Edge::length).sum();
        assertEquals(Math.PI * (12 + 8), arcs, 1e-9); // 37.6991 + 25.1327
    }

    @Test
    void reducer12to8_insideDimensions24Gauge_meanLineCorrection() {
        // trade-reference §1.2(c), second part: inside dimensions in 24 ga (t = 0.0276 in) (computed)
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0.0276, DimensionFace.INSIDE, Tolerance.INCH);
        Development d = ReducerDeveloper.develop(new ReducerSpec("R", 1, 12, 8, 10, 1, Allowances.NET), ctx);
        Layout l = d.pieces().get(0).layout();
        assertEquals(30.6645, l.get("largeRadius"), EPS4);
        assertEquals(20.4664, l.get("smallRadius"), EPS4);
        assertEquals(70.6018, l.get("patternAngle"), EPS4);
        assertEquals(37.7858, l.get("largeStretchOut"), EPS4);
    }

    @Test
    void reducer6to4_shopCheck() {
        // common practice trade check: 6 in to 4 in reducer 4 in tall
        Layout l = net(6, 4, 4).pieces().get(0).layout();
        assertEquals(12.0, l.get("apexHeight"), 1e-9);
        assertEquals(12.37, l.get("largeRadius"), 0.005);
        assertEquals(18.85, l.get("largeStretchOut"), 0.005);
        assertEquals("18 7/8", FractionFormat.SIXTEENTHS.format(l.get("largeStretchOut")));
        assertEquals(6 * 180 / l.get("largeRadius"), l.get("patternAngle"), 1e-9);
    }

    @Test
    void piecesSplitTheAngle_eachPieceCountsOnce() {
        Development d = ReducerDeveloper.develop(new ReducerSpec("R", 2, 12, 8, 10, 3, Allowances.NET),
                meanContext());
        DevelopedPiece piece = d.pieces().get(0);
        assertEquals(3, piece.pattern().count());
        assertEquals(70.6018 / 3, piece.layout().get("pieceAngle"), EPS4);
        assertEquals(Math.PI * (6 + 4) * Math.hypot(2, 10) / 3, piece.pattern().area(), 1e-9);
    }

    @Test
    void smallNotSmallerThanLarge_rejectedNamingFittingAndField() {
        FittingException e = assertThrows(FittingException.class,
                () -> new ReducerSpec("RD-7", 1, 8, 8, 10, 1, Allowances.NET));
        assertEquals("small", e.field());
        assertTrue(e.getMessage().startsWith("fitting 'RD-7', field 'small'"), e.getMessage());
    }

    @Test
    void nonPositiveHeight_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> new ReducerSpec("RD-8", 1, 12, 8, 0, 1, Allowances.NET));
        assertEquals("height", e.field());
    }
}
