package dev.sheetwright.nest.place;

/**
 * Per-thread working memory of the bottom-left search, in named parts: the gathered no-fit pieces, the grid over
 * the inner-fit rectangle, the feasibility test and the candidate positions.
 */
final class Scratch {
    final NoFitPieces pieces = new NoFitPieces();
    final CandidateGrid grid = new CandidateGrid();
    final FeasibilityTest test = new FeasibilityTest();
    final Candidates candidates = new Candidates();

    /** Indexes the gathered pieces over the rectangle and starts a new candidate list. */
    void index(double x0, double y0, double x1, double y1, double eps) {
        grid.build(pieces, x0, y0, x1, y1);
        test.reset(grid, pieces, eps);
        candidates.reset(test);
    }
}
