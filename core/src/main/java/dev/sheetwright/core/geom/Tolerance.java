package dev.sheetwright.core.geom;

/**
 * The one set of tolerances passed through geometry, development and nesting.
 *
 * <p>All lengths are in the length unit of the geometry they are applied to (the job's unit). A value is
 * passed as an argument, never read from a global.
 *
 * @param linear distance below which two points are the same point (joins of contour edges, zero-length edges)
 * @param angular angle in radians below which two directions are the same
 * @param chord the largest sagitta allowed when a true curve is replaced by chords (flattening for nesting,
 *     polylines for curves that are not circle arcs)
 */
public record Tolerance(double linear, double angular, double chord) {

    /** Inch jobs: one millionth of an inch to join points, 0.002 in sagitta for chords. */
    public static final Tolerance INCH = new Tolerance(1e-6, 1e-9, 0.002);
    /** Millimetre jobs: the same tolerances expressed in mm (0.05 mm sagitta). */
    public static final Tolerance MM = new Tolerance(2.5e-5, 1e-9, 0.05);

    public Tolerance {
        requirePositive("linear", linear);
        requirePositive("angular", angular);
        requirePositive("chord", chord);
        if (chord < linear) {
            throw new IllegalArgumentException(
                    "chord tolerance " + chord + " must not be smaller than the linear tolerance " + linear);
        }
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " tolerance must be a positive finite number, got " + value);
        }
    }

    /** Same tolerance with another chord (sagitta) limit. */
    public Tolerance withChord(double newChord) {
        return new Tolerance(linear, angular, newChord);
    }

    /** True when the two lengths differ by no more than the linear tolerance. */
    public boolean same(double a, double b) {
        return Math.abs(a - b) <= linear;
    }

    /** True when the two points are within the linear tolerance of each other. */
    public boolean same(Point2 a, Point2 b) {
        return a.distance(b) <= linear;
    }
}
