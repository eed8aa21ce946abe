package dev.sheetwright.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class FractionFormatTest {

    @Test
    void decimal_trimsTrailingZeros() {
        assertEquals("47.938", FractionFormat.decimal(47.9375, 3));
        assertEquals("48", FractionFormat.decimal(48.0, 3));
        assertEquals("1200", FractionFormat.decimal(1200.0, 1));
        assertEquals("1217.6", FractionFormat.decimal(1217.6125, 1));
    }

    @Test
    void decimal_roundsTheNumberAsWritten() {
        assertEquals("2.68", FractionFormat.decimal(2.675, 2));
        assertEquals("1.001", FractionFormat.decimal(1.0005, 3));
        assertEquals("-1.5", FractionFormat.decimal(-1.5, 2));
    }

    @Test
    void decimal_zero_hasNoSign() {
        assertEquals("0", FractionFormat.decimal(-0.0001, 2));
        assertEquals("0", FractionFormat.decimal(-0.0, 2));
        assertEquals("0", FractionFormat.decimal(0.0, 3));
    }

    @Test
    void format_nearestSixteenth_reduced() {
        FractionFormat f = FractionFormat.SIXTEENTHS;
        assertEquals("18 7/8", f.format(18.8496));
        assertEquals("3/8", f.format(0.375));
        assertEquals("47 15/16", f.format(47.9375));
        assertEquals("1/2", f.format(0.5));
        assertEquals("30 1/4", f.format(30.26));
        assertEquals("48", f.format(47.99));
        assertEquals("12", f.format(11.98));
        assertEquals("0", f.format(0.01));
        assertEquals("-1 1/2", f.format(-1.5));
        assertEquals("0", f.format(-0.01));
        assertEquals("2 7/16", f.format(2.4115)); // Coey's drawn gore height [S:COEY] via trade-reference §3.5(a)
        assertEquals("14 15/32", new FractionFormat(32).format(14.4693));
    }
}
