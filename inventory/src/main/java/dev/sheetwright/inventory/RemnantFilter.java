package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;

/**
 * Which remnants a listing or a reservation considers. A null field matches everything.
 *
 * <p>Gauge and thickness are matched as recorded: a filter on gauge does not match a remnant recorded
 * only by thickness, and the other way round (gauge tables belong to the core module). Thickness matches
 * within {@value #THICKNESS_MATCH_MM} mm.
 *
 * @param material    only this material, or null
 * @param gauge       only this gauge, or null
 * @param thicknessMm only this thickness (mm), or null
 * @param minAreaMm2  only remnants of at least this area (mm²), or null
 * @param includeUsed whether listings include remnants already used; reservations never take used ones
 */
public record RemnantFilter(MaterialType material, Integer gauge, Double thicknessMm, Double minAreaMm2,
                            boolean includeUsed) {
    /** Two thicknesses closer than this (mm) are the same thickness. */
    public static final double THICKNESS_MATCH_MM = 0.005;

    public RemnantFilter {
        if (gauge != null && (gauge < NewRemnant.MIN_GAUGE || gauge > NewRemnant.MAX_GAUGE)) {
            throw new IllegalArgumentException("gauge: " + gauge + " is out of range; must be "
                    + NewRemnant.MIN_GAUGE + " to " + NewRemnant.MAX_GAUGE);
        }
        if (thicknessMm != null && (!Double.isFinite(thicknessMm) || thicknessMm <= 0.0)) {
            throw new IllegalArgumentException("thickness_mm: " + thicknessMm + " is out of range; must be > 0");
        }
        if (minAreaMm2 != null && (!Double.isFinite(minAreaMm2) || minAreaMm2 < 0.0)) {
            throw new IllegalArgumentException("min_area_mm2: " + minAreaMm2 + " is out of range; must be >= 0");
        }
    }

    /** Every remnant that is not used. */
    public static RemnantFilter any() {
        return new RemnantFilter(null, null, null, null, false);
    }

    public RemnantFilter withMaterial(MaterialType m) {
        return new RemnantFilter(m, gauge, thicknessMm, minAreaMm2, includeUsed);
    }

    public RemnantFilter withGauge(Integer g) {
        return new RemnantFilter(material, g, thicknessMm, minAreaMm2, includeUsed);
    }

    public RemnantFilter withThicknessMm(Double t) {
        return new RemnantFilter(material, gauge, t, minAreaMm2, includeUsed);
    }

    public RemnantFilter withMinAreaMm2(Double a) {
        return new RemnantFilter(material, gauge, thicknessMm, a, includeUsed);
    }

    public RemnantFilter withIncludeUsed(boolean u) {
        return new RemnantFilter(material, gauge, thicknessMm, minAreaMm2, u);
    }
}
