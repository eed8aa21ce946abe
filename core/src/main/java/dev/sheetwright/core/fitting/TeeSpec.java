package dev.sheetwright.core.fitting;

/**
 * A round branch meeting a round main: a tee (angle 90), a lateral (angle below 90) or, without the main, a tap
 * cut to sit on an existing duct (trade-reference §4.1). Sizes are ticket diameters; the developer takes them to
 * the mean line.
 *
 * @param main diameter of the main
 * @param branch diameter of the branch (not larger than the main)
 * @param angle angle between the branch axis and the main axis, degrees: 90 for a tee, less for a lateral
 * @param offset sideways offset e of the branch axis from the main axis ({@code |e| + r <= R} on mean radii;
 *     {@code R - r} is a flush-back tee)
 * @param length T: distance from the main axis to the branch end, measured along the branch axis
 * @param mainLength net length of the main pipe that carries the hole (ignored when {@code withMain} is false)
 * @param withMain true: develop the main with its hole as well; false: a tap, the branch only
 * @param allowances of the branch: longitudinal seam; {@code endA} on the straight branch end (connector);
 *     {@code endB} on the curved joint edge (a flange for a tap, a lap or none where the branch is joined to a
 *     main made with it); notching where a seam allowance meets an end or joint allowance
 * @param mainAllowances of the main pipe: seam and its two ends (ignored when {@code withMain} is false)
 */
public record TeeSpec(String id, int qty, double main, double branch, double angle, double offset, double length,
        double mainLength, boolean withMain, Allowances allowances, Allowances mainAllowances)
        implements FittingSpec {

    public TeeSpec {
        FittingSpec.requireCommon(id, qty, 1, allowances);
        FittingSpec.requirePositive(id, "main", main);
        FittingSpec.requirePositive(id, "branch", branch);
        FittingSpec.requirePositive(id, "length", length);
        if (!(angle > 0 && angle <= 90)) {
            throw new FittingException(id, "angle", "must be more than 0 and at most 90 degrees, got " + angle);
        }
        if (!Double.isFinite(offset)) {
            throw new FittingException(id, "offset", "must be a finite length, got " + offset);
        }
        if (branch > main) {
            throw new FittingException(id, "branch", "the branch (" + branch + ") is larger than the main ("
                    + main + "); a branch cylinder cannot meet a smaller main all the way round");
        }
        if (withMain) {
            FittingSpec.requirePositive(id, "mainLength", mainLength);
            if (mainAllowances == null) {
                throw new FittingException(id, "mainAllowances", "must not be null when the main is developed");
            }
        }
        if (mainAllowances == null) {
            mainAllowances = Allowances.NET;
        }
    }

    /** The branch wrap is always one piece. */
    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return withMain ? (angle == 90 ? "tee" : "lateral") : "tap";
    }
}
