package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.develop.TransitionDeveloper.Kind;
import dev.sheetwright.core.develop.TransitionDeveloper.Strip;
import dev.sheetwright.core.develop.TransitionDeveloper.Vertex;
import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.TransitionSpec;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.geom.Transform2;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class TransitionDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals

    private static final DevelopContext MEAN = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN,
            Tolerance.INCH);

    /** Centred 12 x 12 in square to 8 in round, H = 10 in (trade-reference §5.2). */
    private static TransitionSpec square12to8(int pieces, Allowances a) {
        return new TransitionSpec("SR1", 1, 12, 12, 8, 10, 0, 0, pieces, a);
    }

    /** Rectangle 16 x 12, D = 10 at H = 12, centre (2, 1) (trade-reference §5.3). */
    private static TransitionSpec offset16x12to10(int pieces) {
        return new TransitionSpec("SR2", 1, 16, 12, 10, 12, 2, 1, pieces, Allowances.NET);
    }

    private static double trueLength(LayoutTable t, int corner, int point) {
        for (List<Double> r : t.rows()) {
            if (r.get(0) == corner && r.get(1) == point) {
                return r.get(3);
            }
        }
        throw new AssertionError("no row for corner " + corner + " point " + point);
    }

    private static double planLength(LayoutTable t, int corner, int point) {
        for (List<Double> r : t.rows()) {
            if (r.get(0) == corner && r.get(1) == point) {
                return r.get(2);
            }
        }
        throw new AssertionError("no row for corner " + corner + " point " + point);
    }

    @Test
    void square12to8_N16_cornerLinesAndSeam_checkValuesC8() {
        // trade-reference §5.2 table (computed), check value C8: seam TL 10.1980; corner TLs 11.8322, 11.1931,
        // 10.9598, 11.1931, 11.8322 and plan lengths 6.3246, 5.0284, 4.4853, 5.0284, 6.3246
        LayoutTable t = TransitionDeveloper.cornerLineTable(square12to8(1, Allowances.NET), MEAN, 16);
        double[] plan = {6.3246, 5.0284, 4.4853, 5.0284, 6.3246};
        double[] tl = {11.8322, 11.1931, 10.9598, 11.1931, 11.8322};
        for (int c = 0; c < 4; c++) {
            for (int k = 0; k <= 4; k++) {
                int point = (4 * c + k) % 16;
                assertEquals(plan[k], planLength(t, c, point), EPS4, "plan C" + c + "-P" + point);
                assertEquals(tl[k], trueLength(t, c, point), EPS4, "true C" + c + "-P" + point);
            }
        }
        Development d = TransitionDeveloper.develop(square12to8(1, Allowances.NET), MEAN);
        assertEquals(10.1980, d.pieces().get(0).layout().get("seamTrueLength"), EPS4);
        LayoutTable sides = d.pieces().get(0).layout().tables().get(1);
        for (List<Double> r : sides.rows()) {
            assertEquals(10.1980, r.get(2), EPS4); // every side of the centred square has the same seam line
        }
    }

    @Test
    void square12to8_N12_cornerLines() {
        // trade-reference §5.2 (computed): with N = 12 the corner lines are 11.8322, 11.0648, 11.0648, 11.8322
        LayoutTable t = TransitionDeveloper.cornerLineTable(square12to8(1, Allowances.NET), MEAN, 12);
        double[] tl = {11.8322, 11.0648, 11.0648, 11.8322};
        for (int k = 0; k <= 3; k++) {
            assertEquals(tl[k], trueLength(t, 0, k), EPS4);
        }
    }

    @Test
    void square12to8_N16_patternCoordinates_upToRigidMotion() {
        // trade-reference §5.2 flat pattern (computed), S = (0, 0) and P0 = (0, 10.1980)
        double[][] corners = {{6.0000, 0.0000}, {16.3102, 6.1399}, {22.0271, 16.6907}, {21.5406, 28.6808}};
        double[][] circle = {{0, 10.1980}, {1.5589, 10.2743}, {3.0919, 10.5670}, {4.5588, 11.0999},
            {5.9372, 11.8320}, {7.2375, 12.6951}, {8.4049, 13.7310}, {9.3926, 14.9394}, {10.2023, 16.2737},
            {10.8779, 17.6806}, {11.3509, 19.1679}, {11.5812, 20.7116}, {11.5942, 22.2722}, {11.4548, 23.8267},
            {11.1002, 25.3466}, {10.5082, 26.7907}, {9.7208, 28.1383}};
        Point2 closingS = new Point2(18.2641, 33.7072);
        Strip st = TransitionDeveloper.triangulate(square12to8(1, Allowances.NET), MEAN, 16).get(0);
        Transform2 fit = rigidFit(st, corners[0]);
        int c = 0;
        int p = 0;
        for (Vertex v : st.vertices()) {
            Point2 at = fit.apply(v.flat());
            Point2 expected = switch (v.kind()) {
                case CORNER -> new Point2(corners[c][0], corners[c++][1]);
                case CIRCLE -> new Point2(circle[p][0], circle[p++][1]);
                case SIDE_MIDDLE -> v.index() == 0 ? Point2.ORIGIN : closingS;
            };
            assertEquals(expected.x(), at.x(), 1e-4, v.kind() + " " + v.index());
            assertEquals(expected.y(), at.y(), 1e-4, v.kind() + " " + v.index());
        }
        assertEquals(4, c);
        assertEquals(17, p);
    }

    /** The rigid motion (with a mirror if needed) taking S to the origin, P0 onto +y and C0 to the +x side. */
    private static Transform2 rigidFit(Strip st, double[] c0) {
        Point2 s = st.vertices().get(0).flat();
        Point2 p0 = st.vertices().get(1).flat();
        Transform2 t = Transform2.translation(-s.x(), -s.y())
                .then(Transform2.rotation(Math.PI / 2 - p0.minus(s).angle()));
        Point2 c = null;
        for (Vertex v : st.vertices()) {
            if (v.kind() == Kind.CORNER && v.index() == 0) {
                c = t.apply(v.flat());
            }
        }
        return c.x() * c0[0] < 0 ? t.then(Transform2.mirrorX()) : t;
    }

    @Test
    void square12to8_closingSeamBaseAndArea_checkValuesC9() {
        // check value C9 and §5.2 self-checks (computed): closing seam |S' - P0'| = 10.1980, base edges 48.000,
        // surface area 378.37 in^2, at N = 16
        Strip st = TransitionDeveloper.triangulate(square12to8(1, Allowances.NET), MEAN, 16).get(0);
        Point2 sEnd = st.vertices().get(st.base().get(st.base().size() - 1)).flat();
        Point2 pEnd = st.vertices().get(st.top().get(st.top().size() - 1)).flat();
        assertEquals(10.1980, sEnd.distance(pEnd), EPS4);
        double base = 0;
        for (int i = 0; i + 1 < st.base().size(); i++) {
            base += st.vertices().get(st.base().get(i)).flat().distance(st.vertices().get(st.base().get(i + 1)).flat());
        }
        assertEquals(48.000, base, 1e-9);
        double area = 0;
        for (TransitionDeveloper.Triangle t : st.triangles()) {
            Point2 a = st.vertices().get(t.a()).flat();
            area += Math.abs(st.vertices().get(t.b()).flat().minus(a).cross(st.vertices().get(t.c()).flat().minus(a)))
                    / 2;
        }
        assertEquals(378.37, area, 0.005);
    }

    @Test
    void square12to8_patternAtSixteenDivisions_matchesNetArea() {
        // a chord tolerance of 0.08 in on the 4 in radius gives N = 16 (N >= pi / acos(1 - delta / R), §5.1)
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH.withChord(0.08));
        Development d = TransitionDeveloper.develop(square12to8(1, Allowances.NET), ctx);
        Layout l = d.pieces().get(0).layout();
        assertEquals(16, l.get("divisions"));
        assertEquals(378.37, d.pieces().get(0).pattern().area(), 0.005); // §5.2 surface area (computed)
        assertEquals(48.000, l.get("baseLength"), 1e-9);
        assertEquals(10.1980, l.get("closingSeamLength"), EPS4);
        assertEquals(24.9716, l.get("roundLength"), EPS4); // §5.2: 16 chords of 1.5607 sum to 24.9716
    }

    @Test
    void divisions_fromSagitta() {
        // trade-reference §5.1 (computed): D = 20 in, delta = 0.005 in -> N about 100
        assertEquals(100, TransitionDeveloper.divisionsFor(10, 0.005));
        int n = TransitionDeveloper.divisionsFor(4, Tolerance.INCH.chord());
        assertEquals(0, n % 4);
        assertTrue(4 * (1 - Math.cos(Math.PI / n)) <= Tolerance.INCH.chord()); // sagitta of one chord
        assertTrue(4 * (1 - Math.cos(Math.PI / (n - 4))) > Tolerance.INCH.chord()); // and no coarser N would do
    }

    @Test
    void offset16x12to10_cornerFans() {
        // trade-reference §5.3 (computed): N = 16, corner fans and the front seam TL 12.3288
        double[][] fans = {
            {13.5647, 12.8983, 12.7309, 13.1065, 13.9284},
            {13.0384, 12.4673, 12.3377, 12.6825, 13.4164},
            {15.6205, 14.4754, 13.7089, 13.5084, 13.9284},
            {14.7648, 14.1005, 14.0638, 14.6649, 15.7480}};
        LayoutTable t = TransitionDeveloper.cornerLineTable(offset16x12to10(1), MEAN, 16);
        for (int c = 0; c < 4; c++) {
            for (int k = 0; k <= 4; k++) {
                assertEquals(fans[c][k], trueLength(t, c, (4 * c + k) % 16), EPS4, "C" + c + " k " + k);
            }
        }
        Development d = TransitionDeveloper.develop(offset16x12to10(1), MEAN);
        assertEquals(12.3288, d.pieces().get(0).layout().get("seamTrueLength"), EPS4);
    }

    @Test
    void fourPieces_centredSquare_oneQuarterFourOff() {
        Development d = TransitionDeveloper.develop(square12to8(4, Allowances.NET), MEAN);
        assertEquals(1, d.pieces().size());
        Pattern q = d.pieces().get(0).pattern();
        assertEquals(4, q.count());
        Development whole = TransitionDeveloper.develop(square12to8(1, Allowances.NET), MEAN);
        assertEquals(whole.pieces().get(0).pattern().area(), 4 * q.area(), 1e-9);
    }

    @Test
    void halves_centredRectangle_twoOff_offsetRectangle_twoDistinct() {
        Development centred = TransitionDeveloper.develop(
                new TransitionSpec("SR3", 1, 20, 12, 10, 12, 0, 0, 2, Allowances.NET), MEAN);
        assertEquals(1, centred.pieces().size());
        assertEquals(2, centred.pieces().get(0).pattern().count());
        Development offset = TransitionDeveloper.develop(offset16x12to10(2), MEAN);
        assertEquals(2, offset.pieces().size());
        assertEquals("half-1", offset.pieces().get(0).pattern().piece());
    }

    @Test
    void allowancesAndNotches_outlineSimple_bendLinesAtCorners() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("lap 1/2"), t.parseEnd("crimp"), true);
        for (int pieces : new int[] {1, 2, 4}) {
            Development d = TransitionDeveloper.develop(square12to8(pieces, a), MEAN);
            Development net = TransitionDeveloper.develop(square12to8(pieces, Allowances.NET), MEAN);
            Pattern p = d.pieces().get(0).pattern();
            assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)), "pieces " + pieces);
            assertTrue(p.area() > net.pieces().get(0).pattern().area());
            // bend lines from each corner of the piece to its two tangent points: 11.8322 in each (§5.2)
            long cornerBends = p.marks().stream().filter(m -> m.kind() == MarkKind.BEND)
                    .filter(m -> Math.abs(m.edge().length() - 11.8322) < EPS4).count();
            // and the two seam bend lines, 10.1980 in (§5.2)
            long seamBends = p.marks().stream().filter(m -> m.kind() == MarkKind.BEND)
                    .filter(m -> Math.abs(m.edge().length() - 10.1980) < EPS4).count();
            assertEquals(2, seamBends, "pieces " + pieces);
            assertEquals(2 * (4 / pieces), cornerBends, "pieces " + pieces);
        }
    }

    @Test
    void notch_cutsBackToNetCorners_withoutNotchStripsMeetInMitres() {
        // §7.5 (common practice for the depth): notched corners are cut back to the net corner; the apex of each
        // notch is a corner of the net pattern. Unnotched strips meet beyond it.
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances notched = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("lap 1/2"), t.parseEnd("crimp"),
                true);
        for (boolean notch : new boolean[] {true, false}) {
            Development d = TransitionDeveloper.develop(square12to8(4, notched.withNotch(notch)), MEAN);
            Pattern p = d.pieces().get(0).pattern();
            int n = (int) d.pieces().get(0).layout().get("divisions");
            Strip st = TransitionDeveloper.triangulate(square12to8(4, Allowances.NET), MEAN, n).get(0);
            List<Point2> apexes = new java.util.ArrayList<>();
            for (int i : st.base()) {
                apexes.add(st.vertices().get(i).flat()); // seam foot, corner, seam foot
            }
            apexes.add(st.vertices().get(st.top().get(0)).flat());
            apexes.add(st.vertices().get(st.top().get(st.top().size() - 1)).flat());
            List<Point2> cut = p.outer().flatten(1);
            for (Point2 apex : apexes) {
                boolean onOutline = cut.stream().anyMatch(q -> q.distance(apex) < 1e-9);
                assertEquals(notch, onOutline, "notch " + notch + " at " + apex);
            }
        }
    }

    @Test
    void steepSides_warnings() {
        // slope limits: 20 deg per side [S:SPEC15890]; 15 deg per side if diverging [S:UFGS15566A]
        Development steep = TransitionDeveloper.develop(new TransitionSpec("SR4", 1, 30, 30, 8, 10, 0, 0, 4,
                Allowances.NET), MEAN);
        assertEquals(1, steep.warnings().size());
        assertTrue(steep.warnings().get(0).contains("[S:SPEC15890]"));
        // side slope atan(3.5 / 10) = 19.3 deg: only the diverging limit
        Development middling = TransitionDeveloper.develop(new TransitionSpec("SR5", 1, 15, 15, 8, 10, 0, 0, 4,
                Allowances.NET), MEAN);
        assertTrue(middling.warnings().get(0).contains("[S:UFGS15566A]"));
        assertEquals(0, TransitionDeveloper.develop(square12to8(1, Allowances.NET), MEAN).warnings().size());
    }

    @Test
    void flatTransitionInOnePiece_seamStripsOverlap_rejectedNamingAllowances() {
        // a very flat transition develops to nearly a full ring: the two seam edges almost meet, so their
        // allowance strips would overlap; in two pieces it can be made
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.parseSeam("groove 1/4"), dev.sheetwright.core.fitting.EndAllowance.NONE, dev.sheetwright.core.fitting.EndAllowance.NONE, false);
        FittingException e = assertThrows(FittingException.class, () -> TransitionDeveloper.develop(
                new TransitionSpec("SR6", 1, 40, 40, 30, 1, 0, 0, 1, a), MEAN));
        assertEquals("allowances", e.field());
        assertEquals("SR6", e.fitting());
        Development halves = TransitionDeveloper.develop(new TransitionSpec("SR6", 1, 40, 40, 30, 1, 0, 0, 2, a), MEAN);
        assertTrue(SimplePolygons.isSimple(halves.pieces().get(0).pattern().outer().flatten(0.01)));
    }

    @Test
    void piecesNotOneTwoOrFour_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> new TransitionSpec("SR7", 1, 12, 12, 8, 10, 0, 0, 3, Allowances.NET));
        assertEquals("pieces", e.field());
    }

    @Test
    void dispatch_throughDevelopers() {
        Development d = Developers.develop(square12to8(2, Allowances.NET), MEAN);
        assertEquals("half", d.pieces().get(0).pattern().piece());
    }
}
