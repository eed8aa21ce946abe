package dev.sheetwright.core.fitting;

/**
 * Rectangular elbow turning in the plane of its width (trade-reference §13.3, §13.4): two flat cheeks, a throat
 * and a heel wrapper.
 *
 * @param angle turn in degrees, more than 0 and less than 180
 * @param throatRadius inside radius of the throat; 0 makes a square-throat (mitred) elbow
 * @param legs straight tangent length at each end (0 for none)
 * @param allowances longitudinal seam (pocket on the wrappers, flange on the cheeks); ends {@code first} and
 *     {@code second}
 */
public record RectElbowSpec(String id, int qty, double width, double depth, double angle, double throatRadius,
        double legs, Allowances allowances) implements FittingSpec {

    public RectElbowSpec {
        RectFittings.requireCommon(id, qty, width, depth, allowances);
        if (!(angle > 0 && angle < 180)) {
            throw new FittingException(id, "angle", "must be more than 0 and less than 180 degrees, got " + angle);
        }
        RectFittings.requireNotNegative(id, "throatRadius", throatRadius);
        RectFittings.requireNotNegative(id, "legs", legs);
    }

    public boolean squareThroat() {
        return throatRadius == 0;
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "rect-elbow";
    }
}
