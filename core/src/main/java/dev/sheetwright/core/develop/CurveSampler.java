package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Numerical helpers for curves that have no closed form: chord polylines whose point count follows from the
 * sagitta, and adaptive Simpson integration.
 */
final class CurveSampler {

    /** Even start so a curve symmetric about its middle cannot hide its bulges from the first test. */
    private static final int FIRST_SPANS = 8;
    /** Deepest halving of one span (2^-30 of it): far below any shop tolerance. */
    private static final int MAX_DEPTH = 30;

    private CurveSampler() {
    }

    /**
     * Parameters from {@code t0} to {@code t1} (both included) such that every chord between consecutive points
     * stays within {@code chord} of the curve: a span is halved until the curve's quarter, half and three-quarter
     * points all lie within {@code chord} of its chord.
     */
    static List<Double> parameters(PlaneCurve curve, double t0, double t1, double chord) {
        List<Double> out = new ArrayList<>();
        out.add(t0);
        for (int i = 0; i < FIRST_SPANS; i++) {
            double a = t0 + (t1 - t0) * i / FIRST_SPANS;
            double b = i == FIRST_SPANS - 1 ? t1 : t0 + (t1 - t0) * (i + 1) / FIRST_SPANS;
            split(curve, a, b, curve.at(a), curve.at(b), chord, 0, out);
        }
        return out;
    }

    /** The points of {@link #parameters}. */
    static List<Point2> points(PlaneCurve curve, double t0, double t1, double chord) {
        List<Point2> pts = new ArrayList<>();
        for (double t : parameters(curve, t0, t1, chord)) {
            pts.add(curve.at(t));
        }
        return pts;
    }

    private static void split(PlaneCurve curve, double a, double b, Point2 pa, Point2 pb, double chord, int depth,
            List<Double> out) {
        double worst = 0;
        for (double f : new double[] {0.25, 0.5, 0.75}) {
            worst = Math.max(worst, distanceToSegment(curve.at(a + (b - a) * f), pa, pb));
        }
        if (worst <= chord || depth >= MAX_DEPTH) {
            out.add(b);
            return;
        }
        double m = (a + b) / 2;
        Point2 pm = curve.at(m);
        split(curve, a, m, pa, pm, chord, depth + 1, out);
        split(curve, m, b, pm, pb, chord, depth + 1, out);
    }

    static double distanceToSegment(Point2 p, Point2 a, Point2 b) {
        Point2 ab = b.minus(a);
        double len2 = ab.dot(ab);
        if (len2 == 0) {
            return p.distance(a);
        }
        double u = Math.max(0, Math.min(1, p.minus(a).dot(ab) / len2));
        return p.distance(a.plus(ab.times(u)));
    }

    /** Integral of {@code f} from {@code a} to {@code b} by adaptive Simpson's rule to absolute error {@code eps}. */
    static double integrate(DoubleUnaryOperator f, double a, double b, double eps) {
        if (a == b) {
            return 0;
        }
        double fa = f.applyAsDouble(a);
        double fb = f.applyAsDouble(b);
        double m = (a + b) / 2;
        double fm = f.applyAsDouble(m);
        double whole = (b - a) / 6 * (fa + 4 * fm + fb);
        return simpson(f, a, b, fa, fm, fb, whole, eps, 0);
    }

    private static double simpson(DoubleUnaryOperator f, double a, double b, double fa, double fm, double fb,
            double whole, double eps, int depth) {
        double m = (a + b) / 2;
        double lm = (a + m) / 2;
        double rm = (m + b) / 2;
        double flm = f.applyAsDouble(lm);
        double frm = f.applyAsDouble(rm);
        double left = (m - a) / 6 * (fa + 4 * flm + fm);
        double right = (b - m) / 6 * (fm + 4 * frm + fb);
        double diff = left + right - whole;
        if (depth >= 40 || Math.abs(diff) <= 15 * eps) {
            return left + right + diff / 15;
        }
        return simpson(f, a, m, fa, flm, fm, left, eps / 2, depth + 1)
                + simpson(f, m, b, fm, frm, fb, right, eps / 2, depth + 1);
    }
}
