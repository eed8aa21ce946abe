package dev.sheetwright.inventory;

import java.util.Locale;

/** Where a remnant is in its life: on the rack, held by a plan, or cut. */
public enum RemnantState {
    /** On the rack and free to be planned. */
    AVAILABLE,
    /** Held by a plan until its reservation expires. */
    RESERVED,
    /** Cut by a committed plan; kept for the record, never offered again. */
    USED;

    /** The lower-case word stored in the database and in CSV files. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Parses a state word, ignoring case.
     *
     * @throws IllegalArgumentException naming the value and the accepted words
     */
    public static RemnantState parse(String text) {
        if (text != null) {
            String t = text.strip().toUpperCase(Locale.ROOT);
            for (RemnantState s : values()) {
                if (s.name().equals(t)) {
                    return s;
                }
            }
        }
        throw new IllegalArgumentException(
                "state: unknown state '" + text + "'; expected one of available | reserved | used");
    }
}
