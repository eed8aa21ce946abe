package dev.sheetwright.cli;

import dev.sheetwright.core.units.LengthUnit;
import java.util.Locale;

/** Reads sizes typed on the command line (the engine only takes millimetres). Package-private. */
final class SizeText {
    private SizeText() {
    }

    /** {@code "48x30"} (also {@code X}, {@code *}, blanks) in {@code unit} → {width, height} in mm. */
    static double[] parseSize(String text, LengthUnit unit) {
        String[] parts = text.strip().split("\\s*[xX*]\\s*");
        if (parts.length != 2) {
            throw new IllegalArgumentException("--size: '" + text + "' is not a size; write WIDTHxHEIGHT, e.g. 48x30");
        }
        return new double[] {unit.toMm(number("--size", text, parts[0])), unit.toMm(number("--size", text, parts[1]))};
    }

    /** {@code "0.8"} in {@code unit}, or with its own unit: {@code "0.8mm"}, {@code "0.031in"} → mm. */
    static double parseLength(String option, String text, LengthUnit unit) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        if (t.endsWith("mm")) {
            return number(option, text, t.substring(0, t.length() - 2));
        }
        if (t.endsWith("in")) {
            return LengthUnit.INCH.toMm(number(option, text, t.substring(0, t.length() - 2)));
        }
        return unit.toMm(number(option, text, t));
    }

    private static double number(String option, String whole, String part) {
        try {
            double v = Double.parseDouble(part.strip());
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + ": '" + whole + "': '" + part.strip() + "' is not a number");
        }
    }
}
