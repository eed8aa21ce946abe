package dev.sheetwright.nest.model;

import org.locationtech.jts.geom.Polygon;

/**
 * One part type to nest: its outline (holes allowed) already flattened from exact arcs, in job length units,
 * and how many copies are wanted. The shape is treated as immutable.
 */
public record NestPiece(String fitting, String piece, int copies, Polygon shape) {
    /** Upper bound on copies of one piece, a guard against typing errors. */
    public static final int MAX_COPIES = 100_000;

    public NestPiece {
        Checks.requireText("fitting", fitting);
        Checks.requireText("piece", piece);
        if (copies < 1 || copies > MAX_COPIES) {
            throw new IllegalArgumentException("copies must be in 1.." + MAX_COPIES + ", got " + copies);
        }
        Checks.requireArea("shape of " + fitting + "/" + piece, shape);
    }

    public static NestPiece of(String fitting, String piece, int copies, Polygon shape) {
        return new NestPiece(fitting, piece, copies, shape);
    }

    /** "fitting/piece", used in messages. */
    public String label() {
        return fitting + "/" + piece;
    }
}
