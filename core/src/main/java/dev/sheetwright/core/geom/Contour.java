package dev.sheetwright.core.geom;

import java.util.ArrayList;
import java.util.List;

/**
 * A closed loop of lines and true arcs: the outline of a pattern or one of its holes. Each edge ends where the
 * next one starts (within the linear tolerance it was built with) and the last edge ends at the first start.
 */
public final class Contour {

    private final List<Edge> edges;

    private Contour(List<Edge> edges) {
        this.edges = List.copyOf(edges);
    }

    /**
     * Builds a closed contour, checking that consecutive edges join within {@code tolerance.linear()}. Edges
     * shorter than the linear tolerance are dropped.
     */
    public static Contour of(List<? extends Edge> edges, Tolerance tolerance) {
        List<Edge> kept = new ArrayList<>();
        for (Edge e : edges) {
            if (e.length() > tolerance.linear()) {
                kept.add(e);
            }
        }
        if (kept.isEmpty()) {
            throw new IllegalArgumentException("a contour needs at least one edge longer than the tolerance");
        }
        for (int i = 0; i < kept.size(); i++) {
            Edge here = kept.get(i);
            Edge next = kept.get((i + 1) % kept.size());
            double gap = here.end().distance(next.start());
            if (gap > tolerance.linear()) {
                throw new IllegalArgumentException("contour is not closed: edge " + i + " ends " + gap
                        + " away from the start of edge " + ((i + 1) % kept.size()));
            }
        }
        return new Contour(kept);
    }

    /** A straight-sided closed contour through the given corners in order. */
    public static Contour polygon(List<Point2> corners, Tolerance tolerance) {
        List<Edge> lines = new ArrayList<>();
        for (int i = 0; i < corners.size(); i++) {
            lines.add(new Line(corners.get(i), corners.get((i + 1) % corners.size())));
        }
        return of(lines, tolerance);
    }

    public List<Edge> edges() {
        return edges;
    }

    /** Signed area: positive when the contour runs counter-clockwise. Exact for arcs. */
    public double signedArea() {
        double twice = 0;
        for (Edge e : edges) {
            twice += e.twiceSignedArea();
        }
        return twice / 2;
    }

    public double area() {
        return Math.abs(signedArea());
    }

    public boolean isCounterClockwise() {
        return signedArea() > 0;
    }

    /** Total length of the contour (the cut length of this loop). */
    public double perimeter() {
        double sum = 0;
        for (Edge e : edges) {
            sum += e.length();
        }
        return sum;
    }

    public Box2 bounds() {
        Box2 box = edges.get(0).bounds();
        for (Edge e : edges) {
            box = box.union(e.bounds());
        }
        return box;
    }

    public Contour reversed() {
        List<Edge> rev = new ArrayList<>(edges.size());
        for (int i = edges.size() - 1; i >= 0; i--) {
            rev.add(edges.get(i).reversed());
        }
        return new Contour(rev);
    }

    /** The same contour running counter-clockwise (or clockwise when {@code ccw} is false). */
    public Contour oriented(boolean ccw) {
        return isCounterClockwise() == ccw ? this : reversed();
    }

    public Contour transformed(Transform2 t) {
        List<Edge> moved = new ArrayList<>(edges.size());
        for (Edge e : edges) {
            moved.add(e.transformed(t));
        }
        return new Contour(moved);
    }

    /**
     * Corner points of a polygon whose chords stay within {@code chord} of every arc (vertices lie on the true
     * curve). The first point is not repeated at the end.
     */
    public List<Point2> flatten(double chord) {
        List<Point2> pts = new ArrayList<>();
        for (Edge e : edges) {
            pts.addAll(e.flatten(chord));
        }
        return pts;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Contour c && c.edges.equals(edges);
    }

    @Override
    public int hashCode() {
        return edges.hashCode();
    }

    @Override
    public String toString() {
        return "Contour" + edges;
    }
}
