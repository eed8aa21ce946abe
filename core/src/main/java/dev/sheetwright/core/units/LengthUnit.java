package dev.sheetwright.core.units;

import java.util.Locale;

/** The length unit a job is written in. Every length of a job is in its unit; conversions go through mm. */
public enum LengthUnit {
    INCH("in", 254, 10),
    MILLIMETRE("mm", 1, 1);

    private final String symbol;
    // Millimetres per unit as an exact ratio (1 in = 254/10 mm by definition). Multiplying by 254 and then dividing
    // by 10 rounds once per step and lands on the double nearest the true value where multiplying by 25.4 (itself
    // not exact in binary) does not: 48 in gives 1219.2, not 1219.1999999999998.
    private final double numerator;
    private final double denominator;

    LengthUnit(String symbol, double numerator, double denominator) {
        this.symbol = symbol;
        this.numerator = numerator;
        this.denominator = denominator;
    }

    public String symbol() {
        return symbol;
    }

    /** Millimetres in one of this unit (1 in = 25.4 mm exactly). */
    public double mmPerUnit() {
        return numerator / denominator;
    }

    /** Converts a length in this unit to millimetres. */
    public double toMm(double value) {
        return value * numerator / denominator;
    }

    /** Converts a length in millimetres to this unit. */
    public double fromMm(double valueMm) {
        return valueMm * denominator / numerator;
    }

    /** Converts an area in square millimetres to square units of this unit. */
    public double areaFromMm2(double areaMm2) {
        return areaMm2 * (denominator * denominator) / (numerator * numerator);
    }

    /** Converts {@code value} given in {@code from} into this unit. */
    public double convert(double value, LengthUnit from) {
        return from == this ? value : fromMm(from.toMm(value));
    }

    public static LengthUnit parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        switch (t) {
            case "in", "inch", "inches":
                return INCH;
            case "mm", "millimetre", "millimeter", "millimetres", "millimeters":
                return MILLIMETRE;
            default:
                throw new IllegalArgumentException("unknown length unit '" + text + "': use in or mm");
        }
    }
}
