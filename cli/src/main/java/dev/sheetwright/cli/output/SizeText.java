package dev.sheetwright.cli.output;

import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.core.units.Lengths;
import java.util.Locale;

/** Reads sizes typed on the command line (the engine only takes millimetres). Package-private. */
public final class SizeText {
    private SizeText() {
    }

    /** {@code "48x30"} or {@code "47 15/16 x 30"} in {@code unit} → {width, height} in mm. */
    public static double[] parseSize(String text, LengthUnit unit) {
        String[] parts = Lengths.sizeParts(text);
        if (parts == null) {
            throw new IllegalArgumentException("--size: '" + text + "' is not a size; write WIDTHxHEIGHT, e.g. 48x30");
        }
        return new double[] {unit.toMm(number("--size", text, parts[0])), unit.toMm(number("--size", text, parts[1]))};
    }

    /** {@code "0.8"} in {@code unit}, or with its own unit: {@code "0.8mm"}, {@code "0.031in"} → mm. */
    public static double parseLength(String option, String text, LengthUnit unit) {
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
            return Lengths.parse(part.strip());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": '" + whole + "': '" + part.strip() + "' is not a number");
        }
    }
}
