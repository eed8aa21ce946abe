package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

class CutChartProperties {

    private static final CuttingProcess PROCESS = CuttingProcess.PLASMA;
    private static final MaterialType MATERIAL = MaterialType.STAINLESS;

    /** Charts of 2 to 8 rows at distinct thicknesses 0.1-50 mm with arbitrary (not necessarily monotone) values. */
    @Provide
    Arbitrary<CutChart> charts() {
        Arbitrary<CutChartRow> row = Combinators.combine(
                Arbitraries.integers().between(1, 500),
                Arbitraries.doubles().between(100, 50_000),
                Arbitraries.doubles().between(0, 2),
                Arbitraries.doubles().between(0, 3)).as((tenths, v, p, s) ->
                new CutChartRow(PROCESS, MATERIAL, tenths / 10.0, v, p, s, CutChart.SHOP));
        return row.list().ofMinSize(2).ofMaxSize(8).uniqueElements(CutChartRow::thicknessMm)
                .map(rows -> new CutChart(rows, CutChart.defaults().settings()));
    }

    @Property
    void at_rowThickness_returnsTheRowExactly(@ForAll("charts") CutChart chart) {
        for (CutChartRow row : chart.rows()) {
            assertEquals(row, chart.at(PROCESS, MATERIAL, row.thicknessMm()));
        }
    }

    @Property
    void at_betweenTwoRows_isMonotoneAndBoundedByTheRows(@ForAll("charts") CutChart chart,
                                                         @ForAll @IntRange(min = 0, max = 100) int pick,
                                                         @ForAll @DoubleRange(min = 0, max = 1) double fa,
                                                         @ForAll @DoubleRange(min = 0, max = 1) double fb) {
        List<CutChartRow> rows = chart.rows(PROCESS, MATERIAL);
        int i = pick % (rows.size() - 1);
        CutChartRow lo = rows.get(i);
        CutChartRow hi = rows.get(i + 1);
        double t1 = thicknessAt(lo, hi, Math.min(fa, fb));
        double t2 = thicknessAt(lo, hi, Math.max(fa, fb));

        CutChartRow a = chart.at(PROCESS, MATERIAL, t1);
        CutChartRow b = chart.at(PROCESS, MATERIAL, t2);

        assertMonotoneBetween(lo.speedMmPerMin(), hi.speedMmPerMin(), a.speedMmPerMin(), b.speedMmPerMin());
        assertMonotoneBetween(lo.pierceSeconds(), hi.pierceSeconds(), a.pierceSeconds(), b.pierceSeconds());
        assertMonotoneBetween(lo.heightSenseSeconds(), hi.heightSenseSeconds(),
                a.heightSenseSeconds(), b.heightSenseSeconds());
    }

    @Property
    void at_outsideTheRows_isRefused(@ForAll("charts") CutChart chart,
                                     @ForAll @DoubleRange(min = 0.001, max = 10) @Scale(4) double beyond,
                                     @ForAll boolean above) {
        List<CutChartRow> rows = chart.rows(PROCESS, MATERIAL);
        double t = above ? rows.get(rows.size() - 1).thicknessMm() + beyond : rows.get(0).thicknessMm() - beyond;
        if (t > 0) {
            CutDataOutOfRange e = assertThrows(CutDataOutOfRange.class, () -> chart.at(PROCESS, MATERIAL, t));
            assertEquals(t, e.thicknessMm());
        } else {
            assertThrows(IllegalArgumentException.class, () -> chart.at(PROCESS, MATERIAL, t));
        }
    }

    @Property
    void defaults_speedNeverRisesWithThickness(@ForAll CuttingProcess process, @ForAll MaterialType material,
                                               @ForAll @DoubleRange(min = 0.3, max = 4.0) double ta,
                                               @ForAll @DoubleRange(min = 0.3, max = 4.0) double tb) {
        CutChart chart = CutChart.defaults();
        double thin = chart.speedMmPerMin(process, material, Math.min(ta, tb));
        double thick = chart.speedMmPerMin(process, material, Math.max(ta, tb));
        assertTrue(thin >= thick, thin + " < " + thick);
    }

    private static double thicknessAt(CutChartRow lo, CutChartRow hi, double f) {
        double t = lo.thicknessMm() + f * (hi.thicknessMm() - lo.thicknessMm());
        return Math.min(hi.thicknessMm(), Math.max(lo.thicknessMm(), t));
    }

    /** va, vb are values at thicknesses ta <= tb between rows with values lo and hi. */
    private static void assertMonotoneBetween(double lo, double hi, double va, double vb) {
        double min = Math.min(lo, hi);
        double max = Math.max(lo, hi);
        assertTrue(va >= min && va <= max, va + " outside [" + min + ", " + max + "]");
        assertTrue(vb >= min && vb <= max, vb + " outside [" + min + ", " + max + "]");
        assertTrue(hi >= lo ? va <= vb : va >= vb, "not monotone: " + va + ", " + vb + " between " + lo + ", " + hi);
    }
}
