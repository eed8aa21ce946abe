package dev.sheetwright.cli.command;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sheetwright.cli.output.PatternDrawings;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.DxfWriter;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.RotationRule;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

/**
 * Whatever the engine places, the drawing writers accept: outlines with vertices a hair apart (as long outlines
 * with hundreds of vertices have), turned by any angle and moved anywhere, become polylines with no zero-length
 * segment, and the DXF and SVG writers write them.
 */
class PlacedOutlineProperties {
    private static final GeometryFactory GF = new GeometryFactory();

    @Property(tries = 300)
    void placedOutline_anyAngleAnyPlace_writersAccept(@ForAll @IntRange(min = 3, max = 40) int corners,
            @ForAll @DoubleRange(min = 0, max = 360) double angle, @ForAll @DoubleRange(min = -1e4, max = 1e4) double x,
            @ForAll @DoubleRange(min = -1e4, max = 1e4) double y, @ForAll @IntRange(min = 9, max = 16) int hairExponent,
            @ForAll boolean mirrored, @ForAll @DoubleRange(min = 1, max = 2000) double size) {
        // a star-shaped ring, every vertex followed by a twin a hair away (below the request's precision, which is
        // at least 3e-9 here: scale 3 x size >= 3)
        // at least 3e-9 here: scale 3 x size >= 3); exponent 16 stands for an exact repeat (JTS accepts those)
        double hair = hairExponent == 16 ? 0 : Math.pow(10, -hairExponent);
        List<Coordinate> corner = new ArrayList<>();
        for (int i = 0; i < corners; i++) {
            double a = 2 * Math.PI * i / corners;
            double r = size * (i % 2 == 0 ? 1 : 0.6);
            corner.add(new Coordinate(size + r * Math.cos(a), size + r * Math.sin(a)));
        }
        List<Coordinate> cs = new ArrayList<>();
        for (int i = 0; i < corners; i++) {
            Coordinate c = corner.get(i);
            Coordinate next = corner.get((i + 1) % corners);
            double len = c.distance(next);
            cs.add(c);
            // the twin on the edge towards the next corner
            cs.add(new Coordinate(c.x + hair * (next.x - c.x) / len, c.y + hair * (next.y - c.y) / len));
        }
        cs.add(cs.get(0).copy());
        Polygon raw = GF.createPolygon(cs.toArray(new Coordinate[0]));
        // a twin off by a hair can make the ring self-intersect in JTS's eyes; such input is refused before nesting
        Assume.that(raw.isValid());
        NestRequest req = new NestRequest(List.of(NestPiece.of("f", "p", 1, raw)), List.of(new Coil("c", 3 * size, 1)),
                NestRules.touching(RotationRule.free()));
        Polygon placedShape = req.pieces().get(0).shape();
        Placement p = new Placement("f", "p", 0, x, y, angle, mirrored);

        Polyline outline = BenchStripCommand.placedOutline(p, placedShape);

        assertEquals(corners, outline.vertices().size());
        List<Shape> shapes = List.of(outline);
        Drawing d = Drawing.of("mm", PatternDrawings.LAYERS, shapes);
        DxfWriter.toDxf(d);
        PatternDrawings.svgWriter(true).toSvg(d);
    }
}
