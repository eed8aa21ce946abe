package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.testing.Shapes;

class SeparatorTest {
    static final double EPS = 1e-9;

    private static Separator stacked(int count, SearchShape shape, double w, double h, RotationRule rule, long seed) {
        SearchShape[] shapes = new SearchShape[count];
        java.util.Arrays.fill(shapes, shape);
        Separator sep = new Separator(shapes, new double[][] {{0, 0, w, h}}, new OverlapMeasure(1e-4, 1e-9),
                AngleSet.of(rule), new SplittableRandom(seed), 1e-9);
        for (int i = 0; i < count; i++) {
            sep.place(i, 0, w / 2, h / 2, 0);
        }
        sep.refresh();
        return sep;
    }

    @Test
    void fourSquaresStackedInOnePlaceSpreadOverTheirBox() {
        // four 1 x 1 squares in a 2.05 x 2.05 box: only a near-grid layout fits
        Separator sep = stacked(4, SearchShape.of(Shapes.rect(0, 0, 1, 1), 0, 1e-9), 2.05, 2.05, RotationRule.none(), 3);
        assertTrue(sep.totalOverlap() > 0);
        assertTrue(sep.separate(new Separator.Budget(Long.MAX_VALUE, 200_000)), "separation must succeed");
        sep.refresh();
        assertEquals(0, sep.totalOverlap(), EPS);
        for (int i = 0; i < 4; i++) {
            assertTrue(sep.at[i].minX >= 0 && sep.at[i].maxX <= 2.05 && sep.at[i].minY >= 0 && sep.at[i].maxY <= 2.05);
            for (int j = i + 1; j < 4; j++) {
                assertTrue(!new OverlapMeasure(1e-4, 0).collide(sep.at[i], sep.at[j]), i + " and " + j + " collide");
            }
        }
    }

    @Test
    void rectanglesThatMustTurnFindTheirAngle() {
        // three 3 x 1 bars in a 1.1 x 3.3 box: each must stand upright (90 or 270 degrees)
        Separator sep = stacked(3, SearchShape.of(Shapes.rect(0, 0, 3, 1), 0, 1e-9), 3.3, 1.1 * 3, RotationRule.quarter(), 4);
        sep.boxes[0] = new double[] {0, 0, 3.3, 3.3};
        assertTrue(sep.separate(new Separator.Budget(Long.MAX_VALUE, 200_000)));
        sep.refresh();
        assertEquals(0, sep.totalOverlap(), EPS);
    }
}
