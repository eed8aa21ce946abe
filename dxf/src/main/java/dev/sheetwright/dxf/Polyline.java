package dev.sheetwright.dxf;

import java.util.List;

/**
 * A chain of straight and arc segments. A closed polyline has as many segments as vertices (the last one runs back
 * to the first vertex, which is not repeated); an open one has one fewer, and its last vertex's bulge must be 0.
 */
public record Polyline(String layer, List<Vertex> vertices, boolean closed) implements Shape {

    public Polyline {
        Checks.notNull("Polyline.layer", layer);
        vertices = Checks.copy("Polyline.vertices", vertices);
        int n = vertices.size();
        if (n < 2) {
            throw new IllegalArgumentException("Polyline.vertices must hold at least 2 vertices, got " + n);
        }
        for (int i = 1; i < n; i++) {
            Vertex v = vertices.get(i);
            if (v.samePoint(vertices.get(i - 1))) {
                throw new IllegalArgumentException("Polyline.vertices[" + i + "] repeats vertices[" + (i - 1)
                        + "] at (" + v.x() + ", " + v.y() + "): zero-length segment");
            }
        }
        Vertex last = vertices.get(n - 1);
        if (closed && last.samePoint(vertices.get(0))) {
            throw new IllegalArgumentException("Polyline.vertices[" + (n - 1) + "] repeats vertices[0] at ("
                    + last.x() + ", " + last.y() + "): a closed polyline must not repeat its first vertex,"
                    + " the closed flag makes the closing segment");
        }
        if (!closed && last.bulge() != 0) {
            throw new IllegalArgumentException("Polyline.vertices[" + (n - 1) + "].bulge must be 0 on an open"
                    + " polyline (no segment follows the last vertex), got " + last.bulge());
        }
    }

    /** Segments: as many as vertices when closed, one fewer when open. */
    public int segmentCount() {
        return closed ? vertices.size() : vertices.size() - 1;
    }

    /** Exact length: straight segments plus true arc lengths (radius times sweep). */
    public double length() {
        double sum = 0;
        for (int i = 0; i < segmentCount(); i++) {
            Vertex a = vertices.get(i);
            Vertex b = next(i);
            sum += a.bulge() == 0 ? Math.hypot(b.x() - a.x(), b.y() - a.y()) : arc(i).length();
        }
        return sum;
    }

    @Override
    public Bounds bounds() {
        Vertex first = vertices.get(0);
        Bounds box = Bounds.of(first.x(), first.y());
        for (Vertex v : vertices) {
            box = box.include(v.x(), v.y());
        }
        for (int i = 0; i < segmentCount(); i++) {
            if (vertices.get(i).bulge() != 0) {
                box = arc(i).includeAxisCrossings(box);
            }
        }
        return box;
    }

    /** The vertex that segment {@code i} ends at. */
    Vertex next(int i) {
        return vertices.get((i + 1) % vertices.size());
    }

    /** The arc of segment {@code i}, whose bulge must not be 0. */
    BulgeArc arc(int i) {
        Vertex a = vertices.get(i);
        Vertex b = next(i);
        return BulgeArc.of(a.x(), a.y(), b.x(), b.y(), a.bulge());
    }
}
