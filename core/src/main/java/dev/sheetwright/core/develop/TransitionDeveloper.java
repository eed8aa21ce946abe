package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.TransitionSpec;
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

/**
 * Rectangle-to-round transitions by triangulation (trade-reference §5.1; [S:COEY "Off-Centre Square to Round"],
 * [S:NAVY fig. 2-53]): the round end is divided into N equal parts (N a multiple of 4), each rectangle corner is
 * joined to the points of its own quadrant (a fan of triangles on the curved surface) and a flat triangle stands
 * on each rectangle side. Every triangle is laid out flat from its three true lengths (the placement routine of
 * §5.4), walking round from a seam at the middle of a side.
 *
 * <p>N for the pattern is chosen so that the chords of the round end stay within {@code tolerance.chord()} of
 * the circle (§5.1); the round end of the pattern is a polyline through the developed circle points. Rectangle
 * sides and seams are exact lines. Rectangle sizes are used as given (laid out to the ticket size, bends
 * ignored: trade-reference §0.3, common practice); the round end is taken to the mean line (§0.2).
 */
public final class TransitionDeveloper {

    /** Divisions of the round end in the hand-layout table (16 is common: trade-reference §5.1, §5.2). */
    public static final int TABLE_DIVISIONS = 16;
    /** Fewest divisions of a pattern: level-1 texts divide the round into 12 [S:COEY]. */
    static final int MIN_DIVISIONS = 12;
    /** Steepest side slope a project specification allows for transitions, degrees [S:SPEC15890]. */
    static final double SLOPE_LIMIT_DEG = 20.0;
    /** Steepest side slope of a diverging transition in a guide specification, degrees [S:UFGS15566A 2.10.1.1]. */
    static final double DIVERGING_LIMIT_DEG = 15.0;

    private TransitionDeveloper() {
    }

    /** What a developed point stands for on the fitting. */
    public enum Kind { SIDE_MIDDLE, CORNER, CIRCLE }

    /**
     * A point of the flat pattern: the middle of rectangle side {@code index} (0 front, 1 right, 2 back, 3 left),
     * rectangle corner {@code index} (0 front-right, 1 back-right, 2 back-left, 3 front-left), or circle point
     * {@code index} (counted counter-clockwise from the front). Indices past the last (4, N) are the closing
     * copies at the far end of a strip.
     */
    public record Vertex(Kind kind, int index, Point2 flat) {
    }

    /** A triangle of the strip, by indices into the vertex list. */
    public record Triangle(int a, int b, int c) {
    }

    /**
     * One developed piece as a strip of triangles. {@code base} lists the rectangle-side chain and {@code top}
     * the round-end chain, both in order from the starting seam.
     */
    public record Strip(int n, List<Vertex> vertices, List<Triangle> triangles, List<Integer> base,
            List<Integer> top) {

        public Strip {
            vertices = List.copyOf(vertices);
            triangles = List.copyOf(triangles);
            base = List.copyOf(base);
            top = List.copyOf(top);
        }

        Point2 at(int i) {
            return vertices.get(i).flat();
        }
    }

    /** The 3-D fitting: rectangle in z = 0 centred on the origin, circle of mean radius at height H. */
    record Solid(double width, double depth, double radius, double height, double ox, double oy, int n) {

        double[] point(Kind kind, int index) {
            return switch (kind) {
                case CORNER -> {
                    int i = Math.floorMod(index, 4);
                    double x = (i == 0 || i == 1) ? width / 2 : -width / 2;
                    double y = (i == 1 || i == 2) ? depth / 2 : -depth / 2;
                    yield new double[] {x, y, 0};
                }
                case SIDE_MIDDLE -> switch (Math.floorMod(index, 4)) {
                    case 0 -> new double[] {0, -depth / 2, 0};
                    case 1 -> new double[] {width / 2, 0, 0};
                    case 2 -> new double[] {0, depth / 2, 0};
                    default -> new double[] {-width / 2, 0, 0};
                };
                case CIRCLE -> {
                    double phi = -Math.PI / 2 + 2 * Math.PI * Math.floorMod(index, n) / n;
                    yield new double[] {ox + radius * Math.cos(phi), oy + radius * Math.sin(phi), height};
                }
            };
        }

        double trueLength(Kind k1, int i1, Kind k2, int i2) {
            double[] a = point(k1, i1);
            double[] b = point(k2, i2);
            return Math.sqrt(sq(a[0] - b[0]) + sq(a[1] - b[1]) + sq(a[2] - b[2]));
        }

        double planLength(Kind k1, int i1, Kind k2, int i2) {
            double[] a = point(k1, i1);
            double[] b = point(k2, i2);
            return Math.hypot(a[0] - b[0], a[1] - b[1]);
        }

        /** Side slopes from the vertical, degrees: front, right, back, left. */
        double[] sideSlopes() {
            return new double[] {
                Math.toDegrees(Math.atan2(Math.abs(depth / 2 + oy - radius), height)),
                Math.toDegrees(Math.atan2(Math.abs(width / 2 - ox - radius), height)),
                Math.toDegrees(Math.atan2(Math.abs(depth / 2 - oy - radius), height)),
                Math.toDegrees(Math.atan2(Math.abs(width / 2 + ox - radius), height))};
        }

        private static double sq(double v) {
            return v * v;
        }
    }

    /** Divisions of the round so that the chord sagitta stays within {@code chord}: N >= pi / acos(1 - chord/R). */
    public static int divisionsFor(double radius, double chord) {
        double n = chord >= radius ? MIN_DIVISIONS : Math.PI / Math.acos(1 - chord / radius);
        int four = (int) Math.ceil(n / 4 - 1e-9) * 4;
        return Math.max(MIN_DIVISIONS, four);
    }

    private static Solid solid(TransitionSpec spec, DevelopContext ctx, int n) {
        double d = ctx.mean(spec.diameter());
        if (!(d > 0)) {
            throw new FittingException(spec.id(), "diameter",
                    "the mean diameter is not positive after the thickness correction (" + d + ")");
        }
        if (n < 4 || n % 4 != 0) {
            throw new IllegalArgumentException("divisions must be a positive multiple of 4, got " + n);
        }
        return new Solid(spec.width(), spec.depth(), d / 2, spec.height(), spec.offsetX(), spec.offsetY(), n);
    }

    /**
     * The triangulated strips of every piece with the round divided into {@code n} parts ({@code n} a multiple
     * of 4), each laid flat from its seam: the seam's rectangle point at the origin, its circle point straight
     * above, the strip running to the right.
     */
    public static List<Strip> triangulate(TransitionSpec spec, DevelopContext ctx, int n) {
        Solid solid = solid(spec, ctx, n);
        int span = 4 / spec.pieces();
        List<Strip> strips = new ArrayList<>();
        for (int side = 0; side < 4; side += span) {
            strips.add(strip(solid, side, side + span));
        }
        return strips;
    }

    /** Lays flat the strip from the seam at the middle of side {@code from} to the one at side {@code to}. */
    private static Strip strip(Solid s, int from, int to) {
        int q = s.n() / 4;
        List<Vertex> v = new ArrayList<>();
        List<Triangle> tris = new ArrayList<>();
        List<Integer> base = new ArrayList<>();
        List<Integer> top = new ArrayList<>();
        v.add(new Vertex(Kind.SIDE_MIDDLE, from, Point2.ORIGIN));
        v.add(new Vertex(Kind.CIRCLE, from * q, new Point2(0,
                s.trueLength(Kind.SIDE_MIDDLE, from, Kind.CIRCLE, from * q))));
        base.add(0);
        top.add(1);
        int prev = -1;
        for (int corner = from; corner < to; corner++) {
            prev = advance(s, v, tris, base, top, true, Kind.CORNER, corner, prev);
            for (int k = corner * q + 1; k <= (corner + 1) * q; k++) {
                prev = advance(s, v, tris, base, top, false, Kind.CIRCLE, k, prev);
            }
        }
        advance(s, v, tris, base, top, true, Kind.SIDE_MIDDLE, to, prev);
        return new Strip(s.n(), v, tris, base, top);
    }

    /**
     * Adds the next point of the strip (a new base point or a new top point) by the SSS placement of
     * trade-reference §5.4, on the far side of the shared edge from the point the last triangle dropped.
     *
     * @return the index of the point dropped by this triangle
     */
    private static int advance(Solid s, List<Vertex> v, List<Triangle> tris, List<Integer> base, List<Integer> top,
            boolean onBase, Kind kind, int index, int prevDropped) {
        int ia = base.get(base.size() - 1);
        int ib = top.get(top.size() - 1);
        Vertex a = v.get(ia);
        Vertex b = v.get(ib);
        double dA = s.trueLength(a.kind(), a.index(), kind, index);
        double dB = s.trueLength(b.kind(), b.index(), kind, index);
        Point2 ab = b.flat().minus(a.flat());
        double c = ab.length();
        double along = (dA * dA - dB * dB + c * c) / (2 * c);
        double h = Math.sqrt(Math.max(dA * dA - along * along, 0));
        Point2 u = ab.times(1 / c);
        // first triangle: to the right of the seam (negative side of a -> b); then away from the dropped point
        double side = prevDropped < 0 ? -1 : -Math.signum(ab.cross(v.get(prevDropped).flat().minus(a.flat())));
        Point2 p = a.flat().plus(u.times(along)).plus(u.perpendicular().times(side * h));
        v.add(new Vertex(kind, index, p));
        int ip = v.size() - 1;
        tris.add(new Triangle(ia, ib, ip));
        if (onBase) {
            base.add(ip);
            return ia;
        }
        top.add(ip);
        return ib;
    }

    public static Development develop(TransitionSpec spec, DevelopContext ctx) {
        Tolerance tol = ctx.tolerance();
        double radius = ctx.mean(spec.diameter()) / 2;
        int n = divisionsFor(radius, tol.chord());
        Solid solid = solid(spec, ctx, n);
        List<Strip> strips = triangulate(spec, ctx, n);
        List<String> warnings = warnings(spec, solid);
        LayoutTable corners = cornerLineTable(spec, ctx, TABLE_DIVISIONS);
        LayoutTable seams = seamLineTable(spec, ctx);
        List<DevelopedPiece> pieces = new ArrayList<>();
        List<double[]> signatures = new ArrayList<>();
        List<Integer> counts = new ArrayList<>();
        List<Strip> distinct = new ArrayList<>();
        for (Strip st : strips) {
            double[] sig = signature(st);
            int same = -1;
            for (int i = 0; i < signatures.size() && same < 0; i++) {
                if (sameShape(signatures.get(i), sig, tol)) {
                    same = i;
                }
            }
            if (same >= 0) {
                counts.set(same, counts.get(same) + 1);
            } else {
                signatures.add(sig);
                counts.add(1);
                distinct.add(st);
            }
        }
        for (int i = 0; i < distinct.size(); i++) {
            Strip st = distinct.get(i);
            String name = switch (spec.pieces()) {
                case 1 -> "blank";
                case 2 -> distinct.size() == 1 ? "half" : "half-" + (i + 1);
                default -> distinct.size() == 1 ? "quarter" : "quarter-" + (i + 1);
            };
            Pattern p = pattern(spec, st, name, counts.get(i), tol);
            Layout layout = new Layout(List.of(
                    LayoutValue.length("meanDiameter", "round end mean diameter", 2 * radius),
                    LayoutValue.number("divisions", "divisions of the round end in the pattern", n),
                    LayoutValue.length("seamTrueLength", "true length of the starting seam line",
                            st.at(0).distance(st.at(1))),
                    LayoutValue.length("closingSeamLength", "length of the closing seam line on the pattern",
                            st.at(st.base().get(st.base().size() - 1)).distance(st.at(st.top().get(st.top().size() - 1)))),
                    LayoutValue.length("baseLength", "rectangle-end edge length of this piece (net)",
                            chainLength(st, st.base())),
                    LayoutValue.length("roundLength", "round-end edge length of this piece (net, chords)",
                            chainLength(st, st.top())),
                    LayoutValue.area("netArea", "net area of this piece", netArea(st)),
                    LayoutValue.angle("maxSideSlope", "steepest side slope from the vertical",
                            max(solid.sideSlopes())),
                    LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()),
                    LayoutValue.length("blankHeight", "blank height with allowances", p.bounds().height())),
                    List.of(corners, seams));
            pieces.add(new DevelopedPiece(p, layout));
        }
        return new Development(spec, pieces, warnings);
    }

    /**
     * True lengths of the lines from each rectangle corner to the circle points of its quadrant, the round
     * divided into {@code n} parts (trade-reference §5.2 table): corner, circle point, plan length, true length.
     */
    public static LayoutTable cornerLineTable(TransitionSpec spec, DevelopContext ctx, int n) {
        Solid s = solid(spec, ctx, n);
        int q = n / 4;
        List<List<Double>> rows = new ArrayList<>();
        for (int c = 0; c < 4; c++) {
            for (int k = c * q; k <= (c + 1) * q; k++) {
                rows.add(List.of((double) c, (double) (k % n), s.planLength(Kind.CORNER, c, Kind.CIRCLE, k),
                        s.trueLength(Kind.CORNER, c, Kind.CIRCLE, k)));
            }
        }
        return new LayoutTable("cornerLines", "corner lines, round divided into " + n,
                List.of("corner", "point", "plan length", "true length"), rows);
    }

    /** The line from the middle of each side to its tangent circle point (the possible seam lines). */
    private static LayoutTable seamLineTable(TransitionSpec spec, DevelopContext ctx) {
        Solid s = solid(spec, ctx, 4);
        List<List<Double>> rows = new ArrayList<>();
        for (int side = 0; side < 4; side++) {
            rows.add(List.of((double) side, s.planLength(Kind.SIDE_MIDDLE, side, Kind.CIRCLE, side),
                    s.trueLength(Kind.SIDE_MIDDLE, side, Kind.CIRCLE, side)));
        }
        return new LayoutTable("sideLines", "lines from the middle of each side (0 front, 1 right, 2 back, 3 left)"
                + " to the round", List.of("side", "plan length", "true length"), rows);
    }

    private static List<String> warnings(TransitionSpec spec, Solid s) {
        List<String> w = new ArrayList<>();
        double slope = max(s.sideSlopes());
        if (slope > SLOPE_LIMIT_DEG) {
            w.add(String.format(Locale.ROOT, "%s: a side slopes %.1f deg, steeper than the %.0f deg a project"
                    + " specification allows for transitions [S:SPEC15890]", spec.id(), slope, SLOPE_LIMIT_DEG));
        } else if (slope > DIVERGING_LIMIT_DEG) {
            w.add(String.format(Locale.ROOT, "%s: a side slopes %.1f deg; if the air diverges through this"
                    + " transition, a guide specification limits it to %.0f deg per side [S:UFGS15566A]",
                    spec.id(), slope, DIVERGING_LIMIT_DEG));
        }
        return w;
    }

    private static Pattern pattern(TransitionSpec spec, Strip st, String name, int count, Tolerance tol) {
        Allowances a = spec.allowances();
        List<Integer> order = new ArrayList<>(st.base());
        for (int i = st.top().size() - 1; i >= 0; i--) {
            order.add(st.top().get(i));
        }
        List<Point2> net = new ArrayList<>();
        for (int i : order) {
            net.add(st.at(i));
        }
        int nb = st.base().size();
        int m = net.size();
        if (signedArea(net) <= 0 || !AllowanceOutline.isSimple(net)) {
            throw new FittingException(spec.id(), "pieces", "the flat pattern of " + (spec.pieces() == 1
                    ? "one piece" : spec.pieces() + " pieces") + " laps over itself; split it into more pieces");
        }
        double[] widths = new double[m];
        boolean[] notch = new boolean[m];
        for (int i = 0; i < m; i++) {
            widths[i] = i < nb - 1 ? a.endA().width() : a.endB().width();
            notch[i] = a.notch() && (i < nb || i == m - 1);
        }
        widths[nb - 1] = a.seam().right();
        widths[m - 1] = a.seam().left();
        notch[nb] = a.notch();
        List<Point2> cut = AllowanceOutline.offset(net, widths, notch);
        if (!AllowanceOutline.isSimple(cut)) {
            throw new FittingException(spec.id(), "allowances", "the allowances of piece '" + name
                    + "' overlap each other; use narrower allowances or more pieces");
        }
        Contour outer = AllowanceOutline.contour(cut, tol);
        List<Mark> marks = new ArrayList<>();
        if (a.seam().right() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(net.get(nb - 1), net.get(nb))));
        }
        if (a.seam().left() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(net.get(m - 1), net.get(0))));
        }
        AllowanceOutline.endMarks(a.endA(), net.subList(0, nb), marks, tol);
        AllowanceOutline.endMarks(a.endB(), net.subList(nb, m), marks, tol);
        // bend lines where the flat triangles meet the corner fans
        for (Triangle t : st.triangles()) {
            int[] idx = {t.a(), t.b(), t.c()};
            int corners = 0;
            for (int i : idx) {
                corners += st.vertices().get(i).kind() == Kind.CORNER ? 1 : 0;
            }
            boolean halfFlat = st.vertices().get(t.a()).kind() == Kind.SIDE_MIDDLE
                    || st.vertices().get(t.c()).kind() == Kind.SIDE_MIDDLE;
            if (corners == 2 || halfFlat) {
                // a flat triangle: its corner-to-circle edges are bend lines
                for (int i : idx) {
                    for (int j : idx) {
                        if (i < j && st.vertices().get(i).kind() != st.vertices().get(j).kind()
                                && isCornerToCircle(st, i, j)) {
                            marks.add(new Mark(MarkKind.BEND, new Line(st.at(i), st.at(j))));
                        }
                    }
                }
            }
        }
        Triangle middle = st.triangles().get(st.triangles().size() / 2);
        Point2 label = st.at(middle.a()).plus(st.at(middle.b())).plus(st.at(middle.c())).times(1.0 / 3);
        return new Pattern(spec.id(), name, count, outer, List.of(), marks, label);
    }

    private static boolean isCornerToCircle(Strip st, int i, int j) {
        Kind a = st.vertices().get(i).kind();
        Kind b = st.vertices().get(j).kind();
        return (a == Kind.CORNER && b == Kind.CIRCLE) || (a == Kind.CIRCLE && b == Kind.CORNER);
    }

    /** Flat edge lengths of every triangle in strip order: equal lists mean the same piece, turned. */
    private static double[] signature(Strip st) {
        double[] sig = new double[3 * st.triangles().size()];
        int i = 0;
        for (Triangle t : st.triangles()) {
            sig[i++] = st.at(t.a()).distance(st.at(t.b()));
            sig[i++] = st.at(t.b()).distance(st.at(t.c()));
            sig[i++] = st.at(t.c()).distance(st.at(t.a()));
        }
        return sig;
    }

    private static boolean sameShape(double[] a, double[] b, Tolerance tol) {
        if (a.length != b.length) {
            return false;
        }
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i] - b[i]) > tol.linear()) {
                return false;
            }
        }
        return true;
    }

    private static double chainLength(Strip st, List<Integer> chain) {
        double sum = 0;
        for (int i = 0; i + 1 < chain.size(); i++) {
            sum += st.at(chain.get(i)).distance(st.at(chain.get(i + 1)));
        }
        return sum;
    }

    private static double netArea(Strip st) {
        double sum = 0;
        for (Triangle t : st.triangles()) {
            sum += Math.abs(st.at(t.b()).minus(st.at(t.a())).cross(st.at(t.c()).minus(st.at(t.a())))) / 2;
        }
        return sum;
    }

    private static double signedArea(List<Point2> ring) {
        double twice = 0;
        for (int i = 0; i < ring.size(); i++) {
            twice += ring.get(i).cross(ring.get((i + 1) % ring.size()));
        }
        return twice / 2;
    }

    private static double max(double[] values) {
        double m = values[0];
        for (double v : values) {
            m = Math.max(m, v);
        }
        return m;
    }
}
