package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import org.junit.jupiter.api.Test;

class CutTimeEstimateTest {

    private static final double EPS = 1e-9;

    @Test
    void of_workedExample_is720Minutes() {
        // computed, trade-reference §9.5 and §11 C12: 1200 in at 200 in/min, 20 pierces x (0.3 s + 1.5 s),
        // 600 in of rapids at 1000 in/min -> 6.00 + 0.60 + 0.60 = 7.20 min plus loading
        CutWork work = CutWork.ofInches(1200, 20, 600, 0);
        CutRates rates = CutRates.ofInches(200, 0.3, 1.5, 1000, 2.0);

        CutTimeEstimate t = CutTimeEstimate.of(work, rates);

        assertEquals(6.00, t.cuttingMinutes(), EPS);
        assertEquals(0.60, t.piercingMinutes(), EPS);
        assertEquals(0.60, t.rapidMinutes(), EPS);
        assertEquals(0.0, t.handlingMinutes(), EPS);
        assertEquals(7.20, t.totalMinutes(), EPS);
    }

    @Test
    void of_singleReducerBlank_isAbout22Seconds() {
        // computed, trade-reference §9.5: 12 -> 8 in reducer blank, 83.23 in at 250 in/min = 19.97 s,
        // + 0.5 s pierce + 1.5 s sensing = 22.0 s (printed to 0.1 s); 83.23 x 60 / 250 = 19.9752 s exactly
        CutTimeEstimate t = CutTimeEstimate.of(CutWork.ofInches(83.23, 1, 0, 0),
                CutRates.ofInches(250, 0.5, 1.5, 1000, 2.0));
        assertEquals(19.9752, t.cuttingMinutes() * 60, EPS);
        assertEquals(22.0, t.totalSeconds(), 0.05);
    }

    @Test
    void of_sheets_addHandlingPerSheet() {
        // 1-3 min manual load/unload per sheet (common practice, §9.5)
        CutTimeEstimate t = CutTimeEstimate.of(new CutWork(0, 0, 0, 3), CutRates.ofInches(200, 0.3, 1.5, 1000, 2.0));
        assertEquals(6.0, t.handlingMinutes(), EPS);
        assertEquals(6.0, t.totalMinutes(), EPS);
    }

    @Test
    void estimate_fromDefaultChart_usesTheChartRates() {
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        CutChart chart = CutChart.defaults();
        CutWork work = new CutWork(10_000, 12, 3_000, 1);

        CutTimeEstimate t = CutTimeEstimate.estimate(chart, CuttingProcess.PLASMA, m, work);

        CutChartRow row = chart.at(CuttingProcess.PLASMA, MaterialType.GALVANIZED, m.thicknessMm());
        assertEquals(10_000 / row.speedMmPerMin(), t.cuttingMinutes(), EPS);
        assertEquals(12 * row.startSeconds() / 60, t.piercingMinutes(), EPS);
        assertEquals(3_000 / chart.rapidMmPerMin(CuttingProcess.PLASMA), t.rapidMinutes(), EPS);
        assertEquals(chart.loadMinutesPerSheet(CuttingProcess.PLASMA), t.handlingMinutes(), EPS);
    }

    @Test
    void from_chart_sourceNamesCutDataRapidAndHandling() {
        CutRates r = CutRates.from(CutChart.defaults(), CuttingProcess.PLASMA, MaterialType.STEEL, 1.5);
        assertEquals("cut data: speed [S:PLASMAMAN] 40 A max x 0.70 (common practice); starts from memory;"
                + " rapid: from memory; handling: common practice", r.source());
    }

    @Test
    void estimate_thicknessOutsideChart_refuses() {
        Material plate = Material.ofThickness(MaterialType.STEEL, 0.25);
        assertThrows(CutDataOutOfRange.class, () -> CutTimeEstimate.estimate(CutChart.defaults(),
                CuttingProcess.PLASMA, plate, new CutWork(100, 1, 0, 1)));
    }

    @Test
    void plus_addsTermByTerm() {
        CutTimeEstimate a = new CutTimeEstimate(1, 2, 3, 4);
        CutTimeEstimate b = new CutTimeEstimate(0.5, 0.25, 0.125, 2);
        assertEquals(new CutTimeEstimate(1.5, 2.25, 3.125, 6), a.plus(b));
        assertTrue(CutTimeEstimate.zero().plus(a).equals(a));
    }

    @Test
    void cutWork_negativeLength_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CutWork.ofInches(-1, 0, 0, 0));
        assertEquals("cutLengthIn must be finite and >= 0, was -1.0", e.getMessage());
    }

    @Test
    void cutRates_zeroSpeed_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CutRates.ofInches(0, 0.3, 1.5, 1000, 2.0));
        assertEquals("cutSpeedInPerMin must be finite and > 0, was 0.0", e.getMessage());
    }
}
