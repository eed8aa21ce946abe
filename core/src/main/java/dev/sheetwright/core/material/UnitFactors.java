package dev.sheetwright.core.material;

/**
 * The exact conversion factors used by the material and cutting arithmetic, kept in one place.
 *
 * <p>1 in = 25.4 mm is exact by definition. 1 lb/ft² = 0.45359237 kg / 0.09290304 m² = 4.88242764 kg/m²
 * (computed from the exact definitions of the pound and the foot).
 */
public final class UnitFactors {

    /** Millimetres per inch (exact). */
    public static final double MM_PER_IN = 25.4;

    /** Square inches per square foot (exact). */
    public static final double IN2_PER_FT2 = 144.0;

    /** Square millimetres per square metre (exact). */
    public static final double MM2_PER_M2 = 1_000_000.0;

    /** Kilograms per square metre for one pound per square foot (computed from exact definitions). */
    public static final double KG_PER_M2_PER_LB_PER_FT2 = 4.88242764;

    /** Kilograms per pound (exact by definition). */
    public static final double KG_PER_LB = 0.45359237;

    private UnitFactors() {
    }
}
