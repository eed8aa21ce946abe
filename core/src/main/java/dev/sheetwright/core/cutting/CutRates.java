package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.material.UnitFactors;
import java.util.Objects;

/**
 * The rates a cut time is computed with: cut speed, pierce delay, height-sensing time, rapid speed and sheet handling
 * time, with a note of where they came from.
 */
public record CutRates(double cutSpeedMmPerMin, double pierceSeconds, double heightSenseSeconds,
                       double rapidMmPerMin, double loadMinutesPerSheet, String source) {

    /** Source string for rates typed in directly rather than read from a chart. */
    public static final String GIVEN = "given";

    public CutRates {
        requirePositive("cutSpeedMmPerMin", cutSpeedMmPerMin);
        requirePositive("rapidMmPerMin", rapidMmPerMin);
        requireNonNegative("pierceSeconds", pierceSeconds);
        requireNonNegative("heightSenseSeconds", heightSenseSeconds);
        requireNonNegative("loadMinutesPerSheet", loadMinutesPerSheet);
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /** Rates given in inch units (speeds in in/min), source {@value #GIVEN}. */
    public static CutRates ofInches(double cutSpeedInPerMin, double pierceSeconds, double heightSenseSeconds,
                                    double rapidInPerMin, double loadMinutesPerSheet) {
        requirePositive("cutSpeedInPerMin", cutSpeedInPerMin);
        requirePositive("rapidInPerMin", rapidInPerMin);
        return new CutRates(cutSpeedInPerMin * UnitFactors.MM_PER_IN, pierceSeconds, heightSenseSeconds,
                rapidInPerMin * UnitFactors.MM_PER_IN, loadMinutesPerSheet, GIVEN);
    }

    /**
     * Rates read from a chart for a process, material family and thickness.
     *
     * @throws CutDataOutOfRange if the chart does not cover the thickness
     */
    public static CutRates from(CutChart chart, CuttingProcess process, MaterialType material, double thicknessMm) {
        Objects.requireNonNull(chart, "chart");
        CutChartRow row = chart.at(process, material, thicknessMm);
        ProcessSettings s = chart.settings(process);
        return new CutRates(row.speedMmPerMin(), row.pierceSeconds(), row.heightSenseSeconds(), s.rapidMmPerMin(),
                s.loadMinutesPerSheet(), "cut data: " + row.source() + "; rapid: " + s.rapidSource()
                + "; handling: " + s.loadSource());
    }

    /** Rates read from a chart for a material at its nominal thickness. */
    public static CutRates from(CutChart chart, CuttingProcess process, Material material) {
        Objects.requireNonNull(material, "material");
        return from(chart, process, material.type(), material.thicknessMm());
    }

    private static void requirePositive(String name, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and > 0, was " + v);
        }
    }

    private static void requireNonNegative(String name, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, was " + v);
        }
    }
}
