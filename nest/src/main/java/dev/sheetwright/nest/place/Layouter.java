package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;

/**
 * Places copies one after another in a given order (first fit over the opened stock, bottom-left on each, every
 * allowed orientation tried), and can undo back to any step so that a changed order is only re-placed from the
 * first changed position.
 */
final class Layouter {
    final Problem pb;
    private final Scratch scratch = new Scratch();
    private final Bin.Position pos = new Bin.Position();
    private final Bin.Position best = new Bin.Position();
    final List<Bin> bins = new ArrayList<>();
    private final int[] slotUsed;
    private int steps;
    private final int[] evBin;
    private final boolean[] evNew;
    final int[] evInst;
    /** From this time (System.nanoTime) on, only the quick orientations are tried. */
    private long quickFrom = Long.MAX_VALUE;
    /** From this time on, also no new no-fit polygon is computed and only the last opened stock is tried. */
    private long cheapFrom = Long.MAX_VALUE;
    private boolean timed;

    Layouter(Problem pb) {
        this.pb = pb;
        slotUsed = new int[pb.slots.size()];
        int n = pb.instType.length;
        evBin = new int[n];
        evNew = new boolean[n];
        evInst = new int[n];
    }

    int steps() {
        return steps;
    }

    void rollback(int step) {
        while (steps > step) {
            steps--;
            int b = evBin[steps];
            if (b >= 0) {
                Bin bin = bins.get(b);
                bin.removeLast();
                if (evNew[steps]) {
                    bins.remove(b);
                    slotUsed[bin.slot.index]--;
                }
            }
        }
    }

    /**
     * Sets when placing gets cheaper (System.nanoTime values; Long.MAX_VALUE: never): from {@code quickFrom} on only
     * the quick orientations are tried; from {@code cheapFrom} on, pairs without a known exact no-fit polygon use
     * that of their bounding boxes and only the last opened stock and new stock are tried. Positions stay feasible.
     */
    void degradeAt(long quickFrom, long cheapFrom) {
        this.quickFrom = quickFrom;
        this.cheapFrom = cheapFrom;
        this.timed = quickFrom != Long.MAX_VALUE || cheapFrom != Long.MAX_VALUE;
    }

    void run(int[] order, int from) {
        rollback(from);
        for (int i = from; i < order.length; i++) {
            placeOne(order[i]);
        }
    }

    /**
     * As {@link #run(int[], int)} but stops when {@code deadline} (System.nanoTime) passes; returns how many copies
     * of the order are then placed or given up (the order's length when it finished, else the layout is incomplete).
     */
    int runUntil(int[] order, int from, long deadline) {
        rollback(from);
        for (int i = from; i < order.length; i++) {
            if (System.nanoTime() >= deadline) {
                return i;
            }
            placeOne(order[i]);
        }
        return order.length;
    }

    /**
     * Places {@code order[from..]} fast, with no no-fit polygon: in columns along the compacting axis by the boxes
     * of their spacing shapes (boxes that do not overlap keep the gap), beyond everything on the last opened stock,
     * then on new stock without obstacles. For a run whose time is nearly spent; a copy is given up only when no
     * stock is left.
     */
    void placeOnShelves(int[] order, int from) {
        rollback(from);
        Shelves shelves = new Shelves(pb, bins.isEmpty() ? null : bins.get(bins.size() - 1));
        for (int i = from; i < order.length; i++) {
            int inst = order[i];
            evInst[steps] = inst;
            evNew[steps] = false;
            evBin[steps] = -1;
            int t = pb.instType[inst];
            if (pb.tooLarge[t] == null) {
                Shelves.Spot spot = shelves.place(t);
                while (spot == null) {
                    Slot next = nextPlainSlot(t);
                    if (next == null) {
                        break;
                    }
                    Bin bin = new Bin(next, pb.types.size());
                    bins.add(bin);
                    slotUsed[next.index]++;
                    evNew[steps] = true;
                    shelves = new Shelves(pb, bin);
                    spot = shelves.place(t);
                    if (spot == null) {
                        // the new stock takes no copy of this type: close it again
                        bins.remove(bins.size() - 1);
                        slotUsed[next.index]--;
                        evNew[steps] = false;
                        shelves = new Shelves(pb, null);
                        skipped.add(next.index);
                    }
                }
                if (spot != null) {
                    Bin bin = shelves.bin();
                    bin.add(spot.orientation(), inst, spot.x(), spot.y(), pb.typeArea[t]);
                    evBin[steps] = bins.indexOf(bin);
                }
            }
            skipped.clear();
            steps++;
        }
    }

    private final java.util.Set<Integer> skipped = new java.util.HashSet<>();

    /** Stock with none left of it used, no obstacles, taking a box of type t; cheapest first; else null. */
    private Slot nextPlainSlot(int t) {
        for (Slot slot : pb.slots) {
            if (slotUsed[slot.index] >= slot.limit || slot.obstacles.length > 0 || skipped.contains(slot.index)) {
                continue;
            }
            for (Orientation o : pb.quickOrientations.get(t)) {
                if (slot.boxFits(o, pb.precision.eps())) {
                    return slot;
                }
            }
        }
        return null;
    }

    private List<Orientation> tryList;
    private boolean cheap;
    private boolean degraded;

    private void placeOne(int inst) {
        int t = pb.instType[inst];
        long now = timed ? System.nanoTime() : 0;
        cheap = timed && now >= cheapFrom;
        boolean quick = timed && now >= quickFrom;
        tryList = quick ? pb.quickOrientations.get(t) : pb.placeOrientations.get(t);
        degraded = quick || cheap;
        evInst[steps] = inst;
        evNew[steps] = false;
        evBin[steps] = -1;
        if (pb.tooLarge[t] == null) {
            for (int b = cheap ? Math.max(0, bins.size() - 1) : 0; b < bins.size(); b++) {
                Bin bin = bins.get(b);
                if (bin.failCount[t] >= 0) {
                    continue;
                }
                if (!bin.slot.unlimitedLength
                        && (bin.slot.cx1 - bin.slot.cx0) * (bin.slot.cy1 - bin.slot.cy0) - bin.partArea() < pb.typeArea[t]) {
                    continue;
                }
                if (tryBin(bin, t)) {
                    commit(bin, b, inst, false);
                    return;
                }
                if (!degraded) {
                    // a failure with fewer orientations or box no-fit polygons says nothing about the full search
                    bin.failCount[t] = bin.count;
                }
            }
            for (Slot slot : pb.slots) {
                if (slotUsed[slot.index] >= slot.limit) {
                    continue;
                }
                Bin bin = new Bin(slot, pb.types.size());
                if (tryBin(bin, t)) {
                    bins.add(bin);
                    slotUsed[slot.index]++;
                    commit(bin, bins.size() - 1, inst, true);
                    return;
                }
            }
            // out of time and out of new stock: the earlier opened stock, still without new no-fit polygons
            for (int b = 0; cheap && b < bins.size() - 1; b++) {
                Bin bin = bins.get(b);
                if (bin.failCount[t] < 0 && tryBin(bin, t)) {
                    commit(bin, b, inst, false);
                    return;
                }
            }
        }
        steps++;
    }

    private void commit(Bin bin, int b, int inst, boolean isNew) {
        Orientation o = best.orientation;
        bin.add(o, inst, best.x, best.y, pb.typeArea[o.type]);
        evBin[steps] = b;
        evNew[steps] = isNew;
        steps++;
    }

    private boolean tryBin(Bin bin, int t) {
        boolean found = false;
        for (Orientation o : tryList) {
            if (!bin.slot.boxFits(o, pb.precision.eps())) {
                continue;
            }
            if (bin.bottomLeft(o, pb.cache, pb.precision.eps(), scratch, pos, cheap)) {
                if (!found || pos.key1 < best.key1 || (pos.key1 == best.key1 && pos.key2 < best.key2)) {
                    best.x = pos.x;
                    best.y = pos.y;
                    best.key1 = pos.key1;
                    best.key2 = pos.key2;
                    best.orientation = pos.orientation;
                    found = true;
                }
            }
        }
        return found;
    }

    /** Far edge of the part bodies along the bin's primary axis, relative to the stock origin. */
    double usedExtent(Bin bin) {
        double m = -Double.MAX_VALUE;
        for (int k = 0; k < bin.count; k++) {
            Orientation o = pb.orientations.get(bin.orient[k]);
            m = Math.max(m, bin.slot.alongX ? bin.tx[k] + o.bMaxX : bin.ty[k] + o.bMaxY);
        }
        return bin.count == 0 ? 0 : m;
    }

    /** Objective of the current layout. */
    Score score() {
        int unplaced = 0;
        for (int i = 0; i < steps; i++) {
            if (evBin[i] < 0) {
                unplaced++;
            }
        }
        double cost = 0;
        double area = 0;
        double last = 0;
        double margin = pb.request.rules().margin();
        for (int b = 0; b < bins.size(); b++) {
            Bin bin = bins.get(b);
            double used = usedExtent(bin);
            double len = Math.max(0, used + margin);
            cost += bin.slot.stock.match(Sheet::cost, Remnant::cost, c -> c.costPerLength() * len);
            area += SheetLayout.stockArea(bin.slot.stock, len);
            if (b == bins.size() - 1) {
                last = used;
            }
        }
        double parts = 0;
        for (Bin bin : bins) {
            parts += bin.partArea();
        }
        return new Score(unplaced, bins.size(), cost, area, last, parts);
    }

    /** Copy of the current layout. */
    Solution snapshot(Score score) {
        List<Solution.BinPlan> plans = new ArrayList<>();
        for (Bin bin : bins) {
            plans.add(new Solution.BinPlan(bin.slot, Arrays.copyOf(bin.instance, bin.count), Arrays.copyOf(bin.orient, bin.count),
                    Arrays.copyOf(bin.tx, bin.count), Arrays.copyOf(bin.ty, bin.count), usedExtent(bin)));
        }
        List<Integer> unplaced = new ArrayList<>();
        for (int i = 0; i < steps; i++) {
            if (evBin[i] < 0) {
                unplaced.add(evInst[i]);
            }
        }
        return new Solution(plans, unplaced, score);
    }

    /** Lexicographic objective: unplaced copies, stock cost, stock area, then length used on the last stock. */
    record Score(int unplaced, int bins, double cost, double area, double lastLength, double partArea) {
        /** Part area over stock area, 0..1. */
        double utilization() {
            return area > 0 ? Math.min(1, partArea / area) : 0;
        }

        boolean betterThan(Score o) {
            return compare(o) < 0;
        }

        int compare(Score o) {
            if (unplaced != o.unplaced) {
                return Integer.compare(unplaced, o.unplaced);
            }
            int c = cmp(cost, o.cost);
            if (c != 0) {
                return c;
            }
            c = cmp(area, o.area);
            if (c != 0) {
                return c;
            }
            c = Integer.compare(bins, o.bins);
            if (c != 0) {
                return c;
            }
            return Double.compare(lastLength, o.lastLength);
        }

        private static int cmp(double a, double b) {
            return NestPrecision.compareTotals(a, b);
        }

        /** Threshold acceptance: not worse in count terms, and cost and last length within a factor 1 + t. */
        boolean acceptableAgainst(Score cur, double t) {
            if (unplaced != cur.unplaced) {
                return unplaced < cur.unplaced;
            }
            if (bins != cur.bins) {
                return bins < cur.bins && cost <= cur.cost * (1 + t + NestPrecision.RELATIVE_TIE);
            }
            if (cost > cur.cost * (1 + t + NestPrecision.RELATIVE_TIE)) {
                return false;
            }
            return cost < cur.cost || lastLength <= cur.lastLength + t * Math.abs(cur.lastLength);
        }
    }
}
