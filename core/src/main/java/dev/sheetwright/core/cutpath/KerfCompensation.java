package dev.sheetwright.core.cutpath;

import java.util.Locale;

/** Who moves the torch half a kerf into scrap: the program's own path, the controller (G41/G42), or nobody. */
public enum KerfCompensation {
    /** The program's toolpath is the contour offset by kerf/2 into scrap; arcs stay arcs. */
    PATH("path"),
    /** The nominal contour with G41 (scrap on the left of travel); the controller offsets by its kerf setting. */
    CONTROLLER("controller"),
    /** The nominal contour, no offset anywhere. */
    NONE("none");

    private final String word;

    KerfCompensation(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** The mode for a job-file word. */
    public static KerfCompensation parse(String word) {
        String w = word == null ? "" : word.strip().toLowerCase(Locale.ROOT);
        for (KerfCompensation k : values()) {
            if (k.word.equals(w)) {
                return k;
            }
        }
        throw new IllegalArgumentException("use path, controller or none; got '" + word + "'");
    }
}
