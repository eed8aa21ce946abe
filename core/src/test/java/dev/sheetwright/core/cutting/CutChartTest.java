package dev.sheetwright.core.cutting;

import static dev.sheetwright.core.cutting.CuttingProcess.LASER;
import static dev.sheetwright.core.cutting.CuttingProcess.PLASMA;
import static dev.sheetwright.core.material.MaterialType.ALUMINUM;
import static dev.sheetwright.core.material.MaterialType.GALVANIZED;
import static dev.sheetwright.core.material.MaterialType.STEEL;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.GaugeTable;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import java.util.List;
import org.junit.jupiter.api.Test;

class CutChartTest {

    private static final double EPS = 1e-9;
    private static final CutChart DEFAULTS = CutChart.defaults();

    @Test
    void speedMmPerMin_plasmaSteelAtPublishedRow_is70PercentOfMaximum() {
        // [S:PLASMAMAN] via trade-reference §9.2: 1.5 mm, 40 A, 9.4 m/min maximum;
        // production = 70 % of maximum (common practice, §9.2 gives 60-80 %)
        assertEquals(9_400 * 0.70, DEFAULTS.speedMmPerMin(PLASMA, STEEL, 1.5), EPS);
    }

    @Test
    void speedMmPerMin_betweenTwoRows_interpolatesLinearly() {
        // [S:PLASMAMAN] via trade-reference §9.2: 1.0 mm 12.6 m/min and 1.5 mm 9.4 m/min maximum, x 0.70 (common
        // practice); 1.25 mm is the midpoint, so the speed is the mean of the two production speeds
        double expected = (12_600 * 0.70 + 9_400 * 0.70) / 2;
        assertEquals(expected, DEFAULTS.speedMmPerMin(PLASMA, STEEL, 1.25), EPS);
    }

    @Test
    void speedMmPerMin_betweenTwoRows_matchesLineThroughTheRows() {
        List<CutChartRow> rows = DEFAULTS.rows(LASER, GALVANIZED);
        CutChartRow lo = rows.get(2);
        CutChartRow hi = rows.get(3);
        double t = lo.thicknessMm() + 0.3 * (hi.thicknessMm() - lo.thicknessMm());
        double expected = lo.speedMmPerMin()
                + (hi.speedMmPerMin() - lo.speedMmPerMin()) * (t - lo.thicknessMm())
                / (hi.thicknessMm() - lo.thicknessMm());
        assertEquals(expected, DEFAULTS.speedMmPerMin(LASER, GALVANIZED, t), EPS);
    }

    @Test
    void pierceSeconds_betweenTwoRows_interpolatesLinearly() {
        // plasma pierce delays 0.2 s at 2.0 mm and 0.3 s at 3.0 mm (from memory, §9.3 gives 0-0.3 s on <= 3 mm)
        assertEquals(0.25, DEFAULTS.pierceSeconds(PLASMA, STEEL, 2.5), EPS);
        // plasma height sensing 1.5 s per start (from memory, §9.3 gives 1-3 s)
        assertEquals(1.5, DEFAULTS.heightSenseSeconds(PLASMA, STEEL, 2.5), EPS);
    }

    @Test
    void at_betweenRowsWithDifferentSources_namesBoth() {
        String source = DEFAULTS.at(PLASMA, STEEL, 0.5).source();
        assertTrue(source.startsWith("interpolated: "), source);
        assertTrue(source.contains("[S:PLASMAMAN]") && source.contains("from memory"), source);
    }

    @Test
    void speedMmPerMin_belowTable_refusesWithRange() {
        CutDataOutOfRange e = assertThrows(CutDataOutOfRange.class,
                () -> DEFAULTS.speedMmPerMin(PLASMA, GALVANIZED, 0.2));
        assertEquals("thicknessMm 0.200 is outside the plasma cut chart for galvanized (0.300 to 4.000 mm);"
                + " cut data is never extrapolated", e.getMessage());
        assertEquals(GALVANIZED, e.material());
    }

    @Test
    void speedMmPerMin_aboveTable_refusesWithRange() {
        CutDataOutOfRange e = assertThrows(CutDataOutOfRange.class,
                () -> DEFAULTS.speedMmPerMin(LASER, STEEL, 6.35));
        assertEquals("thicknessMm 6.350 is outside the laser cut chart for steel (0.300 to 4.000 mm);"
                + " cut data is never extrapolated", e.getMessage());
    }

    @Test
    void pierceSeconds_aboveTable_refusesWithRange() {
        CutDataOutOfRange e = assertThrows(CutDataOutOfRange.class,
                () -> DEFAULTS.pierceSeconds(PLASMA, ALUMINUM, 4.5));
        assertEquals("thicknessMm 4.500 is outside the plasma cut chart for aluminum (0.300 to 4.000 mm);"
                + " cut data is never extrapolated", e.getMessage());
    }

    @Test
    void at_noRowsForMaterial_refusesNamingProcessAndMaterial() {
        CutChart steelOnly = new CutChart(DEFAULTS.rows(PLASMA, STEEL), DEFAULTS.settings());
        CutDataOutOfRange e = assertThrows(CutDataOutOfRange.class, () -> steelOnly.at(PLASMA, ALUMINUM, 1.0));
        assertEquals("the plasma cut chart has no rows for aluminum (asked for thicknessMm 1.000); add rows for"
                + " this machine", e.getMessage());
    }

    @Test
    void at_nonPositiveThickness_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DEFAULTS.at(PLASMA, STEEL, -1.0));
        assertEquals("thicknessMm must be finite and > 0, was -1.0", e.getMessage());
    }

    @Test
    void defaults_coverGalvanized30To10GaugeForBothProcesses() {
        // galvanized 30 ga 0.399 mm to 10 ga 3.510 mm [S:SMACNA-GALV] via trade-reference §8.1
        for (int gauge : GaugeTable.of(GALVANIZED).gauges()) {
            Material m = Material.ofGauge(GALVANIZED, gauge);
            for (CuttingProcess p : CuttingProcess.values()) {
                assertTrue(DEFAULTS.speedMmPerMin(p, GALVANIZED, m.thicknessMm()) > 0, p + " " + gauge);
            }
        }
    }

    @Test
    void defaults_everyMaterialHasPlasmaRowsFrom03To4Mm() {
        for (MaterialType m : MaterialType.values()) {
            List<CutChartRow> rows = DEFAULTS.rows(PLASMA, m);
            assertEquals(0.3, rows.get(0).thicknessMm(), EPS);
            assertEquals(4.0, rows.get(rows.size() - 1).thicknessMm(), EPS);
        }
    }

    @Test
    void defaults_everyRowNamesItsSource() {
        for (CutChartRow r : DEFAULTS.rows()) {
            String s = r.source();
            assertTrue(s.contains("[S:") || s.contains("common practice") || s.contains("from memory"), s);
        }
    }

    @Test
    void defaults_galvanizedPlasmaIsSlowerThanSteel() {
        // §9.4: plasma on galvanized often needs slightly slower speed (from memory); factor 0.90 from memory
        assertEquals(DEFAULTS.speedMmPerMin(PLASMA, STEEL, 1.0) * 0.90,
                DEFAULTS.speedMmPerMin(PLASMA, GALVANIZED, 1.0), EPS);
    }

    @Test
    void withOverrides_sameKey_replacesDefault() {
        CutChartRow shop = new CutChartRow(PLASMA, GALVANIZED, 1.0, 6_000, 0.0, 2.0, CutChart.SHOP);
        CutChart chart = DEFAULTS.withOverrides(List.of(shop));
        assertEquals(shop, chart.at(PLASMA, GALVANIZED, 1.0));
        assertEquals(DEFAULTS.rows().size(), chart.rows().size());
        assertEquals(DEFAULTS.at(PLASMA, GALVANIZED, 1.5), chart.at(PLASMA, GALVANIZED, 1.5));
    }

    @Test
    void withOverrides_newThickness_extendsTheRange() {
        CutChartRow shop = new CutChartRow(PLASMA, GALVANIZED, 6.0, 1_000, 0.6, 1.5, CutChart.SHOP);
        CutChart chart = DEFAULTS.withOverrides(List.of(shop));
        assertEquals(DEFAULTS.rows().size() + 1, chart.rows().size());
        double at4 = DEFAULTS.speedMmPerMin(PLASMA, GALVANIZED, 4.0);
        assertEquals((at4 + 1_000) / 2, chart.speedMmPerMin(PLASMA, GALVANIZED, 5.0), EPS);
    }

    @Test
    void withOverrides_repeatedKey_isRefused() {
        CutChartRow a = new CutChartRow(LASER, STEEL, 1.0, 20_000, 0.1, 0.0, CutChart.SHOP);
        CutChartRow b = new CutChartRow(LASER, STEEL, 1.0, 21_000, 0.1, 0.0, CutChart.SHOP);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DEFAULTS.withOverrides(List.of(a, b)));
        assertEquals("rows has two rows for laser steel 1.0 mm", e.getMessage());
    }

    @Test
    void withRapid_replacesRapidAndMarksShop() {
        CutChart chart = DEFAULTS.withRapid(PLASMA, 25_400);
        assertEquals(25_400, chart.rapidMmPerMin(PLASMA), EPS);
        assertEquals(CutChart.SHOP, chart.settings(PLASMA).rapidSource());
        assertEquals(DEFAULTS.settings(LASER), chart.settings(LASER));
    }

    @Test
    void withLoadMinutes_replacesHandlingTime() {
        CutChart chart = DEFAULTS.withLoadMinutes(LASER, 0.5);
        assertEquals(0.5, chart.loadMinutesPerSheet(LASER), EPS);
        // 1-3 min manual handling per sheet (common practice, §9.5)
        assertEquals(2.0, chart.loadMinutesPerSheet(PLASMA), EPS);
    }

    @Test
    void withRapid_zero_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DEFAULTS.withRapid(PLASMA, 0));
        assertEquals("rapidMmPerMin must be finite and > 0, was 0.0", e.getMessage());
    }

    @Test
    void cutChartRow_negativePierce_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CutChartRow(LASER, STEEL, 1.0, 20_000, -0.1, 0.0, CutChart.SHOP));
        assertEquals("pierceSeconds must be finite and >= 0, was -0.1", e.getMessage());
    }
}
