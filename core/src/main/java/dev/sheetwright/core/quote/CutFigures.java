package dev.sheetwright.core.quote;

import dev.sheetwright.core.cutpath.SheetCutPlan;

/**
 * What one piece of stock's cut program does, read from its plan so the quote and the program agree. Job units.
 *
 * @param loopLength torch path around the contours (kerf-compensated when the program offsets it)
 * @param leadLength lead-ins and lead-outs
 * @param pierces one per contour
 * @param rapidLength rapid travel from home through every pierce (the way back home not counted)
 */
public record CutFigures(double loopLength, double leadLength, int pierces, double rapidLength) {

    /** No cutting. */
    public static final CutFigures NONE = new CutFigures(0, 0, 0, 0);

    public CutFigures {
        for (double v : new double[] {loopLength, leadLength, rapidLength}) {
            if (!(v >= 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("cut lengths must be finite and >= 0, got " + v);
            }
        }
        if (pierces < 0) {
            throw new IllegalArgumentException("pierces must be >= 0, got " + pierces);
        }
    }

    public static CutFigures of(SheetCutPlan plan) {
        return new CutFigures(plan.loopLength(), plan.leadLength(), plan.pierces(), plan.rapidLength());
    }
}
