package dev.sheetwright.core.material;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One row of a gauge table: gauge number, nominal thickness, the published minimum and maximum thickness where the
 * source gives them, the nominal weight per square foot, and the source of the row.
 */
public record GaugeRow(int gauge, double nominalIn, OptionalDouble minIn, OptionalDouble maxIn,
                       double lbPerFt2, String source) {

    public GaugeRow {
        Objects.requireNonNull(minIn, "minIn");
        Objects.requireNonNull(maxIn, "maxIn");
        if (gauge < 1 || gauge > 40) {
            throw new IllegalArgumentException("gauge must be 1 to 40, was " + gauge);
        }
        if (!(nominalIn > 0) || !Double.isFinite(nominalIn)) {
            throw new IllegalArgumentException("nominalIn must be finite and > 0, was " + nominalIn);
        }
        if (minIn.isPresent() && !(minIn.getAsDouble() > 0 && minIn.getAsDouble() <= nominalIn)) {
            throw new IllegalArgumentException("minIn must be > 0 and <= nominalIn " + nominalIn
                    + ", was " + minIn.getAsDouble());
        }
        if (maxIn.isPresent() && !(maxIn.getAsDouble() >= nominalIn && Double.isFinite(maxIn.getAsDouble()))) {
            throw new IllegalArgumentException("maxIn must be finite and >= nominalIn " + nominalIn
                    + ", was " + maxIn.getAsDouble());
        }
        if (!(lbPerFt2 > 0) || !Double.isFinite(lbPerFt2)) {
            throw new IllegalArgumentException("lbPerFt2 must be finite and > 0, was " + lbPerFt2);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /** Nominal thickness in millimetres. */
    public double nominalMm() {
        return nominalIn * UnitFactors.MM_PER_IN;
    }
}
