package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;

import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.union.CascadedPolygonUnion;

/**
 * No-fit polygon of a moving orientation against a fixed one, kept as the list of convex Minkowski sums
 * conv(a + (-b)) over all pairs of convex pieces: the union is the set of reference positions of the moving
 * shape where it would overlap the fixed one.
 */
final class Nfp {
    /** The convex sums themselves: the exact region, used to test positions (keeps zero-width slits feasible). */
    final ConvexPolygon[] parts;
    /**
     * The same region as fewer convex pieces with the shared edges marked open (from a union when there are many
     * sums), used to generate candidate positions; the same array as {@link #parts} when no union was formed.
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
    static Nfp of(Orientation fixed, Orientation moving) {
        Nfp base = of(fixed.spacing, moving.spacing);
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
        return new Nfp(List.of(base.parts), List.of(base.outline), pockets);
    }

    private static double support(ConvexPolygon[] parts, double ux, double uy) {
        double m = Double.NEGATIVE_INFINITY;
        for (ConvexPolygon c : parts) {
            m = Math.max(m, c.support(ux, uy));
        }
        return m;
    }

    static Nfp of(ConvexPolygon[] fixed, ConvexPolygon[] moving) {
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
            List<ConvexPolygon> merged = unionAndSplit(out);
            if (merged != null && merged.size() < out.size()) {
                return new Nfp(out, merged);
            }
        }
        return new Nfp(out);
    }

    /** Above this many convex sums the union is formed and split again into (fewer) convex pieces. */
    static final int UNION_ABOVE = 4;
    private static final GeometryFactory GF = new GeometryFactory();

    private static List<ConvexPolygon> unionAndSplit(List<ConvexPolygon> parts) {
        List<Geometry> polys = new ArrayList<>();
        for (ConvexPolygon c : parts) {
            Coordinate[] cs = new Coordinate[c.size() + 1];
            for (int i = 0; i < c.size(); i++) {
                cs[i] = new Coordinate(c.xs[i], c.ys[i]);
            }
            cs[c.size()] = cs[0].copy();
            polys.add(GF.createPolygon(cs));
        }
        try {
            Geometry u = CascadedPolygonUnion.union(polys);
            if (u == null || u.isEmpty()) {
                return null;
            }
            double before = 0;
            List<ConvexPolygon> split = ConvexDecomposer.decompose(u);
            for (ConvexPolygon c : split) {
                before += c.area();
            }
            // the split must cover the union (same area up to rounding), otherwise keep the raw sums
            if (Math.abs(before - u.getArea()) > 1e-9 * u.getArea()) {
                return null;
            }
            // mark the edges shared inside the union: points on them are inside, not on the boundary
            IndexedPointInAreaLocator loc = new IndexedPointInAreaLocator(u);
            Envelope e = u.getEnvelopeInternal();
            double delta = 1e-7 * Math.max(e.getWidth(), e.getHeight());
            List<ConvexPolygon> out = new ArrayList<>();
            for (ConvexPolygon c : split) {
                int n = c.size();
                boolean[] open = new boolean[n];
                boolean any = false;
                for (int i = 0; i < n; i++) {
                    int j = (i + 1) % n;
                    for (double f : new double[] {0.25, 0.5, 0.75}) {
                        double px = c.xs[i] + f * (c.xs[j] - c.xs[i]) + c.nx[i] * delta;
                        double py = c.ys[i] + f * (c.ys[j] - c.ys[i]) + c.ny[i] * delta;
                        if (loc.locate(new Coordinate(px, py)) == Location.INTERIOR) {
                            open[i] = true;
                        }
                    }
                    any |= open[i];
                }
                out.add(any ? c.withOpenEdges(open) : c);
            }
            return out;
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** Cache of part-against-part no-fit polygons, safe to share between threads (values are immutable). */
    static final class Cache {
        private final ConcurrentHashMap<Long, Nfp> map = new ConcurrentHashMap<>();
        private final List<Orientation> orientations;

        Cache(List<Orientation> orientations) {
            this.orientations = orientations;
        }

        Nfp get(int fixedId, int movingId) {
            long key = ((long) fixedId << 32) | movingId;
            Nfp n = map.get(key);
            if (n == null) {
                n = of(orientations.get(fixedId), orientations.get(movingId));
                Nfp prev = map.putIfAbsent(key, n);
                if (prev != null) {
                    n = prev;
                }
            }
            return n;
        }
    }
}
