package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Point2;

/**
 * A smooth developed curve that is not a circle arc (the end of an oblique cone, the miter line of a gore), given
 * by a parameter. It is cut as a polyline whose chords stay within the chord tolerance ({@link CurveSampler}).
 */
interface PlaneCurve {

    Point2 at(double t);

    /** Derivative with respect to the parameter; only its direction is used. */
    Point2 tangent(double t);

    /**
     * The curve moved {@code w} along its left-hand unit normal (the parallel, or offset, curve). Its tangent has
     * the direction of this curve's tangent. Valid while {@code |w|} stays below the radius of curvature.
     */
    default PlaneCurve offsetLeft(double w) {
        PlaneCurve base = this;
        return new PlaneCurve() {
            @Override
            public Point2 at(double t) {
                return w == 0 ? base.at(t) : base.at(t).plus(base.tangent(t).unit().perpendicular().times(w));
            }

            @Override
            public Point2 tangent(double t) {
                return base.tangent(t);
            }
        };
    }
}
