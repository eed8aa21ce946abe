package dev.sheetwright.dxf;

/**
 * The length unit of a drawing's numbers. DXF R12 (AC1009) has no unit header variable ({@code $INSUNITS} and
 * {@code $MEASUREMENT} came with later releases), so the writer says the unit in a 999 comment at the top of the
 * file ({@link #dxfComment()}); the real contract is the unit set in the cutting program's import.
 */
public enum DrawingUnit {
    INCH("in", "inch"),
    MILLIMETRE("mm", "millimetre");

    private static final String COMMENT_START = "drawing units: ";

    private final String symbol;
    private final String word;

    DrawingUnit(String symbol, String word) {
        this.symbol = symbol;
        this.word = word;
    }

    /** The 999 comment a DXF file of this unit starts with, e.g. {@code drawing units: in (1 unit = 1 inch)}. */
    public String dxfComment() {
        return COMMENT_START + symbol + " (1 unit = 1 " + word + ")";
    }

    /** The unit a {@link #dxfComment()} names, or null when {@code comment} is no such comment. */
    public static DrawingUnit fromDxfComment(String comment) {
        for (DrawingUnit u : values()) {
            if (comment != null && comment.strip().startsWith(COMMENT_START + u.symbol + " ")) {
                return u;
            }
        }
        return null;
    }

    /** "in" or "mm", also the SVG/CSS unit used for the width and height of a preview. */
    public String symbol() {
        return symbol;
    }

    /** The unit with this symbol, "in" or "mm". */
    public static DrawingUnit fromSymbol(String symbol) {
        for (DrawingUnit u : values()) {
            if (u.symbol.equals(symbol)) {
                return u;
            }
        }
        throw new IllegalArgumentException("units must be \"in\" or \"mm\", got \"" + symbol + "\"");
    }
}
