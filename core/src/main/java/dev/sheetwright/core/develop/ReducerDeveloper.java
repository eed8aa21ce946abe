package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.geom.Pattern;
import java.util.ArrayList;
import java.util.List;

/**
 * Concentric reducer by radial-line development (trade-reference §1.1; [S:COEY "Frustum of a Cone"],
 * [S:LONG p.128]): extend the sides to the apex; the pattern is an annular sector of radii L1, L2 and angle
 * theta = 360 (R1 - R2) / s.
 */
public final class ReducerDeveloper {

    /** Steepest slope per side that the design guides accept without comment, degrees ([S:SPEC15890] 20 deg). */
    static final double SLOPE_WARNING_DEG = 20.0;

    private ReducerDeveloper() {
    }

    /** The closed-form quantities of a frustum from mean diameters and height. */
    public record Frustum(double r1, double r2, double height) {

        public double slant() {
            return Math.hypot(r1 - r2, height);
        }

        public double apexHeight() {
            return height * r1 / (r1 - r2);
        }

        public double largeRadius() {
            return Math.hypot(r1, apexHeight());
        }

        public double smallRadius() {
            return largeRadius() * r2 / r1;
        }

        /** Pattern angle in radians: 2 pi (R1 - R2) / s. */
        public double angle() {
            return 2 * Math.PI * (r1 - r2) / slant();
        }

        public double lateralArea() {
            return Math.PI * (r1 + r2) * slant();
        }

        /** Slope of each side from the axis, degrees. */
        public double slopeDeg() {
            return Math.toDegrees(Math.atan2(r1 - r2, height));
        }
    }

    public static Development develop(ReducerSpec spec, DevelopContext ctx) {
        double d1 = ctx.mean(spec.large());
        double d2 = ctx.mean(spec.small());
        Frustum f = new Frustum(d1 / 2, d2 / 2, spec.height());
        int k = spec.pieces();
        double theta = f.angle();
        String piece = k == 1 ? "blank" : "blank-1of" + k;
        Pattern p = SectorBlank.build(spec.id(), piece, k, f.largeRadius(), f.smallRadius(), theta / (2 * k),
                spec.allowances(), ctx.tolerance());
        List<String> warnings = new ArrayList<>();
        if (f.slopeDeg() > SLOPE_WARNING_DEG) {
            warnings.add(String.format(java.util.Locale.ROOT,
                    "%s: side slope %.1f deg is steeper than the %.0f deg a project specification allows for"
                            + " transitions (trade-reference §1.1)", spec.id(), f.slopeDeg(), SLOPE_WARNING_DEG));
        }
        Layout layout = Layout.of(
                LayoutValue.length("largeMeanDiameter", "large end mean diameter", d1),
                LayoutValue.length("smallMeanDiameter", "small end mean diameter", d2),
                LayoutValue.length("slantHeight", "slant height s", f.slant()),
                LayoutValue.length("apexHeight", "apex height above large end", f.apexHeight()),
                LayoutValue.length("largeRadius", "slant radius L1 (large end)", f.largeRadius()),
                LayoutValue.length("smallRadius", "slant radius L2 (small end)", f.smallRadius()),
                LayoutValue.angle("patternAngle", "pattern angle (whole reducer)", Math.toDegrees(theta)),
                LayoutValue.angle("pieceAngle", "pattern angle of this piece", Math.toDegrees(theta / k)),
                LayoutValue.length("largeStretchOut", "large end stretch-out", Math.PI * d1),
                LayoutValue.length("smallStretchOut", "small end stretch-out", Math.PI * d2),
                LayoutValue.length("largeChord", "chord across large arc of this piece",
                        2 * f.largeRadius() * Math.sin(theta / (2 * k))),
                LayoutValue.angle("slope", "side slope from the axis", f.slopeDeg()));
        return new Development(spec, List.of(new DevelopedPiece(p, layout)), warnings);
    }
}
