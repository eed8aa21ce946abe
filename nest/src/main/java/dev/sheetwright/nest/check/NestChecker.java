package dev.sheetwright.nest.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.operation.distance.DistanceOp;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;

/**
 * Re-checks a nest by a route independent of the placer: the original (un-inflated) outlines are moved by each
 * {@link Placement} and compared with JTS distance, overlay and covering operations; no no-fit polygons.
 *
 * <p>Like JTS's buffer result validator it may miss an error, but it never rejects a good result: lengths are
 * compared with {@code linearTolerance}; with a gap of zero (touching allowed) two parts are accepted if their
 * overlap area is at most {@code overlapFraction} times the total part area of the layout.
 */
public final class NestChecker {
    /** Default linear tolerance, relative to the largest stock dimension. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = NestPrecision.CHECK_RELATIVE;
    /** Default overlap allowance for gap 0: a fraction of the layout's part area (published layouts are rounded). */
    public static final double DEFAULT_OVERLAP_FRACTION = NestPrecision.OVERLAP_FRACTION;
    private static final double ANGLE_TOLERANCE_DEG = NestPrecision.ANGLE_DEG;

    private final NestRequest request;
    private final double linearTolerance;
    private final double overlapFraction;
    private final Map<String, NestPiece> byLabel = new HashMap<>();

    public NestChecker(NestRequest request, double linearTolerance, double overlapFraction) {
        if (request == null) {
            throw new IllegalArgumentException("request must not be null");
        }
        if (!(linearTolerance >= 0) || Double.isInfinite(linearTolerance)) {
            throw new IllegalArgumentException("linearTolerance must be finite and >= 0, got " + linearTolerance);
        }
        if (!(overlapFraction >= 0 && overlapFraction < 1)) {
            throw new IllegalArgumentException("overlapFraction must be in [0, 1), got " + overlapFraction);
        }
        this.request = request;
        this.linearTolerance = linearTolerance;
        this.overlapFraction = overlapFraction;
        for (NestPiece p : request.pieces()) {
            byLabel.put(p.label(), p);
        }
    }

    /** Checks with the default tolerances; an empty list means no violation was found. */
    public static List<Violation> check(NestRequest request, NestResult result) {
        double extent = 0;
        for (SheetLayout l : result.sheets()) {
            extent = Math.max(extent, l.usedLength());
        }
        return new NestChecker(request, request.precision().checkTolerance(extent), DEFAULT_OVERLAP_FRACTION).check(result);
    }

    public List<Violation> check(NestResult result) {
        if (result == null) {
            throw new IllegalArgumentException("result must not be null");
        }
        List<Violation> out = new ArrayList<>();
        checkAccounting(result, out);
        for (SheetLayout layout : result.sheets()) {
            checkLayout(layout, out);
        }
        return out;
    }

    private void checkAccounting(NestResult result, List<Violation> out) {
        Map<String, int[]> seen = new HashMap<>();
        for (NestPiece p : request.pieces()) {
            seen.put(p.label(), new int[p.copies()]);
        }
        for (SheetLayout l : result.sheets()) {
            for (Placement p : l.parts()) {
                count(seen, p.label(), p.copy(), "placed on layout " + l.index(), out);
            }
        }
        for (Unplaced u : result.unplaced()) {
            count(seen, u.label(), u.copy(), "listed as unplaced", out);
        }
        for (NestPiece p : request.pieces()) {
            int[] c = seen.get(p.label());
            for (int i = 0; i < c.length; i++) {
                if (c[i] == 0) {
                    out.add(new Violation(Violation.Kind.MISSING, "copy " + i + " of " + p.label() + " is neither placed nor listed as unplaced"));
                } else if (c[i] > 1) {
                    out.add(new Violation(Violation.Kind.DUPLICATE, "copy " + i + " of " + p.label() + " appears " + c[i] + " times"));
                }
            }
        }
    }

    private static void count(Map<String, int[]> seen, String label, int copy, String where, List<Violation> out) {
        int[] c = seen.get(label);
        if (c == null) {
            out.add(new Violation(Violation.Kind.UNKNOWN_PIECE, label + " (" + where + ") is not in the request"));
        } else if (copy >= c.length) {
            out.add(new Violation(Violation.Kind.UNKNOWN_PIECE, "copy " + copy + " of " + label + " (" + where
                    + ") is out of range 0.." + (c.length - 1)));
        } else {
            c[copy]++;
        }
    }

    private void checkLayout(SheetLayout layout, List<Violation> out) {
        NestRules rules = request.rules();
        List<Polygon> shapes = new ArrayList<>();
        List<Placement> placed = new ArrayList<>();
        double partArea = 0;
        for (Placement p : layout.parts()) {
            NestPiece piece = byLabel.get(p.label());
            if (piece == null) {
                continue;
            }
            if (!rules.rotation().allows(p.rotationDeg(), ANGLE_TOLERANCE_DEG)) {
                out.add(new Violation(Violation.Kind.ROTATION, where(layout, p) + " is rotated " + fmt(p.rotationDeg())
                        + " deg, not allowed by " + rules.rotation()));
            }
            if (p.mirrored() && !rules.mirror()) {
                out.add(new Violation(Violation.Kind.MIRROR, where(layout, p) + " is mirrored, but mirroring is not allowed"));
            }
            Polygon shape = p.apply(piece.shape());
            shapes.add(shape);
            placed.add(p);
            partArea += shape.getArea();
            checkInside(layout, p, shape, out);
        }
        STRtree tree = new STRtree();
        double reach = Math.max(rules.gap(), 0);
        for (int i = 0; i < shapes.size(); i++) {
            Envelope e = new Envelope(shapes.get(i).getEnvelopeInternal());
            e.expandBy(reach);
            tree.insert(e, i);
        }
        double allowedOverlap = overlapFraction * partArea;
        for (int i = 0; i < shapes.size(); i++) {
            Polygon a = shapes.get(i);
            @SuppressWarnings("unchecked")
            List<Integer> near = tree.query(a.getEnvelopeInternal());
            for (int j : near) {
                if (j <= i) {
                    continue;
                }
                Polygon b = shapes.get(j);
                if (rules.gap() > linearTolerance) {
                    double d = DistanceOp.distance(a, b);
                    if (d < rules.gap() - linearTolerance) {
                        boolean overlap = d == 0 && a.intersects(b);
                        out.add(new Violation(overlap ? Violation.Kind.OVERLAP : Violation.Kind.TOO_CLOSE,
                                where(layout, placed.get(i)) + " and " + placed.get(j).label() + " copy " + placed.get(j).copy()
                                        + " are " + fmt(d) + " apart, gap is " + fmt(rules.gap())));
                    }
                } else if (a.intersects(b)) {
                    double area = a.intersection(b).getArea();
                    if (area > allowedOverlap) {
                        out.add(new Violation(Violation.Kind.OVERLAP, where(layout, placed.get(i)) + " overlaps "
                                + placed.get(j).label() + " copy " + placed.get(j).copy() + " by area " + fmt(area)
                                + " (allowed " + fmt(allowedOverlap) + ")"));
                    }
                }
            }
        }
    }

    private void checkInside(SheetLayout layout, Placement p, Polygon shape, List<Violation> out) {
        double m = request.rules().margin();
        double tol = linearTolerance;
        Envelope e = shape.getEnvelopeInternal();
        String w = where(layout, p);
        out.addAll(layout.stock().match(
                sh -> insideSheet(sh, e, m, tol, w),
                r -> insideRemnant(r, shape, m, tol, w),
                c -> insideCoil(c, layout.usedLength(), e, m, tol, w)));
    }

    private static List<Violation> insideSheet(Sheet sh, Envelope e, double m, double tol, String where) {
        if (e.getMinX() < m - tol || e.getMinY() < m - tol || e.getMaxX() > sh.width() - m + tol || e.getMaxY() > sh.height() - m + tol) {
            return List.of(new Violation(m > 0 ? Violation.Kind.MARGIN : Violation.Kind.OUTSIDE_STOCK, where
                    + " spans x " + fmt(e.getMinX()) + ".." + fmt(e.getMaxX()) + ", y " + fmt(e.getMinY()) + ".." + fmt(e.getMaxY())
                    + "; must stay within x " + fmt(m) + ".." + fmt(sh.width() - m) + ", y " + fmt(m) + ".." + fmt(sh.height() - m)));
        }
        return List.of();
    }

    private static List<Violation> insideCoil(Coil c, double usedLength, Envelope e, double m, double tol, String where) {
        List<Violation> out = new ArrayList<>();
        if (e.getMinX() < m - tol || e.getMinY() < m - tol || e.getMaxY() > c.width() - m + tol) {
            out.add(new Violation(m > 0 ? Violation.Kind.MARGIN : Violation.Kind.OUTSIDE_STOCK, where
                    + " spans x from " + fmt(e.getMinX()) + ", y " + fmt(e.getMinY()) + ".." + fmt(e.getMaxY())
                    + "; must stay within x >= " + fmt(m) + ", y " + fmt(m) + ".." + fmt(c.width() - m)));
        }
        if (e.getMaxX() > usedLength - m + tol) {
            out.add(new Violation(Violation.Kind.COIL_LENGTH, where + " reaches x " + fmt(e.getMaxX())
                    + " beyond the used coil length " + fmt(usedLength) + " less margin " + fmt(m)));
        }
        return out;
    }

    private static List<Violation> insideRemnant(Remnant r, Polygon shape, double m, double tol, String where) {
        Geometry grown = r.outline().buffer(tol);
        if (!grown.covers(shape)) {
            return List.of(new Violation(Violation.Kind.OUTSIDE_STOCK, where + " is not inside remnant " + r.id()));
        }
        if (m > 0) {
            double d = DistanceOp.distance(shape, r.outline().getBoundary());
            if (d < m - tol) {
                return List.of(new Violation(Violation.Kind.MARGIN, where + " is " + fmt(d) + " from the edge of remnant "
                        + r.id() + ", margin is " + fmt(m)));
            }
        }
        return List.of();
    }

    private static String where(SheetLayout layout, Placement p) {
        return p.label() + " copy " + p.copy() + " on layout " + layout.index();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
