package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.geom.Transform2;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Gored round elbows by parallel-line development (trade-reference §3; [S:COEY "Round Elbow"], [S:LONG p.52-54],
 * [S:NAVY ch.2]). With k = 2 (n - 1) half-gores of miter angle beta = A / k, the element at angle a round the
 * pipe (from the heel) is {@code y(a) = (R + r cos a) tan beta} long on each half-gore; the stretch-out runs along
 * x from the seam. The miter curves are sinusoids, cut as polylines within the chord tolerance.
 *
 * <p>Pieces are numbered from the first end. Piece j has its seam at {@code seamAt + j x 180 deg}: each piece is
 * turned half round against its neighbour, so all of them cut from one strip without waste (§3.4, see
 * {@link #strip}). Pieces that are the same shape (directly or turned 180 deg in the sheet) are one pattern with
 * a count.
 */
public final class ElbowDeveloper {

    /** Divisions of the ordinate table: the profile in 16 parts ([S:LONG p.52]). */
    static final int ORDINATE_DIVISIONS = 16;
    /** Largest miter angle that makes a smooth elbow (common practice, trade-reference §3.3). */
    static final double SMOOTH_MITER_DEG = 15;
    /** Round elbows above this diameter want 5 pieces for 90 deg and 3 for 45 deg ([S:UFGS15810N 2.2.3.2]). */
    static final double STAMPED_LIMIT_IN = 8;

    private ElbowDeveloper() {
    }

    /** The bend of one elbow on mean dimensions. */
    record Bend(double r, double radius, double angleDeg, int gores) {

        int halfGores() {
            return 2 * (gores - 1);
        }

        double tanBeta() {
            return Math.tan(Math.toRadians(angleDeg / halfGores()));
        }

        double stretchOut() {
            return 2 * Math.PI * r;
        }

        /** Element length of one half-gore at angle {@code a} (radians from the heel). */
        double ordinate(double a) {
            return (radius + r * Math.cos(a)) * tanBeta();
        }

        /** Height of the whole strip: k R tan beta. */
        double blankHeight() {
            return halfGores() * radius * tanBeta();
        }

        /** Miter curve of a piece with its seam at {@code seam} (radians), +h above (sign 1) or -h below (-1). */
        PlaneCurve miter(double seam, int sign) {
            return new PlaneCurve() {
                @Override
                public Point2 at(double x) {
                    return new Point2(x, sign * ordinate(seam + x / r));
                }

                @Override
                public Point2 tangent(double x) {
                    return new Point2(1, -sign * Math.sin(seam + x / r) * tanBeta());
                }
            };
        }

        static PlaneCurve straight() {
            return new PlaneCurve() {
                @Override
                public Point2 at(double x) {
                    return new Point2(x, 0);
                }

                @Override
                public Point2 tangent(double x) {
                    return new Point2(1, 0);
                }
            };
        }
    }

    /**
     * One piece described by what makes its pattern: which ends are straight (square-cut) rather than miters,
     * the seam angle (degrees, 0..360, rounded to 1e-6), the allowances on bottom and top edge and on the right
     * and left stretch-out edges.
     */
    record Gore(boolean bottomStraight, boolean topStraight, double seamDeg, EndAllowance bottom, EndAllowance top,
            double seamRight, double seamLeft) {

        Gore {
            seamDeg = Math.round((((seamDeg % 360) + 360) % 360) * 1e6) / 1e6;
            if (seamDeg == 360) {
                seamDeg = 0;
            }
        }

        /** The same piece turned 180 deg in the plane of the sheet (trade-reference §3.4). */
        Gore turned() {
            return new Gore(topStraight, bottomStraight, -seamDeg, top, bottom, seamLeft, seamRight);
        }

        /** The one of this and {@link #turned()} used as the pattern: straight end down, then smaller seam angle. */
        Gore canonical() {
            Comparator<Gore> order = Comparator.comparing((Gore g) -> !g.bottomStraight)
                    .thenComparingDouble(Gore::seamDeg)
                    .thenComparingDouble(g -> g.bottom.width())
                    .thenComparingDouble(Gore::seamRight);
            Gore t = turned();
            return order.compare(this, t) <= 0 ? this : t;
        }
    }

    public static Development develop(ElbowSpec spec, DevelopContext ctx) {
        Bend bend = bend(spec.id(), ctx.mean(spec.diameter()), spec.radius(), spec.angle(), spec.gores(),
                ctx.tolerance());
        List<Gore> gores = gores(bend.gores(), spec.seamAt().degrees(), spec.allowances(), spec.allowances().endA(),
                spec.allowances().endB(), spec.miterSeam());
        Layout layout = layout(bend, spec.seamAt().degrees(), List.of());
        List<DevelopedPiece> pieces = pieces(spec.id(), bend, gores, spec.allowances(), layout, "",
                ctx.tolerance());
        return new Development(spec, pieces, warnings(spec.id(), spec.diameter(), bend, ctx.unit()));
    }

    /**
     * The net pieces of one elbow (no allowances) laid out in one strip, piece 1 at the bottom: x from 0 to the
     * stretch-out, y from 0 to k R tan beta. Neighbours share their miter curve, so the strip is used without
     * waste (trade-reference §3.4).
     */
    public static List<Pattern> strip(ElbowSpec spec, DevelopContext ctx) {
        Bend bend = bend(spec.id(), ctx.mean(spec.diameter()), spec.radius(), spec.angle(), spec.gores(),
                ctx.tolerance());
        List<Gore> gores = gores(bend.gores(), spec.seamAt().degrees(), Allowances.NET, EndAllowance.NONE,
                EndAllowance.NONE, SeamAllowance.NONE);
        List<Pattern> placed = new ArrayList<>();
        double step = 2 * bend.radius() * bend.tanBeta();
        for (int j = 0; j < gores.size(); j++) {
            Pattern p = build(spec.id(), "piece-" + (j + 1), 1, bend, gores.get(j), Allowances.NET, ctx.tolerance());
            placed.add(p.transformed(Transform2.translation(0, j * step)));
        }
        return placed;
    }

    static Bend bend(String id, double meanDiameter, double radius, double angle, int gores, Tolerance tol) {
        double r = meanDiameter / 2;
        if (!(r > 0)) {
            throw new FittingException(id, "diameter", "the mean diameter is not positive after the thickness"
                    + " correction (" + meanDiameter + ")");
        }
        if (radius - r <= tol.linear()) {
            throw new FittingException(id, "radius", "the centre-line radius (" + radius
                    + ") must exceed the mean pipe radius (" + r + "); the throat would have no length");
        }
        return new Bend(r, radius, angle, gores);
    }

    /** The pieces of one elbow in order, as they lie in the strip. */
    static List<Gore> gores(int n, double seamDeg, Allowances al, EndAllowance first, EndAllowance last,
            SeamAllowance miter) {
        List<Gore> out = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            EndAllowance bottom = j == 0 ? first : lap(miter.left());
            EndAllowance top = j == n - 1 ? last : lap(miter.right());
            out.add(new Gore(j == 0, j == n - 1, seamDeg + 180.0 * j, bottom, top, al.seam().right(),
                    al.seam().left()));
        }
        return out;
    }

    static EndAllowance lap(double w) {
        return w > 0 ? new EndAllowance(EndKind.LAP, w) : EndAllowance.NONE;
    }

    /** Groups the pieces into distinct patterns (same shape directly or turned), with counts. */
    static List<DevelopedPiece> pieces(String id, Bend bend, List<Gore> gores, Allowances al, Layout layout,
            String prefix, Tolerance tol) {
        checkAllowances(id, bend, gores, al);
        Map<Gore, Integer> counts = new LinkedHashMap<>();
        for (Gore g : gores) {
            counts.merge(g.canonical(), 1, Integer::sum);
        }
        long ends = counts.keySet().stream().filter(Gore::bottomStraight).count();
        long middles = counts.size() - ends;
        int endNo = 0;
        int midNo = 0;
        List<DevelopedPiece> out = new ArrayList<>();
        for (Map.Entry<Gore, Integer> e : counts.entrySet()) {
            Gore g = e.getKey();
            String name;
            if (g.bottomStraight()) {
                name = ends == 1 ? "end" : "end-" + ++endNo;
            } else {
                name = middles == 1 ? "middle" : "middle-" + ++midNo;
            }
            out.add(new DevelopedPiece(build(id, prefix + name, e.getValue(), bend, g, al, tol), layout));
        }
        return out;
    }

    private static void checkAllowances(String id, Bend bend, List<Gore> gores, Allowances al) {
        double maxSeam = Math.max(al.seam().right(), al.seam().left());
        if (maxSeam > bend.stretchOut() / 2) {
            throw new FittingException(id, "allowances.seam", "a seam allowance (" + maxSeam
                    + ") is larger than half the stretch-out (" + bend.stretchOut() / 2 + ")");
        }
        double curvatureRadius = bend.r() / bend.tanBeta();
        for (Gore g : gores) {
            double w = Math.max(g.bottomStraight() ? 0 : g.bottom().width(), g.topStraight() ? 0 : g.top().width());
            if (w >= curvatureRadius) {
                throw new FittingException(id, "miterSeam", "the miter allowance (" + w
                        + ") is not smaller than the tightest bend of the miter curve (" + curvatureRadius + ")");
            }
        }
    }

    /** The pattern of one piece: straight ends on y = 0; a middle piece centred on y = 0. */
    static Pattern build(String id, String name, int count, Bend bend, Gore g, Allowances al, Tolerance tol) {
        double seam = Math.toRadians(g.seamDeg());
        PlaneCurve bottom = g.bottomStraight() ? Bend.straight() : bend.miter(seam, -1);
        PlaneCurve top = g.topStraight() ? Bend.straight() : bend.miter(seam, +1);
        SeamAllowance s = new SeamAllowance(al.seam().kind(), g.seamRight(), g.seamLeft());
        return CurvedBlank.build(id, name, count, bottom, top, 0, bend.stretchOut(), s, g.bottom(), g.top(),
                al.notch(), tol);
    }

    static Layout layout(Bend b, double seamDeg, List<LayoutValue> extra) {
        double t = b.tanBeta();
        List<LayoutValue> v = new ArrayList<>(List.of(
                LayoutValue.length("meanDiameter", "mean diameter", 2 * b.r()),
                LayoutValue.angle("angle", "elbow angle", b.angleDeg()),
                LayoutValue.number("gores", "pieces", b.gores()),
                LayoutValue.number("halfGores", "half-gores (backsets) k = 2 (n - 1)", b.halfGores()),
                LayoutValue.angle("miterAngle", "miter angle of a half-gore, beta = A / k", b.angleDeg() / b.halfGores()),
                LayoutValue.length("centreRadius", "centre-line radius R", b.radius()),
                LayoutValue.length("throatRadius", "throat radius R - r", b.radius() - b.r()),
                LayoutValue.length("heelRadius", "heel radius R + r (base line in the elevation)", b.radius() + b.r()),
                LayoutValue.length("heelOrdinate", "half-gore height at the heel (R + r) tan beta", (b.radius() + b.r()) * t),
                LayoutValue.length("centreOrdinate", "half-gore height at the side R tan beta", b.radius() * t),
                LayoutValue.length("throatOrdinate", "half-gore height at the throat (R - r) tan beta",
                        (b.radius() - b.r()) * t),
                LayoutValue.length("stretchOut", "stretch-out (net)", b.stretchOut()),
                LayoutValue.length("blankHeight", "height of the strip for the whole elbow, k R tan beta",
                        b.blankHeight()),
                LayoutValue.angle("seamAngle", "seam of the first piece, from the heel", seamDeg)));
        v.addAll(extra);
        List<List<Double>> rows = new ArrayList<>();
        for (int i = 0; i <= ORDINATE_DIVISIONS; i++) {
            double a = 2 * Math.PI * i / ORDINATE_DIVISIONS;
            double fromSeam = ((a - Math.toRadians(seamDeg)) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI);
            rows.add(List.of(Math.toDegrees(a), b.r() * a, b.r() * fromSeam, b.ordinate(a)));
        }
        LayoutTable table = new LayoutTable("ordinates",
                "half-gore ordinates: a from the heel, x along the stretch-out, y above the base line",
                List.of("a (deg)", "x from heel", "x from seam", "y"), rows);
        return new Layout(v, List.of(table));
    }

    static List<String> warnings(String id, double ticketDiameter, Bend b, dev.sheetwright.core.units.LengthUnit unit) {
        List<String> w = new ArrayList<>();
        if (b.radius() < ticketDiameter) {
            w.add(String.format(Locale.ROOT, "%s: centre-line radius %.4f is under 1 x diameter; a guide"
                    + " specification asks for at least 1 D, 1 1/2 D preferred [S:UFGS15566A 2.10.1]", id, b.radius()));
        }
        double beta = b.angleDeg() / b.halfGores();
        if (beta > SMOOTH_MITER_DEG + 1e-9) {
            w.add(String.format(Locale.ROOT, "%s: miter angle %.2f deg is over %.0f deg; more pieces make a"
                    + " smoother elbow (common practice)", id, beta, SMOOTH_MITER_DEG));
        }
        double limit = unit.convert(STAMPED_LIMIT_IN, dev.sheetwright.core.units.LengthUnit.INCH);
        if (ticketDiameter > limit && ((b.angleDeg() == 90 && b.gores() < 5) || (b.angleDeg() == 45 && b.gores() < 3))) {
            w.add(String.format(Locale.ROOT, "%s: a round elbow over 8 in wants %d pieces for %.0f deg"
                    + " [S:UFGS15810N 2.2.3.2]", id, b.angleDeg() == 90 ? 5 : 3, b.angleDeg()));
        }
        return w;
    }
}
