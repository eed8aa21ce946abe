package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.RectOffsetSpec;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import java.util.List;

/**
 * Rectangular S offset (trade-reference §13.5): the centre line is two reverse arcs of radius
 * R = (L^2 + O^2) / (4 O), each of angle alpha = 2 atan(O / L). Each cheek edge is an arc of R - W/2 and one of
 * R + W/2, swapped at the point of reverse curvature; both wrappers are 2 R alpha long; cheek area W x 2 R alpha.
 */
public final class RectOffsetDeveloper {

    private RectOffsetDeveloper() {
    }

    public static Development develop(RectOffsetSpec spec, DevelopContext ctx) {
        double w = spec.width();
        double r = spec.radius();
        double al = spec.arcAngle();
        double inner = r - w / 2;
        Allowances a = spec.allowances();
        double flange = AllowanceTable.in(ctx.unit()).curvedEdgeFlange(a.seam());
        if (!(inner > flange)) {
            throw new FittingException(spec.id(), "offset", "the offset " + spec.offset() + " over the length "
                    + spec.length() + " bends the throat of a " + w + " wide cheek to a radius of " + inner
                    + " (R " + r + " less W/2), which must exceed the flange allowance " + flange
                    + "; make the length longer or the offset smaller");
        }
        Point2 c1 = new Point2(r, 0);
        Point2 c2 = c1.plus(Point2.polar(2 * r, Math.PI - al));
        List<Edge> right = List.of(new Arc(c1, inner, Math.PI, -al), new Arc(c2, r + w / 2, -al, al));
        List<Edge> left = List.of(new Arc(c2, inner, 0, -al), new Arc(c1, r + w / 2, Math.PI - al, al));
        Point2 reverse = c1.plus(Point2.polar(r, Math.PI - al));
        Pattern cheek = CheekBlank.build(spec.id(), "cheek", 2, right, left, flange, a.endA(), a.endB(), a.notch(),
                reverse, ctx.tolerance());
        double wrapperLen = 2 * r * al;
        Pattern wrapper = RectPanel.wrapper(spec.id(), "wrapper", 2, spec.depth(), wrapperLen, a,
                List.of(wrapperLen / 2), MarkKind.LAYOUT, ctx.tolerance());
        Layout cheekLayout = new Layout(List.of(
                LayoutValue.length("radius", "centre-line radius R of each arc", r),
                LayoutValue.angle("arcAngle", "angle of each arc", Math.toDegrees(al)),
                LayoutValue.length("innerRadius", "inner arc radius R - W/2", inner),
                LayoutValue.length("outerRadius", "outer arc radius R + W/2", r + w / 2),
                LayoutValue.length("offset", "offset of the centre line", spec.offset()),
                LayoutValue.length("length", "advance (length)", spec.length()),
                LayoutValue.length("edge", "each cheek edge (net)", wrapperLen),
                LayoutValue.area("netArea", "cheek area (net)", w * wrapperLen),
                LayoutValue.length("flange", "flange allowance on both edges", flange),
                LayoutValue.length("blankWidth", "blank width with allowances", cheek.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", cheek.bounds().height())),
                List.of());
        return new Development(spec, List.of(new DevelopedPiece(cheek, cheekLayout),
                new DevelopedPiece(wrapper, RectElbowDeveloper.wrapperLayout(wrapperLen, spec.depth(), wrapper,
                        "each"))), List.of());
    }
}
