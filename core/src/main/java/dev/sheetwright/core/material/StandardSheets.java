package dev.sheetwright.core.material;

import java.util.List;
import java.util.stream.Stream;

/**
 * Common sheet and coil sizes (trade-reference §8.3). These are defaults to offer, not limits: a job may use any
 * sheet or remnant. All sizes here are common practice; the 36 in wide sizes also appear in a steel-service-centre
 * weight-per-sheet table [S:SHEETCOIL].
 */
public final class StandardSheets {

    private static final String PRACTICE = "common practice";
    private static final String PRACTICE_AND_LISTED = "common practice; listed in [S:SHEETCOIL]";

    private static final List<SheetSize> INCH = List.of(
            SheetSize.ofInches(36, 96, PRACTICE_AND_LISTED),
            SheetSize.ofInches(36, 120, PRACTICE_AND_LISTED),
            SheetSize.ofInches(48, 96, PRACTICE),
            SheetSize.ofInches(48, 120, PRACTICE),
            SheetSize.ofInches(60, 120, PRACTICE),
            SheetSize.ofInches(60, 144, PRACTICE));

    private static final List<SheetSize> METRIC = List.of(
            SheetSize.ofMm(1000, 2000, PRACTICE),
            SheetSize.ofMm(1250, 2500, PRACTICE),
            SheetSize.ofMm(1500, 3000, PRACTICE));

    /** Coil widths for coil-fed duct lines, inches; 48 and 60 most common (common practice). */
    private static final List<Double> COIL_WIDTHS_IN = List.of(36.0, 48.0, 60.0, 72.0);

    private StandardSheets() {
    }

    /** Inch sheet sizes, narrowest and shortest first. */
    public static List<SheetSize> inch() {
        return INCH;
    }

    /** Metric sheet sizes, smallest first. */
    public static List<SheetSize> metric() {
        return METRIC;
    }

    /** All sheet sizes, inch first. */
    public static List<SheetSize> all() {
        return Stream.concat(INCH.stream(), METRIC.stream()).toList();
    }

    /** Common coil widths in inches (common practice). */
    public static List<Double> coilWidthsIn() {
        return COIL_WIDTHS_IN;
    }
}
