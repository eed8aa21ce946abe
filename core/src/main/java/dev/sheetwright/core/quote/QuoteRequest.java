package dev.sheetwright.core.quote;

import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import java.util.Objects;

/**
 * Everything a quote is computed from: the job's unit, material and process, the cut chart (before the shop's
 * overrides), the job's quote terms, the shop settings, the stock the nest used with its parts, and the fittings and
 * development warnings (for the warnings list).
 */
public record QuoteRequest(LengthUnit unit, Material material, CuttingProcess process, CutChart chart,
                           QuoteTerms terms, ShopSettings shop, List<StockUse> stock, List<FittingSpec> fittings,
                           List<String> developmentWarnings) {

    public QuoteRequest {
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(process, "process");
        Objects.requireNonNull(chart, "chart");
        Objects.requireNonNull(terms, "terms");
        Objects.requireNonNull(shop, "shop");
        stock = List.copyOf(stock);
        fittings = List.copyOf(fittings);
        developmentWarnings = List.copyOf(developmentWarnings);
    }
}
