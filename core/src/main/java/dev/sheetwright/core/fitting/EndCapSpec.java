package dev.sheetwright.core.fitting;

/**
 * Rectangular end cap: a flat W x D panel with a flange on every side (trade-reference §13.7).
 *
 * @param flange width of the flanges turned over the duct end
 * @param notch whether the corners are notched where two flanges meet (§7.5)
 */
public record EndCapSpec(String id, int qty, double width, double depth, double flange, boolean notch)
        implements FittingSpec {

    public EndCapSpec {
        FittingSpec.requireCommon(id, qty, 1, Allowances.NET);
        FittingSpec.requirePositive(id, "width", width);
        FittingSpec.requirePositive(id, "depth", depth);
        RectFittings.requireNotNegative(id, "flange", flange);
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public Allowances allowances() {
        EndAllowance f = flange > 0 ? new EndAllowance(EndKind.FLANGE, flange) : EndAllowance.NONE;
        return new Allowances(SeamAllowance.NONE, f, f, notch);
    }

    @Override
    public String type() {
        return "end-cap";
    }
}
