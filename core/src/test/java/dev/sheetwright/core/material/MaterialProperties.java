package dev.sheetwright.core.material;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

class MaterialProperties {

    /** Relative tolerance for sums and products of a few doubles. */
    private static final double REL_EPS = 1e-12;

    @Provide
    Arbitrary<Material> materials() {
        return Arbitraries.of(MaterialType.values()).flatMap(type ->
                Arbitraries.of(GaugeTable.of(type).gauges()).map(g -> Material.ofGauge(type, g)));
    }

    @Property
    void weightLbOf_isAdditiveInArea(@ForAll("materials") Material m,
                                     @ForAll @DoubleRange(min = 0, max = 10_000) double a,
                                     @ForAll @DoubleRange(min = 0, max = 10_000) double b) {
        double sum = m.weightLbOf(a + b);
        assertEquals(sum, m.weightLbOf(a) + m.weightLbOf(b), REL_EPS * Math.max(1, sum));
    }

    @Property
    void weightLbOf_scalesWithArea(@ForAll("materials") Material m,
                                   @ForAll @DoubleRange(min = 0, max = 10_000) double a,
                                   @ForAll @DoubleRange(min = 0, max = 100) double k) {
        double scaled = m.weightLbOf(k * a);
        assertEquals(scaled, k * m.weightLbOf(a), REL_EPS * Math.max(1, scaled));
        assertEquals(0.0, m.weightLbOf(0.0));
    }

    @Property
    void weightKgOfMm2_agreesWithPoundsOfSameArea(@ForAll("materials") Material m,
                                                  @ForAll @DoubleRange(min = 0, max = 10_000) double areaIn2) {
        double kgFromPounds = m.weightLbOf(areaIn2) * UnitFactors.KG_PER_LB;
        double kg = m.weightKgOfMm2(areaIn2 * UnitFactors.MM_PER_IN * UnitFactors.MM_PER_IN);
        // 4.88242764 kg/m2 per lb/ft2 is rounded to 9 significant figures
        assertEquals(kgFromPounds, kg, 1e-8 * Math.max(1, kg));
    }
}
