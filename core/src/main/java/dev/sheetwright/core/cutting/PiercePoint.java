package dev.sheetwright.core.cutting;

/** A pierce (start) point on a sheet, in sheet coordinates with the origin at the machine's home corner. */
public record PiercePoint(double x, double y) {

    public PiercePoint {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException("x must be finite, was " + x);
        }
        if (!Double.isFinite(y)) {
            throw new IllegalArgumentException("y must be finite, was " + y);
        }
    }

    public double distanceTo(PiercePoint other) {
        return Math.hypot(other.x - x, other.y - y);
    }
}
