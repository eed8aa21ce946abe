package dev.sheetwright.nest.overlap;

/** Where a search shape is: its reference point at (x, y), turned counter-clockwise by {@code angleDeg}. */
public record Pose(double x, double y, double angleDeg) {
    public Pose {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(angleDeg)) {
            throw new IllegalArgumentException("pose must be finite, got (" + x + ", " + y + ", " + angleDeg + ")");
        }
    }

    /** Cosine of the angle; exact for quarter turns. */
    double cos() {
        return trig(angleDeg, true);
    }

    /** Sine of the angle; exact for quarter turns. */
    double sin() {
        return trig(angleDeg, false);
    }

    static double trig(double deg, boolean cosine) {
        double n = deg % 360.0;
        if (n < 0) {
            n += 360.0;
        }
        if (n % 90.0 == 0) {
            int k = (int) (n / 90.0) % 4;
            double[] c = {1, 0, -1, 0};
            double[] s = {0, 1, 0, -1};
            return cosine ? c[k] : s[k];
        }
        double r = Math.toRadians(n);
        return cosine ? Math.cos(r) : Math.sin(r);
    }
}
