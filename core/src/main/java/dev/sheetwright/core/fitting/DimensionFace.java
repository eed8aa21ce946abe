package dev.sheetwright.core.fitting;

import java.util.Locale;

/**
 * Which face of the metal the ticket's diameters refer to. Patterns are developed on the mean (neutral) line:
 * {@code D_mean = D_inside + t = D_outside - t} (trade-reference §0.2, [S:CYC]).
 */
public enum DimensionFace {
    INSIDE,
    OUTSIDE,
    MEAN;

    /** Default when a job does not say: ticket sizes of round fittings are taken as inside (trade-reference §0.1). */
    public static final DimensionFace DEFAULT = INSIDE;

    public double meanDiameter(double diameter, double thickness) {
        return switch (this) {
            case INSIDE -> diameter + thickness;
            case OUTSIDE -> diameter - thickness;
            case MEAN -> diameter;
        };
    }

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static DimensionFace parse(String text) {
        for (DimensionFace f : values()) {
            if (f.word().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return f;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a dimension face: use inside, outside or mean");
    }
}
