package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * A contour moved sideways to the left of its travel by a fixed distance (half the kerf into scrap, since every cut
 * contour runs with scrap on its left). Lines stay lines and arcs stay arcs about the same centre; where the offset
 * edges part at an outside corner they are joined by an arc about the corner, and where they overlap at an inside
 * corner both are trimmed back to their crossing.
 */
public final class KerfOffset {

    private KerfOffset() {
    }

    /**
     * The offset loop.
     *
     * @throws IllegalArgumentException when an edge is too short or an arc too tight for the offset (the offset would
     *     turn it inside out)
     */
    public static Contour left(Contour c, double distance, Tolerance tol) {
        if (distance <= tol.linear()) {
            return c;
        }
        List<Edge> src = c.edges();
        int n = src.size();
        List<Edge> off = new ArrayList<>(n);
        for (Edge e : src) {
            off.add(shifted(e, distance, tol));
        }
        Point2[] trimAt = new Point2[n]; // trim point at the end of edge i / start of edge i+1
        Arc[] join = new Arc[n];
        for (int i = 0; i < n; i++) {
            Edge a = off.get(i);
            Edge b = off.get((i + 1) % n);
            if (tol.same(a.end(), b.start())) {
                continue;
            }
            Point2 corner = src.get(i).end();
            double turn = tangentAtEnd(src.get(i)).cross(tangentAtStart(src.get((i + 1) % n)));
            if (turn < 0) {
                join[i] = Arc.between(corner, a.end(), b.start(), false);
            } else {
                trimAt[i] = nearestCrossing(a, b, corner);
            }
        }
        List<Edge> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Edge e = off.get(i);
            Point2 from = trimAt[(i + n - 1) % n] != null ? trimAt[(i + n - 1) % n] : e.start();
            Point2 to = trimAt[i] != null ? trimAt[i] : e.end();
            out.add(withEnds(e, from, to, tol));
            if (join[i] != null) {
                out.add(join[i]);
            }
        }
        return Contour.of(out, tol);
    }

    /** Unit direction of travel where the edge ends. */
    static Point2 tangentAtEnd(Edge e) {
        if (e instanceof Arc a) {
            return tangent(a, a.endAngle());
        }
        return e.end().minus(e.start()).unit();
    }

    /** Unit direction of travel where the edge starts. */
    static Point2 tangentAtStart(Edge e) {
        if (e instanceof Arc a) {
            return tangent(a, a.startAngle());
        }
        return e.end().minus(e.start()).unit();
    }

    private static Point2 tangent(Arc a, double angle) {
        Point2 ccw = new Point2(-Math.sin(angle), Math.cos(angle));
        return a.sweep() > 0 ? ccw : ccw.times(-1);
    }

    private static Edge shifted(Edge e, double d, Tolerance tol) {
        if (e instanceof Arc a) {
            double r = a.sweep() > 0 ? a.radius() - d : a.radius() + d; // left of a counter-clockwise arc is its centre
            if (r <= tol.linear()) {
                throw new IllegalArgumentException("an arc of radius " + a.radius() + " is too tight to offset by "
                        + d + " into scrap");
            }
            return new Arc(a.centre(), r, a.startAngle(), a.sweep());
        }
        Point2 n = tangentAtStart(e).perpendicular().times(d);
        return new Line(e.start().plus(n), e.end().plus(n));
    }

    private static Edge withEnds(Edge e, Point2 from, Point2 to, Tolerance tol) {
        if (e instanceof Arc a) {
            if (from.equals(a.start()) && to.equals(a.end())) {
                return a;
            }
            double a0 = from.minus(a.centre()).angle();
            double sweep = to.minus(a.centre()).angle() - a0;
            while (sweep - a.sweep() > Math.PI) {
                sweep -= 2 * Math.PI;
            }
            while (a.sweep() - sweep > Math.PI) {
                sweep += 2 * Math.PI;
            }
            if (Math.signum(sweep) != Math.signum(a.sweep())) {
                throw new IllegalArgumentException("an arc of " + a.length() + " is too short for the kerf offset");
            }
            return new Arc(a.centre(), a.radius(), a0, sweep);
        }
        Point2 dir = e.end().minus(e.start());
        if (to.minus(from).dot(dir) < -tol.linear()) {
            throw new IllegalArgumentException("an edge of " + e.length() + " is too short for the kerf offset");
        }
        return new Line(from, to);
    }

    /** Where the two edges (taken whole: lines unbounded, arcs as circles) cross nearest the corner. */
    private static Point2 nearestCrossing(Edge a, Edge b, Point2 corner) {
        List<Point2> xs = crossings(a, b);
        Point2 best = null;
        for (Point2 x : xs) {
            if (best == null || x.distance(corner) < best.distance(corner)) {
                best = x;
            }
        }
        // nearly tangent edges that miss each other by a hair: meet halfway
        return best != null ? best : a.end().plus(b.start()).times(0.5);
    }

    static List<Point2> crossings(Edge a, Edge b) {
        if (a instanceof Line la && b instanceof Line lb) {
            Point2 r = la.end().minus(la.start());
            Point2 s = lb.end().minus(lb.start());
            double den = r.cross(s);
            if (den == 0) {
                return List.of();
            }
            double t = lb.start().minus(la.start()).cross(s) / den;
            return List.of(la.start().plus(r.times(t)));
        }
        if (a instanceof Arc aa && b instanceof Arc ab) {
            return circleCircle(aa.centre(), aa.radius(), ab.centre(), ab.radius());
        }
        Line l = a instanceof Line la ? la : (Line) b;
        Arc c = a instanceof Arc aa ? aa : (Arc) b;
        return lineCircle(l.start(), l.end(), c.centre(), c.radius());
    }

    static List<Point2> lineCircle(Point2 p, Point2 q, Point2 c, double r) {
        Point2 d = q.minus(p);
        Point2 f = p.minus(c);
        double aa = d.dot(d);
        double bb = 2 * f.dot(d);
        double cc = f.dot(f) - r * r;
        double disc = bb * bb - 4 * aa * cc;
        if (disc < 0 || aa == 0) {
            return List.of();
        }
        double sq = Math.sqrt(disc);
        return List.of(p.plus(d.times((-bb - sq) / (2 * aa))), p.plus(d.times((-bb + sq) / (2 * aa))));
    }

    static List<Point2> circleCircle(Point2 c0, double r0, Point2 c1, double r1) {
        double dist = c0.distance(c1);
        if (dist == 0 || dist > r0 + r1 || dist < Math.abs(r0 - r1)) {
            return List.of();
        }
        double a = (r0 * r0 - r1 * r1 + dist * dist) / (2 * dist);
        double h = Math.sqrt(Math.max(0, r0 * r0 - a * a));
        Point2 u = c1.minus(c0).times(1 / dist);
        Point2 m = c0.plus(u.times(a));
        Point2 v = u.perpendicular().times(h);
        return List.of(m.plus(v), m.minus(v));
    }
}
