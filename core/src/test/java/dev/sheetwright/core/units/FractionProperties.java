package dev.sheetwright.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

    @Property
    void format_isTheNearestSixteenth_reduced(@ForAll @IntRange(min = 0, max = 16 * 400) int n,
                                               @ForAll @IntRange(min = -49, max = 49) int noise) {
        double inches = n / 16.0 + noise / 1600.0;

        assertEquals(n, sixteenths(FractionFormat.SIXTEENTHS.format(inches)));
    }

    /** Reads "W N/D" back into sixteenths, checking the fraction is reduced and in halves to sixteenths. */
    private static long sixteenths(String text) {
        String[] parts = text.split(" ");
        long whole = 0;
        String frac = parts[parts.length - 1];
        if (parts.length == 2 || !frac.contains("/")) {
            whole = Long.parseLong(parts[0]);
        }
        if (frac.contains("/")) {
            String[] nd = frac.split("/");
            long den = Long.parseLong(nd[1]);
            assertTrue(den == 2 || den == 4 || den == 8 || den == 16, text);
            assertTrue(Long.parseLong(nd[0]) % 2 == 1, "not reduced: " + text);
            return whole * 16 + Long.parseLong(nd[0]) * (16 / den);
        }
        return whole * 16;
    }
}
