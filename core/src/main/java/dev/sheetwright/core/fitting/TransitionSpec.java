package dev.sheetwright.core.fitting;

/**
 * Rectangle-to-round (or square-to-round) transition, developed by triangulation (trade-reference §5).
 * The rectangle lies in the base plane, centred on the origin; the round end is parallel to it.
 *
 * @param width rectangle side along x
 * @param depth rectangle side along y
 * @param diameter round end diameter
 * @param height distance between the rectangle plane and the round end plane
 * @param offsetX centre of the round end from the rectangle centre, along x
 * @param offsetY centre of the round end from the rectangle centre, along y
 * @param pieces 1 (seam at the middle of the front side), 2 (seams at the front and back middles) or 4 (seams
 *     at the middle of every side)
 * @param allowances seam on the seam edges; {@code endA} on the rectangular end, {@code endB} on the round end;
 *     notching at the corners
 */
public record TransitionSpec(String id, int qty, double width, double depth, double diameter, double height,
        double offsetX, double offsetY, int pieces, Allowances allowances) implements FittingSpec {

    public TransitionSpec {
        FittingSpec.requireCommon(id, qty, pieces, allowances);
        FittingSpec.requirePositive(id, "width", width);
        FittingSpec.requirePositive(id, "depth", depth);
        FittingSpec.requirePositive(id, "diameter", diameter);
        FittingSpec.requirePositive(id, "height", height);
        if (!Double.isFinite(offsetX)) {
            throw new FittingException(id, "offsetX", "must be a finite length, got " + offsetX);
        }
        if (!Double.isFinite(offsetY)) {
            throw new FittingException(id, "offsetY", "must be a finite length, got " + offsetY);
        }
        if (pieces != 1 && pieces != 2 && pieces != 4) {
            throw new FittingException(id, "pieces", "must be 1, 2 or 4 (seams on the lines of symmetry), got "
                    + pieces);
        }
    }

    @Override
    public String type() {
        return "transition";
    }
}
