package dev.sheetwright.nest.overlap;

import java.util.SplittableRandom;

/**
 * Removes the overlap of a layout by guided local search. Pieces live in rectangular bins (a strip cut to length; a
 * piece may move to any open bin: the sheet search uses one bin per sheet); pieces in one bin must not collide and must stay inside it. One overlapping piece at a time moves to the
 * position, bin and rotation that minimise its weighted overlap (samples over every bin and around the current
 * position, the best refined by coordinate descent); the weight of a pair that keeps overlapping grows, and decays
 * when they are apart. Overlaps count in proportion to the areas of the pieces involved (see {@link #size}): moving a
 * small piece out of a large one's way is cheaper than the reverse, so large pieces settle and small ones fill the
 * room left. A run ends when the overlap is zero, or after {@link #STRIKES} rounds without progress.
 *
 * <p>Single-threaded and deterministic for a given random source. The caller bounds the work by a deadline and a
 * move budget; {@link #moves()} counts the piece moves made.
 */
final class Separator {
    static final int STRIKES = 3;
    static final int SWEEPS_WITHOUT_PROGRESS = 60;
    static final int BIN_SAMPLES = 24;
    static final int LOCAL_SAMPLES = 24;
    static final int REFINED = 2;
    /** Rounds of sliding against box sides after a refinement. */
    static final int SNAP_ROUNDS = 3;
    static final double WEIGHT_DECAY = 0.95;
    /** Refinement stops below this step, as a share of the piece's size. */
    static final double SMALLEST_STEP_SHARE = 1e-4;
    /** Most a pair's weight grows in one sweep (the deepest overlap), as a share of the weight. */
    static final double WEIGHT_GROWTH = 0.8;

    final int n;
    final SearchShape[] shapes;
    final PlacedShape[] at;
    final int[] bin;
    /** Bins as boxes x0, y0, x1, y1 where a piece's search shape must stay. */
    double[][] boxes;
    /** Bins a piece may move to (a strip has one). */
    boolean[] open;
    /** Pieces that never move (e.g. a part holding others in its holes). */
    final boolean[] fixed;
    /**
     * Pieces still where the caller placed them in a layout known to be feasible: two such pieces (or one and a
     * fixed piece) never count as overlapping, nor does such a piece sticking out of its bin, since their search
     * shapes are larger than the true outlines. A settled piece that moves is settled no more.
     */
    final boolean[] settled;
    /** The one bin a piece may move to, or -1 for any open bin (the default). */
    final int[] home;
    private final double[][] pair;
    private final double[][] weight;
    private final double[] out;
    private final double[] outWeight;
    private final OverlapMeasure measure;
    /**
     * How much each piece's overlaps count: its area over the mean piece's (the square of the mean square root of
     * the areas). A pair's overlap counts by the product of the two, sticking out of a bin by the square of one.
     */
    private final double[] size;
    private final AngleSet angles;
    private final SplittableRandom rnd;
    private final double precision;
    private long moves;
    private final PlacedShape cand = new PlacedShape();
    private final PlacedShape probe = new PlacedShape();

    Separator(SearchShape[] shapes, double[][] boxes, OverlapMeasure measure, AngleSet angles, SplittableRandom rnd,
            double precision) {
        this.n = shapes.length;
        this.shapes = shapes;
        this.at = new PlacedShape[n];
        for (int i = 0; i < n; i++) {
            at[i] = new PlacedShape();
        }
        this.bin = new int[n];
        this.fixed = new boolean[n];
        this.settled = new boolean[n];
        this.home = new int[n];
        java.util.Arrays.fill(home, -1);
        this.boxes = boxes;
        this.open = new boolean[boxes.length];
        java.util.Arrays.fill(open, true);
        this.pair = new double[n][n];
        this.weight = new double[n][n];
        this.out = new double[n];
        this.outWeight = new double[n];
        for (int i = 0; i < n; i++) {
            java.util.Arrays.fill(weight[i], 1);
        }
        java.util.Arrays.fill(outWeight, 1);
        this.measure = measure;
        this.size = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += Math.sqrt(shapes[i].area);
        }
        double mean = n > 0 ? sum / n : 1;
        for (int i = 0; i < n; i++) {
            size[i] = mean > 0 ? shapes[i].area / (mean * mean) : 1;
        }
        this.angles = angles;
        this.rnd = rnd;
        this.precision = precision;
    }

    long moves() {
        return moves;
    }

    void place(int i, int b, double x, double y, double angle) {
        bin[i] = b;
        at[i].set(shapes[i], x, y, angle);
    }

    /** How far the search shapes in bin b reach along x (the bin's near side when it holds none). */
    double reach(int b) {
        double r = boxes[b][0];
        for (int i = 0; i < n; i++) {
            if (bin[i] == b) {
                r = Math.max(r, at[i].maxX);
            }
        }
        return r;
    }

    /**
     * Cuts bin b from {@code length} (where its pieces reach) back to {@code end}: the pieces of b right of a random
     * line move left by the difference (they then overlap their neighbours along that line, which {@link #separate}
     * resolves). A settled piece the cut moves or leaves sticking out is settled no more: settled pieces are forgiven
     * for sticking out of their bin, and must not be past the new end.
     */
    void cutBin(int b, double length, double end) {
        double delta = length - end;
        double split = boxes[b][0] + rnd.nextDouble() * (length - boxes[b][0]);
        boxes[b][2] = end;
        for (int i = 0; i < n; i++) {
            if (bin[i] != b) {
                continue;
            }
            boolean slides = at[i].x > split;
            if (slides) {
                place(i, b, at[i].x - delta, at[i].y, at[i].angle);
            }
            if (slides || at[i].maxX > end) {
                settled[i] = false;
            }
        }
    }

    /** Recomputes every overlap (after pieces were placed or bins changed). */
    void refresh() {
        for (int i = 0; i < n; i++) {
            out[i] = asGiven(i) ? 0 : outAmount(i, at[i], bin[i]);
            for (int j = i + 1; j < n; j++) {
                double o = counts(i, j) ? pairAmount(i, at[i], j) : 0;
                pair[i][j] = o;
                pair[j][i] = o;
            }
        }
    }

    /** Whether piece i is placed as the caller's feasible layout has it (fixed or settled). */
    private boolean asGiven(int i) {
        return fixed[i] || settled[i];
    }

    /** Whether the overlap of pieces i and j counts: they share a bin and are not both as given. */
    private boolean counts(int i, int j) {
        return bin[i] == bin[j] && !(asGiven(i) && asGiven(j));
    }

    void resetWeights() {
        for (int i = 0; i < n; i++) {
            java.util.Arrays.fill(weight[i], 1);
        }
        java.util.Arrays.fill(outWeight, 1);
    }

    /** How much piece i placed as s sticking out of bin b counts (unweighted): see {@link #size}. */
    private double outAmount(int i, PlacedShape s, int b) {
        return outsideOf(s, b) * size[i] * size[i];
    }

    /** How much the overlap of piece i placed as s with piece j counts (unweighted): see {@link #size}. */
    private double pairAmount(int i, PlacedShape s, int j) {
        return measure.overlap(s, at[j]) * size[i] * size[j];
    }

    /** How far s sticks out of bin b; within the precision (what the checker forgives) it is inside. */
    private double outsideOf(PlacedShape s, int b) {
        double[] bx = boxes[b];
        double o = OverlapMeasure.outside(s, bx[0], bx[1], bx[2], bx[3]);
        return o <= precision ? 0 : o;
    }

    double outOf(int i) {
        return out[i];
    }

    /** Overlap of piece i with everything (unweighted). */
    double overlapOf(int i) {
        double s = out[i];
        for (int j = 0; j < n; j++) {
            s += pair[i][j];
        }
        return s;
    }

    double totalOverlap() {
        double s = 0;
        for (int i = 0; i < n; i++) {
            s += out[i];
            for (int j = i + 1; j < n; j++) {
                s += pair[i][j];
            }
        }
        return s;
    }

    /** Weighted overlap of piece i placed as {@code s} in bin b; stops early once above {@code limit}. */
    private double cost(int i, PlacedShape s, int b, double limit) {
        return cost(i, s, b, limit, false);
    }

    /**
     * As {@link #cost(int, PlacedShape, int, double)}; with {@code staying}, s is where piece i is, and what the
     * settled layout forgives it (see {@link #settled}) does not count.
     */
    private double cost(int i, PlacedShape s, int b, double limit, boolean staying) {
        boolean forgiven = staying && asGiven(i);
        double c = forgiven ? 0 : outWeight[i] * outsideOf(s, b) * size[i] * size[i];
        if (c > limit) {
            return c;
        }
        for (int j = 0; j < n; j++) {
            if (j == i || bin[j] != b || (forgiven && asGiven(j))) {
                continue;
            }
            double o = pairAmount(i, s, j);
            if (o > 0) {
                c += weight[i][j] * o;
                if (c > limit) {
                    return c;
                }
            }
        }
        return c;
    }

    /** Moves piece i to the best place found for it; returns whether it moved. */
    boolean move(int i) {
        return move(i, false);
    }

    /** Moves piece i to the best place found for it, away from where it is even if that is better. */
    void reinsert(int i) {
        move(i, true);
    }

    private boolean move(int i, boolean away) {
        if (fixed[i]) {
            return false;
        }
        moves++;
        double bestCost = away ? Double.POSITIVE_INFINITY : cost(i, at[i], bin[i], Double.POSITIVE_INFINITY, true);
        if (bestCost == 0) {
            return false;
        }
        double[][] top = new double[REFINED][];
        double[] topCost = new double[REFINED];
        java.util.Arrays.fill(topCost, Double.POSITIVE_INFINITY);
        if (!away) {
            offer(top, topCost, bestCost, bin[i], at[i].x, at[i].y, at[i].angle);
        }
        SearchShape sh = shapes[i];
        for (int k = 0; k < BIN_SAMPLES; k++) {
            int b = home[i] >= 0 ? home[i] : randomOpenBin();
            double a = angles.sample(rnd);
            probe.set(sh, 0, 0, a);
            double[] bx = boxes[b];
            double x = sampleIn(bx[0] - probe.minX, bx[2] - probe.maxX);
            double y = sampleIn(bx[1] - probe.minY, bx[3] - probe.maxY);
            cand.set(sh, x, y, a);
            double c = cost(i, cand, b, topCost[REFINED - 1]);
            offer(top, topCost, c, b, x, y, a);
        }
        double spread = Math.max(sh.reach, precision);
        for (int k = 0; k < (away ? 0 : LOCAL_SAMPLES); k++) {
            double r = spread * (k < LOCAL_SAMPLES / 2 ? 0.1 : 1.0);
            double x = at[i].x + (rnd.nextDouble() * 2 - 1) * r;
            double y = at[i].y + (rnd.nextDouble() * 2 - 1) * r;
            double a = rnd.nextInt(3) == 0 ? angles.sample(rnd) : at[i].angle;
            if (angles.free() && rnd.nextBoolean()) {
                a = at[i].angle + (rnd.nextDouble() * 2 - 1) * AngleSet.FREE_REFINE_STEP_DEG;
            }
            cand.set(sh, x, y, a);
            double c = cost(i, cand, bin[i], topCost[REFINED - 1]);
            offer(top, topCost, c, bin[i], x, y, a);
        }
        double[] best = null;
        double bc = Double.POSITIVE_INFINITY;
        for (int k = 0; k < REFINED; k++) {
            if (top[k] == null) {
                continue;
            }
            double[] r = refine(i, top[k], topCost[k]);
            if (r[4] < bc) {
                bc = r[4];
                best = r;
            }
        }
        if (best == null || !(bc < bestCost)) {
            return false;
        }
        place(i, (int) best[0], best[1], best[2], best[3]);
        settled[i] = false;
        update(i);
        return true;
    }

    private int randomOpenBin() {
        int count = 0;
        for (boolean o : open) {
            if (o) {
                count++;
            }
        }
        int k = rnd.nextInt(Math.max(1, count));
        for (int b = 0; b < open.length; b++) {
            if (open[b] && k-- == 0) {
                return b;
            }
        }
        return 0;
    }

    private double sampleIn(double lo, double hi) {
        if (hi <= lo) {
            return (lo + hi) / 2;
        }
        return lo + rnd.nextDouble() * (hi - lo);
    }

    private static void offer(double[][] top, double[] topCost, double c, int b, double x, double y, double a) {
        int k = top.length - 1;
        if (!(c < topCost[k])) {
            return;
        }
        while (k > 0 && c < topCost[k - 1]) {
            top[k] = top[k - 1];
            topCost[k] = topCost[k - 1];
            k--;
        }
        top[k] = new double[] {b, x, y, a};
        topCost[k] = c;
    }

    /** Coordinate descent from a candidate: steps in x, y (and angle when free) that shrink when nothing improves. */
    private double[] refine(int i, double[] start, double startCost) {
        int b = (int) start[0];
        double x = start[1];
        double y = start[2];
        double a = start[3];
        double c = startCost;
        SearchShape sh = shapes[i];
        double step = Math.max(sh.reach * 0.1, precision);
        double astep = angles.free() ? AngleSet.FREE_REFINE_STEP_DEG / 2 : 0;
        double minStep = Math.max(precision, sh.reach * SMALLEST_STEP_SHARE);
        int evals = 0;
        while (step >= minStep && c > 0 && evals < 60) {
            boolean better = false;
            for (int d = 0; d < 6 && c > 0; d++) {
                double nx = x;
                double ny = y;
                double na = a;
                switch (d) {
                    case 0 -> nx = x + step;
                    case 1 -> nx = x - step;
                    case 2 -> ny = y + step;
                    case 3 -> ny = y - step;
                    case 4 -> na = a + astep;
                    default -> na = a - astep;
                }
                if (d >= 4 && astep == 0) {
                    continue;
                }
                cand.set(sh, nx, ny, na);
                double nc = cost(i, cand, b, c);
                evals++;
                if (nc < c) {
                    x = nx;
                    y = ny;
                    a = na;
                    c = nc;
                    better = true;
                }
            }
            if (!better) {
                step /= 2;
                astep /= 2;
            }
        }
        if (c > 0) {
            double[] snapped = snap(i, b, x, y, a, c);
            x = snapped[0];
            y = snapped[1];
            c = snapped[2];
        }
        return new double[] {b, x, y, a, c};
    }

    /**
     * Exact fits: slides the piece so that its bounding box lies against a side of the bin or of a piece it collides
     * with, a few rounds, keeping a slide when it lowers the cost. Steps that halve never land a piece exactly in a
     * gap as wide as the piece; these do.
     */
    private double[] snap(int i, int b, double x, double y, double a, double c) {
        SearchShape sh = shapes[i];
        double[] bx = boxes[b];
        for (int round = 0; round < SNAP_ROUNDS && c > 0; round++) {
            cand.set(sh, x, y, a);
            double w0 = cand.minX - x;
            double w1 = cand.maxX - x;
            double h0 = cand.minY - y;
            double h1 = cand.maxY - y;
            double bestX = x;
            double bestY = y;
            double best = c;
            // sides of the bin, then of the pieces the candidate's box meets
            java.util.List<double[]> slides = new java.util.ArrayList<>(java.util.List.of(new double[] {bx[0] - w0, y},
                    new double[] {bx[2] - w1, y}, new double[] {x, bx[1] - h0}, new double[] {x, bx[3] - h1}));
            double minX = x + w0;
            double maxX = x + w1;
            double minY = y + h0;
            double maxY = y + h1;
            for (int j = 0; j < n; j++) {
                PlacedShape o = at[j];
                if (j == i || bin[j] != b || o.maxX <= minX || o.minX >= maxX || o.maxY <= minY || o.minY >= maxY) {
                    continue;
                }
                slides.add(new double[] {o.maxX - w0, y});
                slides.add(new double[] {o.minX - w1, y});
                slides.add(new double[] {x, o.maxY - h0});
                slides.add(new double[] {x, o.minY - h1});
            }
            for (double[] sl : slides) {
                cand.set(sh, sl[0], sl[1], a);
                double nc = cost(i, cand, b, best);
                if (nc < best) {
                    best = nc;
                    bestX = sl[0];
                    bestY = sl[1];
                }
            }
            if (!(best < c)) {
                break;
            }
            x = bestX;
            y = bestY;
            c = best;
        }
        return new double[] {x, y, c};
    }

    /** Recomputes the overlaps of piece i after it moved. */
    void update(int i) {
        out[i] = asGiven(i) ? 0 : outAmount(i, at[i], bin[i]);
        for (int j = 0; j < n; j++) {
            if (j == i) {
                continue;
            }
            double o = counts(i, j) ? pairAmount(i, at[i], j) : 0;
            pair[i][j] = o;
            pair[j][i] = o;
        }
    }

    private void growWeights() {
        double max = 0;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, out[i]);
            for (int j = i + 1; j < n; j++) {
                max = Math.max(max, pair[i][j]);
            }
        }
        if (max <= 0) {
            return;
        }
        for (int i = 0; i < n; i++) {
            outWeight[i] = out[i] > 0 ? outWeight[i] * (1.2 + WEIGHT_GROWTH * out[i] / max) : Math.max(1, outWeight[i] * WEIGHT_DECAY);
            for (int j = i + 1; j < n; j++) {
                double w = pair[i][j] > 0 ? weight[i][j] * (1.2 + WEIGHT_GROWTH * pair[i][j] / max) : Math.max(1, weight[i][j] * WEIGHT_DECAY);
                weight[i][j] = w;
                weight[j][i] = w;
            }
        }
    }

    /** Where every piece is (bin, x, y, angle, 1 when settled), to put back later. */
    double[][] snapshot() {
        double[][] s = new double[n][];
        for (int i = 0; i < n; i++) {
            s[i] = new double[] {bin[i], at[i].x, at[i].y, at[i].angle, settled[i] ? 1 : 0};
        }
        return s;
    }

    void restore(double[][] s) {
        for (int i = 0; i < n; i++) {
            place(i, (int) s[i][0], s[i][1], s[i][2], s[i][3]);
            settled[i] = s[i][4] != 0;
        }
        refresh();
    }

    /** How the separation is bounded: stop at {@code deadline} (nanoTime) or after {@code moveLimit} moves in all. */
    record Budget(long deadline, long moveLimit) {
        boolean spent(long moves) {
            return moves >= moveLimit || System.nanoTime() >= deadline;
        }
    }

    /**
     * Separates: true when the overlap reached zero (the layout is then the separated one), false when the strikes or
     * the budget ran out (the layout is then the least overlapping one found).
     */
    boolean separate(Budget budget) {
        refresh();
        double bestTotal = totalOverlap();
        if (bestTotal == 0) {
            return true;
        }
        double[][] best = snapshot();
        int[] order = new int[n];
        for (int strike = 0; strike < STRIKES; strike++) {
            int still = 0;
            while (still < SWEEPS_WITHOUT_PROGRESS) {
                if (budget.spent(moves)) {
                    restore(best);
                    return false;
                }
                int m = 0;
                for (int i = 0; i < n; i++) {
                    if (!fixed[i] && overlapOf(i) > 0) {
                        order[m++] = i;
                    }
                }
                for (int k = m - 1; k > 0; k--) {
                    int j = rnd.nextInt(k + 1);
                    int t = order[k];
                    order[k] = order[j];
                    order[j] = t;
                }
                for (int k = 0; k < m; k++) {
                    if (budget.spent(moves)) {
                        restore(best);
                        return false;
                    }
                    if (overlapOf(order[k]) > 0) {
                        move(order[k]);
                    }
                }
                double total = totalOverlap();
                if (total == 0) {
                    return true;
                }
                if (total < bestTotal) {
                    bestTotal = total;
                    best = snapshot();
                    still = 0;
                } else {
                    still++;
                }
                growWeights();
            }
            restore(best);
        }
        return false;
    }
}
