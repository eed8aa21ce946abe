package dev.sheetwright.core.fitting;

/**
 * Concentric round reducer, a right-cone frustum (trade-reference §1).
 *
 * @param large diameter of the large end
 * @param small diameter of the small end
 * @param height vertical distance between the end planes
 */
public record ReducerSpec(String id, int qty, double large, double small, double height, int pieces,
        Allowances allowances) implements FittingSpec {

    public ReducerSpec {
        FittingSpec.requireCommon(id, qty, pieces, allowances);
        FittingSpec.requirePositive(id, "large", large);
        FittingSpec.requirePositive(id, "small", small);
        FittingSpec.requirePositive(id, "height", height);
        if (small >= large) {
            throw new FittingException(id, "small", "the small end (" + small
                    + ") must be smaller than the large end (" + large + "); equal ends make a pipe");
        }
    }

    @Override
    public String type() {
        return "reducer";
    }
}
