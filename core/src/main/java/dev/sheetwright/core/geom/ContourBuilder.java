package dev.sheetwright.core.geom;

import java.util.ArrayList;
import java.util.List;

/** Draws a contour edge by edge, like a layout mechanic with a straightedge and trammels. */
public final class ContourBuilder {

    private final Tolerance tolerance;
    private final Point2 first;
    private final List<Edge> edges = new ArrayList<>();
    private Point2 here;

    private ContourBuilder(Point2 start, Tolerance tolerance) {
        this.first = start;
        this.here = start;
        this.tolerance = tolerance;
    }

    public static ContourBuilder startAt(Point2 start, Tolerance tolerance) {
        return new ContourBuilder(start, tolerance);
    }

    /** Straight line to {@code p}; a step shorter than the tolerance is skipped. */
    public ContourBuilder lineTo(Point2 p) {
        if (here.distance(p) > tolerance.linear()) {
            edges.add(new Line(here, p));
            here = p;
        }
        return this;
    }

    /** Arc about {@code centre} from the current point to {@code p}, turning counter-clockwise or clockwise. */
    public ContourBuilder arcTo(Point2 centre, Point2 p, boolean counterClockwise) {
        if (here.distance(p) > tolerance.linear()) {
            double r0 = here.distance(centre);
            double r1 = p.distance(centre);
            if (Math.abs(r0 - r1) > tolerance.linear() * Math.max(1, r0)) {
                throw new IllegalArgumentException("arc ends are not on one circle: radii " + r0 + " and " + r1);
            }
            Arc arc = Arc.between(centre, here, p, counterClockwise);
            edges.add(arc);
            here = p;
        }
        return this;
    }

    /** Closes the loop with a line back to the start when needed. */
    public Contour close() {
        lineTo(first);
        return Contour.of(edges, tolerance);
    }
}
