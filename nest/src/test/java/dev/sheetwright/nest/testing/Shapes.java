package dev.sheetwright.nest.testing;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

/** Test shapes. */
public final class Shapes {
    public static final GeometryFactory GF = new GeometryFactory();

    private Shapes() {
    }

    public static Polygon rect(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0), new Coordinate(x1, y1),
                new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }

    /** Square frame: outer side {@code outer}, centred square hole of side {@code inner}. */
    public static Polygon frame(double outer, double inner) {
        double a = (outer - inner) / 2;
        LinearRing shell = GF.createLinearRing(rect(0, 0, outer, outer).getExteriorRing().getCoordinates());
        LinearRing hole = GF.createLinearRing(rect(a, a, a + inner, a + inner).reverse().getExteriorRing().getCoordinates());
        return GF.createPolygon(shell, new LinearRing[] {hole});
    }

    public static Polygon wkt(String wkt) {
        try {
            return (Polygon) new WKTReader(GF).read(wkt);
        } catch (ParseException e) {
            throw new IllegalArgumentException(e);
        }
    }
}
