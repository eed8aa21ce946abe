package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Chooses where the torch enters a loop and draws its straight lead-in and lead-out, always in scrap: outside an
 * outline, inside a hole (scrap is on the left of travel). A corner is preferred, then the middle of a straight
 * edge, then the middle of an arc (common practice, trade reference §9.4: pierce in scrap, never on the part edge).
 * A lead must keep the pierce at least kerf/2 off its own part, must not cross it and must be the short way in (no
 * point of the part nearer the pierce than the lead is long); it cannot reach another part,
 * because the lead-in is at most gap − kerf long (checked when the job is read). A hole too small for the lead is
 * entered from its centre; a loop with no room at all is pierced on the path, with a note.
 */
final class LeadPlacer {

    /** A start point on the loop: the edge it lies on, whether that edge is split there, and the way out to scrap. */
    private record Start(int edge, Point2 at, boolean split, Point2 out, int preference) {
    }

    /** A loop made to start where its lead-in ends, and that lead. */
    record Entry(Contour toolpath, Lead lead) {
    }

    private static final double CORNER_TURN = Math.toRadians(30);

    private LeadPlacer() {
    }

    static Entry place(Contour loop, ContourRole role, PartOutline own, int hole, CutPathSettings s, Box2 stock,
            Tolerance tol, String where) {
        List<Start> starts = starts(loop, s.pathOffset(), tol);
        double kerfHalf = s.kerf() / 2;
        if (s.leadIn() <= tol.linear()) {
            Start first = starts.get(0);
            return entry(loop, first, first.at, s, own, role, hole, stock, kerfHalf, tol, Optional.empty());
        }
        for (Start st : starts) {
            Point2 pierce = st.at.plus(st.out.times(s.leadIn()));
            if (clear(pierce, st, own, role, hole, stock, kerfHalf, tol)) {
                return entry(loop, st, pierce, s, own, role, hole, stock, kerfHalf, tol, Optional.empty());
            }
        }
        if (role == ContourRole.HOLE) {
            Point2 centre = centroid(own.hole(hole));
            Start nearest = null;
            for (Start st : starts) {
                if (clearLine(centre, st.at, own, role, hole, stock, kerfHalf, tol)
                        && (nearest == null || centre.distance(st.at) < centre.distance(nearest.at))) {
                    nearest = st;
                }
            }
            if (nearest != null) {
                return entry(loop, nearest, centre, s, own, role, hole, stock, kerfHalf, tol,
                        Optional.of(String.format(Locale.ROOT, "%s: hole too small for the lead-in, pierced at its"
                                + " centre (lead %.3f)", where, centre.distance(nearest.at))));
            }
        }
        for (double part : new double[] {0.5, 0.25}) {
            for (Start st : starts) {
                Point2 pierce = st.at.plus(st.out.times(s.leadIn() * part));
                if (clear(pierce, st, own, role, hole, stock, kerfHalf, tol)) {
                    return entry(loop, st, pierce, s, own, role, hole, stock, kerfHalf, tol,
                            Optional.of(String.format(Locale.ROOT, "%s: no room for the whole lead-in, shortened"
                                    + " to %.3f", where, s.leadIn() * part)));
                }
            }
        }
        Start first = starts.get(0);
        return entry(loop, first, first.at, s, own, role, hole, stock, kerfHalf, tol,
                Optional.of(where + ": no room for a lead-in in scrap, pierced on the path (check the edge)"));
    }

    private static Entry entry(Contour loop, Start st, Point2 pierce, CutPathSettings s, PartOutline own,
            ContourRole role, int hole, Box2 stock, double kerfHalf, Tolerance tol, Optional<String> note) {
        Contour started = startAt(loop, st, tol);
        Optional<Line> in = pierce.distance(st.at) > tol.linear() ? Optional.of(new Line(pierce, st.at))
                : Optional.empty();
        Optional<Line> out = Optional.empty();
        if (s.leadOut() > tol.linear()) {
            Edge last = started.edges().get(started.edges().size() - 1);
            Point2 travel = KerfOffset.tangentAtEnd(last);
            Point2 side = travel.perpendicular();
            for (Point2 dir : List.of(travel.plus(side).unit(), side)) {
                Point2 end = st.at.plus(dir.times(s.leadOut()));
                if (clearLine(end, st.at, own, role, hole, stock, kerfHalf, tol)) {
                    out = Optional.of(new Line(st.at, end));
                    break;
                }
            }
        }
        return new Entry(started, new Lead(pierce, in, out, note));
    }

    private static boolean clear(Point2 pierce, Start st, PartOutline own, ContourRole role, int hole, Box2 stock,
            double kerfHalf, Tolerance tol) {
        return clearLine(pierce, st.at, own, role, hole, stock, kerfHalf, tol);
    }

    /** The pierce is in this loop's scrap, on the stock, kerf/2 off the part, and the line to the loop crosses nothing. */
    private static boolean clearLine(Point2 pierce, Point2 onLoop, PartOutline own, ContourRole role, int hole,
            Box2 stock, double kerfHalf, Tolerance tol) {
        if (pierce.x() < stock.minX() || pierce.x() > stock.maxX() || pierce.y() < stock.minY()
                || pierce.y() > stock.maxY()) {
            return false;
        }
        boolean scrapSide = role == ContourRole.HOLE ? PartOutline.inside(own.hole(hole), pierce)
                : !PartOutline.inside(own.outer(), pierce);
        if (!scrapSide || own.distance(pierce) < kerfHalf - tol.linear()) {
            return false;
        }
        Point2 toLoop = onLoop.minus(pierce);
        double len = toLoop.length();
        if (len <= tol.linear()) {
            return true;
        }
        if (own.distance(pierce) < len - tol.chord()) {
            return false; // the lead must be the short way in, not across a small hole and past its middle
        }
        // stop just short of the loop, which may lie on the contour itself when nothing offsets the path
        Point2 near = pierce.plus(toLoop.times(Math.max(0, 1 - Math.max(kerfHalf / 2, 4 * tol.chord()) / len)));
        return !own.crosses(pierce, near);
    }

    /** Candidate starts, best first: corners, then straight edges, then arcs. */
    private static List<Start> starts(Contour loop, double offset, Tolerance tol) {
        List<Edge> es = loop.edges();
        int n = es.size();
        List<Start> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Edge e = es.get(i);
            Edge prev = es.get((i + n - 1) % n);
            Point2 inDir = KerfOffset.tangentAtEnd(prev);
            Point2 outDir = KerfOffset.tangentAtStart(e);
            boolean rightTurn = inDir.cross(outDir) < 0
                    && Math.acos(Math.max(-1, Math.min(1, inDir.dot(outDir)))) > CORNER_TURN;
            if (e instanceof Arc a && offset > 0 && Math.abs(a.radius() - offset) <= tol.linear() && a.sweep() < 0) {
                // the join arc of an outside corner: its middle is the corner's bisector
                double mid = a.startAngle() + a.sweep() / 2;
                out.add(new Start(i, a.pointAt(mid), true, Point2.polar(1, mid), 0));
                continue;
            }
            if (rightTurn) {
                Point2 bis = inDir.perpendicular().plus(outDir.perpendicular());
                if (bis.length() > tol.angular()) {
                    out.add(new Start(i, e.start(), false, bis.unit(), 0));
                }
            }
            if (e instanceof Line l) {
                Point2 mid = l.start().plus(l.end()).times(0.5);
                out.add(new Start(i, mid, true, outDir.perpendicular(), 1));
            } else if (e instanceof Arc a) {
                double mid = a.startAngle() + a.sweep() / 2;
                Point2 radial = Point2.polar(1, mid);
                out.add(new Start(i, a.pointAt(mid), true, a.sweep() > 0 ? radial.times(-1) : radial, 2));
            }
        }
        out.sort(Comparator.comparingInt(Start::preference));
        return out;
    }

    private static Contour startAt(Contour loop, Start st, Tolerance tol) {
        List<Edge> es = loop.edges();
        int n = es.size();
        List<Edge> out = new ArrayList<>(n + 1);
        Edge first = es.get(st.edge);
        Edge tail = null;
        if (st.split) {
            Edge[] halves = split(first, st.at);
            out.add(halves[1]);
            tail = halves[0];
        } else {
            out.add(first);
        }
        for (int k = 1; k < n; k++) {
            out.add(es.get((st.edge + k) % n));
        }
        if (tail != null) {
            out.add(tail);
        }
        return Contour.of(out, tol);
    }

    private static Edge[] split(Edge e, Point2 at) {
        if (e instanceof Arc a) {
            double m = at.minus(a.centre()).angle();
            double first = m - a.startAngle();
            while (first * a.sweep() < 0) {
                first += Math.signum(a.sweep()) * 2 * Math.PI;
            }
            while (Math.abs(first) > Math.abs(a.sweep())) {
                first -= Math.signum(a.sweep()) * 2 * Math.PI;
            }
            return new Edge[] {new Arc(a.centre(), a.radius(), a.startAngle(), first),
                new Arc(a.centre(), a.radius(), a.startAngle() + first, a.sweep() - first)};
        }
        return new Edge[] {new Line(e.start(), at), new Line(at, e.end())};
    }

    /** Area centroid of a simple polygon (the middle of a round hole). */
    static Point2 centroid(List<Point2> poly) {
        double a = 0;
        double cx = 0;
        double cy = 0;
        int n = poly.size();
        for (int i = 0; i < n; i++) {
            Point2 p = poly.get(i);
            Point2 q = poly.get((i + 1) % n);
            double w = p.cross(q);
            a += w;
            cx += (p.x() + q.x()) * w;
            cy += (p.y() + q.y()) * w;
        }
        if (a == 0) {
            return poly.get(0);
        }
        return new Point2(cx / (3 * a), cy / (3 * a));
    }
}
