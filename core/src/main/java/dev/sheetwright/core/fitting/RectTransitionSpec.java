package dev.sheetwright.core.fitting;

/**
 * Rectangle-to-rectangle transition (trade-reference §13.6): end 1 {@code width x depth} at z = 0 centred on the
 * axis, end 2 {@code toWidth x toDepth} at z = {@code length}, its centre moved by ({@code offsetX},
 * {@code offsetY}). Width faces (top, bottom) are the cheeks, depth faces (left, right) the wrappers.
 *
 * @param construction {@code faces} (four faces) or {@code l-halves} (two halves bent on the corner lines)
 */
public record RectTransitionSpec(String id, int qty, double width, double depth, double toWidth, double toDepth,
        double length, double offsetX, double offsetY, RectConstruction construction, Allowances allowances)
        implements FittingSpec {

    public RectTransitionSpec {
        RectFittings.requireCommon(id, qty, width, depth, allowances);
        FittingSpec.requirePositive(id, "to.width", toWidth);
        FittingSpec.requirePositive(id, "to.depth", toDepth);
        FittingSpec.requirePositive(id, "length", length);
        if (!Double.isFinite(offsetX)) {
            throw new FittingException(id, "offset.x", "must be a finite length, got " + offsetX);
        }
        if (!Double.isFinite(offsetY)) {
            throw new FittingException(id, "offset.y", "must be a finite length, got " + offsetY);
        }
        if (construction != RectConstruction.FACES && construction != RectConstruction.L_HALVES) {
            throw new FittingException(id, "construction", "must be faces or l-halves, got " + construction);
        }
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "rect-transition";
    }
}
