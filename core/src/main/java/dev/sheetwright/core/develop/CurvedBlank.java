package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.geom.ContourBuilder;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * A blank bounded by two straight seam edges and two developed end curves that are not circle arcs (an oblique
 * cone frustum, a gore). Both curves run left to right over the parameter range {@code t0..t1}; the left seam
 * edge joins them at {@code t0}, the right one at {@code t1}.
 *
 * <p>End curves are cut as polylines within {@code tolerance.chord()}. End allowances are offset curves along the
 * curve normal, seam allowances parallel offsets of the straight seam edges. Without notching, each corner is
 * squared off where the seam offset line meets the tangent of the end offset curve; with notching the corner is
 * cut back to the net corner (trade-reference §7.5). Either way an end strip (a lap, flange or connector) ends on
 * the seam line, where the offset curve crosses the seam edge extended, not on the curve normal at the corner:
 * where the end curve meets the seam at a slant (a gore seamed at the side, slope tan beta) the normal would put
 * the strip's end w sin beta off the seam line, and the laps of two gores would not close over the seam.
 */
final class CurvedBlank {

    private CurvedBlank() {
    }

    /**
     * @param bottom lower end curve, or null when both seam edges run to an apex at the origin (a whole cone)
     * @param top upper end curve
     * @param seam {@code right} on the edge at {@code t1}, {@code left} on the edge at {@code t0}
     * @param bottomEnd allowance beyond the bottom curve (away from the blank)
     * @param topEnd allowance beyond the top curve (away from the blank)
     */
    static Pattern build(String fitting, String piece, int count, PlaneCurve bottom, PlaneCurve top, double t0,
            double t1, SeamAllowance seam, EndAllowance bottomEnd, EndAllowance topEnd, boolean notch,
            Tolerance tol) {
        double wr = seam.right();
        double wl = seam.left();
        double eb = bottomEnd.width();
        double et = topEnd.width();
        double chord = tol.chord();
        Point2 b0 = bottom == null ? Point2.ORIGIN : bottom.at(t0);
        Point2 b1 = bottom == null ? Point2.ORIGIN : bottom.at(t1);
        Point2 tp0 = top.at(t0);
        Point2 tp1 = top.at(t1);
        Point2 ur = tp1.minus(b1).unit();
        Point2 ul = tp0.minus(b0).unit();
        Point2 nr = new Point2(ur.y(), -ur.x());
        Point2 nl = ul.perpendicular();
        PlaneCurve topOut = top.offsetLeft(et);
        List<Point2> topPts = CurveSampler.points(topOut, onSeam(topOut, tp0, ul, t0, t1, tol),
                onSeam(topOut, tp1, ur, t1, t0, tol), chord);

        ContourBuilder b;
        if (bottom == null) {
            b = ContourBuilder.startAt(Point2.ORIGIN, tol).lineTo(nr.times(wr));
        } else {
            PlaneCurve bottomOut = bottom.offsetLeft(-eb);
            List<Point2> bottomPts = CurveSampler.points(bottomOut, onSeam(bottomOut, b0, ul, t0, t1, tol),
                    onSeam(bottomOut, b1, ur, t1, t0, tol), chord);
            if (notch) {
                b = ContourBuilder.startAt(b0, tol);
                bottomPts.forEach(b::lineTo);
                b.lineTo(b1).lineTo(b1.plus(nr.times(wr)));
            } else {
                b = ContourBuilder.startAt(meet(b0.plus(nl.times(wl)), ul, bottomPts.get(0), bottom.tangent(t0)), tol);
                bottomPts.forEach(b::lineTo);
                b.lineTo(meet(b1.plus(nr.times(wr)), ur, bottomPts.get(bottomPts.size() - 1), bottom.tangent(t1)));
            }
        }
        if (notch) {
            b.lineTo(tp1.plus(nr.times(wr))).lineTo(tp1);
        } else {
            b.lineTo(meet(b1.plus(nr.times(wr)), ur, topPts.get(topPts.size() - 1), top.tangent(t1)));
        }
        for (int i = topPts.size() - 1; i >= 0; i--) {
            b.lineTo(topPts.get(i));
        }
        if (notch) {
            b.lineTo(tp0).lineTo(tp0.plus(nl.times(wl))).lineTo(b0.plus(nl.times(wl)));
        } else {
            b.lineTo(meet(b0.plus(nl.times(wl)), ul, topPts.get(0), top.tangent(t0)));
            if (bottom == null) {
                b.lineTo(nl.times(wl));
            }
        }

        List<Mark> marks = new ArrayList<>();
        if (wr > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(b1, tp1)));
        }
        if (wl > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(tp0, b0)));
        }
        endMarks(top, +1, topEnd, t0, t1, chord, marks);
        if (bottom != null) {
            endMarks(bottom, -1, bottomEnd, t0, t1, chord, marks);
        }
        double tm = (t0 + t1) / 2;
        Point2 bm = bottom == null ? Point2.ORIGIN : bottom.at(tm);
        Point2 tm2 = top.at(tm);
        marks.add(new Mark(MarkKind.CENTRE, new Line(bm, tm2)));
        Point2 label = bm.plus(tm2).times(0.5);
        return new Pattern(fitting, piece, count, b.close(), List.of(), marks, label);
    }

    /**
     * The parameter where the offset end curve crosses the seam line through the net corner {@code corner} along
     * {@code seam}, searched from the corner's parameter {@code t} (Newton steps on the signed distance from the
     * line; the curve's tangent gives the slope). {@code t} itself when the curve already starts on the line, when
     * the end has no width, or when the search would leave a quarter of the range {@code t..other}.
     */
    private static double onSeam(PlaneCurve curve, Point2 corner, Point2 seam, double t, double other,
            Tolerance tol) {
        double span = Math.abs(other - t);
        double u = t;
        for (int i = 0; i < 30; i++) {
            double f = curve.at(u).minus(corner).cross(seam);
            if (Math.abs(f) <= tol.linear() * 1e-3) {
                return u;
            }
            double df = curve.tangent(u).cross(seam);
            if (df == 0 || !Double.isFinite(df)) {
                return t;
            }
            u -= f / df;
            if (!Double.isFinite(u) || Math.abs(u - t) > span / 4) {
                return t;
            }
        }
        return t;
    }

    /** Where the line through {@code p} along {@code d} meets the line through {@code q} along {@code e}. */
    private static Point2 meet(Point2 p, Point2 d, Point2 q, Point2 e) {
        double den = d.cross(e);
        if (Math.abs(den) < 1e-12 * d.length() * e.length()) {
            return q;
        }
        double s = q.minus(p).cross(e) / den;
        return p.plus(d.times(s));
    }

    private static void endMarks(PlaneCurve net, int outward, EndAllowance end, double t0, double t1, double chord,
            List<Mark> marks) {
        if (end.kind() == EndKind.NONE) {
            return;
        }
        PlaneCurve line = end.kind() == EndKind.BEAD ? net.offsetLeft(outward * end.width() / 2) : net;
        MarkKind kind = switch (end.kind()) {
            case BEAD -> MarkKind.BEAD;
            case CRIMP -> MarkKind.CRIMP;
            default -> MarkKind.BEND;
        };
        List<Point2> pts = CurveSampler.points(line, t0, t1, chord);
        for (int i = 0; i + 1 < pts.size(); i++) {
            marks.add(new Mark(kind, new Line(pts.get(i), pts.get(i + 1))));
        }
    }
}
