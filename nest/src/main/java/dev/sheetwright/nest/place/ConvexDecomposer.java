package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.triangulate.polygon.ConstrainedDelaunayTriangulator;

/**
 * Splits a polygon (holes allowed) into convex pieces whose union is the polygon: a constrained Delaunay
 * triangulation, then greedy Hertel-Mehlhorn merging of neighbours while the merged piece stays convex.
 */
final class ConvexDecomposer {
    private ConvexDecomposer() {
    }

    static List<ConvexPolygon> decompose(Geometry polygonal) {
        List<double[][]> pieces = new ArrayList<>();
        for (int g = 0; g < polygonal.getNumGeometries(); g++) {
            Polygon poly = (Polygon) polygonal.getGeometryN(g);
            if (poly.isEmpty()) {
                continue;
            }
            if (poly.getNumInteriorRing() == 0 && isConvex(poly)) {
                pieces.add(ring(poly.getExteriorRing().getCoordinates()));
                continue;
            }
            Geometry tris = ConstrainedDelaunayTriangulator.triangulate(poly);
            for (int i = 0; i < tris.getNumGeometries(); i++) {
                Polygon t = (Polygon) tris.getGeometryN(i);
                double[][] r = ring(t.getExteriorRing().getCoordinates());
                if (Math.abs(signedArea(r)) > 0) {
                    pieces.add(r);
                }
            }
        }
        pieces = merge(pieces);
        List<ConvexPolygon> out = new ArrayList<>();
        for (double[][] p : pieces) {
            ConvexPolygon c = ConvexPolygon.of(p[0], p[1]);
            if (c != null) {
                out.add(c);
            }
        }
        return out;
    }

    private static boolean isConvex(Polygon p) {
        double[][] r = ring(p.getExteriorRing().getCoordinates());
        int n = r[0].length;
        for (int i = 0; i < n; i++) {
            int a = (i + n - 1) % n;
            int b = (i + 1) % n;
            if (cross(r, a, i, b) < 0) {
                return false;
            }
        }
        return true;
    }

    /** Ring without the closing point, counter-clockwise. */
    private static double[][] ring(Coordinate[] cs) {
        int n = cs.length - 1;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = cs[i].x;
            ys[i] = cs[i].y;
        }
        double[][] r = {xs, ys};
        if (signedArea(r) < 0) {
            for (int i = 0; i < n / 2; i++) {
                double tx = xs[i];
                xs[i] = xs[n - 1 - i];
                xs[n - 1 - i] = tx;
                double ty = ys[i];
                ys[i] = ys[n - 1 - i];
                ys[n - 1 - i] = ty;
            }
        }
        return r;
    }

    private static double signedArea(double[][] r) {
        double a = 0;
        int n = r[0].length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            a += r[0][i] * r[1][j] - r[0][j] * r[1][i];
        }
        return a / 2;
    }

    private static double cross(double[][] r, int o, int a, int b) {
        return (r[0][a] - r[0][o]) * (r[1][b] - r[1][o]) - (r[1][a] - r[1][o]) * (r[0][b] - r[0][o]);
    }

    private record EdgeKey(double x1, double y1, double x2, double y2) {
    }

    /** Greedy merging of neighbouring convex pieces across shared edges while the union stays convex. */
    private static List<double[][]> merge(List<double[][]> input) {
        List<double[][]> pieces = new ArrayList<>(input);
        boolean changed = true;
        while (changed) {
            changed = false;
            Map<EdgeKey, Integer> owner = new HashMap<>();
            for (int i = 0; i < pieces.size(); i++) {
                double[][] p = pieces.get(i);
                int n = p[0].length;
                for (int k = 0; k < n; k++) {
                    int l = (k + 1) % n;
                    owner.put(new EdgeKey(p[0][k], p[1][k], p[0][l], p[1][l]), i);
                }
            }
            boolean[] used = new boolean[pieces.size()];
            List<double[][]> next = new ArrayList<>();
            for (int i = 0; i < pieces.size(); i++) {
                if (used[i]) {
                    continue;
                }
                double[][] p = pieces.get(i);
                int n = p[0].length;
                boolean mergedThis = false;
                for (int k = 0; k < n && !mergedThis; k++) {
                    int l = (k + 1) % n;
                    Integer j = owner.get(new EdgeKey(p[0][l], p[1][l], p[0][k], p[1][k]));
                    if (j == null || j == i || used[j]) {
                        continue;
                    }
                    double[][] m = join(p, k, pieces.get(j), p[0][l], p[1][l]);
                    if (m != null) {
                        used[i] = true;
                        used[j] = true;
                        next.add(m);
                        mergedThis = true;
                        changed = true;
                    }
                }
                if (!mergedThis) {
                    // kept for now; added after the loop if no later piece merges with it
                }
            }
            for (int i = 0; i < pieces.size(); i++) {
                if (!used[i]) {
                    next.add(pieces.get(i));
                }
            }
            pieces = next;
        }
        return pieces;
    }

    /**
     * Joins p (shared edge from vertex k to k+1) with q (which has the same edge reversed); null if the result
     * is not convex.
     */
    private static double[][] join(double[][] p, int k, double[][] q, double bx, double by) {
        int n = p[0].length;
        int m = q[0].length;
        int qb = -1;
        for (int i = 0; i < m; i++) {
            if (q[0][i] == bx && q[1][i] == by) {
                qb = i;
                break;
            }
        }
        if (qb < 0) {
            return null;
        }
        // p: ... k, k+1 ...; q: qb (= p[k+1]), qb+1 (= p[k]) ...
        double[] xs = new double[n + m - 2];
        double[] ys = new double[n + m - 2];
        int t = 0;
        // walk p from k+1 round to k
        for (int s = 0; s < n; s++) {
            int idx = (k + 1 + s) % n;
            xs[t] = p[0][idx];
            ys[t] = p[1][idx];
            t++;
        }
        // then q from qb+2 round to qb-1 (skipping the shared vertices)
        for (int s = 2; s < m; s++) {
            int idx = (qb + s) % m;
            xs[t] = q[0][idx];
            ys[t] = q[1][idx];
            t++;
        }
        double[][] r = {xs, ys};
        int len = xs.length;
        for (int i = 0; i < len; i++) {
            int a = (i + len - 1) % len;
            int b = (i + 1) % len;
            if (cross(r, a, i, b) < 0) {
                return null;
            }
        }
        return r;
    }
}
