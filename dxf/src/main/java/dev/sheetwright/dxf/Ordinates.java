package dev.sheetwright.dxf;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Number text shared by the DXF and SVG writers: the same in every locale ({@code .} as decimal separator, no
 * grouping), never an exponent, the exact binary value rounded half-even to a fixed number of decimals, trailing
 * zeros and a trailing point trimmed, and no negative zero ({@code -0.0} and {@code -0.0000001} both give {@code 0}).
 * NaN and infinities are refused.
 */
final class Ordinates {

    /** Decimals of coordinates, lengths and heights: 1e-6 of a millimetre or an inch is far below any cut. */
    static final int LENGTH_DECIMALS = 6;
    /** Decimals of bulges, which are ratios: more, so that long arcs keep their sweep. */
    static final int BULGE_DECIMALS = 10;

    private Ordinates() {
    }

    /** A coordinate, length or height, e.g. {@code 12.5}, {@code -0.000001}, {@code 100000000}. */
    static String length(double value) {
        return format(value, LENGTH_DECIMALS);
    }

    /** A bulge, e.g. {@code 0.5773502692}. */
    static String bulge(double value) {
        return format(value, BULGE_DECIMALS);
    }

    private static String format(double value, int decimals) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("number to write must be finite, got " + value);
        }
        // new BigDecimal(double) is the exact binary value, so rounding happens once; BigDecimal has no -0.
        return new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
    }
}
