package dev.sheetwright.core.cutting;

import java.util.Locale;

/** The thermal cutting processes the tool can estimate for. */
public enum CuttingProcess {
    /** Air plasma on a CNC table. */
    PLASMA("plasma"),
    /** Fibre laser. */
    LASER("laser");

    private static final String VALID_WORDS = "plasma, laser";

    private final String word;

    CuttingProcess(String word) {
        this.word = word;
    }

    /** The lowercase word used in job files and reports. */
    public String word() {
        return word;
    }

    /**
     * Reads a process word, ignoring case and surrounding blanks.
     *
     * @throws IllegalArgumentException if the word is null or not {@code plasma} or {@code laser}
     */
    public static CuttingProcess parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("cutting process must not be null; valid words: " + VALID_WORDS);
        }
        String w = text.strip().toLowerCase(Locale.ROOT);
        for (CuttingProcess p : values()) {
            if (p.word.equals(w)) {
                return p;
            }
        }
        throw new IllegalArgumentException(
                "cutting process '" + text + "' is not known; valid words: " + VALID_WORDS);
    }
}
