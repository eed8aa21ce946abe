package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.RectConstruction;
import dev.sheetwright.core.fitting.RectTransitionSpec;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * Rectangle-to-rectangle transition (trade-reference §13.6). Each side face joins two parallel edges, so it is a
 * flat trapezoid; its true shape is laid out from its corner points by true lengths (three sides of a triangle,
 * twice). Four faces with seams at every corner (flanges on the width faces, pockets on the depth faces), or two L
 * halves, each a width face and a depth face unfolded about their common corner line and bent on it.
 */
public final class RectTransitionDeveloper {

    private RectTransitionDeveloper() {
    }

    /** A corner of the fitting in 3-D: end 1 in the plane z = 0, end 2 in z = length. */
    record Corner(double x, double y, double z) {

        Corner minus(Corner o) {
            return new Corner(x - o.x, y - o.y, z - o.z);
        }

        double dot(Corner o) {
            return x * o.x + y * o.y + z * o.z;
        }

        Corner cross(Corner o) {
            return new Corner(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
        }

        double length() {
            return Math.sqrt(dot(this));
        }

        double distance(Corner o) {
            return minus(o).length();
        }
    }

    /**
     * One side face: {@code a1 -> b1} its edge on end 1, {@code b2}, {@code a2} the matching corners of end 2, in
     * counter-clockwise order seen from outside; {@code cheek} for a width face (flanges), else a depth face
     * (pockets).
     */
    record Face(String name, Corner a1, Corner b1, Corner b2, Corner a2, boolean cheek) {
    }

    public static Development develop(RectTransitionSpec spec, DevelopContext ctx) {
        List<Face> faces = faces(spec);
        for (Face f : faces) {
            requireFlat(spec.id(), f, ctx.tolerance());
        }
        Face bottom = faces.get(0);
        Face right = faces.get(1);
        Face top = faces.get(2);
        Face left = faces.get(3);
        List<DevelopedPiece> pieces = new ArrayList<>();
        if (spec.construction() == RectConstruction.FACES) {
            for (Face f : faces) {
                pieces.add(single(spec, f, ctx.tolerance()));
            }
        } else {
            pieces.add(half(spec, "l-half-1", bottom, right, ctx.tolerance()));
            pieces.add(half(spec, "l-half-2", top, left, ctx.tolerance()));
        }
        return new Development(spec, pieces, List.of());
    }

    /** The four side faces: bottom (y-), right (x+), top (y+), left (x-). */
    static List<Face> faces(RectTransitionSpec s) {
        double w1 = s.width() / 2;
        double d1 = s.depth() / 2;
        double w2 = s.toWidth() / 2;
        double d2 = s.toDepth() / 2;
        double x = s.offsetX();
        double y = s.offsetY();
        double l = s.length();
        Corner p1 = new Corner(-w1, -d1, 0);
        Corner q1 = new Corner(w1, -d1, 0);
        Corner r1 = new Corner(w1, d1, 0);
        Corner s1 = new Corner(-w1, d1, 0);
        Corner p2 = new Corner(x - w2, y - d2, l);
        Corner q2 = new Corner(x + w2, y - d2, l);
        Corner r2 = new Corner(x + w2, y + d2, l);
        Corner s2 = new Corner(x - w2, y + d2, l);
        return List.of(new Face("bottom", p1, q1, q2, p2, true), new Face("right", q1, r1, r2, q2, false),
                new Face("top", r1, s1, s2, r2, true), new Face("left", s1, p1, p2, s2, false));
    }

    /**
     * A face must be flat to be cut from sheet: its fourth corner must lie in the plane of the other three. When it
     * does not, the edge pair at fault (the face's end-1 and end-2 edges, which are then not parallel) is named.
     */
    static void requireFlat(String id, Face f, Tolerance tol) {
        Corner n = f.b1().minus(f.a1()).cross(f.b2().minus(f.a1()));
        double off = Math.abs(n.dot(f.a2().minus(f.a1()))) / n.length();
        if (off > tol.linear()) {
            throw new FittingException(id, "to", "the " + f.name() + " face would twist: its edge on end 1 and its"
                    + " edge on end 2 are not parallel (a corner is " + off + " out of the plane of the other three),"
                    + " so the face is not flat and cannot be cut from sheet");
        }
    }

    /**
     * The flat point at true distances {@code ra} from {@code pa} and {@code rb} from {@code pb}, on the left of
     * pa -> pb ({@code side} +1) or on its right (-1).
     */
    private static Point2 place(Point2 pa, Point2 pb, double ra, double rb, int side) {
        double base = pa.distance(pb);
        double along = (ra * ra - rb * rb + base * base) / (2 * base);
        double up = Math.sqrt(Math.max(ra * ra - along * along, 0));
        Point2 u = pb.minus(pa).unit();
        return pa.plus(u.times(along)).plus(u.perpendicular().times(side * up));
    }

    /** The flat corners of a face: a1 at the origin, b1 along +x, the end-2 corners above. */
    private static List<Point2> flat(Face f) {
        Point2 a1 = Point2.ORIGIN;
        Point2 b1 = new Point2(f.a1().distance(f.b1()), 0);
        Point2 b2 = place(a1, b1, f.a1().distance(f.b2()), f.b1().distance(f.b2()), 1);
        Point2 a2 = place(a1, b1, f.a1().distance(f.a2()), f.b1().distance(f.a2()), 1);
        return List.of(a1, b1, b2, a2);
    }

    private static DevelopedPiece single(RectTransitionSpec spec, Face f, Tolerance tol) {
        Allowances a = spec.allowances();
        double seam = f.cheek() ? a.seam().left() : a.seam().right();
        List<Point2> net = flat(f);
        List<Double> widths = List.of(a.endA().width(), seam, a.endB().width(), seam);
        boolean n = a.notch();
        Pattern p = outline(spec, f.name(), net, widths, List.of(n, n, n, n), null, List.of(), tol);
        return new DevelopedPiece(p, new Layout(faceValues("", f, net), List.of()));
    }

    private static DevelopedPiece half(RectTransitionSpec spec, String name, Face cheek, Face wrapper,
            Tolerance tol) {
        Allowances a = spec.allowances();
        List<Point2> c = flat(cheek);
        // the wrapper face shares the cheek's right edge b1-b2 (its own a1-a2): lay its far corners out beyond it
        Point2 wb1 = place(c.get(1), c.get(2), wrapper.a1().distance(wrapper.b1()),
                wrapper.a2().distance(wrapper.b1()), -1);
        Point2 wb2 = place(c.get(1), c.get(2), wrapper.a1().distance(wrapper.b2()),
                wrapper.a2().distance(wrapper.b2()), -1);
        List<Point2> net = List.of(c.get(0), c.get(1), wb1, wb2, c.get(2), c.get(3));
        double ea = a.endA().width();
        double eb = a.endB().width();
        List<Double> widths = List.of(ea, ea, a.seam().right(), eb, eb, a.seam().left());
        boolean n = a.notch();
        List<Boolean> notch = List.of(n, false, n, n, false, n);
        List<Boolean> vee = List.of(false, n && ea > 0, false, false, n && eb > 0, false);
        Pattern p = outline(spec, name, net, widths, notch, vee,
                List.of(new Mark(MarkKind.BEND, new Line(c.get(1), c.get(2)))), tol);
        List<LayoutValue> values = new ArrayList<>(faceValues(cheek.name() + ".", cheek, c));
        values.addAll(faceValues(wrapper.name() + ".", wrapper, List.of(c.get(1), wb1, wb2, c.get(2))));
        values.add(LayoutValue.length("bend", "corner bend line (true length)", c.get(1).distance(c.get(2))));
        values.add(LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()));
        values.add(LayoutValue.length("blankHeight", "blank height with allowances", p.bounds().height()));
        return new DevelopedPiece(p, new Layout(values, List.of()));
    }

    private static Pattern outline(RectTransitionSpec spec, String name, List<Point2> net, List<Double> widths,
            List<Boolean> notch, List<Boolean> vee, List<Mark> extra, Tolerance tol) {
        Contour cut = AllowanceOutline.cut(spec.id(), name, net, widths, notch, vee, tol);
        List<Mark> marks = new ArrayList<>(extra);
        int m = net.size();
        int half = m / 2;
        Allowances a = spec.allowances();
        RectPanel.endMarks(a.endA(), net.subList(0, half), marks, tol);
        RectPanel.endMarks(a.endB(), net.subList(half, m), marks, tol);
        for (int i = 0; i < m; i++) {
            if ((i == half - 1 || i == m - 1) && widths.get(i) > 0) {
                marks.add(new Mark(MarkKind.BEND, new Line(net.get(i), net.get((i + 1) % m))));
            }
        }
        Point2 label = Point2.ORIGIN;
        for (Point2 p : net) {
            label = label.plus(p.times(1.0 / m));
        }
        return new Pattern(spec.id(), name, 1, cut, List.of(), marks, label);
    }

    private static List<LayoutValue> faceValues(String prefix, Face f, List<Point2> flat) {
        double e1 = flat.get(0).distance(flat.get(1));
        double e2 = flat.get(2).distance(flat.get(3));
        double h = Math.abs(flat.get(1).minus(flat.get(0)).unit().cross(flat.get(3).minus(flat.get(0))));
        String who = prefix.isEmpty() ? "" : f.name() + " face: ";
        return List.of(
                LayoutValue.length(prefix + "end1Edge", who + "edge on end 1", e1),
                LayoutValue.length(prefix + "end2Edge", who + "edge on end 2", e2),
                LayoutValue.length(prefix + "trueHeight", who + "true height between the end edges", h),
                LayoutValue.length(prefix + "slantA", who + "slant edge at the start of end 1's edge (true length)",
                        flat.get(0).distance(flat.get(3))),
                LayoutValue.length(prefix + "slantB", who + "slant edge at the end of end 1's edge (true length)",
                        flat.get(1).distance(flat.get(2))),
                LayoutValue.area(prefix + "netArea", who + "face area (net)", (e1 + e2) / 2 * h));
    }
}
