package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndCapSpec;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.RectConstruction;
import dev.sheetwright.core.fitting.RectDuctSpec;
import dev.sheetwright.core.fitting.RectElbowSpec;
import dev.sheetwright.core.fitting.RectOffsetSpec;
import dev.sheetwright.core.fitting.RectTransitionSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.ShoeTapSpec;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Rectangular fittings against the worked checks R1-R7 of trade-reference §13 (computed there). */
class RectDeveloperTest {

    private static final double EPS4 = 5e-5;
    private static final Tolerance TOL = Tolerance.INCH;
    private static final DevelopContext CTX = new DevelopContext(LengthUnit.INCH, 0.0276, DimensionFace.INSIDE, TOL);
    private static final AllowanceTable TABLE = AllowanceTable.in(LengthUnit.INCH);
    private static final Allowances NET = new Allowances(SeamAllowance.NONE, EndAllowance.NONE, EndAllowance.NONE,
            false);

    private static Pattern piece(Development d, String name) {
        return d.pieces().stream().map(DevelopedPiece::pattern).filter(p -> p.piece().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no piece " + name));
    }

    private static Layout layout(Development d, String name) {
        return d.pieces().stream().filter(p -> p.pattern().piece().equals(name)).findFirst().orElseThrow().layout();
    }

    @Test
    void r1_lHalf24x12_pittsburgh_blank37_25x48_bendAt24PlusAllowance() {
        // trade-reference §13.2 check R1 (computed): 24 x 12 L halves, 48 in joint, pocket 1, flange 1/4 (§13.1
        // common practice), ends none: each blank 37.25 x 48; bend line 24 in (plus the allowance on that side)
        Allowances a = new Allowances(TABLE.parseRectSeam("pittsburgh"), EndAllowance.NONE, EndAllowance.NONE, true);
        Development d = RectDuctDeveloper.develop(new RectDuctSpec("D1", 1, 24, 12, 48, RectConstruction.L_HALVES,
                a), CTX);
        assertEquals(1, d.pieces().size());
        Pattern p = piece(d, "l-half");
        assertEquals(2, p.count());
        assertEquals(37.25, p.bounds().width(), EPS4);
        assertEquals(48, p.bounds().height(), EPS4);
        double leftCut = p.bounds().minX();
        List<Double> bends = p.marks().stream().filter(m -> m.kind() == MarkKind.BEND)
                .map(m -> ((Line) m.edge()).start().x() - leftCut).sorted().toList();
        // bend lines: the flange edge's line (1/4), the corner (24 + 1/4) and the pocket edge's line (36 + 1/4)
        assertEquals(List.of(0.25, 24.25, 36.25), bends.stream().map(b -> Math.round(b * 1e6) / 1e6).toList());
        assertEquals(24.25, layout(d, "l-half").get("bend1"), EPS4);
    }

    @Test
    void bendDeduction_takenOffPerCornerBend_bendLineMovesByHalf() {
        // §0.3: a fixed amount per 90 degree bend (default 0); here 0.1 in: an L half has one bend, a wrap three
        Allowances a = new Allowances(TABLE.parseRectSeam("pittsburgh"), EndAllowance.NONE, EndAllowance.NONE, true);
        Development l = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48, RectConstruction.L_HALVES, a,
                0.1), CTX);
        assertEquals(37.25 - 0.1, piece(l, "l-half").bounds().width(), EPS4);
        assertEquals(0.25 + 24 - 0.05, layout(l, "l-half").get("bend1"), EPS4);
        Development w = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48, RectConstruction.WRAP, NET,
                0.1), CTX);
        assertEquals(72 - 0.3, piece(w, "wrap").bounds().width(), EPS4);
        assertEquals("bendDeduction", assertThrows(FittingException.class, () -> new RectDuctSpec("D", 1, 24, 12, 48,
                RectConstruction.WRAP, NET, -1)).field());
    }

    @Test
    void ductMakeUps_pieceCountsAndWidths() {
        // §13.2 (common practice): wrap 2(W + D), U = W + 2D and cap W, four sides; allowances none here
        Development wrap = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48, RectConstruction.WRAP, NET),
                CTX);
        assertEquals(72, piece(wrap, "wrap").bounds().width(), EPS4);
        Development u = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48, RectConstruction.U_AND_CAP,
                NET), CTX);
        assertEquals(48, piece(u, "u").bounds().width(), EPS4);
        assertEquals(24, piece(u, "cap").bounds().width(), EPS4);
        Development four = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48,
                RectConstruction.FOUR_SIDES, NET), CTX);
        assertEquals(2, piece(four, "width-side").count());
        assertEquals(2, piece(four, "depth-side").count());
        assertEquals(24, piece(four, "width-side").bounds().width(), EPS4);
        assertEquals(12, piece(four, "depth-side").bounds().width(), EPS4);
    }

    @Test
    void auto_takesFewestSeamsThatFitTheStock() {
        // a 48 x 120 sheet less 3/8 in margins: 119 1/4 along the table, 47 1/4 across
        Allowances a = new Allowances(TABLE.parseRectSeam("pittsburgh"), EndAllowance.NONE, EndAllowance.NONE, true);
        StockRoom sheet = new StockRoom(List.of(new StockRoom.Space("48x120", 119.25, 47.25)), true);
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0.0276, DimensionFace.INSIDE, TOL, sheet);
        // 12 x 12 x 40: a full wrap is 48 + 1 1/4 wide and fits
        Development small = RectDuctDeveloper.develop(new RectDuctSpec("A", 1, 12, 12, 40, RectConstruction.AUTO,
                a), ctx);
        assertEquals(List.of("wrap"), small.pieces().stream().map(p -> p.pattern().piece()).toList());
        // 20 x 20 x 60: the wrap (81 1/4 x 60) fits neither way; an L half (41 1/4 x 60) fits turned
        Development mid = RectDuctDeveloper.develop(new RectDuctSpec("B", 1, 20, 20, 60, RectConstruction.AUTO, a),
                ctx);
        assertEquals(List.of("l-half"), mid.pieces().stream().map(p -> p.pattern().piece()).toList());
        assertTrue(mid.warnings().isEmpty());
        // without quarter turns nothing 60 long fits across 47 1/4: four sides, with a warning (the nest then
        // lists them as not placed)
        StockRoom noTurn = new StockRoom(sheet.spaces(), false);
        Development none = RectDuctDeveloper.develop(new RectDuctSpec("B", 1, 20, 20, 60, RectConstruction.AUTO, a),
                new DevelopContext(LengthUnit.INCH, 0.0276, DimensionFace.INSIDE, TOL, noTurn));
        assertEquals(List.of("width-side", "depth-side"), none.pieces().stream().map(p -> p.pattern().piece())
                .toList());
        assertFalse(none.warnings().isEmpty());
    }

    @Test
    void r2_radiusElbow90_cheekArea_wrappers() {
        // trade-reference §13.3 check R2 (computed): 90 deg, W 24, D 12, Ri 6 (Ro 30), no legs: cheek (pi/4)(30^2 -
        // 6^2) = 678.5840 in2; throat wrapper 12 x 9.4248; heel wrapper 12 x 47.1239
        Development d = RectElbowDeveloper.develop(new RectElbowSpec("E", 1, 24, 12, 90, 6, 0, NET), CTX);
        assertEquals(678.5840, piece(d, "cheek").area(), EPS4);
        assertEquals(2, piece(d, "cheek").count());
        assertEquals(12, piece(d, "throat").bounds().width(), EPS4);
        assertEquals(9.4248, piece(d, "throat").bounds().height(), EPS4);
        assertEquals(47.1239, piece(d, "heel").bounds().height(), EPS4);
        assertEquals(30, layout(d, "cheek").get("heelRadius"), EPS4);
    }

    @Test
    void r2_radiusElbow_withLegs_and45() {
        // §13.3 check R2 (computed): with 2 in legs: cheek 774.5840, wrappers 13.4248 and 51.1239; 45 deg no legs:
        // cheek 339.2920, wrappers 4.7124 and 23.5619
        Development legs = RectElbowDeveloper.develop(new RectElbowSpec("E", 1, 24, 12, 90, 6, 2, NET), CTX);
        assertEquals(774.5840, piece(legs, "cheek").area(), EPS4);
        assertEquals(13.4248, piece(legs, "throat").bounds().height(), EPS4);
        assertEquals(51.1239, piece(legs, "heel").bounds().height(), EPS4);
        Development d45 = RectElbowDeveloper.develop(new RectElbowSpec("E", 1, 24, 12, 45, 6, 0, NET), CTX);
        assertEquals(339.2920, piece(d45, "cheek").area(), EPS4);
        assertEquals(4.7124, piece(d45, "throat").bounds().height(), EPS4);
        assertEquals(23.5619, piece(d45, "heel").bounds().height(), EPS4);
    }

    @Test
    void r3_squareThroat90_cheek192_heel28_throat4_vaneRail() {
        // trade-reference §13.4 check R3 (computed): 90 deg, W 12, legs 2: cheek 192 in2, heel wrapper 28, throat
        // wrapper 4, vane rail 16.9706
        Development d = RectElbowDeveloper.develop(new RectElbowSpec("Q", 1, 12, 10, 90, 0, 2, NET), CTX);
        assertEquals(192, piece(d, "cheek").area(), EPS4);
        assertEquals(28, piece(d, "heel").bounds().height(), EPS4);
        assertEquals(4, piece(d, "throat").bounds().height(), EPS4);
        assertEquals(16.9706, layout(d, "cheek").get("mitre"), EPS4);
        // the wrappers are bent on the mitre: a bend line across each at half its length
        assertTrue(piece(d, "heel").marks().stream().anyMatch(m -> m.kind() == MarkKind.BEND
                && Math.abs(m.edge().start().y() - 14) < EPS4 && Math.abs(m.edge().end().y() - 14) < EPS4));
    }

    @Test
    void r4_offset_radius_angle_wrappers_cheek() {
        // trade-reference §13.5 check R4 (computed): W 12, O 6, L 24: R 25.5, alpha 28.0725 deg, each wrapper
        // 24.9878, cheek area 299.8539 in2; arc radii 19.5 and 31.5
        Development d = RectOffsetDeveloper.develop(new RectOffsetSpec("O", 1, 12, 10, 6, 24, NET), CTX);
        Layout c = layout(d, "cheek");
        assertEquals(25.5, c.get("radius"), EPS4);
        assertEquals(28.0725, c.get("arcAngle"), EPS4);
        assertEquals(19.5, c.get("innerRadius"), EPS4);
        assertEquals(31.5, c.get("outerRadius"), EPS4);
        assertEquals(299.8539, piece(d, "cheek").area(), EPS4);
        assertEquals(24.9878, piece(d, "wrapper").bounds().height(), EPS4);
        assertEquals(2, piece(d, "wrapper").count());
        // the cheek ends are square to the run and the second end is offset 6 and advanced 24 (§13.5)
        assertEquals(12 + 6, piece(d, "cheek").bounds().width(), EPS4);
        assertEquals(24, piece(d, "cheek").bounds().height(), EPS4);
    }

    @Test
    void r5_transitionCentredAndFlatOnOneSide() {
        // trade-reference §13.6 check R5 (computed): 24 x 12 -> 12 x 12, L 12, centred: width faces trapezoids
        // 24/12, height 12, area 216 each; depth faces 12 x 13.4164
        Development d = RectTransitionDeveloper.develop(new RectTransitionSpec("T", 1, 24, 12, 12, 12, 12, 0, 0,
                RectConstruction.FACES, NET), CTX);
        assertEquals(216, piece(d, "top").area(), EPS4);
        assertEquals(216, piece(d, "bottom").area(), EPS4);
        assertEquals(12, layout(d, "top").get("trueHeight"), EPS4);
        assertEquals(13.4164, layout(d, "left").get("trueHeight"), EPS4);
        assertEquals(12 * 13.4164, piece(d, "right").area(), 12 * EPS4);
        // flat on one side (offset x = -6): flat face 12 x 12, the opposite face 12 x 16.9706
        Development f = RectTransitionDeveloper.develop(new RectTransitionSpec("T", 1, 24, 12, 12, 12, 12, -6, 0,
                RectConstruction.FACES, NET), CTX);
        assertEquals(12, layout(f, "left").get("trueHeight"), EPS4);
        assertEquals(16.9706, layout(f, "right").get("trueHeight"), EPS4);
    }

    @Test
    void r6_transitionWithOffset_heightsAreasSlants() {
        // trade-reference §13.6 check R6 (computed): 20 x 10 -> 12 x 8, L 15, offset (3, 1): heights top 15.0000,
        // bottom 15.1327, left 16.5529, right 15.0333; areas 240.0000, 242.1239, 148.9765, 135.2997, total
        // 766.4001; slanted edges of the top face 16.5529 and 15.0333, of the bottom face 16.6733 and 15.1658
        Development d = RectTransitionDeveloper.develop(new RectTransitionSpec("T", 1, 20, 10, 12, 8, 15, 3, 1,
                RectConstruction.FACES, NET), CTX);
        assertEquals(15.0000, layout(d, "top").get("trueHeight"), EPS4);
        assertEquals(15.1327, layout(d, "bottom").get("trueHeight"), EPS4);
        assertEquals(16.5529, layout(d, "left").get("trueHeight"), EPS4);
        assertEquals(15.0333, layout(d, "right").get("trueHeight"), EPS4);
        assertEquals(240.0000, piece(d, "top").area(), EPS4);
        assertEquals(242.1239, piece(d, "bottom").area(), EPS4);
        assertEquals(148.9765, piece(d, "left").area(), EPS4);
        assertEquals(135.2997, piece(d, "right").area(), EPS4);
        double total = d.pieces().stream().mapToDouble(p -> p.pattern().area()).sum();
        assertEquals(766.4001, total, 2 * EPS4);
        List<Double> top = List.of(layout(d, "top").get("slantA"), layout(d, "top").get("slantB"));
        assertEquals(16.5529, top.stream().mapToDouble(Double::doubleValue).max().orElseThrow(), EPS4);
        assertEquals(15.0333, top.stream().mapToDouble(Double::doubleValue).min().orElseThrow(), EPS4);
        List<Double> bottom = List.of(layout(d, "bottom").get("slantA"), layout(d, "bottom").get("slantB"));
        assertEquals(16.6733, bottom.stream().mapToDouble(Double::doubleValue).max().orElseThrow(), EPS4);
        assertEquals(15.1658, bottom.stream().mapToDouble(Double::doubleValue).min().orElseThrow(), EPS4);
        // the same fitting in L halves: the same metal, in two pieces each bent on its corner line
        Development halves = RectTransitionDeveloper.develop(new RectTransitionSpec("T", 1, 20, 10, 12, 8, 15, 3, 1,
                RectConstruction.L_HALVES, NET), CTX);
        assertEquals(2, halves.pieces().size());
        assertEquals(766.4001, halves.pieces().stream().mapToDouble(p -> p.pattern().area()).sum(), 2 * EPS4);
    }

    @Test
    void r7_shoeTap_cheekArea_frontWrapper_opening() {
        // trade-reference §13.7 check R7 (computed): W 10, D 8, H 6, E 2.5: cheek 63.125 in2, front wrapper
        // 8 x 7.0355, opening 12.5 x 8
        Development d = ShoeTapDeveloper.develop(new ShoeTapSpec("S", 1, 10, 8, 6, 2.5, NET), CTX);
        assertEquals(63.125, piece(d, "cheek").area(), EPS4);
        assertEquals(8, piece(d, "front").bounds().width(), EPS4);
        assertEquals(7.0355, piece(d, "front").bounds().height(), EPS4);
        assertEquals(6, piece(d, "back").bounds().height(), EPS4);
        assertEquals(12.5, layout(d, "cheek").get("openingLength"), EPS4);
        assertEquals(8, layout(d, "cheek").get("openingWidth"), EPS4);
    }

    @Test
    void shoeTap_tabsOnTheMainEdge() {
        // §13.7: tabs of about 1 in (common practice) on the main edge; 1 in long, ends 1/2 in from the corners,
        // at most 6 in apart (common practice): 3 tabs on the cheek's 12 1/2 in main edge, 2 on the 8 in wrappers
        Allowances a = new Allowances(SeamAllowance.NONE, TABLE.parseRectEnd("tabs"), EndAllowance.NONE, false);
        Development d = ShoeTapDeveloper.develop(new ShoeTapSpec("S", 1, 10, 8, 6, 2.5, a), CTX);
        assertEquals(63.125 + 3 * 1 * 1, piece(d, "cheek").area(), EPS4);
        assertEquals(8 * 6 + 2 * 1 * 1, piece(d, "back").area(), EPS4);
        assertEquals(6 + 1, piece(d, "back").bounds().height(), EPS4);
        FittingException e = assertThrows(FittingException.class, () -> new RectDuctSpec("D", 1, 24, 12, 48,
                RectConstruction.WRAP, new Allowances(SeamAllowance.NONE, TABLE.parseRectEnd("tabs"),
                        EndAllowance.NONE, false)));
        assertEquals("allowances.ends", e.field());
    }

    @Test
    void pittsburghDefaults_fromTheTable() {
        // §13.1 (common practice): pocket 1 in, flange 1/4 in on a straight edge, 3/16 in on a curved edge
        SeamAllowance p = TABLE.defaultRectSeam();
        assertEquals(1.0, p.right(), 0);
        assertEquals(0.25, p.left(), 0);
        assertEquals(0.1875, TABLE.curvedEdgeFlange(p), 0);
        // a radius elbow's cheek carries the curved-edge flange: blank = Ro + 3/16 - (Ri - 3/16) across
        Allowances a = new Allowances(p, EndAllowance.NONE, EndAllowance.NONE, true);
        Development d = RectElbowDeveloper.develop(new RectElbowSpec("E", 1, 24, 12, 90, 6, 0, a), CTX);
        assertEquals(30 + 0.1875, piece(d, "cheek").bounds().width(), EPS4);
        assertEquals(12 + 2, piece(d, "heel").bounds().width(), EPS4);
    }

    @Test
    void endConnectors_andNotches_onADuctEnd() {
        // drive hem from 1/2 in of metal, S-slip edge 1/2 in (§7.3, common practice); flange W as given
        Allowances a = new Allowances(TABLE.parseRectSeam("pittsburgh"), TABLE.parseRectEnd("drive"),
                TABLE.parseRectEnd("flange 1 1/2"), true);
        Development d = RectDuctDeveloper.develop(new RectDuctSpec("D", 1, 24, 12, 48, RectConstruction.L_HALVES, a),
                CTX);
        Pattern p = piece(d, "l-half");
        assertEquals(48 + 0.5 + 1.5, p.bounds().height(), EPS4);
        // square notches at the four corners (pocket 1 x 1/2, flange 1/4 x 1/2, pocket 1 x 1 1/2, flange 1/4 x
        // 1 1/2) and a V at the bend in each end allowance (1/2 x 1/2 x 1/2 and 1 1/2 ...) come off the full blank
        double full = 37.25 * 50;
        double squares = 1 * 0.5 + 0.25 * 0.5 + 1 * 1.5 + 0.25 * 1.5;
        double vees = 0.5 * 0.5 + 1.5 * 1.5;
        assertEquals(full - squares - vees, p.area(), EPS4);
        assertThrows(IllegalArgumentException.class, () -> TABLE.parseRectEnd("flange"));
        assertThrows(IllegalArgumentException.class, () -> TABLE.parseEnd("drive"));
        assertThrows(IllegalArgumentException.class, () -> TABLE.parseRectSeam("groove 1/4"));
    }

    @Test
    void endCap_panelWithNotchedFlanges() {
        // §13.7: W x D plus flanges; square notches where two flanges meet (§7.5)
        Development d = EndCapDeveloper.develop(new EndCapSpec("K", 1, 24, 12, 1, true), CTX);
        assertEquals(26 * 14 - 4, piece(d, "cap").area(), EPS4);
    }

    @Test
    void badInput_namesTheField() {
        assertEquals("width", assertThrows(FittingException.class,
                () -> new RectDuctSpec("X", 1, 0, 12, 48, RectConstruction.WRAP, NET)).field());
        assertEquals("depth", assertThrows(FittingException.class,
                () -> new RectElbowSpec("X", 1, 12, -1, 90, 6, 0, NET)).field());
        assertEquals("throatRadius", assertThrows(FittingException.class,
                () -> new RectElbowSpec("X", 1, 12, 10, 90, -1, 0, NET)).field());
        assertEquals("offset", assertThrows(FittingException.class,
                () -> new RectOffsetSpec("X", 1, 12, 10, 24, 24, NET)).field());
        assertEquals("entry", assertThrows(FittingException.class,
                () -> new ShoeTapSpec("X", 1, 10, 8, 20, 11, NET)).field());
        // an offset whose throat radius (R - W/2) vanishes: 40 wide, offset 10 over 20 (R 12.5)
        assertEquals("offset", assertThrows(FittingException.class,
                () -> RectOffsetDeveloper.develop(new RectOffsetSpec("X", 1, 40, 10, 10, 20, NET), CTX)).field());
    }

    @Test
    void twistedFace_isRefused_namingTheFaceAndItsEdgePair() {
        // with parallel end planes and square ends every face is flat; a face whose end edges are not parallel
        // is refused (checked on corners set up here)
        var a1 = new RectTransitionDeveloper.Corner(0, 0, 0);
        var b1 = new RectTransitionDeveloper.Corner(10, 0, 0);
        var b2 = new RectTransitionDeveloper.Corner(10, 1, 12);
        var a2 = new RectTransitionDeveloper.Corner(0, -1, 12);
        FittingException e = assertThrows(FittingException.class, () -> RectTransitionDeveloper.requireFlat("T",
                new RectTransitionDeveloper.Face("left", a1, b1, b2, a2, false), TOL));
        assertEquals("to", e.field());
        assertTrue(e.getMessage().contains("left face") && e.getMessage().contains("edge on end 1")
                && e.getMessage().contains("edge on end 2"), e.getMessage());
    }

    @Test
    void marks_bendLinesWhereFacesMeet_onLHalfTransition() {
        Development d = RectTransitionDeveloper.develop(new RectTransitionSpec("T", 1, 20, 10, 12, 8, 15, 3, 1,
                RectConstruction.L_HALVES, NET), CTX);
        for (DevelopedPiece p : d.pieces()) {
            List<Mark> bends = p.pattern().marks().stream().filter(m -> m.kind() == MarkKind.BEND).toList();
            assertEquals(1, bends.size(), p.pattern().piece());
            assertEquals(p.layout().get("bend"), bends.get(0).edge().length(), EPS4);
        }
    }
}
