package dev.sheetwright.cli.output;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.dxf.Layer;
import dev.sheetwright.dxf.Line;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.SvgStyle;
import dev.sheetwright.dxf.SvgWriter;
import dev.sheetwright.dxf.Text;
import dev.sheetwright.dxf.Vertex;
import java.util.ArrayList;
import java.util.List;

/**
 * Turns exact patterns into drawing shapes for the DXF and SVG writers: each contour one closed polyline whose
 * arcs are bulges (so arcs stay true arcs), marks as lines or one-bulge polylines, labels as text.
 */
public final class PatternDrawings {

    /** Every closed contour that is cut: outlines and holes. */
    public static final String CUT = "CUT";
    /** Bend, bead, crimp and centre lines: drawn, never cut. */
    public static final String MARK = "MARK";
    /** Part labels. */
    public static final String LABEL = "LABEL";
    /** The stock outline on sheet programs: not cut. */
    public static final String SHEET = "SHEET";

    public static final List<Layer> LAYERS = List.of(Layer.of(CUT, 7), Layer.of(MARK, 5), Layer.of(LABEL, 3),
            Layer.of(SHEET, 8));

    private PatternDrawings() {
    }

    /** The SVG writer styled for our layers; {@code filled} fills parts (sheet previews). */
    public static SvgWriter svgWriter(boolean filled) {
        return SvgWriter.create().style(CUT, filled ? SvgStyle.filledPart() : SvgStyle.cut())
                .style(MARK, SvgStyle.mark()).style(LABEL, SvgStyle.label())
                .style(SHEET, new SvgStyle("#8a8a8a", 0.002, 0, "none"));
    }

    public static Polyline contour(String layer, Contour c) {
        List<Vertex> vs = new ArrayList<>();
        for (Edge e : c.edges()) {
            Point2 s = e.start();
            vs.add(Vertex.of(s.x(), s.y(), e instanceof Arc a ? a.bulge() : 0));
        }
        return new Polyline(layer, vs, true);
    }

    public static Shape mark(Mark m) {
        Edge e = m.edge();
        if (e instanceof Arc a) {
            Point2 s = a.start();
            Point2 t = a.end();
            return new Polyline(MARK, List.of(Vertex.of(s.x(), s.y(), a.bulge()), Vertex.of(t.x(), t.y())), false);
        }
        return new Line(MARK, e.start().x(), e.start().y(), e.end().x(), e.end().y());
    }

    /** Label text height suited to the part: 1/4 in or 6 mm, smaller for small parts. */
    public static double labelHeight(Pattern p, LengthUnit unit) {
        double normal = unit == LengthUnit.INCH ? 0.25 : 6.0;
        double fit = Math.min(p.bounds().width(), p.bounds().height()) / 8;
        return Math.max(Math.min(normal, fit), normal / 4);
    }

    /** Cut contours, marks and the label lines of one pattern (already moved where it belongs). */
    public static List<Shape> shapes(Pattern p, List<String> labelLines, LengthUnit unit) {
        List<Shape> out = new ArrayList<>();
        out.add(contour(CUT, p.outer()));
        for (Contour h : p.holes()) {
            out.add(contour(CUT, h));
        }
        for (Mark m : p.marks()) {
            out.add(mark(m));
        }
        double h = labelHeight(p, unit);
        Point2 a = p.labelAnchor();
        for (int i = 0; i < labelLines.size(); i++) {
            double width = labelLines.get(i).length() * h * 0.8;
            out.add(new Text(LABEL, a.x() - width / 2, a.y() + (labelLines.size() / 2.0 - i - 1) * h * 1.5, h,
                    labelLines.get(i)));
        }
        return out;
    }
}
