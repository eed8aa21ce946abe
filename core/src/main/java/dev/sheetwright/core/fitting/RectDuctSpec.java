package dev.sheetwright.core.fitting;

/**
 * Straight rectangular duct, width x depth (inside clear sizes) and joint length (trade-reference §13.2).
 *
 * @param construction {@code wrap}, {@code l-halves}, {@code u-and-cap}, {@code four-sides} or {@code auto}
 * @param allowances longitudinal seam on the corner seams; {@code endA}/{@code endB} the transverse connectors on
 *     the first and second end; notching where they meet
 * @param bendDeduction taken off the blank for each 90 degree corner bend (trade-reference §0.3: default 0, the
 *     inside dimensions laid out as they are; a shop that measures its brake sets its own)
 */
public record RectDuctSpec(String id, int qty, double width, double depth, double length,
        RectConstruction construction, Allowances allowances, double bendDeduction) implements FittingSpec {

    /** No bend deduction (§0.3 default). */
    public RectDuctSpec(String id, int qty, double width, double depth, double length,
            RectConstruction construction, Allowances allowances) {
        this(id, qty, width, depth, length, construction, allowances, 0);
    }

    public RectDuctSpec {
        RectFittings.requireCommon(id, qty, width, depth, allowances);
        FittingSpec.requirePositive(id, "length", length);
        if (construction == null || construction == RectConstruction.FACES) {
            throw new FittingException(id, "construction", "must be wrap, l-halves, u-and-cap, four-sides or auto");
        }
        RectFittings.requireNotNegative(id, "bendDeduction", bendDeduction);
        if (bendDeduction >= Math.min(width, depth)) {
            throw new FittingException(id, "bendDeduction", "a bend deduction of " + bendDeduction
                    + " takes a whole side of " + Math.min(width, depth));
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
