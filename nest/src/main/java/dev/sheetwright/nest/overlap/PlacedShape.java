package dev.sheetwright.nest.overlap;

/**
 * A search shape at a pose, with its outline, poles and bounding box in world coordinates. Mutable scratch: the
 * search re-uses one per candidate; {@link #set} fills it.
 */
final class PlacedShape {
    SearchShape shape;
    double[] wx = new double[0];
    double[] wy = new double[0];
    double[] px = new double[0];
    double[] py = new double[0];
    double minX;
    double minY;
    double maxX;
    double maxY;
    double x;
    double y;
    double angle;
    /** Cosine and sine of the angle. */
    double cos;
    double sin;

    void set(SearchShape s, double x, double y, double angleDeg) {
        this.shape = s;
        this.x = x;
        this.y = y;
        this.angle = angleDeg;
        int n = s.xs.length;
        if (wx.length < n) {
            wx = new double[n];
            wy = new double[n];
        }
        int m = s.poleR.length;
        if (px.length < m) {
            px = new double[m];
            py = new double[m];
        }
        double c = Turn.cos(angleDeg);
        double sn = Turn.sin(angleDeg);
        this.cos = c;
        this.sin = sn;
        double x0 = Double.POSITIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double a = c * s.xs[i] - sn * s.ys[i] + x;
            double b = sn * s.xs[i] + c * s.ys[i] + y;
            wx[i] = a;
            wy[i] = b;
            x0 = Math.min(x0, a);
            y0 = Math.min(y0, b);
            x1 = Math.max(x1, a);
            y1 = Math.max(y1, b);
        }
        minX = x0;
        minY = y0;
        maxX = x1;
        maxY = y1;
        for (int i = 0; i < m; i++) {
            px[i] = c * s.poleX[i] - sn * s.poleY[i] + x;
            py[i] = sn * s.poleX[i] + c * s.poleY[i] + y;
        }
    }

    /** Whether the world point (x, y) lies inside the placed outline (even-odd; the boundary may go either way). */
    boolean contains(double px, double py) {
        if (px < minX || px > maxX || py < minY || py > maxY) {
            return false;
        }
        double dx = px - x;
        double dy = py - y;
        return shape.containsLocal(cos * dx + sin * dy, cos * dy - sin * dx);
    }

    int n() {
        return shape.xs.length;
    }
}
