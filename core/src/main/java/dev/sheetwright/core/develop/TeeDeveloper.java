package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.TeeSpec;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

/**
 * Tees, laterals and taps by parallel-line development of the branch, with the hole laid out on the main's
 * stretch-out (trade-reference §4.1; [S:ATK "Oblique tee-piece for unequal pipes", "Offside tee-piece"],
 * [S:KITT]).
 *
 * <p>Branch pattern: stretch-out {@code x = r theta} along x from the seam at {@code theta = 0} (the element on
 * the acute-angle side), the straight branch end on y = 0 and the joint curve at {@code y = T - t(theta)}. The
 * joint curve is not a circle arc, so it is a polyline whose points lie on the true curve, spaced so that every
 * chord stays within {@code tolerance.chord()} of the curve (adaptive halving from the 12 layout divisions).
 *
 * <p>Main pattern: the main's blank (stretch-out along x, length along y) with its seam at the bottom of the
 * main, so the top line is the middle of the blank; the hole is centred there and on the main's length.
 */
public final class TeeDeveloper {

    /** Divisions of the hand-layout table (trade-reference §4.2 works with 12). */
    static final int TABLE_DIVISIONS = 12;
    private static final int MAX_HALVINGS = 40;

    private TeeDeveloper() {
    }

    /**
     * The closed-form geometry of §4.1 on mean radii: main radius {@code bigR}, branch radius {@code r}, branch
     * angle {@code alpha} (rad), offset {@code e}, branch end distance {@code end} (T). Angles theta in radians.
     */
    public record Intersection(double bigR, double r, double alpha, double e, double end) {

        /** Sideways coordinate of the element at theta. */
        public double yb(double theta) {
            return e + r * Math.sin(theta);
        }

        /** Distance t along the branch axis from the axis foot to the joint. */
        public double t(double theta) {
            double y = yb(theta);
            double z = Math.sqrt(Math.max(bigR * bigR - y * y, 0));
            return (r * Math.cos(theta) * Math.cos(alpha) + z) / Math.sin(alpha);
        }

        /** Element length from the branch end to the joint: the branch ordinate T - t. */
        public double ordinate(double theta) {
            return end - t(theta);
        }

        /** Arc length round the main from its top line to the hole point. */
        public double holeS(double theta) {
            return bigR * Math.asin(Math.max(-1, Math.min(1, yb(theta) / bigR)));
        }

        /** Position of the hole point along the main axis. */
        public double holeU(double theta) {
            return r * Math.cos(theta) * Math.sin(alpha) + t(theta) * Math.cos(alpha);
        }

        Point2 branchPoint(double theta) {
            return new Point2(r * theta, ordinate(theta));
        }

        Point2 holePoint(double theta) {
            return new Point2(holeS(theta), holeU(theta));
        }
    }

    public static Development develop(TeeSpec spec, DevelopContext ctx) {
        Tolerance tol = ctx.tolerance();
        double dMain = ctx.mean(spec.main());
        double dBranch = ctx.mean(spec.branch());
        if (!(dBranch > 0)) {
            throw new FittingException(spec.id(), "branch",
                    "the mean diameter is not positive after the thickness correction (" + dBranch + ")");
        }
        double bigR = dMain / 2;
        double r = dBranch / 2;
        double e = spec.offset();
        if (Math.abs(e) + r > bigR + tol.linear()) {
            throw new FittingException(spec.id(), "offset", String.format(Locale.ROOT,
                    "the branch (mean radius %.4f) offset by %.4f runs past the side of the main (mean radius %.4f);"
                            + " |offset| + branch radius must not exceed the main radius", r, e, bigR));
        }
        Intersection x = new Intersection(bigR, r, Math.toRadians(spec.angle()), e, spec.length());
        List<Double> thetas = samples(x, tol);
        double shortest = Double.POSITIVE_INFINITY;
        double longest = 0;
        for (double th : thetas) {
            shortest = Math.min(shortest, x.ordinate(th));
            longest = Math.max(longest, x.ordinate(th));
        }
        if (!(shortest > tol.linear())) {
            throw new FittingException(spec.id(), "length", String.format(Locale.ROOT,
                    "the branch end (%.4f along the branch axis) does not clear the main: the shortest element would"
                            + " be %.4f; make the length larger than %.4f", spec.length(), shortest,
                    spec.length() - shortest));
        }
        List<String> warnings = new ArrayList<>();
        if (spec.branch() == spec.main()) {
            warnings.add(spec.id() + ": the branch is as large as the main; the hole takes half the main's"
                    + " circumference (trade-reference §4.1)");
        }
        if (!spec.withMain() && spec.allowances().endB().kind() == EndKind.NONE) {
            warnings.add(spec.id() + ": a tap with no allowance on its joint edge has nothing to fasten it to the"
                    + " main; a flange or tabs are usual (common practice, trade-reference §4.3)");
        }

        Extent s = extent(x, thetas, true);
        Extent u = extent(x, thetas, false);
        Layout branchLayout = new Layout(List.of(
                LayoutValue.length("mainMeanDiameter", "main mean diameter", dMain),
                LayoutValue.length("branchMeanDiameter", "branch mean diameter", dBranch),
                LayoutValue.angle("angle", "branch angle to the main", spec.angle()),
                LayoutValue.length("offset", "sideways offset of the branch axis", e),
                LayoutValue.length("stretchOut", "branch stretch-out (net)", 2 * Math.PI * r),
                LayoutValue.length("shortestElement", "shortest element (branch end to joint)", shortest),
                LayoutValue.length("longestElement", "longest element (branch end to joint)", longest),
                LayoutValue.length("holeWidth", "hole overall round the main", s.max - s.min),
                LayoutValue.length("holeLength", "hole overall along the main", u.max - u.min),
                LayoutValue.number("jointPoints", "points on the joint curve of the pattern", thetas.size())),
                List.of(table(x)));
        List<DevelopedPiece> pieces = new ArrayList<>();
        pieces.add(new DevelopedPiece(branch(spec, x, thetas, tol), branchLayout));
        if (spec.withMain()) {
            pieces.add(main(spec, x, thetas, s, u, dMain, tol));
        }
        return new Development(spec, pieces, warnings);
    }

    /** The layout table at 12 divisions: theta, x, ordinate, hole s, hole u (as trade-reference §4.2). */
    private static LayoutTable table(Intersection x) {
        List<List<Double>> rows = new ArrayList<>();
        for (int i = 0; i <= TABLE_DIVISIONS; i++) {
            double th = 2 * Math.PI * i / TABLE_DIVISIONS;
            rows.add(List.of(360.0 * i / TABLE_DIVISIONS, x.r() * th, x.ordinate(th), x.holeS(th), x.holeU(th)));
        }
        return new LayoutTable("elements", "element lengths and hole points per division",
                List.of("theta (deg)", "x", "ordinate", "hole s", "hole u"), rows);
    }

    /**
     * Values of theta in [0, 2 pi] (both ends included) at which the joint curve (on the branch) and the hole
     * curve (on the main) are sampled: the 12 layout divisions and any point where the element touches the side
     * of the main, then halving every step whose chord strays more than the chord tolerance from either curve.
     */
    static List<Double> samples(Intersection x, Tolerance tol) {
        TreeSet<Double> start = new TreeSet<>();
        for (int i = 0; i <= TABLE_DIVISIONS; i++) {
            start.add(2 * Math.PI * i / TABLE_DIVISIONS);
        }
        for (double side : new double[] {x.bigR(), -x.bigR()}) {
            double sin = (side - x.e()) / x.r();
            if (Math.abs(sin) <= 1) {
                double a = Math.asin(sin);
                for (double th : new double[] {a, Math.PI - a, a + 2 * Math.PI}) {
                    if (th > 0 && th < 2 * Math.PI) {
                        start.add(th);
                    }
                }
            }
        }
        List<Double> base = new ArrayList<>(start);
        List<Double> out = new ArrayList<>();
        for (int i = 0; i + 1 < base.size(); i++) {
            out.add(base.get(i));
            refine(x, base.get(i), base.get(i + 1), tol.chord(), tol.linear(), 0, out);
        }
        out.add(base.get(base.size() - 1));
        return out;
    }

    private static void refine(Intersection x, double a, double b, double chord, double linear, int depth,
            List<Double> out) {
        if (depth >= MAX_HALVINGS || (b - a) * x.r() < linear) {
            return;
        }
        double sag = Math.max(sagitta(x::branchPoint, a, b), sagitta(x::holePoint, a, b));
        if (sag <= chord) {
            return;
        }
        double m = (a + b) / 2;
        refine(x, a, m, chord, linear, depth + 1, out);
        out.add(m);
        refine(x, m, b, chord, linear, depth + 1, out);
    }

    /** Largest distance of the curve from the chord between theta a and b, probed at quarter points. */
    private static double sagitta(java.util.function.DoubleFunction<Point2> curve, double a, double b) {
        Point2 p = curve.apply(a);
        Point2 q = curve.apply(b);
        double worst = 0;
        for (double f : new double[] {0.25, 0.5, 0.75}) {
            worst = Math.max(worst, distanceToSegment(curve.apply(a + f * (b - a)), p, q));
        }
        return worst;
    }

    private static double distanceToSegment(Point2 c, Point2 p, Point2 q) {
        Point2 d = q.minus(p);
        double len2 = d.dot(d);
        double k = len2 == 0 ? 0 : Math.max(0, Math.min(1, c.minus(p).dot(d) / len2));
        return c.distance(p.plus(d.times(k)));
    }

    private record Extent(double min, double max) {
    }

    /** Overall extent of the hole round the main ({@code round}) or along it, refined between samples. */
    private static Extent extent(Intersection x, List<Double> thetas, boolean round) {
        java.util.function.DoubleUnaryOperator f = round ? x::holeS : x::holeU;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < thetas.size(); i++) {
            double lo = thetas.get(Math.max(0, i - 1));
            double hi = thetas.get(Math.min(thetas.size() - 1, i + 1));
            max = Math.max(max, golden(f, lo, hi, 1));
            min = Math.min(min, golden(f, lo, hi, -1));
        }
        return new Extent(min, max);
    }

    /** Largest value of {@code sign * f} on [lo, hi] by golden-section search, returned as a value of f. */
    private static double golden(java.util.function.DoubleUnaryOperator f, double lo, double hi, int sign) {
        double g = (Math.sqrt(5) - 1) / 2;
        double a = lo;
        double b = hi;
        for (int k = 0; k < 60 && b - a > 1e-13; k++) {
            double c = b - g * (b - a);
            double d = a + g * (b - a);
            if (sign * f.applyAsDouble(c) > sign * f.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        double best = f.applyAsDouble((a + b) / 2);
        for (double end : new double[] {lo, hi}) {
            if (sign * f.applyAsDouble(end) > sign * best) {
                best = f.applyAsDouble(end);
            }
        }
        return best;
    }

    private static Pattern branch(TeeSpec spec, Intersection x, List<Double> thetas, Tolerance tol) {
        Allowances a = spec.allowances();
        double stretch = 2 * Math.PI * x.r();
        // the joint curve from theta = 2 pi back to 0 (the outline runs counter-clockwise)
        List<Point2> joint = new ArrayList<>();
        for (int i = thetas.size() - 1; i >= 0; i--) {
            double th = thetas.get(i);
            Point2 p = i == thetas.size() - 1 ? new Point2(stretch, x.ordinate(th)) : x.branchPoint(th);
            if (joint.isEmpty() || joint.get(joint.size() - 1).distance(p) > tol.linear()) {
                joint.add(p);
            }
        }
        List<Point2> net = new ArrayList<>();
        net.add(Point2.ORIGIN);
        net.add(new Point2(stretch, 0));
        net.addAll(joint);
        int n = net.size();
        double[] widths = new double[n];
        boolean[] notch = new boolean[n];
        widths[0] = a.endA().width();
        widths[1] = a.seam().right();
        for (int i = 2; i < n - 1; i++) {
            widths[i] = a.endB().width();
        }
        widths[n - 1] = a.seam().left();
        notch[0] = a.notch();
        notch[1] = a.notch();
        notch[2] = a.notch();
        notch[n - 1] = a.notch();
        List<Point2> cut = AllowanceOutline.offset(net, widths, notch);
        if (!AllowanceOutline.isSimple(cut)) {
            throw new FittingException(spec.id(), "allowances", "the allowances on the branch pattern overlap"
                    + " each other; use narrower allowances on the joint edge");
        }
        Contour outer = AllowanceOutline.contour(cut, tol);
        List<Mark> marks = new ArrayList<>();
        if (a.seam().right() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(net.get(1), net.get(2))));
        }
        if (a.seam().left() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(net.get(n - 1), net.get(0))));
        }
        AllowanceOutline.endMarks(a.endA(), List.of(net.get(0), net.get(1)), marks, tol);
        AllowanceOutline.endMarks(a.endB(), joint, marks, tol);
        Point2 label = new Point2(stretch / 2, Math.min(x.ordinate(0), x.ordinate(Math.PI)) / 2);
        return new Pattern(spec.id(), "branch", 1, outer, List.of(), marks, label);
    }

    private static DevelopedPiece main(TeeSpec spec, Intersection x, List<Double> thetas, Extent s, Extent u,
            double dMain, Tolerance tol) {
        double stretch = Math.PI * dMain;
        double length = spec.mainLength();
        double holeLength = u.max - u.min;
        if (holeLength >= length - 2 * tol.linear()) {
            throw new FittingException(spec.id(), "mainLength", String.format(Locale.ROOT,
                    "the hole is %.4f long along the main; the main (%.4f) must be longer", holeLength, length));
        }
        Pattern blank = RectangleBlank.build(spec.id(), "main", 1, stretch, length, spec.mainAllowances(), tol);
        double cx = stretch / 2;
        double cy = length / 2 - (u.max + u.min) / 2;
        List<Point2> hole = new ArrayList<>();
        for (int i = 0; i + 1 < thetas.size(); i++) {
            Point2 p = x.holePoint(thetas.get(i));
            Point2 q = new Point2(cx + p.x(), cy + p.y());
            if (hole.isEmpty() || hole.get(hole.size() - 1).distance(q) > tol.linear()) {
                hole.add(q);
            }
        }
        if (hole.get(0).distance(hole.get(hole.size() - 1)) <= tol.linear()) {
            hole.remove(hole.size() - 1);
        }
        Contour holeContour = AllowanceOutline.contour(hole, tol);
        List<Mark> marks = new ArrayList<>();
        for (Mark m : blank.marks()) {
            if (m.kind() != MarkKind.CENTRE) {
                marks.add(m); // the blank's centre line would cross the hole
            }
        }
        // the main's top line, from each end to the hole: the branch is lined up on it
        // (an offset branch whose axis misses the top line by more than its radius leaves the top line whole)
        double bottom = length;
        double top = length;
        if (Math.abs(x.e()) <= x.r()) {
            double th0 = Math.asin(-x.e() / x.r());
            bottom = cy + Math.min(x.holeU(th0), x.holeU(Math.PI - th0));
            top = cy + Math.max(x.holeU(th0), x.holeU(Math.PI - th0));
        }
        if (bottom > tol.linear()) {
            marks.add(new Mark(MarkKind.CENTRE, new Line(new Point2(cx, 0), new Point2(cx, bottom))));
        }
        if (length - top > tol.linear()) {
            marks.add(new Mark(MarkKind.CENTRE, new Line(new Point2(cx, top), new Point2(cx, length))));
        }
        Pattern p = new Pattern(spec.id(), "main", 1, blank.outer(), List.of(holeContour), marks,
                new Point2(stretch / 4, length / 2));
        Layout layout = Layout.of(
                LayoutValue.length("meanDiameter", "main mean diameter", dMain),
                LayoutValue.length("stretchOut", "main stretch-out (net)", stretch),
                LayoutValue.length("length", "main length (net)", length),
                LayoutValue.length("holeWidth", "hole overall round the main", s.max - s.min),
                LayoutValue.length("holeLength", "hole overall along the main", holeLength),
                LayoutValue.length("holeFromEndA", "hole start from the first end (net)", cy + u.min),
                LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", p.bounds().height()));
        return new DevelopedPiece(p, layout);
    }
}
