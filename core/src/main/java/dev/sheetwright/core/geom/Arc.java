package dev.sheetwright.core.geom;

import java.util.ArrayList;
import java.util.List;

/**
 * A true circular arc: centre, radius, start angle and signed sweep (radians; positive = counter-clockwise).
 * A full circle is not an edge of a contour here; close a circle with two half arcs.
 */
public record Arc(Point2 centre, double radius, double startAngle, double sweep) implements Edge {

    public Arc {
        if (centre == null) {
            throw new IllegalArgumentException("arc centre must not be null");
        }
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("arc radius must be positive and finite, got " + radius);
        }
        if (!Double.isFinite(startAngle) || !Double.isFinite(sweep) || sweep == 0 || Math.abs(sweep) > 2 * Math.PI) {
            throw new IllegalArgumentException(
                    "arc sweep must be finite, non-zero and at most a full turn, got " + sweep);
        }
    }

    public static Arc of(Point2 centre, double radius, double startAngle, double sweep) {
        return new Arc(centre, radius, startAngle, sweep);
    }

    /** The arc about {@code centre} from {@code from} to {@code to} (both at the same radius), turning the given way. */
    public static Arc between(Point2 centre, Point2 from, Point2 to, boolean counterClockwise) {
        double a0 = from.minus(centre).angle();
        double a1 = to.minus(centre).angle();
        double sweep = a1 - a0;
        if (counterClockwise) {
            while (sweep <= 0) {
                sweep += 2 * Math.PI;
            }
        } else {
            while (sweep >= 0) {
                sweep -= 2 * Math.PI;
            }
        }
        return new Arc(centre, from.distance(centre), a0, sweep);
    }

    public double endAngle() {
        return startAngle + sweep;
    }

    public Point2 pointAt(double angle) {
        return centre.plus(Point2.polar(radius, angle));
    }

    @Override
    public Point2 start() {
        return pointAt(startAngle);
    }

    @Override
    public Point2 end() {
        return pointAt(endAngle());
    }

    @Override
    public double length() {
        return radius * Math.abs(sweep);
    }

    /** DXF bulge of this arc: tan(sweep / 4). */
    public double bulge() {
        return Math.tan(sweep / 4);
    }

    @Override
    public double twiceSignedArea() {
        double a0 = startAngle;
        double a1 = endAngle();
        return radius * radius * sweep
                + radius * (centre.x() * (Math.sin(a1) - Math.sin(a0)) - centre.y() * (Math.cos(a1) - Math.cos(a0)));
    }

    @Override
    public Box2 bounds() {
        Box2 box = Box2.of(start()).include(end());
        double lo = Math.min(startAngle, endAngle());
        double hi = Math.max(startAngle, endAngle());
        double first = Math.ceil(lo / (Math.PI / 2)) * (Math.PI / 2);
        for (double a = first; a < hi; a += Math.PI / 2) {
            box = box.include(pointAt(a));
        }
        return box;
    }

    @Override
    public Arc reversed() {
        return new Arc(centre, radius, endAngle(), -sweep);
    }

    @Override
    public Arc transformed(Transform2 t) {
        Point2 c = t.apply(centre);
        double a0 = t.applyToVector(Point2.polar(1, startAngle)).angle();
        return new Arc(c, radius, a0, t.mirrors() ? -sweep : sweep);
    }

    /** Number of equal chords needed so that the sagitta stays within {@code chord}. */
    public int segmentsFor(double chord) {
        if (chord >= radius) {
            return Math.max(1, (int) Math.ceil(Math.abs(sweep) / (Math.PI / 2)));
        }
        double maxStep = 2 * Math.acos(1 - chord / radius);
        return Math.max(1, (int) Math.ceil(Math.abs(sweep) / maxStep));
    }

    @Override
    public List<Point2> flatten(double chord) {
        int n = segmentsFor(chord);
        List<Point2> pts = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            pts.add(pointAt(startAngle + sweep * i / n));
        }
        return pts;
    }
}
