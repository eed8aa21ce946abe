package dev.sheetwright.core.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class StandardSheetsTest {

    private static final double EPS = 1e-9;

    @Test
    void inch_includes48x120_labelledInInches() {
        // common practice, trade-reference §8.3
        List<String> labels = StandardSheets.inch().stream().map(SheetSize::label).toList();
        assertEquals(List.of("36 x 96 in", "36 x 120 in", "48 x 96 in", "48 x 120 in", "60 x 120 in",
                "60 x 144 in"), labels);
    }

    @Test
    void metric_1250x2500_keepsMmExactly() {
        // common practice, trade-reference §8.3
        SheetSize s = StandardSheets.metric().get(1);
        assertEquals("1250 x 2500 mm", s.label());
        assertEquals(1250.0, s.widthMm(), EPS);
        assertEquals(3_125_000.0, s.areaMm2(), 1e-6);
    }

    @Test
    void all_isInchThenMetric() {
        assertEquals(StandardSheets.inch().size() + StandardSheets.metric().size(), StandardSheets.all().size());
        assertTrue(StandardSheets.all().stream().allMatch(s -> s.source().startsWith("common practice")));
    }

    @Test
    void coilWidthsIn_include48And60() {
        // common practice, trade-reference §8.3
        assertTrue(StandardSheets.coilWidthsIn().containsAll(List.of(48.0, 60.0)));
    }

    @Test
    void weightLb_negativeCount_namesFieldAndValue() {
        SheetSize s = StandardSheets.inch().get(0);
        Material m = Material.ofGauge(MaterialType.GALVANIZED, 24);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> s.weightLb(m, -1));
        assertEquals("count must be >= 0, was -1", e.getMessage());
    }
}
