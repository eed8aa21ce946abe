package dev.sheetwright.nest.place;

import java.util.Arrays;

/**
 * One opened piece of stock and the parts on it so far (append-only with undo). Finds the bottom-left-most
 * feasible position of an orientation from the no-fit polygons of the parts already placed.
 */
final class Bin {
    final Slot slot;
    int count;
    int[] orient = new int[16];
    int[] instance = new int[16];
    double[] tx = new double[16];
    double[] ty = new double[16];
    /** Prefix maximum of the spacing shape's far edge along the primary axis (index i = after i+1 parts). */
    double[] frontier = new double[16];
    double[] areaPrefix = new double[16];
    /** failCount[type] = number of parts present when that type was found not to fit; -1 if unknown. */
    int[] failCount;

    Bin(Slot slot, int types) {
        this.slot = slot;
        failCount = new int[types];
        Arrays.fill(failCount, -1);
    }

    double frontier() {
        return count == 0 ? Double.NEGATIVE_INFINITY : frontier[count - 1];
    }

    double partArea() {
        return count == 0 ? 0 : areaPrefix[count - 1];
    }

    void add(Orientation o, int inst, double x, double y, double area) {
        if (count == orient.length) {
            int n = count * 2;
            orient = Arrays.copyOf(orient, n);
            instance = Arrays.copyOf(instance, n);
            tx = Arrays.copyOf(tx, n);
            ty = Arrays.copyOf(ty, n);
            frontier = Arrays.copyOf(frontier, n);
            areaPrefix = Arrays.copyOf(areaPrefix, n);
        }
        orient[count] = o.id;
        instance[count] = inst;
        tx[count] = x;
        ty[count] = y;
        double far = slot.alongX ? x + o.sMaxX : y + o.sMaxY;
        frontier[count] = count == 0 ? far : Math.max(frontier[count - 1], far);
        areaPrefix[count] = (count == 0 ? 0 : areaPrefix[count - 1]) + area;
        count++;
    }

    void removeLast() {
        count--;
        for (int t = 0; t < failCount.length; t++) {
            if (failCount[t] > count) {
                failCount[t] = -1;
            }
        }
    }

    /** Result of a search: reference position and its keys (far edge along the primary axis, then the other). */
    static final class Position {
        double x;
        double y;
        double key1;
        double key2;
        Orientation orientation;
    }

    /**
     * The feasible position of {@code o} with the smallest (primary, secondary) reference coordinates, or false
     * if there is none. Writes into {@code out}.
     */
    boolean bottomLeft(Orientation o, Nfp.Cache cache, double eps, Scratch s, Position out) {
        return bottomLeft(o, cache, eps, s, out, false);
    }

    /**
     * As {@link #bottomLeft(Orientation, Nfp.Cache, double, Scratch, Position)}; when {@code cheap}, pairs whose
     * exact no-fit polygon is not yet known use the (containing) no-fit polygon of their bounding boxes instead, so
     * the position is still feasible but no new no-fit polygon is computed.
     */
    /** Whether convex piece {@code c} moved by (px, py) reaches into the rectangle (within eps). */
    private static boolean reaches(ConvexPolygon c, double px, double py, double x0, double y0, double x1, double y1,
            double eps) {
        return c.minX + px < x1 + eps && c.maxX + px > x0 - eps && c.minY + py < y1 + eps && c.maxY + py > y0 - eps;
    }

    boolean bottomLeft(Orientation o, Nfp.Cache cache, double eps, Scratch s, Position out, boolean cheap) {
        double ix0 = slot.cx0 - o.bMinX;
        double iy0 = slot.cy0 - o.bMinY;
        double ix1;
        double iy1 = slot.cy1 - o.bMaxY;
        if (slot.unlimitedLength) {
            ix1 = count == 0 ? ix0 : Math.max(ix0, frontier() - o.sMinX);
        } else {
            ix1 = slot.cx1 - o.bMaxX;
        }
        if (ix0 > ix1 + eps || iy0 > iy1 + eps) {
            return false;
        }
        ix1 = Math.max(ix0, ix1);
        iy1 = Math.max(iy0, iy1);
        boolean alongX = slot.alongX;

        // gather translated convex pieces that reach into the inner-fit rectangle
        NoFitPieces pieces = s.pieces;
        pieces.clear();
        boolean flat = ix1 - ix0 <= eps || iy1 - iy0 <= eps;
        for (int k = 0; k < count; k++) {
            Nfp nfp = cache.get(orient[k], o.id, cheap);
            double px = tx[k];
            double py = ty[k];
            if (!flat && (nfp.minX + px >= ix1 - eps || nfp.maxX + px <= ix0 + eps || nfp.minY + py >= iy1 - eps
                    || nfp.maxY + py <= iy0 + eps)) {
                // touches the rectangle at most on its boundary: only matters if the rectangle is degenerate
                continue;
            }
            boolean union = nfp.outline != nfp.parts;
            int group = nfp.pockets.length == 0 ? -1 : pieces.addGroup(nfp.pockets, px, py);
            for (ConvexPolygon c : nfp.parts) {
                if (reaches(c, px, py, ix0, iy0, ix1, iy1, eps)) {
                    pieces.addTest(c, px, py, union, group);
                }
            }
            for (ConvexPolygon c : nfp.pockets) {
                if (reaches(c, px, py, ix0, iy0, ix1, iy1, eps)) {
                    pieces.addEdge(c, px, py);
                }
            }
            for (ConvexPolygon c : nfp.outline) {
                if (reaches(c, px, py, ix0, iy0, ix1, iy1, eps)) {
                    pieces.addEdge(c, px, py);
                }
            }
        }
        if (slot.obstacles.length > 0) {
            for (ConvexPolygon c : slot.obstacleNfp(o).parts) {
                if (reaches(c, 0, 0, ix0, iy0, ix1, iy1, eps)) {
                    pieces.addTest(c, 0, 0, false, -1);
                    pieces.addEdge(c, 0, 0);
                }
            }
        }
        s.index(ix0, iy0, ix1, iy1, eps);
        Candidates cands = s.candidates;
        cands.add(ix0, iy0);
        cands.add(ix1, iy0);
        cands.add(ix0, iy1);
        cands.add(ix1, iy1);
        cands.addVerticesAndBorderHits(pieces, ix0, iy0, ix1, iy1, eps);
        cands.addUnionVertices(pieces, ix0, iy0, ix1, iy1, eps);
        cands.addCrossings(pieces, s.grid, ix0, iy0, ix1, iy1, eps);
        Candidates.Spot best = cands.firstFeasible(alongX);
        if (best == null) {
            return false;
        }
        out.x = best.x;
        out.y = best.y;
        out.orientation = o;
        if (alongX) {
            out.key1 = out.x + o.bMaxX;
            out.key2 = out.y + o.bMinY;
        } else {
            out.key1 = out.y + o.bMaxY;
            out.key2 = out.x + o.bMinX;
        }
        return true;
    }
}
