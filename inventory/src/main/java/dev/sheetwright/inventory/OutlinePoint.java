package dev.sheetwright.inventory;

/**
 * A vertex of a remnant outline, in millimetres.
 *
 * @param x millimetres, finite
 * @param y millimetres, finite
 */
public record OutlinePoint(double x, double y) {
    public OutlinePoint {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException(
                    "outline: point (" + x + ", " + y + ") is not finite; coordinates must be finite numbers of mm");
        }
    }

    /** Shorthand for {@code new OutlinePoint(x, y)}. */
    public static OutlinePoint of(double x, double y) {
        return new OutlinePoint(x, y);
    }
}
