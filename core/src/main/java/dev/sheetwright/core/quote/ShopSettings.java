package dev.sheetwright.core.quote;

import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CutChartRow;
import dev.sheetwright.core.cutting.CuttingProcess;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A shop's own numbers, read from a settings file: cut chart rows from the machine's chart, rapid speeds, sheet
 * handling time, machine rate, material price and currency. Every number applied from here is marked {@code shop}.
 *
 * @param chartRows rows replacing (or adding to) the built-in cut chart; speeds mm/min, thickness mm
 * @param rapidMmPerMin rapid traverse per process, mm/min
 * @param loadMinutes sheet load and unload minutes per sheet, both processes
 */
public record ShopSettings(List<CutChartRow> chartRows, Map<CuttingProcess, Double> rapidMmPerMin,
                           OptionalDouble loadMinutes, OptionalDouble machineRate, Optional<WeightPrice> price,
                           Optional<String> currency) {

    /** No shop file. */
    public static final ShopSettings NONE = new ShopSettings(List.of(), Map.of(), OptionalDouble.empty(),
            OptionalDouble.empty(), Optional.empty(), Optional.empty());

    public ShopSettings {
        chartRows = List.copyOf(chartRows);
        rapidMmPerMin = rapidMmPerMin.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(rapidMmPerMin));
        Objects.requireNonNull(loadMinutes, "loadMinutes");
        Objects.requireNonNull(machineRate, "machineRate");
        Objects.requireNonNull(price, "price");
        Objects.requireNonNull(currency, "currency");
        for (CutChartRow r : chartRows) {
            if (!CutChart.SHOP.equals(r.source())) {
                throw new IllegalArgumentException("shop chart rows must have source '" + CutChart.SHOP + "', was '"
                        + r.source() + "'");
            }
        }
        rapidMmPerMin.forEach((p, v) -> {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("rapid speed for " + p.word() + " must be finite and > 0, was " + v);
            }
        });
        if (loadMinutes.isPresent() && !(loadMinutes.getAsDouble() >= 0 && Double.isFinite(loadMinutes.getAsDouble()))) {
            throw new IllegalArgumentException("load minutes must be finite and >= 0, was " + loadMinutes.getAsDouble());
        }
        if (machineRate.isPresent() && !(machineRate.getAsDouble() >= 0 && Double.isFinite(machineRate.getAsDouble()))) {
            throw new IllegalArgumentException("machine rate must be finite and >= 0, was " + machineRate.getAsDouble());
        }
    }

    /** The base chart with this shop's rows, rapid speeds and load minutes applied (source {@code shop}). */
    public CutChart applyTo(CutChart base) {
        CutChart chart = base.withOverrides(chartRows);
        for (Map.Entry<CuttingProcess, Double> e : rapidMmPerMin.entrySet()) {
            chart = chart.withRapid(e.getKey(), e.getValue());
        }
        if (loadMinutes.isPresent()) {
            for (CuttingProcess p : CuttingProcess.values()) {
                chart = chart.withLoadMinutes(p, loadMinutes.getAsDouble());
            }
        }
        return chart;
    }
}
