package dev.sheetwright.core.units;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Writes inch values for people: the nearest fraction with a power-of-two denominator (1/16 by default), reduced,
 * e.g. {@code 18 7/8}; decimals are written locale-independently.
 */
public record FractionFormat(int denominator) {

    public static final FractionFormat SIXTEENTHS = new FractionFormat(16);

    public FractionFormat {
        if (denominator < 1 || denominator > 1024 || Integer.bitCount(denominator) != 1) {
            throw new IllegalArgumentException(
                    "fraction denominator must be a power of two from 1 to 1024, got " + denominator);
        }
    }

    /** Nearest fraction, e.g. {@code 18.8496 -> "18 7/8"}, {@code 0.375 -> "3/8"}, {@code -1.5 -> "-1 1/2"}. */
    public String format(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("cannot format " + value + " as a fraction");
        }
        long units = Math.round(Math.abs(value) * denominator);
        String sign = value < 0 && units != 0 ? "-" : "";
        long whole = units / denominator;
        long num = units % denominator;
        long den = denominator;
        while (num != 0 && num % 2 == 0) {
            num /= 2;
            den /= 2;
        }
        if (num == 0) {
            return sign + whole;
        }
        return sign + (whole == 0 ? "" : whole + " ") + num + "/" + den;
    }

    /** The value this format would show, as a number (for round-trip checks). */
    public double rounded(double value) {
        return Math.round(value * denominator) / (double) denominator;
    }

    /**
     * A decimal with at most {@code places} decimals and no trailing zeros, no exponent, {@code .} as separator, e.g.
     * {@code decimal(47.9375, 3) -> "47.938"}, {@code decimal(48.0, 3) -> "48"}. The shortest decimal that reads back
     * as {@code value} is rounded half up, so a value typed as {@code 2.675} shows as {@code 2.68} to two places
     * (rounding its binary expansion, 2.67499..., would give 2.67). Never {@code -0}.
     */
    public static String decimal(double value, int places) {
        BigDecimal d = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_UP).stripTrailingZeros();
        return d.signum() == 0 ? "0" : d.toPlainString();
    }
}
