package dev.sheetwright.nest.overlap;

/**
 * Whether two placed search shapes collide (decided exactly: bounding boxes, then proper edge crossings, then
 * containment) and, if they do, how much: the summed penetration depth of their poles (inscribed circles),
 * r1 + r2 - distance for every pair of poles that overlap deeper than {@link #SHALLOW} of their radii (less for
 * shallow or apart pairs), never less than {@code floor}. When that sum is shallow (less than the largest pole of the
 * smaller shape), the depth of the deepest corner of one inside the other counts instead if it is more, capped at that
 * pole's radius so the measure has no jump where the corners stop counting. For two discs (one pole each) overlapping
 * deeper than that it is the exact penetration depth (the shortest move that separates them). Boundaries that only
 * touch do not collide.
 */
final class OverlapMeasure {
    /** Below this share of their radii two poles count as barely touching (see {@link #poleDepth}). */
    static final double SHALLOW = 0.01;

    private final double floor;
    private final double slack;

    /** The least overlap a collision counts as in a search, as a share of the mean piece size. */
    static final double FLOOR_SHARE = 1e-3;

    /**
     * Share of the precision by which an edge may cross another and still count as touching: far above round-off,
     * and small enough that two touching pieces share no area an outside checker would see (with no gap, a crossing
     * of the whole precision along a long edge left a common area of 1e-5 on a strip 40 wide).
     */
    static final double TOUCH_SHARE = 0.01;

    /**
     * The measure a search uses for pieces of mean size {@code meanReach}: a collision counts at least
     * {@link #FLOOR_SHARE} of that size (never less than {@code precision}), and edges may touch within
     * {@link #TOUCH_SHARE} of {@code precision}.
     */
    static OverlapMeasure forPieces(double meanReach, double precision) {
        return new OverlapMeasure(Math.max(precision, meanReach * FLOOR_SHARE), precision * TOUCH_SHARE);
    }

    /**
     * {@code floor}: the least overlap a collision counts as (a small length, > 0); {@code slack}: how far an edge may
     * cross another and still count as touching (the search's precision, >= 0; callers grow shapes by as much).
     */
    OverlapMeasure(double floor, double slack) {
        if (!(floor > 0) || !(slack >= 0)) {
            throw new IllegalArgumentException("floor must be > 0 and slack >= 0, got " + floor + ", " + slack);
        }
        this.floor = floor;
        this.slack = slack;
    }

    /** Overlap of a and b: 0 when they do not collide. */
    double overlap(PlacedShape a, PlacedShape b) {
        if (a.maxX <= b.minX || b.maxX <= a.minX || a.maxY <= b.minY || b.maxY <= a.minY) {
            return 0;
        }
        if (!collide(a, b)) {
            return 0;
        }
        double poles = poleDepth(a, b);
        double shallow = Math.min(a.shape.poleR[0], b.shape.poleR[0]);
        if (poles >= shallow) {
            return Math.max(floor, poles);
        }
        // a shallow overlap: the corners may reach deeper than the poles see (capped, so the measure stays continuous)
        double corners = Math.min(shallow, Math.max(cornerDepth(a, b), cornerDepth(b, a)));
        return Math.max(floor, Math.max(poles, corners));
    }

    /**
     * How deep the corners of a reach into b: the largest distance from a vertex of a inside b to the boundary of b.
     * It sees the shallow corner overlaps the poles miss. A vertex is no deeper in b than in b's bounding box, so
     * vertices that cannot beat the deepest so far are skipped, and so are edges once one is nearer than that.
     */
    static double cornerDepth(PlacedShape a, PlacedShape b) {
        double deepest = 0;
        int nb = b.n();
        // the edge of b nearest the last corner tested: the next corner inside b is most often near it too, so the
        // scan starts there and stops early once an edge is nearer than the deepest corner so far (the minimum, and
        // so the result, does not depend on the order)
        int near = 0;
        for (int i = 0; i < a.n(); i++) {
            double x = a.wx[i];
            double y = a.wy[i];
            // a point inside b is no deeper than it is inside b's bounding box: such a point cannot beat the deepest
            double room = Math.min(Math.min(x - b.minX, b.maxX - x), Math.min(y - b.minY, b.maxY - y));
            if (room <= deepest || !b.contains(x, y)) {
                continue;
            }
            double d2 = room * room;
            double floor2 = deepest * deepest;
            int start = near;
            for (int k = 0; k < nb && d2 > floor2; k++) {
                int j = start + k < nb ? start + k : start + k - nb;
                int pj = j == 0 ? nb - 1 : j - 1;
                double x0 = b.wx[pj];
                double y0 = b.wy[pj];
                double x1 = b.wx[j];
                double y1 = b.wy[j];
                // an edge whose box is no nearer than the nearest edge so far cannot be nearer
                double gx = Math.max(0, Math.max(Math.min(x0, x1) - x, x - Math.max(x0, x1)));
                double gy = Math.max(0, Math.max(Math.min(y0, y1) - y, y - Math.max(y0, y1)));
                if (gx * gx + gy * gy >= d2) {
                    continue;
                }
                double e2 = segmentDistance2(x, y, x0, y0, x1, y1);
                if (e2 < d2) {
                    d2 = e2;
                    near = j;
                }
            }
            deepest = Math.max(deepest, Math.sqrt(d2));
        }
        return deepest;
    }

    private static double segmentDistance2(double x, double y, double x0, double y0, double x1, double y1) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double l2 = dx * dx + dy * dy;
        double t = l2 > 0 ? Math.max(0, Math.min(1, ((x - x0) * dx + (y - y0) * dy) / l2)) : 0;
        double ex = x0 + t * dx - x;
        double ey = y0 + t * dy - y;
        return ex * ex + ey * ey;
    }

    /**
     * Summed penetration depth of the poles of a and b. A pair of poles that overlaps by less than a hundredth of its
     * radii (or not at all) still adds a little, falling off with the distance, so the search feels which way is out.
     */
    static double poleDepth(PlacedShape a, PlacedShape b) {
        double sum = 0;
        double[] ar = a.shape.poleR;
        double[] br = b.shape.poleR;
        for (int i = 0; i < ar.length; i++) {
            for (int j = 0; j < br.length; j++) {
                double dx = a.px[i] - b.px[j];
                double dy = a.py[i] - b.py[j];
                double rr = ar[i] + br[j];
                double pd = rr - Math.sqrt(dx * dx + dy * dy);
                double e = SHALLOW * rr;
                sum += pd >= e ? pd : e * e / (2 * e - pd);
            }
        }
        return sum;
    }

    /** Exact collision of two simple polygons (interiors intersect). */
    boolean collide(PlacedShape a, PlacedShape b) {
        int na = a.n();
        int nb = b.n();
        double ox0 = Math.max(a.minX, b.minX);
        double ox1 = Math.min(a.maxX, b.maxX);
        double oy0 = Math.max(a.minY, b.minY);
        double oy1 = Math.min(a.maxY, b.maxY);
        double[] la = a.shape.edgeLength;
        double[] lb = b.shape.edgeLength;
        boolean near = false;
        for (int i = 0, pi = na - 1; i < na; pi = i++) {
            double ax0 = a.wx[pi];
            double ay0 = a.wy[pi];
            double ax1 = a.wx[i];
            double ay1 = a.wy[i];
            // only edges of a that reach into the common box can cross b
            // (an edge on the border of the common box still counts: the other shape reaches past it)
            if (Math.max(ax0, ax1) < ox0 || Math.min(ax0, ax1) > ox1 || Math.max(ay0, ay1) < oy0 || Math.min(ay0, ay1) > oy1) {
                continue;
            }
            double ex0 = Math.min(ax0, ax1);
            double ex1 = Math.max(ax0, ax1);
            double ey0 = Math.min(ay0, ay1);
            double ey1 = Math.max(ay0, ay1);
            for (int j = 0, pj = nb - 1; j < nb; pj = j++) {
                double bx0 = b.wx[pj];
                double by0 = b.wy[pj];
                double bx1 = b.wx[j];
                double by1 = b.wy[j];
                if (Math.max(bx0, bx1) < ex0 || Math.min(bx0, bx1) > ex1 || Math.max(by0, by1) < ey0 || Math.min(by0, by1) > ey1) {
                    continue;
                }
                near = true;
                if (Math.max(bx0, bx1) == ex0 || Math.min(bx0, bx1) == ex1 || Math.max(by0, by1) == ey0 || Math.min(by0, by1) == ey1) {
                    continue; // boxes that only touch: no proper crossing
                }
                if (properCross(ax0, ay0, ax1, ay1, la[i] * slack, bx0, by0, bx1, by1, lb[j] * slack)) {
                    return true;
                }
            }
        }
        // no proper crossing: apart, touching, one inside the other, or crossing only at vertices and along
        // collinear edges. A deep point (the first pole's centre) of each tested against the other tells one inside
        // the other; when no two edges even have touching boxes, the boundaries do not meet and that is all there is
        // to test. Else every vertex and every edge midpoint of each is tested against the other.
        if (b.contains(a.px[0], a.py[0]) || a.contains(b.px[0], b.py[0])) {
            return true;
        }
        return near && (pointsInside(a, b) || pointsInside(b, a));
    }

    /** Whether a vertex or an edge midpoint of a lies inside b, farther than the slack from its boundary. */
    private boolean pointsInside(PlacedShape a, PlacedShape b) {
        int na = a.n();
        for (int i = 0, pi = na - 1; i < na; pi = i++) {
            if (deepInside(a.wx[i], a.wy[i], b) || deepInside((a.wx[i] + a.wx[pi]) / 2, (a.wy[i] + a.wy[pi]) / 2, b)) {
                return true;
            }
        }
        return false;
    }

    private boolean deepInside(double x, double y, PlacedShape s) {
        if (!s.contains(x, y)) {
            return false;
        }
        double limit = Math.max(slack, Double.MIN_NORMAL);
        int n = s.n();
        for (int j = 0, pj = n - 1; j < n; pj = j++) {
            if (segmentDistance2(x, y, s.wx[pj], s.wy[pj], s.wx[j], s.wy[j]) <= limit * limit) {
                return false;
            }
        }
        return true;
    }

    /**
     * Whether segment ab crosses segment cd by more than the slack: each end of one is farther than the slack from the
     * other's line, on opposite sides ({@code sab}, {@code scd}: slack times the segment's length).
     */
    private static boolean properCross(double ax, double ay, double bx, double by, double sab,
            double cx, double cy, double dx, double dy, double scd) {
        double d1 = orient(cx, cy, dx, dy, ax, ay);
        double d2 = orient(cx, cy, dx, dy, bx, by);
        if (!(d1 > scd && d2 < -scd || d1 < -scd && d2 > scd)) {
            return false;
        }
        double d3 = orient(ax, ay, bx, by, cx, cy);
        double d4 = orient(ax, ay, bx, by, dx, dy);
        return d3 > sab && d4 < -sab || d3 < -sab && d4 > sab;
    }

    private static double orient(double ax, double ay, double bx, double by, double cx, double cy) {
        return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    }

    /** How far the shape sticks out of the box [x0, x1] x [y0, y1], summed over the four sides (0 when inside). */
    static double outside(PlacedShape s, double x0, double y0, double x1, double y1) {
        return Math.max(0, x0 - s.minX) + Math.max(0, s.maxX - x1) + Math.max(0, y0 - s.minY) + Math.max(0, s.maxY - y1);
    }
}
