package dev.sheetwright.inventory;

/**
 * Converts lengths between the store's millimetres and inches (1 in = 25.4 mm exactly).
 * Parsing of typed values is deliberately not here.
 */
public enum LengthUnit {
    MM(1.0), IN(25.4);

    /** Millimetres in one inch, exactly. */
    public static final double MM_PER_INCH = 25.4;

    private final double mmPerUnit;

    LengthUnit(double mmPerUnit) {
        this.mmPerUnit = mmPerUnit;
    }

    /** Converts a length in this unit to millimetres. */
    public double toMm(double value) {
        return value * mmPerUnit;
    }

    /** Converts a length in millimetres to this unit. */
    public double fromMm(double mm) {
        return mm / mmPerUnit;
    }

    /** Converts an area in square millimetres to square units of this unit. */
    public double areaFromMm2(double mm2) {
        return mm2 / (mmPerUnit * mmPerUnit);
    }
}
