package dev.sheetwright.dxf;

/**
 * A polyline vertex. {@code bulge} describes the segment from this vertex to the next one:
 * {@code bulge = tan(sweep / 4)}, 0 for a straight segment, positive for a counter-clockwise arc, 1 for a
 * counter-clockwise half circle. On a closed polyline the last vertex's bulge belongs to the closing segment.
 */
public record Vertex(double x, double y, double bulge) {

    public Vertex {
        Checks.finite("Vertex.x", x);
        Checks.finite("Vertex.y", y);
        Checks.finite("Vertex.bulge", bulge);
    }

    /** A vertex whose outgoing segment is straight. */
    public static Vertex of(double x, double y) {
        return new Vertex(x, y, 0);
    }

    public static Vertex of(double x, double y, double bulge) {
        return new Vertex(x, y, bulge);
    }

    /** True when both vertices sit at exactly the same point (bulges ignored). */
    boolean samePoint(Vertex other) {
        return x == other.x && y == other.y;
    }
}
