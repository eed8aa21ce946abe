package dev.sheetwright.core.fitting;

/** Checks every rectangular fitting spec shares: sizes, and a longitudinal seam rectangular work can take. */
final class RectFittings {

    private RectFittings() {
    }

    static void requireCommon(String id, int qty, double width, double depth, Allowances allowances) {
        FittingSpec.requireCommon(id, qty, 1, allowances);
        FittingSpec.requirePositive(id, "width", width);
        FittingSpec.requirePositive(id, "depth", depth);
        if (!AllowanceTable.rectangularSeam(allowances.seam().kind())) {
            throw new FittingException(id, "allowances.seam", "'" + allowances.seam().kind().word()
                    + "' is not a rectangular seam: use pittsburgh, snap-lock or none");
        }
        requireRectEnd(id, "allowances.ends", allowances.endA());
        requireRectEnd(id, "allowances.ends", allowances.endB());
    }

    static void requireRectEnd(String id, String field, EndAllowance end) {
        EndKind k = end.kind();
        if (k == EndKind.TABS) {
            throw new FittingException(id, field, "tabs go on a tap's main edge only; a duct end takes none, slip,"
                    + " drive or flange W");
        }
        if (k != EndKind.NONE && k != EndKind.SLIP && k != EndKind.DRIVE && k != EndKind.FLANGE) {
            throw new FittingException(id, field, "'" + k.word() + "' is not a rectangular connector: use none,"
                    + " slip, drive or flange W");
        }
    }

    static void requireNotNegative(String id, String field, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new FittingException(id, field, "must be zero or a positive length, got " + value);
        }
    }
}
