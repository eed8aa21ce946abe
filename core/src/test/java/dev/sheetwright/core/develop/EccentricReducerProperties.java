package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EccentricReducerSpec;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Pattern;
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
 * Properties of the oblique-cone development over realistic eccentric reducers and hoods (inches), checked
 * against 3-D geometry worked out here: true lengths from 3-D points, and the lateral area as a surface integral.
 */
class EccentricReducerProperties {

    record Shape(double large, double small, double height, double offsetX, double offsetY, int pieces) {
    }

    @Provide
    Arbitrary<Shape> shapes() {
        // large end 6 to 48 in, small end 0 (a hood) to 90 % of it, 4 to 48 in tall, the small-end centre anywhere
        // up to 1.2 x (R1 - R2) from the axis, 1 to 3 pieces
        Arbitrary<Double> large = Arbitraries.doubles().between(6, 48);
        Arbitrary<Double> ratio = Arbitraries.oneOf(Arbitraries.just(0.0), Arbitraries.doubles().between(0.2, 0.9));
        Arbitrary<Double> height = Arbitraries.doubles().between(4, 48);
        Arbitrary<Double> reach = Arbitraries.doubles().between(0, 1.2);
        Arbitrary<Double> direction = Arbitraries.doubles().between(0, 360).map(Math::toRadians);
        Arbitrary<Integer> pieces = Arbitraries.integers().between(1, 3);
        return Combinators.combine(large, ratio, height, reach, direction, pieces).as((d, q, h, e, dir, k) -> {
            double small = d * q;
            double off = e * (d - small) / 2;
            return new Shape(d, small, h, off * Math.cos(dir), off * Math.sin(dir), k);
        });
    }

    private static Development develop(Shape s) {
        return EccentricReducerDeveloper.develop(new EccentricReducerSpec("E", 1, s.large(), s.small(), s.height(),
                s.offsetX(), s.offsetY(), false, s.pieces(), Allowances.NET),
                new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH));
    }

    /** 3-D apex: C1 + (C2 - C1) R1 / (R1 - R2), with C1 at the origin. */
    private static double[] apex(Shape s) {
        double k = s.large() / (s.large() - s.small());
        return new double[] {s.offsetX() * k, s.offsetY() * k, s.height() * k};
    }

    private static double[] rim(Shape s, double a) {
        return new double[] {s.large() / 2 * Math.cos(a), s.large() / 2 * Math.sin(a), 0};
    }

    private static double dist(double[] p, double[] q) {
        return Math.sqrt((p[0] - q[0]) * (p[0] - q[0]) + (p[1] - q[1]) * (p[1] - q[1]) + (p[2] - q[2]) * (p[2] - q[2]));
    }

    @Property(tries = 200)
    void seamAndSplitEdges_haveTheTrueLengthsOfTheirGenerators(@ForAll("shapes") Shape s) {
        // trade-reference §11: every pattern edge length equals the corresponding 3-D length
        List<DevelopedPiece> pieces = develop(s).pieces();
        double[] apex = apex(s);
        double rho = s.small() / s.large();
        // the seam is on the longest generator: opposite the apex in plan
        double seam = Math.atan2(-apex[1], -apex[0]);
        for (int i = 0; i < s.pieces(); i++) {
            List<Double> expectedElements = new ArrayList<>();
            List<Double> expectedGenerators = new ArrayList<>();
            for (int j : new int[] {i, i + 1}) {
                double[] b = rim(s, seam + 2 * Math.PI * j / s.pieces());
                double gen = dist(b, apex);
                expectedGenerators.add(gen);
                expectedElements.add(gen * (1 - rho)); // from B to A + (B - A) rho
            }
            Pattern p = pieces.get(Math.min(i, pieces.size() - 1)).pattern(); // concentric: one pattern, count k
            List<Edge> radial = p.outer().edges().stream().filter(EccentricReducerDeveloperTest::isRadial).toList();
            assertEquals(2, radial.size(), "piece " + i);
            List<Double> lengths = radial.stream().map(Edge::length).sorted().toList();
            List<Double> far = radial.stream().map(e -> Math.max(e.start().length(), e.end().length())).sorted()
                    .toList();
            expectedElements.sort(null);
            expectedGenerators.sort(null);
            for (int j = 0; j < 2; j++) {
                assertEquals(expectedElements.get(j), lengths.get(j), 1e-9 * s.large());
                assertEquals(expectedGenerators.get(j), far.get(j), 1e-9 * s.large());
            }
        }
    }

    @Property(tries = 200)
    void patternArea_equalsTheLateralSurfaceOfTheObliqueCone(@ForAll("shapes") Shape s) {
        // trade-reference §11: pattern area = 3-D surface area. Surface X(a, u) = A + (B(a) - A) u, u in rho..1:
        // dArea = u |B'(a) x (B(a) - A)| da du, so area = (1 - rho^2)/2 * integral of |B' x (B - A)| da (Simpson here)
        double[] apex = apex(s);
        double rho = s.small() / s.large();
        double r1 = s.large() / 2;
        int n = 4000;
        double h = 2 * Math.PI / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double a = i * h;
            double[] b = rim(s, a);
            double[] d = {b[0] - apex[0], b[1] - apex[1], b[2] - apex[2]};
            double[] t = {-r1 * Math.sin(a), r1 * Math.cos(a), 0};
            double cx = t[1] * d[2] - t[2] * d[1];
            double cy = t[2] * d[0] - t[0] * d[2];
            double cz = t[0] * d[1] - t[1] * d[0];
            double w = (i == 0 || i == n) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += w * Math.sqrt(cx * cx + cy * cy + cz * cz);
        }
        double lateral = (1 - rho * rho) / 2 * sum * h / 3;
        double area = develop(s).pieces().stream().mapToDouble(p -> p.pattern().area() * p.pattern().count()).sum();
        // chord polygons lose at most 2/3 x sagitta x curve length along each end curve
        double chordLoss = 2.0 / 3 * Tolerance.INCH.chord() * Math.PI * (s.large() + s.small());
        assertEquals(lateral, area, chordLoss + 1e-9 * lateral);
    }
}
