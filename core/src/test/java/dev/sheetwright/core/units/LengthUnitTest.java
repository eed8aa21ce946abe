package dev.sheetwright.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LengthUnitTest {

    @Test
    void inch_convertsByTheExactRatio_givingTheNearestDouble() {
        assertEquals(1219.2, LengthUnit.INCH.toMm(48)); // 48 * 25.4 would give 1219.1999999999998
        assertEquals(762.0, LengthUnit.INCH.toMm(30));
        assertEquals(1217.6125, LengthUnit.INCH.toMm(47.9375));
        assertEquals(48.0, LengthUnit.INCH.fromMm(1219.2));
        assertEquals(25.4, LengthUnit.INCH.mmPerUnit());
    }

    @Test
    void millimetre_isTheIdentity() {
        assertEquals(2.5, LengthUnit.MILLIMETRE.toMm(2.5));
        assertEquals(2.5, LengthUnit.MILLIMETRE.fromMm(2.5));
        assertEquals(1.0, LengthUnit.MILLIMETRE.mmPerUnit());
        assertEquals(7.0, LengthUnit.MILLIMETRE.areaFromMm2(7.0));
    }

    @Test
    void area_squareInch_is645point16mm2() {
        assertEquals(1.0, LengthUnit.INCH.areaFromMm2(645.16), 1e-12);
        assertEquals(1440.0, LengthUnit.INCH.areaFromMm2(LengthUnit.INCH.toMm(48) * LengthUnit.INCH.toMm(30)), 1e-9);
    }

    @Test
    void convert_goesThroughMm() {
        assertEquals(1219.2, LengthUnit.MILLIMETRE.convert(48, LengthUnit.INCH));
        assertEquals(48.0, LengthUnit.INCH.convert(1219.2, LengthUnit.MILLIMETRE));
        assertEquals(3.0, LengthUnit.INCH.convert(3.0, LengthUnit.INCH));
    }

    @Test
    void parse_symbolsAndWords() {
        assertEquals(LengthUnit.INCH, LengthUnit.parse(" Inches "));
        assertEquals(LengthUnit.MILLIMETRE, LengthUnit.parse("mm"));
    }
}
