package dev.sheetwright.core.material;

import java.util.Locale;

/** The sheet material families the tool knows. Each has its own gauge series, see {@link GaugeTable}. */
public enum MaterialType {
    /** Hot-dip galvanized carbon steel sheet (ASTM A653 / A924), galvanized sheet gauge. */
    GALVANIZED("galvanized"),
    /** Uncoated carbon steel sheet, Manufacturers' Standard Gauge. */
    STEEL("steel"),
    /** Stainless steel sheet (300 series basis), U.S. Standard gauge. */
    STAINLESS("stainless"),
    /** Aluminium sheet, Brown &amp; Sharpe gauge. */
    ALUMINUM("aluminum");

    private static final String VALID_WORDS = "galvanized, steel, stainless, aluminum (or aluminium)";

    private final String word;

    MaterialType(String word) {
        this.word = word;
    }

    /** The accepted words, for messages and help: {@code galvanized, steel, stainless, aluminum (or aluminium)}. */
    public static String validWords() {
        return VALID_WORDS;
    }

    /** The lowercase word used in job files and reports, e.g. {@code "galvanized"}. */
    public String word() {
        return word;
    }

    /**
     * Reads a material word, ignoring case and surrounding blanks. Accepts {@code galvanized}, {@code steel},
     * {@code stainless}, {@code aluminum} and the spelling {@code aluminium}.
     *
     * @throws IllegalArgumentException if the word is null or not one of those
     */
    public static MaterialType parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("material must not be null; valid words: " + VALID_WORDS);
        }
        String w = text.strip().toLowerCase(Locale.ROOT);
        if (w.equals("aluminium")) {
            return ALUMINUM;
        }
        for (MaterialType t : values()) {
            if (t.word.equals(w)) {
                return t;
            }
        }
        throw new IllegalArgumentException(
                "material '" + text + "' is not known; valid words: " + VALID_WORDS);
    }
}
