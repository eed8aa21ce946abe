package dev.sheetwright.dxf;

/**
 * The circular arc that a bulge stands for, between two distinct points.
 *
 * <p>With chord length {@code c} and bulge {@code b = tan(sweep / 4)}: sweep {@code = 4 atan b} (signed, positive
 * counter-clockwise), radius {@code = c (1 + b²) / (4 |b|)}, and the centre lies {@code (1 - b²) / (4 b)} chord
 * lengths to the left of the chord's midpoint. Arcs with tiny bulges have huge radii; the centre is then far away
 * and the extreme points lose absolute precision in proportion to the radius (about 1e-16 of it).
 */
public final class BulgeArc {

    private static final double TWO_PI = 2 * Math.PI;

    final double centreX;
    final double centreY;
    final double radius;
    /** Angle of the start point seen from the centre, radians. */
    final double startAngle;
    /** Signed sweep, radians, in (-2π, 2π); positive = counter-clockwise. */
    final double sweep;

    private BulgeArc(double centreX, double centreY, double radius, double startAngle, double sweep) {
        this.centreX = centreX;
        this.centreY = centreY;
        this.radius = radius;
        this.startAngle = startAngle;
        this.sweep = sweep;
    }

    /** The arc from (x1, y1) to (x2, y2) with the given non-zero bulge; the points must differ. */
    public static BulgeArc of(double x1, double y1, double x2, double y2, double bulge) {
        if (bulge == 0) {
            throw new IllegalArgumentException("bulge must not be 0 for an arc, got 0");
        }
        double dx = x2 - x1;
        double dy = y2 - y1;
        double chord = Math.hypot(dx, dy);
        if (chord == 0) {
            throw new IllegalArgumentException("arc end points must differ, got (" + x1 + ", " + y1 + ") twice");
        }
        double offset = (1 - bulge * bulge) / (4 * bulge); // centre offset along the left normal, in chords
        double cx = (x1 + x2) / 2 - dy * offset;
        double cy = (y1 + y2) / 2 + dx * offset;
        double radius = chord * (1 + bulge * bulge) / (4 * Math.abs(bulge));
        return new BulgeArc(cx, cy, radius, Math.atan2(y1 - cy, x1 - cx), 4 * Math.atan(bulge));
    }

    /**
     * The points strictly between the arc's ends where chords no further than {@code chordTolerance} from the arc
     * meet it: the sagitta of a chord of angle a is r (1 - cos(a / 2)), so steps of 2 acos(1 - tol / r) keep it
     * within the tolerance (common practice); none for an arc flatter than the tolerance.
     */
    public java.util.List<double[]> innerPoints(double chordTolerance) {
        if (!(chordTolerance > 0) || !Double.isFinite(chordTolerance)) {
            throw new IllegalArgumentException("chordTolerance must be finite and > 0, got " + chordTolerance);
        }
        double step = chordTolerance >= radius ? Math.PI : 2.0 * Math.acos(1.0 - chordTolerance / radius);
        int segments = Math.max(1, (int) Math.ceil(Math.abs(sweep) / step));
        java.util.List<double[]> out = new java.util.ArrayList<>(segments);
        for (int k = 1; k < segments; k++) {
            double t = startAngle + sweep * k / segments;
            out.add(new double[] {centreX + radius * Math.cos(t), centreY + radius * Math.sin(t)});
        }
        return out;
    }

    double length() {
        return radius * Math.abs(sweep);
    }

    /**
     * Adds to {@code box} the points where the arc crosses the horizontal or vertical line through its centre
     * (its extreme points besides the end points, which the caller includes) and returns the result.
     */
    Bounds includeAxisCrossings(Bounds box) {
        double from = sweep > 0 ? startAngle : startAngle + sweep; // the same arc, counter-clockwise
        double span = Math.abs(sweep);
        Bounds out = box;
        for (int quarter = 0; quarter < 4; quarter++) {
            double t = ((quarter * Math.PI / 2 - from) % TWO_PI + TWO_PI) % TWO_PI;
            if (t <= span) {
                out = switch (quarter) {
                    case 0 -> out.include(centreX + radius, centreY);
                    case 1 -> out.include(centreX, centreY + radius);
                    case 2 -> out.include(centreX - radius, centreY);
                    default -> out.include(centreX, centreY - radius);
                };
            }
        }
        return out;
    }

    /**
     * This arc as cubic Béziers of at most a quarter turn each, for vector output that has no arcs (PDF): each piece
     * of sweep D has control arms 4/3 tan(D/4) r along the tangents (the usual circle approximation; error about
     * 2.7e-4 r per quarter turn). Each element is {c1x, c1y, c2x, c2y, x, y}; the first piece starts at the arc's
     * start point.
     */
    public java.util.List<double[]> cubicBeziers() {
        int n = (int) Math.ceil(Math.abs(sweep) / (Math.PI / 2));
        double step = sweep / n;
        double k = 4.0 / 3 * Math.tan(step / 4) * radius;
        java.util.List<double[]> out = new java.util.ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double a0 = startAngle + i * step;
            double a1 = a0 + step;
            double p0x = centreX + radius * Math.cos(a0);
            double p0y = centreY + radius * Math.sin(a0);
            double p3x = centreX + radius * Math.cos(a1);
            double p3y = centreY + radius * Math.sin(a1);
            out.add(new double[] {p0x - k * Math.sin(a0), p0y + k * Math.cos(a0),
                p3x + k * Math.sin(a1), p3y - k * Math.cos(a1), p3x, p3y});
        }
        return out;
    }
}
