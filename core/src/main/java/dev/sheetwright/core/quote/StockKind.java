package dev.sheetwright.core.quote;

/** What a piece of stock is: a standard sheet, a remnant, or a length cut off a coil. */
public enum StockKind {
    SHEET("sheet"), REMNANT("remnant"), COIL("coil");

    private final String word;

    StockKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }
}
