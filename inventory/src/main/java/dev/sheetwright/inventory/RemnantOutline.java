package dev.sheetwright.inventory;

import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

/**
 * The shape of a remnant: a simple polygon in millimetres, held as its vertices without a repeated
 * closing point. A rectangle is the 4-vertex case. Outlines made by the factories are moved so their
 * bounding box starts at the origin and are wound counter-clockwise; the store keeps the shape, not where
 * it lay on a drawing.
 *
 * @param vertices at least 3 distinct consecutive points forming a simple polygon of positive area
 */
public record RemnantOutline(List<OutlinePoint> vertices) {
    /** Longest accepted side of a bounding box, mm (100 m: longer than any coil run). */
    public static final double MAX_LENGTH_MM = 100_000.0;

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    public RemnantOutline {
        if (vertices == null) {
            throw new IllegalArgumentException("outline: is null; give at least 3 points");
        }
        vertices = List.copyOf(vertices);
        if (vertices.size() < 3) {
            throw new IllegalArgumentException("outline: has " + vertices.size()
                    + " point(s); a polygon needs at least 3");
        }
        for (int i = 0; i < vertices.size(); i++) {
            OutlinePoint a = vertices.get(i);
            OutlinePoint b = vertices.get((i + 1) % vertices.size());
            if (a.equals(b)) {
                throw new IllegalArgumentException("outline: point " + (i + 1) + " (" + text(a)
                        + ") repeats the point after it; give each corner once");
            }
        }
        Polygon polygon = polygonOf(vertices);
        IsValidOp op = new IsValidOp(polygon);
        if (!op.isValid()) {
            TopologyValidationError error = op.getValidationError();
            Coordinate c = error.getCoordinate();
            String at = c == null ? "" : " at (" + MmFormat.format(c.x) + "," + MmFormat.format(c.y) + ")";
            throw new IllegalArgumentException("outline: " + textOf(vertices) + " is not a simple polygon ("
                    + error.getMessage().toLowerCase(java.util.Locale.ROOT) + at
                    + "); edges must not cross or touch");
        }
        double w = maxX(vertices) - minX(vertices);
        double h = maxY(vertices) - minY(vertices);
        if (!(polygon.getArea() > 0.0)) {
            throw new IllegalArgumentException("outline: " + textOf(vertices) + " has zero area");
        }
        if (w > MAX_LENGTH_MM || h > MAX_LENGTH_MM) {
            throw new IllegalArgumentException("outline: bounding box " + MmFormat.format(w) + " x "
                    + MmFormat.format(h) + " mm is too large; each side must be at most "
                    + MmFormat.format(MAX_LENGTH_MM) + " mm");
        }
    }

    /**
     * A rectangle {@code widthMm} along x by {@code heightMm} along y with a corner at the origin.
     *
     * @throws IllegalArgumentException if a side is not finite, not positive or over {@link #MAX_LENGTH_MM}
     */
    public static RemnantOutline rectangle(double widthMm, double heightMm) {
        checkSide("width_mm", widthMm);
        checkSide("height_mm", heightMm);
        return new RemnantOutline(List.of(OutlinePoint.of(0, 0), OutlinePoint.of(widthMm, 0),
                OutlinePoint.of(widthMm, heightMm), OutlinePoint.of(0, heightMm)));
    }

    /**
     * A polygon from its corners in order (either winding). A repeated closing point is dropped; the result
     * is moved so its bounding box starts at the origin, wound counter-clockwise, and starts at its lowest
     * (then leftmost) corner, so the same shape always gives equal outlines.
     *
     * @throws IllegalArgumentException for fewer than 3 points, repeated corners or a self-intersecting ring
     */
    public static RemnantOutline of(List<OutlinePoint> points) {
        if (points == null) {
            throw new IllegalArgumentException("outline: is null; give at least 3 points");
        }
        List<OutlinePoint> pts = new ArrayList<>(points);
        if (pts.size() > 1 && pts.get(0).equals(pts.get(pts.size() - 1))) {
            pts.remove(pts.size() - 1);
        }
        new RemnantOutline(pts); // validates the corners as given, so errors show the caller's numbers
        double x0 = minX(pts);
        double y0 = minY(pts);
        List<OutlinePoint> moved = new ArrayList<>(pts.size());
        for (OutlinePoint p : pts) {
            moved.add(OutlinePoint.of(p.x() - x0, p.y() - y0));
        }
        if (!Orientation.isCCWArea(ring(moved))) {
            Collections.reverse(moved);
        }
        int start = 0;
        for (int i = 1; i < moved.size(); i++) {
            OutlinePoint p = moved.get(i);
            OutlinePoint best = moved.get(start);
            if (p.y() < best.y() || (p.y() == best.y() && p.x() < best.x())) {
                start = i;
            }
        }
        Collections.rotate(moved, -start);
        pts = moved;
        return new RemnantOutline(pts);
    }

    /**
     * Parses corners written as {@code "x1,y1 x2,y2 ..."} (pairs separated by blanks or semicolons), in the
     * given unit, into an outline in millimetres.
     *
     * @throws IllegalArgumentException naming the bad pair
     */
    public static RemnantOutline parse(String text, LengthUnit unit) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("outline: is empty; give corners as \"x1,y1 x2,y2 x3,y3 ...\"");
        }
        List<OutlinePoint> points = new ArrayList<>();
        for (String pair : text.strip().split("[\\s;]+")) {
            String[] xy = pair.split(",", -1);
            if (xy.length != 2) {
                throw new IllegalArgumentException("outline: '" + pair
                        + "' is not a corner; write each corner as x,y and separate corners with blanks");
            }
            try {
                points.add(OutlinePoint.of(unit.toMm(Double.parseDouble(xy[0].strip())),
                        unit.toMm(Double.parseDouble(xy[1].strip()))));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("outline: '" + pair + "' is not a corner of two numbers");
            }
        }
        return of(points);
    }

    /** Parses {@code "x1,y1 x2,y2 ..."} in millimetres; see {@link #parse(String, LengthUnit)}. */
    public static RemnantOutline parse(String text) {
        return parse(text, LengthUnit.MILLIMETRE);
    }

    /** The corners as {@code "x1,y1 x2,y2 ..."} in millimetres; {@link #parse(String)} reads it back exactly. */
    public String toText() {
        return textOf(vertices);
    }

    /** A new JTS polygon of this outline (mm). Treat it as immutable. */
    public Polygon toPolygon() {
        return polygonOf(vertices);
    }

    /** Width of the bounding box along x, mm. */
    public double widthMm() {
        return maxX(vertices) - minX(vertices);
    }

    /** Height of the bounding box along y, mm. */
    public double heightMm() {
        return maxY(vertices) - minY(vertices);
    }

    /** Enclosed area, mm². */
    public double areaMm2() {
        return toPolygon().getArea();
    }

    /** True when the outline is an axis-aligned rectangle (4 corners on its bounding box). */
    public boolean isRectangle() {
        if (vertices.size() != 4) {
            return false;
        }
        double x0 = minX(vertices);
        double x1 = maxX(vertices);
        double y0 = minY(vertices);
        double y1 = maxY(vertices);
        for (OutlinePoint p : vertices) {
            if ((p.x() != x0 && p.x() != x1) || (p.y() != y0 && p.y() != y1)) {
                return false;
            }
        }
        return true;
    }

    private static void checkSide(String field, double value) {
        if (!Double.isFinite(value) || value <= 0.0 || value > MAX_LENGTH_MM) {
            throw new IllegalArgumentException(field + ": " + value + " is out of range; must be > 0 and at most "
                    + MmFormat.format(MAX_LENGTH_MM) + " mm");
        }
    }

    private static Polygon polygonOf(List<OutlinePoint> pts) {
        return GEOMETRY.createPolygon(ring(pts));
    }

    private static Coordinate[] ring(List<OutlinePoint> pts) {
        Coordinate[] ring = new Coordinate[pts.size() + 1];
        for (int i = 0; i < pts.size(); i++) {
            ring[i] = new Coordinate(pts.get(i).x(), pts.get(i).y());
        }
        ring[pts.size()] = ring[0].copy();
        return ring;
    }

    private static String text(OutlinePoint p) {
        return MmFormat.format(p.x()) + "," + MmFormat.format(p.y());
    }

    private static String textOf(List<OutlinePoint> pts) {
        StringBuilder sb = new StringBuilder();
        for (OutlinePoint p : pts) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            sb.append(text(p));
        }
        return sb.toString();
    }

    private static double minX(List<OutlinePoint> pts) {
        return pts.stream().mapToDouble(OutlinePoint::x).min().orElse(0);
    }

    private static double maxX(List<OutlinePoint> pts) {
        return pts.stream().mapToDouble(OutlinePoint::x).max().orElse(0);
    }

    private static double minY(List<OutlinePoint> pts) {
        return pts.stream().mapToDouble(OutlinePoint::y).min().orElse(0);
    }

    private static double maxY(List<OutlinePoint> pts) {
        return pts.stream().mapToDouble(OutlinePoint::y).max().orElse(0);
    }
}
