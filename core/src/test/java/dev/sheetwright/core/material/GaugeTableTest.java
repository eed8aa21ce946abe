package dev.sheetwright.core.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class GaugeTableTest {

    /** Trade-reference §8.1 shows tabulated weight and 41.82 x t differing by at most 0.002 lb/ft2. */
    private static final double EPS_BASIS = 0.0025;

    @Test
    void galvanizedTabulatedWeights_agreeWith4182TimesThickness() {
        GaugeTable table = GaugeTable.of(MaterialType.GALVANIZED);
        for (GaugeRow row : table.rows()) {
            // [S:SMACNA-GALV] weights vs "41.82 x t_nom" column, computed in trade-reference §8.1
            assertEquals(41.82 * row.nominalIn(), row.lbPerFt2(), EPS_BASIS, "gauge " + row.gauge());
        }
    }

    @Test
    void galvanizedEvenGauges_haveMinBelowAndMaxAboveNominal() {
        for (GaugeRow row : GaugeTable.of(MaterialType.GALVANIZED).rows()) {
            if (row.gauge() % 2 == 0) {
                // [S:SMACNA-GALV] via trade-reference §8.1: min/max given for every even gauge 10-30
                assertTrue(row.minIn().getAsDouble() < row.nominalIn(), "gauge " + row.gauge());
                assertTrue(row.maxIn().getAsDouble() > row.nominalIn(), "gauge " + row.gauge());
            }
        }
    }

    @Test
    void everyTable_thicknessFallsAsGaugeRises() {
        for (MaterialType type : MaterialType.values()) {
            List<GaugeRow> rows = GaugeTable.of(type).rows();
            for (int i = 1; i < rows.size(); i++) {
                assertTrue(rows.get(i).nominalIn() < rows.get(i - 1).nominalIn(),
                        type.word() + " gauge " + rows.get(i).gauge());
            }
        }
    }

    @Test
    void gauges_galvanized_coversTenToThirtyIncludingOdd() {
        // [S:SMACNA-GALV] via trade-reference §8.1: even gauges 10-30 and odd gauges 11-29
        assertEquals(21, GaugeTable.of(MaterialType.GALVANIZED).gauges().size());
        assertEquals(10, GaugeTable.of(MaterialType.GALVANIZED).gauges().get(0));
        assertEquals(30, GaugeTable.of(MaterialType.GALVANIZED).gauges().get(20));
    }
}
