package dev.sheetwright.core.geom;

import java.util.List;

/** A straight edge. */
public record Line(Point2 start, Point2 end) implements Edge {

    public Line {
        if (start == null || end == null) {
            throw new IllegalArgumentException("line ends must not be null");
        }
    }

    public static Line of(Point2 start, Point2 end) {
        return new Line(start, end);
    }

    @Override
    public double length() {
        return start.distance(end);
    }

    @Override
    public double twiceSignedArea() {
        return start.cross(end);
    }

    @Override
    public Box2 bounds() {
        return Box2.of(start).include(end);
    }

    @Override
    public Line reversed() {
        return new Line(end, start);
    }

    @Override
    public Line transformed(Transform2 t) {
        return new Line(t.apply(start), t.apply(end));
    }

    @Override
    public List<Point2> flatten(double chord) {
        return List.of(start);
    }
}
