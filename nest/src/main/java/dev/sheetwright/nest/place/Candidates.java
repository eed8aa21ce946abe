package dev.sheetwright.nest.place;

import java.util.Arrays;
import java.util.Comparator;

/**
 * The candidate reference positions of one bottom-left search: rectangle corners, vertices of the no-fit pieces,
 * crossings of their edges with the rectangle's sides and with each other. Positions in a blocked grid cell are
 * dropped at once; the rest are sorted (JDK sort, primary axis first) and tested in that order. Reused between
 * searches of one thread.
 */
final class Candidates {
    /** A candidate position (mutable, pooled: the search runs millions of times). */
    static final class Spot {
        double x;
        double y;
    }

    /** By x, then y; numeric order (0.0 and -0.0 are the same position). */
    private static final Comparator<Spot> ALONG_X = (a, b) -> a.x < b.x ? -1 : a.x > b.x ? 1 : a.y < b.y ? -1 : a.y > b.y ? 1 : 0;
    /** By y, then x. */
    private static final Comparator<Spot> ALONG_Y = (a, b) -> a.y < b.y ? -1 : a.y > b.y ? 1 : a.x < b.x ? -1 : a.x > b.x ? 1 : 0;

    private Spot[] spots = newSpots(new Spot[0], 1024);
    private int count;
    private FeasibilityTest test;

    private static Spot[] newSpots(Spot[] old, int n) {
        Spot[] a = Arrays.copyOf(old, n);
        for (int i = old.length; i < n; i++) {
            a[i] = new Spot();
        }
        return a;
    }

    /** Starts a search whose blocked cells {@code test} knows. */
    void reset(FeasibilityTest test) {
        this.test = test;
        count = 0;
    }

    int count() {
        return count;
    }

    void add(double x, double y) {
        if (test.coveredAt(x, y)) {
            return;
        }
        if (count == spots.length) {
            spots = newSpots(spots, count * 2);
        }
        spots[count].x = x;
        spots[count].y = y;
        count++;
    }

    /** Edge-piece vertices inside the rectangle, and crossings of their edges with the rectangle's sides. */
    void addVerticesAndBorderHits(NoFitPieces pieces, double x0, double y0, double x1, double y1, double eps) {
        for (int k = 0; k < pieces.edges(); k++) {
            ConvexPolygon c = pieces.edge(k);
            double tx = pieces.edgeX(k);
            double ty = pieces.edgeY(k);
            int n = c.size();
            for (int i = 0; i < n; i++) {
                double ax = c.xs[i] + tx;
                double ay = c.ys[i] + ty;
                boolean openHere = c.isOpen(i);
                if (openHere && c.isOpen(i == 0 ? n - 1 : i - 1)) {
                    continue;
                }
                if (ax >= x0 - eps && ax <= x1 + eps && ay >= y0 - eps && ay <= y1 + eps) {
                    add(clamp(ax, x0, x1), clamp(ay, y0, y1));
                }
                if (openHere) {
                    continue;
                }
                int j = i + 1 == n ? 0 : i + 1;
                double bx = c.xs[j] + tx;
                double by = c.ys[j] + ty;
                vertical(ax, ay, bx, by, x0, y0, y1);
                vertical(ax, ay, bx, by, x1, y0, y1);
                horizontal(ax, ay, bx, by, y0, x0, x1);
                horizontal(ax, ay, bx, by, y1, x0, x1);
            }
        }
    }

    /** Vertices of the test pieces that belong to a union (needed where it has hidden zero-width slits). */
    void addUnionVertices(NoFitPieces pieces, double x0, double y0, double x1, double y1, double eps) {
        for (int k = 0; k < pieces.tests(); k++) {
            if (!pieces.inUnion(k)) {
                continue;
            }
            ConvexPolygon c = pieces.test(k);
            for (int i = 0; i < c.size(); i++) {
                double ax = c.xs[i] + pieces.testX(k);
                double ay = c.ys[i] + pieces.testY(k);
                if (ax >= x0 - eps && ax <= x1 + eps && ay >= y0 - eps && ay <= y1 + eps) {
                    add(clamp(ax, x0, x1), clamp(ay, y0, y1));
                }
            }
        }
    }

    private void vertical(double ax, double ay, double bx, double by, double x, double y0, double y1) {
        if ((ax - x) * (bx - x) < 0) {
            double y = ay + (by - ay) * (x - ax) / (bx - ax);
            if (y >= y0 && y <= y1) {
                add(x, y);
            }
        }
    }

    private void horizontal(double ax, double ay, double bx, double by, double y, double x0, double x1) {
        if ((ay - y) * (by - y) < 0) {
            double x = ax + (bx - ax) * (y - ay) / (by - ay);
            if (x >= x0 && x <= x1) {
                add(x, y);
            }
        }
    }

    private static double clamp(double v, double lo, double hi) {
        return v < lo ? lo : Math.min(v, hi);
    }

    /** Crossings of edges of different pieces, found cell by cell (each crossing kept in the cell it lies in). */
    void addCrossings(NoFitPieces pieces, CandidateGrid grid, double x0, double y0, double x1, double y1, double eps) {
        int g = grid.side();
        for (int cell = 0; cell < grid.cells(); cell++) {
            int from = grid.edgesFrom(cell);
            int to = grid.edgesFrom(cell + 1);
            if (to - from < 2 || test.covered(cell)) {
                continue;
            }
            int ca = cell % g;
            int cb = cell / g;
            double lx = ca == 0 ? x0 - eps : grid.x0() + ca * grid.cellWidth();
            double hx = ca == g - 1 ? x1 + eps : grid.x0() + ca * grid.cellWidth() + grid.cellWidth();
            double ly = cb == 0 ? y0 - eps : grid.y0() + cb * grid.cellHeight();
            double hy = cb == g - 1 ? y1 + eps : grid.y0() + cb * grid.cellHeight() + grid.cellHeight();
            for (int e = from; e < to; e++) {
                int k1 = grid.edgePieceAt(e);
                ConvexPolygon c1 = pieces.edge(k1);
                int i1 = grid.edgeIndexAt(e);
                int j1 = i1 + 1 == c1.size() ? 0 : i1 + 1;
                double ax = c1.xs[i1] + pieces.edgeX(k1);
                double ay = c1.ys[i1] + pieces.edgeY(k1);
                double rx = c1.xs[j1] + pieces.edgeX(k1) - ax;
                double ry = c1.ys[j1] + pieces.edgeY(k1) - ay;
                double e1x0 = Math.min(ax, ax + rx);
                double e1x1 = Math.max(ax, ax + rx);
                double e1y0 = Math.min(ay, ay + ry);
                double e1y1 = Math.max(ay, ay + ry);
                for (int f = e + 1; f < to; f++) {
                    int k2 = grid.edgePieceAt(f);
                    if (k2 == k1) {
                        continue;
                    }
                    ConvexPolygon c2 = pieces.edge(k2);
                    int i2 = grid.edgeIndexAt(f);
                    int j2 = i2 + 1 == c2.size() ? 0 : i2 + 1;
                    double qx = c2.xs[i2] + pieces.edgeX(k2);
                    double qy = c2.ys[i2] + pieces.edgeY(k2);
                    double sx = c2.xs[j2] + pieces.edgeX(k2) - qx;
                    double sy = c2.ys[j2] + pieces.edgeY(k2) - qy;
                    if (Math.max(qx, qx + sx) < e1x0 || Math.min(qx, qx + sx) > e1x1
                            || Math.max(qy, qy + sy) < e1y0 || Math.min(qy, qy + sy) > e1y1) {
                        continue;
                    }
                    double den = rx * sy - ry * sx;
                    if (den == 0) {
                        continue;
                    }
                    double wx = qx - ax;
                    double wy = qy - ay;
                    double t = (wx * sy - wy * sx) / den;
                    double u = (wx * ry - wy * rx) / den;
                    if (t < 0 || t > 1 || u < 0 || u > 1) {
                        continue;
                    }
                    double px = ax + t * rx;
                    double py = ay + t * ry;
                    if (px < lx || px >= hx || py < ly || py >= hy) {
                        continue;
                    }
                    add(clamp(px, x0, x1), clamp(py, y0, y1));
                }
            }
        }
    }

    /** The first feasible candidate in (primary, secondary) order, or null. */
    Spot firstFeasible(boolean alongX) {
        Arrays.sort(spots, 0, count, alongX ? ALONG_X : ALONG_Y);
        for (int i = 0; i < count; i++) {
            if (test.feasible(spots[i].x, spots[i].y)) {
                return spots[i];
            }
        }
        return null;
    }
}
