package dev.sheetwright.dxf;

/** An axis-aligned box, {@code minX <= maxX} and {@code minY <= maxY}; a single point is allowed. */
public record Bounds(double minX, double minY, double maxX, double maxY) {

    public Bounds {
        Checks.finite("Bounds.minX", minX);
        Checks.finite("Bounds.minY", minY);
        Checks.finite("Bounds.maxX", maxX);
        Checks.finite("Bounds.maxY", maxY);
        if (minX > maxX) {
            throw new IllegalArgumentException("Bounds.minX must be <= maxX " + maxX + ", got " + minX);
        }
        if (minY > maxY) {
            throw new IllegalArgumentException("Bounds.minY must be <= maxY " + maxY + ", got " + minY);
        }
    }

    /** The box holding the single point (x, y). */
    public static Bounds of(double x, double y) {
        return new Bounds(x, y, x, y);
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }

    /** The smallest box holding this box and the point (x, y). */
    public Bounds include(double x, double y) {
        return new Bounds(Math.min(minX, x), Math.min(minY, y), Math.max(maxX, x), Math.max(maxY, y));
    }

    /** The smallest box holding both boxes. */
    public Bounds union(Bounds other) {
        return new Bounds(Math.min(minX, other.minX), Math.min(minY, other.minY),
                Math.max(maxX, other.maxX), Math.max(maxY, other.maxY));
    }

    /** This box grown by {@code margin} on every side. */
    public Bounds expand(double margin) {
        Checks.finite("margin", margin);
        if (margin < 0) {
            throw new IllegalArgumentException("margin must be >= 0, got " + margin);
        }
        return new Bounds(minX - margin, minY - margin, maxX + margin, maxY + margin);
    }
}
