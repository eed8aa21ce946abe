package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EccentricReducerSpec;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class EccentricReducerDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals
    /** A fine chord so polyline lengths can be compared with true curve lengths. */
    private static final Tolerance FINE = Tolerance.INCH.withChord(1e-5);

    private static Development develop(EccentricReducerSpec spec, Tolerance tol) {
        return EccentricReducerDeveloper.develop(spec,
                new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, tol));
    }

    private static Development flat12to8(int pieces, Allowances a, Tolerance tol) {
        return develop(EccentricReducerSpec.flatSide("E1", 1, 12, 8, 10, pieces, a), tol);
    }

    @Test
    void flat12to8_generatorTableMatchesReference() {
        // trade-reference §2.4 (computed): 12 -> 8 in, H 10 in, one side flat; half table, a from the flat side
        double[][] expected = {
            {0, 30.0000, 20.0000, 10.0000, 0.0000},
            {30, 30.1603, 20.1069, 10.0534, 5.9789},
            {60, 30.5941, 20.3961, 10.1980, 11.8501},
            {90, 31.1769, 20.7846, 10.3923, 17.5781},
            {120, 31.7490, 21.1660, 10.5830, 23.2020},
            {150, 32.1614, 21.4409, 10.7205, 28.7817},
            {180, 32.3110, 21.5407, 10.7703, 34.3529},
        };
        LayoutTable table = flat12to8(1, Allowances.NET, Tolerance.INCH).pieces().get(0).layout().tables().get(0);
        assertEquals("generators", table.key());
        for (int i = 0; i < expected.length; i++) {
            List<Double> row = table.rows().get(i);
            for (int c = 0; c < 5; c++) {
                assertEquals(expected[i][c], row.get(c), EPS4, "row a = " + expected[i][0] + ", column " + c);
            }
        }
        // the far half mirrors the near half; the last row closes the pattern at the whole angle
        assertEquals(table.rows().get(1).get(1), table.rows().get(11).get(1), 1e-12);
        assertEquals(68.7058, table.rows().get(12).get(4), EPS4);
    }

    @Test
    void flat12to8_totalAngleApexAndLongestGenerator() {
        // check values C3, trade-reference §2.4 (computed): apex 30.0000, longest 32.3110, angle 68.7058 deg
        Layout l = flat12to8(1, Allowances.NET, Tolerance.INCH).pieces().get(0).layout();
        assertEquals(30.0000, l.get("apexHeight"), EPS4);
        assertEquals(32.3110, l.get("longestGenerator"), EPS4);
        assertEquals(68.7058, l.get("patternAngle"), EPS4);
        // the flat-side element is vertical, so it is H itself (§2.4)
        assertEquals(10.0, l.get("shortestElement"), 1e-12);
    }

    @Test
    void flat12to8_chordTriangulation_fallsShortAsTheTextbooksDo() {
        // trade-reference §2.3/§2.4 (computed): N = 12 -> 67.9498, N = 16 -> 68.2801, N = 48 -> 68.6585 deg
        ObliqueCone cone = ObliqueCone.of(6, 4, 2, 0, 10);
        assertEquals(67.9498, Math.toDegrees(cone.triangulatedAngle(12)), EPS4);
        assertEquals(68.2801, Math.toDegrees(cone.triangulatedAngle(16)), EPS4);
        assertEquals(68.6585, Math.toDegrees(cone.triangulatedAngle(48)), EPS4);
        // the shortfall is about (pi/N)^2/6 of the exact angle (§2.3): 1.14 % for N = 12
        double shortfall = 1 - cone.triangulatedAngle(12) / cone.totalAngle();
        assertEquals(0.0114, shortfall, 0.0005);
        Layout l = flat12to8(1, Allowances.NET, Tolerance.INCH).pieces().get(0).layout();
        assertEquals(67.9498, l.get("handTriangulatedAngle"), EPS4);
    }

    @Test
    void flat12to8_developedEndCurvesMeasureTheStretchOuts() {
        // trade-reference §2.4 check and §11: developed large-end curve = pi D1 = 37.699 in; small end pi D2
        Pattern p = flat12to8(1, Allowances.NET, FINE).pieces().get(0).pattern();
        double large = 0;
        double small = 0;
        for (Edge e : p.outer().edges()) {
            double r0 = e.start().length();
            double r1 = e.end().length();
            if (r0 > 25 && r1 > 25 && !isRadial(e)) {
                large += e.length();
            } else if (r0 < 25 && r1 < 25) {
                small += e.length();
            }
        }
        assertEquals(37.699, large, 5e-4);
        assertEquals(Math.PI * 12, large, 1e-5);
        assertEquals(Math.PI * 8, small, 1e-5);
    }

    @Test
    void flat12to8_seamOnTheLongSide_radialEdgesAreTheLongestElement() {
        // trade-reference §2.4: seam at a = 180 deg, element 10.7703 in (computed)
        Pattern p = flat12to8(1, Allowances.NET, Tolerance.INCH).pieces().get(0).pattern();
        List<Edge> radial = p.outer().edges().stream().filter(EccentricReducerDeveloperTest::isRadial).toList();
        assertEquals(2, radial.size());
        for (Edge e : radial) {
            assertEquals(10.7703, e.length(), EPS4);
            assertEquals(32.3110, Math.max(e.start().length(), e.end().length()), EPS4);
        }
        // symmetric about the short-side generator (+y)
        assertEquals(-p.bounds().minX(), p.bounds().maxX(), 1e-9);
    }

    @Test
    void zeroOffset_isTheConcentricReducerExactly() {
        // trade-reference §1.2(c), check value C2: same D1, D2, H concentric -> 70.6018 deg, exact arcs
        EccentricReducerSpec spec = new EccentricReducerSpec("E0", 1, 12, 8, 10, 0, 0, false, 1, Allowances.NET);
        Development d = develop(spec, Tolerance.INCH);
        Pattern concentric = ReducerDeveloper.develop(new ReducerSpec("E0", 1, 12, 8, 10, 1, Allowances.NET),
                new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH)).pieces().get(0).pattern();
        assertEquals(70.6018, d.pieces().get(0).layout().get("patternAngle"), EPS4);
        assertEquals(concentric.area(), d.pieces().get(0).pattern().area(), 1e-9);
        assertEquals(concentric.cutLength(), d.pieces().get(0).pattern().cutLength(), 1e-9);
    }

    @Test
    void piecesSplitTheStretchOut_anglesAddUpAndEachPieceIsUpright() {
        Development whole = flat12to8(1, Allowances.NET, Tolerance.INCH);
        Development split = flat12to8(3, Allowances.NET, Tolerance.INCH);
        assertEquals(3, split.pieces().size());
        double angles = 0;
        double area = 0;
        for (DevelopedPiece piece : split.pieces()) {
            assertEquals(1, piece.pattern().count());
            angles += piece.layout().get("pieceAngle");
            area += piece.pattern().area();
            // upright: the middle generator (the centre mark) lies on +y
            Edge centre = piece.pattern().marks().stream().filter(m -> m.kind() == MarkKind.CENTRE).findFirst()
                    .orElseThrow().edge();
            assertEquals(0, centre.start().x(), 1e-9);
            assertEquals(0, centre.end().x(), 1e-9);
            assertTrue(centre.end().y() > centre.start().y());
        }
        assertEquals(68.7058, angles, EPS4);
        // chord polygons lose at most 2/3 x sagitta x curve length of area on each side of the true curves
        double chordLoss = 2.0 / 3 * Tolerance.INCH.chord() * Math.PI * (12 + 8);
        assertEquals(whole.pieces().get(0).pattern().area(), area, chordLoss);
        assertEquals(List.of("blank-1of3", "blank-2of3", "blank-3of3"),
                split.pieces().stream().map(p -> p.pattern().piece()).toList());
    }

    @Test
    void allowances_addedOutsideTheNetPattern_outlineStaysSimple() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        for (boolean notch : new boolean[] {false, true}) {
            Allowances a = new Allowances(t.seam(SeamKind.GROOVE, 0.25), t.parseEnd("crimp 1"),
                    t.parseEnd("bead 3/8"), notch);
            for (int k = 1; k <= 2; k++) {
                Pattern net = flat12to8(k, Allowances.NET, Tolerance.INCH).pieces().get(0).pattern();
                Pattern cut = flat12to8(k, a, Tolerance.INCH).pieces().get(0).pattern();
                assertTrue(SimplePolygons.isSimple(cut.outer().flatten(0.01)), "notch " + notch + ", k " + k);
                assertTrue(cut.area() > net.area() + 0.375 * 10);
                // every net corner is inside or on the cut outline
                for (var v : net.outer().flatten(0.01)) {
                    assertTrue(insideOrOn(v, cut.outer().flatten(0.01)), "net vertex " + v + " outside the cut");
                }
            }
        }
    }

    @Test
    void obliqueCone_smallZero_runsToTheApex() {
        // A hood: 20 in base, apex 12 in above a point on the rim (flat side): H = 12, offset R1
        EccentricReducerSpec spec = EccentricReducerSpec.flatSide("H1", 1, 20, 0, 12, 1, Allowances.NET);
        Development d = develop(spec, FINE);
        Layout l = d.pieces().get(0).layout();
        assertEquals(12.0, l.get("apexHeight"), 1e-12);
        assertEquals(12.0, l.get("shortestGenerator"), 1e-12); // vertical generator over the rim point
        assertEquals(Math.hypot(20, 12), l.get("longestGenerator"), 1e-12);
        assertFalse(d.warnings().isEmpty()); // a 59 deg side is far steeper than transitions allow
    }

    @Test
    void flatAndOffsetTogether_rejectedNamingTheField() {
        FittingException e = assertThrows(FittingException.class,
                () -> new EccentricReducerSpec("E9", 1, 12, 8, 10, 2, 0, true, 1, Allowances.NET));
        assertEquals("flat", e.field());
        assertTrue(e.getMessage().startsWith("fitting 'E9', field 'flat'"), e.getMessage());
    }

    @Test
    void smallNotSmaller_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> EccentricReducerSpec.flatSide("E8", 1, 8, 8, 10, 1, Allowances.NET));
        assertEquals("small", e.field());
    }

    @Test
    void overhangingSmallEnd_warns() {
        EccentricReducerSpec spec = new EccentricReducerSpec("E7", 1, 12, 8, 10, 3, 0, false, 1, Allowances.NET);
        Development d = develop(spec, Tolerance.INCH);
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("overhangs")), d.warnings().toString());
    }

    static boolean isRadial(Edge e) {
        return e instanceof Line && Math.abs(e.start().cross(e.end())) <= 1e-9 * e.start().length() * e.end().length()
                && e.length() > 1;
    }

    private static boolean insideOrOn(dev.sheetwright.core.geom.Point2 p, List<dev.sheetwright.core.geom.Point2> ring) {
        boolean in = false;
        int n = ring.size();
        for (int i = 0; i < n; i++) {
            var a = ring.get(i);
            var b = ring.get((i + 1) % n);
            if (CurveSampler.distanceToSegment(p, a, b) < 1e-6) {
                return true;
            }
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < a.x() + (p.y() - a.y()) * (b.x() - a.x()) / (b.y() - a.y())) {
                in = !in;
            }
        }
        return in;
    }
}
