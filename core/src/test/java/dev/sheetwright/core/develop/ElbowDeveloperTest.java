package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.fitting.SeamPosition;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.geom.Transform2;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class ElbowDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals
    private static final DevelopContext MEAN = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN,
            Tolerance.INCH);

    private static ElbowSpec net(double d, double angle, int gores, double radius, SeamPosition seam) {
        return new ElbowSpec("EL", 1, d, angle, gores, radius, seam, Allowances.NET, SeamAllowance.NONE);
    }

    private static Layout layout(ElbowSpec spec) {
        return ElbowDeveloper.develop(spec, MEAN).pieces().get(0).layout();
    }

    @Test
    void coey4piece90_halfGoresMiterAndHeights() {
        // [S:COEY "Round Elbow"] via trade-reference §3.5(a) and §11 #1, #2: 6 in dia, 6 in throat radius, 4-piece
        // 90 deg -> 6 half-gores, 15 deg; exact (computed) centre 2.4115, heel 3.2154, throat 1.6077, blank 14.4693
        Layout l = layout(net(6, 90, 4, 6 + 3, SeamPosition.SIDE));
        assertEquals(6, l.get("halfGores"));
        assertEquals(15.0, l.get("miterAngle"), 1e-12);
        assertEquals(2.4115, l.get("centreOrdinate"), EPS4);
        assertEquals(3.2154, l.get("heelOrdinate"), EPS4);
        assertEquals(1.6077, l.get("throatOrdinate"), EPS4);
        assertEquals(14.4693, l.get("blankHeight"), EPS4);
        assertEquals(18.8496, l.get("stretchOut"), EPS4);
        // the book's drawn values: 2 7/16 in (a drawing measurement, within 1/16) and 14 5/8 in (within 1/4)
        assertEquals(2 + 7.0 / 16, l.get("centreOrdinate"), 1.0 / 16);
        assertEquals(14 + 5.0 / 8, l.get("blankHeight"), 1.0 / 4);
        assertEquals("2 7/16", FractionFormat.SIXTEENTHS.format(l.get("centreOrdinate")));
    }

    @Test
    void longfieldTwoPiece60_baseLineBacksetsAndOrdinates() {
        // [S:LONG p.52] via trade-reference §3.5(b) and §11 #3: throat radius 3 in, over a 4 1/2 in pipe ->
        // base line 7 1/2 in, backsets 2; computed: beta 30, heel 4.3301, centre 3.0311, throat 1.7321
        Layout l = layout(net(4.5, 60, 2, 3 + 2.25, SeamPosition.THROAT));
        assertEquals(7.5, l.get("heelRadius"), 1e-12);
        assertEquals(2, l.get("halfGores"));
        assertEquals(30.0, l.get("miterAngle"), 1e-12);
        assertEquals(4.3301, l.get("heelOrdinate"), EPS4);
        assertEquals(3.0311, l.get("centreOrdinate"), EPS4);
        assertEquals(1.7321, l.get("throatOrdinate"), EPS4);
        assertEquals(14.1372, l.get("stretchOut"), EPS4);
        assertEquals(16, l.tables().get(0).rows().size() - 1); // profile in 16 parts (book)
    }

    @Test
    void tenInch5piece90_referenceValuesAndOrdinateTable() {
        // trade-reference §3.5(c) (computed) and check value C4: 10 in, R = 1.5 D = 15 in, 5-piece 90 deg
        ElbowSpec spec = net(10, 90, 0, 0, SeamPosition.SIDE); // 0 = shop defaults: 5 pieces, R 1.5 D
        assertEquals(5, spec.gores());
        assertEquals(15.0, spec.radius(), 1e-12);
        Layout l = layout(spec);
        assertEquals(8, l.get("halfGores"));
        assertEquals(11.25, l.get("miterAngle"), 1e-12);
        assertEquals(3.9782, l.get("heelOrdinate"), EPS4);
        assertEquals(2.9837, l.get("centreOrdinate"), EPS4);
        assertEquals(1.9891, l.get("throatOrdinate"), EPS4);
        assertEquals(23.8695, l.get("blankHeight"), EPS4);
        assertEquals(31.4159, l.get("stretchOut"), EPS4);
        double[] x = {0, 1.9635, 3.9270, 5.8905, 7.8540, 9.8175, 11.7810, 13.7445, 15.7080};
        double[] y = {3.9782, 3.9025, 3.6869, 3.3643, 2.9837, 2.6031, 2.2804, 2.0648, 1.9891};
        LayoutTable t = l.tables().get(0);
        for (int i = 0; i < x.length; i++) {
            assertEquals(22.5 * i, t.rows().get(i).get(0), 1e-12);
            assertEquals(x[i], t.rows().get(i).get(1), EPS4, "x at row " + i);
            assertEquals(y[i], t.rows().get(i).get(3), EPS4, "y at row " + i);
        }
    }

    @Test
    void defaultPieces_byAngle() {
        // [S:UFGS15810N 2.2.3.2] via trade-reference §11 #15: round elbows over 8 in: 5 pieces for 90, 3 for 45;
        // 60 -> 4, 30 -> 2 and beta <= 15 deg for other angles are common practice (trade-reference §3.3)
        assertEquals(5, ElbowSpec.defaultGores(90));
        assertEquals(3, ElbowSpec.defaultGores(45));
        assertEquals(4, ElbowSpec.defaultGores(60));
        assertEquals(2, ElbowSpec.defaultGores(30));
        for (double a = 5; a <= 180; a += 5) {
            ElbowSpec s = net(12, a, 0, 0, SeamPosition.SIDE);
            assertTrue(s.miterAngle() <= 15 + 1e-12, "angle " + a);
        }
    }

    @Test
    void shortRadiusAndFewPieces_warn() {
        // [S:UFGS15566A 2.10.1]: R at least 1 D; [S:UFGS15810N 2.2.3.2]: 5 pieces for a 90 deg elbow over 8 in
        Development d = ElbowDeveloper.develop(net(10, 90, 4, 8, SeamPosition.SIDE), MEAN);
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("UFGS15566A")), d.warnings().toString());
        assertTrue(d.warnings().stream().anyMatch(w -> w.contains("UFGS15810N")), d.warnings().toString());
        assertTrue(ElbowDeveloper.develop(net(10, 90, 5, 15, SeamPosition.SIDE), MEAN).warnings().isEmpty());
    }

    @Test
    void pieces_countsAddUpToTheGores() {
        for (SeamPosition seam : SeamPosition.values()) {
            for (int n = 2; n <= 7; n++) {
                Development d = ElbowDeveloper.develop(net(10, 90, n, 15, seam), MEAN);
                int total = d.pieces().stream().mapToInt(p -> p.pattern().count()).sum();
                assertEquals(n, total, seam + " " + n);
            }
        }
    }

    @Test
    void sideSeam_middlePiecesAreOnePatternTurnedHalfRound() {
        // trade-reference §3.4 (computed): with the seam at the side the next piece is the previous one turned
        // 180 deg in the sheet, so with equal allowances every middle piece is one pattern
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.seam(SeamKind.GROOVE, 0.25), t.parseEnd("crimp 1"), t.parseEnd("crimp 1"),
                true);
        ElbowSpec spec = new ElbowSpec("EL", 1, 10, 90, 5, 15, SeamPosition.SIDE, a, t.seam(SeamKind.GROOVE, 0.25));
        Development d = ElbowDeveloper.develop(spec, MEAN);
        Pattern middle = d.pieces().stream().map(DevelopedPiece::pattern).filter(p -> p.piece().equals("middle"))
                .findFirst().orElseThrow();
        assertEquals(3, middle.count());
        // and in the strip: piece 3 turned about its centre lies on piece 2's outline, moved up one step
        List<Pattern> strip = ElbowDeveloper.strip(spec, MEAN);
        double step = 2 * 15 * Math.tan(Math.toRadians(11.25));
        double s = Math.PI * 10;
        Transform2 turn = Transform2.translation(-s / 2, -2 * step).then(Transform2.rotation(Math.PI))
                .then(Transform2.translation(s / 2, step));
        List<Point2> ring = strip.get(1).outer().flatten(1e-3);
        for (Point2 p : strip.get(2).transformed(turn).outer().flatten(1e-3)) {
            double nearest = Double.MAX_VALUE;
            for (int i = 0; i < ring.size(); i++) {
                nearest = Math.min(nearest, CurveSampler.distanceToSegment(p, ring.get(i),
                        ring.get((i + 1) % ring.size())));
            }
            assertEquals(0, nearest, 2 * Tolerance.INCH.chord());
        }
    }

    @Test
    void allowances_outlineSimpleAndLargerThanNet() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        for (boolean notch : new boolean[] {false, true}) {
            for (SeamPosition seam : SeamPosition.values()) {
                Allowances a = new Allowances(t.parseSeam("pittsburgh"), t.parseEnd("crimp 1 1/4"),
                        t.parseEnd("bead 3/8"), notch);
                ElbowSpec spec = new ElbowSpec("EL", 1, 10, 90, 5, 15, seam, a, t.defaultMiterSeam());
                for (DevelopedPiece piece : ElbowDeveloper.develop(spec, MEAN).pieces()) {
                    Pattern p = piece.pattern();
                    assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)), seam + " " + p.piece());
                    assertTrue(p.area() > Math.PI * 10 * 2.9837); // more than the net end piece, S x R tan beta
                }
            }
        }
    }

    @Test
    void defaultMiterSeam_isAQuarterInchLap() {
        // common practice (AllowanceTable): lap 1/4 in on the lower piece's miter edge
        SeamAllowance m = AllowanceTable.in(LengthUnit.INCH).defaultMiterSeam();
        assertEquals(SeamKind.LAP, m.kind());
        assertEquals(0.25, m.right(), 1e-12);
        assertEquals(0, m.left(), 1e-12);
    }

    @Test
    void radiusBelowHalfDiameter_rejectedNamingTheField() {
        FittingException e = assertThrows(FittingException.class, () -> net(10, 90, 5, 4, SeamPosition.SIDE));
        assertEquals("radius", e.field());
        assertTrue(e.getMessage().startsWith("fitting 'EL', field 'radius'"), e.getMessage());
    }

    @Test
    void badAngleOrGores_rejected() {
        assertEquals("angle", assertThrows(FittingException.class,
                () -> net(10, 0, 5, 15, SeamPosition.SIDE)).field());
        assertEquals("gores", assertThrows(FittingException.class,
                () -> net(10, 90, 1, 15, SeamPosition.SIDE)).field());
    }

    @Test
    void miterLaps_endOnTheSeamLine_notSquareToTheMiterCurve() {
        // 6 in, 4-piece 90 deg, seam at the side: there the miter curve meets the seam at slope tan beta (15 deg),
        // so a lap ended on the curve normal would stick out lap x sin(beta) = 0.0647 in past the seam line
        double lap = 0.25;
        Allowances notched = new Allowances(SeamAllowance.NONE, dev.sheetwright.core.fitting.EndAllowance.NONE,
                dev.sheetwright.core.fitting.EndAllowance.NONE, true);
        ElbowSpec spec = new ElbowSpec("EL", 1, 6, 90, 4, 9, SeamPosition.SIDE, notched,
                new SeamAllowance(SeamKind.LAP, lap, lap));
        double stretchOut = Math.PI * 6;
        double tanBeta = Math.tan(Math.toRadians(15));
        for (DevelopedPiece piece : ElbowDeveloper.develop(spec, MEAN).pieces()) {
            List<Point2> pts = piece.pattern().outer().flatten(Tolerance.INCH.chord());
            double minX = pts.stream().mapToDouble(Point2::x).min().orElseThrow();
            double maxX = pts.stream().mapToDouble(Point2::x).max().orElseThrow();
            assertEquals(0, minX, EPS4, piece.pattern().piece() + ": nothing left of the seam line x = 0");
            assertEquals(stretchOut, maxX, EPS4, piece.pattern().piece() + ": nothing right of x = stretch-out");
            // the lap reaches the seam line: at x = 0 the outline rises to the offset curve's crossing, about
            // lap / cos(beta) above the net corner (the curve's slope at the side is tan beta)
            double netTop = 9 * tanBeta; // ordinate at the side seam: R tan beta (trade-reference §3.2)
            double topAtSeam = pts.stream().filter(p -> Math.abs(p.x()) < EPS4).mapToDouble(Point2::y).max()
                    .orElseThrow();
            if (!piece.pattern().piece().startsWith("end") || topAtSeam > netTop + EPS4) {
                assertEquals(netTop + lap / Math.cos(Math.toRadians(15)), topAtSeam, 2e-3,
                        piece.pattern().piece());
            }
        }
    }
}
