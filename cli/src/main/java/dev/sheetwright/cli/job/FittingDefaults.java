package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.units.LengthUnit;

/**
 * What every fitting reader needs from the top of the job file: the job's unit, its allowance table and the job's
 * default allowances (seam, ends, notch and the elbow miter seam).
 */
record FittingDefaults(LengthUnit unit, AllowanceTable table, Allowances allowances, SeamAllowance miter) {

    FittingDefaults {
        if (unit == null || table == null || allowances == null || miter == null) {
            throw new IllegalArgumentException("fitting defaults must not be null");
        }
    }
}
