package dev.sheetwright.dxf;

import java.util.regex.Pattern;

/**
 * How one layer looks in an SVG preview. Sizes are fractions of the drawing size (the larger of its width and
 * height), so a preview looks the same whatever the sheet size or unit.
 *
 * @param stroke      line colour {@code #rrggbb}; also the colour of the layer's texts
 * @param strokeWidth line width as a fraction of the drawing size, in (0, 0.05]
 * @param dash        dash and gap length as a fraction of the drawing size, 0 for a solid line, in [0, 0.1]
 * @param fill        {@code none}, or a colour {@code #rrggbb} filling the layer's closed polylines together with
 *                    the even-odd rule, so that holes stay empty and a part inside a hole is filled again
 */
public record SvgStyle(String stroke, double strokeWidth, double dash, String fill) {

    private static final Pattern COLOUR = Pattern.compile("#[0-9a-fA-F]{6}");
    private static final String NONE = "none";

    public SvgStyle {
        Checks.notNull("SvgStyle.stroke", stroke);
        Checks.notNull("SvgStyle.fill", fill);
        if (!COLOUR.matcher(stroke).matches()) {
            throw new IllegalArgumentException("SvgStyle.stroke must be a colour #rrggbb, got \"" + stroke + "\"");
        }
        if (!fill.equals(NONE) && !COLOUR.matcher(fill).matches()) {
            throw new IllegalArgumentException(
                    "SvgStyle.fill must be \"none\" or a colour #rrggbb, got \"" + fill + "\"");
        }
        if (!(strokeWidth > 0 && strokeWidth <= 0.05)) {
            throw new IllegalArgumentException("SvgStyle.strokeWidth must be in (0, 0.05], got " + strokeWidth);
        }
        if (!(dash >= 0 && dash <= 0.1)) {
            throw new IllegalArgumentException("SvgStyle.dash must be in [0, 0.1], got " + dash);
        }
    }

    /** Solid dark line, no fill: contours that are cut (also the default of layers without a style). */
    public static SvgStyle cut() {
        return new SvgStyle("#1a1a1a", 0.002, 0, NONE);
    }

    /** Dashed blue line: marks, bend lines and other lines that are not cut. */
    public static SvgStyle mark() {
        return new SvgStyle("#1f5fbf", 0.0015, 0.008, NONE);
    }

    /** Dark green: label texts. */
    public static SvgStyle label() {
        return new SvgStyle("#1d6b2f", 0.0015, 0, NONE);
    }

    /** Solid dark line and a light fill with holes left open: parts on a sheet preview. */
    public static SvgStyle filledPart() {
        return new SvgStyle("#1a1a1a", 0.002, 0, "#d6e4f0");
    }

    /** This style with another fill, {@code none} or {@code #rrggbb}. */
    public SvgStyle withFill(String newFill) {
        return new SvgStyle(stroke, strokeWidth, dash, newFill);
    }

    boolean filled() {
        return !fill.equals(NONE);
    }
}
