package dev.sheetwright.nest.model;

/** A clean axis-aligned rectangle of stock left free of parts (margin and gap already taken off). */
public record Offcut(double x, double y, double width, double height) {
    public Offcut {
        Checks.requireFinite("x", x);
        Checks.requireFinite("y", y);
        Checks.requireNonNegative("width", width);
        Checks.requireNonNegative("height", height);
    }

    public double area() {
        return width * height;
    }
}
