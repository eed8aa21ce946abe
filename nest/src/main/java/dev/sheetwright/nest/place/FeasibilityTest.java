package dev.sheetwright.nest.place;

import java.util.Arrays;

/**
 * Whether a reference position is feasible (inside no test piece, or inside one only where a pocket allows it),
 * looked up through the grid; and whether a whole grid cell is blocked, worked out lazily and remembered for the
 * current search. Reused between searches of one thread.
 */
final class FeasibilityTest {
    /** covered[cell]: 2 blocked, 1 not blocked, 0 not yet worked out. */
    private byte[] covered = new byte[1];
    private CandidateGrid grid;
    private NoFitPieces pieces;
    private double eps;

    /** Starts a search over {@code grid}, built from {@code pieces}. */
    void reset(CandidateGrid grid, NoFitPieces pieces, double eps) {
        this.grid = grid;
        this.pieces = pieces;
        this.eps = eps;
        int cells = grid.cells();
        if (covered.length < cells) {
            covered = new byte[cells];
        }
        Arrays.fill(covered, 0, cells, (byte) 0);
    }

    boolean feasible(double x, double y) {
        int cell = grid.cellOf(x, y);
        for (int p = grid.testsFrom(cell), e = grid.testsFrom(cell + 1); p < e; p++) {
            if (pieces.blocks(grid.testAt(p), x, y, eps)) {
                return false;
            }
        }
        return true;
    }

    /** Whether the cell holding (x, y) is blocked whole (no position in it can be feasible). */
    boolean coveredAt(double x, double y) {
        return covered(grid.cellOf(x, y));
    }

    /** Whether the closed cell lies strictly inside one test piece, away from its pockets. */
    boolean covered(int cell) {
        byte v = covered[cell];
        if (v == 0) {
            v = computeCovered(cell) ? (byte) 2 : (byte) 1;
            covered[cell] = v;
        }
        return v == 2;
    }

    private boolean computeCovered(int cell) {
        int g = grid.side();
        double lx = grid.x0() + (cell % g) * grid.cellWidth();
        double ly = grid.y0() + (cell / g) * grid.cellHeight();
        double hx = lx + grid.cellWidth();
        double hy = ly + grid.cellHeight();
        for (int p = grid.testsFrom(cell), e = grid.testsFrom(cell + 1); p < e; p++) {
            if (pieces.blocksBox(grid.testAt(p), lx, ly, hx, hy, eps)) {
                return true;
            }
        }
        return false;
    }
}
