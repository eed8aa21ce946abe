package dev.sheetwright.nest.model;

/**
 * Shop rules for a nest. {@code gap}: least distance between two parts; {@code margin}: least distance from a part
 * to the stock edge; {@code chordTolerance}: how far the given outlines may lie inside the true ones (arcs were
 * flattened with chords inside convex arcs), so every spacing is kept conservative by that much.
 */
public record NestRules(double gap, double margin, RotationRule rotation, boolean mirror, double chordTolerance) {
    public NestRules {
        Checks.requireNonNegative("gap", gap);
        Checks.requireNonNegative("margin", margin);
        Checks.requireNonNull("rotation", rotation);
        Checks.requireNonNegative("chordTolerance", chordTolerance);
    }

    /** Touching allowed, no margin, no chord allowance: the rules of the strip-packing literature. */
    public static NestRules touching(RotationRule rotation) {
        return new NestRules(0, 0, rotation, false, 0);
    }
}
