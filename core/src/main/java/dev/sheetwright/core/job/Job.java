package dev.sheetwright.core.job;

import dev.sheetwright.core.develop.DevelopContext;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.units.LengthUnit;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A whole job file: name, unit, material, which face ticket sizes are on, the fittings, how to cut and what
 * stock to cut from. All lengths are in {@code unit}.
 */
public record Job(String name, LengthUnit unit, Material material, DimensionFace dimensions,
        List<FittingSpec> fittings, CuttingRules cutting, Stock stock, Tolerance tolerance) {

    public Job {
        fittings = List.copyOf(fittings);
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("job name must not be blank");
        }
        if (fittings.isEmpty()) {
            throw new IllegalArgumentException("a job needs at least one fitting");
        }
        Set<String> ids = new HashSet<>();
        for (FittingSpec f : fittings) {
            if (!ids.add(f.id())) {
                throw new IllegalArgumentException("fitting id '" + f.id() + "' is used twice");
            }
        }
    }

    /** Metal thickness in the job's unit. */
    public double thickness() {
        return unit.fromMm(material.thicknessMm());
    }

    public DevelopContext developContext() {
        return new DevelopContext(unit, thickness(), dimensions, tolerance);
    }
}
