package dev.sheetwright.core.material;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * One sheet material as used on a job: family, gauge (when chosen by gauge), nominal decimal thickness, nominal
 * weight per square foot, and where those numbers come from.
 *
 * <p>Make one with {@link #ofGauge(MaterialType, int)} (numbers from that family's {@link GaugeTable}),
 * {@link #ofThickness(MaterialType, double)} or {@link #ofThicknessMm(MaterialType, double)} (weight from the
 * family's lb/ft² per inch basis).
 */
public record Material(MaterialType type, OptionalInt gauge, double thicknessIn, double weightLbPerFt2,
                       String source) {

    /** Thinnest sheet accepted, inches (exclusive lower bound is 0; this is the inclusive lower bound). */
    public static final double MIN_THICKNESS_IN = 0.001;
    /** Thickest plate accepted, inches. */
    public static final double MAX_THICKNESS_IN = 1.0;

    public Material {
        Objects.requireNonNull(type, "type");
        Objects.requireNonNull(gauge, "gauge");
        if (gauge.isPresent() && (gauge.getAsInt() < 1 || gauge.getAsInt() > 40)) {
            throw new IllegalArgumentException("gauge must be 1 to 40, was " + gauge.getAsInt());
        }
        if (!(thicknessIn >= MIN_THICKNESS_IN && thicknessIn <= MAX_THICKNESS_IN)) {
            throw new IllegalArgumentException("thicknessIn must be " + MIN_THICKNESS_IN + " to " + MAX_THICKNESS_IN
                    + " in, was " + thicknessIn);
        }
        if (!(weightLbPerFt2 > 0) || !Double.isFinite(weightLbPerFt2)) {
            throw new IllegalArgumentException("weightLbPerFt2 must be finite and > 0, was " + weightLbPerFt2);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }

    /**
     * The material of a given gauge, with the nominal thickness and weight of that gauge's table row.
     *
     * @throws IllegalArgumentException naming the material, the gauge and the gauges the table has
     */
    public static Material ofGauge(MaterialType type, int gauge) {
        Objects.requireNonNull(type, "type");
        GaugeRow row = GaugeTable.of(type).row(gauge);
        return new Material(type, OptionalInt.of(gauge), row.nominalIn(), row.lbPerFt2(), row.source());
    }

    /** A material given by decimal thickness in inches; weight from the family's lb/ft² per inch basis. */
    public static Material ofThickness(MaterialType type, double thicknessIn) {
        Objects.requireNonNull(type, "type");
        if (!(thicknessIn >= MIN_THICKNESS_IN && thicknessIn <= MAX_THICKNESS_IN)) {
            throw new IllegalArgumentException("thicknessIn must be " + MIN_THICKNESS_IN + " to " + MAX_THICKNESS_IN
                    + " in, was " + thicknessIn);
        }
        GaugeTable table = GaugeTable.of(type);
        return new Material(type, OptionalInt.empty(), thicknessIn, table.lbPerFt2Of(thicknessIn),
                table.basisSource());
    }

    /** A material given by decimal thickness in millimetres; see {@link #ofThickness(MaterialType, double)}. */
    public static Material ofThicknessMm(MaterialType type, double thicknessMm) {
        double minMm = MIN_THICKNESS_IN * UnitFactors.MM_PER_IN;
        double maxMm = MAX_THICKNESS_IN * UnitFactors.MM_PER_IN;
        if (!(thicknessMm >= minMm && thicknessMm <= maxMm)) {
            throw new IllegalArgumentException("thicknessMm must be " + minMm + " to " + maxMm
                    + " mm, was " + thicknessMm);
        }
        return ofThickness(type, thicknessMm / UnitFactors.MM_PER_IN);
    }

    /** The gauge-table row this material was taken from, if it was chosen by gauge. */
    public Optional<GaugeRow> gaugeRow() {
        return gauge.isPresent() ? GaugeTable.of(type).find(gauge.getAsInt()) : Optional.empty();
    }

    /** Nominal thickness in millimetres. */
    public double thicknessMm() {
        return thicknessIn * UnitFactors.MM_PER_IN;
    }

    /** Nominal weight in kg/m². */
    public double weightKgPerM2() {
        return weightLbPerFt2 * UnitFactors.KG_PER_M2_PER_LB_PER_FT2;
    }

    /** Weight in pounds of a flat piece of the given area in square inches. */
    public double weightLbOf(double areaIn2) {
        requireArea("areaIn2", areaIn2);
        return areaIn2 / UnitFactors.IN2_PER_FT2 * weightLbPerFt2;
    }

    /** Weight in kilograms of a flat piece of the given area in square millimetres. */
    public double weightKgOfMm2(double areaMm2) {
        requireArea("areaMm2", areaMm2);
        return areaMm2 / UnitFactors.MM2_PER_M2 * weightKgPerM2();
    }

    /** A short label, e.g. {@code "galvanized 24 ga (0.0276 in)"} or {@code "aluminum 0.0400 in (1.016 mm)"}. */
    public String describe() {
        if (gauge.isPresent()) {
            return String.format(Locale.ROOT, "%s %d ga (%.4f in)", type.word(), gauge.getAsInt(), thicknessIn);
        }
        return String.format(Locale.ROOT, "%s %.4f in (%.3f mm)", type.word(), thicknessIn, thicknessMm());
    }

    private static void requireArea(String name, double area) {
        if (!(area >= 0) || !Double.isFinite(area)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, was " + area);
        }
    }
}
