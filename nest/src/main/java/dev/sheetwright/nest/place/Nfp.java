package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.overlayng.UnaryUnionNG;

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
        return new Nfp(List.of(base.parts), base.outline == base.parts ? null : List.of(base.outline), pockets);
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
            if (merged != null) {
                return new Nfp(out, merged);
            }
        }
        return new Nfp(out);
    }

    /** Above this many convex sums the union is formed and split again into (fewer) convex pieces. */
    static final int UNION_ABOVE = 12;
    private static final GeometryFactory GF = new GeometryFactory();

    /**
     * Boundary rings of the union of the sums (exterior and holes), each kept as a closed edge chain for candidate
     * generation only; null if the union fails.
     */
    private static List<ConvexPolygon> unionAndSplit(List<ConvexPolygon> parts) {
        List<Geometry> polys = new ArrayList<>();
        int rawVertices = 0;
        for (ConvexPolygon c : parts) {
            Coordinate[] cs = new Coordinate[c.size() + 1];
            for (int i = 0; i < c.size(); i++) {
                cs[i] = new Coordinate(c.xs[i], c.ys[i]);
            }
            cs[c.size()] = cs[0].copy();
            polys.add(GF.createPolygon(cs));
            rawVertices += c.size();
        }
        try {
            Geometry u = UnaryUnionNG.union(GF.buildGeometry(polys), GF.getPrecisionModel());
            if (u == null || u.isEmpty()) {
                return null;
            }
            List<ConvexPolygon> rings = new ArrayList<>();
            int vertices = 0;
            for (int g = 0; g < u.getNumGeometries(); g++) {
                Polygon p = (Polygon) u.getGeometryN(g);
                rings.add(ConvexPolygon.ring(p.getExteriorRing().getCoordinates()));
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    rings.add(ConvexPolygon.ring(p.getInteriorRingN(h).getCoordinates()));
                }
            }
            for (ConvexPolygon r : rings) {
                vertices += r.size();
            }
            return vertices < rawVertices ? rings : null;
        } catch (RuntimeException e) {
            return null;
        }
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

        Cache(List<Orientation> orientations) {
            this(orientations, null);
        }

        Cache(List<Orientation> orientations, int[] canonicalType) {
            this.orientations = orientations;
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
            long milli = Math.round(dev.sheetwright.nest.model.RotationRule.normalize(deg) * 1e6) % 360_000_000L;
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
                n = of(f, m);
            }
            Nfp prev = map.putIfAbsent(k, n);
            return prev != null ? prev : n;
        }
    }
}
