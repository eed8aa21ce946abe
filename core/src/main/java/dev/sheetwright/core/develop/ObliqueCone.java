package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Point2;

/**
 * An oblique (scalene) cone frustum with parallel circular ends, and its exact radial development
 * (trade-reference §2.1, §2.2).
 *
 * <p>Large end: centre (0, 0, 0), radius R1. Small end: centre (ex, ey, H), radius R2 (0 for a whole cone).
 * Apex A = C1 + (C2 - C1) R1 / (R1 - R2). The angle round the large end, {@code s}, is measured from the
 * shortest generator (the one in the plan direction of the apex), so the longest generator is at s = +-pi,
 * where the seam goes. The pattern has the apex at the origin and the shortest generator along +y; a large-end
 * point develops to {@code L(s) (sin phi(s), cos phi(s))} with {@code d phi / d s = |(B - A) x B'| / |B - A|^2}
 * integrated numerically; the small end is the same curve scaled by R2 / R1.
 */
public final class ObliqueCone {

    /** Spans of the precomputed table of phi; each is integrated adaptively to {@link #EPS}. */
    private static final int SPANS = 256;
    /** Absolute integration error per evaluation, radians (1e-10 relative of any duct pattern angle or better). */
    private static final double EPS = 1e-13;

    private final double r1;
    private final double r2;
    private final double ax;
    private final double ay;
    private final double az;
    private final double shortAngle;
    private final double[] cumulative = new double[SPANS + 1];

    private ObliqueCone(double r1, double r2, double ex, double ey, double height) {
        if (!(r1 > 0) || !(r2 >= 0) || !(r2 < r1) || !(height > 0)) {
            throw new IllegalArgumentException("oblique cone needs R1 > R2 >= 0 and H > 0, got R1 " + r1 + ", R2 "
                    + r2 + ", H " + height);
        }
        this.r1 = r1;
        this.r2 = r2;
        double k = r1 / (r1 - r2);
        this.ax = ex * k;
        this.ay = ey * k;
        this.az = height * k;
        this.shortAngle = Math.hypot(ax, ay) == 0 ? 0 : Math.atan2(ay, ax);
        double h = 2 * Math.PI / SPANS;
        for (int i = 0; i < SPANS; i++) {
            double s = -Math.PI + i * h;
            cumulative[i + 1] = cumulative[i] + CurveSampler.integrate(this::rate, s, s + h, EPS);
        }
    }

    /**
     * @param r1 large-end mean radius
     * @param r2 small-end mean radius, 0 for a cone to its apex
     * @param ex plan offset of the small-end centre, x
     * @param ey plan offset of the small-end centre, y
     * @param height distance between the end planes
     */
    public static ObliqueCone of(double r1, double r2, double ex, double ey, double height) {
        return new ObliqueCone(r1, r2, ex, ey, height);
    }

    /** Apex height above the large end: H R1 / (R1 - R2). */
    public double apexHeight() {
        return az;
    }

    /** Plan distance of the apex from the large-end centre. */
    public double apexOffset() {
        return Math.hypot(ax, ay);
    }

    /** R2 / R1: the small end is the large end scaled about the apex by this. */
    public double ratio() {
        return r2 / r1;
    }

    /** Plan angle (radians, from +x) of the shortest generator; the seam is opposite it. */
    public double shortSideAngle() {
        return shortAngle;
    }

    /** Large-end point at angle {@code s} from the short side (3-D, large end in z = 0). */
    private double[] rim(double s) {
        double a = shortAngle + s;
        return new double[] {r1 * Math.cos(a), r1 * Math.sin(a)};
    }

    /** True length from the apex to the large end at {@code s}: L(s) = |B - A|. */
    public double generator(double s) {
        double[] b = rim(s);
        return Math.sqrt(sq(b[0] - ax) + sq(b[1] - ay) + sq(az));
    }

    /** True length of the element (the part of the generator between the two ends): L (1 - R2/R1). */
    public double element(double s) {
        return generator(s) * (1 - ratio());
    }

    /** d phi / d s = |(B - A) x B'| / |B - A|^2 (trade-reference §2.2). */
    double rate(double s) {
        double a = shortAngle + s;
        double dx = r1 * Math.cos(a) - ax;
        double dy = r1 * Math.sin(a) - ay;
        double dz = -az;
        double tx = -r1 * Math.sin(a);
        double ty = r1 * Math.cos(a);
        // (dx, dy, dz) x (tx, ty, 0)
        double cx = -dz * ty;
        double cy = dz * tx;
        double cz = dx * ty - dy * tx;
        return Math.sqrt(cx * cx + cy * cy + cz * cz) / (dx * dx + dy * dy + dz * dz);
    }

    /** Developed polar angle of the generator at {@code s} (-pi..pi), radians from the short side. */
    public double phi(double s) {
        if (s < -Math.PI || s > Math.PI) {
            throw new IllegalArgumentException("s must be within -pi..pi, got " + s);
        }
        double h = 2 * Math.PI / SPANS;
        int i = Math.min(SPANS - 1, (int) Math.floor((s + Math.PI) / h));
        double base = -Math.PI + i * h;
        return cumulative[i] + CurveSampler.integrate(this::rate, base, s, EPS) - cumulative[SPANS / 2];
    }

    /** The developed angle swept going from the short side through {@code a} (0..2 pi) in the positive sense. */
    public double phiForward(double a) {
        if (a <= Math.PI) {
            return phi(a);
        }
        return phi(Math.PI) + phi(a - 2 * Math.PI) - phi(-Math.PI);
    }

    /** Whole pattern angle, radians. */
    public double totalAngle() {
        return cumulative[SPANS];
    }

    /**
     * The pattern angle a layout mechanic gets by triangulating with {@code n} chords round the large end (each
     * triangle apex - B_i - B_i+1 from its three true lengths, trade-reference §2.3, §5.4); shorter than
     * {@link #totalAngle()} by about (pi/n)^2/6.
     */
    public double triangulatedAngle(int n) {
        double c = 2 * r1 * Math.sin(Math.PI / n);
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double l0 = generator(-Math.PI + 2 * Math.PI * i / n);
            double l1 = generator(-Math.PI + 2 * Math.PI * (i + 1) / n);
            sum += Math.acos(Math.max(-1, Math.min(1, (l0 * l0 + l1 * l1 - c * c) / (2 * l0 * l1))));
        }
        return sum;
    }

    /** Steepest side of the frustum from the vertical, degrees. */
    public double steepestSlopeDeg() {
        return Math.toDegrees(Math.atan2(apexOffset() + r1, az));
    }

    /** The developed large-end curve, parameter s in -pi..pi, running left to right. */
    PlaneCurve largeEnd() {
        return scaled(1);
    }

    /** The developed small-end curve (R2/R1 times the large one). */
    PlaneCurve smallEnd() {
        return scaled(ratio());
    }

    private PlaneCurve scaled(double f) {
        return new PlaneCurve() {
            @Override
            public Point2 at(double s) {
                double p = phi(s);
                return new Point2(Math.sin(p), Math.cos(p)).times(f * generator(s));
            }

            @Override
            public Point2 tangent(double s) {
                double a = shortAngle + s;
                double l = generator(s);
                double dl = ((r1 * Math.cos(a) - ax) * -r1 * Math.sin(a) + (r1 * Math.sin(a) - ay) * r1 * Math.cos(a)) / l;
                double p = phi(s);
                Point2 radial = new Point2(Math.sin(p), Math.cos(p));
                Point2 across = new Point2(Math.cos(p), -Math.sin(p));
                return radial.times(f * dl).plus(across.times(f * l * rate(s)));
            }
        };
    }

    private static double sq(double v) {
        return v * v;
    }
}
