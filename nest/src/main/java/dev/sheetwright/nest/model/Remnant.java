package dev.sheetwright.nest.model;

import java.util.function.Function;
import org.locationtech.jts.geom.Polygon;

/** A single left-over piece of stock, a rectangle or any polygon, in the same frame as its placements. */
public record Remnant(String id, Polygon outline, double cost) implements Stock {
    public Remnant {
        Checks.requireText("id", id);
        Checks.requireArea("outline of remnant " + id, outline);
        Checks.requireNonNegative("cost", cost);
    }

    @Override
    public String label() {
        return id;
    }

    @Override
    public <T> T match(Function<? super Sheet, ? extends T> sheet,
            Function<? super Remnant, ? extends T> remnant,
            Function<? super Coil, ? extends T> coil) {
        return remnant.apply(this);
    }
}
