package dev.sheetwright.core.geom;

/** What a mark line on a pattern tells the mechanic. Marks are drawn or scribed, never cut. */
public enum MarkKind {
    /** Fold line where an allowance is turned (the net line of a seam or connector allowance). */
    BEND,
    /** Where a bead is rolled. */
    BEAD,
    /** Start of the crimped zone of a male end. */
    CRIMP,
    /** Centre line of a pattern, for lining up by hand. */
    CENTRE,
    /** A line a mechanic lays out from (e.g. gore ordinates' base line). */
    LAYOUT
}
