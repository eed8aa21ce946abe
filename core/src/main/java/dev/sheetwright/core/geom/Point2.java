package dev.sheetwright.core.geom;

/** A point (or a free vector) in the plane of a flat pattern. Immutable; {@code equals} is exact. */
public record Point2(double x, double y) {

    public static final Point2 ORIGIN = new Point2(0, 0);

    public Point2 {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("point coordinates must be finite, got (" + x + ", " + y + ")");
        }
    }

    public static Point2 of(double x, double y) {
        return new Point2(x, y);
    }

    /** The point at distance {@code r} from the origin in direction {@code angle} (radians, counter-clockwise from +x). */
    public static Point2 polar(double r, double angle) {
        return new Point2(r * Math.cos(angle), r * Math.sin(angle));
    }

    public Point2 plus(Point2 v) {
        return new Point2(x + v.x, y + v.y);
    }

    public Point2 minus(Point2 v) {
        return new Point2(x - v.x, y - v.y);
    }

    public Point2 times(double k) {
        return new Point2(x * k, y * k);
    }

    public double dot(Point2 v) {
        return x * v.x + y * v.y;
    }

    /** z component of the cross product: positive when {@code v} turns counter-clockwise from this. */
    public double cross(Point2 v) {
        return x * v.y - y * v.x;
    }

    public double length() {
        return Math.hypot(x, y);
    }

    public double distance(Point2 p) {
        return Math.hypot(x - p.x, y - p.y);
    }

    /** Angle of this vector in radians, in (-pi, pi]. */
    public double angle() {
        return Math.atan2(y, x);
    }

    /** This vector turned 90 degrees counter-clockwise. */
    public Point2 perpendicular() {
        return new Point2(-y, x);
    }

    public Point2 unit() {
        double len = length();
        if (len == 0) {
            throw new IllegalStateException("the zero vector has no direction");
        }
        return new Point2(x / len, y / len);
    }

    /** Approximate comparison within the linear tolerance. */
    public boolean eq(Point2 other, Tolerance tolerance) {
        return tolerance.same(this, other);
    }
}
