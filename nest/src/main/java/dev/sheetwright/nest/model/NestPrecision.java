package dev.sheetwright.nest.model;

import java.util.List;

import java.util.ArrayList;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * The one precision of a nest, built once per request: {@code scale} is the largest coordinate of the stock and the
 * outlines, {@code linear} the distance under which the placer treats two positions as the same (the job's linear
 * tolerance, never below the round-off of double arithmetic at that scale). Every tolerance of the placer, the
 * offcut check and the independent checker is derived here, so there is no other epsilon in the nest module.
 */
public record NestPrecision(double scale, double linear) {
    /** Round-off of double arithmetic on coordinates of size {@code scale}, relative (about 10^7 ulps). */
    public static final double ROUND_OFF = 1e-9;
    /** Round-off of a parameter along an edge (0 at its start, 1 at its end): shorter intervals are empty. */
    public static final double PARAMETER_ROUND_OFF = 1e-12;
    /** What the independent checker forgives, relative to the largest length it sees (published layouts are rounded). */
    public static final double CHECK_RELATIVE = 1e-7;
    /** Overlap the checker forgives with no gap, as a fraction of a layout's part area (rounded published layouts). */
    public static final double OVERLAP_FRACTION = 1e-5;
    /** Two angles within this many degrees are the same angle. */
    public static final double ANGLE_DEG = 1e-6;
    /** Two totals (cost, area) within this fraction of the larger are equal when comparing nests. */
    public static final double RELATIVE_TIE = 1e-12;

    public NestPrecision {
        if (!(scale > 0) || Double.isInfinite(scale)) {
            throw new IllegalArgumentException("scale must be finite and > 0, got " + scale);
        }
        if (!(linear > 0) || Double.isInfinite(linear)) {
            throw new IllegalArgumentException("linear must be finite and > 0, got " + linear);
        }
    }

    /** Precision from the request's own scale only (strip benchmarks and requests without a job tolerance). */
    public static NestPrecision ofScale(double scale) {
        double s = Math.max(1, scale);
        return new NestPrecision(s, s * ROUND_OFF);
    }

    /** Precision of a job: its linear tolerance (job unit), kept at or above round-off at the scale. */
    public static NestPrecision ofTolerance(double scale, double linearTolerance) {
        double s = Math.max(1, scale);
        return new NestPrecision(s, Math.max(linearTolerance, s * ROUND_OFF));
    }

    /** The largest coordinate of the stock and the outlines (1 at least); null lists count as empty. */
    public static double scaleOf(List<NestPiece> pieces, List<Stock> stock) {
        double scale = 1;
        for (Stock s : stock == null ? List.<Stock>of() : stock) {
            if (s != null) {
                scale = Math.max(scale, extent(s));
            }
        }
        for (NestPiece p : pieces == null ? List.<NestPiece>of() : pieces) {
            if (p != null) {
                scale = Math.max(scale, extent(p.shape().getEnvelopeInternal()));
            }
        }
        return scale;
    }

    /** Largest coordinate a piece of stock spans (a coil: its width; its length is open). */
    public static double extent(Stock s) {
        return s.match(sh -> Math.max(sh.width(), sh.height()), r -> extent(r.outline().getEnvelopeInternal()),
                Coil::width);
    }

    private static double extent(Envelope e) {
        return Math.max(Math.max(Math.abs(e.getMinX()), Math.abs(e.getMaxX())),
                Math.max(Math.abs(e.getMinY()), Math.abs(e.getMaxY())));
    }

    /** The placer's epsilon: positions closer than this are the same, overlaps shallower than this are touching. */
    public double eps() {
        return linear;
    }

    /** The checker's length tolerance for a result whose lengths reach {@code extent} (e.g. a long coil). */
    public double checkTolerance(double extent) {
        return Math.max(linear, Math.max(scale, extent) * CHECK_RELATIVE);
    }

    /** Whether {@code a} and {@code b} are equal within {@link #RELATIVE_TIE} of the larger. */
    public static int compareTotals(double a, double b) {
        double tol = RELATIVE_TIE * Math.max(Math.abs(a), Math.abs(b));
        return a < b - tol ? -1 : a > b + tol ? 1 : 0;
    }

    /** Whether {@code angleDeg} is a whole multiple of {@code stepDeg}, within {@link #ANGLE_DEG}. */
    public static boolean multipleOf(double angleDeg, double stepDeg) {
        double q = angleDeg / stepDeg;
        return Math.abs(q - Math.rint(q)) * stepDeg <= ANGLE_DEG;
    }

    /**
     * The outline without vertices closer than {@link #linear()} to the vertex kept before them (each ring), so that
     * every edge is longer than the precision: a placed copy (rotated by any angle, moved anywhere) then has no
     * zero-length edge after rounding, and drawing writers accept it. The same polygon when nothing is dropped, or
     * when dropping would leave a ring of fewer than three vertices.
     */
    public Polygon clean(Polygon shape) {
        LinearRing shell = clean(shape.getExteriorRing());
        boolean changed = shell != shape.getExteriorRing();
        LinearRing[] holes = new LinearRing[shape.getNumInteriorRing()];
        for (int i = 0; i < holes.length; i++) {
            holes[i] = clean(shape.getInteriorRingN(i));
            changed |= holes[i] != shape.getInteriorRingN(i);
        }
        return changed ? shape.getFactory().createPolygon(shell, holes) : shape;
    }

    private LinearRing clean(LinearRing ring) {
        Coordinate[] cs = ring.getCoordinates();
        int n = cs.length - 1; // the last repeats the first
        ArrayList<Coordinate> kept = new ArrayList<>(n + 1);
        for (int i = 0; i < n; i++) {
            if (kept.isEmpty() || cs[i].distance(kept.get(kept.size() - 1)) > linear) {
                kept.add(cs[i]);
            }
        }
        while (kept.size() > 1 && kept.get(kept.size() - 1).distance(kept.get(0)) <= linear) {
            kept.remove(kept.size() - 1);
        }
        if (kept.size() == n || kept.size() < 3) {
            return ring;
        }
        kept.add(kept.get(0).copy());
        return ring.getFactory().createLinearRing(kept.toArray(new Coordinate[0]));
    }
}
