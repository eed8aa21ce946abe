package dev.sheetwright.cli.output;

import dev.sheetwright.core.cutpath.SheetCutPlan;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.Layer;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.Text;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.List;

/**
 * Sheet pictures for the shop report: the same stock outline, cut contours and marks as the sheet's cut program, with
 * each part's label (fitting, piece, copy, as on the program's LABEL layer) sized to be read on a printed page.
 */
public final class ReportDrawings {

    /** Width of one character in cap heights, sans-serif capitals and digits, rounded up (fits labels in parts). */
    static final double CHAR_WIDTH_PER_CAP = 0.95;
    /** A full label is used when it can be at least a 150th of the sheet's long side; else the part's number. */
    static final double FULL_LABEL_PER_SHEET = 1.0 / 150;
    /** Largest label: a 60th of the sheet's long side, so it prints at about 10 pt on a landscape page. */
    static final double MAX_LABEL_PER_SHEET = 1.0 / 60;
    /** Smallest label, a 200th of the long side: below it a label would not print legibly at all. */
    static final double MIN_LABEL_PER_SHEET = 1.0 / 200;

    private ReportDrawings() {
    }

    /** The label printed on a placed part, the same words as on the cut program. */
    public static String label(Placement pl) {
        return pl.fitting() + " " + pl.piece() + " #" + (pl.copy() + 1);
    }

    /**
     * The text drawn on part {@code number} (1-based on its sheet): the full label when it fits legibly, otherwise
     * the number alone, which the sheet's key ({@link #key}) resolves.
     */
    public static String shownLabel(SheetLayout sheet, List<Pattern> placed, int number) {
        String full = label(sheet.parts().get(number - 1));
        return fit(placed.get(number - 1), full) >= FULL_LABEL_PER_SHEET * longSide(sheet) ? full
                : String.valueOf(number);
    }

    /** The key under a sheet picture: every part's number and full label. */
    public static List<String> key(SheetLayout sheet) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < sheet.parts().size(); i++) {
            out.add((i + 1) + " " + label(sheet.parts().get(i)));
        }
        return out;
    }

    private static double fit(Pattern p, String text) {
        Box2 b = p.bounds();
        return Math.min(0.9 * b.width() / (CHAR_WIDTH_PER_CAP * text.length()), 0.4 * b.height());
    }

    private static double longSide(SheetLayout sheet) {
        dev.sheetwright.dxf.Bounds b = SheetDrawings.stockOutline(sheet).bounds();
        return Math.max(b.width(), b.height());
    }

    /**
     * The picture of one sheet; {@code placed} are the layout's parts already moved to sheet coordinates. With a
     * cut plan ({@code path} not null) the pierces are numbered in cutting order and the rapids drawn dashed.
     */
    public static Drawing sheet(SheetLayout sheet, List<Pattern> placed, LengthUnit unit, SheetCutPlan path) {
        List<Shape> shapes = new ArrayList<>();
        shapes.add(SheetDrawings.stockOutline(sheet));
        double longSide = longSide(sheet);
        for (int i = 0; i < placed.size(); i++) {
            Pattern p = placed.get(i);
            shapes.addAll(PatternDrawings.shapes(p, List.of(), unit));
            String text = shownLabel(sheet, placed, i + 1);
            double h = Math.max(MIN_LABEL_PER_SHEET * longSide, Math.min(MAX_LABEL_PER_SHEET * longSide,
                    fit(p, text)));
            Point2 a = p.labelAnchor();
            double width = CHAR_WIDTH_PER_CAP * text.length() * h;
            shapes.add(new Text(PatternDrawings.LABEL, a.x() - width / 2, a.y() - h / 2, h, text));
        }
        List<Layer> layers = new ArrayList<>(PatternDrawings.LAYERS);
        if (path != null) {
            SheetDrawings.addPath(shapes, path, unit, longSide);
            layers.addAll(SheetDrawings.PREVIEW_LAYERS);
        }
        return Drawing.of(unit.symbol(), layers, shapes);
    }
}
