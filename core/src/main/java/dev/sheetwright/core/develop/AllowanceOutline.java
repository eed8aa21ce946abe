package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.ContourBuilder;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * Adds allowances to a straight-sided net outline (trade-reference §0.4, §7.5): every net edge gets a strip of
 * its own width outside it (a parallel offset); neighbouring strips meet where their outer lines cross (a mitre),
 * or, at a vertex marked for notching, the cut goes back to the net corner between them (a V or square notch
 * with its apex on the net corner).
 */
final class AllowanceOutline {

    private AllowanceOutline() {
    }

    /**
     * @param net vertices of the net outline, counter-clockwise, first not repeated
     * @param widths allowance outside edge {@code i} (from vertex {@code i} to {@code i + 1}), 0 for none
     * @param notch whether the corner at vertex {@code i} is notched back to the net line
     * @return vertices of the cut outline, counter-clockwise
     */
    static List<Point2> offset(List<Point2> net, double[] widths, boolean[] notch) {
        return offset(net, widths, notch, new boolean[net.size()]);
    }

    /**
     * As {@link #offset(List, double[], boolean[])}, and at each vertex marked {@code vee} (a bend line meeting a
     * straight edge that carries an allowance) a V notch with its apex on the net line and a 90 degree included
     * angle, so flanges turned up on both sides of the bend meet in a mitre (trade-reference §7.5).
     */
    static List<Point2> offset(List<Point2> net, double[] widths, boolean[] notch, boolean[] vee) {
        int n = net.size();
        List<Point2> out = new ArrayList<>();
        for (int v = 0; v < n; v++) {
            int before = (v - 1 + n) % n;
            Point2 p = net.get(v);
            Point2 dIn = net.get(v).minus(net.get(before)).unit();
            Point2 dOut = net.get((v + 1) % n).minus(p).unit();
            Point2 nIn = outward(dIn);
            Point2 nOut = outward(dOut);
            double wIn = widths[before];
            double wOut = widths[v];
            double turn = dIn.cross(dOut);
            if (wIn == 0 && wOut == 0) {
                out.add(p);
            } else if (vee[v] && wIn == wOut) {
                out.add(p.plus(nIn.times(wIn)).minus(dIn.times(wIn)));
                out.add(p);
                out.add(p.plus(nOut.times(wOut)).plus(dOut.times(wOut)));
            } else if (notch[v] && turn > 0) {
                out.add(p.plus(nIn.times(wIn)));
                out.add(p);
                out.add(p.plus(nOut.times(wOut)));
            } else if (Math.abs(turn) < 1e-12 || dIn.dot(dOut) < -0.999) {
                // straight on (or doubling back): no crossing of the two outer lines; step between them
                out.add(p.plus(nIn.times(wIn)));
                out.add(p.plus(nOut.times(wOut)));
            } else {
                out.add(cross(p.plus(nIn.times(wIn)), dIn, p.plus(nOut.times(wOut)), dOut));
            }
        }
        return out;
    }

    /**
     * The cut outline of a rectangular piece: {@link #offset(List, double[], boolean[], boolean[])} over lists
     * ({@code vee} may be null for none), refused naming the piece when the allowances overlap.
     */
    static Contour cut(String fitting, String piece, List<Point2> net, List<Double> widths, List<Boolean> notch,
            List<Boolean> vee, Tolerance tol) {
        int n = net.size();
        double[] w = new double[n];
        boolean[] nt = new boolean[n];
        boolean[] v = new boolean[n];
        for (int i = 0; i < n; i++) {
            w[i] = widths.get(i);
            nt[i] = notch.get(i);
            v[i] = vee != null && vee.get(i);
        }
        List<Point2> out = offset(net, w, nt, v);
        if (!isSimple(net) || !isSimple(out)) {
            throw new dev.sheetwright.core.fitting.FittingException(fitting, "allowances", "the allowances of piece '"
                    + piece + "' overlap (or run past a corner or bend); make them narrower");
        }
        return contour(out, tol);
    }

    /** Outward normal of a counter-clockwise outline's edge running in direction {@code d}. */
    private static Point2 outward(Point2 d) {
        return new Point2(d.y(), -d.x());
    }

    /** Where the line through {@code a} along {@code da} crosses the line through {@code b} along {@code db}. */
    private static Point2 cross(Point2 a, Point2 da, Point2 b, Point2 db) {
        double k = b.minus(a).cross(db) / da.cross(db);
        return a.plus(da.times(k));
    }

    /** The open polyline {@code chain} moved sideways by {@code w} to the right of its running direction. */
    static List<Point2> offsetChain(List<Point2> chain, double w) {
        List<Point2> out = new ArrayList<>();
        int n = chain.size();
        for (int i = 0; i < n; i++) {
            Point2 p = chain.get(i);
            if (i == 0 || i == n - 1) {
                Point2 d = i == 0 ? chain.get(1).minus(p).unit() : p.minus(chain.get(n - 2)).unit();
                out.add(p.plus(outward(d).times(w)));
            } else {
                Point2 dIn = p.minus(chain.get(i - 1)).unit();
                Point2 dOut = chain.get(i + 1).minus(p).unit();
                if (Math.abs(dIn.cross(dOut)) < 1e-12) {
                    out.add(p.plus(outward(dIn).times(w)));
                } else {
                    out.add(cross(p.plus(outward(dIn).times(w)), dIn, p.plus(outward(dOut).times(w)), dOut));
                }
            }
        }
        return out;
    }

    static Contour contour(List<Point2> pts, Tolerance tol) {
        ContourBuilder b = ContourBuilder.startAt(pts.get(0), tol);
        for (int i = 1; i < pts.size(); i++) {
            b.lineTo(pts.get(i));
        }
        return b.close();
    }

    /** Mark lines along an open polyline: one mark per segment. */
    static void markChain(List<Point2> chain, MarkKind kind, List<Mark> marks, Tolerance tol) {
        for (int i = 0; i + 1 < chain.size(); i++) {
            if (chain.get(i).distance(chain.get(i + 1)) > tol.linear()) {
                marks.add(new Mark(kind, new Line(chain.get(i), chain.get(i + 1))));
            }
        }
    }

    /**
     * The mark for an end allowance along a net edge chain (running with the outline, allowance on its right):
     * a bend line on the net line, a crimp line on the net line, a bead line half way across the bead allowance.
     */
    static void endMarks(EndAllowance end, List<Point2> netChain, List<Mark> marks, Tolerance tol) {
        if (end.kind() == EndKind.NONE) {
            return;
        }
        switch (end.kind()) {
            case BEAD -> markChain(offsetChain(netChain, end.width() / 2), MarkKind.BEAD, marks, tol);
            case CRIMP -> markChain(netChain, MarkKind.CRIMP, marks, tol);
            default -> markChain(netChain, MarkKind.BEND, marks, tol);
        }
    }

    /** True when no two non-neighbouring edges of the closed polygon cross or touch. */
    static boolean isSimple(List<Point2> ring) {
        int n = ring.size();
        for (int i = 0; i < n; i++) {
            Point2 a = ring.get(i);
            Point2 b = ring.get((i + 1) % n);
            for (int j = i + 2; j < n; j++) {
                if ((j + 1) % n == i) {
                    continue;
                }
                if (segmentsMeet(a, b, ring.get(j), ring.get((j + 1) % n))) {
                    return false;
                }
            }
        }
        return true;
    }

    private static boolean segmentsMeet(Point2 a, Point2 b, Point2 c, Point2 d) {
        double minX1 = Math.min(a.x(), b.x());
        double maxX1 = Math.max(a.x(), b.x());
        double minX2 = Math.min(c.x(), d.x());
        double maxX2 = Math.max(c.x(), d.x());
        if (maxX1 < minX2 || maxX2 < minX1) {
            return false;
        }
        double d1 = b.minus(a).cross(c.minus(a));
        double d2 = b.minus(a).cross(d.minus(a));
        double d3 = d.minus(c).cross(a.minus(c));
        double d4 = d.minus(c).cross(b.minus(c));
        return d1 * d2 < 0 && d3 * d4 < 0;
    }
}
