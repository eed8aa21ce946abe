package dev.sheetwright.core.quote;

import dev.sheetwright.core.material.UnitFactors;
import dev.sheetwright.core.units.LengthUnit;

/** The weight unit of a quote: pounds for inch jobs, kilograms for millimetre jobs. */
public enum MassUnit {
    LB("lb", UnitFactors.KG_PER_LB),
    KG("kg", 1.0);

    private final String symbol;
    private final double kg;

    MassUnit(String symbol, double kg) {
        this.symbol = symbol;
        this.kg = kg;
    }

    public String symbol() {
        return symbol;
    }

    /** Kilograms in one of this unit (1 lb = 0.45359237 kg exactly). */
    public double kg() {
        return kg;
    }

    /** Pounds for inch jobs, kilograms for millimetre jobs. */
    public static MassUnit of(LengthUnit unit) {
        return unit == LengthUnit.INCH ? LB : KG;
    }
}
