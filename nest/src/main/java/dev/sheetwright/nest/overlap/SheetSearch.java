package dev.sheetwright.nest.overlap;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalLong;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Predicate;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestFailure;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRanking;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.ProgressListener;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Stock;
import dev.sheetwright.nest.place.Nester;

/**
 * Sheet elimination: takes a feasible nest on sheets (and remnants) and empties sheets one at a time. The sheet to
 * empty is the least filled one (by part area; on a tie the later one). Its parts go, largest first, one at a time
 * onto another open sheet: the part is put where it overlaps least among places sampled there, and a {@link Separator}
 * over that sheet's parts alone (all of them may move, within the sheet) removes the overlap. Each part first gets a
 * quick try ({@link #QUICK_MOVES} piece moves: a part that fits a hole, or nearly) on every sheet with room for it by
 * area, the emptiest first; the first part that stays then gets a thorough try ({@link #ATTEMPT_MOVES}) on
 * {@link #DESTINATIONS} of them, before smaller parts take the room. In a timed run tries go {@link #LANES} at a
 * time, side by side on their own threads, and the first in order that succeeds is kept. When every part has left, the
 * sheet closes and the next least filled one is emptied. A part that stays keeps the sheet open; the parts that moved stay moved (the
 * layout is feasible after every insertion, and the sheet only emptier), and the next round tries again with the
 * thorough tries on sheets chosen at random and, from the second round on, trades: the part goes onto a sheet whose
 * smaller parts may leave for the sheet being emptied, if they bring less area than it takes away or are much
 * smaller. Emptying stops when {@link #ELIMINATION_SHARE} of the budget is spent, or when no sheet has room by area
 * for any part of the sheet to empty; the rest compacts the last open sheet toward its near end, for the largest
 * offcut there. Layouts are ranked by {@link NestRanking}, so a worker that empties no sheet may still leave a larger
 * offcut on the last.
 *
 * <p>Separating on one sheet at a time keeps each separation small (a sheet's parts, not the job's), so it is fast
 * enough on jobs of hundreds of parts.
 *
 * <p>What stays where it is: layouts on remnants (they are the cheapest stock and keep their parts; sheet parts do
 * not move onto remnants, whose outlines need not be rectangles), parts that hold other parts in their holes and
 * those held parts (the host is fixed, the held part keeps its place in the hole; a sheet with such a host is never
 * emptied), and coils. So a remnant is never traded for a sheet and the cost never rises. Each sheet's bin is the
 * sheet less the margin, widened by half the gap, since the search shapes carry half the gap.
 *
 * <p>With an iteration count, {@link StripSearch#FIXED_WORKERS} logical workers each make an equal share of the
 * piece moves, whatever the thread count, so the result depends only on the input, the seed and the count (each
 * try draws from its own random source, split from its worker's in order); a timed run has one worker per
 * {@link #LANES} threads. The best layout by {@link NestRanking} that passes {@link NestChecker} is returned
 * (ties keep the given nest, then the lowest worker).
 */
public final class SheetSearch {
    /**
     * Most copies a request may have for the sheet search: each insertion scans every part's pose, and the
     * separation over a sheet keeps two weights per pair of its parts, so sheets of many small parts grow costly; on
     * larger jobs the first engine makes better use of the time (kept from the earlier search, not measured again).
     */
    public static final int MAX_COPIES = 1500;
    /** Most open sheets a part is offered to, in one try to empty a sheet. */
    static final int DESTINATIONS = 4;
    /** Share of a worker's budget for emptying sheets; the rest compacts the last sheet. */
    static final double ELIMINATION_SHARE = 0.95;
    /** First cut when compacting the last sheet, as a share of its used length. */
    static final double COMPACT_FIRST_CUT = 0.05;
    static final double COMPACT_SMALLEST_CUT = 0.002;
    /**
     * A trade may bring more area to the sheet being emptied than it takes away only in parts each at most this share
     * of the part that left (parts that much smaller find room elsewhere more easily).
     */
    static final double SMALLER_SHARE = 0.5;
    /**
     * Tries a worker runs side by side (a part offered to this many sheets at once) on so many threads of its own in a
     * timed run; a run of fixed steps (or on one thread) takes them in turn and stops at the first that succeeds, so
     * its nest does not depend on the thread count.
     */
    static final int LANES = 2;
    /** Most piece moves a quick insertion may take to separate. */
    static final long QUICK_MOVES = 100;
    /** Most piece moves one insertion may take to separate. */
    static final long ATTEMPT_MOVES = 3000;

    private static final GeometryFactory GF = new GeometryFactory();

    private final NestRequest request;
    private final NestResult start;
    private final PiecePoses poses;
    /** The layouts of the start that take part (sheets), by bin. */
    private final List<SheetLayout> binLayouts = new ArrayList<>();
    /** The parts that take part, with their bin. */
    private final List<Placement> parts = new ArrayList<>();
    private final List<Integer> partBin = new ArrayList<>();
    private final boolean[] partFixed;
    /** Parts held in another part's hole, by bin: they go back exactly where they were. */
    private final List<List<Placement>> held = new ArrayList<>();
    private final SearchShape[] shapes;
    private final double[][] boxes;
    private final double precision;
    private final OverlapMeasure measure;
    private final AngleSet angles;

    private SheetSearch(NestRequest request, NestResult start) {
        this.request = request;
        this.start = start;
        double gap = request.rules().gap();
        double margin = request.rules().margin();
        double extent = 0;
        for (SheetLayout l : start.sheets()) {
            if (l.stock() instanceof Sheet s) {
                extent = Math.max(extent, Math.max(s.width(), s.height()));
            }
        }
        this.precision = request.precision().checkTolerance(extent);
        this.poses = new PiecePoses(request.pieces(), PiecePoses.growFor(request.rules(), precision), precision);
        this.angles = AngleSet.of(request.rules().rotation());
        List<double[]> bx = new ArrayList<>();
        List<Boolean> fixedList = new ArrayList<>();
        for (SheetLayout l : start.sheets()) {
            if (!(l.stock() instanceof Sheet s)) {
                continue;
            }
            int b = binLayouts.size();
            binLayouts.add(l);
            bx.add(new double[] {margin - gap / 2, margin - gap / 2, s.width() - margin + gap / 2, s.height() - margin + gap / 2});
            List<Placement> guests = new ArrayList<>();
            held.add(guests);
            List<Polygon> outlines = new ArrayList<>();
            for (Placement p : l.parts()) {
                outlines.add(p.apply(poses.piece(p).shape()));
            }
            boolean[] isGuest = new boolean[outlines.size()];
            boolean[] isHost = new boolean[outlines.size()];
            for (int h = 0; h < outlines.size(); h++) {
                Polygon host = outlines.get(h);
                if (host.getNumInteriorRing() == 0) {
                    continue;
                }
                Polygon shell = GF.createPolygon(host.getExteriorRing().getCoordinates());
                for (int g = 0; g < outlines.size(); g++) {
                    if (g != h && shell.contains(outlines.get(g).getInteriorPoint())) {
                        isGuest[g] = true;
                        isHost[h] = true;
                    }
                }
            }
            for (int k = 0; k < outlines.size(); k++) {
                if (isGuest[k]) {
                    guests.add(l.parts().get(k));
                } else {
                    parts.add(l.parts().get(k));
                    partBin.add(b);
                    fixedList.add(isHost[k]);
                }
            }
        }
        this.boxes = bx.toArray(double[][]::new);
        int n = parts.size();
        this.shapes = new SearchShape[n];
        this.partFixed = new boolean[n];
        double reach = 0;
        for (int i = 0; i < n; i++) {
            shapes[i] = poses.shape(parts.get(i));
            partFixed[i] = fixedList.get(i);
            reach += shapes[i].reach;
        }
        double meanReach = n > 0 ? reach / n : 1;
        this.measure = OverlapMeasure.forPieces(meanReach, precision);
    }

    /**
     * Shortest time limit for which a job's nest searches sheets unless told otherwise. The first layout then gets
     * half the time, and on shorter runs that costs more than the sheet search wins: measured on the fixture jobs
     * (README, nesting benchmarks), at 10 s it left a smaller offcut on the last sheet and saved no sheet, at 30 s
     * and 60 s it saved one of twelve on riverside-300.
     */
    public static final Duration WORTHWHILE = Duration.ofSeconds(30);

    /**
     * Whether a job's nest searches sheets when not told: a timed run of at least {@link #WORTHWHILE} (a run of fixed
     * steps does not, so that its nest stays what the first engine makes of the steps).
     */
    public static boolean byDefault(NestOptions options) {
        return options.iterations().isEmpty() && options.timeLimit().compareTo(WORTHWHILE) >= 0;
    }

    /** Share of a timed search the first layout (the no-fit-polygon engine) gets before sheet elimination. */
    public static final double FIRST_LAYOUT_SHARE = 0.5;

    /**
     * A nest of {@code request} in two stages: the no-fit-polygon engine ({@link Nester}) makes the first layout in
     * {@link #FIRST_LAYOUT_SHARE} of the time (with an iteration count: all its steps), then {@link #eliminate} tries
     * to empty sheets in the rest (with an iteration count: as many piece moves). When the first layout has no more
     * sheets than the area of its parts needs ({@link #roomToEmpty}), a timed run gives the rest to another run of
     * the first engine from another seed instead, and the better nest by {@link NestRanking} wins. Else a timed run
     * searches sheets on its threads in groups of {@link #LANES}; a thread left over runs the first engine again
     * meanwhile (the better nest wins). When the sheet search does not apply (no sheets, or more than
     * {@link #MAX_COPIES} copies) the first engine gets all the time.
     *
     * @throws NestFailure if the sheet search fails (a bug)
     */
    public static NestResult nest(NestRequest request, NestOptions options) {
        if (!applies(request)) {
            return Nester.nest(request, options);
        }
        long deadline = System.nanoTime() + Math.min(options.timeLimit().toNanos(), Long.MAX_VALUE / 4);
        NestResult start = Nester.nest(request, options.share(FIRST_LAYOUT_SHARE));
        if (options.iterations().isPresent()) {
            return eliminateOrFail(request, start, options, deadline);
        }
        if (!roomToEmpty(request, start)) {
            // every sheet is needed by area alone: the rest of the time goes to another run of the first engine
            NestResult again = Nester.nest(request, again(options, deadline, options.threads()));
            return NestRanking.BEST_FIRST.compare(again, start) < 0 ? again : start;
        }
        int spare = options.threads() % LANES;
        if (options.threads() < LANES || spare == 0) {
            return eliminateOrFail(request, start, options, deadline);
        }
        // the threads that pair up search sheets, the one left over runs the first engine again (a second chance at
        // the first layout's tie-breaks when no sheet empties), and the better nest wins
        NestOptions searchOptions = new NestOptions(options.timeLimit(), options.iterations(), options.seed(),
                options.threads() - spare, options.listener());
        NestOptions againOptions = again(options, deadline, 1);
        ExecutorService ex = Executors.newSingleThreadExecutor(r -> {
            Thread th = new Thread(r, "first-layout-again");
            th.setDaemon(true);
            return th;
        });
        try {
            Future<NestResult> again = ex.submit(() -> Nester.nest(request, againOptions));
            NestResult searched = eliminateOrFail(request, start, searchOptions, deadline);
            NestResult other = again.get();
            return NestRanking.BEST_FIRST.compare(other, searched) < 0 ? other : searched;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new NestFailure("nesting was interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            throw c instanceof NestFailure nf ? nf
                    : new NestFailure("the nesting engine failed (a bug; nothing was written): " + c, c);
        } finally {
            ex.shutdownNow();
        }
    }

    /**
     * Options for another timed run of the first engine until {@code deadline} on {@code threads}, from another seed
     * than {@code options}' and telling no progress (its early layouts are worse than the one already told).
     */
    private static NestOptions again(NestOptions options, long deadline, int threads) {
        long left = Math.max(0, deadline - System.nanoTime());
        return new NestOptions(Duration.ofNanos(left), OptionalLong.empty(), LogicalWorkers.seedOf(options.seed(), 0),
                threads, ProgressListener.NONE);
    }

    /**
     * Whether a sheet of {@code nest} might be emptied: it has more sheet layouts than the area of their parts needs
     * (that area over the usable area, less the margin, of the largest sheet, rounded up).
     */
    static boolean roomToEmpty(NestRequest request, NestResult nest) {
        double margin = request.rules().margin();
        double usable = 0;
        for (Stock st : request.stock()) {
            if (st instanceof Sheet s) {
                usable = Math.max(usable, Math.max(0, s.width() - 2 * margin) * Math.max(0, s.height() - 2 * margin));
            }
        }
        int sheets = 0;
        double partArea = 0;
        for (SheetLayout l : nest.sheets()) {
            if (l.stock() instanceof Sheet) {
                sheets++;
                partArea += l.utilization() * l.stockArea();
            }
        }
        // the area ratio rounded up, an exact whole number of sheets within the precision of totals counting as that many
        return usable > 0 && sheets > Math.ceil(partArea / usable * (1 - NestPrecision.RELATIVE_TIE));
    }

    private static NestResult eliminateOrFail(NestRequest request, NestResult start, NestOptions options, long deadline) {
        try {
            return eliminate(request, start, options, deadline);
        } catch (RuntimeException | OutOfMemoryError e) {
            throw new NestFailure("the sheet search failed (a bug; nothing was written): " + e, e);
        }
    }

    /** Whether the sheet search can work on {@code request}: some stock is a sheet, and not too many copies. */
    public static boolean applies(NestRequest request) {
        return request.totalCopies() <= MAX_COPIES && request.stock().stream().anyMatch(s -> s instanceof Sheet);
    }

    /**
     * A nest of {@code request} with at most as many sheets as {@code start} (a feasible nest of it) and never a
     * higher stock cost, searched within {@code options} until {@code deadlineNanos} (a {@link System#nanoTime()}
     * value); improvements are told to the options' listener.
     */
    public static NestResult eliminate(NestRequest request, NestResult start, NestOptions options, long deadlineNanos) {
        if (!applies(request) || start.sheets().stream().filter(l -> l.stock() instanceof Sheet).count() < 2) {
            return start;
        }
        boolean counted = options.iterations().isPresent();
        if (counted ? options.iterations().getAsLong() == 0 : System.nanoTime() >= deadlineNanos) {
            return start;
        }
        return new SheetSearch(request, start).run(options, deadlineNanos);
    }

    private NestResult run(NestOptions options, long deadline) {
        boolean counted = options.iterations().isPresent();
        // a timed run: one worker per LANES threads, each trying sheets side by side on its own threads
        int workers = counted ? StripSearch.FIXED_WORKERS : Math.max(1, options.threads() / LANES);
        boolean sideBySide = !counted && options.threads() >= LANES;
        long perWorker = counted ? Math.max(1, options.iterations().getAsLong() / workers) : Long.MAX_VALUE;
        Progress progress = new Progress(options, binLayouts.size());
        List<Found> results = LogicalWorkers.run("sheet-search", workers, options.threads(), options.seed(),
                seed -> () -> {
                    ExecutorService pool = sideBySide ? Executors.newFixedThreadPool(LANES, r -> {
                        Thread th = new Thread(r, "sheet-search-lane");
                        th.setDaemon(true);
                        return th;
                    }) : null;
                    try {
                        return new Worker(seed, new Separator.Budget(deadline, perWorker), progress, pool).call();
                    } finally {
                        if (pool != null) {
                            pool.shutdownNow();
                        }
                    }
                });
        // the best by the shop's ranking that passes the checker; ties keep the start, then the lowest worker
        NestResult best = start;
        for (Found f : results) {
            if (f == null) {
                continue;
            }
            NestResult r = toResult(f);
            if (NestRanking.BEST_FIRST.compare(r, best) < 0 && NestChecker.check(request, r).isEmpty()) {
                best = r;
            }
        }
        return best;
    }

    /** The poses of a worker's layout and its open bins. */
    record Found(double[][] poses, boolean[] open) {
    }

    /** A try at moving parts: builds the separation to run from its own random source. */
    @FunctionalInterface
    private interface Try {
        Attempt start(SplittableRandom r);
    }

    /**
     * A separation being tried over some parts ({@code local}, by index) on some sheets, with an optional further test
     * of the separated layout ({@code keep}, null for none); {@code ok} once it has run.
     */
    private static final class Attempt {
        final Separator sep;
        final List<Integer> local;
        final int[] sheets;
        final Predicate<Separator> keep;
        boolean ok;

        Attempt(Separator sep, List<Integer> local, int[] sheets, Predicate<Separator> keep) {
            this.sep = sep;
            this.local = local;
            this.sheets = sheets;
            this.keep = keep;
        }
    }

    private double costOf(boolean[] open) {
        double c = 0;
        for (int b = 0; b < open.length; b++) {
            if (open[b]) {
                c += ((Sheet) binLayouts.get(b).stock()).cost();
            }
        }
        return c;
    }

    /** The nest with the parts at {@code f}'s poses: remnant layouts as they were, empty sheets dropped. */
    NestResult toResult(Found f) {
        List<List<Placement>> byBin = new ArrayList<>();
        for (int b = 0; b < binLayouts.size(); b++) {
            byBin.add(new ArrayList<>(held.get(b)));
        }
        for (int i = 0; i < parts.size(); i++) {
            double[] p = f.poses()[i];
            byBin.get((int) p[0]).add(PiecePoses.placement(parts.get(i), shapes[i], p[1], p[2], p[3]));
        }
        List<SheetLayout> out = new ArrayList<>();
        int bin = 0;
        for (SheetLayout l : start.sheets()) {
            if (!(l.stock() instanceof Sheet s)) {
                out.add(new SheetLayout(l.stock(), out.size(), l.usedLength(), l.parts(), l.offcut(), l.utilization()));
                continue;
            }
            List<Placement> mine = byBin.get(bin++);
            if (mine.isEmpty()) {
                continue;
            }
            mine.sort(Comparator.comparingDouble(Placement::x).thenComparingDouble(Placement::y));
            double maxX = 0;
            double area = 0;
            for (Placement p : mine) {
                Polygon shape = poses.piece(p).shape();
                Envelope e = p.apply(shape).getEnvelopeInternal();
                maxX = Math.max(maxX, e.getMaxX());
                area += shape.getArea();
            }
            double used = Math.min(s.width(), maxX + request.rules().margin());
            out.add(new SheetLayout(s, out.size(), used, mine, null, Math.min(1, area / (s.width() * s.height()))));
        }
        return new NestResult(out, start.unplaced());
    }

    /** Tells the listener of fewer sheets than every worker found before. */
    private final class Progress {
        private final NestOptions options;
        private int best;

        Progress(NestOptions options, int sheets) {
            this.options = options;
            this.best = sheets;
        }

        /** {@code lastLength}: how far the parts of the last open sheet reach along x, margin included. */
        synchronized void found(long moves, boolean[] open, double lastLength) {
            int sheets = count(open);
            if (sheets >= best) {
                return;
            }
            best = sheets;
            int others = start.sheets().size() - binLayouts.size();
            double stockArea = 0;
            double partArea = 0;
            for (SheetLayout l : start.sheets()) {
                partArea += l.parts().stream().mapToDouble(p -> poses.piece(p).shape().getArea()).sum();
                if (!(l.stock() instanceof Sheet)) {
                    stockArea += l.stockArea();
                }
            }
            for (int b = 0; b < open.length; b++) {
                if (open[b]) {
                    stockArea += binLayouts.get(b).stockArea();
                }
            }
            double cost = costOf(open);
            for (SheetLayout l : start.sheets()) {
                cost += l.stock() instanceof Sheet ? 0 : NestRanking.cost(l);
            }
            options.listener().improved(moves, sheets + others, cost, lastLength,
                    stockArea > 0 ? Math.min(1, partArea / stockArea) : 0);
        }
    }

    /**
     * One logical worker with its own random source. It keeps every part's pose (bin, x, y, angle, 1 while settled)
     * and which sheets are open, and changes them only by a separation that succeeded (an insertion, a trade, or the
     * last sheet's compaction).
     */
    private final class Worker {
        private final SplittableRandom rnd;
        /** The budget of the phase under way. */
        private Separator.Budget budget;
        private final Progress progress;
        private double[][] pose;
        private final boolean[] open = new boolean[boxes.length];
        private final PlacedShape scratch = new PlacedShape();
        private long moves;
        /** Whether any part moved. */
        private boolean changed;

        /** Tries run side by side ({@link #LANES}), on {@link #pool} when it has one, else in turn. */
        private final int lanes = LANES;
        private final ExecutorService pool;

        Worker(long seed, Separator.Budget budget, Progress progress, ExecutorService pool) {
            this.rnd = new SplittableRandom(seed);
            this.budget = budget;
            this.progress = progress;
            this.pool = pool;
        }

        private boolean spent() {
            return budget.spent(moves);
        }

        /** The layout the worker ends with, or null if no part moved. */
        Found call() {
            int n = parts.size();
            pose = new double[n][];
            for (int i = 0; i < n; i++) {
                Placement p = parts.get(i);
                double[] ref = PiecePoses.reference(p, shapes[i]);
                // the first layout is feasible for the true outlines, but search shapes are larger: every part starts
                // settled (what it overlaps there is forgiven) until it moves
                pose[i] = new double[] {partBin.get(i), ref[0], ref[1], p.rotationDeg(), partFixed[i] ? 0 : 1};
            }
            Arrays.fill(open, true);
            Separator.Budget whole = budget;
            budget = share(whole, ELIMINATION_SHARE);
            int round = 0;
            while (!spent()) {
                List<Integer> candidates = emptiable();
                if (candidates.isEmpty()) {
                    break;
                }
                // only the least filled sheet: parts leaving another could only fill it up again
                int t = candidates.get(0);
                long movesBefore = moves;
                if (empty(t, round)) {
                    progress.found(moves, open, lastLength());
                }
                if (moves == movesBefore) {
                    break; // no sheet has room for any of its parts
                }
                round++;
            }
            budget = whole;
            compactLast();
            return changed ? new Found(pose, open.clone()) : null;
        }

        /** {@code fraction} of what is left of {@code whole}, from now. */
        private Separator.Budget share(Separator.Budget whole, double fraction) {
            long now = System.nanoTime();
            long deadline = whole.deadline() >= Long.MAX_VALUE / 2 ? whole.deadline()
                    : now + (long) (Math.max(0, whole.deadline() - now) * fraction);
            long limit = whole.moveLimit() >= Long.MAX_VALUE / 2 ? whole.moveLimit()
                    : moves + (long) ((whole.moveLimit() - moves) * fraction);
            return new Separator.Budget(deadline, limit);
        }

        /**
         * Compacts the last open sheet toward its near end, for the largest offcut there: its bin is cut shorter (the
         * parts right of a random line move left by the cut) and separated on that sheet, {@link #COMPACT_FIRST_CUT}
         * of the used length at first, halving after {@link StripSearch#FAILS_BEFORE_SMALLER_CUT} failures, until {@link #COMPACT_SMALLEST_CUT} or the budget.
         * A sheet with a part holding others in its holes is left as it is.
         */
        private void compactLast() {
            int last = -1;
            for (int b = 0; b < open.length; b++) {
                if (open[b]) {
                    last = b;
                }
            }
            if (last < 0 || spent() || !held.get(last).isEmpty()) {
                return;
            }
            List<Integer> local = partsOn(last);
            if (local.isEmpty() || local.stream().anyMatch(i -> partFixed[i])) {
                return;
            }
            Separator sep = over(local, new int[] {last}, rnd);
            double near = boxes[last][0];
            double startLength = sep.reach(0);
            double bestLength = startLength;
            double[][] best = sep.snapshot();
            Separator.Budget inside = new Separator.Budget(budget.deadline(), budget.moveLimit() - moves);
            double cut = COMPACT_FIRST_CUT;
            int fails = 0;
            while (cut >= COMPACT_SMALLEST_CUT && !inside.spent(sep.moves())) {
                sep.restore(best);
                sep.cutBin(0, bestLength, near + (bestLength - near) * (1 - cut));
                sep.resetWeights();
                if (sep.separate(inside) && sep.reach(0) < bestLength) {
                    best = sep.snapshot();
                    bestLength = sep.reach(0);
                    fails = 0;
                } else if (++fails >= StripSearch.FAILS_BEFORE_SMALLER_CUT) {
                    cut /= 2;
                    fails = 0;
                }
            }
            moves += sep.moves();
            if (bestLength < startLength) {
                sep.restore(best);
                takePoses(sep, local, new int[] {last});
            }
        }

        /** Search-shape area of the parts on sheet b. */
        private double areaOn(int b) {
            double a = 0;
            for (int i = 0; i < pose.length; i++) {
                a += (int) pose[i][0] == b ? shapes[i].area : 0;
            }
            return a;
        }

        /**
         * Tries to move every part of sheet t onto the other open sheets, largest first (large parts before small
         * ones take the room): a quick {@link #insert} on every sheet with room for it (a part that fits a hole
         * there, or nearly); for the first part that stays, a thorough insert on {@link #DESTINATIONS} sheets (the
         * emptiest in a first round, else chosen at random) and else a {@link #trade}; once a part stays, the rest
         * get the quick tries only. Returns whether t was emptied (it then closes); parts that moved stay moved
         * either way (the layout stays feasible and t only emptier).
         */
        private boolean empty(int t, int round) {
            List<Integer> mine = partsOn(t);
            mine.sort(Comparator.<Integer>comparingDouble(i -> -shapes[i].area));
            boolean all = true;
            for (int q : mine) {
                if (spent()) {
                    return false;
                }
                List<Integer> dests = destinations(t, q);
                List<Try> tries = new ArrayList<>();
                for (int d : dests) {
                    tries.add(r -> insert(q, d, r));
                }
                boolean placed = first(tries, QUICK_MOVES);
                if (!placed && all) {
                    // the first part to stay gets the costly tries, before smaller parts take the room
                    if (round > 0) {
                        for (int k = dests.size() - 1; k > 0; k--) {
                            int j = rnd.nextInt(k + 1);
                            dests.set(k, dests.set(j, dests.get(k)));
                        }
                    }
                    List<Integer> some = dests.subList(0, Math.min(DESTINATIONS, dests.size()));
                    tries.clear();
                    for (int d : some) {
                        tries.add(r -> insert(q, d, r));
                    }
                    placed = first(tries, ATTEMPT_MOVES);
                    if (!placed && round > 0) {
                        tries.clear();
                        for (int d : some) {
                            tries.add(r -> trade(q, t, d, r));
                        }
                        placed = first(tries, ATTEMPT_MOVES);
                    }
                }
                all &= placed;
            }
            // a trade may have brought smaller parts over: the sheet is empty only when nothing is left on it
            if (areaOn(t) == 0) {
                open[t] = false;
                return true;
            }
            return false;
        }

        /** The open sheets other than t with room for part q by area, the emptiest first. */
        private List<Integer> destinations(int t, int q) {
            double[] used = new double[boxes.length];
            for (int i = 0; i < pose.length; i++) {
                used[(int) pose[i][0]] += shapes[i].area;
            }
            List<Integer> out = new ArrayList<>();
            double[] free = new double[boxes.length];
            for (int b = 0; b < boxes.length; b++) {
                double[] bx = boxes[b];
                free[b] = (bx[2] - bx[0]) * (bx[3] - bx[1]) - used[b];
                if (b != t && open[b] && free[b] >= shapes[q].area) {
                    out.add(b);
                }
            }
            out.sort(Comparator.<Integer>comparingDouble(b -> -free[b]).thenComparingInt(b -> b));
            return out;
        }

        /**
         * Part q put onto sheet d at the place of least overlap sampled there, for a {@link Separator} over the parts
         * of d (all of them may move, within d only) to remove the overlap.
         */
        private Attempt insert(int q, int d, SplittableRandom r) {
            List<Integer> local = partsOn(d);
            local.add(q);
            int[] sheets = {d};
            Separator sep = over(local, sheets, r);
            int m = local.size();
            sep.settled[m - 1] = false;
            sep.reinsert(m - 1);
            return new Attempt(sep, local, sheets, null);
        }

        /**
         * A trade: part q (on sheet t) goes onto sheet d, and parts of d smaller than q may leave for t to make room
         * (a separation over both sheets: q stays on d, the parts of t on t, d's parts at least as large as q on
         * d). Kept when it separates and what came over to t has less area than q (t ends with less on it), or comes
         * in parts each at most {@link #SMALLER_SHARE} of q, easier to place elsewhere.
         */
        private Attempt trade(int q, int t, int d, SplittableRandom r) {
            List<Integer> local = new ArrayList<>();
            for (int i = 0; i < pose.length; i++) {
                int b = (int) pose[i][0];
                if ((b == d || b == t) && i != q) {
                    local.add(i);
                }
            }
            local.add(q);
            int[] sheets = {d, t};
            Separator sep = over(local, sheets, r);
            int m = local.size();
            double[] at = pose[q];
            sep.place(m - 1, 0, at[1], at[2], at[3]);
            for (int k = 0; k < m - 1; k++) {
                int i = local.get(k);
                sep.home[k] = (int) pose[i][0] == t ? 1 : shapes[i].area >= shapes[q].area ? 0 : -1;
            }
            sep.home[m - 1] = 0;
            sep.settled[m - 1] = false;
            sep.reinsert(m - 1);
            return new Attempt(sep, local, sheets, done -> {
                double came = 0;
                double largest = 0;
                for (int k = 0; k < m - 1; k++) {
                    if ((int) pose[local.get(k)][0] == d && done.bin[k] == 1) {
                        came += shapes[local.get(k)].area;
                        largest = Math.max(largest, shapes[local.get(k)].area);
                    }
                }
                return came < shapes[q].area || largest <= shapes[q].area * SMALLER_SHARE;
            });
        }

        /**
         * Runs {@code tries} in order, up to {@link #lanes} side by side (each from its own random source, split from
         * the worker's in order, so the outcome does not depend on how many run at once), each separating within
         * {@code most} piece moves and the worker's budget; the poses take the first in order that succeeds, and the
         * rest of that batch is dropped. Returns whether one succeeded.
         */
        private boolean first(List<Try> tries, long most) {
            for (int from = 0; from < tries.size() && !spent(); from += lanes) {
                int to = Math.min(tries.size(), from + lanes);
                long limit = Math.min(most, budget.moveLimit() - moves);
                Separator.Budget each = new Separator.Budget(budget.deadline(), limit);
                List<Callable<Attempt>> batch = new ArrayList<>();
                for (int k = from; k < to; k++) {
                    Try tr = tries.get(k);
                    SplittableRandom r = rnd.split();
                    batch.add(() -> {
                        Attempt a = tr.start(r);
                        a.ok = a.sep.separate(each) && (a.keep == null || a.keep.test(a.sep));
                        return a;
                    });
                }
                List<Attempt> done = runAll(batch);
                Attempt won = null;
                for (Attempt a : done) {
                    moves += a.sep.moves();
                    if (won == null && a.ok) {
                        won = a;
                    }
                }
                if (won != null) {
                    takePoses(won.sep, won.local, won.sheets);
                    return true;
                }
            }
            return false;
        }

        /**
         * Runs the batch on the worker's lanes, results in order; with no lanes (a run of fixed steps, or one thread)
         * in turn, stopping at the first that succeeds.
         */
        private List<Attempt> runAll(List<Callable<Attempt>> batch) {
            List<Attempt> out = new ArrayList<>();
            try {
                if (pool == null || batch.size() < 2) {
                    // in turn, and no further than the first that succeeds (the later ones could not be kept)
                    for (Callable<Attempt> c : batch) {
                        Attempt a = c.call();
                        out.add(a);
                        if (a.ok) {
                            break;
                        }
                    }
                    return out;
                }
                for (Future<Attempt> f : pool.invokeAll(batch)) {
                    out.add(f.get());
                }
                return out;
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("the sheet search was interrupted", e);
            } catch (ExecutionException e) {
                throw e.getCause() instanceof RuntimeException re ? re : new IllegalStateException(e.getCause());
            } catch (Exception e) {
                throw e instanceof RuntimeException re ? re : new IllegalStateException(e);
            }
        }

        /** The parts on sheet b, by index. */
        private List<Integer> partsOn(int b) {
            List<Integer> out = new ArrayList<>();
            for (int i = 0; i < pose.length; i++) {
                if ((int) pose[i][0] == b) {
                    out.add(i);
                }
            }
            return out;
        }

        /**
         * A separator over the parts {@code local} (by index) on {@code sheets} (its bin k is sheet sheets[k]) drawing
         * from {@code r}: each part where it is (a part on none of them in bin 0), fixed and settled as it is.
         */
        private Separator over(List<Integer> local, int[] sheets, SplittableRandom r) {
            int m = local.size();
            SearchShape[] ls = new SearchShape[m];
            for (int k = 0; k < m; k++) {
                ls[k] = shapes[local.get(k)];
            }
            double[][] bx = new double[sheets.length][];
            for (int k = 0; k < sheets.length; k++) {
                bx[k] = boxes[sheets[k]].clone();
            }
            Separator sep = new Separator(ls, bx, measure, angles, r, precision);
            for (int k = 0; k < m; k++) {
                int i = local.get(k);
                double[] p = pose[i];
                int b = 0;
                for (int j = 0; j < sheets.length; j++) {
                    b = sheets[j] == (int) p[0] ? j : b;
                }
                sep.place(k, b, p[1], p[2], p[3]);
                sep.fixed[k] = partFixed[i];
                sep.settled[k] = p[4] != 0;
            }
            return sep;
        }

        /** The separator's poses as the parts' poses (its bin k is sheet sheets[k]). */
        private void takePoses(Separator sep, List<Integer> local, int[] sheets) {
            for (int k = 0; k < local.size(); k++) {
                PlacedShape at = sep.at[k];
                pose[local.get(k)] = new double[] {sheets[sep.bin[k]], at.x, at.y, at.angle, sep.settled[k] ? 1 : 0};
            }
            changed = true;
        }

        /** How far the search shapes on the last open sheet reach along x, less the half gap they carry, plus the margin. */
        private double lastLength() {
            int last = -1;
            for (int b = 0; b < open.length; b++) {
                if (open[b]) {
                    last = b;
                }
            }
            double reach = 0;
            for (int i = 0; i < pose.length; i++) {
                if ((int) pose[i][0] == last) {
                    scratch.set(shapes[i], pose[i][1], pose[i][2], pose[i][3]);
                    reach = Math.max(reach, scratch.maxX);
                }
            }
            double gap = request.rules().gap();
            return Math.max(0, reach - gap / 2 + request.rules().margin());
        }

        /** Open bins with no part holding others and more than one open bin left, least filled first (ties: the later bin). */
        private List<Integer> emptiable() {
            double[] area = new double[boxes.length];
            boolean[] blocked = new boolean[boxes.length];
            for (int i = 0; i < pose.length; i++) {
                int b = (int) pose[i][0];
                area[b] += shapes[i].area;
                blocked[b] |= partFixed[i];
            }
            for (int b = 0; b < boxes.length; b++) {
                blocked[b] |= !held.get(b).isEmpty();
            }
            List<Integer> out = new ArrayList<>();
            if (count(open) < 2) {
                return out;
            }
            for (int b = 0; b < boxes.length; b++) {
                if (open[b] && !blocked[b]) {
                    out.add(b);
                }
            }
            out.sort(Comparator.<Integer>comparingDouble(b -> area[b]).thenComparing(Comparator.<Integer>reverseOrder()));
            return out;
        }
    }

    private static int count(boolean[] open) {
        int c = 0;
        for (boolean o : open) {
            c += o ? 1 : 0;
        }
        return c;
    }
}
