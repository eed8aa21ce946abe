package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The fast placement of a run whose time is nearly spent: copies in columns along the bin's compacting axis, by
 * the boxes of their spacing shapes (two spacing boxes that do not overlap keep the gap between the parts), all
 * beyond the far edge of what the bin already holds. Needs no no-fit polygon; used on stock without obstacles.
 */
final class Shelves {
    /** A position found: the orientation and its reference point. */
    record Spot(Orientation orientation, double x, double y) {
    }

    private final Problem pb;
    private final Bin bin;
    /** Spacing boxes of the current column start at this coordinate along the compacting axis. */
    private double colStart;
    /** Far edge of the spacing boxes of the current column along the compacting axis. */
    private double colEnd = Double.NEGATIVE_INFINITY;
    /** Far edge of the last spacing box of the current column across the compacting axis. */
    private double across = Double.NEGATIVE_INFINITY;

    /** Columns on {@code bin} (null, or a bin with obstacles: nothing fits). */
    Shelves(Problem pb, Bin bin) {
        this.pb = pb;
        this.bin = bin == null || bin.slot.obstacles.length > 0 ? null : bin;
        this.colStart = this.bin == null ? 0 : this.bin.frontier();
    }

    Bin bin() {
        return bin;
    }

    /** A place for a copy of type {@code t}, or null when the bin has no room left for it. */
    Spot place(int t) {
        if (bin == null) {
            return null;
        }
        List<Orientation> os = new ArrayList<>(pb.quickOrientations.get(t));
        boolean alongX = bin.slot.alongX;
        Slot slot = bin.slot;
        double room = alongX ? slot.cy1 - slot.cy0 : slot.cx1 - slot.cx0;
        // copies a full column holds per unit of length along the compacting axis, most first
        os.sort(Comparator.comparingDouble(o -> {
            double along = alongX ? o.sMaxX - o.sMinX : o.sMaxY - o.sMinY;
            double across = alongX ? o.sMaxY - o.sMinY : o.sMaxX - o.sMinX;
            return -Math.max(1, Math.floor(room / across)) / along;
        }));
        Spot s = inColumn(os);
        if (s == null && colEnd > Double.NEGATIVE_INFINITY) {
            colStart = Math.max(colStart, colEnd);
            across = Double.NEGATIVE_INFINITY;
            s = inColumn(os);
        }
        return s;
    }

    private Spot inColumn(List<Orientation> os) {
        Slot slot = bin.slot;
        double eps = pb.precision.eps();
        for (Orientation o : os) {
            if (!slot.boxFits(o, eps)) {
                continue;
            }
            double x;
            double y;
            if (slot.alongX) {
                x = Math.max(colStart - o.sMinX, slot.cx0 - o.bMinX);
                y = Math.max(across - o.sMinY, slot.cy0 - o.bMinY);
            } else {
                y = Math.max(colStart - o.sMinY, slot.cy0 - o.bMinY);
                x = Math.max(across - o.sMinX, slot.cx0 - o.bMinX);
            }
            boolean inX = slot.unlimitedLength || x + o.bMaxX <= slot.cx1 + eps;
            if (!inX || y + o.bMaxY > slot.cy1 + eps) {
                continue;
            }
            if (slot.alongX) {
                across = y + o.sMaxY;
                colEnd = Math.max(colEnd, x + o.sMaxX);
            } else {
                across = x + o.sMaxX;
                colEnd = Math.max(colEnd, y + o.sMaxY);
            }
            return new Spot(o, x, y);
        }
        return null;
    }
}
