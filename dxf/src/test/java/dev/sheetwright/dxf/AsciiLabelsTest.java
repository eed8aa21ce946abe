package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AsciiLabelsTest {

    @Test
    void forDxf_plainAscii_unchanged() {
        assertEquals("P1 CONE R100/R200 120DEG x=5 {a} ~", AsciiLabels.forDxf("P1 CONE R100/R200 120DEG x=5 {a} ~"));
    }

    @Test
    void forDxf_lineBreaksAndControls_becomeQuestionMarks() {
        assertEquals("A?B??C?D?E", AsciiLabels.forDxf("A\nB\r\nC\tD\u0000E"));
        assertEquals("A?B?C", AsciiLabels.forDxf("A\u2028B\u0085C"));
    }

    @Test
    void forDxf_groupCodeInjection_staysOnOneLine() {
        String attack = "P1\r\n  0\r\nEOF\r\n  0\r\nLINE";
        String safe = AsciiLabels.forDxf(attack);
        assertEquals("P1??  0??EOF??  0??LINE", safe);
        assertTrue(safe.chars().allMatch(c -> c >= 0x20 && c <= 0x7E));
    }

    @Test
    void forDxf_nonAscii_closeAsciiOrQuestionMark() {
        assertEquals("120DEG", AsciiLabels.forDxf("120\u00B0"));
        assertEquals("DIA50 DIA80", AsciiLabels.forDxf("\u00D850 \u230080"));
        assertEquals("Lotnaht a 1/2 in", AsciiLabels.forDxf("L\u00F6tnaht \u00E0 \u00BD in"));
        assertEquals("200x100 +/-1 - 'a' \"b\"",
                AsciiLabels.forDxf("200\u00D7100 \u00B11 \u2013 \u2018a\u2019 \u201Cb\u201D"));
        assertEquals("Strasse 2 fi", AsciiLabels.forDxf("Stra\u00DFe\u00A0\u00B2 \uFB01"));
        assertEquals("?? ?", AsciiLabels.forDxf("\u65E5\u672C \uD83D\uDD27"), "one ? per code point");
        assertEquals("a?b", AsciiLabels.forDxf("a\uD800b"), "unpaired surrogate");
    }

    @Test
    void forDxf_percentAndCaretSequences_cannotReachTheReader() {
        // R12 reads %%d as a degree sign and ^J as a control character; "^ " is a literal caret
        assertEquals("100%d", AsciiLabels.forDxf("100%%d"));
        assertEquals("50% off, %", AsciiLabels.forDxf("50% off, %%%"));
        assertEquals("a^ Jb^ ", AsciiLabels.forDxf("a^Jb^"));
    }

    @Test
    void forDxf_tooLong_cutTo255Characters() {
        assertEquals(AsciiLabels.MAX_LENGTH, AsciiLabels.forDxf("x".repeat(300)).length());
        String carets = AsciiLabels.forDxf("^".repeat(200));
        assertEquals(254, carets.length(), "127 escaped carets; a half escape is never written");
        assertTrue(carets.endsWith("^ "));
    }
}
