package dev.sheetwright.core.job;

/** Which turns of a part the nesting may use. */
public enum RotationMode {
    /** Any angle. */
    FREE,
    /** Multiples of a step angle. */
    STEP,
    /** Quarter turns only (0, 90, 180, 270). */
    QUARTER,
    /** As drawn only. */
    NONE
}
