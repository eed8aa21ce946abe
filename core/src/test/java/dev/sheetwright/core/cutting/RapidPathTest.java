package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

class RapidPathTest {

    private static final double EPS = 1e-9;

    @Test
    void length_noPoints_isZero() {
        assertEquals(0.0, RapidPath.length(List.of()), EPS);
    }

    @Test
    void nearestNeighbour_pointsOnALine_visitsInDistanceOrder() {
        PiercePoint a = new PiercePoint(0, 10);
        PiercePoint b = new PiercePoint(0, 5);
        PiercePoint c = new PiercePoint(0, 20);

        RapidPath path = RapidPath.nearestNeighbour(List.of(a, b, c));

        assertEquals(List.of(b, a, c), path.order());
        assertEquals(20.0, path.length(), EPS);
    }

    @Test
    void nearestNeighbour_equalDistances_takesEarlierPoint() {
        PiercePoint first = new PiercePoint(4, 3);
        PiercePoint second = new PiercePoint(3, 4);

        RapidPath path = RapidPath.nearestNeighbour(List.of(first, second));

        assertEquals(List.of(first, second), path.order());
        assertEquals(5.0 + Math.sqrt(2), path.length(), EPS);
    }

    @Test
    void nearestNeighbour_greedyTour_isNotNecessarilyShortest() {
        // from the origin the nearest point is (1, 0); the greedy tour then goes left and back right
        List<PiercePoint> points = List.of(new PiercePoint(1, 0), new PiercePoint(-2, 0), new PiercePoint(4, 0));
        assertEquals(1 + 3 + 6, RapidPath.length(points), EPS);
    }

    @Test
    void piercePoint_nonFinite_namesFieldAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new PiercePoint(Double.NaN, 0));
        assertEquals("x must be finite, was NaN", e.getMessage());
    }
}
