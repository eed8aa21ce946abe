package dev.sheetwright.core.fitting;

/**
 * A longitudinal seam resolved to widths: metal added outside the net line on the right and on the left edge of
 * the stretch-out (the pattern drawn with its stretch-out running left to right).
 */
public record SeamAllowance(SeamKind kind, double right, double left) {

    public static final SeamAllowance NONE = new SeamAllowance(SeamKind.NONE, 0, 0);

    public SeamAllowance {
        if (kind == null) {
            throw new IllegalArgumentException("seam kind must not be null");
        }
        if (!(right >= 0) || !(left >= 0) || !Double.isFinite(right) || !Double.isFinite(left)) {
            throw new IllegalArgumentException("seam allowances must be finite and not negative, got right "
                    + right + ", left " + left);
        }
    }

    public double total() {
        return right + left;
    }

    public String describe() {
        return kind.word() + (total() > 0 ? " (" + right + " + " + left + ")" : "");
    }
}
