package dev.sheetwright.core.cutpath;

/**
 * How each contour is entered, left and compensated, from the job's {@code cutting:} section. Lengths in job units.
 *
 * @param kerf width of the cut; the path is offset by half of it with {@link KerfCompensation#PATH}
 * @param leadIn length of the straight lead-in from the pierce to the contour (0 = pierce on the path)
 * @param leadOut length of the lead-out past the start point (0 = none)
 * @param compensation who offsets the torch by half the kerf
 */
public record CutPathSettings(double kerf, double leadIn, double leadOut, KerfCompensation compensation) {

    public CutPathSettings {
        requireLength("kerf", kerf);
        requireLength("lead-in", leadIn);
        requireLength("lead-out", leadOut);
        if (compensation == null) {
            throw new IllegalArgumentException("kerf-compensation must not be null");
        }
    }

    /** The longest lead-in a gap allows: a lead of this length ending kerf/2 off its own part keeps its kerf clear of a neighbour one gap away. */
    public static double longestLeadIn(double gap, double kerf) {
        return gap - kerf;
    }

    /** Half the kerf when the program offsets the path itself, else 0. */
    public double pathOffset() {
        return compensation == KerfCompensation.PATH ? kerf / 2 : 0;
    }

    private static void requireLength(String name, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, got " + v);
        }
    }
}
