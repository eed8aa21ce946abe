package dev.sheetwright.dxf;

/** A straight line from (x1, y1) to (x2, y2), e.g. a bend or mark line; written as a DXF LINE. */
public record Line(String layer, double x1, double y1, double x2, double y2) implements Shape {

    public Line {
        Checks.notNull("Line.layer", layer);
        Checks.finite("Line.x1", x1);
        Checks.finite("Line.y1", y1);
        Checks.finite("Line.x2", x2);
        Checks.finite("Line.y2", y2);
        if (x1 == x2 && y1 == y2) {
            throw new IllegalArgumentException("Line end points must differ, got (" + x1 + ", " + y1 + ") twice");
        }
    }

    public double length() {
        return Math.hypot(x2 - x1, y2 - y1);
    }

    @Override
    public Bounds bounds() {
        return Bounds.of(x1, y1).include(x2, y2);
    }
}
