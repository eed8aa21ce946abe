package dev.sheetwright.nest.model;

import java.util.function.Function;

/** A strip of unlimited length along +x, y from 0 to width, cut off after the last part. */
public record Coil(String name, double width, double costPerLength) implements Stock {
    public Coil {
        Checks.requireText("name", name);
        Checks.requirePositive("width", width);
        Checks.requireNonNegative("costPerLength", costPerLength);
    }

    @Override
    public String label() {
        return name;
    }

    @Override
    public <T> T match(Function<? super Sheet, ? extends T> sheet,
            Function<? super Remnant, ? extends T> remnant,
            Function<? super Coil, ? extends T> coil) {
        return coil.apply(this);
    }
}
