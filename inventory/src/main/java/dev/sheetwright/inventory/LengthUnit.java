package dev.sheetwright.inventory;

/**
 * Converts lengths between the store's millimetres and inches (1 in = 25.4 mm exactly).
 * Parsing of typed values is deliberately not here.
 */
public enum LengthUnit {
    MM(1, 1), IN(254, 10);

    /** Millimetres in one inch, exactly. */
    public static final double MM_PER_INCH = 25.4;

    // mm per unit as an exact ratio: multiplying by 254 and then dividing by 10 rounds once, so
    // 48 in gives the double nearest 1219.2 (48 * 25.4 would give 1219.1999999999998).
    private final double numerator;
    private final double denominator;

    LengthUnit(double numerator, double denominator) {
        this.numerator = numerator;
        this.denominator = denominator;
    }

    /** Converts a length in this unit to millimetres. */
    public double toMm(double value) {
        return value * numerator / denominator;
    }

    /** Converts a length in millimetres to this unit. */
    public double fromMm(double mm) {
        return mm * denominator / numerator;
    }

    /** Converts an area in square millimetres to square units of this unit. */
    public double areaFromMm2(double mm2) {
        return mm2 * (denominator * denominator) / (numerator * numerator);
    }
}
