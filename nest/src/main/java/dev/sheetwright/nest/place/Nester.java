package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestFailure;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;

/**
 * True-shape nesting. A constructive pass places the copies in a fixed order (first fit over the stock,
 * bottom-left on each piece of stock from exact no-fit polygons, every allowed orientation), then each worker
 * thread runs a threshold-accepting local search over the placing order (swap and move), re-placing only from
 * the first changed position. Objective, in order: every copy placed, lowest stock cost, least stock area, shortest
 * use of the last piece of stock (which leaves the largest offcut at its far end).
 *
 * <p>With {@link NestOptions#iterations()} given, {@link #FIXED_SEARCHES} searches each run a fixed share of the
 * steps from their own seed, on however many threads are given, and the best result is chosen with ties going to
 * the lowest search, so the nest depends only on the input, the seed and the step count. A timed run runs one
 * search per thread and ends by the time limit, its constructive pass included.
 */
public final class Nester {
    /** Threshold of the acceptance rule at the start of the search, relative to the current objective. */
    static final double START_THRESHOLD = 0.004;
    /** Share of a timed run after which the constructive pass tries only the quick orientations. */
    static final double QUICK_AT = 0.4;
    /** Share of a timed run after which the constructive pass computes no new no-fit polygons. */
    static final double CHEAP_AT = 0.7;

    final Problem pb;
    private final NestOptions options;

    Nester(NestRequest request, NestOptions options) {
        if (request == null) {
            throw new IllegalArgumentException("request must not be null");
        }
        if (options == null) {
            throw new IllegalArgumentException("options must not be null");
        }
        this.pb = new Problem(request);
        this.options = options;
    }

    /**
     * Nests the request; never loses a copy (each is placed once or listed as unplaced).
     *
     * @throws IllegalArgumentException if the request or the options are missing
     * @throws NestFailure if the engine fails inside (a bug, or out of memory): never a bad-input exception
     */
    public static NestResult nest(NestRequest request, NestOptions options) {
        Nester n = new Nester(request, options);
        try {
            return n.run();
        } catch (NestFailure e) {
            throw e;
        } catch (RuntimeException | OutOfMemoryError e) {
            throw new NestFailure("the nesting engine failed (a bug; nothing was written): " + describe(e), e);
        }
    }

    private static String describe(Throwable e) {
        return e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage());
    }

    /**
     * Searches of a run with a fixed step count: always this many, each from its own seed derived from the run's
     * seed, executed on however many threads are given, so that the nest does not depend on the thread count.
     */
    static final int FIXED_SEARCHES = 4;
    /**
     * Share of a timed run after which the constructive pass stops and the rest is placed on shelves: the deadline
     * itself, since shelves are a last resort (a copy on a shelf lies beyond everything placed before it).
     */
    static final double SHELF_AT = 1.0;

    private NestResult run() {
        boolean fixed = options.iterations().isPresent();
        int searches = fixed ? FIXED_SEARCHES : options.threads();
        int threads = Math.min(options.threads(), searches);
        long deadline = System.nanoTime() + Math.min(options.timeLimit().toNanos(), Long.MAX_VALUE / 4);
        List<Solution> results = new ArrayList<>();
        if (threads == 1) {
            for (int id = 0; id < searches; id++) {
                results.add(new Worker(id, searches, deadline).call());
            }
        } else {
            ExecutorService ex = Executors.newFixedThreadPool(threads, r -> {
                Thread t = new Thread(r, "nest-worker");
                t.setDaemon(true);
                return t;
            });
            try {
                List<Future<Solution>> fs = new ArrayList<>();
                for (int id = 0; id < searches; id++) {
                    fs.add(ex.submit(new Worker(id, searches, deadline)::call));
                }
                for (Future<Solution> f : fs) {
                    results.add(f.get());
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new NestFailure("nesting was interrupted", e);
            } catch (ExecutionException e) {
                Throwable c = e.getCause();
                throw new NestFailure("the nesting engine failed (a bug; nothing was written): " + describe(c), c);
            } finally {
                ex.shutdownNow();
            }
        }
        // ties go to the lowest search: the result depends only on the input, the seed and the step count
        Solution best = results.get(0);
        for (Solution s : results) {
            if (s.score().betterThan(best.score())) {
                best = s;
            }
        }
        return toResult(best);
    }

    /** One search: a constructive pass in its own order, then the order search. */
    private final class Worker {
        private final int id;
        private final int searches;
        private final long deadline;

        Worker(int id, int searches, long deadline) {
            this.id = id;
            this.searches = searches;
            this.deadline = deadline;
        }

        Solution call() {
            SplittableRandom rnd = new SplittableRandom(options.seed() * 0x9E3779B97F4A7C15L + id * 0xBF58476D1CE4E5B9L + 1);
            int[] order = initialOrder(id, rnd);
            Layouter lay = new Layouter(pb);
            long tc = System.nanoTime();
            boolean fixed = options.iterations().isPresent();
            if (fixed) {
                lay.run(order, 0);
            } else {
                // the constructive pass gets a share of the budget, then places with fewer orientations, then
                // without computing new no-fit polygons, and at last on shelves by bounding boxes, so that it ends
                // in time whatever the job
                long b = Math.max(0, deadline - tc);
                lay.degradeAt(tc + (long) (QUICK_AT * b), tc + (long) (CHEAP_AT * b));
                int done = lay.runUntil(order, 0, tc + (long) (SHELF_AT * b));
                if (done < order.length) {
                    lay.placeOnShelves(order, done);
                }
                lay.degradeAt(Long.MAX_VALUE, Long.MAX_VALUE);
            }
            Layouter.Score cur = lay.score();
            Solution best = lay.snapshot(cur);
            report(0, cur);
            int n = order.length;
            long total = fixed ? share(options.iterations().getAsLong(), searches, id) : Long.MAX_VALUE;
            long start = System.nanoTime();
            long budget = Math.max(1, deadline - start);
            int valid = n;
            if (n < 2) {
                return best;
            }
            int[] cand = order.clone();
            for (long it = 0; it < total; it++) {
                double progress;
                if (fixed) {
                    progress = (double) it / total;
                } else {
                    long now = System.nanoTime();
                    if (now >= deadline) {
                        break;
                    }
                    progress = (double) (now - start) / budget;
                }
                double threshold = START_THRESHOLD * (1 - progress);
                System.arraycopy(order, 0, cand, 0, n);
                int from = mutate(cand, rnd);
                if (from < 0) {
                    continue;
                }
                if (fixed) {
                    lay.run(cand, Math.min(from, valid));
                } else if (lay.runUntil(cand, Math.min(from, valid), deadline) < n) {
                    break;
                }
                valid = n;
                Layouter.Score s = lay.score();
                if (s.acceptableAgainst(cur, threshold)) {
                    System.arraycopy(cand, 0, order, 0, n);
                    cur = s;
                    if (s.betterThan(best.score())) {
                        best = lay.snapshot(s);
                        report(it + 1, s);
                    }
                } else {
                    valid = from;
                }
            }
            return best;
        }

        /** Swap two copies of different types, or move one to an earlier place; returns the first changed index. */
        private int mutate(int[] a, SplittableRandom rnd) {
            int n = a.length;
            for (int attempt = 0; attempt < 8; attempt++) {
                int i = rnd.nextInt(n);
                int j = rnd.nextInt(n);
                if (rnd.nextBoolean()) {
                    // half of the moves stay near the end of the order: cheap to re-place, and they decide the length
                    int tail = Math.max(2, n / 4);
                    i = n - 1 - rnd.nextInt(tail);
                    j = n - 1 - rnd.nextInt(tail);
                }
                if (i == j || pb.instType[a[i]] == pb.instType[a[j]]) {
                    continue;
                }
                int lo = Math.min(i, j);
                int hi = Math.max(i, j);
                if (rnd.nextInt(3) == 0) {
                    int v = a[hi];
                    System.arraycopy(a, lo, a, lo + 1, hi - lo);
                    a[lo] = v;
                } else {
                    int v = a[lo];
                    a[lo] = a[hi];
                    a[hi] = v;
                }
                return lo;
            }
            return -1;
        }
    }

    /** Best score told to the listener so far, over all searches. */
    private Layouter.Score reported;

    /** Tells the listener of a layout better than every one told before (searches report from their threads). */
    private synchronized void report(long iteration, Layouter.Score s) {
        if (reported == null || s.betterThan(reported)) {
            reported = s;
            options.listener().improved(iteration, s.bins(), s.cost(), s.lastLength(), s.utilization());
        }
    }

    private static long share(long total, int threads, int id) {
        return total / threads + (id < total % threads ? 1 : 0);
    }

    /** Thread 0: decreasing area; 1: decreasing longest side; 2: decreasing height; further: random. */
    private int[] initialOrder(int id, SplittableRandom rnd) {
        int n = pb.instType.length;
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            idx.add(i);
        }
        Comparator<Integer> byArea = Comparator.comparingDouble(i -> -pb.typeArea[pb.instType[i]]);
        Comparator<Integer> c = switch (id) {
            case 0 -> byArea;
            case 1 -> Comparator.<Integer>comparingDouble(i -> -longest(pb.instType[i])).thenComparing(byArea);
            case 2 -> Comparator.<Integer>comparingDouble(i -> -extent(pb.instType[i])).thenComparing(byArea);
            default -> null;
        };
        if (c != null) {
            idx.sort(c.thenComparingInt(i -> i));
        } else {
            for (int i = n - 1; i > 0; i--) {
                int j = rnd.nextInt(i + 1);
                Integer t = idx.get(i);
                idx.set(i, idx.get(j));
                idx.set(j, t);
            }
        }
        int[] out = new int[n];
        for (int i = 0; i < n; i++) {
            out[i] = idx.get(i);
        }
        return out;
    }

    private double longest(int type) {
        Orientation o = pb.orientationsByType.get(type).get(0);
        return Math.max(o.bMaxX - o.bMinX, o.bMaxY - o.bMinY);
    }

    /** Smallest extent across the compacting direction over the orientations (how much of the width it takes). */
    private double extent(int type) {
        double e = Double.POSITIVE_INFINITY;
        for (Orientation o : pb.orientationsByType.get(type)) {
            e = Math.min(e, o.bMaxY - o.bMinY);
        }
        return e;
    }

    NestResult toResult(Solution s) {
        List<SheetLayout> sheets = new ArrayList<>();
        double margin = pb.request.rules().margin();
        double gap = pb.request.rules().gap();
        for (Solution.BinPlan plan : s.bins()) {
            List<Placement> parts = new ArrayList<>();
            double partArea = 0;
            double maxX = Double.NEGATIVE_INFINITY;
            double maxY = Double.NEGATIVE_INFINITY;
            for (int k = 0; k < plan.instances().length; k++) {
                int inst = plan.instances()[k];
                int t = pb.instType[inst];
                Orientation o = pb.orientations.get(plan.orientations()[k]);
                parts.add(new Placement(pb.types.get(t).fitting(), pb.types.get(t).piece(), pb.instCopy[inst],
                        plan.x()[k], plan.y()[k], o.angleDeg, o.mirrored));
                partArea += pb.typeArea[t];
                maxX = Math.max(maxX, plan.x()[k] + o.bMaxX);
                maxY = Math.max(maxY, plan.y()[k] + o.bMaxY);
            }
            double used = Math.max(0, plan.usedExtent() + margin);
            double usedX = maxX + gap;
            double usedY = maxY + gap;
            Offcut offcut = plan.slot().stock.match(
                    sh -> bestOffcut(0, 0, sh.width(), sh.height(), usedX, usedY),
                    r -> {
                        Envelope e = r.outline().getEnvelopeInternal();
                        Offcut o = bestOffcut(e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY(), usedX, usedY);
                        return o != null && r.outline().covers(rectangle(o)) ? o : null;
                    },
                    c -> null);
            double stockArea = SheetLayout.stockArea(plan.slot().stock, used);
            double util = stockArea > 0 ? Math.min(1, partArea / stockArea) : 0;
            sheets.add(new SheetLayout(plan.slot().stock, sheets.size(), used, parts, offcut, util));
        }
        List<Unplaced> unplaced = new ArrayList<>();
        List<Integer> un = new ArrayList<>(s.unplaced());
        un.sort(Comparator.naturalOrder());
        for (int inst : un) {
            int t = pb.instType[inst];
            String reason = pb.tooLarge[t] != null ? pb.tooLarge[t]
                    : "no room left on the stock given (all limited stock used or no remaining stock fits it)";
            unplaced.add(new Unplaced(pb.types.get(t).fitting(), pb.types.get(t).piece(), pb.instCopy[inst], reason));
        }
        return new NestResult(sheets, unplaced);
    }

    private static Offcut bestOffcut(double x0, double y0, double x1, double y1, double usedX, double usedY) {
        double w1 = x1 - Math.max(x0, usedX);
        double h2 = y1 - Math.max(y0, usedY);
        double a1 = Math.max(0, w1) * (y1 - y0);
        double a2 = Math.max(0, h2) * (x1 - x0);
        if (a1 <= 0 && a2 <= 0) {
            return null;
        }
        return a1 >= a2 ? new Offcut(x1 - w1, y0, w1, y1 - y0) : new Offcut(x0, y1 - h2, x1 - x0, h2);
    }

    private static Polygon rectangle(Offcut o) {
        GeometryFactory gf = new GeometryFactory();
        return gf.createPolygon(new Coordinate[] {new Coordinate(o.x(), o.y()), new Coordinate(o.x() + o.width(), o.y()),
                new Coordinate(o.x() + o.width(), o.y() + o.height()), new Coordinate(o.x(), o.y() + o.height()),
                new Coordinate(o.x(), o.y())});
    }
}
