package dev.sheetwright.core.quote;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The job file's {@code quote:} section.
 *
 * @param currency code shown with money (e.g. {@code USD}), if given
 * @param price material price per lb or kg, if given (it then prices every stock line by weight)
 * @param machineRate machine cost per hour, if given
 */
public record QuoteTerms(Optional<String> currency, Optional<WeightPrice> price, OptionalDouble machineRate) {

    /** A job without a {@code quote:} section. */
    public static final QuoteTerms NONE = new QuoteTerms(Optional.empty(), Optional.empty(), OptionalDouble.empty());

    public QuoteTerms {
        Objects.requireNonNull(currency, "currency");
        Objects.requireNonNull(price, "price");
        Objects.requireNonNull(machineRate, "machineRate");
        if (currency.isPresent() && !currency.get().matches("[A-Za-z$€£¥]{1,5}")) {
            throw new IllegalArgumentException("currency must be a short code such as USD, was '" + currency.get()
                    + "'");
        }
        if (machineRate.isPresent() && !(machineRate.getAsDouble() >= 0 && Double.isFinite(machineRate.getAsDouble()))) {
            throw new IllegalArgumentException("machine-rate must be finite and >= 0, was " + machineRate.getAsDouble());
        }
    }
}
