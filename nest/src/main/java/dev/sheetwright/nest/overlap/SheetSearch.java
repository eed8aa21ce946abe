package dev.sheetwright.nest.overlap;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestFailure;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.place.Nester;

/**
 * Sheet elimination: takes a feasible nest on sheets (and remnants) and empties sheets step by step. The sheet to
 * empty is the least filled one (by part area; on a tie the later one). Its bin is cut shorter along x by a share of
 * the length its parts use (the parts right of a random line move left by as much, overlapping their neighbours), and
 * the {@link Separator} removes the overlap moving one part at a time over every sheet still open, so parts leave
 * the sheet for room on the others. A step that separates is kept and the next cuts again; after
 * {@link #FAILS_BEFORE_SMALLER_CUT} failures the cut halves, and below {@link #SMALLEST_CUT} the next least filled
 * sheet is tried. When the bin is too short to hold any part the sheet closes: what is left on it goes to its best
 * sampled place elsewhere, and a separation that succeeds leaves one sheet fewer. A worker stops when each sheet
 * failed {@link #TRIES_PER_SHEET} times in a row or the budget is spent.
 *
 * <p>What stays where it is: layouts on remnants (they are the cheapest stock and keep their parts; sheet parts do
 * not move onto remnants, whose outlines need not be rectangles), parts that hold other parts in their holes and
 * those held parts (the host is fixed, the held part keeps its place in the hole), and coils (no strip shortening
 * here). So a remnant is never traded for a sheet and the cost never rises. Each sheet's bin is the sheet less the
 * margin, widened by half the gap, since the search shapes carry half the gap.
 *
 * <p>With an iteration count, {@link StripSearch#FIXED_WORKERS} logical workers each make an equal share of the
 * piece moves, whatever the thread count, so the result depends only on the input, the seed and the count; a timed
 * run has one worker per thread. The result with the fewest sheets (then lowest cost, ties to the lowest worker)
 * that passes {@link NestChecker} is returned, else the given nest.
 */
public final class SheetSearch {
    /**
     * Most copies a request may have for the sheet search: the separator keeps two weights per pair of parts per
     * worker (memory quadratic in the parts), and on larger jobs the first engine makes better use of the time.
     */
    public static final int MAX_COPIES = 1500;
    /** How many times in a row each sheet may fail to be emptied before a worker gives up. */
    static final int TRIES_PER_SHEET = 2;
    /** First cut of a sheet's used length, as a share of it; it halves after {@link #FAILS_BEFORE_SMALLER_CUT} fails. */
    static final double FIRST_CUT = 0.1;
    /** Below this cut the sheet is given up for another. */
    static final double SMALLEST_CUT = 0.005;
    static final int FAILS_BEFORE_SMALLER_CUT = 2;

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
    /** The least width any part's search shape can take (a bin narrower than that holds no part). */
    private final double smallestExtent;

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
        double least = Double.POSITIVE_INFINITY;
        for (SearchShape sh : shapes) {
            least = Math.min(least, 2 * sh.poleR[0]);
        }
        this.smallestExtent = n > 0 ? least : 0;
    }

    /** Share of a timed search the first layout (the no-fit-polygon engine) gets before sheet elimination. */
    public static final double FIRST_LAYOUT_SHARE = 0.5;

    /**
     * A nest of {@code request} in two stages: the no-fit-polygon engine ({@link Nester}) makes the first layout in
     * {@link #FIRST_LAYOUT_SHARE} of the time (with an iteration count: all its steps), then {@link #eliminate} tries
     * to empty sheets in the rest (with an iteration count: as many piece moves). When the sheet search does not
     * apply (no sheets, or more than {@link #MAX_COPIES} copies) the first engine gets all the time.
     *
     * @throws NestFailure if the sheet search fails (a bug)
     */
    public static NestResult nest(NestRequest request, NestOptions options) {
        if (!applies(request)) {
            return Nester.nest(request, options);
        }
        long deadline = System.nanoTime() + Math.min(options.timeLimit().toNanos(), Long.MAX_VALUE / 4);
        NestResult start = Nester.nest(request, options.share(FIRST_LAYOUT_SHARE));
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
        int workers = counted ? StripSearch.FIXED_WORKERS : options.threads();
        long perWorker = counted ? Math.max(1, options.iterations().getAsLong() / workers) : Long.MAX_VALUE;
        Progress progress = new Progress(options, binLayouts.size());
        List<Found> results = LogicalWorkers.run("sheet-search", workers, options.threads(), options.seed(),
                seed -> () -> new Worker(seed, new Separator.Budget(deadline, perWorker), progress).call());
        List<Found> ranked = new ArrayList<>();
        for (Found f : results) {
            if (f != null) {
                ranked.add(f);
            }
        }
        // stable sort: ties keep the lowest worker first
        ranked.sort(Comparator.comparingInt(Found::sheets).thenComparingDouble(Found::cost));
        for (Found f : ranked) {
            NestResult r = toResult(f);
            if (NestChecker.check(request, r).isEmpty()) {
                return r;
            }
        }
        return start;
    }

    /** The poses of a worker's best layout, its open bins, sheets and cost. */
    record Found(double[][] poses, boolean[] open, int sheets, double cost) {
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
            int sheets = 0;
            for (boolean o : open) {
                sheets += o ? 1 : 0;
            }
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
                cost += l.stock().match(sh -> 0.0, r -> r.cost(), c -> c.costPerLength() * l.usedLength());
            }
            options.listener().improved(moves, sheets + others, cost, lastLength,
                    stockArea > 0 ? Math.min(1, partArea / stockArea) : 0);
        }
    }

    /** One logical worker with its own random source. */
    private final class Worker {
        private final Separator.Budget budget;
        private final Progress progress;
        private final Separator sep;

        Worker(long seed, Separator.Budget budget, Progress progress) {
            this.budget = budget;
            this.progress = progress;
            double[][] myBoxes = new double[boxes.length][];
            for (int b = 0; b < boxes.length; b++) {
                myBoxes[b] = boxes[b].clone();
            }
            this.sep = new Separator(shapes, myBoxes, measure, angles, new SplittableRandom(seed), precision);
        }

        /** The fewest-sheet layout found, or null if no sheet could be emptied. */
        Found call() {
            for (int i = 0; i < sep.n; i++) {
                Placement p = parts.get(i);
                double[] ref = PiecePoses.reference(p, shapes[i]);
                sep.place(i, partBin.get(i), ref[0], ref[1], p.rotationDeg());
            }
            // the first layout is feasible for the true outlines, but search shapes are larger: every part starts
            // settled (what it overlaps there is forgiven) until it moves
            for (int i = 0; i < sep.n; i++) {
                sep.fixed[i] = partFixed[i];
                sep.settled[i] = !partFixed[i];
            }
            sep.refresh();
            double[][] best = sep.snapshot();
            boolean[] bestOpen = sep.open.clone();
            double[] bestEnds = ends();
            int startSheets = count(bestOpen);
            int target = -1;
            int tried = 0;
            int fails = 0;
            double cut = FIRST_CUT;
            while (!budget.spent(sep.moves())) {
                List<Integer> candidates = emptiable();
                if (candidates.isEmpty()) {
                    break;
                }
                if (target < 0 || !sep.open[target]) {
                    if (tried >= TRIES_PER_SHEET * candidates.size()) {
                        break;
                    }
                    target = candidates.get(tried % candidates.size());
                    cut = FIRST_CUT;
                    fails = 0;
                }
                double[] box = sep.boxes[target];
                double used = sep.reach(target) - box[0];
                double shorter = used * (1 - cut);
                if (used <= 0 || shorter < smallestExtent) {
                    // too short to hold a part: the sheet closes and what is left on it goes elsewhere
                    sep.open[target] = false;
                    for (int i = 0; i < sep.n; i++) {
                        if (sep.bin[i] == target) {
                            sep.reinsert(i);
                        }
                    }
                } else {
                    sep.cutBin(target, box[0] + used, box[0] + shorter);
                }
                sep.resetWeights();
                if (sep.separate(budget)) {
                    best = sep.snapshot();
                    bestEnds = ends();
                    fails = 0;
                    if (!sep.open[target]) {
                        bestOpen = sep.open.clone();
                        progress.found(sep.moves(), bestOpen, lastLength());
                        target = -1;
                        tried = 0;
                    }
                } else {
                    System.arraycopy(bestOpen, 0, sep.open, 0, bestOpen.length);
                    for (int b = 0; b < bestEnds.length; b++) {
                        sep.boxes[b][2] = bestEnds[b];
                    }
                    sep.restore(best);
                    if (++fails >= FAILS_BEFORE_SMALLER_CUT) {
                        fails = 0;
                        cut /= 2;
                        if (cut < SMALLEST_CUT) {
                            // this sheet will not empty for now: try the next one
                            target = -1;
                            tried++;
                        }
                    }
                }
            }
            int sheets = count(bestOpen);
            return sheets < startSheets ? new Found(best, bestOpen, sheets, costOf(bestOpen)) : null;
        }

        /** The far x side of every bin, to put back when a step fails. */
        private double[] ends() {
            double[] e = new double[sep.boxes.length];
            for (int b = 0; b < e.length; b++) {
                e[b] = sep.boxes[b][2];
            }
            return e;
        }

        /** How far the search shapes on the last open sheet reach along x, less the half gap they carry, plus the margin. */
        private double lastLength() {
            int last = -1;
            for (int b = 0; b < sep.open.length; b++) {
                if (sep.open[b]) {
                    last = b;
                }
            }
            double reach = 0;
            for (int i = 0; i < sep.n; i++) {
                if (sep.bin[i] == last) {
                    reach = Math.max(reach, sep.at[i].maxX);
                }
            }
            double gap = request.rules().gap();
            return Math.max(0, reach - gap / 2 + request.rules().margin());
        }

        /** Open bins with no part holding others and more than one open bin left, least filled first (ties: the later bin). */
        private List<Integer> emptiable() {
            double[] area = new double[boxes.length];
            boolean[] blocked = new boolean[boxes.length];
            for (int i = 0; i < sep.n; i++) {
                area[sep.bin[i]] += shapes[i].area;
                blocked[sep.bin[i]] |= partFixed[i];
            }
            for (int b = 0; b < boxes.length; b++) {
                blocked[b] |= !held.get(b).isEmpty();
            }
            List<Integer> out = new ArrayList<>();
            if (count(sep.open) < 2) {
                return out;
            }
            for (int b = 0; b < boxes.length; b++) {
                if (sep.open[b] && !blocked[b]) {
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
