package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.MaterialType;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A cut chart: rows keyed by (process, material, thickness) and per-process machine settings.
 *
 * <p>Lookups interpolate linearly between the two nearest rows of the same process and material and never extrapolate
 * (trade-reference §9.2); a thickness equal to a row returns that row's numbers exactly. Immutable: the
 * {@code with...} methods return a new chart, so a job or shop settings file can override any number.
 */
public record CutChart(List<CutChartRow> rows, Map<CuttingProcess, ProcessSettings> settings) {

    /** Source string for numbers supplied by the shop (machine chart or settings file). */
    public static final String SHOP = "shop";

    private static final Comparator<CutChartRow> ORDER = Comparator
            .comparing(CutChartRow::process)
            .thenComparing(CutChartRow::material)
            .thenComparingDouble(CutChartRow::thicknessMm);

    public CutChart {
        Objects.requireNonNull(rows, "rows");
        Objects.requireNonNull(settings, "settings");
        List<CutChartRow> sorted = new ArrayList<>(rows);
        sorted.forEach(r -> Objects.requireNonNull(r, "row"));
        sorted.sort(ORDER);
        for (int i = 1; i < sorted.size(); i++) {
            if (sorted.get(i).sameKey(sorted.get(i - 1))) {
                CutChartRow r = sorted.get(i);
                throw new IllegalArgumentException("rows has two rows for " + r.process().word() + " "
                        + r.material().word() + " " + r.thicknessMm() + " mm");
            }
        }
        for (CuttingProcess p : CuttingProcess.values()) {
            ProcessSettings s = settings.get(p);
            if (s == null) {
                throw new IllegalArgumentException("settings has no entry for " + p.word());
            }
            if (s.process() != p) {
                throw new IllegalArgumentException("settings entry for " + p.word() + " is for "
                        + s.process().word());
            }
        }
        rows = List.copyOf(sorted);
        settings = Map.copyOf(settings);
    }

    /** The built-in starting values (see the sources in each row). */
    public static CutChart defaults() {
        return DefaultCutChart.CHART;
    }

    /** The rows for one process and material, thinnest first. */
    public List<CutChartRow> rows(CuttingProcess process, MaterialType material) {
        Objects.requireNonNull(process, "process");
        Objects.requireNonNull(material, "material");
        return rows.stream().filter(r -> r.process() == process && r.material() == material).toList();
    }

    /**
     * Cut data at a thickness: a row's own numbers when the thickness equals a row, otherwise linear interpolation
     * of speed, pierce and sensing time between the two nearest rows. The returned row's source names both rows'
     * sources when they differ.
     *
     * @throws CutDataOutOfRange if the chart has no rows for the process and material, or the thickness lies outside
     *                           their range
     */
    public CutChartRow at(CuttingProcess process, MaterialType material, double thicknessMm) {
        if (!(thicknessMm > 0) || !Double.isFinite(thicknessMm)) {
            throw new IllegalArgumentException("thicknessMm must be finite and > 0, was " + thicknessMm);
        }
        List<CutChartRow> table = rows(process, material);
        if (table.isEmpty()) {
            throw CutDataOutOfRange.noRows(process, material, thicknessMm);
        }
        double min = table.get(0).thicknessMm();
        double max = table.get(table.size() - 1).thicknessMm();
        if (thicknessMm < min || thicknessMm > max) {
            throw CutDataOutOfRange.outside(process, material, thicknessMm, min, max);
        }
        for (int i = 0; i < table.size(); i++) {
            CutChartRow hi = table.get(i);
            if (thicknessMm == hi.thicknessMm()) {
                return hi;
            }
            if (thicknessMm < hi.thicknessMm()) {
                return interpolate(table.get(i - 1), hi, thicknessMm);
            }
        }
        throw new IllegalStateException("unreachable: thickness " + thicknessMm + " inside [" + min + ", " + max + "]");
    }

    /** Production cut speed in mm/min; see {@link #at}. */
    public double speedMmPerMin(CuttingProcess process, MaterialType material, double thicknessMm) {
        return at(process, material, thicknessMm).speedMmPerMin();
    }

    /** Pierce delay in seconds; see {@link #at}. */
    public double pierceSeconds(CuttingProcess process, MaterialType material, double thicknessMm) {
        return at(process, material, thicknessMm).pierceSeconds();
    }

    /** Height-sensing time per start in seconds; see {@link #at}. */
    public double heightSenseSeconds(CuttingProcess process, MaterialType material, double thicknessMm) {
        return at(process, material, thicknessMm).heightSenseSeconds();
    }

    /** Rapid traverse speed, rapid-speed source and sheet handling time of a process. */
    public ProcessSettings settings(CuttingProcess process) {
        return settings.get(Objects.requireNonNull(process, "process"));
    }

    public double rapidMmPerMin(CuttingProcess process) {
        return settings(process).rapidMmPerMin();
    }

    public double loadMinutesPerSheet(CuttingProcess process) {
        return settings(process).loadMinutesPerSheet();
    }

    /**
     * A chart where each given row replaces the row with the same process, material and thickness, and rows with a new
     * key are added. The overrides must not repeat a key among themselves.
     */
    public CutChart withOverrides(List<CutChartRow> overrides) {
        Objects.requireNonNull(overrides, "overrides");
        new CutChart(overrides, settings); // rejects repeated keys among the overrides
        List<CutChartRow> merged = new ArrayList<>(overrides);
        for (CutChartRow r : rows) {
            if (overrides.stream().noneMatch(o -> o.sameKey(r))) {
                merged.add(r);
            }
        }
        return new CutChart(merged, settings);
    }

    /** A chart with the rapid speed of one process replaced, source {@value #SHOP}. */
    public CutChart withRapid(CuttingProcess process, double mmPerMin) {
        return withRapid(process, mmPerMin, SHOP);
    }

    public CutChart withRapid(CuttingProcess process, double mmPerMin, String source) {
        return withSettings(settings(process).withRapid(mmPerMin, source));
    }

    /** A chart with the sheet load/unload minutes of one process replaced, source {@value #SHOP}. */
    public CutChart withLoadMinutes(CuttingProcess process, double minutes) {
        return withLoadMinutes(process, minutes, SHOP);
    }

    public CutChart withLoadMinutes(CuttingProcess process, double minutes, String source) {
        return withSettings(settings(process).withLoadMinutes(minutes, source));
    }

    private CutChart withSettings(ProcessSettings replacement) {
        Map<CuttingProcess, ProcessSettings> copy = new EnumMap<>(settings);
        copy.put(replacement.process(), replacement);
        return new CutChart(rows, copy);
    }

    private static CutChartRow interpolate(CutChartRow lo, CutChartRow hi, double t) {
        double f = (t - lo.thicknessMm()) / (hi.thicknessMm() - lo.thicknessMm());
        String source = lo.source().equals(hi.source()) ? lo.source()
                : "interpolated: " + lo.source() + " | " + hi.source();
        return new CutChartRow(lo.process(), lo.material(), t,
                lerp(lo.speedMmPerMin(), hi.speedMmPerMin(), f),
                lerp(lo.pierceSeconds(), hi.pierceSeconds(), f),
                lerp(lo.heightSenseSeconds(), hi.heightSenseSeconds(), f),
                source);
    }

    /**
     * a + (b - a) f, kept within [a, b]: monotone in f for fixed a and b, exact at f = 0, and never past either row
     * by rounding, so lookups stay monotone across row boundaries.
     */
    private static double lerp(double a, double b, double f) {
        double v = a + (b - a) * f;
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), v));
    }
}
