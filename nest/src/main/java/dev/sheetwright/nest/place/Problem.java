package dev.sheetwright.nest.place;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;
import org.locationtech.jts.simplify.TopologyPreservingSimplifier;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.Stock;

/** A request prepared for placing: orientations with convex pieces, stock slots, copies, tolerance. */
final class Problem {
    /** Outlines with more vertices than this are simplified (conservatively, outward) before decomposition. */
    static final int SIMPLIFY_ABOVE_VERTICES = 48;
    /** Relative size of that simplification, times the outline's bounding-box diagonal. */
    static final double SIMPLIFY_FRACTION = 1e-3;

    final NestRequest request;
    final List<NestPiece> types;
    final List<List<Orientation>> orientationsByType = new ArrayList<>();
    /**
     * The orientations the layouter tries, per type: all of {@link #orientationsByType}, except that a sampled free
     * rotation (more than {@link #COARSE_ABOVE} angles) is placed at the quarter turns only, which is where developed
     * duct patterns (drawn with their chord or seam along an axis) pack and which keeps the number of distinct no-fit
     * polygons small; the full set is kept for a type that fits no stock at a quarter turn.
     */
    final List<List<Orientation>> placeOrientations = new ArrayList<>();
    /** The cheapest orientations per type (0 and 90 degrees where they fit): used when the time is nearly spent. */
    final List<List<Orientation>> quickOrientations = new ArrayList<>();
    /** canonicalType[t]: lowest type with the same outline as t (same no-fit polygons), else t. */
    final int[] canonicalType;
    /** Free rotations sampled at more angles than this are placed at the quarter turns only. */
    static final int COARSE_ABOVE = 8;
    final List<Orientation> orientations = new ArrayList<>();
    final double[] typeArea;
    /** instance i = (type, copy) */
    final int[] instType;
    final int[] instCopy;
    final List<Slot> slots = new ArrayList<>();
    /** null when the type fits at least one slot; else why not. */
    final String[] tooLarge;
    /** The request's one precision; every tolerance of the placer comes from it. */
    final NestPrecision precision;
    final Nfp.Cache cache;

    Problem(NestRequest request) {
        this.request = request;
        this.types = request.pieces();
        NestRules rules = request.rules();
        precision = request.precision();
        typeArea = new double[types.size()];
        List<Double> angles = rules.rotation().candidateAngles();
        for (int t = 0; t < types.size(); t++) {
            Polygon shape = types.get(t).shape();
            typeArea[t] = shape.getArea();
            Geometry spacingShape = inflate(shape, rules.gap() / 2 * (1 + GAP_SAFETY) + rules.chordTolerance());
            List<ConvexPolygon> spacing = ConvexDecomposer.decompose(shells(spacingShape));
            List<ConvexPolygon> holes = holes(spacingShape);
            List<ConvexPolygon> body = rules.gap() == 0 ? spacing
                    : ConvexDecomposer.decompose(shells(inflate(shape, rules.chordTolerance())));
            List<Orientation> list = new ArrayList<>();
            for (int m = 0; m < (rules.mirror() ? 2 : 1); m++) {
                for (double a : angles) {
                    Orientation o = new Orientation(orientations.size(), t, a, m == 1,
                            Orientation.transform(spacing, a, m == 1), Orientation.transform(body, a, m == 1),
                            Orientation.transform(holes, a, m == 1));
                    orientations.add(o);
                    list.add(o);
                }
            }
            orientationsByType.add(list);
        }
        int total = request.totalCopies();
        instType = new int[total];
        instCopy = new int[total];
        int i = 0;
        for (int t = 0; t < types.size(); t++) {
            for (int c = 0; c < types.get(t).copies(); c++) {
                instType[i] = t;
                instCopy[i] = c;
                i++;
            }
        }
        buildSlots(rules);
        canonicalType = new int[types.size()];
        for (int t = 0; t < types.size(); t++) {
            canonicalType[t] = t;
            for (int u = 0; u < t; u++) {
                if (canonicalType[u] == u && types.get(u).shape().equalsExact(types.get(t).shape(), 0)) {
                    canonicalType[t] = u;
                    break;
                }
            }
        }
        boolean coarse = rules.rotation() instanceof dev.sheetwright.nest.model.RotationRule.Free && angles.size() > COARSE_ABOVE;
        for (int t = 0; t < types.size(); t++) {
            List<Orientation> all = orientationsByType.get(t);
            List<Orientation> place = coarse ? fitting(all, 90) : all;
            placeOrientations.add(place.isEmpty() ? all : place);
            List<Orientation> quick = fitting(placeOrientations.get(t), 90);
            List<Orientation> q2 = new ArrayList<>();
            for (Orientation o : quick) {
                if (!o.mirrored && (o.angleDeg == 0 || o.angleDeg == 90)) {
                    q2.add(o);
                }
            }
            quickOrientations.add(q2.isEmpty() ? placeOrientations.get(t) : q2);
        }
        cache = new Nfp.Cache(orientations, canonicalType, precision.eps());
        tooLarge = new String[types.size()];
        for (int t = 0; t < types.size(); t++) {
            tooLarge[t] = fitsSomewhere(t) ? null : tooLargeReason(t, rules.margin());
        }
    }

    /** Those of {@code list} at a multiple of {@code step} degrees whose box fits some slot with stock left. */
    private List<Orientation> fitting(List<Orientation> list, double step) {
        List<Orientation> out = new ArrayList<>();
        for (Orientation o : list) {
            if (!NestPrecision.multipleOf(o.angleDeg, step)) {
                continue;
            }
            for (Slot slot : slots) {
                if (slot.limit > 0 && slot.boxFits(o, precision.eps())) {
                    out.add(o);
                    break;
                }
            }
        }
        return out;
    }

    /** The outer rings only (holes filled). */
    static Geometry shells(Geometry g) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Polygon p = (Polygon) g.getGeometryN(i);
            out.add(g.getFactory().createPolygon(p.getExteriorRing().getCoordinates()));
        }
        return g.getFactory().createMultiPolygon(out.toArray(new Polygon[0]));
    }

    /** The holes as convex pieces (a non-convex hole is split; each piece alone is a pocket other parts may use). */
    static List<ConvexPolygon> holes(Geometry g) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Polygon p = (Polygon) g.getGeometryN(i);
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                out.add(g.getFactory().createPolygon(p.getInteriorRingN(h).getCoordinates()));
            }
        }
        if (out.isEmpty()) {
            return List.of();
        }
        return ConvexDecomposer.decompose(g.getFactory().createMultiPolygon(out.toArray(new Polygon[0])));
    }

    /**
     * Outward offset that contains the true offset: mitred joins (a mitre limit bevel still lies outside the round
     * offset); long outlines are first simplified by s and then grown by s more, which covers the original.
     */
    /**
     * Extra spacing kept beyond the gap, as a fraction of it: the mitred offsets of mirrored orientations came out
     * up to 0.1 % of the gap short in property runs (gap 0.2, no chord allowance), so keep ten times that. With no
     * gap (strip packing) nothing is added.
     */
    static final double GAP_SAFETY = 0.01;

    static Geometry inflate(Polygon shape, double d) {
        Geometry g = shape;
        if (shape.getNumPoints() > SIMPLIFY_ABOVE_VERTICES) {
            Envelope e = shape.getEnvelopeInternal();
            double s = SIMPLIFY_FRACTION * Math.hypot(e.getWidth(), e.getHeight());
            g = TopologyPreservingSimplifier.simplify(shape, s);
            d += s;
        }
        if (d <= 0) {
            return g;
        }
        BufferParameters bp = new BufferParameters(8, BufferParameters.CAP_FLAT, BufferParameters.JOIN_MITRE, 4.0);
        return BufferOp.bufferOp(g, d, bp);
    }

    private void buildSlots(NestRules rules) {
        double m = rules.margin();
        List<Slot> unordered = new ArrayList<>();
        List<Double> rank = new ArrayList<>();
        GeometryFactory gf = new GeometryFactory();
        for (Stock s : request.stock()) {
            int idx = unordered.size();
            Slot slot = s.match(
                    sh -> new Slot(idx, s, m, m, sh.width() - m, sh.height() - m, false, sh.width() >= sh.height(),
                            List.of(), sh.count().orElse(Integer.MAX_VALUE), precision.eps()),
                    r -> remnantSlot(idx, r, m, gf),
                    c -> new Slot(idx, s, m, m, Double.POSITIVE_INFINITY, c.width() - m, true, true, List.of(), 1,
                            precision.eps()));
            if (slot != null) {
                unordered.add(slot);
                // remnants first (already paid for), then by cost per unit area
                rank.add(s.match(sh -> 1 + sh.cost() / (sh.width() * sh.height()), r -> 0.0,
                        c -> 1 + c.costPerLength() / c.width()));
            }
        }
        List<Integer> ord = new ArrayList<>();
        for (int i = 0; i < unordered.size(); i++) {
            ord.add(i);
        }
        ord.sort(Comparator.comparingDouble(rank::get));
        for (int i : ord) {
            Slot u = unordered.get(i);
            slots.add(new Slot(slots.size(), u.stock, u.cx0, u.cy0, u.cx1, u.cy1, u.unlimitedLength, u.alongX,
                    List.of(u.obstacles), u.limit, precision.eps()));
        }
    }

    /** The slot of a remnant: its outline eroded by the margin, as a box with obstacles; null if nothing is left. */
    private Slot remnantSlot(int idx, Remnant r, double m, GeometryFactory gf) {
        Geometry inner = r.outline();
        if (m > 0) {
            // erode by slightly more than m so the chords of the rounded corners stay m away
            double d = m / Math.cos(Math.PI / 32);
            inner = r.outline().buffer(-d, 8);
        }
        if (inner.isEmpty()) {
            return null;
        }
        Envelope e = inner.getEnvelopeInternal();
        Geometry outside = gf.toGeometry(e).difference(inner);
        List<ConvexPolygon> obstacles = outside.isEmpty() ? List.of() : ConvexDecomposer.decompose(polygonal(outside));
        return new Slot(idx, r, e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY(), false, e.getWidth() >= e.getHeight(),
                obstacles, 1, precision.eps());
    }

    private static Geometry polygonal(Geometry g) {
        List<Polygon> polys = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Geometry c = g.getGeometryN(i);
            if (c instanceof Polygon p && p.getArea() > 0) {
                polys.add(p);
            }
        }
        return g.getFactory().createMultiPolygon(polys.toArray(new Polygon[0]));
    }

    private boolean fitsSomewhere(int t) {
        Scratch s = new Scratch();
        Bin.Position pos = new Bin.Position();
        for (Slot slot : slots) {
            if (slot.limit <= 0) {
                continue;
            }
            for (Orientation o : orientationsByType.get(t)) {
                if (!slot.boxFits(o, precision.eps())) {
                    continue;
                }
                if (slot.obstacles.length == 0) {
                    return true;
                }
                Bin b = new Bin(slot, types.size());
                if (b.bottomLeft(o, cache, precision.eps(), s, pos)) {
                    return true;
                }
            }
        }
        return false;
    }

    private String tooLargeReason(int t, double margin) {
        // the piece's true extent: the orientation whose bounding box is smallest (a turned box is never smaller
        // than the piece's own), longer side first as a tie-break
        double bw = Double.POSITIVE_INFINITY;
        double bh = Double.POSITIVE_INFINITY;
        for (Orientation o : orientationsByType.get(t)) {
            double w = o.bMaxX - o.bMinX + 2 * margin;
            double h = o.bMaxY - o.bMinY + 2 * margin;
            if (w * h < bw * bh || (w * h == bw * bh && Math.max(w, h) < Math.max(bw, bh))) {
                bw = w;
                bh = h;
            }
        }
        String largest = "none";
        double area = -1;
        for (Stock s : request.stock()) {
            if (s instanceof Sheet sh && sh.count().isPresent() && sh.count().getAsInt() == 0) {
                continue;
            }
            String d = s.match(sh -> "sheet " + fmt(sh.width()) + " x " + fmt(sh.height()),
                    r -> "remnant " + fmt(r.outline().getEnvelopeInternal().getWidth()) + " x "
                            + fmt(r.outline().getEnvelopeInternal().getHeight()),
                    c -> "coil " + fmt(c.width()) + " wide");
            double a = s.match(sh -> sh.width() * sh.height(), r -> r.outline().getArea(), c -> Double.MAX_VALUE);
            if (a > area) {
                area = a;
                largest = d;
            }
        }
        return "larger than every stock (needs " + fmt(bw) + " x " + fmt(bh) + " with margin; largest " + largest + ")";
    }

    static String fmt(double v) {
        String s = String.format(Locale.ROOT, "%.1f", v);
        return s.endsWith(".0") ? s.substring(0, s.length() - 2) : s;
    }
}
