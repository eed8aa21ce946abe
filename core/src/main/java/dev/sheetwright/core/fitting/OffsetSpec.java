package dev.sheetwright.core.fitting;

/**
 * Round offset made of two equal gored elbows and, when needed, a straight between them (trade-reference §3.6).
 * Give either the elbow {@code angle} or the {@code length} (advance along the original direction); the other
 * is 0 and is worked out. {@code gores} 0 and {@code radius} 0 take the elbow defaults ({@link ElbowSpec}).
 *
 * @param offset distance between the centre lines of the two parallel runs
 * @param angle angle of each elbow, degrees (0 = work it out from {@code length})
 * @param length advance: run along the original direction from the start of the first elbow to the end of the
 *     second (0 = work it out from {@code angle})
 */
public record OffsetSpec(String id, int qty, double diameter, double offset, double angle, double length,
        double radius, int gores, SeamPosition seamAt, Allowances allowances, SeamAllowance miterSeam)
        implements FittingSpec {

    public OffsetSpec {
        FittingSpec.requireCommon(id, qty, 1, allowances);
        FittingSpec.requirePositive(id, "diameter", diameter);
        FittingSpec.requirePositive(id, "offset", offset);
        if (miterSeam == null) {
            throw new FittingException(id, "miterSeam", "must not be null (use none for a bare net pattern)");
        }
        if (seamAt == null) {
            seamAt = SeamPosition.SIDE;
        }
        if ((angle == 0) == (length == 0)) {
            throw new FittingException(id, angle == 0 ? "angle" : "length",
                    "give either the elbow angle or the advance length, not " + (angle == 0 ? "neither" : "both"));
        }
        if (angle != 0 && !(angle > 0 && angle <= 90)) {
            throw new FittingException(id, "angle", "must be above 0 and at most 90 degrees, got " + angle);
        }
        if (length != 0) {
            FittingSpec.requirePositive(id, "length", length);
        }
        if (radius == 0) {
            radius = 1.5 * diameter;
        }
        FittingSpec.requirePositive(id, "radius", radius);
        if (radius < diameter / 2) {
            throw new FittingException(id, "radius", "the centre-line radius (" + radius
                    + ") must be at least half the diameter (" + diameter / 2 + ")");
        }
        if (gores != 0 && (gores < 2 || gores > ElbowSpec.MAX_GORES)) {
            throw new FittingException(id, "gores", "must be from 2 to " + ElbowSpec.MAX_GORES + " pieces, got "
                    + gores);
        }
    }

    /** One piece per gore and one straight; nothing is split round the stretch-out. */
    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "offset";
    }
}
