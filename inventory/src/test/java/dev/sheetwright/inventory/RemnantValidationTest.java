package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.units.LengthUnit;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RemnantValidationTest {
    @TempDir
    Path dir;

    @Test
    void rectangle_negativeWidth_namesFieldValueAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RemnantOutline.rectangle(-5, 300));
        assertEquals("width_mm: -5.0 is out of range; must be > 0 and at most 100000 mm", e.getMessage());
    }

    @Test
    void rectangle_zeroHeight_isRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RemnantOutline.rectangle(5, 0));
        assertEquals("height_mm: 0.0 is out of range; must be > 0 and at most 100000 mm", e.getMessage());
    }

    @Test
    void of_bowtie_isRejectedAsSelfIntersecting() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RemnantOutline.parse("0,0 100,100 100,0 0,100"));
        assertEquals("outline: 0,0 100,100 100,0 0,100 is not a simple polygon (self-intersection at (50,50));"
                + " edges must not cross or touch", e.getMessage());
    }

    @Test
    void of_twoPoints_isRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RemnantOutline.parse("0,0 100,100"));
        assertEquals("outline: has 2 point(s); a polygon needs at least 3", e.getMessage());
    }

    @Test
    void of_collinearPoints_isRejected() {
        assertThrows(IllegalArgumentException.class, () -> RemnantOutline.parse("0,0 50,0 100,0"));
    }

    @Test
    void of_clockwiseOffsetPolygon_isMovedToOriginAndWoundCounterClockwise() {
        RemnantOutline o = RemnantOutline.parse("10,10 10,40 60,40 60,10 10,10");

        assertEquals(RemnantOutline.rectangle(50, 30).vertices().size(), o.vertices().size());
        assertEquals(true, o.isRectangle());
        assertEquals(50.0, o.widthMm());
        assertEquals(30.0, o.heightMm());
        assertEquals(1500.0, o.areaMm2());
        assertEquals(List.of(OutlinePoint.of(0, 0), OutlinePoint.of(50, 0), OutlinePoint.of(50, 30),
                OutlinePoint.of(0, 30)), o.vertices());
    }

    @Test
    void newRemnant_neitherGaugeNorThickness_isRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new NewRemnant(
                MaterialType.STEEL, null, null, RemnantOutline.rectangle(1, 1), "", null));
        assertEquals("gauge/thickness_mm: both are missing; give a gauge or a thickness", e.getMessage());
    }

    @Test
    void newRemnant_gaugeOutOfRange_namesRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NewRemnant.manual(
                MaterialType.STEEL, 60, RemnantOutline.rectangle(1, 1), ""));
        assertEquals("gauge: 60 is out of range; must be 1 to 38", e.getMessage());
    }

    @Test
    void newRemnant_negativeThickness_namesRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NewRemnant.manualMm(
                MaterialType.STEEL, -0.5, RemnantOutline.rectangle(1, 1), ""));
        assertEquals("thickness_mm: -0.5 is out of range; must be > 0 and at most 25 mm", e.getMessage());
    }

    @Test
    void store_afterRejectedInputs_isUnchanged() {
        TestRack rack = TestRack.make(TestRack.Kind.SQLITE, dir, "r.db");
        try (RemnantStore store = rack.open()) {
            store.add(NewRemnant.manual(MaterialType.STEEL, 20, RemnantOutline.rectangle(100, 100), ""));
            List<String> before = rack.snapshot();

            assertThrows(IllegalArgumentException.class, () -> store.add(NewRemnant.manual(
                    MaterialType.parse("copper"), 20, RemnantOutline.rectangle(100, 100), "")));
            assertThrows(IllegalArgumentException.class, () -> store.add(NewRemnant.manual(
                    MaterialType.STEEL, 20, RemnantOutline.rectangle(-100, 100), "")));
            assertThrows(IllegalArgumentException.class, () -> store.add(NewRemnant.manual(
                    MaterialType.STEEL, 20, RemnantOutline.parse("0,0 10,10 10,0 0,10"), "")));
            assertThrows(IllegalArgumentException.class, () -> store.add(null));

            assertEquals(before, rack.snapshot());
            assertEquals(1, store.list(RemnantFilter.any(), RemnantSort.ID).size());
        }
    }

    @Test
    void open_folderInsteadOfFile_isRejected() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("folder"));
        RackAccessException e = assertThrows(RackAccessException.class, () -> RemnantStore.open(folder));
        assertEquals("inventory: " + folder + " is a folder; give a database file", e.getMessage());
    }

    @Test
    void newRemnant_gaugeAndThicknessDisagree_refusedNamingBoth() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new NewRemnant(
                MaterialType.GALVANIZED, 24, 6.35, RemnantOutline.rectangle(1117.6, 1117.6), "",
                RemnantSource.manual()));
        assertTrue(e.getMessage().startsWith("gauge/thickness_mm: galvanized 24 ga is 0.701 mm"), e.getMessage());
        assertTrue(e.getMessage().endsWith("but the thickness given is 6.350 mm; give the gauge or the thickness"
                + " that is right"), e.getMessage());
    }

    @Test
    void newRemnant_gaugeAndItsOwnTableThickness_accepted() {
        // 24 ga galvanized: 0.0276 in nominal [S:SMACNA-GALV] = 0.70104 mm
        NewRemnant r = new NewRemnant(MaterialType.GALVANIZED, 24, 0.70104, RemnantOutline.rectangle(100, 100), "",
                RemnantSource.manual());
        assertEquals(24, r.gauge());
    }

    @Test
    void newRemnant_gaugeMissingFromTheTable_refusedListingTheGauges() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NewRemnant.manual(
                MaterialType.GALVANIZED, 7, RemnantOutline.rectangle(100, 100), ""));
        assertTrue(e.getMessage().startsWith("gauge: 7 is not in the galvanized gauge table ("), e.getMessage());
        assertTrue(e.getMessage().contains("valid gauges: "), e.getMessage());
    }
}
