package dev.sheetwright.nest.model;

import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

/**
 * Where one copy goes: take the shape as given, mirror x to -x if {@code mirrored}, rotate counter-clockwise by
 * {@code rotationDeg} about (0, 0), then translate by (x, y).
 */
public record Placement(String fitting, String piece, int copy, double x, double y, double rotationDeg, boolean mirrored) {
    public Placement {
        Checks.requireText("fitting", fitting);
        Checks.requireText("piece", piece);
        if (copy < 0) {
            throw new IllegalArgumentException("copy must be >= 0, got " + copy);
        }
        Checks.requireFinite("x", x);
        Checks.requireFinite("y", y);
        Checks.requireFinite("rotationDeg", rotationDeg);
    }

    public String label() {
        return fitting + "/" + piece;
    }

    /** The transformation described above; multiples of 90 degrees are exact. */
    public AffineTransformation toTransform() {
        return transform(rotationDeg, mirrored, x, y);
    }

    /** The shape moved to its place, a new polygon. */
    public Polygon apply(Polygon shape) {
        return (Polygon) toTransform().transform(shape);
    }

    /** Mirror (optional), rotate CCW by {@code deg} about the origin, translate. */
    public static AffineTransformation transform(double deg, boolean mirrored, double x, double y) {
        AffineTransformation t = new AffineTransformation();
        if (mirrored) {
            t.scale(-1, 1);
        }
        double n = RotationRule.normalize(deg);
        double q = n / 90.0;
        if (q == Math.rint(q)) {
            int k = (int) q;
            double[] sin = {0, 1, 0, -1};
            double[] cos = {1, 0, -1, 0};
            t.rotate(sin[k], cos[k]);
        } else {
            t.rotate(Math.toRadians(n));
        }
        t.translate(x, y);
        return t;
    }
}
