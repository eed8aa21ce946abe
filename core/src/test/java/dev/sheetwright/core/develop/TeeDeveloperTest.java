package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.TeeSpec;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class TeeDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals

    private static DevelopContext meanContext() {
        return new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH);
    }

    private static Development net(double main, double branch, double angle, double offset, double end) {
        return TeeDeveloper.develop(new TeeSpec("T1", 1, main, branch, angle, offset, end, 24, true,
                Allowances.NET, Allowances.NET), meanContext());
    }

    private static LayoutTable elements(Development d) {
        return d.pieces().get(0).layout().tables().get(0);
    }

    /** Column {@code col} of the 12-division table at division {@code i} (theta = 30 i degrees). */
    private static double cell(Development d, int i, int col) {
        return elements(d).rows().get(i).get(col);
    }

    @Test
    void tee6on10_elementTable() {
        // trade-reference §4.2 first table (computed), 6 in branch on 10 in main, 90 deg, e = 0, end 8 in above
        Development d = net(10, 6, 90, 0, 8);
        double[] x = {0, 1.5708, 3.1416, 4.7124, 6.2832, 7.8540, 9.4248};
        double[] ord = {3.0000, 3.2303, 3.7280, 4.0000, 3.7280, 3.2303, 3.0000};
        double[] s = {0, 1.5235, 2.7320, 3.2175, 2.7320, 1.5235, 0};
        double[] u = {3.0000, 2.5981, 1.5000, 0, -1.5000, -2.5981, -3.0000};
        for (int i = 0; i <= 6; i++) {
            assertEquals(30.0 * i, cell(d, i, 0), 1e-12);
            assertEquals(x[i], cell(d, i, 1), EPS4, "x at division " + i);
            assertEquals(ord[i], cell(d, i, 2), EPS4, "ordinate at division " + i);
            assertEquals(s[i], cell(d, i, 3), EPS4, "hole s at division " + i);
            assertEquals(u[i], cell(d, i, 4), EPS4, "hole u at division " + i);
            // symmetric for 180-360 deg (§4.2); the hole's s changes sign on the other side of the top line
            assertEquals(ord[i], cell(d, 12 - i, 2), EPS4);
            assertEquals(-s[i], cell(d, 12 - i, 3), EPS4);
        }
    }

    @Test
    void tee6on10_checkValuesC6() {
        // check value C6 (computed): ordinate 3.0000 at 0 deg, 4.0000 at 90 deg; hole 6.4350 round the main and
        // 6.000 along it (trade-reference §4.2)
        Development d = net(10, 6, 90, 0, 8);
        Layout l = d.pieces().get(0).layout();
        assertEquals(3.0000, l.get("shortestElement"), EPS4);
        assertEquals(4.0000, l.get("longestElement"), EPS4);
        assertEquals(6.4350, l.get("holeWidth"), EPS4);
        assertEquals(6.0000, l.get("holeLength"), EPS4);
        // the hole actually cut in the main has the same overall size
        Box2 hole = d.pieces().get(1).pattern().holes().get(0).bounds();
        assertEquals(6.4350, hole.width(), EPS4);
        assertEquals(6.0000, hole.height(), EPS4);
    }

    @Test
    void tee6on10_offset1p5_ordinates() {
        // trade-reference §4.2, same tee with the branch axis offset e = 1.5 in (computed)
        Development d = net(10, 6, 90, 1.5, 8);
        double[] ord = {3.2303, 4.0000, 5.1354, 5.8206, 5.1354, 4.0000, 3.2303, 3.0000, 3.1221, 3.2303, 3.1221,
            3.0000};
        for (int i = 0; i < 12; i++) {
            assertEquals(ord[i], cell(d, i, 2), EPS4, "ordinate at " + 30 * i + " deg");
        }
    }

    @Test
    void tee6on6_equalDiameters_ordinatesAndWarning() {
        // trade-reference §4.2: 6 in on 6 in, 90 deg, e = 0, end 8 in: ordinates 8 - 3|cos theta| (computed)
        Development d = net(6, 6, 90, 0, 8);
        double[] ord = {5.0000, 5.4019, 6.5000, 8.0000};
        for (int i = 0; i < 4; i++) {
            assertEquals(ord[i], cell(d, i, 2), EPS4);
        }
        for (int i = 0; i <= 12; i++) {
            double th = Math.toRadians(30 * i);
            assertEquals(8 - 3 * Math.abs(Math.cos(th)), cell(d, i, 2), 1e-12); // §4.1 equal-diameter form
            assertEquals(3 * Math.cos(th), cell(d, i, 4), 1e-12); // hole u = R cos theta (§4.1)
        }
        // hole round the main is half the main's circumference: s = R theta up to 90 deg (§4.1)
        assertEquals(3 * Math.PI, d.pieces().get(0).layout().get("holeWidth"), 1e-9);
        assertEquals(1, d.warnings().size());
        assertTrue(SimplePolygons.isSimple(d.pieces().get(1).pattern().holes().get(0).flatten(0.01)));
    }

    @Test
    void lateral6on10at45_table() {
        // trade-reference §4.2, lateral 6 in on 10 in, alpha = 45 deg, e = 0, T = 14 in (computed)
        Development d = net(10, 6, 45, 0, 14);
        double[] ord = {3.9289, 4.6566, 6.4585, 8.3431, 9.4585, 9.8527, 9.9289};
        double[] u = {9.2426, 8.4439, 6.3933, 4.0000, 2.1507, 1.0955, 0.7574};
        double[] s = {0, 1.5235, 2.7320, 3.2175, 2.7320, 1.5235, 0};
        for (int i = 0; i <= 6; i++) {
            assertEquals(ord[i], cell(d, i, 2), EPS4, "ordinate at division " + i);
            assertEquals(u[i], cell(d, i, 4), EPS4, "hole u at division " + i);
            assertEquals(s[i], cell(d, i, 3), EPS4, "hole s at division " + i);
        }
    }

    @Test
    void lateral6on10at45_checkValuesC7() {
        // check value C7 (computed): shortest / longest element 3.9289 / 9.9289; hole length 8.4852 = 6 / sin 45
        Development d = net(10, 6, 45, 0, 14);
        Layout l = d.pieces().get(0).layout();
        assertEquals(3.9289, l.get("shortestElement"), EPS4);
        assertEquals(9.9289, l.get("longestElement"), EPS4);
        // the reference prints 8.4852 for 6 / sin 45 = 8.48528..., cut off rather than rounded: compare with both
        assertEquals(8.4852, l.get("holeLength"), 1e-4);
        assertEquals(6 / Math.sin(Math.toRadians(45)), l.get("holeLength"), 1e-9);
        assertEquals(6 / Math.sin(Math.toRadians(45)), d.pieces().get(1).pattern().holes().get(0).bounds().height(),
                1e-9);
        // the branch pattern: net height is the longest element, width the stretch-out (trade-reference §4.1)
        Box2 b = d.pieces().get(0).pattern().bounds();
        assertEquals(9.9289, b.height(), EPS4);
        assertEquals(6 * Math.PI, b.width(), 1e-9);
    }

    @Test
    void jointCurve_pointsWithinChordTolerance() {
        // every chord of the joint polyline stays within tolerance.chord() of the true curve (§4.1 curve)
        Tolerance tol = Tolerance.INCH;
        TeeDeveloper.Intersection x = new TeeDeveloper.Intersection(5, 3, Math.toRadians(45), 0, 14);
        List<Double> th = TeeDeveloper.samples(x, tol);
        for (int i = 0; i + 1 < th.size(); i++) {
            double a = th.get(i);
            double b = th.get(i + 1);
            for (int k = 1; k < 10; k++) {
                double m = a + (b - a) * k / 10;
                double exact = x.ordinate(m);
                double chord = x.ordinate(a) + (x.ordinate(b) - x.ordinate(a)) * k / 10;
                assertTrue(Math.abs(exact - chord) <= tol.chord() * 1.01, "sagitta at theta " + m);
            }
        }
        // a tighter tolerance takes more points: the count follows the sagitta, not a fixed number
        assertTrue(TeeDeveloper.samples(x, tol.withChord(0.0005)).size() > th.size());
    }

    @Test
    void main_holeInsideBlankAwayFromSeam() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances main = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("crimp"), t.parseEnd("bead"), true);
        Development d = TeeDeveloper.develop(new TeeSpec("T2", 1, 10, 6, 45, 1, 14, 16, true, Allowances.NET, main),
                meanContext());
        Pattern p = d.pieces().get(1).pattern();
        Contour hole = p.holes().get(0);
        Box2 hb = hole.bounds();
        assertTrue(hb.minX() > 0 && hb.maxX() < 10 * Math.PI, "hole stays clear of the seam edges");
        assertTrue(hb.minY() > 0 && hb.maxY() < 16, "hole stays within the net length");
        // centred on the main's length: the polyline's extremes are within the chord tolerance of the curve's
        assertEquals(8.0, (hb.minY() + hb.maxY()) / 2, Tolerance.INCH.chord());
        assertFalse(hole.isCounterClockwise());
        assertTrue(SimplePolygons.isSimple(hole.flatten(0.01)));
        assertEquals(p.outer().area() - hole.area(), p.area(), 1e-9);
    }

    @Test
    void main_topLineMarks_stopAtTheHole() {
        // e = 0: the hole crosses the main's top line at hole u = +-3 for the tee 6 on 10 (§4.2 table, s = 0)
        Development d = net(10, 6, 90, 0, 8);
        List<dev.sheetwright.core.geom.Mark> centre = d.pieces().get(1).pattern().marks().stream()
                .filter(m -> m.kind() == dev.sheetwright.core.geom.MarkKind.CENTRE).toList();
        assertEquals(2, centre.size());
        assertEquals(24 - 6, centre.get(0).edge().length() + centre.get(1).edge().length(), 1e-9);
        // a branch offset past its own radius leaves the whole top line to mark
        Development off = net(20, 4, 90, 5, 14);
        List<dev.sheetwright.core.geom.Mark> whole = off.pieces().get(1).pattern().marks().stream()
                .filter(m -> m.kind() == dev.sheetwright.core.geom.MarkKind.CENTRE).toList();
        assertEquals(24, whole.stream().mapToDouble(m -> m.edge().length()).sum(), 1e-9);
    }

    @Test
    void tap_withFlangeAndNotches_outlineSimple_branchOnly() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        EndAllowance flange = t.defaultTapFlange();
        assertEquals(EndKind.FLANGE, flange.kind());
        Allowances a = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("crimp"), flange, true);
        Development d = TeeDeveloper.develop(new TeeSpec("TAP1", 1, 14, 6, 90, 2, 10, 0, false, a, null),
                meanContext());
        assertEquals(1, d.pieces().size());
        Pattern p = d.pieces().get(0).pattern();
        assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)));
        Pattern bare = TeeDeveloper.develop(new TeeSpec("TAP1", 1, 14, 6, 90, 2, 10, 0, false,
                Allowances.NET, null), meanContext()).pieces().get(0).pattern();
        // the allowances only add metal: the net pattern lies inside the cut pattern
        assertTrue(p.area() > bare.area());
        Box2 b = p.bounds();
        Box2 n = bare.bounds();
        assertEquals(n.minX() - 0.375, b.minX(), 1e-9); // groove 1/4: 3/8 on each edge [S:NAVY ch.2]
        assertEquals(n.maxX() + 0.375, b.maxX(), 1e-9);
        assertEquals(n.minY() - 1.25, b.minY(), 1e-9); // crimp 1 1/4 (from memory, AllowanceTable)
        assertTrue(b.maxY() > n.maxY() + 0.5 - 1e-9);
    }

    @Test
    void tapWithoutJointAllowance_warns() {
        Development d = TeeDeveloper.develop(new TeeSpec("TAP2", 1, 14, 6, 90, 0, 10, 0, false,
                Allowances.NET, null), meanContext());
        assertEquals(1, d.warnings().size());
        assertTrue(d.warnings().get(0).startsWith("TAP2:"));
    }

    @Test
    void branchPastSideOfMain_rejectedNamingOffset() {
        FittingException e = assertThrows(FittingException.class, () -> net(10, 6, 90, 2.5, 8));
        assertEquals("offset", e.field());
        assertEquals("T1", e.fitting());
    }

    @Test
    void branchLargerThanMain_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> new TeeSpec("T3", 1, 8, 10, 90, 0, 12, 20, true, Allowances.NET, Allowances.NET));
        assertEquals("branch", e.field());
    }

    @Test
    void branchEndInsideMain_rejectedNamingLength() {
        FittingException e = assertThrows(FittingException.class, () -> net(10, 6, 90, 0, 4.5));
        assertEquals("length", e.field());
    }

    @Test
    void mainShorterThanHole_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> TeeDeveloper.develop(new TeeSpec("T4", 1, 10, 6, 45, 0, 14, 8, true, Allowances.NET,
                        Allowances.NET), meanContext()));
        assertEquals("mainLength", e.field());
    }

    @Test
    void angleOutOfRange_rejected() {
        FittingException e = assertThrows(FittingException.class,
                () -> new TeeSpec("T5", 1, 10, 6, 120, 0, 14, 20, true, Allowances.NET, Allowances.NET));
        assertEquals("angle", e.field());
    }

    @Test
    void dispatch_throughDevelopers() {
        Development d = Developers.develop(new TeeSpec("T6", 2, 10, 6, 90, 0, 8, 24, true, Allowances.NET,
                Allowances.NET), meanContext());
        assertEquals("branch", d.pieces().get(0).pattern().piece());
        assertEquals("main", d.pieces().get(1).pattern().piece());
        assertEquals("tee", d.fitting().type());
    }
}
