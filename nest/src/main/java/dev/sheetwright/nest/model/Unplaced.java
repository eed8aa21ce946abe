package dev.sheetwright.nest.model;

/** A requested copy that could not be placed, and why. */
public record Unplaced(String fitting, String piece, int copy, String reason) {
    public Unplaced {
        Checks.requireText("fitting", fitting);
        Checks.requireText("piece", piece);
        if (copy < 0) {
            throw new IllegalArgumentException("copy must be >= 0, got " + copy);
        }
        Checks.requireText("reason", reason);
    }

    public String label() {
        return fitting + "/" + piece;
    }
}
