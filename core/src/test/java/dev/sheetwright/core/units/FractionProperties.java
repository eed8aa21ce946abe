package dev.sheetwright.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

class FractionProperties {

    @Property
    void format_thenParse_givesTheRoundedValue(@ForAll @DoubleRange(min = -500, max = 500) double v) {
        FractionFormat f = FractionFormat.SIXTEENTHS;
        assertEquals(f.rounded(v), Lengths.parse(f.format(v)), 1e-12);
    }

    @Property
    void exactSixteenths_roundTripExactly(@ForAll @IntRange(min = 0, max = 20000) int sixteenths) {
        double v = sixteenths / 16.0;
        assertEquals(v, Lengths.parse(FractionFormat.SIXTEENTHS.format(v)), 0);
    }
}
