package dev.sheetwright.nest.overlap;

/** Cosine and sine of a turn in degrees (counter-clockwise), exact for quarter turns. */
final class Turn {
    private static final double[] COS = {1, 0, -1, 0};
    private static final double[] SIN = {0, 1, 0, -1};

    private Turn() {
    }

    static double cos(double deg) {
        int k = quarter(deg);
        return k >= 0 ? COS[k] : Math.cos(Math.toRadians(deg));
    }

    static double sin(double deg) {
        int k = quarter(deg);
        return k >= 0 ? SIN[k] : Math.sin(Math.toRadians(deg));
    }

    /** 0..3 for a whole number of quarter turns, else -1. */
    private static int quarter(double deg) {
        double n = deg % 360.0;
        if (n < 0) {
            n += 360.0;
        }
        return n % 90.0 == 0 ? (int) (n / 90.0) % 4 : -1;
    }
}
