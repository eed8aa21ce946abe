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

    @Test
    void parseSize_ticketForms() {
        assertEquals(java.util.List.of(48.0, 120.0), boxed(Lengths.parseSize("48x120")));
        assertEquals(java.util.List.of(47.9375, 30.0), boxed(Lengths.parseSize("47 15/16 x 30")));
        assertEquals(java.util.List.of(12.5, 96.0), boxed(Lengths.parseSize("12-1/2 X 96")));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Lengths.parseSize("48 by 120"));
        assertEquals("'48 by 120' is not a size; write W x L, e.g. 48x120", e.getMessage());
    }

    private static java.util.List<Double> boxed(double[] v) {
        return java.util.List.of(v[0], v[1]);
    }
}
