package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

class CutTimeEstimateProperties {

    private static final double REL_EPS = 1e-12;

    @Property
    void totalMinutes_isSumOfTheFourTerms(@ForAll @DoubleRange(min = 0, max = 1e6) double cutMm,
                                          @ForAll @IntRange(min = 0, max = 500) int pierces,
                                          @ForAll @DoubleRange(min = 0, max = 1e6) double rapidMm,
                                          @ForAll @IntRange(min = 0, max = 20) int sheets,
                                          @ForAll @DoubleRange(min = 100, max = 50_000) double speed) {
        CutTimeEstimate t = CutTimeEstimate.of(new CutWork(cutMm, pierces, rapidMm, sheets),
                new CutRates(speed, 0.3, 1.5, 20_000, 2.0, CutRates.GIVEN));
        double sum = cutMm / speed + pierces * 1.8 / 60 + rapidMm / 20_000 + sheets * 2.0;
        assertEquals(sum, t.totalMinutes(), REL_EPS * Math.max(1, sum));
    }

    @Property
    void estimate_splitWork_addsUpToWholeWork(@ForAll @DoubleRange(min = 0, max = 1e5) double cutA,
                                              @ForAll @DoubleRange(min = 0, max = 1e5) double cutB,
                                              @ForAll @IntRange(min = 0, max = 100) int piercesA,
                                              @ForAll @IntRange(min = 0, max = 100) int piercesB) {
        CutRates rates = new CutRates(5_000, 0.2, 1.5, 20_000, 2.0, CutRates.GIVEN);
        CutTimeEstimate whole = CutTimeEstimate.of(new CutWork(cutA + cutB, piercesA + piercesB, 0, 1), rates);
        CutTimeEstimate parts = CutTimeEstimate.of(new CutWork(cutA, piercesA, 0, 1), rates)
                .plus(CutTimeEstimate.of(new CutWork(cutB, piercesB, 0, 0), rates));
        assertEquals(whole.totalMinutes(), parts.totalMinutes(), REL_EPS * Math.max(1, whole.totalMinutes()));
    }
}
