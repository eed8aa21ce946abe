package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class CuttingProcessTest {

    @Test
    void parse_anyCase_readsTheWord() {
        assertEquals(CuttingProcess.PLASMA, CuttingProcess.parse("Plasma"));
        assertEquals(CuttingProcess.LASER, CuttingProcess.parse(" LASER"));
    }

    @Test
    void parse_unknownWord_listsTheValidWords() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CuttingProcess.parse("waterjet"));
        assertEquals("cutting process 'waterjet' is not known; valid words: plasma, laser", e.getMessage());
    }

    @Test
    void word_everyProcess_parsesBackToItself() {
        for (CuttingProcess p : CuttingProcess.values()) {
            assertEquals(p, CuttingProcess.parse(p.word()));
        }
    }
}
