package dev.sheetwright.core.material;

import java.util.Locale;
import java.util.Objects;

/**
 * A rectangular sheet size, kept in inches, with the label it is sold under (inch or metric) and a source note.
 * Make one with {@link #ofInches(double, double, String)} or {@link #ofMm(double, double, String)}.
 */
public record SheetSize(double widthIn, double lengthIn, String label, String source) {

    public SheetSize {
        if (!(widthIn > 0) || !Double.isFinite(widthIn)) {
            throw new IllegalArgumentException("widthIn must be finite and > 0, was " + widthIn);
        }
        if (!(lengthIn > 0) || !Double.isFinite(lengthIn)) {
            throw new IllegalArgumentException("lengthIn must be finite and > 0, was " + lengthIn);
        }
        Objects.requireNonNull(label, "label");
        if (label.isBlank()) {
            throw new IllegalArgumentException("label must not be blank");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /** A sheet sold in inches, labelled e.g. {@code "48 x 120 in"}. */
    public static SheetSize ofInches(double widthIn, double lengthIn, String source) {
        return new SheetSize(widthIn, lengthIn,
                String.format(Locale.ROOT, "%s x %s in", trim(widthIn), trim(lengthIn)), source);
    }

    /** A sheet sold in millimetres, labelled e.g. {@code "1250 x 2500 mm"}. */
    public static SheetSize ofMm(double widthMm, double lengthMm, String source) {
        return new SheetSize(widthMm / UnitFactors.MM_PER_IN, lengthMm / UnitFactors.MM_PER_IN,
                String.format(Locale.ROOT, "%s x %s mm", trim(widthMm), trim(lengthMm)), source);
    }

    public double widthMm() {
        return widthIn * UnitFactors.MM_PER_IN;
    }

    public double lengthMm() {
        return lengthIn * UnitFactors.MM_PER_IN;
    }

    public double areaIn2() {
        return widthIn * lengthIn;
    }

    public double areaFt2() {
        return areaIn2() / UnitFactors.IN2_PER_FT2;
    }

    public double areaMm2() {
        return widthMm() * lengthMm();
    }

    /** Weight in pounds of {@code count} whole sheets of this size in the given material (trade-reference §8.4). */
    public double weightLb(Material material, int count) {
        Objects.requireNonNull(material, "material");
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, was " + count);
        }
        return count * material.weightLbOf(areaIn2());
    }

    /** Weight in kilograms of {@code count} whole sheets of this size in the given material. */
    public double weightKg(Material material, int count) {
        return weightLb(material, count) * UnitFactors.KG_PER_LB;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
