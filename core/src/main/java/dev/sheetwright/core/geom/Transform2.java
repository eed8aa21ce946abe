package dev.sheetwright.core.geom;

/**
 * A rigid motion of the plane, optionally with a mirror image: {@code p' = R p + t} where {@code R} is a rotation
 * or a reflection. Applied to patterns when they are turned for layout or placed on a sheet.
 *
 * <p>Matrix form: {@code x' = a x + b y + tx}, {@code y' = c x + d y + ty}.
 */
public record Transform2(double a, double b, double c, double d, double tx, double ty) {

    public static final Transform2 IDENTITY = new Transform2(1, 0, 0, 1, 0, 0);

    public Transform2 {
        for (double v : new double[] {a, b, c, d, tx, ty}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("transform entries must be finite");
            }
        }
        double det = a * d - b * c;
        if (Math.abs(Math.abs(det) - 1) > 1e-9 || Math.abs(a * b + c * d) > 1e-9) {
            throw new IllegalArgumentException("transform must be a rotation or reflection (rigid), det " + det);
        }
    }

    /** Counter-clockwise rotation by {@code angle} radians about the origin. */
    public static Transform2 rotation(double angle) {
        double cos = Math.cos(angle);
        double sin = Math.sin(angle);
        return new Transform2(cos, -sin, sin, cos, 0, 0);
    }

    public static Transform2 translation(double dx, double dy) {
        return new Transform2(1, 0, 0, 1, dx, dy);
    }

    /** Mirror image across the y axis ({@code x -> -x}). */
    public static Transform2 mirrorX() {
        return new Transform2(-1, 0, 0, 1, 0, 0);
    }

    /**
     * The placement convention used by nesting: mirror {@code x -> -x} if asked, rotate counter-clockwise by
     * {@code angleDeg} about the origin, then translate by {@code (dx, dy)}.
     */
    public static Transform2 placement(double dx, double dy, double angleDeg, boolean mirrored) {
        Transform2 t = mirrored ? mirrorX() : IDENTITY;
        return t.then(rotation(Math.toRadians(angleDeg))).then(translation(dx, dy));
    }

    /** The transform that applies this one first and then {@code next}. */
    public Transform2 then(Transform2 next) {
        return new Transform2(
                next.a * a + next.b * c, next.a * b + next.b * d,
                next.c * a + next.d * c, next.c * b + next.d * d,
                next.a * tx + next.b * ty + next.tx, next.c * tx + next.d * ty + next.ty);
    }

    public Point2 apply(Point2 p) {
        return new Point2(a * p.x() + b * p.y() + tx, c * p.x() + d * p.y() + ty);
    }

    /** Applies only the linear part (for directions). */
    public Point2 applyToVector(Point2 v) {
        return new Point2(a * v.x() + b * v.y(), c * v.x() + d * v.y());
    }

    /** True when this transform turns the plane over (a mirror image), which reverses arc directions. */
    public boolean mirrors() {
        return a * d - b * c < 0;
    }
}
