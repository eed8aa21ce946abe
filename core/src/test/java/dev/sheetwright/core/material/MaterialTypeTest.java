package dev.sheetwright.core.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class MaterialTypeTest {

    @Test
    void parse_anyCaseAndBlanks_readsTheWord() {
        assertEquals(MaterialType.GALVANIZED, MaterialType.parse("Galvanized"));
        assertEquals(MaterialType.STEEL, MaterialType.parse(" STEEL "));
        assertEquals(MaterialType.STAINLESS, MaterialType.parse("stainless"));
        assertEquals(MaterialType.ALUMINUM, MaterialType.parse("aluminum"));
    }

    @Test
    void parse_britishSpelling_readsAluminum() {
        assertEquals(MaterialType.ALUMINUM, MaterialType.parse("Aluminium"));
    }

    @Test
    void parse_unknownWord_listsTheValidWords() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MaterialType.parse("brass"));
        assertEquals("material 'brass' is not known; valid words: galvanized, steel, stainless, aluminum"
                + " (or aluminium)", e.getMessage());
    }

    @Test
    void parse_null_listsTheValidWords() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MaterialType.parse(null));
        assertEquals("material must not be null; valid words: galvanized, steel, stainless, aluminum"
                + " (or aluminium)", e.getMessage());
    }

    @Test
    void word_everyType_parsesBackToItself() {
        for (MaterialType t : MaterialType.values()) {
            assertEquals(t, MaterialType.parse(t.word()));
        }
    }
}
