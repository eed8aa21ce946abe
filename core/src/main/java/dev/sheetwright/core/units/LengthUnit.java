package dev.sheetwright.core.units;

import java.util.Locale;

/** The length unit a job is written in. Every length of a job is in its unit; conversions go through mm. */
public enum LengthUnit {
    INCH("in", 25.4),
    MILLIMETRE("mm", 1.0);

    private final String symbol;
    private final double mm;

    LengthUnit(String symbol, double mm) {
        this.symbol = symbol;
        this.mm = mm;
    }

    public String symbol() {
        return symbol;
    }

    /** Millimetres in one of this unit (1 in = 25.4 mm exactly). */
    public double mmPerUnit() {
        return mm;
    }

    public double toMm(double value) {
        return value * mm;
    }

    public double fromMm(double valueMm) {
        return valueMm / mm;
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
