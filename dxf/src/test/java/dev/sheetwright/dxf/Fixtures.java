package dev.sheetwright.dxf;

import java.util.List;

/** Drawings shared by the tests. Coordinates in millimetres. */
final class Fixtures {

    static final Layer CUT = Layer.of("CUT", 7);
    static final Layer MARK = Layer.of("MARK", 5);
    static final Layer LABEL = Layer.of("LABEL", 3);

    /** Cone blank: inner and outer sector radius and the sector angle, centred at (260, -20), from 30° to 150°. */
    static final double SECTOR_INNER = 100;
    static final double SECTOR_OUTER = 200;
    static final double SECTOR_DEG = 120;
    /** Plate 200 x 100 at (500, 30) with a round hole of radius 25 at its centre. */
    static final double PLATE_W = 200;
    static final double PLATE_H = 100;
    static final double HOLE_R = 25;

    private Fixtures() {
    }

    /** A 40 x 20 plate whose top edge is a shallow arc, a mark line and a label: small enough to read by eye. */
    static Drawing tiny() {
        Polyline plate = new Polyline("CUT", List.of(
                Vertex.of(0, 0), Vertex.of(40, 0), Vertex.of(40, 20, 0.25), Vertex.of(0, 20)), true);
        Line bend = new Line("MARK", 20, 0, 20, 20);
        Text label = new Text("LABEL", 2, 2, 3.5, "P1 40x20");
        return Drawing.of("mm", List.of(CUT, MARK, LABEL), List.of(plate, bend, label));
    }

    /**
     * Annular sector (cone blank) with centre (cx, cy), radii r and R, from angle a0 to a1 degrees: outer arc
     * counter-clockwise, radial edge, inner arc clockwise, radial edge.
     */
    static Polyline sector(String layer, double cx, double cy, double r, double bigR, double a0, double a1) {
        double b = Math.tan(Math.toRadians(a1 - a0) / 4);
        return new Polyline(layer, List.of(
                polar(cx, cy, bigR, a0, b), polar(cx, cy, bigR, a1, 0),
                polar(cx, cy, r, a1, -b), polar(cx, cy, r, a0, 0)), true);
    }

    /** A circle as a closed polyline of two half circles (bulge 1 each), counter-clockwise. */
    static Polyline circle(String layer, double cx, double cy, double r) {
        return new Polyline(layer, List.of(Vertex.of(cx - r, cy, 1), Vertex.of(cx + r, cy, 1)), true);
    }

    static Polyline rectangle(String layer, double x0, double y0, double x1, double y1) {
        return new Polyline(layer, List.of(Vertex.of(x0, y0), Vertex.of(x1, y0), Vertex.of(x1, y1),
                Vertex.of(x0, y1)), true);
    }

    /** Cone blank, plate with a round hole, labels and a mark line across the blank. */
    static Drawing coneAndPlate() {
        return Drawing.of("mm", List.of(CUT, MARK, LABEL), List.of(
                sector("CUT", 260, -20, SECTOR_INNER, SECTOR_OUTER, 30, 30 + SECTOR_DEG),
                new Line("MARK", 260, 80, 260, 180),
                new Text("LABEL", 200, 120, 8, "P1 CONE R100/R200 120\u00B0"),
                rectangle("CUT", 500, 30, 500 + PLATE_W, 30 + PLATE_H),
                circle("CUT", 500 + PLATE_W / 2, 30 + PLATE_H / 2, HOLE_R),
                new Text("LABEL", 510, 105, 8, "P2 plate \u00D850")));
    }

    private static Vertex polar(double cx, double cy, double r, double deg, double bulge) {
        double a = Math.toRadians(deg);
        return Vertex.of(cx + r * Math.cos(a), cy + r * Math.sin(a), bulge);
    }
}
