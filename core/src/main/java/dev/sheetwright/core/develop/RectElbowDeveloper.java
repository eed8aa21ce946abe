package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.RectElbowSpec;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.List;

/**
 * Rectangular elbows (trade-reference §13.3, §13.4). A radius elbow's cheek is an annular sector of throat radius
 * Ri and heel radius Ro = Ri + W over the angle, with a straight leg at each end; its wrappers are depth x (Ri A +
 * legs) and depth x (Ro A + legs). A square-throat elbow (throat radius 0) has a cheek bounded by the straight
 * throat and heel lines of both legs meeting on the mitre line; its wrappers are bent on the mitre.
 */
public final class RectElbowDeveloper {

    private RectElbowDeveloper() {
    }

    public static Development develop(RectElbowSpec spec, DevelopContext ctx) {
        return spec.squareThroat() ? square(spec, ctx) : radius(spec, ctx);
    }

    private static Development radius(RectElbowSpec spec, DevelopContext ctx) {
        double ri = spec.throatRadius();
        double ro = ri + spec.width();
        double a = Math.toRadians(spec.angle());
        double e = spec.legs();
        Allowances al = spec.allowances();
        double flange = AllowanceTable.in(ctx.unit()).curvedEdgeFlange(al.seam());
        if (flange >= ri) {
            throw new FittingException(spec.id(), "throatRadius", "the throat radius " + ri
                    + " must be larger than the cheek's flange allowance " + flange);
        }
        Point2 ua = Point2.polar(1, a);
        Point2 ta = new Point2(-Math.sin(a), Math.cos(a));
        List<Edge> heel = new ArrayList<>();
        if (e > 0) {
            heel.add(new Line(new Point2(ro, -e), new Point2(ro, 0)));
        }
        heel.add(new Arc(Point2.ORIGIN, ro, 0, a));
        if (e > 0) {
            heel.add(new Line(ua.times(ro), ua.times(ro).plus(ta.times(e))));
        }
        List<Edge> throat = new ArrayList<>();
        if (e > 0) {
            throat.add(new Line(ua.times(ri).plus(ta.times(e)), ua.times(ri)));
        }
        throat.add(new Arc(Point2.ORIGIN, ri, a, -a));
        if (e > 0) {
            throat.add(new Line(new Point2(ri, 0), new Point2(ri, -e)));
        }
        Point2 label = Point2.polar((ri + ro) / 2, a / 2);
        Pattern cheek = CheekBlank.build(spec.id(), "cheek", 2, heel, throat, flange, al.endA(), al.endB(),
                al.notch(), label, ctx.tolerance());
        double throatLen = ri * a + 2 * e;
        double heelLen = ro * a + 2 * e;
        List<Double> tangents = e > 0 ? List.of(e, throatLen - e) : List.of();
        Pattern throatW = RectPanel.wrapper(spec.id(), "throat", 1, spec.depth(), throatLen, al, tangents,
                MarkKind.LAYOUT, ctx.tolerance());
        Pattern heelW = RectPanel.wrapper(spec.id(), "heel", 1, spec.depth(), heelLen,
                al, e > 0 ? List.of(e, heelLen - e) : List.of(), MarkKind.LAYOUT, ctx.tolerance());
        Layout cheekLayout = new Layout(List.of(
                LayoutValue.length("throatRadius", "throat radius Ri", ri),
                LayoutValue.length("heelRadius", "heel radius Ro", ro),
                LayoutValue.length("centreRadius", "centre-line radius", (ri + ro) / 2),
                LayoutValue.angle("angle", "angle of the turn", spec.angle()),
                LayoutValue.length("legs", "straight leg at each end", e),
                LayoutValue.length("throatEdge", "throat edge length (net)", throatLen),
                LayoutValue.length("heelEdge", "heel edge length (net)", heelLen),
                LayoutValue.area("netArea", "cheek area (net)", spec.width() * ((ri + ro) / 2 * a + 2 * e)),
                LayoutValue.length("flange", "flange allowance on throat and heel", flange),
                LayoutValue.length("blankWidth", "blank width with allowances", cheek.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", cheek.bounds().height())),
                List.of());
        return new Development(spec, List.of(new DevelopedPiece(cheek, cheekLayout),
                new DevelopedPiece(throatW, wrapperLayout(throatLen, spec.depth(), throatW, "throat")),
                new DevelopedPiece(heelW, wrapperLayout(heelLen, spec.depth(), heelW, "heel"))), List.of());
    }

    private static Development square(RectElbowSpec spec, DevelopContext ctx) {
        double w = spec.width();
        double a = Math.toRadians(spec.angle());
        double e = spec.legs();
        Allowances al = spec.allowances();
        double flange = al.seam().left();
        Point2 ua = Point2.polar(1, a);
        Point2 ta = new Point2(-Math.sin(a), Math.cos(a));
        double heelRun = w * Math.tan(a / 2); // from a leg's end line extended to the mitre, along the heel
        Point2 h = new Point2(w, heelRun);
        List<Point2> net = new ArrayList<>();
        List<Double> widths = new ArrayList<>();
        List<Boolean> notch = new ArrayList<>();
        double ea = al.endA().width();
        double eb = al.endB().width();
        boolean n = al.notch();
        net.add(new Point2(0, -e));
        widths.add(ea);
        notch.add(n);
        net.add(new Point2(w, -e));
        widths.add(flange);
        notch.add(n);
        net.add(h);
        widths.add(flange);
        notch.add(n);
        net.add(ua.times(w).plus(ta.times(e)));
        widths.add(eb);
        notch.add(n);
        net.add(ta.times(e));
        if (e > 0) {
            widths.add(flange);
            notch.add(n);
            net.add(Point2.ORIGIN);
            widths.add(flange);
            notch.add(false);
        } else {
            net.remove(net.size() - 1); // the throat is a point: the end lines meet at the origin
        }
        Contour outline = AllowanceOutline.cut(spec.id(), "cheek", net, widths, notch, null, ctx.tolerance());
        List<Mark> marks = new ArrayList<>();
        int m = net.size();
        for (int i = 0; i < m; i++) {
            Point2 p = net.get(i);
            Point2 q = net.get((i + 1) % m);
            boolean end = i == 0 || i == 3;
            if (end) {
                RectPanel.endMarks(i == 0 ? al.endA() : al.endB(), List.of(p, q), marks, ctx.tolerance());
            } else if (flange > 0) {
                marks.add(new Mark(MarkKind.BEND, new Line(p, q)));
            }
        }
        marks.add(new Mark(MarkKind.LAYOUT, new Line(Point2.ORIGIN, h)));
        Pattern cheek = new Pattern(spec.id(), "cheek", 2, outline, List.of(), marks, new Point2(w / 2, (heelRun - e) / 2));
        double heelLen = 2 * (e + heelRun);
        double throatLen = 2 * e;
        double mitre = w / Math.cos(a / 2);
        Pattern heelW = RectPanel.wrapper(spec.id(), "heel", 1, spec.depth(), heelLen, al, List.of(heelLen / 2),
                MarkKind.BEND, ctx.tolerance());
        List<DevelopedPiece> pieces = new ArrayList<>();
        double area = w * (w * Math.tan(a / 2)) + 2 * e * w;
        pieces.add(new DevelopedPiece(cheek, new Layout(List.of(
                LayoutValue.angle("angle", "angle of the turn", spec.angle()),
                LayoutValue.length("legs", "straight leg at each end (throat line)", e),
                LayoutValue.length("heelLine", "heel line of each leg to the mitre", e + heelRun),
                LayoutValue.length("mitre", "mitre line, throat to heel (vane rail at 90 degrees)", mitre),
                LayoutValue.area("netArea", "cheek area (net)", area),
                LayoutValue.length("flange", "flange allowance on throat and heel", flange),
                LayoutValue.length("blankWidth", "blank width with allowances", cheek.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", cheek.bounds().height())),
                List.of())));
        pieces.add(new DevelopedPiece(heelW, wrapperLayout(heelLen, spec.depth(), heelW, "heel")));
        if (throatLen > 0) {
            Pattern throatW = RectPanel.wrapper(spec.id(), "throat", 1, spec.depth(), throatLen, al,
                    List.of(e), MarkKind.BEND, ctx.tolerance());
            pieces.add(new DevelopedPiece(throatW, wrapperLayout(throatLen, spec.depth(), throatW, "throat")));
        }
        List<String> warnings = throatLen > 0 ? List.of() : List.of("fitting " + spec.id()
                + ": a square throat with no legs has no throat wrapper; the cheeks meet at the throat corner");
        return new Development(spec, pieces, warnings);
    }

    static Layout wrapperLayout(double length, double depth, Pattern p, String which) {
        return new Layout(List.of(
                LayoutValue.length("stretchOut", which + " wrapper stretch-out (net)", length),
                LayoutValue.length("width", "wrapper width (depth, net)", depth),
                LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()),
                LayoutValue.length("blankHeight", "blank length with allowances", p.bounds().height())),
                List.of());
    }
}
