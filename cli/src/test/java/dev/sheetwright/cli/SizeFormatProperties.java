package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

class SizeFormatProperties {
    /** Reads "W N/D" back into sixteenths. */
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

    @Property
    void fraction_readsBackToTheNearestSixteenth(@ForAll @IntRange(min = 0, max = 16 * 400) int n,
                                                 @ForAll @IntRange(min = -49, max = 49) int noise) {
        double inches = n / 16.0 + noise / 1600.0;

        assertEquals(n, sixteenths(SizeFormat.fraction(inches)));
    }
}
