package dev.sheetwright.core.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * An estimate of rapid travel on one sheet: a nearest-neighbour tour of the pierce points starting at the sheet
 * origin (common practice, §9.4 "nearest-next is a good start"). Deterministic: when two points are equally near, the
 * one earlier in the input list is taken. The tour ends at the last pierce; the return to home is not counted.
 *
 * <p>This is an estimate for quoting, not the cutting order a post-processor must use (inner contours before outer
 * contours is a separate rule).
 */
public record RapidPath(List<PiercePoint> order, double length) {

    private static final PiercePoint ORIGIN = new PiercePoint(0, 0);

    public RapidPath {
        order = List.copyOf(order);
        if (!(length >= 0) || !Double.isFinite(length)) {
            throw new IllegalArgumentException("length must be finite and >= 0, was " + length);
        }
    }

    /** The nearest-neighbour tour from the origin through all points, in the same length unit as the points. */
    public static RapidPath nearestNeighbour(List<PiercePoint> points) {
        Objects.requireNonNull(points, "points");
        List<PiercePoint> left = new ArrayList<>(points);
        left.forEach(p -> Objects.requireNonNull(p, "point"));
        List<PiercePoint> order = new ArrayList<>(left.size());
        PiercePoint at = ORIGIN;
        double length = 0;
        while (!left.isEmpty()) {
            int best = 0;
            double bestDistance = at.distanceTo(left.get(0));
            for (int i = 1; i < left.size(); i++) {
                double d = at.distanceTo(left.get(i));
                if (d < bestDistance) {
                    best = i;
                    bestDistance = d;
                }
            }
            at = left.remove(best);
            order.add(at);
            length += bestDistance;
        }
        return new RapidPath(order, length);
    }

    /** Length of the nearest-neighbour tour from the origin through all points. */
    public static double length(List<PiercePoint> points) {
        return nearestNeighbour(points).length();
    }
}
