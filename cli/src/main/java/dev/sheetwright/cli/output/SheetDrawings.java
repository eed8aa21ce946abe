package dev.sheetwright.cli.output;

import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.Text;
import dev.sheetwright.dxf.Vertex;
import dev.sheetwright.nest.jobs.JobNestRequest;
import dev.sheetwright.nest.jobs.PatternShapes;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;

/** One cut program per sheet: the stock outline, every placed part with its marks and label, moved exactly. */
public final class SheetDrawings {

    private SheetDrawings() {
    }

    public static Drawing drawing(SheetLayout sheet, JobNestRequest plan, String jobName, LengthUnit unit) {
        return drawing(sheet, plan, jobName, unit, sheet.offcut(), null);
    }

    /**
     * The cut program of one sheet. When {@code offcut} is given it is labelled on layer {@code LABEL} with its
     * size, starting at a point inside it; {@code offcutId} (the rack id it will be recorded under, or null) leads
     * the label so the id is etched or marked on the metal and the rack matches the records.
     */
    public static Drawing drawing(SheetLayout sheet, JobNestRequest plan, String jobName, LengthUnit unit,
            Offcut offcut, String offcutId) {
        List<Shape> shapes = new ArrayList<>();
        shapes.add(stockOutline(sheet));
        for (Placement pl : sheet.parts()) {
            Pattern p = plan.pattern(pl.fitting(), pl.piece()).transformed(PatternShapes.transform(pl));
            shapes.addAll(PatternDrawings.shapes(p, List.of(pl.fitting() + " " + pl.piece() + " #" + (pl.copy() + 1)),
                    unit));
        }
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
        return Drawing.of(unit.symbol(), PatternDrawings.LAYERS, shapes);
    }

    static Polyline stockOutline(SheetLayout sheet) {
        List<Vertex> vs = new ArrayList<>();
        if (sheet.stock() instanceof Sheet s) {
            rectangle(vs, s.width(), s.height());
        } else if (sheet.stock() instanceof Coil c) {
            rectangle(vs, sheet.usedLength(), c.width());
        } else if (sheet.stock() instanceof Remnant r) {
            Coordinate[] cs = r.outline().getExteriorRing().getCoordinates();
            for (int i = 0; i < cs.length - 1; i++) {
                vs.add(Vertex.of(cs[i].x, cs[i].y));
            }
        }
        return new Polyline(PatternDrawings.SHEET, vs, true);
    }

    private static void rectangle(List<Vertex> vs, double w, double h) {
        vs.add(Vertex.of(0, 0));
        vs.add(Vertex.of(w, 0));
        vs.add(Vertex.of(w, h));
        vs.add(Vertex.of(0, h));
    }
}
