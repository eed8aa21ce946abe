package dev.sheetwright.nest.place;

import java.util.List;

/**
 * One piece type in one allowed orientation: convex pieces of its spacing shape (inflated by gap/2 plus the chord
 * tolerance) and of its body shape (inflated by the chord tolerance only), with their bounds.
 */
final class Orientation {
    final int id;
    final int type;
    final double angleDeg;
    final boolean mirrored;
    final ConvexPolygon[] spacing;
    final ConvexPolygon[] body;
    /** Convex pieces of the holes of the spacing shape: pockets where other parts may sit. */
    final ConvexPolygon[] holes;
    final double sMinX;
    final double sMinY;
    final double sMaxX;
    final double sMaxY;
    final double bMinX;
    final double bMinY;
    final double bMaxX;
    final double bMaxY;

    Orientation(int id, int type, double angleDeg, boolean mirrored, List<ConvexPolygon> spacing, List<ConvexPolygon> body,
                List<ConvexPolygon> holes) {
        this.holes = holes.toArray(new ConvexPolygon[0]);
        this.id = id;
        this.type = type;
        this.angleDeg = angleDeg;
        this.mirrored = mirrored;
        this.spacing = spacing.toArray(new ConvexPolygon[0]);
        this.body = body.toArray(new ConvexPolygon[0]);
        double[] s = bounds(this.spacing);
        double[] b = bounds(this.body);
        sMinX = s[0];
        sMinY = s[1];
        sMaxX = s[2];
        sMaxY = s[3];
        bMinX = b[0];
        bMinY = b[1];
        bMaxX = b[2];
        bMaxY = b[3];
    }

    static double[] bounds(ConvexPolygon[] parts) {
        double[] r = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (ConvexPolygon p : parts) {
            r[0] = Math.min(r[0], p.minX);
            r[1] = Math.min(r[1], p.minY);
            r[2] = Math.max(r[2], p.maxX);
            r[3] = Math.max(r[3], p.maxY);
        }
        return r;
    }

    /** Rotates candidate-only rings (kept as given, not re-hulled). */
    static List<ConvexPolygon> transformRings(List<ConvexPolygon> rings, double deg) {
        double[] sc = sinCos(deg);
        java.util.ArrayList<ConvexPolygon> out = new java.util.ArrayList<>();
        for (ConvexPolygon p : rings) {
            int n = p.size();
            double[] xs = new double[n];
            double[] ys = new double[n];
            for (int i = 0; i < n; i++) {
                xs[i] = p.xs[i] * sc[1] - p.ys[i] * sc[0];
                ys[i] = p.xs[i] * sc[0] + p.ys[i] * sc[1];
            }
            ConvexPolygon r = ConvexPolygon.ring(xs, ys);
            out.add(p.open == null ? r : r.withOpenEdges(p.open));
        }
        return out;
    }

    /** {sin, cos} of deg, exact for multiples of 90. */
    static double[] sinCos(double deg) {
        double q = deg / 90.0;
        if (q == Math.rint(q)) {
            int k = ((int) q % 4 + 4) % 4;
            return new double[] {new double[] {0, 1, 0, -1}[k], new double[] {1, 0, -1, 0}[k]};
        }
        return new double[] {Math.sin(Math.toRadians(deg)), Math.cos(Math.toRadians(deg))};
    }

    /** Rotates (after an optional mirror x to -x) each convex piece; mirrored rings are re-hulled counter-clockwise. */
    static List<ConvexPolygon> transform(List<ConvexPolygon> parts, double deg, boolean mirror) {
        double rad = Math.toRadians(deg);
        double q = deg / 90.0;
        double sin;
        double cos;
        if (q == Math.rint(q)) {
            int k = ((int) q % 4 + 4) % 4;
            sin = new double[] {0, 1, 0, -1}[k];
            cos = new double[] {1, 0, -1, 0}[k];
        } else {
            sin = Math.sin(rad);
            cos = Math.cos(rad);
        }
        java.util.ArrayList<ConvexPolygon> out = new java.util.ArrayList<>();
        for (ConvexPolygon p : parts) {
            int n = p.size();
            double[] xs = new double[n];
            double[] ys = new double[n];
            for (int i = 0; i < n; i++) {
                double x = mirror ? -p.xs[i] : p.xs[i];
                double y = p.ys[i];
                xs[i] = x * cos - y * sin;
                ys[i] = x * sin + y * cos;
            }
            ConvexPolygon c = ConvexPolygon.of(xs, ys);
            if (c != null) {
                out.add(c);
            }
        }
        return out;
    }
}
