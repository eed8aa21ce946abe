package dev.sheetwright.core.fitting;

import java.util.Locale;

/**
 * Where the longitudinal seam of a round elbow piece lies, as an angle round the pipe measured from the heel
 * (outside of the bend) towards the throat (trade-reference §3.2, §3.4).
 */
public enum SeamPosition {
    /** On the outside of the bend: long seam, wasteful ([S:NAVY ch.2]). */
    HEEL(0),
    /** Half-way round, on the side of the elbow: the preferred place ([S:NAVY ch.2]). */
    SIDE(90),
    /** On the inside of the bend: a short seam, hard to make well ([S:NAVY ch.2]). */
    THROAT(180);

    private final double degrees;

    SeamPosition(double degrees) {
        this.degrees = degrees;
    }

    /** Angle round the pipe from the heel, degrees. */
    public double degrees() {
        return degrees;
    }

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static SeamPosition parse(String text) {
        for (SeamPosition p : values()) {
            if (p.word().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return p;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a seam position: use heel, side or throat");
    }
}
