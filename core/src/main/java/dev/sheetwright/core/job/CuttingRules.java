package dev.sheetwright.core.job;

import dev.sheetwright.core.cutting.CuttingProcess;

/**
 * How parts may be laid out on stock, from the job's {@code cutting:} section. Lengths in the job's unit.
 *
 * @param kerf width of the cut; spacing must exceed it
 * @param gap minimum distance between two parts
 * @param margin minimum distance from a part to the stock edge
 * @param rotationStep step in degrees when {@code rotation} is {@link RotationMode#STEP}, else 0
 * @param mirror whether parts may be turned over (off for material finished on one side)
 */
public record CuttingRules(CuttingProcess process, double kerf, double gap, double margin, RotationMode rotation,
        double rotationStep, boolean mirror) {

    public CuttingRules {
        if (process == null || rotation == null) {
            throw new IllegalArgumentException("cutting process and rotation must not be null");
        }
        if (!(kerf >= 0) || !(gap >= 0) || !(margin >= 0)) {
            throw new IllegalArgumentException("kerf, gap and margin must not be negative");
        }
        if (gap <= kerf && gap > 0) {
            throw new IllegalArgumentException("gap (" + gap + ") must exceed the kerf (" + kerf + ")");
        }
        if (rotation == RotationMode.STEP && !(rotationStep > 0 && rotationStep <= 180)) {
            throw new IllegalArgumentException("rotation step must be from 0 to 180 degrees, got " + rotationStep);
        }
    }
}
