package dev.sheetwright.inventory;

import java.math.BigDecimal;

/**
 * Writes millimetre values the same way in every locale, without exponents, and with enough digits that
 * reading the text back gives the identical double. Package-private.
 */
final class MmFormat {
    private MmFormat() {
    }

    static String format(double value) {
        if (value == 0.0) {
            return "0";
        }
        String plain = new BigDecimal(Double.toString(value)).stripTrailingZeros().toPlainString();
        return plain;
    }
}
