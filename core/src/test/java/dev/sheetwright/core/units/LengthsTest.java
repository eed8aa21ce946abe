package dev.sheetwright.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class LengthsTest {

    @Test
    void parse_ticketForms() {
        assertEquals(18.875, Lengths.parse("18 7/8"));
        assertEquals(0.375, Lengths.parse("3/8"));
        assertEquals(12.5, Lengths.parse("12-1/2"));
        assertEquals(12.5, Lengths.parse(" 12.5 "));
        assertEquals(-1.25, Lengths.parse("-1 1/4"));
        assertEquals(0.5, Lengths.parse(".5"));
    }

    @Test
    void parse_garbage_namesTheText() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Lengths.parse("12 in"));
        assertEquals("'12 in' is not a number; write a decimal (12.5), a fraction (3/8) or a mixed number"
                + " (18 7/8 or 12-1/2)", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Lengths.parse("3/0"));
    }
}
