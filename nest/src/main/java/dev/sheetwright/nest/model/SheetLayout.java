package dev.sheetwright.nest.model;

import java.util.List;

/**
 * One piece of stock with its parts. {@code index} counts the layouts of the result from 0; {@code usedLength}
 * is the length cut off a coil (for sheets and remnants: the extent used along the compacting axis);
 * {@code offcut} the largest clean rectangle left, or null; {@code utilization} part area / stock area used.
 */
public record SheetLayout(Stock stock, int index, double usedLength, List<Placement> parts, Offcut offcut, double utilization) {
    public SheetLayout {
        Checks.requireNonNull("stock", stock);
        if (index < 0) {
            throw new IllegalArgumentException("index must be >= 0, got " + index);
        }
        Checks.requireNonNegative("usedLength", usedLength);
        parts = List.copyOf(Checks.requireNonNull("parts", parts));
        if (!(utilization >= 0 && utilization <= 1 + NestPrecision.ROUND_OFF)) {
            throw new IllegalArgumentException("utilization must be in 0..1, got " + utilization);
        }
    }

    /** Area of the stock this layout uses: a whole sheet or remnant; for a coil, its width times the length cut off. */
    public double stockArea() {
        return stockArea(stock, usedLength);
    }

    /** Area of {@code stock} when {@code usedLength} of it is used (only a coil's area depends on it). */
    public static double stockArea(Stock stock, double usedLength) {
        return stock.match(s -> s.width() * s.height(), r -> r.outline().getArea(), c -> c.width() * usedLength);
    }
}
