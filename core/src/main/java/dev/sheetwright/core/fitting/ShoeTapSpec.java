package dev.sheetwright.core.fitting;

/**
 * Rectangular tap on a rectangular main (trade-reference §13.7): branch width x depth (width along the main's
 * airflow), height above the main; the upstream side runs at 45 degrees over its lowest {@code entry}, so the
 * opening on the main is (width + entry) x depth. {@code entry: 0} is a straight tap.
 *
 * @param allowances seam on the four corner seams; {@code endA} on the main edge (a flange or tabs), {@code endB} the
 *     connector on the top end
 */
public record ShoeTapSpec(String id, int qty, double width, double depth, double height, double entry,
        Allowances allowances) implements FittingSpec {

    public ShoeTapSpec {
        FittingSpec.requireCommon(id, qty, 1, allowances);
        FittingSpec.requirePositive(id, "width", width);
        FittingSpec.requirePositive(id, "depth", depth);
        FittingSpec.requirePositive(id, "height", height);
        RectFittings.requireNotNegative(id, "entry", entry);
        if (entry > width) {
            throw new FittingException(id, "entry", "the 45 degree entry (" + entry + ") must not be larger than the"
                    + " tap's width (" + width + ")");
        }
        if (entry >= height) {
            throw new FittingException(id, "entry", "the 45 degree entry (" + entry + ") must be less than the tap's"
                    + " height (" + height + ")");
        }
        if (!AllowanceTable.rectangularSeam(allowances.seam().kind())) {
            throw new FittingException(id, "allowances.seam", "'" + allowances.seam().kind().word()
                    + "' is not a rectangular seam: use pittsburgh, snap-lock or none");
        }
        EndKind main = allowances.endA().kind();
        if (main != EndKind.FLANGE && main != EndKind.TABS && main != EndKind.NONE) {
            throw new FittingException(id, "allowances.ends.main", "the main edge takes flange W, tabs [W] or none,"
                    + " got "
                    + allowances.endA().kind().word());
        }
        RectFittings.requireRectEnd(id, "allowances.ends.top", allowances.endB());
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "shoe-tap";
    }
}
