package dev.sheetwright.core.fitting;

/**
 * Round reducer whose small end is moved off the axis of the large end: a frustum of an oblique cone
 * (trade-reference §2). With {@code small} 0 it is a whole cone (hood, cap), oblique or right.
 *
 * @param large diameter of the large end
 * @param small diameter of the small end; 0 for a cone that runs to its apex
 * @param height vertical distance between the end planes (to the apex for a cone)
 * @param offsetX plan offset of the small-end centre from the large-end centre, x
 * @param offsetY plan offset of the small-end centre from the large-end centre, y
 * @param flat one side flat (the usual eccentric reducer): the offset is (R1 - R2, 0) on mean radii, worked out
 *     when the fitting is developed; {@code offsetX} and {@code offsetY} must then be 0
 * @param pieces number of pieces the blank is split into round the stretch-out
 */
public record EccentricReducerSpec(String id, int qty, double large, double small, double height, double offsetX,
        double offsetY, boolean flat, int pieces, Allowances allowances) implements FittingSpec {

    public EccentricReducerSpec {
        FittingSpec.requireCommon(id, qty, pieces, allowances);
        FittingSpec.requirePositive(id, "large", large);
        FittingSpec.requirePositive(id, "height", height);
        if (!(small >= 0) || !Double.isFinite(small)) {
            throw new FittingException(id, "small", "must be 0 (a cone to its apex) or a positive length, got " + small);
        }
        if (small >= large) {
            throw new FittingException(id, "small", "the small end (" + small
                    + ") must be smaller than the large end (" + large + "); equal ends make a pipe or an offset");
        }
        if (!Double.isFinite(offsetX)) {
            throw new FittingException(id, "offsetX", "must be a finite length, got " + offsetX);
        }
        if (!Double.isFinite(offsetY)) {
            throw new FittingException(id, "offsetY", "must be a finite length, got " + offsetY);
        }
        if (flat && (offsetX != 0 || offsetY != 0)) {
            throw new FittingException(id, "flat", "give either flat: true or an offset, not both");
        }
    }

    /** The usual eccentric reducer: one side flat, small end offset towards +x. */
    public static EccentricReducerSpec flatSide(String id, int qty, double large, double small, double height,
            int pieces, Allowances allowances) {
        return new EccentricReducerSpec(id, qty, large, small, height, 0, 0, true, pieces, allowances);
    }

    /** {@code cone} for a whole cone (small end 0, right or oblique), else {@code eccentric-reducer}. */
    @Override
    public String type() {
        return small == 0 ? "cone" : "eccentric-reducer";
    }
}
