package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.TeeSpec;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Properties of tee, lateral and tap development over realistic sizes (inches). The 3-D side is worked out here
 * from the two cylinders alone (a root search along each branch element), not from the developer's formula.
 */
class TeeProperties {

    private static final Tolerance TOL = Tolerance.INCH;
    private static final DevelopContext CTX = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, TOL);
    private static final int SAMPLES = 4000;

    record Size(double main, double branch, double angle, double offset, double end, double mainLength) {

        double bigR() {
            return main / 2;
        }

        double r() {
            return branch / 2;
        }

        double alpha() {
            return Math.toRadians(angle);
        }

        TeeSpec spec(Allowances a) {
            return new TeeSpec("TP", 1, main, branch, angle, offset, end, mainLength, true, a, Allowances.NET);
        }
    }

    @Provide
    Arbitrary<Size> sizes() {
        // main 6 to 36 in; branch 3 in up to the main; 30 to 90 deg; offset anywhere the branch stays on the main
        Arbitrary<Double> main = Arbitraries.doubles().between(6, 36);
        Arbitrary<Double> ratio = Arbitraries.doubles().between(0, 1.0);
        Arbitrary<Double> angle = Arbitraries.doubles().between(30, 90);
        Arbitrary<Double> offsetFraction = Arbitraries.doubles().between(-1, 1);
        Arbitrary<Double> clear = Arbitraries.doubles().between(1, 12);
        return Combinators.combine(main, ratio, angle, offsetFraction, clear).as((d, k, a, f, c) -> {
            double bigR = d / 2;
            double r = 1.5 + k * (bigR - 1.5);
            double alpha = Math.toRadians(a);
            double reach = (r * Math.cos(alpha) + bigR) / Math.sin(alpha); // farthest the joint can be
            double end = reach + c;
            return new Size(d, 2 * r, a, f * (bigR - r), end, 2 * (r + reach) + 4);
        });
    }

    /** 3-D point of branch element theta at distance lambda along the branch axis from its foot (0, e, 0). */
    private static double[] element(Size s, double theta, double lambda) {
        double a = s.alpha();
        return new double[] {
            lambda * Math.cos(a) + s.r() * Math.cos(theta) * Math.sin(a),
            s.offset() + s.r() * Math.sin(theta),
            lambda * Math.sin(a) - s.r() * Math.cos(theta) * Math.cos(a)};
    }

    /** Where element theta, followed down from the branch end, first meets the main: by bisection. */
    private static double meetsMain(Size s, double theta) {
        double lo = s.r() * Math.cos(theta) * Math.cos(s.alpha()) / Math.sin(s.alpha()); // height 0: inside
        double hi = s.end(); // the branch end: outside the main
        for (int i = 0; i < 200 && hi - lo > 1e-13; i++) {
            double mid = (lo + hi) / 2;
            double[] p = element(s, theta, mid);
            if (p[1] * p[1] + p[2] * p[2] > s.bigR() * s.bigR()) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return (lo + hi) / 2;
    }

    private static double distance(double[] p, double[] q) {
        return Math.sqrt((p[0] - q[0]) * (p[0] - q[0]) + (p[1] - q[1]) * (p[1] - q[1]) + (p[2] - q[2]) * (p[2] - q[2]));
    }

    /** Length of the 3-D intersection curve, sampled densely. */
    private static double intersectionLength(Size s) {
        double len = 0;
        double[] prev = element(s, 0, meetsMain(s, 0));
        for (int i = 1; i <= SAMPLES; i++) {
            double th = 2 * Math.PI * i / SAMPLES;
            double[] q = element(s, th, meetsMain(s, th));
            len += distance(prev, q);
            prev = q;
        }
        return len;
    }

    @Property(tries = 200)
    void everyElement_equalsIts3dLength(@ForAll("sizes") Size s) {
        Pattern p = TeeDeveloper.develop(s.spec(Allowances.NET), CTX).pieces().get(0).pattern();
        int checked = 0;
        for (Point2 v : p.outer().flatten(1)) {
            if (v.y() > TOL.linear()) { // a point of the joint curve: x = r theta, y = element length
                double theta = v.x() / s.r();
                double lambda = meetsMain(s, theta);
                double true3d = distance(element(s, theta, s.end()), element(s, theta, lambda));
                // within the linear tolerance: theta read back from x is rounded, and where an element grazes
                // the side of the main the length changes like the square root of theta
                assertEquals(true3d, v.y(), TOL.linear(), "element at theta " + theta);
                checked++;
            }
        }
        assertTrue(checked >= 13); // at least the 12 layout divisions and the closing element
    }

    @Property(tries = 50)
    void jointOnBranch_and_holeInMain_bothMeasureThe3dIntersection(@ForAll("sizes") Size s) {
        Development d = TeeDeveloper.develop(s.spec(Allowances.NET), CTX);
        Pattern branch = d.pieces().get(0).pattern();
        Pattern main = d.pieces().get(1).pattern();
        double stretch = 2 * Math.PI * s.r();
        double seamElement = distance(element(s, 0, s.end()), element(s, 0, meetsMain(s, 0)));
        double joint = branch.outer().perimeter() - stretch - 2 * seamElement;
        double hole = main.holes().get(0).perimeter();
        double curve = intersectionLength(s);
        // chords inscribed within the chord tolerance fall short of the curve by a small fraction
        assertEquals(curve, joint, 1e-3 * curve);
        assertEquals(curve, hole, 1e-3 * curve);
        assertEquals(joint, hole, 1e-3 * curve);
    }

    @Property(tries = 50)
    void branchArea_equals3dBranchSurface(@ForAll("sizes") Size s) {
        Pattern branch = TeeDeveloper.develop(s.spec(Allowances.NET), CTX).pieces().get(0).pattern();
        // surface between the end plane and the joint: integral of r x element length d theta (Simpson)
        int m = SAMPLES;
        double h = 2 * Math.PI / m;
        double sum = 0;
        for (int i = 0; i <= m; i++) {
            double th = i * h;
            double len = s.end() - meetsMain(s, th);
            sum += (i == 0 || i == m ? 1 : i % 2 == 1 ? 4 : 2) * s.r() * len;
        }
        double area = sum * h / 3;
        double jointLength = intersectionLength(s);
        // the chords cut off at most (2/3) sagitta x length of the curve
        assertEquals(area, branch.area(), TOL.chord() * jointLength);
    }

    @Property(tries = 200)
    void outlines_closedAndSimple_withAllowances(@ForAll("sizes") Size s, @ForAll boolean notch) {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.parseSeam("groove 1/4"), t.parseEnd("crimp"), t.parseEnd("lap 3/8"), notch);
        Development d = TeeDeveloper.develop(s.spec(a), CTX);
        for (DevelopedPiece piece : d.pieces()) {
            Pattern p = piece.pattern();
            assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)), p.piece());
            for (var hole : p.holes()) {
                assertTrue(SimplePolygons.isSimple(hole.flatten(0.01)));
                assertTrue(p.bounds().minX() < hole.bounds().minX() && hole.bounds().maxX() < p.bounds().maxX());
                assertTrue(p.bounds().minY() < hole.bounds().minY() && hole.bounds().maxY() < p.bounds().maxY());
            }
        }
    }
}
