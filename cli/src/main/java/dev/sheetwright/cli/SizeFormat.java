package dev.sheetwright.cli;

import dev.sheetwright.core.units.LengthUnit;
import java.math.BigDecimal;
import java.math.RoundingMode;

/** Writes lengths for people: decimals in the chosen unit, and inches also to the nearest 1/16. Package-private. */
final class SizeFormat {
    private SizeFormat() {
    }

    /** A plain decimal with at most {@code places} decimals and no trailing zeros, e.g. {@code 47.938}. */
    static String decimal(double value, int places) {
        BigDecimal d = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_UP).stripTrailingZeros();
        return d.signum() == 0 ? "0" : d.toPlainString();
    }

    /** Inches to the nearest 1/16, reduced: {@code 47 15/16}, {@code 48}, {@code 1/2}. */
    static String fraction(double inches) {
        long sixteenths = Math.round(inches * 16.0);
        String sign = sixteenths < 0 ? "-" : "";
        sixteenths = Math.abs(sixteenths);
        long whole = sixteenths / 16;
        long num = sixteenths % 16;
        long den = 16;
        while (num != 0 && num % 2 == 0) {
            num /= 2;
            den /= 2;
        }
        if (num == 0) {
            return sign + whole;
        }
        return sign + (whole == 0 ? "" : whole + " ") + num + "/" + den;
    }

    /** A length in mm shown in {@code unit}: {@code 1217.6} for mm, {@code 47.937 (47 15/16)} for inches. */
    static String length(double mm, LengthUnit unit) {
        if (unit == LengthUnit.MILLIMETRE) {
            return decimal(mm, 1);
        }
        double in = unit.fromMm(mm);
        String dec = decimal(in, 3);
        String frac = fraction(in);
        return dec.equals(frac) ? dec : dec + " (" + frac + ")";
    }
}
