package dev.sheetwright.nest.overlap;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.locationtech.jts.algorithm.construct.MaximumInscribedCircle;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;

/**
 * The shape a piece has during the search: the outer ring of the piece grown by {@code grow} (half the gap plus the
 * chord allowance), simplified outward to at most {@link #MAX_VERTICES} vertices, so that two search shapes that do
 * not overlap keep the true outlines at least the gap apart. Holes are ignored (nothing is moved into a hole).
 *
 * <p>Coordinates are local: the piece's original coordinates less {@link #refX}, {@link #refY} (the centre of the
 * largest inscribed circle), so a rotation turns the piece about a point deep inside it. The poles are inscribed
 * circles (centre and radius) covering most of the shape; they measure how deep two shapes overlap.
 */
public final class SearchShape {
    /** Most vertices a search shape keeps; outlines with more are simplified outward. */
    public static final int MAX_VERTICES = 48;
    /** Most poles (inscribed circles) per shape. */
    public static final int MAX_POLES = 12;
    /** Poles smaller than this share of the largest one are not kept. */
    static final double SMALLEST_POLE = 0.12;
    /** Poles stop once they cover this share of the shape's area. */
    static final double POLE_COVER = 0.92;
    /** Inscribed circles are found to this share of the shape's size (they only measure overlap depth). */
    static final double CIRCLE_TOLERANCE = 1e-3;
    /** First simplification distance, as a share of the shape's size (it grows by half until few vertices remain). */
    static final double FIRST_SIMPLIFY_SHARE = 1e-3;

    private static final GeometryFactory GF = new GeometryFactory();
    /**
     * Segments a quadrant of a grown outline's round corners. The buffer rounds a corner's segment count to the
     * nearest whole number, so one chord may span up to 1.5 times a segment's angle: the growth is widened by
     * 1 / cos(3 pi / (8 x this)) (1.1 % at 8) so that every chord lies outside the true offset and the grown ring
     * covers every point within the growth of the outline.
     */
    static final int GROW_SEGMENTS = 8;

    /** Round corners of {@link #GROW_SEGMENTS}, and no simplification of the input (which may cut inside it). */
    private static BufferParameters growParameters() {
        BufferParameters p = new BufferParameters(GROW_SEGMENTS, BufferParameters.CAP_FLAT, BufferParameters.JOIN_ROUND,
                BufferParameters.DEFAULT_MITRE_LIMIT);
        p.setSimplifyFactor(0);
        return p;
    }

    final double[] xs;
    final double[] ys;
    final double[] poleX;
    final double[] poleY;
    final double[] poleR;
    final double refX;
    final double refY;
    final double area;
    /** Length of the edge that ends at each vertex. */
    final double[] edgeLength;
    /** Distance from the reference point to the farthest vertex. */
    final double reach;
    /** The distinct vertex heights, ascending: the bounds of the bands {@link #containsLocal} looks up. */
    private final double[] slabY;
    /** For each band between two consecutive heights, the edges (by end vertex) that cross it from bottom to top. */
    private final int[][] slabEdges;

    private SearchShape(double[] xs, double[] ys, double[] poleX, double[] poleY, double[] poleR, double refX, double refY,
            double area) {
        this.xs = xs;
        this.ys = ys;
        this.poleX = poleX;
        this.poleY = poleY;
        this.poleR = poleR;
        this.refX = refX;
        this.refY = refY;
        this.area = area;
        double r = 0;
        for (int i = 0; i < xs.length; i++) {
            r = Math.max(r, Math.hypot(xs[i], ys[i]));
        }
        this.reach = r;
        this.edgeLength = new double[xs.length];
        for (int i = 0, j = xs.length - 1; i < xs.length; j = i++) {
            edgeLength[i] = Math.hypot(xs[i] - xs[j], ys[i] - ys[j]);
        }
        this.slabY = Arrays.stream(ys).sorted().distinct().toArray();
        int slabs = Math.max(0, slabY.length - 1);
        this.slabEdges = new int[slabs][];
        int n = xs.length;
        for (int k = 0; k < slabs; k++) {
            int[] in = new int[n];
            int c = 0;
            for (int i = 0, j = n - 1; i < n; j = i++) {
                if (Math.min(ys[i], ys[j]) <= slabY[k] && Math.max(ys[i], ys[j]) >= slabY[k + 1]) {
                    in[c++] = i;
                }
            }
            slabEdges[k] = Arrays.copyOf(in, c);
        }
    }

    /**
     * Whether the local point (x, y) lies inside the outline (even-odd; a point on the boundary may go either way):
     * the edges that cross the horizontal band of the point's y are looked up (the bands lie between consecutive
     * vertex heights), so the test takes a few edges instead of all of them.
     */
    boolean containsLocal(double x, double y) {
        int last = slabY.length - 1;
        if (last < 1 || y < slabY[0] || y >= slabY[last]) {
            return false;
        }
        int lo = 0;
        int hi = last - 1;
        while (lo < hi) { // the band k with slabY[k] <= y < slabY[k + 1]
            int mid = (lo + hi + 1) >>> 1;
            if (slabY[mid] <= y) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        boolean in = false;
        int n = xs.length;
        for (int i : slabEdges[lo]) {
            int j = i == 0 ? n - 1 : i - 1;
            double xc = xs[j] + (y - ys[j]) / (ys[i] - ys[j]) * (xs[i] - xs[j]);
            if (x < xc) {
                in = !in;
            }
        }
        return in;
    }

    /**
     * The search shape of {@code outline} grown by {@code grow} (>= 0); {@code precision} is the smallest length
     * the search distinguishes (used to stop the inscribed-circle iteration).
     */
    public static SearchShape of(Polygon outline, double grow, double precision) {
        if (outline == null || outline.isEmpty()) {
            throw new IllegalArgumentException("outline must be a non-empty polygon");
        }
        if (!(grow >= 0) || !(precision > 0)) {
            throw new IllegalArgumentException("grow must be >= 0 and precision > 0, got " + grow + ", " + precision);
        }
        Polygon shell = GF.createPolygon(outline.getExteriorRing().getCoordinates());
        // a round buffer's chords cut inside the true offset at a convex corner (by up to 8 % of the distance with
        // two segments a quadrant), which would let a part turned to an angle come closer than the gap: the buffer
        // is drawn finer and its distance widened so that its chords lie outside the offset (see GROW_SEGMENTS)
        Polygon grown = grow > 0 ? largest(BufferOp.bufferOp(shell, grow / Math.cos(3 * Math.PI / (8 * GROW_SEGMENTS)),
                growParameters())) : shell;
        Polygon simple = simplifyOutward(grown, precision);
        if (grow > 0 || simple != grown) {
            simple = mitred(simple);
        }
        double size = Math.max(simple.getEnvelopeInternal().getWidth(), simple.getEnvelopeInternal().getHeight());
        double circleTolerance = Math.max(precision, size * CIRCLE_TOLERANCE);
        Point centre = new MaximumInscribedCircle(simple, circleTolerance).getCenter();
        double rx = centre.getX();
        double ry = centre.getY();
        Polygon ccw = (Polygon) simple.norm().reverse(); // norm() gives a clockwise shell
        Coordinate[] cs = ccw.getExteriorRing().getCoordinates();
        int n = cs.length - 1;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = cs[i].x - rx;
            ys[i] = cs[i].y - ry;
        }
        List<double[]> poles = poles(simple, circleTolerance);
        double[] px = new double[poles.size()];
        double[] py = new double[poles.size()];
        double[] pr = new double[poles.size()];
        for (int i = 0; i < poles.size(); i++) {
            px[i] = poles.get(i)[0] - rx;
            py[i] = poles.get(i)[1] - ry;
            pr[i] = poles.get(i)[2];
        }
        return new SearchShape(xs, ys, px, py, pr, rx, ry, simple.getArea());
    }

    public int vertexCount() {
        return xs.length;
    }

    public int poleCount() {
        return poleR.length;
    }

    /** A copy of the local outline as a JTS polygon (for tests and checks). */
    public Polygon localPolygon() {
        Coordinate[] cs = new Coordinate[xs.length + 1];
        for (int i = 0; i < xs.length; i++) {
            cs[i] = new Coordinate(xs[i], ys[i]);
        }
        cs[xs.length] = cs[0].copy();
        return GF.createPolygon(cs);
    }

    /**
     * Douglas-Peucker with a growing distance d until at most {@link #MAX_VERTICES} vertices remain, then grown by d
     * with mitred corners: every point of the input lies within d of the simplified ring, so the grown ring covers it.
     */
    private static Polygon simplifyOutward(Polygon p, double precision) {
        if (p.getExteriorRing().getNumPoints() - 1 <= MAX_VERTICES) {
            return p;
        }
        double size = Math.max(p.getEnvelopeInternal().getWidth(), p.getEnvelopeInternal().getHeight());
        double d = Math.max(precision, size * FIRST_SIMPLIFY_SHARE);
        for (int round = 0; round < 40; round++) {
            Polygon s = largest(DouglasPeuckerSimplifier.simplify(p, d));
            if (s != null && s.getExteriorRing().getNumPoints() - 1 <= MAX_VERTICES) {
                Polygon grown = largest(s.buffer(d * 1.01, 2, BufferParameters.CAP_FLAT));
                Polygon out = mitred(grown);
                if (out.covers(p)) {
                    return out;
                }
            }
            d *= 1.5;
        }
        return mitred(largest(p.convexHull().buffer(precision)));
    }

    /** Removes the many small segments a buffer puts on rounded corners by re-simplifying within a small distance. */
    private static Polygon mitred(Polygon p) {
        if (p.getExteriorRing().getNumPoints() - 1 <= MAX_VERTICES) {
            return p;
        }
        BufferParameters bp = new BufferParameters(2, BufferParameters.CAP_FLAT, BufferParameters.JOIN_MITRE, 3);
        double size = Math.max(p.getEnvelopeInternal().getWidth(), p.getEnvelopeInternal().getHeight());
        double d = size * FIRST_SIMPLIFY_SHARE;
        for (int round = 0; round < 40; round++) {
            Polygon s = largest(DouglasPeuckerSimplifier.simplify(p, d));
            if (s != null) {
                Polygon g = largest(BufferOp.bufferOp(s, d * 1.01, bp));
                if (g.getExteriorRing().getNumPoints() - 1 <= MAX_VERTICES && g.covers(p)) {
                    return g;
                }
            }
            d *= 1.5;
        }
        return largest(p.convexHull());
    }

    /** The outer ring of the largest polygon of g, or null. */
    private static Polygon largest(Geometry g) {
        Polygon best = largestKeepingHoles(g);
        return best == null ? null : GF.createPolygon(best.getExteriorRing().getCoordinates());
    }

    private static Polygon largestKeepingHoles(Geometry g) {
        Polygon best = null;
        for (int i = 0; i < g.getNumGeometries(); i++) {
            if (g.getGeometryN(i) instanceof Polygon q && (best == null || q.getArea() > best.getArea())) {
                best = q;
            }
        }
        return best;
    }

    /** Inscribed circles, largest first: each is the largest circle in what the earlier ones leave uncovered. */
    private static List<double[]> poles(Polygon shape, double precision) {
        List<double[]> out = new ArrayList<>();
        Geometry rest = shape;
        double area = shape.getArea();
        double covered = 0;
        double first = 0;
        while (out.size() < MAX_POLES && !rest.isEmpty()) {
            Polygon part = largestKeepingHoles(rest);
            if (part == null) {
                break;
            }
            MaximumInscribedCircle mic = new MaximumInscribedCircle(part, precision);
            double r = mic.getRadiusLine().getLength();
            if (out.isEmpty()) {
                first = r;
            } else if (r < SMALLEST_POLE * first || !(r > precision)) {
                break;
            }
            Point c = mic.getCenter();
            out.add(new double[] {c.getX(), c.getY(), r});
            covered += Math.PI * r * r;
            if (covered >= POLE_COVER * area) {
                break;
            }
            rest = rest.difference(c.buffer(r, 16));
        }
        return out;
    }
}
