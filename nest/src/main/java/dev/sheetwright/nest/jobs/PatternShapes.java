package dev.sheetwright.nest.jobs;

import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Transform2;
import dev.sheetwright.nest.model.Placement;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * The edge between exact patterns and the nesting engine: flattens a pattern's contours into a JTS polygon (for
 * collision work only), and turns a nest placement back into a rigid motion of the exact pattern.
 */
public final class PatternShapes {

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private PatternShapes() {
    }

    /** The pattern's outline and holes as a polygon whose vertices lie on the true curves (chords inside arcs). */
    public static Polygon polygon(Pattern p, double chord) {
        LinearRing shell = ring(p.outer(), chord);
        LinearRing[] holes = new LinearRing[p.holes().size()];
        for (int i = 0; i < holes.length; i++) {
            holes[i] = ring(p.holes().get(i), chord);
        }
        return FACTORY.createPolygon(shell, holes);
    }

    private static LinearRing ring(Contour c, double chord) {
        List<Point2> pts = c.flatten(chord);
        Coordinate[] cs = new Coordinate[pts.size() + 1];
        for (int i = 0; i < pts.size(); i++) {
            cs[i] = new Coordinate(pts.get(i).x(), pts.get(i).y());
        }
        cs[pts.size()] = cs[0].copy();
        return FACTORY.createLinearRing(cs);
    }

    /** The same placement as a transform of the exact pattern (mirror, then rotate, then translate). */
    public static Transform2 transform(Placement placement) {
        return Transform2.placement(placement.x(), placement.y(), placement.rotationDeg(), placement.mirrored());
    }
}
