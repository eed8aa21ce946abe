package dev.sheetwright.core.units;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads lengths the way they are written on shop tickets: decimals ({@code 12.5}), fractions ({@code 3/8}) and
 * mixed numbers ({@code 18 7/8}, {@code 12-1/2}).
 */
public final class Lengths {

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)");
    private static final Pattern FRACTION = Pattern.compile("([+-]?)(\\d+)/(\\d+)");
    private static final Pattern MIXED = Pattern.compile("([+-]?)(\\d+)(?:\\s+|-)(\\d+)/(\\d+)");

    private Lengths() {
    }

    /**
     * Parses a number written as a decimal, a fraction or a mixed number.
     *
     * @throws IllegalArgumentException when the text is none of these, or a denominator is zero
     */
    public static double parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("expected a number, got nothing");
        }
        String t = text.trim();
        Matcher m;
        if (DECIMAL.matcher(t).matches()) {
            return Double.parseDouble(t);
        }
        if ((m = FRACTION.matcher(t)).matches()) {
            double v = fraction(m.group(2), m.group(3), text);
            return "-".equals(m.group(1)) ? -v : v;
        }
        if ((m = MIXED.matcher(t)).matches()) {
            double v = Long.parseLong(m.group(2)) + fraction(m.group(3), m.group(4), text);
            return "-".equals(m.group(1)) ? -v : v;
        }
        throw new IllegalArgumentException(
                "'" + text + "' is not a number; write a decimal (12.5), a fraction (3/8) or a mixed number (18 7/8 or 12-1/2)");
    }

    private static double fraction(String num, String den, String text) {
        long d = Long.parseLong(den);
        if (d == 0) {
            throw new IllegalArgumentException("'" + text + "' has a zero denominator");
        }
        return (double) Long.parseLong(num) / d;
    }

    /**
     * Reads a sheet or remnant size {@code W x L} ({@code 48x120}, {@code 47 15/16 x 30}, {@code X} or {@code *}
     * also separate), each side as {@link #parse(String)} reads it. The caller checks the range.
     *
     * @return {width, length} in the unit the text is written in
     */
    public static double[] parseSize(String text) {
        String[] parts = sizeParts(text);
        if (parts == null) {
            throw new IllegalArgumentException("'" + text + "' is not a size; write W x L, e.g. 48x120");
        }
        return new double[] {parse(parts[0]), parse(parts[1])};
    }

    /** The two sides of a size as written ({@code "47 15/16 x 30"} → {"47 15/16", "30"}), or null if not a size. */
    public static String[] sizeParts(String text) {
        String[] parts = text == null ? new String[0] : text.strip().split("\\s*[xX*]\\s*");
        return parts.length == 2 ? parts : null;
    }
}
