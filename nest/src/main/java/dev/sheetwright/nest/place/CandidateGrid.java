package dev.sheetwright.nest.place;

import java.util.Arrays;

/**
 * A uniform g x g grid over an inner-fit rectangle with, per cell, the test pieces whose box meets it and the
 * (closed) edges of the edge pieces that pass through it: the index behind the feasibility test and the search for
 * edge crossings. Reused between searches of one thread.
 */
final class CandidateGrid {
    /** Grid cells per side at most, and cells per bounding edge: tuned on the strip benchmarks. */
    private static final int GRID_MAX = 128;
    private static final double GRID_DENSITY = 1.0;

    private int g;
    private double gx0;
    private double gy0;
    private double cellW;
    private double cellH;
    private int[] testStart = new int[1];
    private int[] testCells = new int[256];
    private int[] edgeStart = new int[1];
    private int[] edgePiece = new int[1024];
    private int[] edgeIdx = new int[1024];
    private int[] counts = new int[1];

    int side() {
        return g;
    }

    int cells() {
        return g * g;
    }

    double x0() {
        return gx0;
    }

    double y0() {
        return gy0;
    }

    double cellWidth() {
        return cellW;
    }

    double cellHeight() {
        return cellH;
    }

    int cellX(double x) {
        int i = (int) Math.floor((x - gx0) / cellW);
        return i < 0 ? 0 : Math.min(g - 1, i);
    }

    int cellY(double y) {
        int i = (int) Math.floor((y - gy0) / cellH);
        return i < 0 ? 0 : Math.min(g - 1, i);
    }

    int cellOf(double x, double y) {
        return cellY(y) * g + cellX(x);
    }

    /** Test pieces of {@code cell} are {@code testAt(p)} for p in testsFrom(cell) .. testsFrom(cell + 1). */
    int testsFrom(int cell) {
        return testStart[cell];
    }

    int testAt(int p) {
        return testCells[p];
    }

    /** Edges of {@code cell} are entries edgesFrom(cell) .. edgesFrom(cell + 1): edge piece and edge index. */
    int edgesFrom(int cell) {
        return edgeStart[cell];
    }

    int edgePieceAt(int e) {
        return edgePiece[e];
    }

    int edgeIndexAt(int e) {
        return edgeIdx[e];
    }

    /** Buckets the test pieces (by box) and the edges (by box) of {@code pieces} over the rectangle. */
    void build(NoFitPieces pieces, double x0, double y0, double x1, double y1) {
        int edgeCount = 0;
        for (int k = 0; k < pieces.edges(); k++) {
            edgeCount += pieces.edge(k).size();
        }
        g = (int) Math.max(1, Math.min(GRID_MAX, Math.sqrt(edgeCount * GRID_DENSITY)));
        gx0 = x0;
        gy0 = y0;
        cellW = Math.max((x1 - x0) / g, Double.MIN_NORMAL);
        cellH = Math.max((y1 - y0) / g, Double.MIN_NORMAL);
        int cells = g * g;
        if (counts.length < cells + 1) {
            counts = new int[cells + 1];
            testStart = new int[cells + 1];
            edgeStart = new int[cells + 1];
        }
        bucketTests(pieces, cells);
        bucketEdges(pieces, cells, x0, y0, x1, y1);
    }

    private void bucketTests(NoFitPieces pieces, int cells) {
        Arrays.fill(counts, 0, cells + 1, 0);
        for (int pass = 0; pass < 2; pass++) {
            for (int k = 0; k < pieces.tests(); k++) {
                ConvexPolygon c = pieces.test(k);
                int a0 = cellX(c.minX + pieces.testX(k));
                int a1 = cellX(c.maxX + pieces.testX(k));
                int b0 = cellY(c.minY + pieces.testY(k));
                int b1 = cellY(c.maxY + pieces.testY(k));
                for (int b = b0; b <= b1; b++) {
                    for (int a = a0; a <= a1; a++) {
                        int at = bucketSlot(b * g + a, pass, testStart);
                        if (at >= 0) {
                            testCells[at] = k;
                        }
                    }
                }
            }
            if (pass == 0) {
                int total = prefix(testStart, cells);
                if (testCells.length < total) {
                    testCells = new int[total * 2];
                }
                Arrays.fill(counts, 0, cells, 0);
            }
        }
    }

    private void bucketEdges(NoFitPieces pieces, int cells, double x0, double y0, double x1, double y1) {
        Arrays.fill(counts, 0, cells + 1, 0);
        for (int pass = 0; pass < 2; pass++) {
            for (int k = 0; k < pieces.edges(); k++) {
                ConvexPolygon c = pieces.edge(k);
                double tx = pieces.edgeX(k);
                double ty = pieces.edgeY(k);
                int n = c.size();
                for (int i = 0; i < n; i++) {
                    if (c.isOpen(i)) {
                        continue;
                    }
                    int j = i + 1 == n ? 0 : i + 1;
                    double ax = c.xs[i] + tx;
                    double ay = c.ys[i] + ty;
                    double bx = c.xs[j] + tx;
                    double by = c.ys[j] + ty;
                    if (Math.max(ax, bx) < x0 || Math.min(ax, bx) > x1 || Math.max(ay, by) < y0 || Math.min(ay, by) > y1) {
                        continue;
                    }
                    int a0 = cellX(Math.min(ax, bx));
                    int a1 = cellX(Math.max(ax, bx));
                    int b0 = cellY(Math.min(ay, by));
                    int b1 = cellY(Math.max(ay, by));
                    for (int b = b0; b <= b1; b++) {
                        for (int a = a0; a <= a1; a++) {
                            int at = bucketSlot(b * g + a, pass, edgeStart);
                            if (at >= 0) {
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

    /** Counting pass (0): counts the cell and returns -1; filling pass: the next free slot of the cell's bucket. */
    private int bucketSlot(int cell, int pass, int[] start) {
        if (pass == 0) {
            counts[cell]++;
            return -1;
        }
        return start[cell] + counts[cell]++;
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
}
