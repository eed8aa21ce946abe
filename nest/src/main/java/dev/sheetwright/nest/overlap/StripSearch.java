package dev.sheetwright.nest.overlap;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;

/**
 * Shortens the strip (a coil) of a feasible one-strip nest by overlap minimisation: cut the strip shorter (the pieces
 * right of a random line move left by the cut), separate; on success keep it and cut again, on failure start again
 * from the best layout with two large pieces swapped and a smaller cut. The last share of the run cuts in small steps
 * (compression). Several logical workers search from seeds derived from the seed; the shortest layout that passes
 * {@link NestChecker} is returned, else the given one.
 *
 * <p>With an iteration count the workers are {@link #FIXED_WORKERS} whatever the thread count, each with an equal
 * share of the piece moves, so the result depends only on the input, the seed and the count.
 */
public final class StripSearch {
    /** Logical workers of a run with an iteration count. */
    public static final int FIXED_WORKERS = 4;
    /** First cut of the strip, as a share of its length. */
    static final double FIRST_CUT = 0.02;
    static final double SMALLEST_CUT = 0.002;
    /** Share of the run after which the strip is cut in small steps only. */
    static final double COMPRESS_AT = 0.8;
    static final int FAILS_BEFORE_SMALLER_CUT = 2;

    private final NestRequest request;
    private final NestResult start;
    private final PiecePoses poses;
    private final Coil coil;
    private final List<Placement> startParts;
    private final SearchShape[] shapes;
    private final double grow;
    private final double precision;
    private final OverlapMeasure measure;
    private final AngleSet angles;
    private final double x0;
    private final double y0;
    private final double y1;

    private StripSearch(NestRequest request, NestResult start) {
        this.request = request;
        this.start = start;
        if (start.sheets().size() != 1 || !(start.sheets().get(0).stock() instanceof Coil c)) {
            throw new IllegalArgumentException("strip search needs a nest on exactly one coil, got "
                    + start.sheets().size() + " layouts");
        }
        this.coil = c;
        this.startParts = start.sheets().get(0).parts();
        double gap = request.rules().gap();
        double margin = request.rules().margin();
        this.precision = precisionOf(request, start);
        this.grow = PiecePoses.growFor(request.rules(), precision);
        this.x0 = margin - gap / 2;
        this.y0 = margin - gap / 2;
        this.y1 = coil.width() - margin + gap / 2;
        this.angles = AngleSet.of(request.rules().rotation());
        this.poses = new PiecePoses(request.pieces(), grow, precision);
        int n = startParts.size();
        this.shapes = new SearchShape[n];
        double reach = 0;
        for (int i = 0; i < n; i++) {
            Placement p = startParts.get(i);
            shapes[i] = poses.shape(p);
            reach += shapes[i].reach;
        }
        double meanReach = n > 0 ? reach / n : 1;
        this.measure = OverlapMeasure.forPieces(meanReach, precision);
    }

    /**
     * The length the search distinguishes: what the independent checker forgives at this strip's scale (so a
     * crossing the search calls touching is one the checker accepts; with a gap, shapes are grown by as much).
     */
    private static double precisionOf(NestRequest request, NestResult start) {
        NestPrecision p = NestPrecision.ofScale(NestPrecision.scaleOf(request.pieces(), request.stock()));
        return p.checkTolerance(start.sheets().get(0).usedLength());
    }

    /** The search over a feasible one-coil nest, for tests of its conversions. */
    static StripSearch over(NestRequest request, NestResult start) {
        return new StripSearch(request, start);
    }

    int pieceCount() {
        return shapes.length;
    }

    /**
     * A nest of {@code request} on one coil, at most as long as {@code start} (a feasible nest of it), searched within
     * {@code options} (its deadline is {@code deadlineNanos}, a {@link System#nanoTime()} value).
     */
    public static NestResult shorten(NestRequest request, NestResult start, NestOptions options, long deadlineNanos) {
        if (start.sheets().size() != 1 || !start.unplaced().isEmpty() || start.sheets().get(0).parts().size() < 2) {
            return start;
        }
        return new StripSearch(request, start).run(options, deadlineNanos);
    }

    private NestResult run(NestOptions options, long deadline) {
        boolean counted = options.iterations().isPresent();
        int workers = counted ? FIXED_WORKERS : options.threads();
        long perWorker = counted ? Math.max(1, options.iterations().getAsLong() / workers) : Long.MAX_VALUE;
        List<double[][]> results = LogicalWorkers.run("strip-search", workers, options.threads(), options.seed(),
                seed -> () -> new Worker(seed, new Separator.Budget(deadline, perWorker), counted).call());
        // the shortest checked layout, ties to the lowest worker
        NestResult best = start;
        double bestLength = start.sheets().get(0).usedLength();
        for (double[][] poses : results) {
            if (poses == null) {
                continue;
            }
            NestResult r = toResult(poses);
            double len = r.sheets().get(0).usedLength();
            if (len < bestLength && NestChecker.check(request, r).isEmpty()) {
                best = r;
                bestLength = len;
            }
        }
        return best;
    }

    /** The poses as a nest: the used length is measured on the true outlines moved by their placements. */
    NestResult toResult(double[][] poses) {
        List<Placement> parts = new ArrayList<>();
        double maxX = Double.NEGATIVE_INFINITY;
        double area = 0;
        for (int i = 0; i < poses.length; i++) {
            Placement p = PiecePoses.placement(startParts.get(i), shapes[i], poses[i][1], poses[i][2], poses[i][3]);
            parts.add(p);
            Polygon shape = this.poses.piece(p).shape();
            Envelope e = p.apply(shape).getEnvelopeInternal();
            maxX = Math.max(maxX, e.getMaxX());
            area += shape.getArea();
        }
        double used = Math.max(0, maxX + request.rules().margin());
        double util = Math.min(1, area / (coil.width() * used));
        SheetLayout layout = new SheetLayout(coil, 0, used, parts, null, util);
        return new NestResult(List.of(layout), start.unplaced());
    }

    /** One logical worker with its own random source. */
    private final class Worker {
        private final SplittableRandom rnd;
        private final Separator.Budget budget;
        private final boolean counted;
        private final Separator sep;
        private final long started = System.nanoTime();

        Worker(long seed, Separator.Budget budget, boolean counted) {
            this.rnd = new SplittableRandom(seed);
            this.budget = budget;
            this.counted = counted;
            this.sep = new Separator(shapes, new double[][] {{x0, y0, Double.MAX_VALUE, y1}}, measure, angles, rnd, precision);
        }

        private double progress() {
            if (counted) {
                return (double) sep.moves() / budget.moveLimit();
            }
            long span = Math.max(1, budget.deadline() - started);
            return (double) (System.nanoTime() - started) / span;
        }

        private double usedLength() {
            return sep.reach(0);
        }

        /** Poses (bin, x, y, angle) of the shortest overlap-free layout found, or null if none beat the start. */
        double[][] call() {
            for (int i = 0; i < sep.n; i++) {
                Placement p = startParts.get(i);
                double[] ref = PiecePoses.reference(p, shapes[i]);
                sep.place(i, 0, ref[0], ref[1], p.rotationDeg());
            }
            double length = usedLength();
            sep.boxes[0][2] = length;
            if (!sep.separate(budget)) {
                return null;
            }
            double[][] best = sep.snapshot();
            double bestLength = usedLength();
            double startLength = bestLength;
            double cut = FIRST_CUT;
            int fails = 0;
            while (!budget.spent(sep.moves())) {
                boolean compress = progress() >= COMPRESS_AT;
                double share = compress ? SMALLEST_CUT + rnd.nextDouble() * (FIRST_CUT / 4 - SMALLEST_CUT) : cut;
                double target = bestLength * (1 - share);
                sep.restore(best);
                if (fails > 0 && !compress) {
                    swapLarge();
                }
                sep.cutBin(0, bestLength, target);
                sep.resetWeights();
                if (sep.separate(budget)) {
                    best = sep.snapshot();
                    bestLength = usedLength();
                    fails = 0;
                } else if (++fails >= FAILS_BEFORE_SMALLER_CUT) {
                    cut = Math.max(SMALLEST_CUT, cut / 2);
                    fails = 0;
                }
            }
            return bestLength < startLength ? best : null;
        }

        /** Disruption: two large pieces trade places (each keeps its rotation). */
        private void swapLarge() {
            int n = sep.n;
            double[] areas = new double[n];
            double sum = 0;
            for (int i = 0; i < n; i++) {
                areas[i] = shapes[i].area;
                sum += areas[i];
            }
            double mean = sum / n;
            for (int attempt = 0; attempt < 20; attempt++) {
                int a = rnd.nextInt(n);
                int b = rnd.nextInt(n);
                if (a == b || areas[a] < mean || areas[b] < mean || shapes[a] == shapes[b]) {
                    continue;
                }
                double ax = sep.at[a].x;
                double ay = sep.at[a].y;
                double aa = sep.at[a].angle;
                sep.place(a, 0, sep.at[b].x, sep.at[b].y, aa);
                sep.place(b, 0, ax, ay, sep.at[b].angle);
                return;
            }
        }
    }
}
