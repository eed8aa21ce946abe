package dev.sheetwright.dxf;

/**
 * The length unit of a drawing's numbers. DXF R12 itself has no unit variable: the writer adds {@code $INSUNITS}
 * and {@code $MEASUREMENT} as hints only, the real contract is the unit set in the cutting program's import.
 */
public enum DrawingUnit {
    INCH("in", 1, 0),
    MILLIMETRE("mm", 4, 1);

    private final String symbol;
    private final int insUnits;
    private final int measurement;

    DrawingUnit(String symbol, int insUnits, int measurement) {
        this.symbol = symbol;
        this.insUnits = insUnits;
        this.measurement = measurement;
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

    /** Value of the {@code $INSUNITS} header hint: 1 inches, 4 millimetres. */
    int insUnits() {
        return insUnits;
    }

    /** Value of the {@code $MEASUREMENT} header hint: 0 imperial, 1 metric. */
    int measurement() {
        return measurement;
    }
}
