package dev.sheetwright.nest.place;

import java.util.Arrays;

/**
 * Per-thread working memory of the bottom-left search: the translated convex no-fit pieces, a uniform grid over
 * the inner-fit rectangle, and the candidate points.
 */
final class Scratch {
    /** Grid cells per side at most, and cells per bounding edge: tuned on the strip benchmarks. */
    private static final int GRID_MAX = 128;
    private static final double GRID_DENSITY = 1.0;
    ConvexPolygon[] pc = new ConvexPolygon[256];
    double[] ptx = new double[256];
    double[] pty = new double[256];
    int np;
    boolean[] distinct = new boolean[256];
    /** owner[k]: pocket group of test piece k, or -1. */
    int[] owner = new int[256];
    ConvexPolygon[] pockets = new ConvexPolygon[16];
    double[] pocketX = new double[16];
    double[] pocketY = new double[16];
    int npk;
    /** Pockets of group g are pockets[groupStart[g] .. groupStart[g + 1]). */
    int[] groupStart = new int[17];
    int groups;
    ConvexPolygon[] ec = new ConvexPolygon[256];
    double[] etx = new double[256];
    double[] ety = new double[256];
    int ne;

    double[] cx = new double[1024];
    double[] cy = new double[1024];
    int nc;

    // grid
    private int g;
    private double gx0;
    private double gy0;
    private double cellW;
    private double cellH;
    private int[] pieceStart = new int[1];
    private int[] pieceCells = new int[256];
    private int[] edgeStart = new int[1];
    private int[] edgePiece = new int[1024];
    private int[] edgeIdx = new int[1024];
    private int[] counts = new int[1];

    void clearPieces() {
        np = 0;
        ne = 0;
        npk = 0;
        groups = 0;
        groupStart[0] = 0;
    }

    /** Starts a pocket group (the pockets of one no-fit polygon); returns its index. */
    int addGroup(ConvexPolygon[] ps, double x, double y) {
        for (ConvexPolygon c : ps) {
            if (npk == pockets.length) {
                pockets = Arrays.copyOf(pockets, npk * 2);
                pocketX = Arrays.copyOf(pocketX, npk * 2);
                pocketY = Arrays.copyOf(pocketY, npk * 2);
            }
            pockets[npk] = c;
            pocketX[npk] = x;
            pocketY[npk] = y;
            npk++;
        }
        if (groups + 2 > groupStart.length) {
            groupStart = Arrays.copyOf(groupStart, groupStart.length * 2);
        }
        groups++;
        groupStart[groups] = npk;
        return groups - 1;
    }

    private boolean inPocket(int group, double x, double y, double eps) {
        for (int q = groupStart[group]; q < groupStart[group + 1]; q++) {
            if (pockets[q].containsClosed(x, y, pocketX[q], pocketY[q], eps)) {
                return true;
            }
        }
        return false;
    }

    private boolean pocketTouches(int group, double lx, double ly, double hx, double hy) {
        for (int q = groupStart[group]; q < groupStart[group + 1]; q++) {
            ConvexPolygon c = pockets[q];
            if (c.minX + pocketX[q] <= hx && c.maxX + pocketX[q] >= lx && c.minY + pocketY[q] <= hy && c.maxY + pocketY[q] >= ly) {
                return true;
            }
        }
        return false;
    }

    /** A piece whose edges (all but the open ones) bound the region: source of candidate positions. */
    void addEdgePiece(ConvexPolygon c, double x, double y) {
        if (ne == ec.length) {
            int n = ne * 2;
            ec = Arrays.copyOf(ec, n);
            etx = Arrays.copyOf(etx, n);
            ety = Arrays.copyOf(ety, n);
        }
        ec[ne] = c;
        etx[ne] = x;
        ety[ne] = y;
        ne++;
    }

    void addPiece(ConvexPolygon c, double x, double y) {
        if (np == pc.length) {
            int n = np * 2;
            pc = Arrays.copyOf(pc, n);
            ptx = Arrays.copyOf(ptx, n);
            pty = Arrays.copyOf(pty, n);
        }
        if (np == distinct.length) {
            distinct = Arrays.copyOf(distinct, np * 2);
            owner = Arrays.copyOf(owner, np * 2);
        }
        owner[np] = -1;
        pc[np] = c;
        ptx[np] = x;
        pty[np] = y;
        distinct[np] = false;
        np++;
    }

    void clearCandidates() {
        nc = 0;
    }

    void addCandidate(double x, double y) {
        if (isCovered(x, y)) {
            return;
        }
        if (nc == cx.length) {
            cx = Arrays.copyOf(cx, nc * 2);
            cy = Arrays.copyOf(cy, nc * 2);
        }
        cx[nc] = x;
        cy[nc] = y;
        nc++;
    }

    private int cellX(double x) {
        int i = (int) Math.floor((x - gx0) / cellW);
        return i < 0 ? 0 : Math.min(g - 1, i);
    }

    private int cellY(double y) {
        int i = (int) Math.floor((y - gy0) / cellH);
        return i < 0 ? 0 : Math.min(g - 1, i);
    }

    /** Buckets pieces (by box) and their edges (by box) into a g x g grid over the rectangle. */
    void buildGrid(double x0, double y0, double x1, double y1, double eps) {
        int edges = 0;
        for (int k = 0; k < ne; k++) {
            edges += ec[k].size();
        }
        g = (int) Math.max(1, Math.min(GRID_MAX, Math.sqrt(edges * GRID_DENSITY)));
        gx0 = x0;
        gy0 = y0;
        cellW = Math.max((x1 - x0) / g, 1e-300);
        cellH = Math.max((y1 - y0) / g, 1e-300);
        int cells = g * g;
        // pieces
        if (counts.length < cells + 1) {
            counts = new int[cells + 1];
            pieceStart = new int[cells + 1];
            edgeStart = new int[cells + 1];
        }
        Arrays.fill(counts, 0, cells + 1, 0);
        for (int k = 0; k < np; k++) {
            ConvexPolygon c = pc[k];
            int a0 = cellX(c.minX + ptx[k]);
            int a1 = cellX(c.maxX + ptx[k]);
            int b0 = cellY(c.minY + pty[k]);
            int b1 = cellY(c.maxY + pty[k]);
            for (int b = b0; b <= b1; b++) {
                for (int a = a0; a <= a1; a++) {
                    counts[b * g + a]++;
                }
            }
        }
        int total = prefix(pieceStart, cells);
        if (pieceCells.length < total) {
            pieceCells = new int[total * 2];
        }
        Arrays.fill(counts, 0, cells, 0);
        for (int k = 0; k < np; k++) {
            ConvexPolygon c = pc[k];
            int a0 = cellX(c.minX + ptx[k]);
            int a1 = cellX(c.maxX + ptx[k]);
            int b0 = cellY(c.minY + pty[k]);
            int b1 = cellY(c.maxY + pty[k]);
            for (int b = b0; b <= b1; b++) {
                for (int a = a0; a <= a1; a++) {
                    int cell = b * g + a;
                    pieceCells[pieceStart[cell] + counts[cell]++] = k;
                }
            }
        }
        markCovered(eps);
        // edges
        Arrays.fill(counts, 0, cells + 1, 0);
        for (int pass = 0; pass < 2; pass++) {
            for (int k = 0; k < ne; k++) {
                ConvexPolygon c = ec[k];
                int n = c.size();
                for (int i = 0; i < n; i++) {
                    if (c.isOpen(i)) {
                        continue;
                    }
                    int j = i + 1 == n ? 0 : i + 1;
                    double ax = c.xs[i] + etx[k];
                    double ay = c.ys[i] + ety[k];
                    double bx = c.xs[j] + etx[k];
                    double by = c.ys[j] + ety[k];
                    if (Math.max(ax, bx) < x0 || Math.min(ax, bx) > x1 || Math.max(ay, by) < y0 || Math.min(ay, by) > y1) {
                        continue;
                    }
                    int a0 = cellX(Math.min(ax, bx));
                    int a1 = cellX(Math.max(ax, bx));
                    int b0 = cellY(Math.min(ay, by));
                    int b1 = cellY(Math.max(ay, by));
                    for (int b = b0; b <= b1; b++) {
                        for (int a = a0; a <= a1; a++) {
                            int cell = b * g + a;
                            if (pass == 0) {
                                counts[cell]++;
                            } else {
                                int at = edgeStart[cell] + counts[cell]++;
                                edgePiece[at] = k;
                                edgeIdx[at] = i;
                            }
                        }
                    }
                }
            }
            if (pass == 0) {
                int t = prefix(edgeStart, cells);
                if (edgePiece.length < t) {
                    edgePiece = new int[t * 2];
                    edgeIdx = new int[t * 2];
                }
                Arrays.fill(counts, 0, cells, 0);
            }
        }
    }

    /**
     * covered[cell]: 2 when the whole closed cell lies strictly inside one test piece (so it holds no feasible
     * point), 1 when not, 0 when not yet worked out (cells are tested lazily, only where a candidate or an edge
     * crossing needs them).
     */
    private byte[] covered = new byte[1];
    private double coverEps;

    private void markCovered(double eps) {
        int cells = g * g;
        if (covered.length < cells) {
            covered = new byte[cells];
        }
        Arrays.fill(covered, 0, cells, (byte) 0);
        coverEps = eps;
    }

    private boolean covered(int cell) {
        byte v = covered[cell];
        if (v == 0) {
            v = computeCovered(cell, coverEps) ? (byte) 2 : (byte) 1;
            covered[cell] = v;
        }
        return v == 2;
    }

    private boolean computeCovered(int cell, double eps) {
        int a = cell % g;
        int b = cell / g;
        double lx = gx0 + a * cellW;
        double ly = gy0 + b * cellH;
        double hx = lx + cellW;
        double hy = ly + cellH;
        for (int p = pieceStart[cell], e = pieceStart[cell + 1]; p < e; p++) {
            int k = pieceCells[p];
            ConvexPolygon c = pc[k];
            if (c.containsStrictly(lx, ly, ptx[k], pty[k], eps) && c.containsStrictly(hx, hy, ptx[k], pty[k], eps)
                    && c.containsStrictly(lx, hy, ptx[k], pty[k], eps) && c.containsStrictly(hx, ly, ptx[k], pty[k], eps)
                    && (owner[k] < 0 || !pocketTouches(owner[k], lx - eps, ly - eps, hx + eps, hy + eps))) {
                return true;
            }
        }
        return false;
    }

    private boolean isCovered(double x, double y) {
        return covered(cellY(y) * g + cellX(x));
    }

    private int prefix(int[] start, int cells) {
        int sum = 0;
        for (int c = 0; c < cells; c++) {
            start[c] = sum;
            sum += counts[c];
        }
        start[cells] = sum;
        return sum;
    }

    /** Piece vertices inside the rectangle, and crossings of piece edges with the rectangle's sides. */
    void collectVerticesAndBorderHits(double x0, double y0, double x1, double y1, double eps) {
        for (int k = 0; k < ne; k++) {
            ConvexPolygon c = ec[k];
            double tx = etx[k];
            double ty = ety[k];
            int n = c.size();
            for (int i = 0; i < n; i++) {
                double ax = c.xs[i] + tx;
                double ay = c.ys[i] + ty;
                boolean openHere = c.isOpen(i);
                if (openHere && c.isOpen(i == 0 ? n - 1 : i - 1)) {
                    continue;
                }
                if (ax >= x0 - eps && ax <= x1 + eps && ay >= y0 - eps && ay <= y1 + eps) {
                    addCandidate(clamp(ax, x0, x1), clamp(ay, y0, y1));
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

    /** Vertices of the test pieces (needed where a union has hidden zero-width slits). */
    void collectTestVertices(double x0, double y0, double x1, double y1, double eps, boolean[] distinct) {
        for (int k = 0; k < np; k++) {
            if (!distinct[k]) {
                continue;
            }
            ConvexPolygon c = pc[k];
            for (int i = 0; i < c.size(); i++) {
                double ax = c.xs[i] + ptx[k];
                double ay = c.ys[i] + pty[k];
                if (ax >= x0 - eps && ax <= x1 + eps && ay >= y0 - eps && ay <= y1 + eps) {
                    addCandidate(clamp(ax, x0, x1), clamp(ay, y0, y1));
                }
            }
        }
    }

    private void vertical(double ax, double ay, double bx, double by, double x, double y0, double y1) {
        if ((ax - x) * (bx - x) < 0) {
            double y = ay + (by - ay) * (x - ax) / (bx - ax);
            if (y >= y0 && y <= y1) {
                addCandidate(x, y);
            }
        }
    }

    private void horizontal(double ax, double ay, double bx, double by, double y, double x0, double x1) {
        if ((ay - y) * (by - y) < 0) {
            double x = ax + (bx - ax) * (y - ay) / (by - ay);
            if (x >= x0 && x <= x1) {
                addCandidate(x, y);
            }
        }
    }

    private static double clamp(double v, double lo, double hi) {
        return v < lo ? lo : Math.min(v, hi);
    }

    /** Crossings of edges of different pieces, found cell by cell (each crossing kept in the cell it lies in). */
    void collectIntersections(double x0, double y0, double x1, double y1, double eps) {
        int cells = g * g;
        for (int cell = 0; cell < cells; cell++) {
            int from = edgeStart[cell];
            int to = edgeStart[cell + 1];
            if (to - from < 2 || covered(cell)) {
                continue;
            }
            int ca = cell % g;
            int cb = cell / g;
            double lx = gx0 + ca * cellW;
            double hx = ca == g - 1 ? x1 + eps : lx + cellW;
            double ly = gy0 + cb * cellH;
            double hy = cb == g - 1 ? y1 + eps : ly + cellH;
            if (ca == 0) {
                lx = x0 - eps;
            }
            if (cb == 0) {
                ly = y0 - eps;
            }
            for (int e = from; e < to; e++) {
                int k1 = edgePiece[e];
                ConvexPolygon c1 = ec[k1];
                int i1 = edgeIdx[e];
                int j1 = i1 + 1 == c1.size() ? 0 : i1 + 1;
                double ax = c1.xs[i1] + etx[k1];
                double ay = c1.ys[i1] + ety[k1];
                double rx = c1.xs[j1] + etx[k1] - ax;
                double ry = c1.ys[j1] + ety[k1] - ay;
                double e1x0 = Math.min(ax, ax + rx);
                double e1x1 = Math.max(ax, ax + rx);
                double e1y0 = Math.min(ay, ay + ry);
                double e1y1 = Math.max(ay, ay + ry);
                for (int f = e + 1; f < to; f++) {
                    int k2 = edgePiece[f];
                    if (k2 == k1) {
                        continue;
                    }
                    ConvexPolygon c2 = ec[k2];
                    int i2 = edgeIdx[f];
                    int j2 = i2 + 1 == c2.size() ? 0 : i2 + 1;
                    double qx = c2.xs[i2] + etx[k2];
                    double qy = c2.ys[i2] + ety[k2];
                    double sx = c2.xs[j2] + etx[k2] - qx;
                    double sy = c2.ys[j2] + ety[k2] - qy;
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
                    addCandidate(clamp(px, x0, x1), clamp(py, y0, y1));
                }
            }
        }
    }

    private boolean feasible(double x, double y, double eps) {
        int cell = cellY(y) * g + cellX(x);
        for (int p = pieceStart[cell], e = pieceStart[cell + 1]; p < e; p++) {
            int k = pieceCells[p];
            if (pc[k].containsStrictly(x, y, ptx[k], pty[k], eps) && (owner[k] < 0 || !inPocket(owner[k], x, y, eps))) {
                return false;
            }
        }
        return true;
    }

    private int[] order = new int[1024];

    /** Index of the first feasible candidate in (primary, secondary) order, or -1. */
    int firstFeasible(boolean alongX, double eps) {
        if (order.length < nc) {
            order = new int[cx.length];
        }
        for (int i = 0; i < nc; i++) {
            order[i] = i;
        }
        double[] k1 = alongX ? cx : cy;
        double[] k2 = alongX ? cy : cx;
        sort(order, 0, nc - 1, k1, k2);
        for (int i = 0; i < nc; i++) {
            int c = order[i];
            if (feasible(cx[c], cy[c], eps)) {
                return c;
            }
        }
        return -1;
    }

    private static boolean less(int a, int b, double[] k1, double[] k2) {
        return k1[a] < k1[b] || (k1[a] == k1[b] && k2[a] < k2[b]);
    }

    private static void sort(int[] a, int lo, int hi, double[] k1, double[] k2) {
        while (hi - lo > 16) {
            int mid = (lo + hi) >>> 1;
            // median of three
            if (less(a[mid], a[lo], k1, k2)) {
                swap(a, mid, lo);
            }
            if (less(a[hi], a[lo], k1, k2)) {
                swap(a, hi, lo);
            }
            if (less(a[hi], a[mid], k1, k2)) {
                swap(a, hi, mid);
            }
            int pivot = a[mid];
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (less(a[i], pivot, k1, k2)) {
                    i++;
                }
                while (less(pivot, a[j], k1, k2)) {
                    j--;
                }
                if (i <= j) {
                    swap(a, i, j);
                    i++;
                    j--;
                }
            }
            if (j - lo < hi - i) {
                sort(a, lo, j, k1, k2);
                lo = i;
            } else {
                sort(a, i, hi, k1, k2);
                hi = j;
            }
        }
        for (int i = lo + 1; i <= hi; i++) {
            int v = a[i];
            int j = i - 1;
            while (j >= lo && less(v, a[j], k1, k2)) {
                a[j + 1] = a[j];
                j--;
            }
            a[j + 1] = v;
        }
    }

    private static void swap(int[] a, int i, int j) {
        int t = a[i];
        a[i] = a[j];
        a[j] = t;
    }
}
