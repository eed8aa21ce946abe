package dev.sheetwright.nest.place;

import java.util.List;
import java.util.concurrent.ConcurrentHashMap;

import dev.sheetwright.nest.model.Stock;

/**
 * One kind of stock as the placer sees it: the box the part bodies must stay in (margin taken off), the
 * obstacles inside that box (for non-rectangular remnants: the box minus the eroded remnant, as convex pieces),
 * the compacting axis, how many may be opened, and the cost rank.
 */
final class Slot {
    final int index;
    final Stock stock;
    final double cx0;
    final double cy0;
    final double cx1;
    final double cy1;
    final boolean unlimitedLength;
    final boolean alongX;
    final ConvexPolygon[] obstacles;
    final int limit;
    /** The problem's precision, for the obstacles' no-fit polygons. */
    private final double eps;
    private final ConcurrentHashMap<Integer, Nfp> obstacleNfps = new ConcurrentHashMap<>();

    Slot(int index, Stock stock, double cx0, double cy0, double cx1, double cy1, boolean unlimitedLength,
         boolean alongX, List<ConvexPolygon> obstacles, int limit, double eps) {
        this.index = index;
        this.stock = stock;
        this.cx0 = cx0;
        this.cy0 = cy0;
        this.cx1 = cx1;
        this.cy1 = cy1;
        this.unlimitedLength = unlimitedLength;
        this.alongX = alongX;
        this.obstacles = obstacles.toArray(new ConvexPolygon[0]);
        this.limit = limit;
        this.eps = eps;
    }

    /** Whether the body box of {@code o} fits the container box at all. */
    boolean boxFits(Orientation o, double eps) {
        boolean w = unlimitedLength || (cx1 - cx0) - (o.bMaxX - o.bMinX) >= -eps;
        return w && (cy1 - cy0) - (o.bMaxY - o.bMinY) >= -eps;
    }

    Nfp obstacleNfp(Orientation o) {
        return obstacleNfps.computeIfAbsent(o.id, k -> Nfp.of(obstacles, o.body, eps));
    }
}
