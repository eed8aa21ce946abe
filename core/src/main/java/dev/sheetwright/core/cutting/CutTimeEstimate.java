package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.Material;
import java.util.Objects;

/**
 * A cut-time estimate, each term kept separately (trade-reference §9.5, computed formula):
 *
 * <pre>
 * T = L_cut / v                              cutting
 *   + N_pierce * (t_pierce + t_sense)        piercing (starts)
 *   + L_rapid / v_rapid                      rapids
 *   + sheets * t_load                        handling
 * </pre>
 *
 * All terms are in minutes. Estimates for different sheets or materials add with {@link #plus}.
 */
public record CutTimeEstimate(double cuttingMinutes, double piercingMinutes, double rapidMinutes,
                              double handlingMinutes) {

    private static final double SECONDS_PER_MINUTE = 60.0;

    public CutTimeEstimate {
        requireMinutes("cuttingMinutes", cuttingMinutes);
        requireMinutes("piercingMinutes", piercingMinutes);
        requireMinutes("rapidMinutes", rapidMinutes);
        requireMinutes("handlingMinutes", handlingMinutes);
    }

    /** An estimate of no work. */
    public static CutTimeEstimate zero() {
        return new CutTimeEstimate(0, 0, 0, 0);
    }

    /** Applies the formula to the given work and rates. */
    public static CutTimeEstimate of(CutWork work, CutRates rates) {
        Objects.requireNonNull(work, "work");
        Objects.requireNonNull(rates, "rates");
        return new CutTimeEstimate(
                work.cutLengthMm() / rates.cutSpeedMmPerMin(),
                work.pierceCount() * (rates.pierceSeconds() + rates.heightSenseSeconds()) / SECONDS_PER_MINUTE,
                work.rapidLengthMm() / rates.rapidMmPerMin(),
                work.sheetCount() * rates.loadMinutesPerSheet());
    }

    /**
     * Estimates work in a material with the rates from a chart.
     *
     * @throws CutDataOutOfRange if the chart does not cover the material's thickness
     */
    public static CutTimeEstimate estimate(CutChart chart, CuttingProcess process, Material material, CutWork work) {
        return of(work, CutRates.from(chart, process, material));
    }

    /** Total minutes: the sum of the four terms. */
    public double totalMinutes() {
        return cuttingMinutes + piercingMinutes + rapidMinutes + handlingMinutes;
    }

    /** Total seconds. */
    public double totalSeconds() {
        return totalMinutes() * SECONDS_PER_MINUTE;
    }

    /** Term-by-term sum of two estimates. */
    public CutTimeEstimate plus(CutTimeEstimate other) {
        Objects.requireNonNull(other, "other");
        return new CutTimeEstimate(cuttingMinutes + other.cuttingMinutes, piercingMinutes + other.piercingMinutes,
                rapidMinutes + other.rapidMinutes, handlingMinutes + other.handlingMinutes);
    }

    private static void requireMinutes(String name, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, was " + v);
        }
    }
}
