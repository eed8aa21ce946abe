package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndCapSpec;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.RectConstruction;
import dev.sheetwright.core.fitting.RectDuctSpec;
import dev.sheetwright.core.fitting.RectElbowSpec;
import dev.sheetwright.core.fitting.RectOffsetSpec;
import dev.sheetwright.core.fitting.RectTransitionSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.ShoeTapSpec;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Properties of rectangular fittings over realistic sizes (inches), trade-reference §13.8: wrapper = cheek edge,
 * cheek area = W x centre-line length, face edges = 3-D edges (corners set up here from the fitting's description,
 * §13.6), allowances never cut into the net pattern.
 */
class RectProperties {

    private static final double EPS = 1e-6;
    private static final Tolerance TOL = Tolerance.INCH;
    private static final DevelopContext CTX = new DevelopContext(LengthUnit.INCH, 0.0276, DimensionFace.INSIDE, TOL);
    private static final AllowanceTable TABLE = AllowanceTable.in(LengthUnit.INCH);
    private static final Allowances NET = new Allowances(SeamAllowance.NONE, EndAllowance.NONE, EndAllowance.NONE,
            false);

    // ---- generators ----

    @Provide
    Arbitrary<RectElbowSpec> radiusElbows() {
        Arbitrary<Double> w = Arbitraries.doubles().between(4, 48);
        Arbitrary<Double> d = Arbitraries.doubles().between(4, 36);
        Arbitrary<Double> a = Arbitraries.doubles().between(10, 170);
        Arbitrary<Double> ri = Arbitraries.doubles().between(1, 36);
        Arbitrary<Double> legs = Arbitraries.of(0.0, 1.0, 2.0, 4.5);
        return Combinators.combine(w, d, a, ri, legs).as((ww, dd, aa, rr, ll) -> new RectElbowSpec("E", 1, ww, dd,
                aa, rr, ll, NET));
    }

    @Provide
    Arbitrary<RectElbowSpec> squareElbows() {
        Arbitrary<Double> w = Arbitraries.doubles().between(4, 48);
        Arbitrary<Double> a = Arbitraries.doubles().between(15, 120);
        Arbitrary<Double> legs = Arbitraries.of(0.0, 1.0, 2.0, 6.0);
        return Combinators.combine(w, a, legs).as((ww, aa, ll) -> new RectElbowSpec("Q", 1, ww, 10, aa, 0, ll, NET));
    }

    @Provide
    Arbitrary<RectOffsetSpec> offsets() {
        Arbitrary<Double> w = Arbitraries.doubles().between(4, 24);
        Arbitrary<Double> o = Arbitraries.doubles().between(1, 24);
        Arbitrary<Double> k = Arbitraries.doubles().between(1.5, 6);
        return Combinators.combine(w, o, k).as((ww, oo, kk) -> {
            // length at least the offset times k and long enough that the throat arc R - W/2 stays above 1 in
            double l = oo * kk;
            while ((l * l + oo * oo) / (4 * oo) - ww / 2 < 1) {
                l *= 1.5;
            }
            return new RectOffsetSpec("O", 1, ww, 8, oo, l, NET);
        });
    }

    @Provide
    Arbitrary<RectTransitionSpec> transitions() {
        Arbitrary<Double> w1 = Arbitraries.doubles().between(6, 48);
        Arbitrary<Double> d1 = Arbitraries.doubles().between(4, 30);
        Arbitrary<Double> k = Arbitraries.doubles().between(0.3, 1.2);
        Arbitrary<Double> l = Arbitraries.doubles().between(6, 36);
        Arbitrary<Double> x = Arbitraries.doubles().between(-10, 10);
        Arbitrary<Double> y = Arbitraries.doubles().between(-6, 6);
        Arbitrary<RectConstruction> c = Arbitraries.of(RectConstruction.FACES, RectConstruction.L_HALVES);
        return Combinators.combine(w1, d1, k, l, x, y, c).as((ww, dd, kk, ll, xx, yy, cc) ->
                new RectTransitionSpec("T", 1, ww, dd, ww * kk, dd * (1.5 - kk / 2), ll, xx, yy, cc, NET));
    }

    @Provide
    Arbitrary<Allowances> rectAllowances() {
        Arbitrary<SeamAllowance> seam = Arbitraries.of("pittsburgh", "snap-lock", "none").map(TABLE::parseRectSeam);
        Arbitrary<EndAllowance> end = Arbitraries.of("none", "slip", "drive", "drive 3/4", "flange 1 1/2",
                "flange 3/8").map(TABLE::parseRectEnd);
        Arbitrary<Boolean> notch = Arbitraries.of(true, false);
        return Combinators.combine(seam, end, end, notch).as(Allowances::new);
    }

    // ---- wrapper = cheek edge ----

    @Property(tries = 150)
    void radiusElbow_wrapperEqualsTheCheekEdgeItWraps(@ForAll("radiusElbows") RectElbowSpec s) {
        Development d = RectElbowDeveloper.develop(s, CTX);
        double ri = s.throatRadius();
        double ro = ri + s.width();
        double throat = 0;
        double heel = 0;
        int ends = 0;
        for (Edge e : piece(d, "cheek").outer().edges()) {
            double r = radial(e, s);
            if (Math.abs(r - ri) < EPS) {
                throat += e.length();
            } else if (Math.abs(r - ro) < EPS) {
                heel += e.length();
            } else {
                ends++;
            }
        }
        assertEquals(2, ends, "two end edges");
        assertEquals(throat, piece(d, "throat").bounds().height(), 1e-9);
        assertEquals(heel, piece(d, "heel").bounds().height(), 1e-9);
    }

    /**
     * Distance of an edge's middle from the turn's axis, measured as the elbow runs (§13.3 set-up): on the first
     * leg's side of the bisector, across the first leg below the start line (y < 0), else from the centre; on the
     * second leg's side, across the second leg beyond the end line, else from the centre.
     */
    private static double radial(Edge e, RectElbowSpec s) {
        double a = Math.toRadians(s.angle());
        Point2 m = e instanceof Arc arc ? arc.pointAt(arc.startAngle() + arc.sweep() / 2)
                : e.start().plus(e.end()).times(0.5);
        boolean firstSide = m.dot(Point2.polar(1, a / 2 + Math.PI / 2)) < 0;
        if (firstSide) {
            return m.y() < -EPS ? m.x() : m.length();
        }
        Point2 endTangent = new Point2(-Math.sin(a), Math.cos(a));
        return m.dot(endTangent) > EPS ? m.dot(Point2.polar(1, a)) : m.length();
    }

    @Property(tries = 150)
    void squareThroatElbow_wrappersEqualTheCheekLinesTheyWrap(@ForAll("squareElbows") RectElbowSpec s) {
        Development d = RectElbowDeveloper.develop(s, CTX);
        double a = Math.toRadians(s.angle());
        double e = s.legs();
        double w = s.width();
        // the heel lines x = W (first leg) and p . u(A) = W (second leg) meet on the mitre (§13.4 set-up)
        Point2 u = Point2.polar(1, a);
        Point2 t = new Point2(-Math.sin(a), Math.cos(a));
        double hy = (w - w * u.x()) / u.y();
        Point2 h = new Point2(w, hy);
        double heel = new Point2(w, -e).distance(h) + h.distance(u.times(w).plus(t.times(e)));
        assertEquals(heel, piece(d, "heel").bounds().height(), 1e-9);
        double perimeter = piece(d, "cheek").outer().perimeter();
        double throat = e == 0 ? 0 : piece(d, "throat").bounds().height();
        assertEquals(2 * e, throat, 1e-9);
        assertEquals(perimeter, heel + throat + 2 * w, 1e-9);
        assertEquals(w * hy + 2 * e * w, piece(d, "cheek").area(), 1e-6);
    }

    @Property(tries = 150)
    void offset_wrappersEqualEachCheekEdge_cheekAreaIsWidthTimesCentreLine(@ForAll("offsets") RectOffsetSpec s) {
        Development d = RectOffsetDeveloper.develop(s, CTX);
        Layout c = layout(d, "cheek");
        double r = c.get("radius");
        double alpha = Math.toRadians(c.get("arcAngle"));
        // the two reverse arcs must reach the offset over the length: O = 2R(1 - cos a), L = 2R sin a (§13.5)
        assertEquals(s.offset(), 2 * r * (1 - Math.cos(alpha)), 1e-9);
        assertEquals(s.length(), 2 * r * Math.sin(alpha), 1e-9);
        List<Edge> edges = piece(d, "cheek").outer().edges();
        List<Double> sides = new ArrayList<>();
        double run = 0;
        int lines = 0;
        int first = -1;
        for (int i = 0; i < edges.size(); i++) {
            if (edges.get(i) instanceof Line) {
                first = i;
                break;
            }
        }
        for (int k = 1; k <= edges.size(); k++) {
            Edge e = edges.get((first + k) % edges.size());
            if (e instanceof Line) {
                lines++;
                sides.add(run);
                run = 0;
            } else {
                run += e.length();
            }
        }
        assertEquals(2, lines);
        double wrapper = piece(d, "wrapper").bounds().height();
        assertEquals(wrapper, sides.get(0), 1e-9);
        assertEquals(wrapper, sides.get(1), 1e-9);
        assertEquals(s.width() * 2 * r * alpha, piece(d, "cheek").area(), 1e-6);
    }

    @Property(tries = 150)
    void radiusElbow_cheekAreaIsWidthTimesCentreLine(@ForAll("radiusElbows") RectElbowSpec s) {
        Development d = RectElbowDeveloper.develop(s, CTX);
        double centreLine = (s.throatRadius() + s.width() / 2) * Math.toRadians(s.angle()) + 2 * s.legs();
        assertEquals(s.width() * centreLine, piece(d, "cheek").area(), 1e-6 * Math.max(1, s.width() * centreLine));
    }

    // ---- face edges = 3-D edges ----

    private record C3(double x, double y, double z) {
        double to(C3 o) {
            return Math.sqrt((x - o.x) * (x - o.x) + (y - o.y) * (y - o.y) + (z - o.z) * (z - o.z));
        }
    }

    @Property(tries = 150)
    void transition_everyFaceEdgeIsItsTrueLength(@ForAll("transitions") RectTransitionSpec s) {
        // the fitting's eight corners (§13.6): end 1 centred at z = 0, end 2 at z = L moved by (x, y)
        double w1 = s.width() / 2;
        double d1 = s.depth() / 2;
        double w2 = s.toWidth() / 2;
        double d2 = s.toDepth() / 2;
        C3 p1 = new C3(-w1, -d1, 0);
        C3 q1 = new C3(w1, -d1, 0);
        C3 r1 = new C3(w1, d1, 0);
        C3 s1 = new C3(-w1, d1, 0);
        C3 p2 = new C3(s.offsetX() - w2, s.offsetY() - d2, s.length());
        C3 q2 = new C3(s.offsetX() + w2, s.offsetY() - d2, s.length());
        C3 r2 = new C3(s.offsetX() + w2, s.offsetY() + d2, s.length());
        C3 s2 = new C3(s.offsetX() - w2, s.offsetY() + d2, s.length());
        Development d = RectTransitionDeveloper.develop(s, CTX);
        if (s.construction() == RectConstruction.FACES) {
            assertEdges(piece(d, "bottom"), p1.to(q1), q1.to(q2), q2.to(p2), p2.to(p1));
            assertEdges(piece(d, "right"), q1.to(r1), r1.to(r2), r2.to(q2), q2.to(q1));
            assertEdges(piece(d, "top"), r1.to(s1), s1.to(s2), s2.to(r2), r2.to(r1));
            assertEdges(piece(d, "left"), s1.to(p1), p1.to(p2), p2.to(s2), s2.to(s1));
        } else {
            // each half's outline: two end-1 edges, the far corner line, two end-2 edges, the near corner line
            assertEdges(piece(d, "l-half-1"), p1.to(q1), q1.to(r1), r1.to(r2), r2.to(q2), q2.to(p2), p2.to(p1));
            assertEdges(piece(d, "l-half-2"), r1.to(s1), s1.to(p1), p1.to(p2), p2.to(s2), s2.to(r2), r2.to(r1));
            assertEquals(q1.to(q2), layout(d, "l-half-1").get("bend"), 1e-9);
            assertEquals(s1.to(s2), layout(d, "l-half-2").get("bend"), 1e-9);
        }
        // and the faces' areas add up to the surface: each face a trapezoid of its parallel sides and true height
        double surface = trapezoid(p1, q1, q2, p2) + trapezoid(q1, r1, r2, q2) + trapezoid(r1, s1, s2, r2)
                + trapezoid(s1, p1, p2, s2);
        assertEquals(surface, d.pieces().stream().mapToDouble(p -> p.pattern().area()).sum(), 1e-6 * surface);
    }

    /** Area of the flat face a1 b1 b2 a2 whose edges a1-b1 and a2-b2 are parallel: (a + b) / 2 x height. */
    private static double trapezoid(C3 a1, C3 b1, C3 b2, C3 a2) {
        double a = a1.to(b1);
        double b = a2.to(b2);
        // height: distance from a2 to the line a1-b1, by Heron on the triangle a1 b1 a2
        double c = a1.to(a2);
        double e = b1.to(a2);
        double sp = (a + c + e) / 2;
        double tri = Math.sqrt(Math.max(sp * (sp - a) * (sp - c) * (sp - e), 0));
        return (a + b) / 2 * (2 * tri / a);
    }

    @Property(tries = 100)
    void shoeTap_faceEdgesAreTheirTrueLengths(@ForAll("widths") double w, @ForAll("widths") double h,
            @ForAll("fractions") double k) {
        double e = Math.min(w, h * 0.9) * k;
        Development d = ShoeTapDeveloper.develop(new ShoeTapSpec("S", 1, w, 8, h, e, NET), CTX);
        // main edge W + E, back H, top W, front straight H - E and the 45 degree run E sqrt 2 (§13.7)
        if (e > 0) {
            assertEdges(piece(d, "cheek"), w + e, h, w, h - e, e * Math.sqrt(2));
        } else {
            assertEdges(piece(d, "cheek"), w, h, w, h);
        }
        assertEquals(h - e + e * Math.sqrt(2), piece(d, "front").bounds().height(), 1e-9);
    }

    @Provide
    Arbitrary<Double> widths() {
        return Arbitraries.doubles().between(3, 40);
    }

    @Provide
    Arbitrary<Double> fractions() {
        return Arbitraries.doubles().between(0, 1);
    }

    private static void assertEdges(Pattern p, double... expected) {
        List<Double> got = p.outer().edges().stream().map(Edge::length).sorted().toList();
        List<Double> want = java.util.Arrays.stream(expected).sorted().boxed().toList();
        assertEquals(want.size(), got.size(), p.piece() + " edges " + got);
        for (int i = 0; i < want.size(); i++) {
            assertEquals(want.get(i), got.get(i), 1e-9, p.piece() + " edges " + got + " want " + want);
        }
    }

    // ---- allowances never cut into the net pattern ----

    @Property(tries = 200)
    void allowancesNeverCutIntoTheNetPattern(@ForAll("anyRect") FittingSpec netSpec,
            @ForAll("rectAllowances") Allowances a) {
        FittingSpec withAllowances = withAllowances(netSpec, a);
        Development net = Developers.develop(netSpec, CTX);
        Development cut = Developers.develop(withAllowances, CTX);
        assertEquals(net.pieces().size(), cut.pieces().size());
        for (int i = 0; i < net.pieces().size(); i++) {
            Pattern n = net.pieces().get(i).pattern();
            Pattern c = cut.pieces().get(i).pattern();
            assertEquals(n.piece(), c.piece());
            List<Point2> ring = c.outer().flatten(1e-5);
            assertTrue(SimplePolygons.isSimple(ring), c.piece() + " cut outline crosses itself");
            for (Point2 p : n.outer().flatten(1e-3)) {
                assertTrue(insideOrOn(p, ring, 2e-5), c.piece() + ": net point " + p + " outside the cut");
            }
            assertTrue(c.area() >= n.area() - 1e-9, c.piece());
        }
    }

    @Provide
    Arbitrary<FittingSpec> anyRect() {
        Arbitrary<FittingSpec> ducts = Combinators.combine(Arbitraries.doubles().between(6, 40),
                Arbitraries.doubles().between(6, 30), Arbitraries.doubles().between(12, 60),
                Arbitraries.of(RectConstruction.WRAP, RectConstruction.L_HALVES, RectConstruction.U_AND_CAP,
                        RectConstruction.FOUR_SIDES))
                .as((w, d, l, c) -> new RectDuctSpec("D", 1, w, d, l, c, NET));
        Arbitrary<FittingSpec> caps = Combinators.combine(Arbitraries.doubles().between(6, 40),
                Arbitraries.doubles().between(6, 30)).as((w, d) -> new EndCapSpec("K", 1, w, d, 0, false));
        Arbitrary<FittingSpec> taps = Combinators.combine(Arbitraries.doubles().between(6, 30),
                Arbitraries.doubles().between(6, 20), Arbitraries.doubles().between(0, 0.8))
                .as((w, h, k) -> new ShoeTapSpec("S", 1, w, 8, h, Math.min(w, h) * k, NET));
        Arbitrary<FittingSpec> elbows = radiusElbows().map(s -> new RectElbowSpec("E", 1, s.width(), s.depth(),
                s.angle(), Math.max(s.throatRadius(), 2), Math.max(s.legs(), 2), NET));
        Arbitrary<FittingSpec> square = squareElbows().map(s -> new RectElbowSpec("Q", 1, s.width(), 10, s.angle(),
                0, Math.max(s.legs(), 2), NET));
        Arbitrary<FittingSpec> offs = offsets().map(s -> s);
        Arbitrary<FittingSpec> trans = transitions().map(s -> s);
        return Arbitraries.oneOf(ducts, caps, taps, elbows, square, offs, trans);
    }

    /** The same fitting with the given allowances (a cap takes the end width as its flange). */
    private static FittingSpec withAllowances(FittingSpec s, Allowances a) {
        if (s instanceof RectDuctSpec d) {
            return new RectDuctSpec(d.id(), 1, d.width(), d.depth(), d.length(), d.construction(), a);
        }
        if (s instanceof RectElbowSpec e) {
            return new RectElbowSpec(e.id(), 1, e.width(), e.depth(), e.angle(), e.throatRadius(), e.legs(), a);
        }
        if (s instanceof RectOffsetSpec o) {
            return new RectOffsetSpec(o.id(), 1, o.width(), o.depth(), o.offset(), o.length(), a);
        }
        if (s instanceof RectTransitionSpec t) {
            return new RectTransitionSpec(t.id(), 1, t.width(), t.depth(), t.toWidth(), t.toDepth(), t.length(),
                    t.offsetX(), t.offsetY(), t.construction(), a);
        }
        if (s instanceof ShoeTapSpec t) {
            // the main edge takes a flange or tabs: a drive end here becomes tabs of the same width
            EndAllowance main = a.endA().kind() == EndKind.FLANGE ? a.endA()
                    : a.endA().kind() == EndKind.DRIVE ? new EndAllowance(EndKind.TABS, a.endA().width())
                    : TABLE.defaultRectTapFlange();
            return new ShoeTapSpec(t.id(), 1, t.width(), t.depth(), t.height(), t.entry(),
                    new Allowances(a.seam(), main, a.endB(), a.notch()));
        }
        EndCapSpec c = (EndCapSpec) s;
        return new EndCapSpec(c.id(), 1, c.width(), c.depth(), Math.max(a.endA().width(), 0.5), a.notch());
    }

    /** Point in (or within {@code slack} of) the polygon {@code ring}. */
    private static boolean insideOrOn(Point2 p, List<Point2> ring, double slack) {
        boolean in = false;
        int n = ring.size();
        for (int i = 0, j = n - 1; i < n; j = i++) {
            Point2 a = ring.get(i);
            Point2 b = ring.get(j);
            if (segmentDistance(p, a, b) <= slack) {
                return true;
            }
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }

    private static double segmentDistance(Point2 p, Point2 a, Point2 b) {
        Point2 ab = b.minus(a);
        double len2 = ab.dot(ab);
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.distance(a.plus(ab.times(t)));
    }

    private static Pattern piece(Development d, String name) {
        return d.pieces().stream().map(DevelopedPiece::pattern).filter(p -> p.piece().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no piece " + name));
    }

    private static Layout layout(Development d, String name) {
        return d.pieces().stream().filter(p -> p.pattern().piece().equals(name)).findFirst().orElseThrow().layout();
    }
}
