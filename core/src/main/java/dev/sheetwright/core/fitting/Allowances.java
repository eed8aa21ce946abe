package dev.sheetwright.core.fitting;

/**
 * All allowances of one fitting: the longitudinal seam, the two round ends, and whether corners where a seam
 * allowance meets an end allowance are notched back to the net line (trade-reference §7.5).
 *
 * @param endA allowance on the first end (large end of a reducer, first end of a pipe)
 * @param endB allowance on the second end (small end of a reducer, second end of a pipe)
 */
public record Allowances(SeamAllowance seam, EndAllowance endA, EndAllowance endB, boolean notch) {

    /** The bare net pattern: exactly the developed surface. */
    public static final Allowances NET = new Allowances(SeamAllowance.NONE, EndAllowance.NONE, EndAllowance.NONE,
            false);

    public Allowances {
        if (seam == null || endA == null || endB == null) {
            throw new IllegalArgumentException("allowances must not be null");
        }
    }

    public Allowances withSeam(SeamAllowance s) {
        return new Allowances(s, endA, endB, notch);
    }

    public Allowances withEnds(EndAllowance a, EndAllowance b) {
        return new Allowances(seam, a, b, notch);
    }

    public Allowances withNotch(boolean n) {
        return new Allowances(seam, endA, endB, n);
    }
}
