package dev.sheetwright.core.fitting;

/** A connector allowance on one round end: metal added beyond the net end line. */
public record EndAllowance(EndKind kind, double width) {

    public static final EndAllowance NONE = new EndAllowance(EndKind.NONE, 0);

    public EndAllowance {
        if (kind == null) {
            throw new IllegalArgumentException("end kind must not be null");
        }
        if (!(width >= 0) || !Double.isFinite(width)) {
            throw new IllegalArgumentException("end allowance must be finite and not negative, got " + width);
        }
        if (kind == EndKind.NONE && width != 0) {
            throw new IllegalArgumentException("end allowance 'none' cannot have a width, got " + width);
        }
    }
}
