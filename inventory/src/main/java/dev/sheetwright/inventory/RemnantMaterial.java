package dev.sheetwright.inventory;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * The material of a remnant. This is the one place that lists the accepted words; it is meant to be
 * replaced by the core material type once that exists.
 */
public enum RemnantMaterial {
    GALVANIZED, STEEL, STAINLESS, ALUMINUM;

    /** The lower-case word stored in the database and in CSV files, e.g. {@code galvanized}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The accepted words, separated by {@code " | "}, for error messages and help text. */
    public static String words() {
        return Arrays.stream(values()).map(RemnantMaterial::word).collect(Collectors.joining(" | "));
    }

    /**
     * Parses a material word, ignoring case and surrounding blanks.
     *
     * @throws IllegalArgumentException naming the value and the accepted words
     */
    public static RemnantMaterial parse(String text) {
        if (text != null) {
            String t = text.strip().toUpperCase(Locale.ROOT);
            for (RemnantMaterial m : values()) {
                if (m.name().equals(t)) {
                    return m;
                }
            }
        }
        throw new IllegalArgumentException(
                "material: unknown material '" + text + "'; expected one of " + words());
    }
}
