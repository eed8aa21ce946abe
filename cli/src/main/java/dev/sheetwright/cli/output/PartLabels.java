package dev.sheetwright.cli.output;

import dev.sheetwright.core.cutpath.PartOutline;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.dxf.Text;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Labels that stay on their own part: the text's box, with a clearance all round, must lie in the part's metal (not
 * over a hole, an edge or the gap to the next part). The full label is tried from the normal height down to a
 * quarter of it; then the part's number on the sheet, which the sheet's key resolves; a part too small even for its
 * number gets no text on it and is marked so in the key.
 */
public final class PartLabels {

    /** Width of one character in text heights, capitals and digits, rounded up. */
    static final double CHAR_WIDTH = ReportDrawings.CHAR_WIDTH_PER_CAP;
    private static final double SHRINK = 0.8;
    private static final int SAMPLES_PER_SIDE = 6;

    /** What is drawn on a part, and whether the key must name it. */
    public record Placed(Optional<Text> text, boolean keyed) {
    }

    private PartLabels() {
    }

    /** Largest label: 1/4 in or 6 mm. */
    static double normalHeight(LengthUnit unit) {
        return unit == LengthUnit.INCH ? 0.25 : 6.0;
    }

    /**
     * The label of part {@code number} (1-based on its sheet) on {@code part}, already in sheet coordinates.
     */
    public static Placed place(Pattern part, String full, int number, LengthUnit unit, double chord) {
        PartOutline metal = new PartOutline(part, chord);
        double normal = normalHeight(unit);
        for (double h = normal; h >= normal / 4; h *= SHRINK) {
            Optional<Text> t = fit(metal, part.labelAnchor(), full, h);
            if (t.isPresent()) {
                return new Placed(t, false);
            }
        }
        String num = String.valueOf(number);
        for (double h = normal; h >= normal / 8; h *= SHRINK) {
            Optional<Text> t = fit(metal, part.labelAnchor(), num, h);
            if (t.isPresent()) {
                return new Placed(t, true);
            }
        }
        return new Placed(Optional.empty(), true);
    }

    /** The text centred on the anchor when its box and a clearance of half its height stay in the metal. */
    private static Optional<Text> fit(PartOutline metal, Point2 anchor, String text, double h) {
        double w = CHAR_WIDTH * text.length() * h;
        double clear = h / 2;
        double x0 = anchor.x() - w / 2;
        double y0 = anchor.y() - h / 2;
        List<Point2> probes = new ArrayList<>();
        for (int i = 0; i <= SAMPLES_PER_SIDE; i++) {
            double fx = x0 + w * i / SAMPLES_PER_SIDE;
            double fy = y0 + h * i / SAMPLES_PER_SIDE;
            probes.add(new Point2(fx, y0));
            probes.add(new Point2(fx, y0 + h));
            probes.add(new Point2(x0, fy));
            probes.add(new Point2(x0 + w, fy));
            probes.add(new Point2(fx, y0 + h / 2));
        }
        for (Point2 p : probes) {
            if (!metal.inMetal(p) || metal.distance(p) < clear) {
                return Optional.empty();
            }
        }
        return Optional.of(new Text(PatternDrawings.LABEL, x0, y0, h, text));
    }
}
