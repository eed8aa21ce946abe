package dev.sheetwright.core.fitting;

/** Straight round pipe or collar: a cylinder of a diameter and length (trade-reference §6). */
public record PipeSpec(String id, int qty, double diameter, double length, int pieces, Allowances allowances)
        implements FittingSpec {

    public PipeSpec {
        FittingSpec.requireCommon(id, qty, pieces, allowances);
        FittingSpec.requirePositive(id, "diameter", diameter);
        FittingSpec.requirePositive(id, "length", length);
    }

    @Override
    public String type() {
        return "pipe";
    }
}
