package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.MaterialType;
import java.util.Objects;

/**
 * One row of a cut chart: for a process, material family and thickness, the production cut speed, the pierce delay
 * and the height-sensing time per start, with the source of the numbers ({@code [S:...]} tag, {@code common practice},
 * {@code from memory} or {@code shop}).
 */
public record CutChartRow(CuttingProcess process, MaterialType material, double thicknessMm,
                          double speedMmPerMin, double pierceSeconds, double heightSenseSeconds, String source) {

    /** Thickest material a cut chart row may describe, mm. */
    public static final double MAX_THICKNESS_MM = 50.0;

    public CutChartRow {
        Objects.requireNonNull(process, "process");
        Objects.requireNonNull(material, "material");
        if (!(thicknessMm > 0 && thicknessMm <= MAX_THICKNESS_MM)) {
            throw new IllegalArgumentException("thicknessMm must be > 0 and <= " + MAX_THICKNESS_MM
                    + " mm, was " + thicknessMm);
        }
        if (!(speedMmPerMin > 0) || !Double.isFinite(speedMmPerMin)) {
            throw new IllegalArgumentException("speedMmPerMin must be finite and > 0, was " + speedMmPerMin);
        }
        if (!(pierceSeconds >= 0) || !Double.isFinite(pierceSeconds)) {
            throw new IllegalArgumentException("pierceSeconds must be finite and >= 0, was " + pierceSeconds);
        }
        if (!(heightSenseSeconds >= 0) || !Double.isFinite(heightSenseSeconds)) {
            throw new IllegalArgumentException("heightSenseSeconds must be finite and >= 0, was "
                    + heightSenseSeconds);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /** True if this row has the same process, material and thickness as {@code other}. */
    public boolean sameKey(CutChartRow other) {
        return process == other.process && material == other.material
                && Double.compare(thicknessMm, other.thicknessMm) == 0;
    }

    /** Seconds spent at each start: pierce delay plus height sensing. */
    public double startSeconds() {
        return pierceSeconds + heightSenseSeconds;
    }
}
