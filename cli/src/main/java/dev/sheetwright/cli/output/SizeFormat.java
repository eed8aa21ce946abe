package dev.sheetwright.cli.output;

import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;

/**
 * Writes rack sizes for people, in tables and messages: decimals in the chosen unit, inches also to the nearest 1/16
 * (both from {@link FractionFormat}). Package-private.
 */
public final class SizeFormat {
    private SizeFormat() {
    }

    /** A length in mm shown in {@code unit}: {@code 1217.6} for mm, {@code 47.938 (47 15/16)} for inches. */
    public static String length(double mm, LengthUnit unit) {
        if (unit == LengthUnit.MILLIMETRE) {
            return FractionFormat.decimal(mm, 1);
        }
        double in = unit.fromMm(mm);
        String dec = FractionFormat.decimal(in, 3);
        String frac = FractionFormat.SIXTEENTHS.format(in);
        return dec.equals(frac) ? dec : dec + " (" + frac + ")";
    }
}
