package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;

import dev.sheetwright.nest.model.NestPrecision;

/**
 * No-fit polygon of a moving orientation against a fixed one, kept as the list of convex Minkowski sums
 * conv(a + (-b)) over all pairs of convex pieces: the union is the set of reference positions of the moving
 * shape where it would overlap the fixed one.
 */
final class Nfp {
    /** The convex sums themselves: the exact region, used to test positions (keeps zero-width slits feasible). */
    final ConvexPolygon[] parts;
    /**
     * The boundary of the region as chains of edges, connecting edges marked open (when there are many sums), used
     * to generate candidate positions; the same array as {@link #parts} when no boundary was formed.
     */
    final ConvexPolygon[] outline;
    /** Convex regions inside the no-fit region where the moving part sits in a hole (or around the fixed one). */
    final ConvexPolygon[] pockets;
    final double minX;
    final double minY;
    final double maxX;
    final double maxY;

    Nfp(List<ConvexPolygon> parts) {
        this(parts, null);
    }

    Nfp(List<ConvexPolygon> parts, List<ConvexPolygon> outline) {
        this(parts, outline, List.of());
    }

    Nfp(List<ConvexPolygon> parts, List<ConvexPolygon> outline, List<ConvexPolygon> pockets) {
        this.pockets = pockets.toArray(new ConvexPolygon[0]);
        this.parts = parts.toArray(new ConvexPolygon[0]);
        this.outline = outline == null ? this.parts : outline.toArray(new ConvexPolygon[0]);
        double[] b = Orientation.bounds(this.parts);
        minX = b[0];
        minY = b[1];
        maxX = b[2];
        maxY = b[3];
    }

    /** No-fit polygon of two orientations, with the pockets of their holes. */
    static Nfp of(Orientation fixed, Orientation moving, double eps) {
        Nfp base = of(fixed.spacing, moving.spacing, eps);
        if (fixed.holes.length == 0 && moving.holes.length == 0) {
            return base;
        }
        List<ConvexPolygon> pockets = new ArrayList<>();
        double pad = 1 + Math.max(base.maxX - base.minX, base.maxY - base.minY);
        double x0 = base.minX - pad;
        double y0 = base.minY - pad;
        double x1 = base.maxX + pad;
        double y1 = base.maxY + pad;
        for (ConvexPolygon h : fixed.holes) {
            // moving part inside the fixed part's hole: n . (p + v) <= c for every vertex v of the moving part
            int n = h.size();
            double[] ax = new double[n];
            double[] ay = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                ax[i] = h.nx[i];
                ay[i] = h.ny[i];
                b[i] = h.c[i] - support(moving.spacing, h.nx[i], h.ny[i]);
            }
            ConvexPolygon p = ConvexPolygon.fromHalfPlanes(ax, ay, b, x0, y0, x1, y1);
            if (p != null) {
                pockets.add(p);
            }
        }
        for (ConvexPolygon h : moving.holes) {
            // fixed part inside the moving part's hole: n . (a - p) <= c for every vertex a of the fixed part
            int n = h.size();
            double[] ax = new double[n];
            double[] ay = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                ax[i] = -h.nx[i];
                ay[i] = -h.ny[i];
                b[i] = h.c[i] - support(fixed.spacing, h.nx[i], h.ny[i]);
            }
            ConvexPolygon p = ConvexPolygon.fromHalfPlanes(ax, ay, b, x0, y0, x1, y1);
            if (p != null) {
                pockets.add(p);
            }
        }
        return new Nfp(List.of(base.parts), base.outline == base.parts ? null : List.of(base.outline), pockets);
    }

    private static double support(ConvexPolygon[] parts, double ux, double uy) {
        double m = Double.NEGATIVE_INFINITY;
        for (ConvexPolygon c : parts) {
            m = Math.max(m, c.support(ux, uy));
        }
        return m;
    }

    /** The convex sums of every pair; {@code eps}: the problem's precision (for the union boundary). */
    static Nfp of(ConvexPolygon[] fixed, ConvexPolygon[] moving, double eps) {
        List<ConvexPolygon> out = new ArrayList<>();
        for (ConvexPolygon a : fixed) {
            for (ConvexPolygon b : moving) {
                ConvexPolygon s = a.minusSum(b);
                if (s != null) {
                    out.add(s);
                }
            }
        }
        if (out.size() > UNION_ABOVE) {
            List<ConvexPolygon> merged = unionBoundary(out, eps);
            if (merged != null) {
                return new Nfp(out, merged);
            }
        }
        return new Nfp(out);
    }

    /** Above this many convex sums the boundary of their union is formed for candidate generation. */
    static final int UNION_ABOVE = 12;

    /**
     * The boundary of the union of the sums, for candidate generation only: each sum's edges with the parts lying
     * strictly inside another sum cut away, kept per sum as one chain whose connecting edges are marked open (they
     * give no candidates). An edge shared with a sum on its other side is inside the union and cut away as well
     * (positions there could pass the test against the sums while overlapping); collinear overlapping outer edges
     * are all kept. Null when that leaves no fewer edges than the sums themselves have.
     */
    static List<ConvexPolygon> unionBoundary(List<ConvexPolygon> parts, double eps) {
        int rawEdges = 0;
        for (ConvexPolygon c : parts) {
            rawEdges += c.size();
        }
        List<ConvexPolygon> chains = new ArrayList<>();
        int edges = 0;
        double[] keep = new double[16];
        double[] px = new double[32];
        double[] py = new double[32];
        boolean[] closed = new boolean[32];
        for (int p = 0; p < parts.size(); p++) {
            ConvexPolygon a = parts.get(p);
            int n = a.size();
            int m = 0;
            boolean lastAtVertex = false;
            int lastVertex = -1;
            boolean firstAtStart = false;
            for (int i = 0; i < n; i++) {
                int j = i + 1 == n ? 0 : i + 1;
                double ax = a.xs[i];
                double ay = a.ys[i];
                double bx = a.xs[j];
                double by = a.ys[j];
                keep[0] = 0;
                keep[1] = 1;
                int k = 1;
                double sx0 = Math.min(ax, bx);
                double sx1 = Math.max(ax, bx);
                double sy0 = Math.min(ay, by);
                double sy1 = Math.max(ay, by);
                for (int q = 0; q < parts.size() && k > 0; q++) {
                    ConvexPolygon b = parts.get(q);
                    if (q == p || b.minX > sx1 || b.maxX < sx0 || b.minY > sy1 || b.maxY < sy0) {
                        continue;
                    }
                    // the open interval of t where a + t (b - a) is strictly inside (by eps) polygon q
                    double lo = 0;
                    double hi = 1;
                    for (int e = 0; e < b.size() && lo < hi; e++) {
                        double d0 = b.nx[e] * ax + b.ny[e] * ay - b.c[e] + eps;
                        double dd = b.nx[e] * (bx - ax) + b.ny[e] * (by - ay);
                        if (b.nx[e] * a.nx[i] + b.ny[e] * a.ny[i] < -1 + NestPrecision.ROUND_OFF && Math.abs(d0 - eps) <= eps
                                && Math.abs(d0 - eps + dd) <= eps) {
                            // q's edge on the same line, q on the other side: the shared part is inside the union
                            continue;
                        }
                        if (dd == 0) {
                            if (d0 >= 0) {
                                hi = lo;
                            }
                        } else if (dd > 0) {
                            hi = Math.min(hi, -d0 / dd);
                        } else {
                            lo = Math.max(lo, -d0 / dd);
                        }
                    }
                    if (hi - lo > NestPrecision.PARAMETER_ROUND_OFF) {
                        if (keep.length < 2 * k + 2) {
                            keep = java.util.Arrays.copyOf(keep, keep.length * 2);
                        }
                        k = cut(keep, k, lo, hi);
                    }
                }
                double len = Math.hypot(bx - ax, by - ay);
                for (int r = 0; r < k; r++) {
                    double t0 = keep[2 * r];
                    double t1 = keep[2 * r + 1];
                    if ((t1 - t0) * len <= 4 * eps && !(t0 == 0 && t1 == 1)) {
                        // a sliver left where the edge enters another sum: no new vertex of the union
                        continue;
                    }
                    if (m + 2 > px.length) {
                        px = java.util.Arrays.copyOf(px, px.length * 2);
                        py = java.util.Arrays.copyOf(py, py.length * 2);
                        closed = java.util.Arrays.copyOf(closed, closed.length * 2);
                    }
                    if (m > 0 && lastAtVertex && lastVertex == i && t0 == 0) {
                        closed[m - 1] = true;
                    } else {
                        if (m == 0 && i == 0 && t0 == 0) {
                            firstAtStart = true;
                        }
                        px[m] = t0 == 0 ? ax : ax + t0 * (bx - ax);
                        py[m] = t0 == 0 ? ay : ay + t0 * (by - ay);
                        closed[m] = true;
                        m++;
                    }
                    px[m] = t1 == 1 ? bx : ax + t1 * (bx - ax);
                    py[m] = t1 == 1 ? by : ay + t1 * (by - ay);
                    closed[m] = false;
                    m++;
                    lastAtVertex = t1 == 1;
                    lastVertex = j;
                }
            }
            if (m == 0) {
                continue;
            }
            if (m > 2 && firstAtStart && lastAtVertex && lastVertex == 0) {
                // the chain ends where it started: drop the repeated point and close the ring
                m--;
                closed[m - 1] = true;
            }
            if (m < 2) {
                continue;
            }
            double[] xs = java.util.Arrays.copyOf(px, m);
            double[] ys = java.util.Arrays.copyOf(py, m);
            boolean[] open = new boolean[m];
            boolean anyOpen = false;
            for (int i = 0; i < m; i++) {
                open[i] = !closed[i];
                anyOpen |= open[i];
                edges += closed[i] ? 1 : 0;
            }
            ConvexPolygon ring = ConvexPolygon.ring(xs, ys);
            chains.add(anyOpen ? ring.withOpenEdges(open) : ring);
        }
        return edges < rawEdges ? chains : null;
    }

    /** Removes the open interval (lo, hi) from the k sorted disjoint intervals in keep; returns the new count. */
    private static int cut(double[] keep, int k, double lo, double hi) {
        double[] out = new double[2 * k + 2];
        int n = 0;
        for (int r = 0; r < k; r++) {
            double a = keep[2 * r];
            double b = keep[2 * r + 1];
            if (hi <= a || lo >= b) {
                out[n++] = a;
                out[n++] = b;
                continue;
            }
            if (lo > a) {
                out[n++] = a;
                out[n++] = lo;
            }
            if (hi < b) {
                out[n++] = hi;
                out[n++] = b;
            }
        }
        System.arraycopy(out, 0, keep, 0, n);
        return n / 2;
    }

    /** This no-fit polygon turned counter-clockwise by {@code deg} about the origin. */
    Nfp rotated(double deg) {
        List<ConvexPolygon> p = Orientation.transform(List.of(parts), deg, false);
        List<ConvexPolygon> o = outline == parts ? null : Orientation.transformRings(List.of(outline), deg);
        List<ConvexPolygon> k = Orientation.transform(List.of(pockets), deg, false);
        return new Nfp(p, o, k);
    }

    /**
     * Cache of part-against-part no-fit polygons, safe to share between threads (values are immutable). Uses
     * NFP(R A, R B) = R NFP(A, B): a pair is computed with the fixed part unturned and then rotated, when the
     * needed relative angle is one of the allowed ones.
     */
    static final class Cache {
        private final ConcurrentHashMap<Long, Nfp> map = new ConcurrentHashMap<>();
        private final List<Orientation> orientations;
        private final java.util.Map<String, Integer> byKey = new java.util.HashMap<>();

        /** canon[id]: the same orientation of the lowest type with the same outline (they share no-fit polygons). */
        private final int[] canon;
        private final ConcurrentHashMap<Long, Nfp> boxes = new ConcurrentHashMap<>();

        private final double eps;

        Cache(List<Orientation> orientations, double eps) {
            this(orientations, null, eps);
        }

        Cache(List<Orientation> orientations, int[] canonicalType, double eps) {
            this.orientations = orientations;
            this.eps = eps;
            for (Orientation o : orientations) {
                byKey.put(key(o.type, o.angleDeg, o.mirrored), o.id);
            }
            canon = new int[orientations.size()];
            for (Orientation o : orientations) {
                Integer c = canonicalType == null ? null : byKey.get(key(canonicalType[o.type], o.angleDeg, o.mirrored));
                canon[o.id] = c == null ? o.id : c;
            }
        }

        /**
         * The exact no-fit polygon when it is already known, else (when {@code cheap}) the no-fit polygon of the two
         * spacing bounding boxes, which contains the exact one: a position outside it is feasible too.
         */
        Nfp get(int fixedId, int movingId, boolean cheap) {
            if (!cheap) {
                return get(fixedId, movingId);
            }
            long k = ((long) canon[fixedId] << 32) | canon[movingId];
            Nfp n = map.get(k);
            if (n != null) {
                return n;
            }
            n = boxes.get(k);
            if (n == null) {
                Orientation f = orientations.get(canon[fixedId]);
                Orientation m = orientations.get(canon[movingId]);
                double[] xs = {f.sMinX - m.sMaxX, f.sMaxX - m.sMinX, f.sMaxX - m.sMinX, f.sMinX - m.sMaxX};
                double[] ys = {f.sMinY - m.sMaxY, f.sMinY - m.sMaxY, f.sMaxY - m.sMinY, f.sMaxY - m.sMinY};
                ConvexPolygon box = ConvexPolygon.of(xs, ys);
                n = new Nfp(box == null ? List.of() : List.of(box));
                boxes.putIfAbsent(k, n);
            }
            return n;
        }

        private static String key(int type, double deg, boolean mirrored) {
            long milli = Math.round(dev.sheetwright.nest.model.RotationRule.normalize(deg) / NestPrecision.ANGLE_DEG) % Math.round(360 / NestPrecision.ANGLE_DEG);
            return type + ":" + milli + ":" + mirrored;
        }

        Nfp get(int fixedId, int movingId) {
            fixedId = canon[fixedId];
            movingId = canon[movingId];
            long k = ((long) fixedId << 32) | movingId;
            Nfp n = map.get(k);
            if (n != null) {
                return n;
            }
            Orientation f = orientations.get(fixedId);
            Orientation m = orientations.get(movingId);
            Integer baseF = f.angleDeg == 0 ? null : byKey.get(key(f.type, 0, f.mirrored));
            Integer baseM = baseF == null ? null : byKey.get(key(m.type, m.angleDeg - f.angleDeg, m.mirrored));
            if (baseF != null && baseM != null) {
                n = get(baseF, baseM).rotated(f.angleDeg);
            } else {
                n = of(f, m, eps);
            }
            Nfp prev = map.putIfAbsent(k, n);
            return prev != null ? prev : n;
        }
    }
}
