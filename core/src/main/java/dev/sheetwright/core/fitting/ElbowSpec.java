package dev.sheetwright.core.fitting;

/**
 * Gored (segmented) round elbow, developed by parallel lines (trade-reference §3).
 *
 * <p>A field given as 0 takes the shop default: {@code gores} by the elbow angle ({@link #defaultGores}),
 * {@code radius} 1 1/2 x diameter ([S:UFGS15566A 2.10.1]); a null {@code seamAt} puts the seam on the side.
 *
 * @param diameter pipe diameter (face as set for the job)
 * @param angle elbow angle, degrees (0 &lt; angle &lt;= 180)
 * @param gores number of pieces n (two end pieces of one half-gore each, n - 2 middle pieces)
 * @param radius centre-line radius of the bend
 * @param seamAt where the first piece's longitudinal seam lies; the next piece is turned half round
 * @param allowances longitudinal seam on both stretch-out edges; {@code endA}/{@code endB} on the straight ends of
 *     the first/last piece; notches where the seam allowance meets an end or miter edge
 * @param miterSeam circumferential seam between gores: {@code right} is added to the miter edge of the lower
 *     piece, {@code left} to the miter edge of the piece above it
 */
public record ElbowSpec(String id, int qty, double diameter, double angle, int gores, double radius,
        SeamPosition seamAt, Allowances allowances, SeamAllowance miterSeam) implements FittingSpec {

    /** Most gores accepted for one elbow. */
    public static final int MAX_GORES = 24;

    public ElbowSpec {
        FittingSpec.requireCommon(id, qty, 1, allowances);
        FittingSpec.requirePositive(id, "diameter", diameter);
        requireAngle(id, "angle", angle);
        if (miterSeam == null) {
            throw new FittingException(id, "miterSeam", "must not be null (use none for a bare net pattern)");
        }
        if (seamAt == null) {
            seamAt = SeamPosition.SIDE;
        }
        if (gores == 0) {
            gores = defaultGores(angle);
        }
        if (gores < 2 || gores > MAX_GORES) {
            throw new FittingException(id, "gores", "must be from 2 to " + MAX_GORES + " pieces, got " + gores);
        }
        if (angle / (2 * (gores - 1)) > 45) {
            throw new FittingException(id, "gores", gores + " pieces leave a miter angle over 45 deg for a "
                    + angle + " deg elbow; use more pieces");
        }
        if (radius == 0) {
            radius = 1.5 * diameter;
        }
        FittingSpec.requirePositive(id, "radius", radius);
        if (radius < diameter / 2) {
            throw new FittingException(id, "radius", "the centre-line radius (" + radius
                    + ") must be at least half the diameter (" + diameter / 2 + ") or the throat folds over");
        }
    }

    static void requireAngle(String id, String field, double angle) {
        if (!(angle > 0) || !(angle <= 180)) {
            throw new FittingException(id, field, "must be an angle above 0 and at most 180 degrees, got " + angle);
        }
    }

    /**
     * Pieces used when a job gives none (common practice, trade-reference §3.3): 90 deg - 5, 60 deg - 4,
     * 45 deg - 3, 30 deg - 2; any other angle gets the fewest pieces whose miter angle is at most 15 deg.
     */
    public static int defaultGores(double angle) {
        if (angle == 90) {
            return 5;
        }
        if (angle == 60) {
            return 4;
        }
        if (angle == 45) {
            return 3;
        }
        if (angle == 30) {
            return 2;
        }
        return Math.max(2, (int) Math.ceil(angle / 30 - 1e-12) + 1);
    }

    /** Half-gores k = 2 (n - 1) ([S:COEY "Round Elbow"] [S:LONG p.52]). */
    public int halfGores() {
        return 2 * (gores - 1);
    }

    /** Miter angle of each half-gore, degrees: beta = A / k. */
    public double miterAngle() {
        return angle / halfGores();
    }

    /** An elbow is one wrap per gore; its gores are already separate pieces. */
    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "elbow";
    }
}
