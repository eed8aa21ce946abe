package dev.sheetwright.core.job;

import java.util.OptionalInt;

/** A standard sheet size on hand: width x length, an optional count limit and a price each. */
public record StockSheet(String name, double width, double length, OptionalInt count, double cost) {

    public StockSheet {
        if (!(width > 0) || !(length > 0)) {
            throw new IllegalArgumentException("sheet size must be positive, got " + width + " x " + length);
        }
        if (count.isPresent() && count.getAsInt() < 0) {
            throw new IllegalArgumentException("sheet count must not be negative, got " + count.getAsInt());
        }
        if (!(cost >= 0)) {
            throw new IllegalArgumentException("sheet cost must not be negative, got " + cost);
        }
    }
}
