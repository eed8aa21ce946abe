package dev.sheetwright.nest.jobs;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.distance.DistanceOp;

/**
 * The offcut worth putting back on the rack from one layout: an axis-parallel rectangle inside the stock that keeps
 * at least the gap from every placed part, so it can be sheared or cut off along straight lines without touching a
 * part. The engine reports one rectangle per layout; {@link #of} re-checks it here with JTS (inside the stock, gap
 * from every true placed outline) and, when it is absent or fails, finds the largest clean rectangle instead.
 *
 * <p>The search treats every placed part as its bounding box grown by the clearance, and for a remnant that is not
 * a rectangle it also treats the boxes of the pieces between the outline and its bounding box as taken. Among the
 * rectangles bounded by those boxes it takes the largest that passes the same JTS check; so it never reports a
 * rectangle that is not clean, but on a polygonal remnant or among parts turned at odd angles a larger clean
 * rectangle may exist. Coils get no offcut: what is left stays on the coil.
 */
public final class CleanOffcut {
    /** Most candidate rectangles checked with JTS before giving up (each check is a few distance calls). */
    static final int MAX_CHECKED = 500;

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private final NestRequest request;
    private final Polygon stock;
    private final List<Polygon> parts;

    private CleanOffcut(NestRequest request, SheetLayout layout) {
        if (request == null || layout == null) {
            throw new IllegalArgumentException("request and layout must not be null");
        }
        this.request = request;
        this.stock = stockPolygon(layout);
        Map<String, NestPiece> byLabel = new HashMap<>();
        for (NestPiece p : request.pieces()) {
            byLabel.put(p.label(), p);
        }
        List<Polygon> placed = new ArrayList<>();
        for (Placement pl : layout.parts()) {
            NestPiece piece = byLabel.get(pl.label());
            if (piece == null) {
                throw new IllegalArgumentException("layout " + (layout.index() + 1) + " places " + pl.label()
                        + ", which the request does not list");
            }
            placed.add(pl.apply(piece.shape()));
        }
        this.parts = placed;
    }

    /**
     * The offcut of {@code layout}: the larger of the engine's rectangle (when it is clean) and the largest clean
     * rectangle found here; empty for a coil or when there is no room.
     *
     * @param tolerance how far a length may be off when checking (in the request's unit, >= 0)
     * @param allowance extra clearance beyond the gap for rectangles found here, e.g. the chord tolerance by
     *                  which true curves may lie outside the nested outlines (>= 0)
     */
    public static Optional<Offcut> of(NestRequest request, SheetLayout layout, double tolerance, double allowance) {
        checkLength("tolerance", tolerance);
        checkLength("allowance", allowance);
        CleanOffcut c = new CleanOffcut(request, layout);
        if (c.stock == null) {
            return Optional.empty();
        }
        Offcut reported = layout.offcut();
        Optional<Offcut> found = c.largest(request.rules().gap() + allowance, tolerance);
        if (reported != null && c.isClean(reported, tolerance)
                && (found.isEmpty() || area(reported) >= area(found.get()))) {
            return Optional.of(reported);
        }
        return found;
    }

    private static double area(Offcut o) {
        return o.width() * o.height();
    }

    /**
     * True when {@code offcut} has area, lies inside the stock of {@code layout} and keeps at least the gap
     * (less {@code tolerance}) from every placed part. A coil's offcut is never clean.
     */
    public static boolean isClean(NestRequest request, SheetLayout layout, Offcut offcut, double tolerance) {
        checkLength("tolerance", tolerance);
        if (offcut == null) {
            throw new IllegalArgumentException("offcut must not be null");
        }
        CleanOffcut c = new CleanOffcut(request, layout);
        return c.stock != null && c.isClean(offcut, tolerance);
    }

    private boolean isClean(Offcut o, double tolerance) {
        if (!(o.width() > 2 * tolerance && o.height() > 2 * tolerance)) {
            return false;
        }
        Polygon inner = rectangle(o.x() + tolerance, o.y() + tolerance, o.x() + o.width() - tolerance,
                o.y() + o.height() - tolerance);
        if (!stock.covers(inner)) {
            return false;
        }
        Polygon rect = rectangle(o.x(), o.y(), o.x() + o.width(), o.y() + o.height());
        double need = request.rules().gap() - tolerance;
        Envelope box = rect.getEnvelopeInternal();
        for (Polygon part : parts) {
            if (box.distance(part.getEnvelopeInternal()) >= need) {
                continue;
            }
            if (DistanceOp.distance(rect, part) < need) {
                return false;
            }
        }
        return true;
    }

    /** Up to this many distinct x edges every x range is tried (quadratic); above, only ranges from a stock end. */
    static final int ALL_RANGES_UP_TO = 120;

    private Optional<Offcut> largest(double clearance, double tolerance) {
        Envelope container = stock.getEnvelopeInternal();
        List<Envelope> taken = new ArrayList<>();
        for (Polygon part : parts) {
            Envelope e = new Envelope(part.getEnvelopeInternal());
            e.expandBy(clearance);
            taken.add(e);
        }
        Geometry outside = rectangle(container.getMinX(), container.getMinY(), container.getMaxX(),
                container.getMaxY()).difference(stock);
        for (int i = 0; i < outside.getNumGeometries(); i++) {
            Geometry g = outside.getGeometryN(i);
            if (g.getArea() > 0) {
                taken.add(g.getEnvelopeInternal());
            }
        }
        TreeSet<Double> xs = new TreeSet<>();
        xs.add(container.getMinX());
        xs.add(container.getMaxX());
        for (Envelope e : taken) {
            xs.add(clamp(e.getMinX(), container.getMinX(), container.getMaxX()));
            xs.add(clamp(e.getMaxX(), container.getMinX(), container.getMaxX()));
        }
        Double[] x = xs.toArray(Double[]::new);
        List<Offcut> candidates = new ArrayList<>();
        // every x range on small layouts; on large ones (thousands of parts) only ranges from one stock end, which
        // is where an offcut that can be sheared off lies, so the work stays linear in the parts
        boolean all = x.length <= ALL_RANGES_UP_TO;
        for (int i = 0; i < x.length; i++) {
            for (int j = i + 1; j < x.length; j++) {
                if (all || i == 0 || j == x.length - 1) {
                    addFreeBands(x[i], x[j], container, taken, candidates);
                }
            }
        }
        candidates.sort(Comparator.comparingDouble(Offcut::area).reversed());
        int checked = 0;
        for (Offcut o : candidates) {
            if (checked++ >= MAX_CHECKED) {
                break;
            }
            if (isClean(o, tolerance)) {
                return Optional.of(o);
            }
        }
        return Optional.empty();
    }

    /** Every maximal free band in y over the x range (left, right), as a candidate rectangle. */
    private static void addFreeBands(double left, double right, Envelope container, List<Envelope> taken,
            List<Offcut> out) {
        List<double[]> blocked = new ArrayList<>();
        for (Envelope e : taken) {
            if (e.getMinX() < right && e.getMaxX() > left) {
                blocked.add(new double[] {e.getMinY(), e.getMaxY()});
            }
        }
        blocked.sort(Comparator.comparingDouble(b -> b[0]));
        double y = container.getMinY();
        for (double[] b : blocked) {
            if (b[0] > y) {
                addBand(left, right, y, Math.min(b[0], container.getMaxY()), out);
            }
            y = Math.max(y, b[1]);
            if (y >= container.getMaxY()) {
                return;
            }
        }
        addBand(left, right, y, container.getMaxY(), out);
    }

    private static void addBand(double left, double right, double bottom, double top, List<Offcut> out) {
        if (top > bottom && right > left) {
            out.add(new Offcut(left, bottom, right - left, top - bottom));
        }
    }

    /** The stock as laid out, or null for a coil. */
    private static Polygon stockPolygon(SheetLayout layout) {
        return layout.stock().match(s -> rectangle(0, 0, s.width(), s.height()), Remnant::outline, c -> null);
    }

    private static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return FACTORY.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0),
            new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    private static void checkLength(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, got " + value);
        }
    }
}
