package dev.sheetwright.cli.rack;

import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.nest.model.Offcut;
import java.util.Locale;

/**
 * The smallest offcut worth a place on the rack, in the job's unit: its narrow side at least {@code width} and its
 * area at least {@code area}. Defaults are common practice (about a foot wide and a square foot; 300 mm and
 * 0.1 m² for metric jobs); a shop with a small rack sets larger ones.
 */
public record MinOffcut(double width, double area) {

    public MinOffcut {
        if (!(width > 0) || Double.isInfinite(width)) {
            throw new IllegalArgumentException("--min-offcut-width must be a number > 0, got " + width);
        }
        if (!(area > 0) || Double.isInfinite(area)) {
            throw new IllegalArgumentException("--min-offcut-area must be a number > 0, got " + area);
        }
    }

    /** 12 in and 144 in² for inch jobs, 300 mm and 100 000 mm² for mm jobs (common practice). */
    public static MinOffcut defaults(LengthUnit unit) {
        return unit == LengthUnit.INCH ? new MinOffcut(12, 144) : new MinOffcut(300, 100_000);
    }

    /** True when {@code offcut} is large enough to keep. */
    public boolean accepts(Offcut offcut) {
        return Math.min(offcut.width(), offcut.height()) >= width && offcut.area() >= area;
    }

    /** For messages, e.g. {@code 12 in wide and 144 in2}. */
    public String text(LengthUnit unit) {
        return String.format(Locale.ROOT, "%s %s wide and %s %s2", number(width), unit.symbol(), number(area),
                unit.symbol());
    }

    private static String number(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
