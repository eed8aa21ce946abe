package dev.sheetwright.cli.job;

import dev.sheetwright.core.quote.MassUnit;
import dev.sheetwright.core.quote.QuoteTerms;
import dev.sheetwright.core.quote.Sourced;
import dev.sheetwright.core.quote.WeightPrice;
import dev.sheetwright.core.units.LengthUnit;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/** The job file's {@code quote:} section: currency, one price per weight, machine rate per hour, lead-in length. */
final class QuoteSectionReader {

    private QuoteSectionReader() {
    }

    static QuoteTerms read(Fields q, LengthUnit unit) {
        q.allowOnly(Set.of("currency", "price-per-lb", "price-per-kg", "machine-rate", "lead-in"));
        Optional<String> currency = Optional.empty();
        if (q.has("currency")) {
            String c = q.string("currency");
            if (!c.matches("[A-Za-z]{1,5}")) {
                throw q.error("currency", "must be a short code of letters such as USD, got '" + c + "'");
            }
            currency = Optional.of(c.toUpperCase(Locale.ROOT));
        }
        if (q.has("price-per-lb") && q.has("price-per-kg")) {
            throw q.error("price-per-kg", "give price-per-lb or price-per-kg, not both");
        }
        Optional<WeightPrice> price = Optional.empty();
        if (q.has("price-per-lb")) {
            price = Optional.of(new WeightPrice(q.notNegative("price-per-lb", 0), MassUnit.LB, Sourced.JOB));
        } else if (q.has("price-per-kg")) {
            price = Optional.of(new WeightPrice(q.notNegative("price-per-kg", 0), MassUnit.KG, Sourced.JOB));
        }
        OptionalDouble rate = q.has("machine-rate") ? OptionalDouble.of(q.notNegative("machine-rate", 0))
                : OptionalDouble.empty();
        double leadIn = q.notNegative("lead-in", 0);
        // a sanity bound only: lead-ins are about 1-6 mm (common practice, trade-reference §9.4)
        if (leadIn > unit.fromMm(25)) {
            throw q.error("lead-in", "must be at most " + unit.fromMm(25) + " " + unit.symbol() + " (25 mm), got "
                    + leadIn);
        }
        return new QuoteTerms(currency, price, rate, leadIn);
    }
}
