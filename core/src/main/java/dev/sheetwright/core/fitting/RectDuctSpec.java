package dev.sheetwright.core.fitting;

/**
 * Straight rectangular duct, width x depth (inside clear sizes) and joint length (trade-reference §13.2).
 *
 * @param construction {@code wrap}, {@code l-halves}, {@code u-and-cap}, {@code four-sides} or {@code auto}
 * @param allowances longitudinal seam on the corner seams; {@code endA}/{@code endB} the transverse connectors on
 *     the first and second end; notching where they meet
 */
public record RectDuctSpec(String id, int qty, double width, double depth, double length,
        RectConstruction construction, Allowances allowances) implements FittingSpec {

    public RectDuctSpec {
        RectFittings.requireCommon(id, qty, width, depth, allowances);
        FittingSpec.requirePositive(id, "length", length);
        if (construction == null || construction == RectConstruction.FACES) {
            throw new FittingException(id, "construction", "must be wrap, l-halves, u-and-cap, four-sides or auto");
        }
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "rect-duct";
    }
}
