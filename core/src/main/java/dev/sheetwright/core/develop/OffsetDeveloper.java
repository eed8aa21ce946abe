package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.OffsetSpec;
import dev.sheetwright.core.geom.Pattern;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A round offset: two equal gored elbows of angle A and centre-line radius R joined by a straight S
 * (trade-reference §3.6): {@code O = 2R(1 - cos A) + S sin A}, advance {@code = 2R sin A + S cos A}. Given A,
 * {@code S = (O - 2R(1 - cos A)) / sin A}; given the advance instead, A is found by bisection.
 *
 * <p>Pieces of both elbows that are the same pattern are counted together; the straight is a pipe blank. The
 * joints next to the straight (or between the elbows when S = 0) carry the circumferential seam: {@code right}
 * on the elbow, {@code left} on the straight (or on the second elbow).
 */
public final class OffsetDeveloper {

    private OffsetDeveloper() {
    }

    /** Offset geometry on the centre line: elbow angle (degrees), straight, advance. */
    record Run(double angleDeg, double straight, double advance) {
    }

    public static Development develop(OffsetSpec spec, DevelopContext ctx) {
        String id = spec.id();
        double lin = ctx.tolerance().linear();
        Run run = spec.angle() > 0 ? fromAngle(id, spec.offset(), spec.radius(), spec.angle(), lin)
                : fromAdvance(id, spec.offset(), spec.radius(), spec.length(), lin);
        int n = spec.gores() > 0 ? spec.gores() : ElbowSpec.defaultGores(run.angleDeg());
        if (run.angleDeg() / (2 * (n - 1)) > 45) {
            throw new FittingException(id, "gores", n + " pieces leave a miter angle over 45 deg for "
                    + String.format(Locale.ROOT, "%.4f", run.angleDeg()) + " deg elbows; use more pieces");
        }
        double d = ctx.mean(spec.diameter());
        ElbowDeveloper.Bend bend = ElbowDeveloper.bend(id, d, spec.radius(), run.angleDeg(), n, ctx.tolerance());
        Allowances al = spec.allowances();
        boolean straight = run.straight() > ctx.tolerance().chord(); // shorter is no piece to cut
        EndAllowance elbowJoint = ElbowDeveloper.lap(spec.miterSeam().right());
        EndAllowance otherJoint = ElbowDeveloper.lap(spec.miterSeam().left());
        double seam = spec.seamAt().degrees();
        List<ElbowDeveloper.Gore> gores = new ArrayList<>(ElbowDeveloper.gores(n, seam, al, al.endA(), elbowJoint,
                spec.miterSeam()));
        gores.addAll(ElbowDeveloper.gores(n, seam, al, straight ? elbowJoint : otherJoint, al.endB(),
                spec.miterSeam()));
        List<LayoutValue> runValues = List.of(
                LayoutValue.length("offset", "offset between the centre lines", spec.offset()),
                LayoutValue.length("advance", "advance along the first run", run.advance()),
                LayoutValue.length("straightLength", "straight between the elbows (tangent to tangent)",
                        run.straight()),
                LayoutValue.angle("offsetAngle", "angle of each elbow", run.angleDeg()));
        Layout layout = ElbowDeveloper.layout(bend, seam, runValues);
        List<DevelopedPiece> pieces = new ArrayList<>(ElbowDeveloper.pieces(id, bend, gores, al, layout, "",
                ctx.tolerance()));
        if (straight) {
            Allowances sa = new Allowances(al.seam(), otherJoint, otherJoint, al.notch());
            Pattern p = RectangleBlank.build(id, "straight", 1, bend.stretchOut(), run.straight(), sa,
                    ctx.tolerance());
            List<LayoutValue> v = new ArrayList<>(runValues);
            v.add(LayoutValue.length("meanDiameter", "mean diameter", d));
            v.add(LayoutValue.length("stretchOut", "stretch-out (net)", bend.stretchOut()));
            pieces.add(new DevelopedPiece(p, new Layout(v, List.of())));
        }
        return new Development(spec, pieces, ElbowDeveloper.warnings(id, spec.diameter(), bend, ctx.unit()));
    }

    /** Largest elbow angle (radians, at most 90 deg) whose two elbows alone do not pass the offset. */
    static double maxAngle(double offset, double radius) {
        return offset >= 2 * radius ? Math.PI / 2 : Math.acos(1 - offset / (2 * radius));
    }

    static Run fromAngle(String id, double offset, double radius, double angleDeg, double lin) {
        double a = Math.toRadians(angleDeg);
        double s = (offset - 2 * radius * (1 - Math.cos(a))) / Math.sin(a);
        if (s < -lin) {
            throw new FittingException(id, "angle", String.format(Locale.ROOT,
                    "two %.4f deg elbows of radius %.4f already offset %.4f, more than the %.4f asked; use a smaller"
                            + " angle (at most %.4f deg)", angleDeg, radius, 2 * radius * (1 - Math.cos(a)), offset,
                    Math.toDegrees(maxAngle(offset, radius))));
        }
        s = Math.max(0, s);
        return new Run(angleDeg, s, 2 * radius * Math.sin(a) + s * Math.cos(a));
    }

    /** advance(A) = O cot A + 2R tan(A/2); it falls steadily while S >= 0, so bisection finds the one A. */
    static Run fromAdvance(String id, double offset, double radius, double advance, double lin) {
        double hi = maxAngle(offset, radius);
        double least = advanceAt(offset, radius, hi);
        if (advance < least - lin) {
            throw new FittingException(id, "length", String.format(Locale.ROOT,
                    "an advance of %.4f is too short for an offset of %.4f with radius %.4f: at least %.4f", advance,
                    offset, radius, least));
        }
        double lo = 1e-9;
        for (int i = 0; i < 200 && hi - lo > 1e-15; i++) {
            double mid = (lo + hi) / 2;
            if (advanceAt(offset, radius, mid) > advance) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return fromAngle(id, offset, radius, Math.toDegrees((lo + hi) / 2), lin);
    }

    private static double advanceAt(double offset, double radius, double a) {
        return offset / Math.tan(a) + 2 * radius * Math.tan(a / 2);
    }
}
