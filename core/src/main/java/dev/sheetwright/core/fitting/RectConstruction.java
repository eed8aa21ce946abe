package dev.sheetwright.core.fitting;

import java.util.Locale;

/**
 * How a rectangular duct or transition is made up of pieces (trade-reference §13.2, §13.6): one full wrap, two
 * L halves, a U and a cap, four flat sides (or faces), or, for straight duct, {@code auto}: the fewest seams whose
 * pieces fit the job's stock.
 */
public enum RectConstruction {
    WRAP("wrap"),
    L_HALVES("l-halves"),
    U_AND_CAP("u-and-cap"),
    FOUR_SIDES("four-sides"),
    FACES("faces"),
    AUTO("auto");

    private final String word;

    RectConstruction(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** Reads a construction word, accepting only the {@code allowed} ones. */
    public static RectConstruction parse(String text, RectConstruction... allowed) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        StringBuilder words = new StringBuilder();
        for (RectConstruction c : allowed) {
            if (c.word.equals(t)) {
                return c;
            }
            words.append(words.length() == 0 ? "" : " | ").append(c.word);
        }
        throw new IllegalArgumentException("'" + text + "' is not a construction here: use " + words);
    }
}
