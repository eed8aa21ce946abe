package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.develop.TransitionDeveloper.Strip;
import dev.sheetwright.core.develop.TransitionDeveloper.Triangle;
import dev.sheetwright.core.develop.TransitionDeveloper.Vertex;
import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.TransitionSpec;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Properties of rectangle-to-round triangulation over realistic sizes (inches). The 3-D points are set up here
 * from the fitting's description (trade-reference §5.1), independently of the developer.
 */
class TransitionProperties {

    private static final Tolerance TOL = Tolerance.INCH;
    private static final DevelopContext CTX = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, TOL);

    @Provide
    Arbitrary<TransitionSpec> specs() {
        // rectangle sides 6 to 48 in, round from 4 in (30 % of the shorter side if more) up to the shorter side,
        // 4 to 36 in high, the round
        // offset anywhere it stays over the rectangle, 1, 2 or 4 pieces
        Arbitrary<Double> w = Arbitraries.doubles().between(6, 48);
        Arbitrary<Double> l = Arbitraries.doubles().between(6, 48);
        Arbitrary<Double> k = Arbitraries.doubles().between(0.3, 1.0);
        Arbitrary<Double> h = Arbitraries.doubles().between(4, 36);
        Arbitrary<Double> fx = Arbitraries.doubles().between(-1, 1);
        Arbitrary<Double> fy = Arbitraries.doubles().between(-1, 1);
        Arbitrary<Integer> pieces = Arbitraries.of(1, 2, 4);
        return Combinators.combine(w, l, k, h, fx, fy, pieces).as((width, depth, ratio, height, ox, oy, n) -> {
            double least = Math.max(4, 0.3 * Math.min(width, depth));
            double d = least + (ratio - 0.3) / 0.7 * (Math.min(width, depth) - least);
            return new TransitionSpec("TR", 1, width, depth, d, height, ox * (width - d) / 2, oy * (depth - d) / 2,
                    n, Allowances.NET);
        });
    }

    /** 3-D position of a developed point (§5.1): rectangle in z = 0 centred on the origin, round at height H. */
    private static double[] solid(TransitionSpec s, Vertex v, int n) {
        double w = s.width() / 2;
        double l = s.depth() / 2;
        int i = Math.floorMod(v.index(), 4);
        return switch (v.kind()) {
            case CORNER -> new double[][] {{w, -l, 0}, {w, l, 0}, {-w, l, 0}, {-w, -l, 0}}[i];
            case SIDE_MIDDLE -> new double[][] {{0, -l, 0}, {w, 0, 0}, {0, l, 0}, {-w, 0, 0}}[i];
            case CIRCLE -> {
                double phi = 2 * Math.PI * v.index() / n - Math.PI / 2;
                yield new double[] {s.offsetX() + s.diameter() / 2 * Math.cos(phi),
                    s.offsetY() + s.diameter() / 2 * Math.sin(phi), s.height()};
            }
        };
    }

    private static double distance(double[] p, double[] q) {
        return Math.sqrt((p[0] - q[0]) * (p[0] - q[0]) + (p[1] - q[1]) * (p[1] - q[1]) + (p[2] - q[2]) * (p[2] - q[2]));
    }

    private static double area3d(double[] a, double[] b, double[] c) {
        double[] u = {b[0] - a[0], b[1] - a[1], b[2] - a[2]};
        double[] v = {c[0] - a[0], c[1] - a[1], c[2] - a[2]};
        double x = u[1] * v[2] - u[2] * v[1];
        double y = u[2] * v[0] - u[0] * v[2];
        double z = u[0] * v[1] - u[1] * v[0];
        return Math.sqrt(x * x + y * y + z * z) / 2;
    }

    @Property(tries = 300)
    void everyDevelopedEdge_equalsIts3dLength(@ForAll("specs") TransitionSpec s) {
        int n = TransitionDeveloper.divisionsFor(s.diameter() / 2, TOL.chord());
        for (Strip st : TransitionDeveloper.triangulate(s, CTX, n)) {
            for (Triangle t : st.triangles()) {
                Vertex[] v = {st.vertices().get(t.a()), st.vertices().get(t.b()), st.vertices().get(t.c())};
                for (int i = 0; i < 3; i++) {
                    Vertex p = v[i];
                    Vertex q = v[(i + 1) % 3];
                    double flat = p.flat().distance(q.flat());
                    assertEquals(distance(solid(s, p, n), solid(s, q, n)), flat, 1e-9 * (s.width() + s.height()),
                            p + " to " + q);
                }
            }
        }
    }

    @Property(tries = 300)
    void netArea_equalsSumOf3dTriangles(@ForAll("specs") TransitionSpec s) {
        Development d;
        try {
            d = TransitionDeveloper.develop(s, CTX);
        } catch (FittingException e) {
            assertEquals("pieces", e.field()); // only a one-piece pattern that laps over itself is refused
            Assume.that(false);
            return;
        }
        int n = (int) d.pieces().get(0).layout().get("divisions");
        double flat = 0;
        for (DevelopedPiece p : d.pieces()) {
            flat += p.pattern().count() * p.pattern().area();
        }
        // the surface as §5.1 builds it: a fan of N/4 triangles at each corner and one flat triangle per side
        double[][] c = new double[4][];
        for (int i = 0; i < 4; i++) {
            c[i] = solid(s, new Vertex(TransitionDeveloper.Kind.CORNER, i, Point2.ORIGIN), n);
        }
        double surface = 0;
        for (int i = 0; i < 4; i++) {
            for (int k = i * n / 4; k < (i + 1) * n / 4; k++) {
                surface += area3d(c[i], circle(s, k, n), circle(s, k + 1, n));
            }
            surface += area3d(c[(i + 3) % 4], c[i], circle(s, i * n / 4, n));
        }
        assertEquals(surface, flat, 1e-9 * surface);
    }

    private static double[] circle(TransitionSpec s, int k, int n) {
        return solid(s, new Vertex(TransitionDeveloper.Kind.CIRCLE, k, Point2.ORIGIN), n);
    }

    @Property(tries = 300)
    void onePiece_closes_seamLinesAgree(@ForAll("specs") TransitionSpec s) {
        TransitionSpec one = new TransitionSpec(s.id(), 1, s.width(), s.depth(), s.diameter(), s.height(),
                s.offsetX(), s.offsetY(), 1, Allowances.NET);
        Strip st = TransitionDeveloper.triangulate(one, CTX, 16).get(0);
        Point2 s0 = st.vertices().get(st.base().get(0)).flat();
        Point2 p0 = st.vertices().get(st.top().get(0)).flat();
        Point2 s1 = st.vertices().get(st.base().get(st.base().size() - 1)).flat();
        Point2 p1 = st.vertices().get(st.top().get(st.top().size() - 1)).flat();
        // §11: a closed fitting's pattern closes: the last seam line has the length of the first
        assertEquals(s0.distance(p0), s1.distance(p1), 1e-9 * s.height());
        // the base edges add up to the rectangle's perimeter (lines along the base are true in plan, §5.1)
        double base = 0;
        for (int i = 0; i + 1 < st.base().size(); i++) {
            base += st.vertices().get(st.base().get(i)).flat().distance(st.vertices().get(st.base().get(i + 1)).flat());
        }
        assertEquals(2 * (s.width() + s.depth()), base, 1e-9 * base);
    }

    @Property(tries = 200)
    void outlines_closedAndSimple_withAllowances(@ForAll("specs") TransitionSpec s, @ForAll boolean notch) {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("lap 1/2"), t.parseEnd("crimp"), notch);
        TransitionSpec withAllowances = new TransitionSpec(s.id(), 1, s.width(), s.depth(), s.diameter(),
                s.height(), s.offsetX(), s.offsetY(), s.pieces(), a);
        Development d;
        try {
            d = TransitionDeveloper.develop(withAllowances, CTX);
        } catch (FittingException e) {
            // a refusal is allowed (the pattern or its allowance strips would lap over), a bad outline is not
            assertTrue(e.field().equals("pieces") || e.field().equals("allowances"), e.getMessage());
            Assume.that(false);
            return;
        }
        for (DevelopedPiece piece : d.pieces()) {
            Pattern p = piece.pattern();
            assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)), p.piece());
            assertTrue(p.outer().isCounterClockwise());
        }
    }
}
