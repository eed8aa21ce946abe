package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;

/**
 * No-fit polygon of a moving orientation against a fixed one, kept as the list of convex Minkowski sums
 * conv(a + (-b)) over all pairs of convex pieces: the union is the set of reference positions of the moving
 * shape where it would overlap the fixed one.
 */
final class Nfp {
    final ConvexPolygon[] parts;
    final double minX;
    final double minY;
    final double maxX;
    final double maxY;

    Nfp(List<ConvexPolygon> parts) {
        this.parts = parts.toArray(new ConvexPolygon[0]);
        double[] b = Orientation.bounds(this.parts);
        minX = b[0];
        minY = b[1];
        maxX = b[2];
        maxY = b[3];
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
        return new Nfp(out);
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
                n = of(orientations.get(fixedId).spacing, orientations.get(movingId).spacing);
                Nfp prev = map.putIfAbsent(key, n);
                if (prev != null) {
                    n = prev;
                }
            }
            return n;
        }
    }
}
