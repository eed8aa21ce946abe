package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class OrdinatesTest {

    @Test
    void length_ordinaryValues_fixedPointWithTrailingZerosTrimmed() {
        assertEquals("12.5", Ordinates.length(12.5));
        assertEquals("100", Ordinates.length(100));
        assertEquals("0", Ordinates.length(0));
        assertEquals("-3.25", Ordinates.length(-3.25));
        assertEquals("0.1", Ordinates.length(0.1));
        assertEquals("0.333333", Ordinates.length(1.0 / 3));
        assertEquals("0.666667", Ordinates.length(2.0 / 3));
        assertEquals("86.794919", Ordinates.length(260 + 200 * Math.cos(Math.toRadians(150))));
    }

    @Test
    void length_tinyAndHugeValues_neverUseAnExponent() {
        // Double.toString would give 1.0E-4, 1.0E15 and 1.23456789E10
        assertEquals("0.0001", Ordinates.length(1e-4));
        assertEquals("0.000001", Ordinates.length(1e-6));
        assertEquals("1000000000000000", Ordinates.length(1e15));
        assertEquals("12345678900", Ordinates.length(1.23456789e10));
        assertEquals("0", Ordinates.length(Double.MIN_VALUE));
    }

    @Test
    void length_negativeZeroAndTinyNegatives_writtenAsZero() {
        assertEquals("0", Ordinates.length(-0.0));
        assertEquals("0", Ordinates.length(-1e-9));
        assertEquals("-0.000001", Ordinates.length(-1e-6));
    }

    @Test
    void length_underGermanLocale_stillUsesPointAndNoGrouping() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("1,5", String.format("%.1f", 1.5), "the JVM really formats the German way now");
            assertEquals("1234567.125", Ordinates.length(1234567.125));
            assertEquals("-0.5", Ordinates.length(-0.5));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void bulge_tenDecimals() {
        // bulge of a 120 degree arc = tan(30 deg); DXF bulge definition via README-dxfcheck.md (common practice)
        assertEquals("0.5773502692", Ordinates.bulge(Math.tan(Math.toRadians(30))));
        assertEquals("1", Ordinates.bulge(1));
        assertEquals("-0.0000000001", Ordinates.bulge(-1e-10));
    }

    @Test
    void length_nonFinite_rejectedWithMessage() {
        assertEquals("number to write must be finite, got NaN",
                assertThrows(IllegalArgumentException.class, () -> Ordinates.length(Double.NaN)).getMessage());
        assertEquals("number to write must be finite, got Infinity",
                assertThrows(IllegalArgumentException.class,
                        () -> Ordinates.length(Double.POSITIVE_INFINITY)).getMessage());
        assertEquals("number to write must be finite, got -Infinity",
                assertThrows(IllegalArgumentException.class,
                        () -> Ordinates.bulge(Double.NEGATIVE_INFINITY)).getMessage());
    }
}
