package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.ShoeTapSpec;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import java.util.List;

/**
 * Rectangular tap with a 45 degree entry (shoe tap), or a straight tap when the entry is 0 (trade-reference
 * §13.7): two cheeks of area W H + E^2 / 2, a back wrapper D x H and a front wrapper D x ((H - E) + E sqrt 2) bent
 * at the knee; every piece carries the flange (or tabs) on its main edge, and the opening cut in the main is
 * (W + E) x D.
 */
public final class ShoeTapDeveloper {

    private ShoeTapDeveloper() {
    }

    private static List<double[]> tabList(double[][] tabs) {
        return List.of(tabs);
    }

    public static Development develop(ShoeTapSpec spec, DevelopContext ctx) {
        double w = spec.width();
        double h = spec.height();
        double e = spec.entry();
        Allowances a = spec.allowances();
        double flange = a.seam().left();
        double main = a.endA().width();
        double top = a.endB().width();
        boolean n = a.notch();
        boolean tabs = a.endA().kind() == EndKind.TABS;
        AllowanceTable table = AllowanceTable.in(ctx.unit());
        List<Point2> net = new ArrayList<>();
        List<Double> widths = new ArrayList<>();
        TabbedEdge.append(net, widths, new Point2(-e, 0), new Point2(w, 0),
                tabs ? tabList(table.tabs(w + e)) : List.of(new double[] {0, w + e}), main);
        List<Boolean> notch = new ArrayList<>();
        for (int i = 0; i < net.size(); i++) {
            notch.add(i == 0 && n);
        }
        net.addAll(List.of(new Point2(w, 0), new Point2(w, h), new Point2(0, h)));
        widths.addAll(List.of(flange, top, flange));
        notch.addAll(List.of(n, n, n));
        if (e > 0) {
            net.add(new Point2(0, e));
            widths.add(flange);
            notch.add(false); // the knee is an inside corner
        }
        Contour outline = AllowanceOutline.cut(spec.id(), "cheek", net, widths, notch, null, ctx.tolerance());
        List<Mark> marks = new ArrayList<>();
        RectPanel.endMarks(a.endA(), List.of(new Point2(-e, 0), new Point2(w, 0)), marks, ctx.tolerance());
        Point2 heelTop = new Point2(w, h);
        Point2 frontTop = new Point2(0, h);
        RectPanel.endMarks(a.endB(), List.of(heelTop, frontTop), marks, ctx.tolerance());
        if (flange > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(w, 0), heelTop)));
            marks.add(new Mark(MarkKind.BEND, new Line(frontTop, e > 0 ? new Point2(0, e) : Point2.ORIGIN)));
            if (e > 0) {
                marks.add(new Mark(MarkKind.BEND, new Line(new Point2(0, e), new Point2(-e, 0))));
            }
        }
        Pattern cheek = new Pattern(spec.id(), "cheek", 2, outline, List.of(), marks, new Point2(w / 2, h / 2));
        double slant = e * Math.sqrt(2);
        double frontLen = (h - e) + slant;
        List<double[]> wrapperTabs = tabs ? tabList(table.tabs(spec.depth())) : List.of();
        Pattern back = RectPanel.wrapper(spec.id(), "back", 1, spec.depth(), h, a, List.of(), MarkKind.BEND,
                wrapperTabs, ctx.tolerance());
        Pattern front = RectPanel.wrapper(spec.id(), "front", 1, spec.depth(), frontLen, a,
                e > 0 ? List.of(slant) : List.of(), MarkKind.BEND, wrapperTabs, ctx.tolerance());
        Layout cheekLayout = new Layout(List.of(
                LayoutValue.length("width", "tap width along the main", w),
                LayoutValue.length("height", "height above the main", h),
                LayoutValue.length("entry", "45 degree entry E (its height and its run along the main)", e),
                LayoutValue.length("slant", "slant edge of the entry, E sqrt 2", slant),
                LayoutValue.length("openingLength", "opening in the main, along the airflow (W + E)", w + e),
                LayoutValue.length("openingWidth", "opening in the main, across (depth)", spec.depth()),
                LayoutValue.area("netArea", "cheek area (net)", w * h + e * e / 2),
                LayoutValue.length("mainFlange", (tabs ? "tabs" : "flange") + " on the main edge", main),
                LayoutValue.length("blankWidth", "blank width with allowances", cheek.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", cheek.bounds().height())),
                List.of());
        Layout frontLayout = new Layout(List.of(
                LayoutValue.length("stretchOut", "front wrapper length (net)", frontLen),
                LayoutValue.length("knee", "knee bend from the main edge", slant),
                LayoutValue.length("width", "wrapper width (depth, net)", spec.depth()),
                LayoutValue.length("blankWidth", "blank width with allowances", front.bounds().width()),
                LayoutValue.length("blankHeight", "blank length with allowances", front.bounds().height())),
                List.of());
        return new Development(spec, List.of(new DevelopedPiece(cheek, cheekLayout),
                new DevelopedPiece(back, RectElbowDeveloper.wrapperLayout(h, spec.depth(), back, "back")),
                new DevelopedPiece(front, frontLayout)), List.of());
    }
}
