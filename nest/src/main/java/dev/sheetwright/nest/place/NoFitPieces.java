package dev.sheetwright.nest.place;

import java.util.Arrays;

/**
 * The translated convex pieces of the no-fit polygons that reach into one inner-fit rectangle, gathered for one
 * bottom-left search: test pieces (a position strictly inside one is infeasible, unless it lies in a pocket of the
 * piece's group), pocket groups (where the moving part sits in a hole), and edge pieces (whose edges give
 * candidate positions). Reused between searches of one thread.
 */
final class NoFitPieces {
    private ConvexPolygon[] test = new ConvexPolygon[256];
    private double[] testX = new double[256];
    private double[] testY = new double[256];
    /** distinct[k]: test piece k belongs to a union whose boundary hides zero-width slits (its vertices count). */
    private boolean[] distinct = new boolean[256];
    /** group[k]: pocket group of test piece k, or -1. */
    private int[] group = new int[256];
    private int tests;

    private ConvexPolygon[] pockets = new ConvexPolygon[16];
    private double[] pocketX = new double[16];
    private double[] pocketY = new double[16];
    private int pocketCount;
    /** Pockets of group g are pockets[groupStart[g] .. groupStart[g + 1]). */
    private int[] groupStart = new int[17];
    private int groups;

    private ConvexPolygon[] edge = new ConvexPolygon[256];
    private double[] edgeX = new double[256];
    private double[] edgeY = new double[256];
    private int edges;

    void clear() {
        tests = 0;
        edges = 0;
        pocketCount = 0;
        groups = 0;
        groupStart[0] = 0;
    }

    /** Starts a pocket group (the pockets of one no-fit polygon at x, y); returns its index. */
    int addGroup(ConvexPolygon[] ps, double x, double y) {
        for (ConvexPolygon c : ps) {
            if (pocketCount == pockets.length) {
                pockets = Arrays.copyOf(pockets, pocketCount * 2);
                pocketX = Arrays.copyOf(pocketX, pocketCount * 2);
                pocketY = Arrays.copyOf(pocketY, pocketCount * 2);
            }
            pockets[pocketCount] = c;
            pocketX[pocketCount] = x;
            pocketY[pocketCount] = y;
            pocketCount++;
        }
        if (groups + 2 > groupStart.length) {
            groupStart = Arrays.copyOf(groupStart, groupStart.length * 2);
        }
        groups++;
        groupStart[groups] = pocketCount;
        return groups - 1;
    }

    /** A test piece at x, y; {@code inUnion}: its vertices are candidates too; {@code pocketGroup}: or -1. */
    void addTest(ConvexPolygon c, double x, double y, boolean inUnion, int pocketGroup) {
        if (tests == test.length) {
            int n = tests * 2;
            test = Arrays.copyOf(test, n);
            testX = Arrays.copyOf(testX, n);
            testY = Arrays.copyOf(testY, n);
            distinct = Arrays.copyOf(distinct, n);
            group = Arrays.copyOf(group, n);
        }
        test[tests] = c;
        testX[tests] = x;
        testY[tests] = y;
        distinct[tests] = inUnion;
        group[tests] = pocketGroup;
        tests++;
    }

    /** A piece whose edges (all but the open ones) bound the region: source of candidate positions. */
    void addEdge(ConvexPolygon c, double x, double y) {
        if (edges == edge.length) {
            int n = edges * 2;
            edge = Arrays.copyOf(edge, n);
            edgeX = Arrays.copyOf(edgeX, n);
            edgeY = Arrays.copyOf(edgeY, n);
        }
        edge[edges] = c;
        edgeX[edges] = x;
        edgeY[edges] = y;
        edges++;
    }

    int tests() {
        return tests;
    }

    ConvexPolygon test(int k) {
        return test[k];
    }

    double testX(int k) {
        return testX[k];
    }

    double testY(int k) {
        return testY[k];
    }

    boolean inUnion(int k) {
        return distinct[k];
    }

    int edges() {
        return edges;
    }

    ConvexPolygon edge(int k) {
        return edge[k];
    }

    double edgeX(int k) {
        return edgeX[k];
    }

    double edgeY(int k) {
        return edgeY[k];
    }

    /** Whether (x, y) lies strictly inside test piece k and in none of its pockets: an overlapping position. */
    boolean blocks(int k, double x, double y, double eps) {
        return test[k].containsStrictly(x, y, testX[k], testY[k], eps) && (group[k] < 0 || !inPocket(group[k], x, y, eps));
    }

    /** Whether the closed box lies strictly inside test piece k, away from its pockets: holds no feasible point. */
    boolean blocksBox(int k, double lx, double ly, double hx, double hy, double eps) {
        ConvexPolygon c = test[k];
        double x = testX[k];
        double y = testY[k];
        return c.containsStrictly(lx, ly, x, y, eps) && c.containsStrictly(hx, hy, x, y, eps)
                && c.containsStrictly(lx, hy, x, y, eps) && c.containsStrictly(hx, ly, x, y, eps)
                && (group[k] < 0 || !pocketTouches(group[k], lx - eps, ly - eps, hx + eps, hy + eps));
    }

    private boolean inPocket(int g, double x, double y, double eps) {
        for (int q = groupStart[g]; q < groupStart[g + 1]; q++) {
            if (pockets[q].containsClosed(x, y, pocketX[q], pocketY[q], eps)) {
                return true;
            }
        }
        return false;
    }

    private boolean pocketTouches(int g, double lx, double ly, double hx, double hy) {
        for (int q = groupStart[g]; q < groupStart[g + 1]; q++) {
            ConvexPolygon c = pockets[q];
            if (c.minX + pocketX[q] <= hx && c.maxX + pocketX[q] >= lx && c.minY + pocketY[q] <= hy && c.maxY + pocketY[q] >= ly) {
                return true;
            }
        }
        return false;
    }
}
