package dev.sheetwright.core.job;

/** Coil stock: a strip of the given width and unlimited length, cut off after the last part. */
public record StockCoil(String name, double width, double costPerLength) {

    public StockCoil {
        if (!(width > 0)) {
            throw new IllegalArgumentException("coil width must be positive, got " + width);
        }
        if (!(costPerLength >= 0)) {
            throw new IllegalArgumentException("coil cost must not be negative, got " + costPerLength);
        }
    }
}
