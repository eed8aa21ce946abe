package dev.sheetwright.nest.model;

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
}
