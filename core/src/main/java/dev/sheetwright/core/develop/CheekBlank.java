package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.ContourBuilder;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * The flat cheek of a rectangular elbow or offset with curved edges (trade-reference §13.3, §13.5): a straight
 * end edge, a side made of lines and true arcs that join without a kink (throat or heel, legs and arcs), the other
 * straight end edge and the other side; each side leaves its end edge square. The flange allowance along a side
 * is the side moved outward (lines shifted, arcs about the same centre at a larger or smaller radius), so the cut
 * stays lines and true arcs. End allowances are strips beyond the end edges; with notching, each corner where an
 * end strip meets a side flange is cut back to the net corner (§7.5).
 */
final class CheekBlank {

    private CheekBlank() {
    }

    /**
     * @param right the side from the right end of the first end edge to the right end of the second (running with
     *     a counter-clockwise outline)
     * @param left the side from the left end of the second end edge back to the left end of the first
     * @param flange allowance outside both sides
     */
    static Pattern build(String fitting, String piece, int count, List<Edge> right, List<Edge> left, double flange,
            EndAllowance first, EndAllowance second, boolean notch, Point2 label, Tolerance tol) {
        List<Edge> rightOut = offset(right, flange, fitting);
        List<Edge> leftOut = offset(left, flange, fitting);
        Point2 l1 = left.get(left.size() - 1).end();
        Point2 r1 = right.get(0).start();
        Point2 r2 = right.get(right.size() - 1).end();
        Point2 l2 = left.get(0).start();
        Point2 n1 = outward(r1.minus(l1).unit());
        Point2 n2 = outward(l2.minus(r2).unit());
        double e1 = first.width();
        double e2 = second.width();

        Point2 r1Out = rightOut.get(0).start();
        Point2 r2Out = rightOut.get(rightOut.size() - 1).end();
        Point2 l2Out = leftOut.get(0).start();
        Point2 l1Out = leftOut.get(leftOut.size() - 1).end();
        ContourBuilder b;
        if (notch) {
            b = ContourBuilder.startAt(l1, tol).lineTo(l1.plus(n1.times(e1))).lineTo(r1.plus(n1.times(e1)))
                    .lineTo(r1).lineTo(r1Out);
            follow(b, rightOut);
            b.lineTo(r2).lineTo(r2.plus(n2.times(e2))).lineTo(l2.plus(n2.times(e2))).lineTo(l2).lineTo(l2Out);
            follow(b, leftOut);
        } else {
            b = ContourBuilder.startAt(l1Out.plus(n1.times(e1)), tol).lineTo(r1Out.plus(n1.times(e1)))
                    .lineTo(r1Out);
            follow(b, rightOut);
            b.lineTo(r2Out.plus(n2.times(e2))).lineTo(l2Out.plus(n2.times(e2))).lineTo(l2Out);
            follow(b, leftOut);
        }

        List<Mark> marks = new ArrayList<>();
        if (flange > 0) {
            right.forEach(e -> marks.add(new Mark(MarkKind.BEND, e)));
            left.forEach(e -> marks.add(new Mark(MarkKind.BEND, e)));
        }
        RectPanel.endMarks(first, List.of(l1, r1), marks, tol);
        RectPanel.endMarks(second, List.of(r2, l2), marks, tol);
        return new Pattern(fitting, piece, count, b.close(), List.of(), marks, label);
    }

    private static void follow(ContourBuilder b, List<Edge> chain) {
        for (Edge e : chain) {
            if (e instanceof Arc a) {
                b.arcTo(a.centre(), a.end(), a.sweep() > 0);
            } else {
                b.lineTo(e.end());
            }
        }
    }

    /** Each edge moved {@code w} to the right of its running direction (outside a counter-clockwise outline). */
    static List<Edge> offset(List<Edge> chain, double w, String fitting) {
        List<Edge> out = new ArrayList<>();
        for (Edge e : chain) {
            if (e instanceof Arc a) {
                double r = a.sweep() > 0 ? a.radius() + w : a.radius() - w;
                if (!(r > 0)) {
                    throw new FittingException(fitting, "allowances.seam", "the flange allowance " + w
                            + " is wider than the cheek's inner radius " + a.radius());
                }
                out.add(new Arc(a.centre(), r, a.startAngle(), a.sweep()));
            } else {
                Point2 n = outward(e.end().minus(e.start()).unit()).times(w);
                out.add(new Line(e.start().plus(n), e.end().plus(n)));
            }
        }
        return out;
    }

    private static Point2 outward(Point2 d) {
        return new Point2(d.y(), -d.x());
    }
}
