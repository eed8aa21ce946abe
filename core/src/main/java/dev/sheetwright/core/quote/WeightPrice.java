package dev.sheetwright.core.quote;

import java.util.Objects;

/** A material price per pound or per kilogram, with its source ({@code job} or {@code shop}). */
public record WeightPrice(double amount, MassUnit per, String source) {

    public WeightPrice {
        if (!(amount >= 0) || !Double.isFinite(amount)) {
            throw new IllegalArgumentException("price per weight must be finite and >= 0, was " + amount);
        }
        Objects.requireNonNull(per, "per");
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /** The same price per unit of {@code unit}: a price per lb is divided by 0.45359237 to give a price per kg. */
    public double per(MassUnit unit) {
        return amount * unit.kg() / per.kg();
    }
}
