package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;

/**
 * What every development needs besides the fitting itself: the job's unit, the metal thickness (in that unit),
 * which face the ticket sizes are on, the tolerance, and the room the job's stock leaves for a blank (used by
 * fittings that choose their own make-up).
 */
public record DevelopContext(LengthUnit unit, double thickness, DimensionFace face, Tolerance tolerance,
        StockRoom room) {

    /** A context with no stock known ({@link StockRoom#ANY}). */
    public DevelopContext(LengthUnit unit, double thickness, DimensionFace face, Tolerance tolerance) {
        this(unit, thickness, face, tolerance, StockRoom.ANY);
    }

    public DevelopContext {
        if (unit == null || face == null || tolerance == null || room == null) {
            throw new IllegalArgumentException("develop context fields must not be null");
        }
        if (!(thickness >= 0) || !Double.isFinite(thickness)) {
            throw new IllegalArgumentException("thickness must be finite and not negative, got " + thickness);
        }
    }

    /** Mean-line diameter of a ticket diameter (trade-reference §0.2). */
    public double mean(double diameter) {
        return face.meanDiameter(diameter, thickness);
    }
}
