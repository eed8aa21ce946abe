package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.MaterialType;
import java.util.Locale;

/**
 * Thrown when cut data is asked for a thickness the cut chart does not cover (or a process and material it has no rows
 * for). Cut data is never extrapolated: add rows for the machine instead.
 */
public final class CutDataOutOfRange extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final CuttingProcess process;
    private final MaterialType material;
    private final double thicknessMm;

    private CutDataOutOfRange(String message, CuttingProcess process, MaterialType material, double thicknessMm) {
        super(message);
        this.process = process;
        this.material = material;
        this.thicknessMm = thicknessMm;
    }

    static CutDataOutOfRange outside(CuttingProcess process, MaterialType material, double thicknessMm,
                                     double minMm, double maxMm) {
        return new CutDataOutOfRange(String.format(Locale.ROOT,
                "thicknessMm %.3f is outside the %s cut chart for %s (%.3f to %.3f mm); cut data is never"
                        + " extrapolated", thicknessMm, process.word(), material.word(), minMm, maxMm),
                process, material, thicknessMm);
    }

    static CutDataOutOfRange noRows(CuttingProcess process, MaterialType material, double thicknessMm) {
        return new CutDataOutOfRange(String.format(Locale.ROOT,
                "the %s cut chart has no rows for %s (asked for thicknessMm %.3f); add rows for this machine",
                process.word(), material.word(), thicknessMm), process, material, thicknessMm);
    }

    public CuttingProcess process() {
        return process;
    }

    public MaterialType material() {
        return material;
    }

    public double thicknessMm() {
        return thicknessMm;
    }
}
