package dev.sheetwright.nest.model;

import java.util.OptionalInt;
import java.util.function.Function;

/** A rectangular sheet size, x from 0 to width, y from 0 to height; count limits how many may be used. */
public record Sheet(String name, double width, double height, OptionalInt count, double cost) implements Stock {
    public Sheet {
        Checks.requireText("name", name);
        Checks.requirePositive("width", width);
        Checks.requirePositive("height", height);
        Checks.requireNonNull("count", count);
        if (count.isPresent() && count.getAsInt() < 0) {
            throw new IllegalArgumentException("count must be >= 0, got " + count.getAsInt());
        }
        Checks.requireNonNegative("cost", cost);
    }

    /** A sheet size with no limit on how many are used. */
    public static Sheet unlimited(String name, double width, double height, double cost) {
        return new Sheet(name, width, height, OptionalInt.empty(), cost);
    }

    @Override
    public String label() {
        return name;
    }

    @Override
    public <T> T match(Function<? super Sheet, ? extends T> sheet,
            Function<? super Remnant, ? extends T> remnant,
            Function<? super Coil, ? extends T> coil) {
        return sheet.apply(this);
    }
}
