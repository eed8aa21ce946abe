package dev.sheetwright.nest.place;

import java.util.Arrays;

import dev.sheetwright.nest.model.NestPrecision;

/**
 * An immutable convex polygon, counter-clockwise, with outward unit edge normals for fast point tests.
 * Package-private working type of the placer.
 */
final class ConvexPolygon {
    final double[] xs;
    final double[] ys;
    /** Outward unit normal and offset of edge i (from vertex i to i+1): n . p = c on the edge. */
    final double[] nx;
    final double[] ny;
    final double[] c;
    final double minX;
    final double minY;
    final double maxX;
    final double maxY;
    /**
     * Edges that lie inside a larger region this polygon is one piece of (null: none). A point on such an edge is
     * still inside the region, so those edges count as interior in {@link #containsStrictly}.
     */
    final boolean[] open;

    private ConvexPolygon(double[] xs, double[] ys) {
        this(xs, ys, null);
    }

    private ConvexPolygon(double[] xs, double[] ys, boolean[] open) {
        this.open = open;
        this.xs = xs;
        this.ys = ys;
        int n = xs.length;
        nx = new double[n];
        ny = new double[n];
        c = new double[n];
        double x0 = Double.POSITIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double ex = xs[j] - xs[i];
            double ey = ys[j] - ys[i];
            double len = Math.hypot(ex, ey);
            nx[i] = ey / len;
            ny[i] = -ex / len;
            c[i] = nx[i] * xs[i] + ny[i] * ys[i];
            x0 = Math.min(x0, xs[i]);
            y0 = Math.min(y0, ys[i]);
            x1 = Math.max(x1, xs[i]);
            y1 = Math.max(y1, ys[i]);
        }
        minX = x0;
        minY = y0;
        maxX = x1;
        maxY = y1;
    }

    int size() {
        return xs.length;
    }

    /** Whether (px, py) - (tx, ty) lies deeper than {@code eps} inside this polygon. */
    boolean containsStrictly(double px, double py, double tx, double ty, double eps) {
        double x = px - tx;
        double y = py - ty;
        if (open == null && (x <= minX + eps || x >= maxX - eps || y <= minY + eps || y >= maxY - eps)) {
            return false;
        }
        if (x < minX - eps || x > maxX + eps || y < minY - eps || y > maxY + eps) {
            return false;
        }
        if (open == null) {
            for (int i = 0; i < nx.length; i++) {
                if (nx[i] * x + ny[i] * y - c[i] > -eps) {
                    return false;
                }
            }
        } else {
            for (int i = 0; i < nx.length; i++) {
                if (nx[i] * x + ny[i] * y - c[i] > (open[i] ? eps : -eps)) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Same polygon with edges marked open (interior to the region it is a piece of). */
    ConvexPolygon withOpenEdges(boolean[] openEdges) {
        return new ConvexPolygon(xs, ys, openEdges.clone());
    }

    boolean isOpen(int edge) {
        return open != null && open[edge];
    }

    double area() {
        double a = 0;
        int n = xs.length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            a += xs[i] * ys[j] - xs[j] * ys[i];
        }
        return a / 2;
    }

    /**
     * Convex hull of the points (Andrew's monotone chain), collinear points dropped. Returns null when the hull
     * has no area.
     */
    static ConvexPolygon hull(double[] px, double[] py, int count) {
        Integer[] idx = new Integer[count];
        for (int i = 0; i < count; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (a, b) -> px[a] != px[b] ? Double.compare(px[a], px[b]) : Double.compare(py[a], py[b]));
        int[] h = new int[2 * count + 1];
        int k = 0;
        for (int t = 0; t < count; t++) {
            int i = idx[t];
            while (k >= 2 && cross(px, py, h[k - 2], h[k - 1], i) <= 0) {
                k--;
            }
            h[k++] = i;
        }
        for (int t = count - 2, lower = k + 1; t >= 0; t--) {
            int i = idx[t];
            while (k >= lower && cross(px, py, h[k - 2], h[k - 1], i) <= 0) {
                k--;
            }
            h[k++] = i;
        }
        int n = k - 1;
        if (n < 3) {
            return null;
        }
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = px[h[i]];
            ys[i] = py[h[i]];
        }
        ConvexPolygon p = new ConvexPolygon(xs, ys);
        return p.area() > 0 ? p : null;
    }

    private static double cross(double[] px, double[] py, int o, int a, int b) {
        return (px[a] - px[o]) * (py[b] - py[o]) - (py[a] - py[o]) * (px[b] - px[o]);
    }

    /** Minkowski sum this + (-other): the positions of other's origin where the two interiors overlap. */
    ConvexPolygon minusSum(ConvexPolygon other) {
        // merge the edges of this and of -other by angle (both counter-clockwise, from their lowest vertices): the
        // visited sums a_i - b_j include every vertex of the sum; near-parallel edges add both orders. The hull of
        // those few points is the hull of all n * m differences.
        int n = xs.length;
        int m = other.xs.length;
        int i0 = lowest(xs, ys, 1);
        int j0 = lowest(other.xs, other.ys, -1);
        double[] px = new double[2 * (n + m) + 2];
        double[] py = new double[px.length];
        int k = 0;
        int i = 0;
        int j = 0;
        while (i < n || j < m) {
            int ia = (i0 + i) % n;
            int jb = (j0 + j) % m;
            px[k] = xs[ia] - other.xs[jb];
            py[k] = ys[ia] - other.ys[jb];
            k++;
            if (i == n) {
                j++;
                continue;
            }
            if (j == m) {
                i++;
                continue;
            }
            int ia1 = (ia + 1) % n;
            int jb1 = (jb + 1) % m;
            double ex = xs[ia1] - xs[ia];
            double ey = ys[ia1] - ys[ia];
            double fx = other.xs[jb] - other.xs[jb1];
            double fy = other.ys[jb] - other.ys[jb1];
            double cr = ex * fy - ey * fx;
            double tol = NestPrecision.ROUND_OFF * (Math.abs(ex) + Math.abs(ey)) * (Math.abs(fx) + Math.abs(fy));
            if (cr > tol) {
                i++;
            } else if (cr < -tol) {
                j++;
            } else {
                px[k] = xs[ia1] - other.xs[jb];
                py[k] = ys[ia1] - other.ys[jb];
                k++;
                px[k] = xs[ia] - other.xs[jb1];
                py[k] = ys[ia] - other.ys[jb1];
                k++;
                i++;
                j++;
            }
        }
        return hull(px, py, k);
    }

    /** Index of the lowest vertex (then leftmost) of the points times {@code sign}. */
    private static int lowest(double[] xs, double[] ys, int sign) {
        int best = 0;
        for (int i = 1; i < xs.length; i++) {
            double y = sign * ys[i];
            double by = sign * ys[best];
            if (y < by || (y == by && sign * xs[i] < sign * xs[best])) {
                best = i;
            }
        }
        return best;
    }

    /** The hull of all n * m differences (reference for {@link #minusSum}). */
    ConvexPolygon minusSumByHull(ConvexPolygon other) {
        int n = xs.length * other.xs.length;
        double[] px = new double[n];
        double[] py = new double[n];
        int k = 0;
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < other.xs.length; j++) {
                px[k] = xs[i] - other.xs[j];
                py[k] = ys[i] - other.ys[j];
                k++;
            }
        }
        return hull(px, py, n);
    }

    /** Largest value of n . v over the vertices. */
    double support(double ux, double uy) {
        double m = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < xs.length; i++) {
            m = Math.max(m, ux * xs[i] + uy * ys[i]);
        }
        return m;
    }

    /**
     * The convex polygon {p : a_i . p <= b_i for all i} clipped to the box, or null if it has no area.
     * Sutherland-Hodgman clipping of the box by each half-plane.
     */
    static ConvexPolygon fromHalfPlanes(double[] ax, double[] ay, double[] b, double x0, double y0, double x1, double y1) {
        double[] px = {x0, x1, x1, x0};
        double[] py = {y0, y0, y1, y1};
        int n = 4;
        for (int h = 0; h < b.length && n >= 3; h++) {
            double[] qx = new double[n + 1];
            double[] qy = new double[n + 1];
            int m = 0;
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                double di = ax[h] * px[i] + ay[h] * py[i] - b[h];
                double dj = ax[h] * px[j] + ay[h] * py[j] - b[h];
                if (di <= 0) {
                    qx[m] = px[i];
                    qy[m] = py[i];
                    m++;
                }
                if ((di < 0 && dj > 0) || (di > 0 && dj < 0)) {
                    double t = di / (di - dj);
                    qx[m] = px[i] + t * (px[j] - px[i]);
                    qy[m] = py[i] + t * (py[j] - py[i]);
                    m++;
                }
            }
            px = qx;
            py = qy;
            n = m;
        }
        return n < 3 ? null : hull(px, py, n);
    }

    /** Whether (px, py) - (tx, ty) lies inside or on this polygon, within eps. */
    boolean containsClosed(double px, double py, double tx, double ty, double eps) {
        double x = px - tx;
        double y = py - ty;
        for (int i = 0; i < nx.length; i++) {
            if (nx[i] * x + ny[i] * y - c[i] > eps) {
                return false;
            }
        }
        return true;
    }

    /**
     * A closed ring kept exactly as given (not necessarily convex): only its edges and vertices are used, as a
     * source of candidate positions.
     */
    static ConvexPolygon ring(org.locationtech.jts.geom.Coordinate[] closed) {
        int n = closed.length - 1;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = closed[i].x;
            ys[i] = closed[i].y;
        }
        return new ConvexPolygon(xs, ys);
    }

    static ConvexPolygon ring(double[] xs, double[] ys) {
        return new ConvexPolygon(xs, ys);
    }

    static ConvexPolygon of(double[] xs, double[] ys) {
        return hull(xs, ys, xs.length);
    }
}
