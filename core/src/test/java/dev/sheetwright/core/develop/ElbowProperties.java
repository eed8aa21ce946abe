package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.SeamPosition;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Properties of gored-elbow development over realistic round elbows (inches), checked against the 3-D miter
 * ellipse, element lengths from a plane-line intersection, and the cylinder surface worked out here.
 */
class ElbowProperties {

    /** Fine chord so polyline lengths can be compared with true curve lengths. */
    private static final Tolerance FINE = Tolerance.INCH.withChord(1e-5);

    @Provide
    Arbitrary<ElbowSpec> elbows() {
        // 4 to 36 in pipe, 10 to 90 deg, 2 to 7 pieces, centre-line radius 1 to 3 D, any seam position
        Arbitrary<Double> d = Arbitraries.doubles().between(4, 36);
        Arbitrary<Double> angle = Arbitraries.doubles().between(10, 90);
        Arbitrary<Integer> n = Arbitraries.integers().between(2, 7);
        Arbitrary<Double> rf = Arbitraries.doubles().between(1, 3);
        Arbitrary<SeamPosition> seam = Arbitraries.of(SeamPosition.class);
        return Combinators.combine(d, angle, n, rf, seam).as((dia, a, g, f, s) ->
                new ElbowSpec("EL", 1, dia, a, g, f * dia, s, Allowances.NET, SeamAllowance.NONE));
    }

    private static DevelopContext ctx(Tolerance t) {
        return new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, t);
    }

    /**
     * Element length of one half-gore at angle a from the heel, from 3-D: the pipe axis is z, the bend axis the
     * line x = -R, z = 0; the miter plane holds the bend axis and leans beta from the square cut z = 0. The element
     * through (r cos a, r sin a) meets it where n . (p - (-R, 0, 0)) = 0, n = (-sin beta, 0, cos beta).
     */
    private static double element(ElbowSpec e, double a) {
        double beta = Math.toRadians(e.miterAngle());
        double x = e.diameter() / 2 * Math.cos(a);
        return Math.sin(beta) * (x + e.radius()) / Math.cos(beta);
    }

    /** Length of the miter ellipse (semi-axes r and r / cos beta), by Simpson's rule on its own parametrisation. */
    private static double ellipse(ElbowSpec e) {
        double r = e.diameter() / 2;
        double big = r / Math.cos(Math.toRadians(e.miterAngle()));
        int n = 20000;
        double h = 2 * Math.PI / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double t = i * h;
            double w = (i == 0 || i == n) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += w * Math.hypot(big * Math.sin(t), r * Math.cos(t));
        }
        return sum * h / 3;
    }

    private static boolean isSeamEdge(Edge edge, double stretchOut) {
        return edge instanceof Line && Math.abs(edge.start().x() - edge.end().x()) < 1e-9
                && (Math.abs(edge.start().x()) < 1e-9 || Math.abs(edge.start().x() - stretchOut) < 1e-9);
    }

    @Property(tries = 60)
    void edges_haveTheirTrueLengths(@ForAll("elbows") ElbowSpec e) {
        // trade-reference §11: seam edges are the elements at the seam; miter curves are the 3-D miter ellipse
        double s = Math.PI * e.diameter();
        double seam = Math.toRadians(e.seamAt().degrees());
        double miter = ellipse(e);
        double curvature = e.diameter() / 2 / Math.tan(Math.toRadians(e.miterAngle()));
        for (DevelopedPiece piece : ElbowDeveloper.develop(e, ctx(FINE)).pieces()) {
            Pattern p = piece.pattern();
            boolean end = p.piece().startsWith("end");
            int halves = end ? 1 : 2;
            List<Edge> seams = p.outer().edges().stream().filter(x -> isSeamEdge(x, s)).toList();
            assertEquals(2, seams.size(), p.piece());
            for (Edge edge : seams) {
                // turned pieces have the seam half round: either element fits, both ends of the stretch-out agree
                double near = Math.min(Math.abs(edge.length() - halves * element(e, seam)),
                        Math.abs(edge.length() - halves * element(e, seam + Math.PI)));
                assertEquals(0, near, 1e-9 * e.radius());
                assertEquals(seams.get(0).length(), edge.length(), 1e-9 * e.radius());
            }
            double rest = p.outer().perimeter() - seams.get(0).length() - seams.get(1).length() - (end ? s : 0);
            // a polyline within sagitta c of a curve of bend radius >= rho falls short by under c L / rho
            double shortfall = FINE.chord() * halves * miter / curvature;
            assertEquals(halves * miter, rest, shortfall + 1e-9 * miter, p.piece());
        }
    }

    @Property(tries = 60)
    void area_equalsTheCylinderSurfaceOfEachPiece(@ForAll("elbows") ElbowSpec e) {
        // trade-reference §11: pattern area = 3-D area; a half-gore's surface is the integral of y(a) r da
        double r = e.diameter() / 2;
        int n = 2000;
        double h = 2 * Math.PI / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double w = (i == 0 || i == n) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += w * element(e, i * h) * r;
        }
        double halfGore = sum * h / 3;
        double loss = 2.0 / 3 * Tolerance.INCH.chord() * 2 * ellipse(e);
        double total = 0;
        for (DevelopedPiece piece : ElbowDeveloper.develop(e, ctx(Tolerance.INCH)).pieces()) {
            Pattern p = piece.pattern();
            int halves = p.piece().startsWith("end") ? 1 : 2;
            assertEquals(halves * halfGore, p.area(), loss + 1e-9 * halfGore, p.piece());
            total += p.area() * p.count();
        }
        assertEquals(e.halfGores() * halfGore, total, e.gores() * loss + 1e-9 * halfGore);
    }

    @Property(tries = 25)
    void strip_piecesTileTheStripWithoutOverlapOrGap(@ForAll("elbows") ElbowSpec e) {
        // trade-reference §3.4: all pieces cut from one strip, width = stretch-out, height = k R tan beta
        Tolerance tol = Tolerance.INCH;
        List<Pattern> strip = ElbowDeveloper.strip(e, ctx(tol));
        double width = Math.PI * e.diameter();
        double height = e.halfGores() * e.radius() * Math.tan(Math.toRadians(e.miterAngle()));
        double area = strip.stream().mapToDouble(Pattern::area).sum();
        assertEquals(width * height, area, e.gores() * 2 * tol.chord() * width);
        List<List<Point2>> rings = strip.stream().map(p -> p.outer().flatten(tol.chord())).toList();
        for (Pattern p : strip) {
            assertTrue(p.bounds().minX() >= -1e-9 && p.bounds().maxX() <= width + 1e-9);
            assertTrue(p.bounds().minY() >= -1e-9 && p.bounds().maxY() <= height + 1e-9);
        }
        // every sample point of the strip lies in exactly one piece, unless it is within two chords of an edge
        int nx = 41;
        int ny = 41;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                Point2 q = new Point2(width * (i + 0.5) / nx, height * (j + 0.5) / ny);
                int inside = 0;
                double nearest = Double.MAX_VALUE;
                for (List<Point2> ring : rings) {
                    if (contains(ring, q)) {
                        inside++;
                    }
                    for (int k = 0; k < ring.size(); k++) {
                        nearest = Math.min(nearest,
                                CurveSampler.distanceToSegment(q, ring.get(k), ring.get((k + 1) % ring.size())));
                    }
                }
                assertTrue(inside == 1 || nearest < 2 * tol.chord(), "point " + q + " is in " + inside + " pieces");
            }
        }
    }

    private static boolean contains(List<Point2> ring, Point2 p) {
        boolean in = false;
        int n = ring.size();
        for (int i = 0, j = n - 1; i < n; j = i++) {
            Point2 a = ring.get(i);
            Point2 b = ring.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }
}
