package dev.sheetwright.core.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

class MaterialTest {

    /** Published tables give weights to 3 decimals (lb/ft²) and thickness to 4 (in). */
    private static final double EPS_TABLE = 5e-4;
    /** Arithmetic on exact inputs. */
    private static final double EPS = 1e-9;
    /** kg/m² values are printed to 2 decimals in the source table. */
    private static final double EPS_KG_PRINTED = 5e-3;
    /** Trade-reference §8.1 shows listed weights and 41.82 x t differing by up to 0.002 lb/ft2. */
    private static final double EPS_BASIS = 0.0025;

    private static final SheetSize SHEET_48_X_120 = SheetSize.ofInches(48, 120, "common practice");

    @Test
    void ofGauge_galvanized24_weighs1156LbPerFt2() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        // [S:LONG p.102] [S:SMACNA-GALV] via trade-reference §8.1 and §11 check 6
        assertEquals(1.156, m.weightLbPerFt2(), EPS_TABLE);
        assertEquals(OptionalInt.of(24), m.gauge());
    }

    @Test
    void ofGauge_galvanized26_weighs0906LbPerFt2() {
        // [S:SMACNA-GALV] via trade-reference §8.1
        assertEquals(0.906, Material.ofGauge(MaterialType.GALVANIZED, 26).weightLbPerFt2(), EPS_TABLE);
    }

    @Test
    void ofGauge_galvanizedOdd25_weighs41_82TimesThickness() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 25);
        // [S:SMACNA-GALV] thickness, weight computed 41.82 x t via trade-reference §8.1
        assertEquals(0.0247, m.thicknessIn(), EPS);
        assertEquals(41.82 * 0.0247, m.weightLbPerFt2(), EPS);
        // the listed 1.031 lb/ft2 [S:COATED] is 0.002 below 41.82 x t, the same spread as the even gauges
        assertEquals(1.031, m.weightLbPerFt2(), EPS_BASIS);
        assertTrue(m.gaugeRow().orElseThrow().minIn().isEmpty());
    }

    @Test
    void ofGauge_steel10_isMsg01345In5625Lb() {
        Material m = Material.ofGauge(MaterialType.STEEL, 10);
        // [S:MSG-OFF] via trade-reference §8.1 and §11 check 8
        assertEquals(0.1345, m.thicknessIn(), EPS);
        assertEquals(5.625, m.weightLbPerFt2(), EPS_TABLE);
    }

    @Test
    void ofGauge_steel16_isMsgSeries() {
        // from memory: standard MSG series 16 ga = 0.0598 in (2.5 lb/ft2 = 41.82 x t, computed)
        Material m = Material.ofGauge(MaterialType.STEEL, 16);
        assertEquals(0.0598, m.thicknessIn(), EPS);
        assertEquals(41.82 * 0.0598, m.weightLbPerFt2(), EPS);
    }

    @Test
    void gaugeRow_galvanized24_hasNominalMinMax() {
        GaugeRow row = Material.ofGauge(MaterialType.GALVANIZED, 24).gaugeRow().orElseThrow();
        // [S:SMACNA-GALV] via trade-reference §8.1 and §11 check 7
        assertEquals(0.0276, row.nominalIn(), EPS);
        assertEquals(0.0236, row.minIn().getAsDouble(), EPS);
        assertEquals(0.0316, row.maxIn().getAsDouble(), EPS);
        // [S:SMACNA-GALV] mm column via trade-reference §8.1 (0.701 mm, printed to 3 decimals)
        assertEquals(0.701, row.nominalMm(), EPS_TABLE);
    }

    @Test
    void ofGauge_stainless24_weighs1040() {
        Material m = Material.ofGauge(MaterialType.STAINLESS, 24);
        // [S:SSGA] [S:USC206] thickness; weight computed 41.6 x t, trade-reference §8.2
        assertEquals(0.0250, m.thicknessIn(), EPS);
        assertEquals(1.040, m.weightLbPerFt2(), EPS_TABLE);
    }

    @Test
    void ofGauge_aluminum20_weighs0450() {
        Material m = Material.ofGauge(MaterialType.ALUMINUM, 20);
        // [S:EICAC] [S:THELEN] thickness; weight computed 14.05 x t, trade-reference §8.2
        assertEquals(0.0320, m.thicknessIn(), EPS);
        assertEquals(0.450, m.weightLbPerFt2(), EPS_TABLE);
    }

    @Test
    void ofGauge_unknownGauge_namesMaterialGaugeAndValidGauges() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Material.ofGauge(MaterialType.STAINLESS, 23));
        assertEquals("gauge 23 is not in the stainless gauge table (U.S. Standard gauge); valid gauges:"
                + " 10, 12, 14, 16, 18, 20, 22, 24, 26, 28, 30", e.getMessage());
    }

    @Test
    void weightLbOf_one48x120Sheet24ga_is4624Lb() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        // 40 ft2 x 1.156 lb/ft2 = 46.24 lb: [S:LONG p.102] [S:SMACNA-GALV], computed in trade-reference §8.3
        assertEquals(46.24, m.weightLbOf(48 * 120), EPS_TABLE);
        assertEquals(40.0, SHEET_48_X_120.areaFt2(), EPS);
    }

    @Test
    void weightLb_three48x120Sheets24ga_is13872Lb() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        // computed, trade-reference §8.4 example (3 sheets 48 x 120 of 24 ga)
        assertEquals(138.72, SHEET_48_X_120.weightLb(m, 3), EPS_TABLE);
    }

    @Test
    void weightKg_one48x120Sheet24ga_is2097Kg() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        // 46.24 lb = 20.97 kg, computed in trade-reference §8.3
        assertEquals(20.97, SHEET_48_X_120.weightKg(m, 1), EPS_KG_PRINTED);
    }

    @Test
    void weightKgPerM2_galvanized24_is564() {
        // [S:SMACNA-GALV] kg/m2 column via trade-reference §8.1 and §11 check 6 (printed to 2 decimals)
        assertEquals(5.64, Material.ofGauge(MaterialType.GALVANIZED, 24).weightKgPerM2(), EPS_KG_PRINTED);
    }

    @Test
    void weightKgPerM2_galvanized30_is320() {
        // [S:SMACNA-GALV] kg/m2 column via trade-reference §8.1 (printed to 2 decimals)
        assertEquals(3.20, Material.ofGauge(MaterialType.GALVANIZED, 30).weightKgPerM2(), EPS_KG_PRINTED);
    }

    @Test
    void weightKgOfMm2_oneSquareMetre_equalsKgPerM2() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 22);
        assertEquals(m.weightKgPerM2(), m.weightKgOfMm2(1_000_000), EPS);
    }

    @Test
    void ofThickness_galvanized_uses4182PerInch() {
        Material m = Material.ofThickness(MaterialType.GALVANIZED, 0.0276);
        // 41.82 x 0.0276 = 1.154: "41.82 x t_nom" column, trade-reference §8.1 (computed) [S:MSG-ROOF]
        assertEquals(1.154, m.weightLbPerFt2(), EPS_TABLE);
        assertTrue(m.gauge().isEmpty());
        assertTrue(m.gaugeRow().isEmpty());
    }

    @Test
    void ofThickness_aluminum_uses1405PerInch() {
        // 14.05 lb/ft2 per in from 2.70 g/cm3, trade-reference §8.2 (computed)
        assertEquals(14.05 * 0.040, Material.ofThickness(MaterialType.ALUMINUM, 0.040).weightLbPerFt2(), EPS);
    }

    @Test
    void ofThicknessMm_sameAsInchesDividedBy254() {
        Material mm = Material.ofThicknessMm(MaterialType.STAINLESS, 1.5);
        Material in = Material.ofThickness(MaterialType.STAINLESS, 1.5 / 25.4);
        assertEquals(in, mm);
        assertEquals(1.5, mm.thicknessMm(), EPS);
    }

    @Test
    void ofThickness_zero_namesFieldValueAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Material.ofThickness(MaterialType.STEEL, 0.0));
        assertEquals("thicknessIn must be 0.001 to 1.0 in, was 0.0", e.getMessage());
    }

    @Test
    void ofThicknessMm_nan_namesFieldValueAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Material.ofThicknessMm(MaterialType.STEEL, Double.NaN));
        assertEquals("thicknessMm must be 0.0254 to 25.4 mm, was NaN", e.getMessage());
    }

    @Test
    void weightLbOf_negativeArea_namesFieldAndValue() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> m.weightLbOf(-1.0));
        assertEquals("areaIn2 must be finite and >= 0, was -1.0", e.getMessage());
    }

    @Test
    void describe_byGauge_showsGaugeAndThickness() {
        assertEquals("galvanized 24 ga (0.0276 in)", Material.ofGauge(MaterialType.GALVANIZED, 24).describe());
    }

    @Test
    void describe_byThickness_showsInchesAndMm() {
        assertEquals("aluminum 0.0400 in (1.016 mm)", Material.ofThickness(MaterialType.ALUMINUM, 0.04).describe());
    }

    @Test
    void source_byGauge_carriesTableTag() {
        assertTrue(Material.ofGauge(MaterialType.GALVANIZED, 24).source().contains("[S:SMACNA-GALV]"));
        assertTrue(Material.ofGauge(MaterialType.STEEL, 18).source().startsWith("from memory"));
        assertFalse(Material.ofGauge(MaterialType.STEEL, 10).source().contains("from memory"));
    }
}
