package dev.sheetwright.cli.output;

import dev.sheetwright.core.cutpath.CutStep;
import dev.sheetwright.core.cutpath.SheetCutPlan;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.Layer;
import dev.sheetwright.dxf.Line;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.SvgStyle;
import dev.sheetwright.dxf.SvgWriter;
import dev.sheetwright.dxf.Text;
import dev.sheetwright.dxf.Vertex;
import dev.sheetwright.nest.jobs.JobNestRequest;
import dev.sheetwright.nest.jobs.PatternShapes;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;

/**
 * One cut program per sheet: the stock outline, every contour in cutting order on {@code CUT} (nominal, as drawn),
 * the lead-ins and lead-outs on {@code LEAD}, marks, and labels that stay inside their part (a part too small for
 * its label gets its number, resolved by the key beside the sheet on layer {@code KEY}). With the path shown
 * (previews only) each pierce gets its order number and the rapids are drawn as dashed lines.
 */
public final class SheetDrawings {

    /** Lead-ins and lead-outs: cut, but not part of any part's outline. */
    public static final String LEAD = "LEAD";
    /** Rapid travel between contours (previews with the path shown only; never cut). */
    public static final String RAPID = "RAPID";
    /** Order numbers at the pierces (previews with the path shown only). */
    public static final String ORDER = "ORDER";
    /** The key of part numbers, beside the stock (not on the metal, never cut or etched). */
    public static final String KEY = "KEY";

    static final List<Layer> SHEET_LAYERS;

    static {
        List<Layer> layers = new ArrayList<>(PatternDrawings.LAYERS);
        layers.add(Layer.of(LEAD, 1));
        layers.add(Layer.of(KEY, 8));
        SHEET_LAYERS = List.copyOf(layers);
    }

    static final List<Layer> PREVIEW_LAYERS = List.of(Layer.of(RAPID, 6), Layer.of(ORDER, 6));

    private SheetDrawings() {
    }

    /** The preview writer: parts filled, leads red, rapids thin and dashed, order numbers beside the pierces. */
    public static SvgWriter svgWriter() {
        return PatternDrawings.svgWriter(true).style(LEAD, new SvgStyle("#c0392b", 0.0015, 0, "none"))
                .style(RAPID, new SvgStyle("#8e44ad", 0.0008, 0.004, "none"))
                .style(ORDER, new SvgStyle("#8e44ad", 0.001, 0, "none"))
                .style(KEY, new SvgStyle("#333333", 0.001, 0, "none"));
    }

    /**
     * The cut program of one sheet. When {@code offcut} is given it is labelled on layer {@code LABEL} with its
     * size, starting at a point inside it; {@code offcutId} (the rack id it will be recorded under, or null) leads
     * the label so the id is etched or marked on the metal and the rack matches the records.
     *
     * @param cut the sheet's cut plan: contours are written in its order with its leads
     * @param showPath also draw order numbers and rapids (for previews)
     */
    public static Drawing drawing(SheetLayout sheet, JobNestRequest plan, String jobName, LengthUnit unit,
            Offcut offcut, String offcutId, SheetCutPlan cut, double chord, boolean showPath) {
        List<Shape> shapes = new ArrayList<>();
        shapes.add(stockOutline(sheet));
        List<Pattern> placed = new ArrayList<>();
        for (Placement pl : sheet.parts()) {
            placed.add(plan.pattern(pl.fitting(), pl.piece()).transformed(PatternShapes.transform(pl)));
        }
        for (CutStep step : cut.steps()) {
            shapes.add(PatternDrawings.contour(PatternDrawings.CUT, step.nominal()));
        }
        for (CutStep step : cut.steps()) {
            step.lead().leadIn().ifPresent(l -> shapes.add(line(LEAD, l)));
            step.lead().leadOut().ifPresent(l -> shapes.add(line(LEAD, l)));
        }
        List<String> key = new ArrayList<>();
        for (int i = 0; i < placed.size(); i++) {
            Pattern p = placed.get(i);
            for (Mark m : p.marks()) {
                shapes.add(PatternDrawings.mark(m));
            }
            String full = ReportDrawings.label(sheet.parts().get(i));
            PartLabels.Placed label = PartLabels.place(p, full, i + 1, unit, chord);
            label.text().ifPresent(shapes::add);
            if (label.keyed()) {
                key.add((i + 1) + " " + full + (label.text().isEmpty() ? " (no room for a label on the part)" : ""));
            }
        }
        addKey(shapes, sheet, key, unit);
        if (offcut != null && offcut.width() > 0 && offcut.height() > 0) {
            String first = (offcutId == null ? "" : offcutId + "  ")
                    + String.format(Locale.ROOT, "OFFCUT %.2f x %.2f %s", offcut.width(), offcut.height(),
                            unit.symbol());
            String second = String.format(Locale.ROOT, "%s sheet %d", jobName, sheet.index() + 1);
            // as large as reads well, small enough that both lines stay inside the offcut
            double h = Math.min(unit == LengthUnit.INCH ? 0.5 : 12, Math.min(offcut.height() / 5,
                    offcut.width() / (0.8 * Math.max(first.length(), second.length()) + 2)));
            shapes.add(new Text(PatternDrawings.LABEL, offcut.x() + h, offcut.y() + 2.5 * h, h, first));
            shapes.add(new Text(PatternDrawings.LABEL, offcut.x() + h, offcut.y() + h, h, second));
        }
        List<Layer> layers = new ArrayList<>(SHEET_LAYERS);
        if (showPath) {
            layers.addAll(PREVIEW_LAYERS);
            dev.sheetwright.dxf.Bounds b = stockOutline(sheet).bounds();
            addPath(shapes, cut, unit, Math.max(b.width(), b.height()));
        }
        return Drawing.of(unit.symbol(), layers, shapes);
    }

    /** Order numbers at each pierce and the rapids to it, for a preview. */
    static void addPath(List<Shape> shapes, SheetCutPlan cut, LengthUnit unit, double longSide) {
        // numbers that read on a whole-sheet preview: a 100th of the sheet's long side, at least a label's height
        double h = Math.max(PartLabels.normalHeight(unit), longSide / 100);
        for (int i = 0; i < cut.steps().size(); i++) {
            dev.sheetwright.core.geom.Line r = cut.rapids().get(i);
            if (r.length() > 0) {
                shapes.add(line(RAPID, r));
            }
            Point2 p = cut.steps().get(i).lead().pierce();
            shapes.add(new Text(ORDER, p.x() + h / 4, p.y() + h / 4, h, String.valueOf(i + 1)));
        }
    }

    /** The key of numbered parts, beside the stock's right-hand end (off the metal). */
    private static void addKey(List<Shape> shapes, SheetLayout sheet, List<String> key, LengthUnit unit) {
        if (key.isEmpty()) {
            return;
        }
        dev.sheetwright.dxf.Bounds b = stockOutline(sheet).bounds();
        double h = PartLabels.normalHeight(unit);
        double x = b.maxX() + 2 * h;
        double y = b.maxY() - h;
        shapes.add(new Text(KEY, x, y, h, "KEY (parts too small for their label)"));
        for (String k : key) {
            y -= 1.6 * h;
            shapes.add(new Text(KEY, x, y, h, k));
        }
    }

    private static Line line(String layer, dev.sheetwright.core.geom.Line l) {
        return new Line(layer, l.start().x(), l.start().y(), l.end().x(), l.end().y());
    }

    static Polyline stockOutline(SheetLayout sheet) {
        List<Vertex> vs = sheet.stock().match(
                s -> rectangle(s.width(), s.height()),
                r -> {
                    Coordinate[] cs = r.outline().getExteriorRing().getCoordinates();
                    List<Vertex> ring = new ArrayList<>();
                    for (int i = 0; i < cs.length - 1; i++) {
                        ring.add(Vertex.of(cs[i].x, cs[i].y));
                    }
                    return ring;
                },
                c -> rectangle(sheet.usedLength(), c.width()));
        return new Polyline(PatternDrawings.SHEET, vs, true);
    }

    private static List<Vertex> rectangle(double w, double h) {
        return List.of(Vertex.of(0, 0), Vertex.of(w, 0), Vertex.of(w, h), Vertex.of(0, h));
    }
}
