package dev.sheetwright.cli.output;

import dev.sheetwright.core.develop.LayoutValue;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;
import java.util.Locale;

/** Formats layout values for people: decimals, and inch lengths also as fractions. */
public record LayoutText(LengthUnit unit, FractionFormat fractions) {

    public String format(LayoutValue v) {
        return switch (v.kind()) {
            case ANGLE -> String.format(Locale.ROOT, "%.4f deg", v.value());
            case NUMBER -> trimmed(v.value());
            case LENGTH -> length(v.value());
            case AREA -> area(v.value());
        };
    }

    /** An area in square job units, decimals only. */
    public String area(double value) {
        return unit == LengthUnit.INCH ? String.format(Locale.ROOT, "%.2f in2", value)
                : String.format(Locale.ROOT, "%.0f mm2", value);
    }

    /** Metal thickness: decimals only (a fraction to 1/16 would round sheet metal to 0). */
    public String thickness(double value) {
        return unit == LengthUnit.INCH ? String.format(Locale.ROOT, "%.4f in", value)
                : String.format(Locale.ROOT, "%.3f mm", value);
    }

    public String length(double value) {
        if (unit == LengthUnit.INCH) {
            return String.format(Locale.ROOT, "%.4f in (%s)", value, fractions.format(value));
        }
        return String.format(Locale.ROOT, "%.2f mm", value);
    }

    public String number(double value, int places) {
        return String.format(Locale.ROOT, "%." + places + "f", value);
    }

    private static String trimmed(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.4f", v);
    }
}
