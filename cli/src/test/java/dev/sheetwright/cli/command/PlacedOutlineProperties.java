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
            @ForAll @DoubleRange(min = -1e4, max = 1e4) double y, @ForAll @DoubleRange(min = 1e-15, max = 1e-6) double hair,
            @ForAll boolean mirrored, @ForAll @DoubleRange(min = 1, max = 2000) double size) {
        // a star-shaped ring, every vertex followed by a twin a hair away (and the closing vertex too)
        List<Coordinate> cs = new ArrayList<>();
        for (int i = 0; i < corners; i++) {
            double a = 2 * Math.PI * i / corners;
            double r = size * (i % 2 == 0 ? 1 : 0.6);
            double px = size + r * Math.cos(a);
            double py = size + r * Math.sin(a);
            cs.add(new Coordinate(px, py));
            cs.add(new Coordinate(px + hair, py - hair));
        }
        cs.add(cs.get(0).copy());
        Polygon raw = GF.createPolygon(cs.toArray(new Coordinate[0]));
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
