package dev.sheetwright.core.job;

import java.util.List;
import java.util.Optional;

/** What the job may be cut from: standard sheets, remnants (used first) and an optional coil. */
public record Stock(List<StockSheet> sheets, List<StockRemnant> remnants, Optional<StockCoil> coil) {

    public Stock {
        sheets = List.copyOf(sheets);
        remnants = List.copyOf(remnants);
        if (sheets.isEmpty() && remnants.isEmpty() && coil.isEmpty()) {
            throw new IllegalArgumentException("stock must list at least one sheet size, remnant or coil");
        }
    }
}
