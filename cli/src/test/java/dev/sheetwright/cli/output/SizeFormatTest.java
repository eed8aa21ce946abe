package dev.sheetwright.cli.output;

import dev.sheetwright.core.units.LengthUnit;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class SizeFormatTest {
    private static final double EPS = 1e-9;

    @Test
    void length_inches_showsDecimalAndFraction() {
        assertEquals("47.938 (47 15/16)", SizeFormat.length(1217.6125, LengthUnit.INCH));
        assertEquals("48", SizeFormat.length(1219.2, LengthUnit.INCH));
        assertEquals("1217.6", SizeFormat.length(1217.6125, LengthUnit.MILLIMETRE));
    }

    @Test
    void parseSize_unitsAndSeparators_giveMm() {
        double[] wh = SizeText.parseSize("48 X 30", LengthUnit.INCH);
        assertEquals(1219.2, wh[0], EPS);
        assertEquals(762, wh[1], EPS);
        assertEquals(600, SizeText.parseSize("600x300", LengthUnit.MILLIMETRE)[0], EPS);
    }

    @Test
    void parseSize_malformed_namesOptionAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SizeText.parseSize("48", LengthUnit.INCH));
        assertEquals("--size: '48' is not a size; write WIDTHxHEIGHT, e.g. 48x30", e.getMessage());
        IllegalArgumentException n = assertThrows(IllegalArgumentException.class,
                () -> SizeText.parseSize("48xabc", LengthUnit.INCH));
        assertEquals("--size: '48xabc': 'abc' is not a number", n.getMessage());
    }

    @Test
    void parseLength_ownUnitWinsOverDefault() {
        assertEquals(0.8, SizeText.parseLength("--thickness", "0.8mm", LengthUnit.INCH), EPS);
        assertEquals(25.4, SizeText.parseLength("--thickness", "1in", LengthUnit.MILLIMETRE), EPS);
        assertEquals(25.4, SizeText.parseLength("--thickness", "1", LengthUnit.INCH), EPS);
    }
}
