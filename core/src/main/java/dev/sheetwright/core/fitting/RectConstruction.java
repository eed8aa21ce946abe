package dev.sheetwright.core.fitting;

import java.util.Locale;

/**
 * How a rectangular duct or transition is made up of pieces (trade-reference §13.2, §13.6): one full wrap, two
 * L halves, a U and a cap, four flat sides (or faces), or, for straight duct, {@code auto}: the fewest seams whose
 * pieces fit the job's stock.
 */
public enum RectConstruction {
    WRAP("wrap", 1),
    L_HALVES("l-halves", 2),
    U_AND_CAP("u-and-cap", 2),
    FOUR_SIDES("four-sides", 4),
    FACES("faces", 4),
    AUTO("auto", 0);

    private final String word;
    private final int seams;

    RectConstruction(String word, int seams) {
        this.word = word;
        this.seams = seams;
    }

    public String word() {
        return word;
    }

    /** Longitudinal seams of a duct made this way (0 for {@code auto}, which is not yet a make-up). */
    public int seams() {
        return seams;
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
