package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EccentricReducerSpec;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Transform2;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Eccentric reducers and cones by exact radial development of the oblique cone (trade-reference §2.2): every
 * surface point keeps its true distance from the apex, and the developed polar angle is the integral of
 * {@code |(B - A) x B'| / |B - A|^2}. The end curves are cut as polylines within the chord tolerance, the seam
 * edges are exact lines. A concentric one (offset 0) is an exact annular sector ({@link SectorBlank}).
 *
 * <p>The seam is on the longest generator; {@code pieces: k} splits the large-end circumference into k equal
 * parts, one pattern each, drawn upright (its middle generator along +y, apex at the origin).
 */
public final class EccentricReducerDeveloper {

    /** Divisions of the generator table (trade-reference §2.4 uses 12, i.e. 30 deg steps). */
    static final int TABLE_DIVISIONS = 12;
    /** Chord count of the hand triangulation reported beside the exact angle (textbook drawings, §2.3). */
    static final int HAND_CHORDS = 12;

    private EccentricReducerDeveloper() {
    }

    public static Development develop(EccentricReducerSpec spec, DevelopContext ctx) {
        String id = spec.id();
        double d1 = ctx.mean(spec.large());
        double d2 = spec.small() == 0 ? 0 : ctx.mean(spec.small());
        if (!(d2 >= 0) || !(d1 > d2)) {
            throw new FittingException(id, "small", "mean diameters after the thickness correction are not a reducer ("
                    + d1 + " to " + d2 + ")");
        }
        double r1 = d1 / 2;
        double r2 = d2 / 2;
        double ex = spec.flat() ? r1 - r2 : spec.offsetX();
        double ey = spec.flat() ? 0 : spec.offsetY();
        ObliqueCone cone = ObliqueCone.of(r1, r2, ex, ey, spec.height());
        int k = spec.pieces();
        Allowances al = spec.allowances();
        boolean concentric = Math.hypot(ex, ey) <= ctx.tolerance().linear();
        double total = cone.totalAngle();
        double minElement = cone.element(0);
        double minSmall = cone.generator(0) * cone.ratio();

        if (al.endA().width() > minElement || al.endB().width() > minElement) {
            throw new FittingException(id, "allowances.ends", "an end allowance ("
                    + Math.max(al.endA().width(), al.endB().width()) + ") is longer than the shortest element ("
                    + minElement + ")");
        }
        if (r2 > 0 && al.endB().width() >= minSmall) {
            throw new FittingException(id, "allowances.ends", "the small-end allowance (" + al.endB().width()
                    + ") reaches the apex of the pattern");
        }
        double maxSeam = Math.max(al.seam().right(), al.seam().left());
        if (maxSeam > Math.PI * d1 / k / 2) {
            throw new FittingException(id, "allowances.seam", "a seam allowance (" + maxSeam
                    + ") is larger than half the stretch-out of a piece (" + Math.PI * d1 / k / 2 + ")");
        }

        List<Pattern> patterns = new ArrayList<>();
        List<Double> pieceAngles = new ArrayList<>();
        if (concentric) {
            String piece = k == 1 ? "blank" : "blank-1of" + k;
            double l1 = cone.generator(0);
            patterns.add(SectorBlank.build(id, piece, k, l1, l1 * cone.ratio(), total / (2 * k), al,
                    ctx.tolerance()));
            pieceAngles.add(total / k);
        } else {
            for (int i = 0; i < k; i++) {
                double s0 = -Math.PI + 2 * Math.PI * i / k;
                double s1 = i == k - 1 ? Math.PI : -Math.PI + 2 * Math.PI * (i + 1) / k;
                double angle = cone.phi(s1) - cone.phi(s0);
                if (angle >= 2 * Math.PI - ctx.tolerance().angular()) {
                    throw new FittingException(id, "pieces", "the pattern reaches a full turn; split it into pieces");
                }
                if (angle >= Math.PI && maxSeam > 0) {
                    throw new FittingException(id, "pieces", String.format(Locale.ROOT,
                            "a piece of %.1f deg leaves too little room for two seam allowances; split the pattern"
                                    + " with pieces: %d or more", Math.toDegrees(angle), 2 * k));
                }
                String piece = k == 1 ? "blank" : "blank-" + (i + 1) + "of" + k;
                Pattern p = CurvedBlank.build(id, piece, 1, r2 == 0 ? null : cone.smallEnd(), cone.largeEnd(), s0, s1,
                        al.seam(), al.endB(), al.endA(), al.notch(), ctx.tolerance());
                patterns.add(p.transformed(Transform2.rotation(cone.phi((s0 + s1) / 2))));
                pieceAngles.add(angle);
            }
        }

        List<String> warnings = new ArrayList<>();
        if (cone.steepestSlopeDeg() > ReducerDeveloper.SLOPE_WARNING_DEG) {
            warnings.add(String.format(Locale.ROOT, "%s: steepest side %.1f deg from the axis is steeper than the"
                    + " %.0f deg a project specification allows for transitions (trade-reference §1.1)", id,
                    cone.steepestSlopeDeg(), ReducerDeveloper.SLOPE_WARNING_DEG));
        }
        if (r2 > 0 && Math.hypot(ex, ey) > r1 - r2 + ctx.tolerance().linear()) {
            warnings.add(String.format(Locale.ROOT, "%s: the small end overhangs the large end in plan (offset %.4f"
                    + " is more than R1 - R2 = %.4f); check the ticket", id, Math.hypot(ex, ey), r1 - r2));
        }

        List<DevelopedPiece> pieces = new ArrayList<>();
        for (int i = 0; i < patterns.size(); i++) {
            pieces.add(new DevelopedPiece(patterns.get(i), layout(cone, d1, d2, Math.hypot(ex, ey),
                    pieceAngles.get(i), Math.hypot(ex, ey) <= ctx.tolerance().linear())));
        }
        return new Development(spec, pieces, warnings);
    }

    /**
     * The hand-layout values. A right cone ({@code right}: no plan offset) is laid out by radial lines from one
     * slant radius, so the triangulated angle of an oblique layout is left out: it would mean nothing there.
     */
    private static Layout layout(ObliqueCone cone, double d1, double d2, double offset, double pieceAngle,
            boolean right) {
        List<LayoutValue> v = new ArrayList<>(List.of(
                LayoutValue.length("largeMeanDiameter", "large end mean diameter", d1),
                LayoutValue.length("smallMeanDiameter", "small end mean diameter (0: cone to its apex)", d2),
                LayoutValue.length("offset", "plan offset of the small-end centre", offset),
                LayoutValue.length("apexHeight", "apex height above large end", cone.apexHeight()),
                LayoutValue.length("apexOffset", "plan distance of the apex from the large-end centre",
                        cone.apexOffset()),
                LayoutValue.length("shortestGenerator", "shortest generator, apex to large end (short side)",
                        cone.generator(0)),
                LayoutValue.length("longestGenerator", "longest generator, apex to large end (seam)",
                        cone.generator(Math.PI)),
                LayoutValue.length("shortestElement", "shortest element between the ends", cone.element(0)),
                LayoutValue.length("longestElement", "longest element between the ends (seam)",
                        cone.element(Math.PI)),
                LayoutValue.angle("patternAngle", "pattern angle (whole fitting, exact)",
                        Math.toDegrees(cone.totalAngle())),
                LayoutValue.angle("pieceAngle", "pattern angle of this piece", Math.toDegrees(pieceAngle)),
                LayoutValue.length("largeStretchOut", "large end stretch-out", Math.PI * d1),
                LayoutValue.length("smallStretchOut", "small end stretch-out", Math.PI * d2),
                LayoutValue.angle("slope", "steepest side from the axis", cone.steepestSlopeDeg())));
        if (!right) {
            v.add(11, LayoutValue.angle("handTriangulatedAngle", "pattern angle by " + HAND_CHORDS
                    + " chords (hand triangulation)", Math.toDegrees(cone.triangulatedAngle(HAND_CHORDS))));
        }
        List<List<Double>> rows = new ArrayList<>();
        for (int i = 0; i <= TABLE_DIVISIONS; i++) {
            double a = 2 * Math.PI * i / TABLE_DIVISIONS;
            double s = a <= Math.PI ? a : a - 2 * Math.PI;
            rows.add(List.of(Math.toDegrees(a), cone.generator(s), cone.generator(s) * cone.ratio(), cone.element(s),
                    Math.toDegrees(cone.phiForward(a))));
        }
        LayoutTable table = new LayoutTable("generators",
                "true lengths per division, a from the short side; phi = developed angle from the short side",
                List.of("a (deg)", "L large", "L small", "element", "phi (deg)"), rows);
        return new Layout(v, List.of(table));
    }
}
