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

/**
 * The job file's {@code quote:} section: currency, one price per weight, machine rate per hour. The lead-in moved to
 * {@code cutting:} (the cut program and the quote use the same one); a {@code quote: {lead-in}} is refused saying so.
 */
final class QuoteSectionReader {

    private QuoteSectionReader() {
    }

    static QuoteTerms read(Fields q, LengthUnit unit) {
        if (q.has("lead-in")) {
            throw q.error("lead-in", "has moved to the cutting: section (cutting: {lead-in: ..., lead-out: ...}),"
                    + " where the cut program and the quote both read it");
        }
        q.allowOnly(Set.of("currency", "price-per-lb", "price-per-kg", "machine-rate"));
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
        return new QuoteTerms(currency, price, rate);
    }
}
