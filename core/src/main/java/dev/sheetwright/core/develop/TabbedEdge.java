package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Point2;
import java.util.List;

/**
 * A straight net edge that carries tabs instead of a continuous strip (a tap's main edge, trade-reference §13.7):
 * the edge is split at the tab ends, each tab stretch gets the tab depth as its allowance and each gap none, so
 * {@link AllowanceOutline} cuts the tabs square out from the net line.
 */
final class TabbedEdge {

    private TabbedEdge() {
    }

    /**
     * Appends the vertices of the edge from {@code p} towards {@code q} (p itself included, q not) and the
     * allowance of each stretch after them.
     *
     * @param tabs (start, end) of each tab as distances from {@code p}, in order
     * @param depth how far each tab stands out
     */
    static void append(List<Point2> vertices, List<Double> widths, Point2 p, Point2 q, List<double[]> tabs,
            double depth) {
        Point2 u = q.minus(p).unit();
        double length = p.distance(q);
        double at = 0;
        vertices.add(p);
        for (double[] t : tabs) {
            if (t[0] > at) {
                widths.add(0.0);
                vertices.add(p.plus(u.times(t[0])));
            }
            widths.add(depth);
            at = t[1];
            if (at < length) {
                vertices.add(p.plus(u.times(at)));
            }
        }
        if (at < length) {
            widths.add(0.0);
        }
    }
}
